import { type Href, Link } from 'expo-router';
import { StyleSheet } from 'react-native';

import { colors, fonts, fontSize } from '@/lib/theme';

/** An inline link to a page of the app; a real anchor on the web. */
export function TextLink({ href, children }: { href: Href; children: string }) {
  return (
    <Link href={href} style={styles.link}>
      {children}
    </Link>
  );
}

const styles = StyleSheet.create({
  link: {
    color: colors.primary,
    fontFamily: fonts.semibold,
    fontSize: fontSize.md,
    lineHeight: 24,
    textDecorationLine: 'underline',
  },
});
