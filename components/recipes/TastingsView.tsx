import { Formik, useFormikContext } from 'formik';
import { StyleSheet, View } from 'react-native';

import {
  Banner,
  Button,
  Card,
  FormField,
  FormNumberField,
  FormStatus,
  Segmented,
  submitTo,
  Text,
} from '@/components/ui';
import { useAddTastingMutation, useRecipeEvaluationQuery, useTastingsQuery } from '@/lib/api/recipes';
import { formatDate } from '@/lib/format';
import { check, parseNumber } from '@/lib/forms';
import { useDebouncedValue } from '@/lib/hooks/use-debounced-value';
import { withSugarAddition } from '@/lib/recipes/tasting';
import { type RecipeContent, tastingSchema } from '@/lib/schemas/recipes';
import { space } from '@/lib/theme';

const SCALES = [
  { key: 'sweetness', label: 'Sweetness', low: 'dry', high: 'sweet' },
  { key: 'sourness', label: 'Sourness', low: 'soft', high: 'sharp' },
  { key: 'fizz', label: 'Fizz', low: 'still', high: 'lively' },
  { key: 'flavour', label: 'Flavour', low: 'faint', high: 'bold' },
] as const;
const SCORE_OPTIONS = ['1', '2', '3', '4', '5'].map((v) => ({ value: v, label: v }));

const today = () => new Date().toISOString().slice(0, 10);
const initial = {
  tastedOn: today(),
  notes: '',
  sweetness: '3',
  sourness: '3',
  fizz: '3',
  flavour: '3',
  addSugar: 'no' as 'no' | 'yes',
  sugarGrams: '',
  sugarToMl: '',
};
type Values = typeof initial;

const toInput = (v: Values) => ({
  tastedOn: v.tastedOn,
  notes: v.notes,
  sweetness: Number(v.sweetness),
  sourness: Number(v.sourness),
  fizz: Number(v.fizz),
  flavour: Number(v.flavour),
  sugarAddition:
    v.addSugar === 'yes' ? { type: 'sucrose', grams: parseNumber(v.sugarGrams), toMl: parseNumber(v.sugarToMl) } : null,
});

const RANK = { ok: 0, caution: 1, danger: 2 } as const;

/** Before a sugar addition is saved: what the recipe's numbers would become, when that is a caution or a danger. */
function SugarAdditionCheck({ content }: { content: RecipeContent }) {
  const { values } = useFormikContext<Values>();
  const { value: input } = check(tastingSchema, toInput(values));
  const preview = useDebouncedValue(
    values.addSugar === 'yes' && input?.sugarAddition ? withSugarAddition(content, input.sugarAddition) : undefined,
    400,
  );
  const evaluation = useRecipeEvaluationQuery(preview);
  if (!preview || !evaluation.data) return null;
  const findings = evaluation.data.carbonation.findings
    .filter((f) => f.level !== 'ok')
    .sort((a, b) => RANK[b.level] - RANK[a.level]);
  if (findings.length === 0)
    return (
      <Banner tone="success">
        With this sugar the recipe stays within its bottle&apos;s rating and the alcohol limit.
      </Banner>
    );
  return (
    <Banner
      tone={findings[0].level as 'caution' | 'danger'}
      title={
        findings[0].level === 'danger'
          ? 'With this sugar the recipe would be a danger'
          : 'With this sugar the recipe would need care'
      }
    >
      {findings.map((f) => (
        <Text key={f.code}>{f.message}</Text>
      ))}
    </Banner>
  );
}

/** The taste-and-adjust log: scores on our 1–5 scales, notes, and sugar added at the tasting. */
export function TastingsView({
  recipeId,
  canEdit,
  content,
  onShowHistory,
}: {
  recipeId: number;
  canEdit: boolean;
  content: RecipeContent;
  onShowHistory: () => void;
}) {
  const tastings = useTastingsQuery(recipeId);
  const add = useAddTastingMutation(recipeId);
  return (
    <View style={styles.wrap}>
      {canEdit ? (
        <Card title="Record a tasting">
          <Formik<Values>
            initialValues={initial}
            validate={(values) => {
              const errors = check(tastingSchema, toInput(values)).errors;
              return Object.fromEntries(
                Object.entries(errors).map(([k, v]) => [
                  k.replace('sugarAddition.grams', 'sugarGrams').replace('sugarAddition.toMl', 'sugarToMl'),
                  v,
                ]),
              );
            }}
            onSubmit={submitTo((values: Values) => add.mutateAsync(check(tastingSchema, toInput(values)).value!), {
              afterSuccess: (h) => h.resetForm(),
            })}
          >
            {({ values, setFieldValue, handleSubmit, isSubmitting }) => (
              <View style={styles.wrap}>
                <FormStatus error={add.error} />
                <FormField name="tastedOn" label="Date" hint="YYYY-MM-DD" />
                {SCALES.map((s) => (
                  <Segmented
                    key={s.key}
                    label={`${s.label} (1 ${s.low} – 5 ${s.high})`}
                    value={values[s.key]}
                    onChange={(v) => setFieldValue(s.key, v)}
                    options={SCORE_OPTIONS}
                  />
                ))}
                <FormField name="notes" label="Notes" multiline />
                <Segmented
                  label="Sugar added at this tasting"
                  value={values.addSugar}
                  onChange={(v) => setFieldValue('addSugar', v)}
                  options={[
                    { value: 'no', label: 'None' },
                    { value: 'yes', label: 'Sucrose added' },
                  ]}
                />
                {values.addSugar === 'yes' ? (
                  <View style={styles.row}>
                    <View style={styles.cell}>
                      <FormNumberField name="sugarGrams" label="Grams of sucrose" unit="g" />
                    </View>
                    <View style={styles.cell}>
                      <FormNumberField name="sugarToMl" label="Into this much liquid" unit="mL" />
                    </View>
                  </View>
                ) : null}
                {values.addSugar === 'yes' ? <SugarAdditionCheck content={content} /> : null}
                <Button label="Save tasting" busy={isSubmitting} onPress={() => handleSubmit()} style={styles.left} />
              </View>
            )}
          </Formik>
        </Card>
      ) : null}
      <Card title="Tastings">
        {tastings.data?.length === 0 ? <Text variant="muted">No tastings yet.</Text> : null}
        {tastings.data?.map((t) => (
          <View key={t.id} style={styles.entry}>
            <Text>
              {formatDate(t.tastedOn)} · {t.by ?? 'someone'} · tasted version {t.versionNumber}
            </Text>
            {t.createdVersion ? (
              <Button
                variant="quiet"
                style={styles.left}
                label={`Its sugar made version ${t.createdVersion}: open History`}
                onPress={onShowHistory}
              />
            ) : null}
            <Text variant="small">
              Sweetness {t.scores.sweetness} · sourness {t.scores.sourness} · fizz {t.scores.fizz} · flavour{' '}
              {t.scores.flavour}
              {t.sugarAddition
                ? ` · +${t.sugarAddition.grams} g ${t.sugarAddition.type} to ${t.sugarAddition.toMl} mL`
                : ''}
            </Text>
            {t.notes ? <Text>{t.notes}</Text> : null}
          </View>
        ))}
      </Card>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.lg },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  cell: { flexGrow: 1, flexBasis: 150 },
  entry: { gap: space.xxs, paddingBottom: space.sm },
  left: { alignSelf: 'flex-start' },
});
