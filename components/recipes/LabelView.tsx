import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { Badge, Banner, Card, DownloadLink, Loading, NumberField, Select, Text } from '@/components/ui';
import {
  nutritionFileUrl,
  nutritionQuery,
  useNutritionQuery,
  useRecipeVersionsQuery,
  useSaveLabValuesMutation,
} from '@/lib/api/recipes';
import { formatDateTime } from '@/lib/format';
import { check, parseNumber } from '@/lib/forms';
import { ALLERGEN_CAUTION, BASIS_NAMES, type BasisKey } from '@/lib/nutrition/panel';
import { nutritionQuerySchema } from '@/lib/schemas/nutrition';
import { space } from '@/lib/theme';

import { LabValuesForm } from './LabValuesForm';
import { NutritionFactsPanel } from './NutritionFactsPanel';

interface Props {
  recipeId: number;
  current: number;
  /** Owners enter the lab's values. */
  canEnterLab: boolean;
}

/**
 * The recipe's label: the nutrition panel as formulated and after conditioning side by side (and the lab's, once an
 * owner has entered it), the allergen statement, what the numbers rest on, and the files for a label designer.
 */
export function LabelView({ recipeId, current, canEnterLab }: Props) {
  const versions = useRecipeVersionsQuery(recipeId);
  const [version, setVersion] = useState(current);
  const [servingText, setServingText] = useState('');
  // The serving is checked by the API's own query schema: a bad one says why and the rule's serving stays.
  const servingCheck = check(nutritionQuerySchema, { servingMl: parseNumber(servingText) });
  const servingMl = servingCheck.value?.servingMl ?? null;
  const nutrition = useNutritionQuery(recipeId, version, servingMl);
  const saveLab = useSaveLabValuesMutation(recipeId);
  if (nutrition.isError) return <Banner tone="danger">{nutrition.error.message}</Banner>;
  const answer = nutrition.data;
  if (!answer) return <Loading label="Working out the panel…" />;
  const bases: BasisKey[] = answer.lab
    ? ['lab', 'afterConditioning', 'asFormulated']
    : ['asFormulated', 'afterConditioning'];
  const file = (basis: BasisKey, ext: 'pdf' | 'png') => {
    const query = nutritionQuery({ version: answer.version, servingMl, basis });
    return {
      path: nutritionFileUrl(recipeId, ext, query),
      fileName: `nutrition-${recipeId}-v${answer.version}-${basis}.${ext}`,
    };
  };
  return (
    <View style={styles.wrap}>
      <Card title="Label">
        <View style={styles.controls}>
          <View style={styles.control}>
            <Select
              compact
              label="Version"
              value={String(version)}
              onChange={(v) => setVersion(Number(v))}
              options={(versions.data ?? [{ number: current, note: '' }]).map((v) => ({
                value: String(v.number),
                label: `Version ${v.number}${v.number === current ? ' (current)' : ''}`,
              }))}
            />
          </View>
          <View style={styles.control}>
            <NumberField
              label="Serving"
              unit="mL"
              value={servingText}
              onChangeText={setServingText}
              error={servingCheck.errors.servingMl}
              hint="Empty: the rule's serving (360 mL, or the whole bottle when it holds under 720 mL)."
            />
          </View>
        </View>
        <Text>
          {answer.bottleName}: serving size {answer.serving.household} ({answer.serving.metric}),{' '}
          {answer.serving.servingsText}. Alcohol {answer.abvPercent.asFormulated} % ABV as formulated,{' '}
          {answer.abvPercent.afterConditioning} % after conditioning.
        </Text>
        {answer.lab ? null : (
          <Banner tone="caution">
            {`Estimates only. Values on a package must come from lab analysis of the finished drink${
              canEnterLab ? ': enter them below and they replace the estimate.' : ': an owner enters them here.'
            }`}
          </Banner>
        )}
      </Card>
      <View style={styles.panels}>
        {bases.map((basis) => (
          <View key={basis} style={styles.panelColumn}>
            <View style={styles.panelHead}>
              <Text variant="subheading" level={2}>
                {BASIS_NAMES[basis]}
              </Text>
              {basis === 'lab' ? (
                <Badge tone="success" label="To declare" />
              ) : (
                <Badge tone="caution" label="Estimate" />
              )}
            </View>
            <NutritionFactsPanel answer={answer} basis={basis} label={`Nutrition Facts, ${BASIS_NAMES[basis]}`} />
            <View style={styles.downloads}>
              <DownloadLink
                label="PDF"
                accessibleName={`Download ${BASIS_NAMES[basis]} as PDF`}
                {...file(basis, 'pdf')}
              />
              <DownloadLink
                label="PNG"
                accessibleName={`Download ${BASIS_NAMES[basis]} as PNG`}
                {...file(basis, 'png')}
              />
            </View>
          </View>
        ))}
      </View>
      <Card title="Allergen statement">
        <Text variant="subheading">
          {answer.allergenStatement ?? 'No major food allergen recorded for these ingredients.'}
        </Text>
        <Text variant="small">{ALLERGEN_CAUTION}</Text>
      </Card>
      <Card title="What these numbers rest on">
        {answer.notes
          .filter((note) => note !== ALLERGEN_CAUTION)
          .map((note) => (
            <Text key={note} variant="small">
              • {note}
            </Text>
          ))}
        <View style={styles.downloads}>
          <DownloadLink
            label="Values as CSV"
            accessibleName="Download the values as CSV"
            path={nutritionFileUrl(recipeId, 'csv', nutritionQuery({ version: answer.version, servingMl }))}
            fileName={`nutrition-${recipeId}-v${answer.version}-values.csv`}
          />
        </View>
      </Card>
      <Card title="Lab values">
        {answer.lab ? (
          <Text variant="small">
            In force for version {answer.version}: entered by {answer.lab.enteredBy ?? 'someone'} on{' '}
            {formatDateTime(answer.lab.enteredAt)}
            {answer.lab.reference ? ` (${answer.lab.reference})` : ''}.
          </Text>
        ) : (
          <Text variant="small">No lab values for version {answer.version} yet.</Text>
        )}
        {canEnterLab ? (
          <LabValuesForm
            version={answer.version}
            current={answer.lab?.per100Ml ?? null}
            reference={answer.lab?.reference ?? ''}
            error={saveLab.error}
            onSubmit={(input) => saveLab.mutateAsync(input)}
          />
        ) : null}
      </Card>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.lg },
  controls: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  control: { flexGrow: 1, flexBasis: 220 },
  panels: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xl },
  panelColumn: { gap: space.sm, flexGrow: 1, flexBasis: 320, maxWidth: 540 },
  panelHead: { flexDirection: 'row', alignItems: 'center', gap: space.sm, flexWrap: 'wrap' },
  downloads: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap' },
});
