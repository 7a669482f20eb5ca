import { Formik } from 'formik';
import { StyleSheet, View } from 'react-native';

import { Button, FormField, FormNumberField, FormStatus, Select, submitTo } from '@/components/ui';
import type { BottleFormat } from '@/lib/api/bottle-formats';
import { check, parseNumber } from '@/lib/forms';
import {
  type BottleFormatInput,
  bottleFormatSchema,
  type Closure,
  CLOSURE_LABELS,
  CLOSURES,
  type Material,
  MATERIAL_LABELS,
  MATERIALS,
} from '@/lib/schemas/bottle-formats';
import { space } from '@/lib/theme';

interface Values {
  name: string;
  liquidMl: string;
  headspaceMl: string;
  closure: Closure;
  material: Material;
  maxWorkingPressureBar: string;
  pressureSource: string;
  notes: string;
}

const toValues = (f?: BottleFormat): Values => ({
  name: f?.name ?? '',
  liquidMl: f ? String(f.liquidMl) : '',
  headspaceMl: f ? String(f.headspaceMl) : '',
  closure: f?.closure ?? 'crown-cap',
  material: f?.material ?? 'glass',
  maxWorkingPressureBar: f ? String(f.maxWorkingPressureBar) : '',
  pressureSource: f?.pressureSource ?? '',
  notes: f?.notes ?? '',
});

const toInput = (v: Values) => ({
  ...v,
  liquidMl: parseNumber(v.liquidMl),
  headspaceMl: parseNumber(v.headspaceMl),
  maxWorkingPressureBar: parseNumber(v.maxWorkingPressureBar),
  notes: v.notes.trim() === '' ? null : v.notes,
});

interface Props {
  format?: BottleFormat;
  onSubmit: (input: BottleFormatInput) => Promise<unknown>;
  onCancel: () => void;
  error: unknown;
}

/** Adds or edits a bottle format; the pressure must say where it comes from. */
export function BottleFormatForm({ format, onSubmit, onCancel, error }: Props) {
  return (
    <Formik<Values>
      initialValues={toValues(format)}
      validate={(values) => check(bottleFormatSchema, toInput(values)).errors}
      onSubmit={submitTo((values: Values) => onSubmit(check(bottleFormatSchema, toInput(values)).value!), {
        afterSuccess: () => onCancel(),
      })}
    >
      {({ handleSubmit, isSubmitting, values, setFieldValue }) => (
        <View style={styles.form}>
          <FormStatus error={error} />
          <FormField name="name" label="Name" />
          <View style={styles.row}>
            <View style={styles.cell}>
              <FormNumberField name="liquidMl" label="Liquid" unit="mL" />
            </View>
            <View style={styles.cell}>
              <FormNumberField name="headspaceMl" label="Headspace" unit="mL" />
            </View>
            <View style={styles.cell}>
              <FormNumberField name="maxWorkingPressureBar" label="Maximum working pressure" unit="bar" />
            </View>
          </View>
          <Select
            compact
            label="Closure"
            value={values.closure}
            options={CLOSURES.map((c) => ({ value: c, label: CLOSURE_LABELS[c] }))}
            onChange={(c) => setFieldValue('closure', c)}
          />
          <Select
            compact
            label="Material"
            value={values.material}
            options={MATERIALS.map((m) => ({ value: m, label: MATERIAL_LABELS[m] }))}
            onChange={(m) => setFieldValue('material', m)}
          />
          <FormField
            name="pressureSource"
            label="Where the pressure figure comes from"
            hint="The supplier and their sheet, e.g. “Supplier spec sheet, March 2026”."
          />
          <FormField name="notes" label="Notes" multiline />
          <View style={styles.row}>
            <Button label={format ? 'Save format' : 'Add format'} busy={isSubmitting} onPress={() => handleSubmit()} />
            <Button label="Cancel" variant="quiet" onPress={onCancel} />
          </View>
        </View>
      )}
    </Formik>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md, alignItems: 'flex-start' },
  cell: { flexGrow: 1, flexBasis: 150 },
});
