import { Formik } from 'formik';
import { StyleSheet, View } from 'react-native';

import { Banner, Button, Card, FormField, FormStatus, Segmented, submitTo, Text } from '@/components/ui';
import { type BatchDetail, useAddDeviationMutation, useAddLotMutation, useDecideMutation } from '@/lib/api/batches';
import { formatDate } from '@/lib/format';
import { check } from '@/lib/forms';
import { type Decision, decisionSchema, deviationSchema, ingredientLotSchema } from '@/lib/schemas/batches';
import { space } from '@/lib/theme';

/** A supplier's lot used in the batch, with the quantity as written on the sack or the invoice. */
export function IngredientLotForm({ batchId }: { batchId: number }) {
  const add = useAddLotMutation(batchId);
  type Values = { ingredientName: string; supplier: string; supplierLot: string; quantity: string };
  const toInput = (v: Values) => ({ ...v, ingredientId: null });
  return (
    <Card title="Ingredient lots used">
      <Formik<Values>
        initialValues={{ ingredientName: '', supplier: '', supplierLot: '', quantity: '' }}
        validate={(v) => check(ingredientLotSchema, toInput(v)).errors}
        onSubmit={submitTo((v: Values) => add.mutateAsync(check(ingredientLotSchema, toInput(v)).value!), {
          afterSuccess: (helpers) => helpers.resetForm(),
        })}
      >
        {({ handleSubmit, isSubmitting }) => (
          <View style={styles.form}>
            <FormStatus error={add.error} />
            <View style={styles.row}>
              <View style={styles.cell}>
                <FormField name="ingredientName" label="Ingredient" />
              </View>
              <View style={styles.cell}>
                <FormField name="quantity" label="Quantity" hint='As written: "2 kg", "5 lb", "3 gal".' />
              </View>
            </View>
            <View style={styles.row}>
              <View style={styles.cell}>
                <FormField name="supplier" label="Supplier" />
              </View>
              <View style={styles.cell}>
                <FormField name="supplierLot" label="Supplier's lot" autoCapitalize="characters" />
              </View>
            </View>
            <Button
              label="Add lot"
              variant="secondary"
              busy={isSubmitting}
              onPress={() => handleSubmit()}
              style={styles.left}
            />
          </View>
        )}
      </Formik>
    </Card>
  );
}

/** What went other than planned and what was done; it may close a danger reading. */
export function DeviationForm({ batch }: { batch: BatchDetail }) {
  const add = useAddDeviationMutation(batch.id);
  type Values = { whatHappened: string; actionTaken: string; closesReadingId: string };
  const toInput = (v: Values) => ({
    whatHappened: v.whatHappened,
    actionTaken: v.actionTaken,
    closesReadingId: v.closesReadingId ? Number(v.closesReadingId) : null,
  });
  const standing = batch.readings.filter((r) => batch.standingDangers.includes(r.id));
  return (
    <Card title="Record a deviation">
      <Formik<Values>
        initialValues={{ whatHappened: '', actionTaken: '', closesReadingId: '' }}
        validate={(v) => check(deviationSchema, toInput(v)).errors}
        onSubmit={submitTo((v: Values) => add.mutateAsync(check(deviationSchema, toInput(v)).value!), {
          afterSuccess: (helpers) => helpers.resetForm(),
        })}
      >
        {({ values, setFieldValue, handleSubmit, isSubmitting }) => (
          <View style={styles.form}>
            <FormStatus error={add.error} />
            <FormField name="whatHappened" label="What happened" multiline />
            <FormField name="actionTaken" label="What was done" multiline />
            {standing.length > 0 ? (
              <Segmented
                label="It answers the danger reading"
                value={values.closesReadingId}
                onChange={(v) => setFieldValue('closesReadingId', v)}
                options={[
                  { value: '', label: 'None' },
                  ...standing.map((r) => ({ value: String(r.id), label: `#${r.id} ${r.kind} ${r.value}` })),
                ]}
              />
            ) : null}
            <Button
              label="Record deviation"
              variant="secondary"
              busy={isSubmitting}
              onPress={() => handleSubmit()}
              style={styles.left}
            />
          </View>
        )}
      </Formik>
    </Card>
  );
}

/** The owner's decision: released, held or discarded, with a note; over a standing danger only with a reason. */
export function DecisionForm({ batch }: { batch: BatchDetail }) {
  const decide = useDecideMutation(batch.id);
  type Values = { decision: Decision; note: string; overrideReason: string };
  const toInput = (v: Values) => ({
    decision: v.decision,
    note: v.note,
    overrideReason: v.overrideReason.trim() || null,
  });
  const standing = batch.standingDangers.length;
  return (
    <Card title="Your decision">
      {batch.card.approval ? (
        <Text variant="small">
          Recipe version {batch.version} approved by {batch.card.approval.by ?? 'an owner'} on{' '}
          {formatDate(batch.card.approval.at)}
          {batch.card.approval.overrideReason ? `, over a danger finding: ${batch.card.approval.overrideReason}` : ''}.
        </Text>
      ) : (
        <Text variant="small">
          Trial of a version not approved for production: it can be held or discarded, never released.
        </Text>
      )}
      {standing > 0 ? (
        <Banner tone="danger" title={standing === 1 ? 'A danger reading stands' : `${standing} danger readings stand`}>
          Release needs a later ok reading, a deviation that answers it, or your written reason below.
        </Banner>
      ) : null}
      <Formik<Values>
        initialValues={{ decision: batch.trial ? 'discarded' : 'released', note: '', overrideReason: '' }}
        validate={(v) => check(decisionSchema, toInput(v)).errors}
        onSubmit={submitTo((v: Values) => decide.mutateAsync(check(decisionSchema, toInput(v)).value!))}
      >
        {({ values, setFieldValue, handleSubmit, isSubmitting }) => (
          <View style={styles.form}>
            <FormStatus error={decide.error} />
            <Segmented
              label="Decision"
              value={values.decision}
              onChange={(d) => setFieldValue('decision', d)}
              options={[
                ...(batch.trial ? [] : [{ value: 'released' as const, label: 'Release' }]),
                { value: 'held' as const, label: 'Hold' },
                { value: 'discarded' as const, label: 'Discard' },
              ]}
            />
            <FormField name="note" label="Note" multiline />
            {values.decision === 'released' && standing > 0 ? (
              <FormField name="overrideReason" label="Why you release despite the danger reading" multiline />
            ) : null}
            <Button
              label={
                values.decision === 'released'
                  ? 'Release the batch'
                  : values.decision === 'held'
                    ? 'Hold the batch'
                    : 'Discard the batch'
              }
              variant={values.decision === 'discarded' ? 'danger' : 'primary'}
              busy={isSubmitting}
              onPress={() => handleSubmit()}
              style={styles.left}
            />
          </View>
        )}
      </Formik>
    </Card>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  cell: { flexGrow: 1, flexBasis: 180 },
  left: { alignSelf: 'flex-start' },
});
