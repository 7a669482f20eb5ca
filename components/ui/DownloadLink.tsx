import { Linking, Platform, StyleSheet } from 'react-native';

import { env } from '@/lib/env';
import { colors, fonts, fontSize, radius, space, touchTarget } from '@/lib/theme';

import { Text } from './Text';

interface Props {
  label: string;
  /** An API path, e.g. `/api/recipes/3/nutrition.pdf`. */
  path: string;
  /** The file name the browser saves it under. */
  fileName: string;
  accessibleName?: string;
}

/**
 * A file to download, looking like a secondary button. On the web a real anchor with `download`, so the browser saves
 * the file (the session cookie goes along, the server checks who asks); elsewhere the system opens the address.
 */
export function DownloadLink({ label, path, fileName, accessibleName }: Props) {
  const href = `${env.apiUrl}${path}`;
  return Platform.OS === 'web' ? (
    <Text href={href} hrefAttrs={{ download: fileName }} aria-label={accessibleName ?? label} style={styles.link}>
      {label}
    </Text>
  ) : (
    <Text role="link" aria-label={accessibleName ?? label} onPress={() => Linking.openURL(href)} style={styles.link}>
      {label}
    </Text>
  );
}

const styles = StyleSheet.create({
  link: {
    minHeight: touchTarget,
    paddingHorizontal: space.lg,
    paddingVertical: space.sm,
    borderRadius: radius.md,
    borderWidth: 2,
    borderColor: colors.primary,
    backgroundColor: colors.surface,
    color: colors.primary,
    fontFamily: fonts.semibold,
    fontSize: fontSize.md,
    lineHeight: 24,
    textAlign: 'center',
    textDecorationLine: 'none',
  },
});
