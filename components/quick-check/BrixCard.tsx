import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { Banner, Card, NumberField, Segmented, Text } from '@/components/ui';
import { useBrixQuery } from '@/lib/api/calculations';
import { READING_CAUTION } from '@/lib/chemistry/brix';
import { useDebouncedValue } from '@/lib/hooks/use-debounced-value';
import { type BrixRequest, brixSchema } from '@/lib/schemas/calculations';
import { space } from '@/lib/theme';
import { formatNumber } from '@/lib/units';

type Mode = 'brix' | 'specificGravity';

function toRequest(mode: Mode, text: string): { request?: BrixRequest; error?: string } {
  const value = Number(text.trim().replace(',', '.'));
  if (text.trim() === '') return {};
  try {
    return { request: brixSchema.validateSync({ [mode]: Number.isNaN(value) ? text : value }) };
  } catch (error) {
    return { error: (error as Error).message };
  }
}

/** Converts a refractometer (°Bx) or hydrometer (specific gravity) reading to sugar per litre. */
export function BrixCard() {
  const [mode, setMode] = useState<Mode>('brix');
  const [text, setText] = useState('');
  const { request, error } = toRequest(mode, text);
  const brix = useBrixQuery(useDebouncedValue(request));
  return (
    <Card title="Sugar from a reading">
      <Segmented
        label="Reading"
        value={mode}
        onChange={(m) => {
          setMode(m);
          setText('');
        }}
        options={[
          { value: 'brix', label: 'Brix (°Bx)' },
          { value: 'specificGravity', label: 'Specific gravity' },
        ]}
      />
      <NumberField
        label={mode === 'brix' ? 'Refractometer reading' : 'Hydrometer reading'}
        unit={mode === 'brix' ? '°Bx' : 'SG'}
        value={text}
        onChangeText={setText}
        error={error}
        placeholder={mode === 'brix' ? 'e.g. 6.5' : 'e.g. 1.025'}
      />
      {brix.data && request ? (
        <View style={styles.answer} aria-live="polite">
          <Text>
            {formatNumber(brix.data.brix, 1)} °Bx · SG {formatNumber(brix.data.specificGravity, 4)} · about{' '}
            {formatNumber(brix.data.sugarGPerL, 0)} g/L of sugar
          </Text>
        </View>
      ) : null}
      <Banner tone="info">{READING_CAUTION}</Banner>
    </Card>
  );
}

const styles = StyleSheet.create({ answer: { gap: space.xs } });
