/**
 * The house typeface on the web: which weights, in which unicode-range parts, under which file names, and the
 * @font-face rules for them. Pure, so the build (server/cli/build-fonts.ts, which writes the files) and the app
 * (lib/fonts.web.ts, which declares them) read one list.
 */

/** The weights the app uses, as @expo-google-fonts/source-sans-3 ships them, and the family names of lib/theme.ts. */
export const FONT_WEIGHTS = [
  { family: 'SourceSans3_400Regular', weight: '400Regular', slug: '400' },
  { family: 'SourceSans3_600SemiBold', weight: '600SemiBold', slug: '600' },
  { family: 'SourceSans3_700Bold', weight: '700Bold', slug: '700' },
] as const;

/**
 * Each weight in two parts: the browser fetches a part only when the page shows one of its characters. `core` is
 * what nearly every screen prints (Basic Latin, dashes, curly quotes, bullet, ellipsis); `extra` the rest the screens
 * use (Latin-1 letters and signs such as °, µ, ±, ×, é; super- and subscripts, €, →, −, ≈, ≤, ≥). A character in
 * neither (a name in Polish, say) is drawn in the fallback face.
 */
export const FONT_PARTS = {
  core: [
    [0x20, 0x7e],
    [0x2013, 0x2014],
    [0x2018, 0x201d],
    [0x2022, 0x2022],
    [0x2026, 0x2026],
  ],
  extra: [
    [0xa0, 0xff],
    [0x2070, 0x209f],
    [0x20ac, 0x20ac],
    [0x2192, 0x2192],
    [0x2212, 0x2212],
    [0x2248, 0x2248],
    [0x2264, 0x2265],
  ],
} as const satisfies Record<string, readonly (readonly [number, number])[]>;
export type FontPart = keyof typeof FONT_PARTS;

/** Where the files are served from (Expo serves public/ as the site's root). */
export const FONTS_PATH = '/fonts';
export const fontFileName = (slug: string, part: FontPart) => `source-sans-3-${slug}-${part}.woff2`;

/** Every character of a part, for the subsetter. */
export const partText = (part: FontPart) =>
  FONT_PARTS[part]
    .map(([from, to]) => Array.from({ length: to - from + 1 }, (_, i) => String.fromCodePoint(from + i)).join(''))
    .join('');

const hex = (n: number) => n.toString(16).toUpperCase();
/** The CSS unicode-range of a part, e.g. "U+20-7E, U+2013-2014". */
export const unicodeRange = (part: FontPart) =>
  FONT_PARTS[part].map(([from, to]) => (from === to ? `U+${hex(from)}` : `U+${hex(from)}-${hex(to)}`)).join(', ');

/** The @font-face rules: swap, so text draws at once in the fallback face and changes when a part arrives. */
export function fontFaceCss(): string {
  return FONT_WEIGHTS.flatMap(({ family, slug }) =>
    (Object.keys(FONT_PARTS) as FontPart[]).map(
      (part) =>
        `@font-face{font-family:'${family}';src:url('${FONTS_PATH}/${fontFileName(slug, part)}') format('woff2');` +
        `font-display:swap;unicode-range:${unicodeRange(part)}}`,
    ),
  ).join('\n');
}
