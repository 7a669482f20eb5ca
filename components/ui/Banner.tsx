import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';

import { fonts, radius, space } from '@/lib/theme';

import { type Tone, toneColors } from './Badge';
import { Text } from './Text';

interface Props {
  tone?: Tone;
  title?: string;
  children?: ReactNode;
}

/** A message across the content: cautions, failures, confirmations. Cautions and dangers are announced. */
export function Banner({ tone = 'info', title, children }: Props) {
  const { bg, fg } = toneColors[tone];
  const urgent = tone === 'danger' || tone === 'caution';
  return (
    <View role={urgent ? 'alert' : 'status'} style={[styles.banner, { backgroundColor: bg, borderLeftColor: fg }]}>
      {title ? <Text style={[styles.title, { color: fg }]}>{title}</Text> : null}
      {typeof children === 'string' ? <Text>{children}</Text> : children}
    </View>
  );
}

const styles = StyleSheet.create({
  banner: { borderLeftWidth: 5, borderRadius: radius.sm, padding: space.md, gap: space.xs, alignSelf: 'stretch' },
  title: { fontFamily: fonts.bold },
});
