import { useRouter } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { Banner, Button, Card, type Column, NumberField, Segmented, Table, Text } from '@/components/ui';
import { cardQuery, type RecipeDetail, useCardQuery, useRecipeQuery, useScaleQuery } from '@/lib/api/recipes';
import { parseNumber } from '@/lib/forms';
import { useDebouncedValue } from '@/lib/hooks/use-debounced-value';
import type { Rounded } from '@/lib/recipes/scaling';
import { batchSteps, formatRounded, resolutionDigits } from '@/lib/recipes/stages';
import { colors, fonts, space } from '@/lib/theme';
import { formatNumber, type UnitSystem } from '@/lib/units';

import { RecipeBatches } from './RecipeBatches';
import { SafetyNotice } from './SafetyNotice';
import { StartBatch } from './StartBatch';

type Kind = 'litres' | 'us-gallons' | 'bottles';
type Row = Rounded & { name: string };

const show = formatRounded;

/** The recipe at batch size: every amount rounded to what a scale reads, with the rounding shown. */
export function ScaleView({
  recipe,
  units,
  productionOnly = false,
}: {
  recipe: RecipeDetail;
  units: UnitSystem;
  productionOnly?: boolean;
}) {
  const recipeId = recipe.id;
  // Brewers work from the version approved for production; developers scale the newest.
  const version = productionOnly ? recipe.approvedVersion : null;
  const approved = useRecipeQuery(recipeId, productionOnly ? recipe.approvedVersion : undefined);
  const [kind, setKind] = useState<Kind>('bottles');
  const [text, setText] = useState('120');
  const [system, setSystem] = useState<UnitSystem>(units);
  const value = parseNumber(text);
  const valid = value !== undefined && !Number.isNaN(value) && value > 0;
  const request = useDebouncedValue(
    valid && (!productionOnly || version) ? { batch: { kind, value: value! }, units: system, version } : undefined,
    300,
  );
  const content = productionOnly ? approved.data?.content : recipe.content;
  const router = useRouter();
  const scaled = useScaleQuery(recipeId, request);
  // The floor sees the card's safety summary for the version it works from.
  const card = useCardQuery(
    recipeId,
    request && scaled.data
      ? cardQuery({ version: scaled.data.version, kind, value: value!, units: system })
      : undefined,
  );
  const columns: Column<Row>[] = [
    { key: 'name', header: 'What', flex: 2, render: (r) => r.name },
    { key: 'amount', header: 'Amount', render: (r) => <Text style={r.warn ? styles.warn : undefined}>{show(r)}</Text> },
    {
      key: 'exact',
      header: 'Exact',
      render: (r) => `${formatNumber(r.exact, resolutionDigits(r.resolution) + 2)} ${r.unit}`,
    },
    {
      key: 'rounding',
      header: 'Rounded to',
      render: (r) => `${r.resolution} ${r.unit}${r.warn ? ` · ${formatNumber(r.offPct, 1)} % off` : ''}`,
    },
  ];
  return (
    <View style={styles.wrap}>
      {productionOnly && !version ? (
        <Banner tone="info">No version of this recipe is approved for production yet.</Banner>
      ) : null}
      {productionOnly && version ? (
        <Banner tone="success">{`Version ${version}, approved for production.`}</Banner>
      ) : null}
      <Card title="Batch size">
        <Segmented
          label="Batch given as"
          value={kind}
          onChange={setKind}
          options={[
            { value: 'bottles', label: 'Bottles' },
            { value: 'litres', label: 'Litres' },
            { value: 'us-gallons', label: 'US gallons' },
          ]}
        />
        <NumberField
          label={
            kind === 'bottles'
              ? 'Number of bottles'
              : kind === 'litres'
                ? 'Litres of finished drink'
                : 'US gallons of finished drink'
          }
          value={text}
          onChangeText={setText}
          error={valid ? (scaled.error?.message ?? undefined) : 'Enter a batch size above 0.'}
        />
        <Segmented
          label="Amounts in"
          value={system}
          onChange={setSystem}
          options={[
            { value: 'metric', label: 'Metric' },
            { value: 'us', label: 'US' },
          ]}
        />
      </Card>
      {card.data ? <SafetyNotice card={card.data} /> : null}
      {scaled.data ? (
        <Card
          title={`Batch: ${scaled.data.bottles} bottles of ${scaled.data.bottleName}`}
          aside={<Text variant="small">version {scaled.data.version}</Text>}
        >
          <StartBatch recipe={recipe} batch={valid ? { kind, value: value! } : null} />
          <Button
            label="Print card"
            variant="secondary"
            style={styles.left}
            onPress={() =>
              router.push(
                `/print/${recipeId}?version=${scaled.data.version}&kind=${kind}&value=${value}&units=${system}`,
              )
            }
          />
          <Text>
            Finished drink {show(scaled.data.finishedLitres)} · base brew {show(scaled.data.baseLitres)}
            {scaled.data.topUpLitres.exact > 0
              ? ` (of which ${show(scaled.data.topUpLitres)} to top up after straining)`
              : ''}
          </Text>
          <Table
            label="Scaled amounts"
            columns={columns}
            rows={[...scaled.data.lines, ...scaled.data.sugars]}
            rowKey={(r) => r.name}
          />
          <Text variant="subheading">Steps</Text>
          {content &&
            batchSteps(content, scaled.data, scaled.data.bottleName, system).map((step, i) => (
              <Text key={i}>
                {i + 1}. {step}
              </Text>
            ))}
          {[...scaled.data.lines, ...scaled.data.sugars].some((r) => r.warn) ? (
            <Banner tone="caution">
              Some amounts are more than 1 % off once rounded: weigh them on a finer scale.
            </Banner>
          ) : null}
        </Card>
      ) : null}
      <RecipeBatches recipeId={recipeId} />
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.lg },
  left: { alignSelf: 'flex-start' },
  warn: { color: colors.caution, fontFamily: fonts.semibold },
});
