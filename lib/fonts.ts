import { SourceSans3_400Regular } from '@expo-google-fonts/source-sans-3/400Regular';
import { SourceSans3_600SemiBold } from '@expo-google-fonts/source-sans-3/600SemiBold';
import { SourceSans3_700Bold } from '@expo-google-fonts/source-sans-3/700Bold';
import { useFonts } from 'expo-font';

import { fonts } from './theme';

/**
 * Whether the house typeface is ready to draw with. On native the TTF files load first; a font that fails to load
 * is no reason to keep people out, so an error counts as ready (the system face stands in). The web has its own
 * version (fonts.web.ts) that never waits.
 */
export function useAppFonts(): boolean {
  const [loaded, error] = useFonts({
    [fonts.regular]: SourceSans3_400Regular,
    [fonts.semibold]: SourceSans3_600SemiBold,
    [fonts.bold]: SourceSans3_700Bold,
  });
  return loaded || error !== null;
}
