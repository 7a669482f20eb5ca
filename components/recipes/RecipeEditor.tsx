import { Formik, setNestedObjectValues, useFormikContext } from 'formik';
import { useEffect } from 'react';
import { Platform, StyleSheet, useWindowDimensions, View } from 'react-native';

import {
  Badge,
  Banner,
  Button,
  Card,
  FormField,
  FormNumberField,
  Loading,
  Segmented,
  Select,
  Text,
} from '@/components/ui';
import { SummaryStrip } from '@/components/ui/calculations/SummaryStrip';
import type { BottleFormat } from '@/lib/api/bottle-formats';
import { usePrimingQuery } from '@/lib/api/calculations';
import { ApiError } from '@/lib/api/client';
import { type RecipeDetail, useRecipeEvaluationQuery } from '@/lib/api/recipes';
import { SUGAR_OPTIONS, SUGARS } from '@/lib/chemistry/sugars';
import { formatDateTime } from '@/lib/format';
import { useDebouncedValue } from '@/lib/hooks/use-debounced-value';
import { formErrors, type RecipeFormValues, toContent, toFormValues } from '@/lib/recipes/form';
import { processStages } from '@/lib/recipes/stages';
import { targetAdvice } from '@/lib/recipes/target';
import { AMOUNT_UNIT_LABELS, METHOD_LABELS, METHODS } from '@/lib/schemas/recipes';
import { breakpoints, colors, fonts, space } from '@/lib/theme';
import { formatNumber, formatTemp, type UnitSystem } from '@/lib/units';

import { IngredientPicker } from './IngredientPicker';
import { RecipeResults } from './RecipeResults';
import { RecipeSummary } from './RecipeSummary';

interface Props {
  recipe: RecipeDetail;
  formats: BottleFormat[];
  units: UnitSystem;
  limitPercent: number;
  canEdit: boolean;
  onSave: (values: {
    name: string;
    flavourNotes: string;
    content: NonNullable<ReturnType<typeof toContent>['content']>;
    baseVersion: number;
  }) => Promise<unknown>;
  saveError: unknown;
  onReload: () => void;
}

/**
 * Asks before the page is closed or reloaded with unsaved edits (the browser's own prompt; its wording is the
 * browser's). Only on the web, where closing a tab would lose the form.
 */
function useLeaveWarning(active: boolean) {
  useEffect(() => {
    if (Platform.OS !== 'web' || !active || typeof window === 'undefined') return;
    const warn = (event: BeforeUnloadEvent) => {
      event.preventDefault();
      event.returnValue = '';
    };
    window.addEventListener('beforeunload', warn);
    return () => window.removeEventListener('beforeunload', warn);
  }, [active]);
}

/** The designer: the recipe's parts on one side, its numbers for one bottle beside them, updated as it changes. */
export function RecipeEditor({ recipe, formats, units, limitPercent, canEdit, onSave, saveError, onReload }: Props) {
  return (
    <Formik<RecipeFormValues>
      initialValues={toFormValues(recipe.name, recipe.flavourNotes, recipe.content, recipe.ingredientNames)}
      enableReinitialize
      validate={(values) => toContent(values).errors}
      onSubmit={async (values, helpers) => {
        const { content } = toContent(values);
        if (!content) return;
        await onSave({
          name: values.name,
          flavourNotes: values.flavourNotes,
          content,
          baseVersion: recipe.currentVersion,
        }).catch((error: unknown) => {
          // The server's field messages land on their fields, like every other form's; the banner says the rest.
          if (error instanceof ApiError && Object.keys(error.fields).length > 0) {
            const errors = formErrors(error.fields);
            helpers.setErrors(errors as never);
            helpers.setTouched(setNestedObjectValues(errors, true) as never, false);
          }
        });
      }}
    >
      <Layout
        recipe={recipe}
        formats={formats}
        units={units}
        limitPercent={limitPercent}
        canEdit={canEdit}
        saveError={saveError}
        onReload={onReload}
      />
    </Formik>
  );
}

