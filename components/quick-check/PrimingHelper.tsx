import { useFormikContext } from 'formik';
import { StyleSheet, View } from 'react-native';

import { usePrimingQuery } from '@/lib/api/calculations';
import { SUGARS } from '@/lib/chemistry/sugars';
import { useDebouncedValue } from '@/lib/hooks/use-debounced-value';
import { toPrimingRequest, type QuickCheckValues } from '@/lib/quick-check';
import { space } from '@/lib/theme';
import { formatNumber, formatPressure, formatTemp, type UnitSystem } from '@/lib/units';

import { FindingList } from '../calculations/FindingList';
import { Banner, Button, Card, FormField, Select, Text } from '../ui';
import { sugarOptions } from './QuickCheckInputs';

/** "How much sugar for this fizz?": fills the sugar that reaches the target and shows the alcohol that follows. */
export function PrimingHelper({ units }: { units: UnitSystem }) {
  const { values, setFieldValue } = useFormikContext<QuickCheckValues>();
  const { request, errors } = toPrimingRequest(values, units);
  const settled = useDebouncedValue(request);
  const priming = usePrimingQuery(settled);
  const answer = priming.data;
  const sugarName = SUGARS[values.primingSugar].label.toLowerCase();
  return (
    <Card title="Sugar for a target fizz">
      <View style={styles.row}>
        <View style={styles.cell}>
          <FormField name="targetVolumes" label="Target carbonation" suffix="volumes" inputMode="decimal" hint="Often 2.5 to 3 for kombucha." />
        </View>
      </View>
      <Select compact label="Sugar to use" value={values.primingSugar} options={sugarOptions.filter((o) => o.value !== 'lactose')} onChange={(type) => setFieldValue('primingSugar', type)} />
      {errors.targetVolumes ? null : priming.isError ? <Banner tone="danger">{priming.error.message}</Banner> : null}
      {answer && request ? (
        <View style={styles.answer} aria-live="polite">
          <Text variant="subheading">
            {formatNumber(answer.sugarG, 2)} g of {sugarName} per bottle
          </Text>
          <Text variant="muted">
            {formatNumber(answer.sugarGPerL, 1)} g/L. It also makes +{formatNumber(answer.addedAbvPercent, 2)} % ABV ({formatNumber(answer.totalAbvPercent, 2)} % in all): in a
            sealed bottle the sugar that makes the fizz makes alcohol too.
          </Text>
          {answer.maxSafeSugarG !== null ? (
            <Text variant="muted">
              The most this bottle takes at {formatTemp(request.highestTempC, units)} in the worst case: {formatNumber(answer.maxSafeSugarG, 2)} g (
              {formatPressure(answer.worstGaugeBarAtHighest, units)} with the amount above).
            </Text>
          ) : null}
          <FindingList findings={answer.findings} />
          <Button
            label="Use this amount"
            variant="secondary"
            style={styles.left}
            onPress={() => setFieldValue('sugars', [{ type: values.primingSugar, grams: String(Number(answer.sugarG.toFixed(2))) }])}
          />
        </View>
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  cell: { flexGrow: 1, flexBasis: 150 },
  answer: { gap: space.sm },
  left: { alignSelf: 'flex-start' },
});
