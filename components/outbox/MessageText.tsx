import { Link } from 'expo-router';
import { Platform, StyleSheet } from 'react-native';

import { Text } from '@/components/ui';
import { env } from '@/lib/env';
import { colors, fonts } from '@/lib/theme';

const URL_PATTERN = /(https?:\/\/[^\s]+)/g;

function appOrigins(): string[] {
  const origins: string[] = [];
  if (Platform.OS === 'web' && typeof window !== 'undefined') origins.push(window.location.origin);
  if (env.apiUrl) origins.push(new URL(env.apiUrl).origin);
  return origins;
}

/** An e-mail's plain text with its links made followable; links into this app open inside it. */
export function MessageText({ text }: { text: string }) {
  const origins = appOrigins();
  const parts = text.split(URL_PATTERN);
  return (
    <Text style={styles.text} selectable>
      {parts.map((part, index) => {
        if (index % 2 === 0) return part;
        let url: URL;
        try {
          url = new URL(part);
        } catch {
          return part;
        }
        const internal = origins.includes(url.origin) || url.hostname === 'localhost';
        return (
          <Link key={index} href={(internal ? `${url.pathname}${url.search}` : part) as never} style={styles.link}>
            {part}
          </Link>
        );
      })}
    </Text>
  );
}

const styles = StyleSheet.create({
  text: { whiteSpace: 'pre-wrap' } as never,
  link: {
    color: colors.primary,
    fontFamily: fonts.semibold,
    textDecorationLine: 'underline',
    wordBreak: 'break-all',
  } as never,
});
