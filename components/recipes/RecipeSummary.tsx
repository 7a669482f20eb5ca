import { StyleSheet, View } from 'react-native';

import { Card, Text } from '@/components/ui';
import { SUGARS } from '@/lib/chemistry/sugars';
import { AMOUNT_UNIT_LABELS, type RecipeContent } from '@/lib/schemas/recipes';
import { fonts, space } from '@/lib/theme';
import { formatNumber, formatTemp, type UnitSystem } from '@/lib/units';

interface Props {
  content: RecipeContent;
  /** Display names by ingredient id. */
  names: Record<number, string>;
  bottleName?: string;
  units: UnitSystem;
  /** Card title; "What goes in" by default. */
  title?: string;
}

/**
 * A recipe version read-only, in the words of the designer's form: the base, the ingredients with their amounts,
 * the sugars and the process. What a brewer sees on the Design tab, and an owner beside the findings on Review.
 */
export function RecipeSummary({ content, names, bottleName, units, title = 'What goes in' }: Props) {
  const p = content.process;
  const steeped = p.method === 'steep-strain';
  const t = (c: number) => formatTemp(c, units);
  const base = content.baseBrew;
  const sugars = content.sugars.filter((s) => s.gPerL > 0);
  return (
    <Card title={title}>
      <View style={styles.list}>
        {content.lines.length === 0 ? <Text variant="muted">No ingredients.</Text> : null}
        {content.lines.map((l) => (
          <Row
            key={l.ingredientId}
            term={names[l.ingredientId] ?? `Ingredient ${l.ingredientId}`}
            value={`${formatNumber(l.amount, 1)} ${AMOUNT_UNIT_LABELS[l.unit]}${steeped ? `, ${formatNumber(l.extractionPct, 0)} % of its sugar reaches the liquid` : ''}`}
          />
        ))}
        {sugars.map((s) => (
          <Row key={s.type} term={SUGARS[s.type].label} value={`${formatNumber(s.gPerL, 1)} g per litre`} />
        ))}
      </View>
      <View style={styles.list}>
        <Row
          term="Base"
          value={`${base.name}: pH ${base.ph ?? 'not given'}, ${formatNumber(base.residualSugarGPerL, 1)} g/L residual sugar, ${formatNumber(base.abvPercent, 2)} % ABV`}
        />
        {bottleName ? <Row term="Bottle" value={bottleName} /> : null}
        <Row
          term="Method"
          value={
            steeped
              ? `steeped ${formatNumber(p.steepHours, 0)} h at ${t(p.steepTempC)}, strained (${formatNumber(p.strainLossPct, 0)} % of the liquid lost)`
              : 'flavoured in the bottle'
          }
        />
        <Row
          term="Carbonating"
          value={`${formatNumber(p.carbonateHours, 0)} h at ${t(p.carbonateTempC)}, then cold store at ${t(p.coldStoreTempC)}`}
        />
        <Row term="Target" value={`${formatNumber(content.targetVolumes, 1)} volumes of CO2`} />
      </View>
    </Card>
  );
}

function Row({ term, value }: { term: string; value: string }) {
  return (
    <Text>
      <Text style={styles.term}>{term}:</Text> {value}
    </Text>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.xs },
  term: { fontFamily: fonts.semibold },
});
