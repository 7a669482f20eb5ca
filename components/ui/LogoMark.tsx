import { SvgXml } from 'react-native-svg';

import { colors } from '@/lib/theme';

import { logoSvg } from './logo-svg';

/** The mark on native: the drawing of logo-svg.ts through react-native-svg. */
export function LogoMark({ size = 36, inverse = false }: { size?: number; inverse?: boolean }) {
  const xml = logoSvg({
    body: inverse ? colors.railText : colors.primary,
    hole: inverse ? colors.rail : colors.background,
    brand: colors.brand,
  });
  return (
    <SvgXml
      xml={xml}
      width={size}
      height={size}
      accessibilityElementsHidden
      importantForAccessibility="no-hide-descendants"
    />
  );
}
