import { useFormikContext } from 'formik';
import { StyleSheet, View } from 'react-native';

import { Button, Card, FormNumberField, Segmented, Select, Text } from '@/components/ui';
import type { BottleFormat } from '@/lib/api/bottle-formats';
import { SUGAR_OPTIONS, SUGARS } from '@/lib/chemistry/sugars';
import type { QuickCheckValues } from '@/lib/quick-check';
import { colors, space } from '@/lib/theme';
import { convertUnit, displayUnits, formatPressure, unitLabels, type UnitSystem } from '@/lib/units';

/** The inputs of the Quick check: the bottle, the sugar, the CO2 already in the base, the temperatures. */
export function QuickCheckInputs({ formats, units }: { formats: BottleFormat[]; units: UnitSystem }) {
  const { values, setFieldValue, setValues } = useFormikContext<QuickCheckValues>();
  const u = displayUnits[units];
  const volumeUnit = unitLabels[u.smallVolume];
  const tempUnit = unitLabels[u.temperature];
  const chosen = formats.find((f) => String(f.id) === values.bottleFormatId);
  const toDisplay = (ml: number) =>
    String(Number(convertUnit(ml, 'ml', u.smallVolume).toFixed(units === 'us' ? 2 : 0)));

  const chooseFormat = (id: string) => {
    const format = formats.find((f) => String(f.id) === id);
    if (!format) return setFieldValue('bottleFormatId', '');
    return setValues({
      ...values,
      bottleFormatId: id,
      liquid: toDisplay(format.liquidMl),
      headspace: toDisplay(format.headspaceMl),
    });
  };

  return (
    <View style={styles.column}>
      <Card title="Bottle">
        <Select
          compact
          label="Bottle format"
          value={values.bottleFormatId}
          onChange={chooseFormat}
          options={[
            ...formats.map((f) => ({ value: String(f.id), label: f.name })),
            { value: '', label: 'Other bottle' },
          ]}
        />
        {chosen ? (
          <Text variant="small">
            Rated to {formatPressure(chosen.maxWorkingPressureBar, units)}. {chosen.pressureSource}.
          </Text>
        ) : null}
        <View style={styles.row}>
          <View style={styles.cell}>
            <FormNumberField name="liquid" label="Liquid per bottle" unit={volumeUnit} />
          </View>
          <View style={styles.cell}>
            <FormNumberField name="headspace" label="Headspace" unit={volumeUnit} hint="Gas space under the cap." />
          </View>
        </View>
        {chosen ? null : (
          <FormNumberField
            name="maxPressure"
            label="Maximum working pressure"
            unit={unitLabels[u.pressure]}
            hint="From the bottle supplier's sheet. Leave empty if you do not know it."
          />
        )}
      </Card>

      <Card title="Sugar in each bottle">
        {values.sugars.map((sugar, index) => (
          <View key={index} style={styles.sugar}>
            <Select
              compact
              label={`Sugar ${index + 1}`}
              value={sugar.type}
              options={SUGAR_OPTIONS}
              onChange={(type) => setFieldValue(`sugars.${index}.type`, type)}
            />
            <View style={styles.row}>
              <View style={styles.cell}>
                <FormNumberField
                  name={`sugars.${index}.grams`}
                  label={`Grams of ${SUGARS[sugar.type].label.toLowerCase()}`}
                  unit="g"
                />
              </View>
              {values.sugars.length > 1 ? (
                <Button
                  label="Remove"
                  accessibleName={`Remove sugar ${index + 1}`}
                  variant="quiet"
                  onPress={() =>
                    setFieldValue(
                      'sugars',
                      values.sugars.filter((_, i) => i !== index),
                    )
                  }
                  style={styles.remove}
                />
              ) : null}
            </View>
          </View>
        ))}
        {values.sugars.length < 6 ? (
          <Button
            label="Add another sugar"
            variant="secondary"
            onPress={() => setFieldValue('sugars', [...values.sugars, { type: 'sucrose', grams: '' }])}
            style={styles.left}
          />
        ) : null}
      </Card>

      <Card title="The base when it is sealed">
        <Segmented
          label="CO2 already in the base"
          value={values.residualMode}
          onChange={(mode) => setFieldValue('residualMode', mode)}
          options={[
            { value: 'last-open', label: 'From temperature' },
            { value: 'volumes', label: 'Known volumes' },
          ]}
        />
        {values.residualMode === 'volumes' ? (
          <FormNumberField name="residualVolumes" label="Residual CO2" unit="volumes" />
        ) : (
          <FormNumberField
            name="lastOpenTemp"
            label="Temperature when it was last open"
            unit={tempUnit}
            hint="Estimated as saturated with CO2 at that temperature."
          />
        )}
        <View style={styles.row}>
          <View style={styles.cell}>
            <FormNumberField name="sealedTemp" label="Temperature when capped" unit={tempUnit} />
          </View>
          <View style={styles.cell}>
            <FormNumberField name="baseAbv" label="Alcohol already in the base" unit="% ABV" />
          </View>
        </View>
      </Card>

      <Card title="Temperatures the bottles will see">
        <View style={styles.row}>
          <View style={styles.cell}>
            <FormNumberField name="conditioningTemp" label="Conditioning room" unit={tempUnit} />
          </View>
          <View style={styles.cell}>
            <FormNumberField name="coldTemp" label="Cold store" unit={tempUnit} />
          </View>
          <View style={styles.cell}>
            <FormNumberField
              name="highestTemp"
              label="Highest it may meet"
              unit={tempUnit}
              hint="A hot van or shelf."
            />
          </View>
        </View>
        <Segmented
          label="Show results for"
          value={values.yield}
          onChange={(value) => setFieldValue('yield', value)}
          options={[
            { value: 'worst', label: 'Worst case' },
            { value: 'expected', label: 'Expected' },
          ]}
        />
      </Card>
    </View>
  );
}

const styles = StyleSheet.create({
  column: { gap: space.lg },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md, alignItems: 'flex-start' },
  cell: { flexGrow: 1, flexBasis: 150 },
  sugar: { gap: space.sm, paddingBottom: space.sm, borderBottomWidth: 1, borderBottomColor: colors.divider },
  remove: { marginTop: 26 },
  left: { alignSelf: 'flex-start' },
});
