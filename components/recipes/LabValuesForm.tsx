import { Formik } from 'formik';
import { StyleSheet, View } from 'react-native';

import { Button, FormField, FormNumberField, FormStatus, submitTo, Text } from '@/components/ui';
import { ApiError } from '@/lib/api/client';
import { check, parseNumber } from '@/lib/forms';
import { LABEL_NUTRIENTS, type LabelNutrient, NUTRIENT_NAMES, NUTRIENT_UNITS } from '@/lib/nutrition/label-rules';
import type { LabValues } from '@/lib/nutrition/panel';
import { type LabValuesInput, labValuesSchema } from '@/lib/schemas/nutrition';
import { space } from '@/lib/theme';

interface Props {
  version: number;
  /** The values in force, to start from. */
  current: LabValues | null;
  reference: string;
  onSubmit: (input: LabValuesInput) => Promise<unknown>;
  error: unknown;
}

type Values = Record<LabelNutrient, string> & { reference: string };

const toInput = (version: number, v: Values) => ({
  version,
  per100Ml: Object.fromEntries(LABEL_NUTRIENTS.map((n) => [n, parseNumber(v[n]) ?? null])),
  reference: v.reference,
});

/** The schema's messages land on the form's own fields ("per100Ml.sodium" is the field "sodium"). */
const fieldErrors = (errors: Record<string, string>) =>
  Object.fromEntries(Object.entries(errors).map(([path, message]) => [path.replace(/^per100Ml\./, ''), message]));

/**
 * An owner types the lab's values per 100 mL of the finished drink, as the report gives them. Any may stay empty
 * (the estimate stays for it); all empty clears the lab values. Each save is kept on record.
 */
export function LabValuesForm({ version, current, reference, onSubmit, error }: Props) {
  const initialValues = {
    ...Object.fromEntries(LABEL_NUTRIENTS.map((n) => [n, current?.[n] === undefined ? '' : String(current[n])])),
    reference,
  } as Values;
  return (
    <Formik<Values>
      initialValues={initialValues}
      enableReinitialize
      validate={(values) => fieldErrors(check(labValuesSchema, toInput(version, values)).errors)}
      onSubmit={submitTo<Values>(async (values) => {
        try {
          return await onSubmit(check(labValuesSchema, toInput(version, values)).value!);
        } catch (e) {
          throw e instanceof ApiError ? new ApiError(e.status, e.code, e.message, fieldErrors(e.fields)) : e;
        }
      })}
    >
      {({ handleSubmit, isSubmitting, dirty }) => (
        <View style={styles.form}>
          <FormStatus error={error} />
          <Text variant="small">Per 100 mL of the finished drink, from the lab’s report for version {version}.</Text>
          <View style={styles.grid}>
            {LABEL_NUTRIENTS.map((n) => (
              <View key={n} style={styles.cell}>
                <FormNumberField name={n} label={NUTRIENT_NAMES[n]} unit={NUTRIENT_UNITS[n]} />
              </View>
            ))}
          </View>
          <FormField name="reference" label="Lab and report" hint="e.g. the lab's name and report number" />
          <Button
            label="Save lab values"
            busy={isSubmitting}
            disabled={!dirty}
            onPress={() => handleSubmit()}
            style={styles.submit}
          />
        </View>
      )}
    </Formik>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.md },
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  cell: { flexGrow: 1, flexBasis: 200 },
  submit: { alignSelf: 'flex-start' },
});
