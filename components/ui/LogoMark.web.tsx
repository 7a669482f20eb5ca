import { Image } from 'react-native';

import { colors } from '@/lib/theme';

import { logoSvg } from './logo-svg';

/**
 * The mark on the web: the drawing of logo-svg.ts as an image, so the sign-in screen needs no SVG library (the
 * browser draws SVG itself).
 */
export function LogoMark({ size = 36, inverse = false }: { size?: number; inverse?: boolean }) {
  const xml = logoSvg({
    body: inverse ? colors.railText : colors.primary,
    hole: inverse ? colors.rail : colors.background,
    brand: colors.brand,
  });
  return (
    <Image
      // React Native Web escapes the markup of an `svg+xml;utf8` data address itself: give it as it is.
      source={{ uri: `data:image/svg+xml;utf8,${xml}` }}
      style={{ width: size, height: size }}
      aria-hidden
    />
  );
}
