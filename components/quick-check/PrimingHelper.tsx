import { useFormikContext } from 'formik';
import { StyleSheet, View } from 'react-native';

import { Banner, Button, Card, FormNumberField, Select, Text } from '@/components/ui';
import { FindingList } from '@/components/ui/calculations/FindingList';
import { usePrimingQuery } from '@/lib/api/calculations';
import { SUGAR_OPTIONS, SUGARS } from '@/lib/chemistry/sugars';
import { useDebouncedValue } from '@/lib/hooks/use-debounced-value';
import { type QuickCheckValues, toPrimingRequest } from '@/lib/quick-check';
import { space } from '@/lib/theme';
import { formatNumber, formatPressure, formatTemp, type UnitSystem } from '@/lib/units';

import { SugarBands } from './SugarBands';

/**
 * Asks in the recipe's terms ("How much sugar for 2.5 volumes in this bottle?"), answers in grams for the bottle,
 * and shows where that sits between the bottle's safe, caution and danger bands and the alcohol limit.
 */
export function PrimingHelper({ units, limitPercent }: { units: UnitSystem; limitPercent: number }) {
  const { values, setFieldValue } = useFormikContext<QuickCheckValues>();
  const { request, errors } = toPrimingRequest(values, units);
  const settled = useDebouncedValue(request);
  const priming = usePrimingQuery(settled);
  const answer = priming.data;
  const sugarName = SUGARS[values.primingSugar].label.toLowerCase();
  return (
    <Card title={`How much sugar for ${values.targetVolumes || '…'} volumes in this bottle?`}>
      <View style={styles.row}>
        <View style={styles.cell}>
          <FormNumberField
            name="targetVolumes"
            label="Fizz you want"
            unit="volumes of CO2"
            hint="Kombucha often has 2.5 to 3 volumes: more fizz needs a bottle rated for it."
          />
        </View>
        <View style={styles.cell}>
          <Select
            label="Sweetened with"
            value={values.primingSugar}
            options={SUGAR_OPTIONS.filter((o) => o.value !== 'lactose')}
            onChange={(type) => setFieldValue('primingSugar', type)}
          />
        </View>
      </View>
      {errors.targetVolumes ? null : priming.isError ? <Banner tone="danger">{priming.error.message}</Banner> : null}
      {answer && request ? (
        <View style={styles.answer} aria-live="polite">
          <Text variant="subheading">
            {answer.targetReachable
              ? `${formatNumber(answer.sugarG, 2)} g of ${sugarName} per bottle`
              : `At most ${formatNumber(answer.safeSugarG, 2)} g of ${sugarName} per bottle: the target is out of reach`}
          </Text>
          <Text variant="muted">
            {answer.targetReachable
              ? `${formatNumber(answer.sugarGPerL, 1)} g/L. It also makes`
              : `The target would take ${formatNumber(answer.sugarG, 2)} g (${formatNumber(answer.sugarGPerL, 1)} g/L) and make`}{' '}
            +{formatNumber(answer.addedAbvPercent, 2)} % ABV ({formatNumber(answer.totalAbvPercent, 2)} % in all): in a
            sealed bottle the sugar that makes the fizz makes alcohol too.
          </Text>
          {answer.maxSafeSugarG !== null ? (
            <Text variant="muted">
              The most that is safe at {formatTemp(answer.checkedTempC, units)} in the worst case (
              {formatNumber(answer.ratingShare * 100, 0)} % of the rating, below the alcohol limit):{' '}
              {formatNumber(answer.maxSafeSugarG, 2)} g ({formatPressure(answer.worstGaugeBarAtHighest, units)} with the
              amount above).
            </Text>
          ) : null}
          <SugarBands
            bands={answer.bands}
            targetG={answer.sugarG}
            safeG={answer.safeSugarG}
            limitPercent={limitPercent}
            sugarName={sugarName}
          />
          <FindingList findings={answer.findings} />
          <Button
            label={answer.targetReachable ? 'Use this amount' : 'Use the most that is safe'}
            variant="secondary"
            style={styles.left}
            // Never more than the most that is safe, and rounded down so rounding cannot cross it.
            onPress={() =>
              setFieldValue('sugars', [
                { type: values.primingSugar, grams: String(Math.floor(answer.safeSugarG * 100) / 100) },
              ])
            }
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