function Layout({ recipe, formats, units, limitPercent, canEdit, saveError, onReload }: Omit<Props, 'onSave'>) {
  const { width } = useWindowDimensions();
  const wide = width >= breakpoints.wide;
  const { values, dirty, isSubmitting, handleSubmit, resetForm } = useFormikContext<RecipeFormValues>();
  const { content } = toContent(values);
  const settled = useDebouncedValue(content, 350);
  const evaluation = useRecipeEvaluationQuery(settled);
  const format = formats.find((f) => String(f.id) === values.bottleFormatId);
  const stale = saveError instanceof ApiError && saveError.code === 'stale_version';
  useLeaveWarning(dirty && canEdit);
  return (
    <View style={styles.column}>
      {stale ? (
        <Banner tone="caution" title="Someone else saved this recipe">
          <Text>{(saveError as ApiError).message}</Text>
          <Button
            label="Load their version (drops your changes)"
            variant="secondary"
            onPress={() => {
              resetForm();
              onReload();
            }}
            style={styles.left}
          />
        </Banner>
      ) : saveError instanceof Error ? (
        <Banner tone="danger">{saveError.message}</Banner>
      ) : null}
      <View style={!wide && styles.stickyTop}>
        {canEdit ? (
          <View style={styles.saveBar}>
            <Badge
              label={`Version ${recipe.currentVersion}${dirty ? ' · unsaved changes' : ''}`}
              tone={dirty ? 'caution' : 'neutral'}
            />
            <Button
              label="Save as new version"
              busy={isSubmitting}
              disabled={!dirty || !content}
              onPress={() => handleSubmit()}
            />
          </View>
        ) : null}
        {!wide && evaluation.data ? <SummaryStrip result={evaluation.data.carbonation} units={units} /> : null}
      </View>
      <View style={[styles.layout, wide && styles.layoutWide]}>
        <View style={[styles.column, wide && styles.inputs]}>
          {canEdit ? (
            <Parts formats={formats} canEdit={canEdit} />
          ) : (
            <RecipeSummary
              title="The recipe"
              content={recipe.content}
              names={recipe.ingredientNames}
              bottleName={format?.name}
              units={units}
            />
          )}
          {canEdit && format && content ? (
            <TargetHelper
              units={units}
              content={content}
              liquidMl={format.liquidMl}
              headspaceMl={format.headspaceMl}
              rating={format.maxWorkingPressureBar}
              currentAddedGPerL={
                evaluation.data
                  ? (evaluation.data.carbonation.sugar.addedG / format.liquidMl) * 1000 -
                    content.baseBrew.residualSugarGPerL
                  : null
              }
              fermentableGPerL={evaluation.data?.carbonation.sugar.fermentableGPerL ?? null}
            />
          ) : null}
          {content ? (
            <Card title="Process">
              {processStages(content).map((stage, i) => (
                <Text key={stage.title}>
                  {i + 1}. {stage.title}
                  {stage.hours ? ` · ${formatNumber(stage.hours, 0)} h` : ''}
                  {stage.tempC !== null ? ` · ${formatTemp(stage.tempC, units)}` : ''} — {stage.detail}
                </Text>
              ))}
            </Card>
          ) : null}
        </View>
        <View style={[styles.column, wide && styles.results]}>
          {evaluation.isError ? <Banner tone="danger">{evaluation.error.message}</Banner> : null}
          {!content ? (
            <Banner tone="caution">Some parts need attention: the numbers are for the last complete recipe.</Banner>
          ) : null}
          {evaluation.data ? (
            <View style={{ opacity: evaluation.isPlaceholderData ? 0.6 : 1 }}>
              <RecipeResults
                evaluation={evaluation.data}
                units={units}
                limitPercent={limitPercent}
                bottleName={format?.name ?? 'the bottle'}
              />
            </View>
          ) : (
            <Loading label="Working out the numbers…" />
          )}
        </View>
      </View>
      <Text variant="small">
        Last saved by {recipe.savedBy ?? 'someone'} on {formatDateTime(recipe.savedAt)}.
      </Text>
    </View>
  );
}

