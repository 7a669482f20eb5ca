import { fontFaceCss } from './web-fonts';

// Declared once, when the app's code first runs: the rules name the WOFF2 parts the build writes into public/fonts.
if (typeof document !== 'undefined' && !document.getElementById('fw-fonts')) {
  const style = document.createElement('style');
  style.id = 'fw-fonts';
  style.textContent = fontFaceCss();
  document.head.appendChild(style);
}

/**
 * On the web the typeface comes from @font-face rules with `font-display: swap` (lib/web-fonts.ts): the first screen
 * draws at once in the fallback face, and nothing waits for the font files.
 */
export function useAppFonts(): boolean {
  return true;
}
