/**
 * Fizzwright's visual identity, "Hedgerow": bottle green, elderflower cream and a hawthorn-berry red,
 * with a honey amber for cautions. This file is the only place colours, spacing and type sizes are defined.
 * Contrast ratios noted are text on `paper` (WCAG AA asks 4.5:1 for body text, 3:1 for large text and UI).
 */
export const palette = {
  bottle: '#1E4A43', // 9.9:1 on paper: primary actions, rail, headings
  bottleDeep: '#12302B',
  moss: '#3F6B4F',
  elderflower: '#FBF8F2', // paper
  cream: '#F2ECE0',
  ink: '#1B2422', // 15.4:1 on paper
  slate: '#4E5A57', // 6.9:1 on paper: secondary text
  pebble: '#C9C2B4', // borders
  hawthorn: '#A3262F', // 6.7:1 on paper: danger
  hawthornTint: '#F8E4E4',
  honey: '#8A5A00', // 5.6:1 on paper: caution text
  honeyTint: '#FBF0D6',
  meadow: '#2C6B3A', // 6.1:1 on paper: success
  meadowTint: '#E3F1E4',
  sky: '#245C8A', // 6.5:1 on paper: information
  skyTint: '#E2EDF6',
  white: '#FFFFFF',
  focus: '#D98E04', // focus ring, 3:1 against bottle and paper; the amber of the logo
  linen: '#E4DED2', // card, table and chart hairlines
  oat: '#EDE8DE', // dividers between rows
  bottleLight: '#2F6A5F',
  bottleLine: '#3B6A61',
  mint: '#E8F0EC', // text on the rail
  mintMuted: '#BFD3CC',
  mintPale: '#D3E2DC',
  sage: '#E6EFEC', // a chosen option's background
  hawthornDeep: '#7E1C23',
  umber: '#3D3422', // text on caution tints
  black: '#000000', // the nutrition panel, black on white as labels print it
} as const;

export const colors = {
  background: palette.elderflower,
  surface: palette.white,
  surfaceMuted: palette.cream,
  text: palette.ink,
  textMuted: palette.slate,
  textOnPrimary: palette.white,
  primary: palette.bottle,
  primaryPressed: palette.bottleDeep,
  border: palette.pebble,
  danger: palette.hawthorn,
  dangerTint: palette.hawthornTint,
  caution: palette.honey,
  cautionTint: palette.honeyTint,
  success: palette.meadow,
  successTint: palette.meadowTint,
  info: palette.sky,
  infoTint: palette.skyTint,
  focus: palette.focus,
  rail: palette.bottle,
  railText: palette.mint,
  railTextMuted: palette.mintMuted,
  railLine: palette.bottleLine,
  railActive: palette.bottleLight,
  panelText: palette.mintPale,
  hairline: palette.linen,
  divider: palette.oat,
  selected: palette.sage,
  dangerStrong: palette.hawthornDeep,
  textOnCaution: palette.umber,
  brand: palette.focus,
  labelInk: palette.black,
  labelPaper: palette.white,
} as const;

/** The one look of a chosen option, everywhere: segments, option chips, lists of choices, toggled chips. */
export const selection = {
  box: { backgroundColor: colors.primary, borderColor: colors.primary },
  text: { color: colors.textOnPrimary },
} as const;

export const fonts = {
  regular: 'SourceSans3_400Regular',
  semibold: 'SourceSans3_600SemiBold',
  bold: 'SourceSans3_700Bold',
} as const;

export const fontSize = {
  xs: 13,
  sm: 15,
  md: 17,
  lg: 20,
  xl: 24,
  display: 26,
  xxl: 30,
  /** The printed card's checkpoints: a little larger than body text, for reading at arm's length. */
  lead: 18,
} as const;

export const space = {
  xxs: 2,
  xs: 4,
  sm: 8,
  md: 12,
  lg: 16,
  xl: 24,
  xxl: 32,
} as const;

export const radius = { sm: 6, md: 10, lg: 16, pill: 999 } as const;

/** Smallest touch target, in density-independent pixels (WCAG 2.5.5 asks 44 CSS px). */
export const touchTarget = 44;

/** Window widths at which the layout changes. */
export const breakpoints = {
  /** From here the shell shows a side rail instead of a bottom tab bar. */
  wide: 1024,
  /** From here tables show as tables rather than stacked cards. */
  table: 720,
} as const;