function Parts({ formats, canEdit }: { formats: BottleFormat[]; canEdit: boolean }) {
  const { values, setFieldValue } = useFormikContext<RecipeFormValues>();
  const steep = values.method === 'steep-strain';
  return (
    <View style={styles.column} pointerEvents={canEdit ? 'auto' : 'none'}>
      <Card title="Recipe">
        <FormField name="name" label="Recipe name" editable={canEdit} />
        <FormField name="flavourNotes" label="Flavour notes" multiline editable={canEdit} />
        <Select
          compact
          label="Bottle format"
          value={values.bottleFormatId}
          options={formats.map((f) => ({ value: String(f.id), label: f.name }))}
          onChange={(id) => setFieldValue('bottleFormatId', id)}
        />
      </Card>
      <Card title="Base brew">
        <View style={styles.row}>
          <View style={styles.cell}>
            <FormField name="base.name" label="Base" />
          </View>
          <View style={styles.cell}>
            <FormNumberField name="base.residualSugarGPerL" label="Residual sugar" unit="g/L" />
          </View>
          <View style={styles.cell}>
            <FormNumberField
              name="base.residualAddedSugarGPerL"
              label="Of which added sugar"
              unit="g/L"
              hint="For the label. Empty: all of it counts as added sugars."
            />
          </View>
          <View style={styles.cell}>
            <FormNumberField name="base.abvPercent" label="Alcohol" unit="% ABV" />
          </View>
          <View style={styles.cell}>
            <FormNumberField name="base.ph" label="pH" hint="4.2 or below before flavouring." />
          </View>
        </View>
        <Segmented
          label="CO2 already in the base"
          value={values.base.residualMode}
          onChange={(m) => setFieldValue('base.residualMode', m)}
          options={[
            { value: 'last-open', label: 'From temperature' },
            { value: 'volumes', label: 'Known volumes' },
          ]}
        />
        {values.base.residualMode === 'volumes' ? (
          <FormNumberField name="base.residualCo2Volumes" label="Residual CO2" unit="volumes" />
        ) : (
          <FormNumberField name="base.lastOpenTempC" label="Temperature when last open" unit="°C" />
        )}
      </Card>
      <Card title="How the flavour goes in">
        <Segmented
          label="Method"
          value={values.method}
          onChange={(m) => setFieldValue('method', m)}
          options={METHODS.map((m) => ({ value: m, label: METHOD_LABELS[m] }))}
        />
        {steep ? (
          <View style={styles.row}>
            <View style={styles.cell}>
              <FormNumberField name="steepHours" label="Steep for" unit="h" />
            </View>
            <View style={styles.cell}>
              <FormNumberField name="steepTempC" label="Steep at" unit="°C" />
            </View>
            <View style={styles.cell}>
              <FormNumberField name="strainLossPct" label="Liquid lost when straining" unit="%" />
            </View>
          </View>
        ) : (
          <Banner tone="caution">
            Solids stay in the bottle: pressure keeps rising as long as sugar remains. The worst case applies.
          </Banner>
        )}
        <View style={styles.row}>
          <View style={styles.cell}>
            <FormNumberField name="carbonateHours" label="Carbonate for" unit="h" />
          </View>
          <View style={styles.cell}>
            <FormNumberField name="carbonateTempC" label="Carbonate at" unit="°C" />
          </View>
          <View style={styles.cell}>
            <FormNumberField name="coldStoreTempC" label="Cold store at" unit="°C" />
          </View>
          <View style={styles.cell}>
            <FormNumberField name="highestTempC" label="Highest it may meet" unit="°C" />
          </View>
        </View>
      </Card>
      <Card title="Ingredients">
        {values.lines.length === 0 ? (
          <Text variant="muted">No ingredients yet: add the first from the library.</Text>
        ) : null}
        {values.lines.map((line, index) => (
          <View key={line.ingredientId} style={styles.line}>
            <Text style={styles.lineName}>{line.name}</Text>
            <View style={styles.row}>
              <View style={styles.cell}>
                <FormNumberField name={`lines.${index}.amount`} label={`Amount of ${line.name}`} />
              </View>
              <View style={styles.wideCell}>
                <Select
                  compact
                  label="Unit"
                  value={line.unit}
                  options={(Object.keys(AMOUNT_UNIT_LABELS) as (keyof typeof AMOUNT_UNIT_LABELS)[]).map((u) => ({
                    value: u,
                    label: AMOUNT_UNIT_LABELS[u],
                  }))}
                  onChange={(u) => setFieldValue(`lines.${index}.unit`, u)}
                />
              </View>
              {steep ? (
                <View style={styles.cell}>
                  <FormNumberField name={`lines.${index}.extractionPct`} label="Sugar reaching the liquid" unit="%" />
                </View>
              ) : null}
            </View>
            {canEdit ? (
              <Button
                label="Remove"
                accessibleName={`Remove ${line.name}`}
                variant="quiet"
                onPress={() =>
                  setFieldValue(
                    'lines',
                    values.lines.filter((_, i) => i !== index),
                  )
                }
                style={styles.left}
              />
            ) : null}
          </View>
        ))}
        {canEdit ? (
          <IngredientPicker
            exclude={values.lines.map((l) => l.ingredientId)}
            onPick={(ingredient) =>
              setFieldValue('lines', [
                ...values.lines,
                {
                  ingredientId: ingredient.id,
                  name: ingredient.displayName,
                  amount: '',
                  unit: 'g-per-l',
                  extractionPct: String(ingredient.steepSharePct),
                },
              ])
            }
          />
        ) : null}
      </Card>
      <Card title="Added sugar">
        {values.sugars.map((sugar, index) => (
          <View key={index} style={styles.line}>
            <Select
              compact
              label={`Sugar ${index + 1}`}
              value={sugar.type}
              options={SUGAR_OPTIONS}
              onChange={(type) => setFieldValue(`sugars.${index}.type`, type)}
            />
            <FormNumberField
              name={`sugars.${index}.gPerL`}
              label={`${SUGARS[sugar.type].label} per litre`}
              unit="g/L"
            />
          </View>
        ))}
        <View style={styles.row}>
          <View style={styles.cell}>
            <FormNumberField name="targetVolumes" label="Target carbonation" unit="volumes" />
          </View>
          <View style={styles.cell}>
            <FormField name="sweetnessNote" label="Sweetness note" placeholder="e.g. off-dry" />
          </View>
        </View>
      </Card>
    </View>
  );
}

