import * as DocumentPicker from 'expo-document-picker';
import { Formik } from 'formik';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import {
  Banner,
  Button,
  Card,
  FormField,
  FormNumberField,
  FormStatus,
  Segmented,
  Select,
  submitTo,
} from '@/components/ui';
import { LEVEL_LABEL, LEVEL_TONE } from '@/components/ui/review-tone';
import { type BatchReadingEntry, useAddReadingMutation, useLabReportMutation } from '@/lib/api/batches';
import { check, parseNumber } from '@/lib/forms';
import {
  READING_KIND_LABELS,
  READING_KINDS,
  READING_UNITS,
  type ReadingKind,
  readingSchema,
  type Stage,
  STAGE_LABELS,
  STAGES,
} from '@/lib/schemas/batches';
import { space } from '@/lib/theme';

type Values = {
  kind: ReadingKind;
  value: string;
  tempC: string;
  stage: Stage;
  source: 'in-house' | 'lab';
  note: string;
  correctsId: string;
};

const toInput = (v: Values) => ({
  kind: v.kind,
  value: parseNumber(v.value),
  tempC: v.tempC.trim() === '' ? null : parseNumber(v.tempC),
  stage: v.stage,
  source: v.kind === 'abv' ? v.source : null,
  note: v.note,
  correctsId: v.correctsId ? Number(v.correctsId) : null,
});

/**
 * The "Record a reading" sheet of the floor screen: what was measured, the value on a numeric keypad, the stage
 * (pre-chosen from the next step), and the check at once in plain words. An ABV from a lab takes its report.
 */
export function ReadingForm({
  batchId,
  stage,
  readings,
}: {
  batchId: number;
  stage: Stage;
  readings: BatchReadingEntry[];
}) {
  const add = useAddReadingMutation(batchId);
  const report = useLabReportMutation(batchId);
  const [last, setLast] = useState<BatchReadingEntry | null>(null);
  const attach = async (readingId: number) => {
    const result = await DocumentPicker.getDocumentAsync({
      type: ['application/pdf', 'image/png', 'image/jpeg'],
      multiple: false,
      copyToCacheDirectory: false,
    });
    const asset = result.canceled ? null : result.assets[0];
    if (!asset) return;
    const file = asset.file ?? (await (await fetch(asset.uri)).blob());
    report.mutate({ readingId, file, name: asset.name });
  };
  return (
    <Card title="Record a reading">
      <Formik<Values>
        initialValues={{ kind: 'ph', value: '', tempC: '', stage, source: 'in-house', note: '', correctsId: '' }}
        enableReinitialize
        validate={(v) => check(readingSchema, toInput(v)).errors}
        onSubmit={submitTo(
          async (v: Values) => {
            const saved = await add.mutateAsync(check(readingSchema, toInput(v)).value!);
            setLast(saved);
          },
          { afterSuccess: (helpers) => helpers.resetForm() },
        )}
      >
        {({ values, setFieldValue, handleSubmit, isSubmitting }) => (
          <View style={styles.form}>
            <FormStatus error={add.error} />
            <Select
              compact
              label="What was measured"
              value={values.kind}
              options={READING_KINDS.map((k) => ({ value: k, label: READING_KIND_LABELS[k] }))}
              onChange={(k) => setFieldValue('kind', k)}
            />
            <View style={styles.row}>
              <View style={styles.cell}>
                <FormNumberField
                  name="value"
                  label={READING_KIND_LABELS[values.kind]}
                  unit={READING_UNITS[values.kind] || undefined}
                />
              </View>
              {values.kind === 'gauge-pressure' || values.kind === 'ph' ? (
                <View style={styles.cell}>
                  <FormNumberField
                    name="tempC"
                    label={
                      values.kind === 'gauge-pressure' ? 'Temperature of the test bottle' : 'Temperature of the sample'
                    }
                    unit="°C"
                  />
                </View>
              ) : null}
            </View>
            {values.kind === 'abv' ? (
              <Segmented
                label="Measured"
                value={values.source}
                onChange={(s) => setFieldValue('source', s)}
                options={[
                  { value: 'in-house', label: 'In house' },
                  { value: 'lab', label: 'By a lab' },
                ]}
              />
            ) : null}
            <Select
              compact
              label="Stage"
              value={values.stage}
              options={STAGES.map((s) => ({ value: s, label: STAGE_LABELS[s] }))}
              onChange={(s) => setFieldValue('stage', s)}
            />
            {readings.some((r) => r.kind === values.kind) ? (
              <Select
                compact
                label="It corrects an earlier reading"
                value={values.correctsId}
                options={[
                  { value: '', label: 'No, a new reading' },
                  ...readings
                    .filter((r) => r.kind === values.kind)
                    .slice(-4)
                    .map((r) => ({
                      value: String(r.id),
                      label: `#${r.id}: ${r.value}${READING_UNITS[r.kind] ? ` ${READING_UNITS[r.kind]}` : ''}`,
                    })),
                ]}
                onChange={(id) => setFieldValue('correctsId', id)}
              />
            ) : null}
            <FormField name="note" label={values.correctsId ? 'Why it is corrected' : 'Note'} />
            <Button label="Record reading" busy={isSubmitting} onPress={() => handleSubmit()} style={styles.left} />
          </View>
        )}
      </Formik>
      {last ? (
        <Banner
          tone={LEVEL_TONE[last.check.level]}
          title={`${READING_KIND_LABELS[last.kind]} recorded: ${LEVEL_LABEL[last.check.level]}`}
        >
          {last.check.message}
        </Banner>
      ) : null}
      {last?.kind === 'abv' && last.source === 'lab' ? (
        <View style={styles.form}>
          <FormStatus error={report.error} />
          {report.isSuccess ? <Banner tone="success">Lab report kept with the reading.</Banner> : null}
          <Button
            label="Attach the lab report"
            variant="secondary"
            busy={report.isPending}
            onPress={() => attach(last.id)}
            style={styles.left}
          />
        </View>
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  cell: { flexGrow: 1, flexBasis: 150 },
  left: { alignSelf: 'flex-start' },
});
