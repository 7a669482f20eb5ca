import { StyleSheet, View } from 'react-native';

import { Banner, Text } from '@/components/ui';
import { SAFETY_CAUTIONS } from '@/lib/chemistry/cautions';
import { colors, space } from '@/lib/theme';

/** The standing cautions, shown wherever pressure numbers are. */
export function Cautions() {
  return (
    <Banner tone="caution" title="Glass under pressure">
      <View style={styles.list}>
        {SAFETY_CAUTIONS.map((caution) => (
          <Text key={caution} variant="small" style={styles.item}>
            • {caution}
          </Text>
        ))}
      </View>
    </Banner>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.xxs },
  item: { color: colors.textOnCaution },
});