/** Fills the added sugar that reaches the target fizz, given what the base and the ingredients already bring. */
function TargetHelper({
  units,
  content,
  liquidMl,
  headspaceMl,
  rating,
  fermentableGPerL,
  currentAddedGPerL,
}: {
  units: UnitSystem;
  content: NonNullable<ReturnType<typeof toContent>['content']>;
  liquidMl: number;
  headspaceMl: number;
  rating: number;
  fermentableGPerL: number | null;
  currentAddedGPerL: number | null;
}) {
  const { setFieldValue, values } = useFormikContext<RecipeFormValues>();
  const asked = {
    liquidMl,
    headspaceMl,
    targetVolumes: content.targetVolumes,
    residualCo2Volumes: content.baseBrew.residualCo2Volumes,
    lastOpenTempC: content.baseBrew.lastOpenTempC,
    sugarType: 'sucrose' as const,
    sealedTempC: content.process.carbonateTempC,
    highestTempC: content.highestTempC,
    maxWorkingPressureBar: rating,
    baseAbvPercent: content.baseBrew.abvPercent,
    abvLimitPercent: null,
    bottleFormatId: null,
    yield: 'worst' as const,
  };
  const request = useDebouncedValue(asked, 400);
  const priming = usePrimingQuery(request);
  if (!priming.data || fermentableGPerL === null || currentAddedGPerL === null) return null;
  // Until the answer is for what the form says now, the old figures would be for another target: say so instead.
  const current = !priming.isPlaceholderData && JSON.stringify(request) === JSON.stringify(asked);
  const advice = targetAdvice(priming.data, liquidMl, fermentableGPerL, currentAddedGPerL);
  return (
    <Card title="Sugar for the target fizz">
      {!current ? (
        <Text>Working out the sugar for {formatNumber(content.targetVolumes, 2)} volumes…</Text>
      ) : (
        <Text>
          {advice.reachable
            ? `${request.targetVolumes} volumes need ${formatNumber(advice.totalGPerL, 1)} g/L of fermentable sugar in all; the base and the ingredients bring ${formatNumber(advice.fromOthersGPerL, 1)} g/L, so add ${formatNumber(advice.addGPerL, 1)} g/L of sucrose. The alcohol follows: +${formatNumber(advice.addedAbvPercent, 2)} % ABV.`
            : `${request.targetVolumes} volumes cannot be reached safely in this bottle (${advice.limitedBy === 'alcohol' ? 'the alcohol would reach the limit' : `the pressure would pass ${formatNumber(advice.ratingSharePercent, 0)} % of its rating on the warmest day`}). The most that is safe is ${formatNumber(advice.totalGPerL, 1)} g/L of fermentable sugar in all; the base and the ingredients bring ${formatNumber(advice.fromOthersGPerL, 1)} g/L, so add at most ${formatNumber(advice.addGPerL, 1)} g/L of sucrose.`}
        </Text>
      )}
      <Button
        label={advice.reachable ? 'Use this sugar' : 'Use the most that is safe'}
        variant="secondary"
        style={styles.left}
        disabled={!current}
        onPress={() =>
          setFieldValue('sugars', [
            { type: 'sucrose', gPerL: String(advice.addGPerL) },
            ...values.sugars.filter((s) => s.type !== 'sucrose'),
          ])
        }
      />
      <Text variant="small">
        {units === 'us'
          ? 'Amounts in the recipe are per litre; the Scale tab gives them in US units.'
          : 'Amounts in the recipe are per litre of finished drink.'}
      </Text>
    </Card>
  );
}

const styles = StyleSheet.create({
  column: { gap: space.lg },
  layout: { gap: space.lg },
  layoutWide: { flexDirection: 'row', alignItems: 'flex-start' },
  inputs: { flex: 5, minWidth: 380 },
  // On a wide screen the numbers stay in view while the long list of parts scrolls past.
  results: { flex: 6, position: 'sticky' as never, top: space.lg },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md, alignItems: 'flex-start' },
  cell: { flexGrow: 1, flexBasis: 150 },
  wideCell: { flexGrow: 2, flexBasis: 280 },
  line: { gap: space.sm, paddingBottom: space.sm, borderBottomWidth: 1, borderBottomColor: colors.divider },
  lineName: { fontFamily: fonts.semibold },
  left: { alignSelf: 'flex-start' },
  // On phones the save bar and the key numbers stay at the top of the screen while the long form scrolls.
  stickyTop: {
    position: 'sticky' as never,
    top: 0,
    zIndex: 3,
    gap: space.sm,
    backgroundColor: colors.background,
    paddingVertical: space.xs,
  },
  saveBar: {
    flexDirection: 'row',
    flexWrap: 'wrap',
    alignItems: 'center',
    justifyContent: 'space-between',
    gap: space.md,
  },
});
