import { StyleSheet, View } from 'react-native';

import { Card, type Column, Table, Text } from '@/components/ui';
import { Cautions } from '@/components/ui/calculations/Cautions';
import { FindingList } from '@/components/ui/calculations/FindingList';
import { PressureChart } from '@/components/ui/calculations/PressureChart';
import type { CarbonationAnswer } from '@/lib/api/calculations';
import { ratingLevel } from '@/lib/chemistry/carbonation';
import { WARM_DAY_NAME } from '@/lib/recipes/evaluate';
import { colors, fonts, space } from '@/lib/theme';
import { formatNumber, formatPressure, formatSmallVolume, formatTemp, inUnits, type UnitSystem } from '@/lib/units';

interface Props {
  answer: CarbonationAnswer;
  chart: CarbonationAnswer | undefined;
  units: UnitSystem;
  limitPercent: number;
  /** Names of the three temperatures, in the order they were asked. */
  temperatureNames: string[];
}

type Row = {
  name: string;
  tempC: number;
  worst: number;
  expected: number;
  dissolved: number;
  headspaceMl: number;
  full: boolean;
  over: boolean;
};

/** What a Quick check answers: sugar, fizz, alcohol, pressure at each temperature, findings and cautions. */
export function CarbonationResults({ answer, chart, units, limitPercent, temperatureNames }: Props) {
  const { sugar, cases } = answer;
  const chosen = answer;
  const rating = answer.bottleFormat?.maxWorkingPressureBar ?? answerRating(answer);
  const rows: Row[] = chosen.pressures.map((p, i) => ({
    // Past the names asked for comes the brewery's warm day, added when it is hotter than all of them.
    name: temperatureNames[i] ?? WARM_DAY_NAME,
    tempC: p.tempC,
    worst: cases.worst.gaugeBar[i],
    expected: cases.expected.gaugeBar[i],
    dissolved: p.dissolvedVolumes,
    headspaceMl: p.headspaceMl,
    full: p.liquidFills,
    over: p.liquidFills || (rating !== null && ratingLevel(cases.worst.gaugeBar[i], rating) === 'danger'),
  }));
  const columns: Column<Row>[] = [
    { key: 'where', header: 'Where', flex: 1.2, render: (r) => `${r.name} · ${formatTemp(r.tempC, units)}` },
    {
      key: 'worst',
      header: 'Worst case',
      flex: 1.3,
      render: (r) => (
        <Text style={r.over ? styles.over : undefined}>
          {r.full
            ? 'bottle full: no gas space'
            : `${formatPressure(r.worst, units)}${r.over ? ' · at or over rating' : ''}`}
        </Text>
      ),
    },
    { key: 'expected', header: 'Expected', flex: 1.3, render: (r) => formatPressure(r.expected, units) },
    { key: 'dissolved', header: 'In the liquid', render: (r) => `${formatNumber(r.dissolved, 2)} vol` },
    { key: 'headspace', header: 'Headspace', render: (r) => formatSmallVolume(r.headspaceMl, units) },
  ];
  return (
    <View style={styles.column}>
      <Card title="In each bottle">
        <View style={styles.figures}>
          <Figure
            label="Fermentable sugar"
            value={`${formatNumber(sugar.fermentableG, 2)} g`}
            detail={`${formatNumber(sugar.fermentableGPerL, 1)} g/L${sugar.sweetOnlyG > 0 ? ` · ${formatNumber(sugar.sweetOnlyG, 1)} g sweetness only` : ''}`}
          />
          <Figure
            label="Carbonation, worst case"
            value={`${formatNumber(cases.worst.co2.totalVolumes, 2)} volumes`}
            detail={`${formatNumber(cases.worst.co2.residualVolumes, 2)} already in the base + ${formatNumber(cases.worst.co2.fromSugarVolumes, 2)} from sugar`}
          />
          <Figure
            label="Carbonation, expected"
            value={`${formatNumber(cases.expected.co2.totalVolumes, 2)} volumes`}
            detail="95 % of the sugar's theoretical yield"
          />
          <Figure
            label="Alcohol, worst case"
            value={`${formatNumber(cases.worst.alcohol.totalAbvPercent, 2)} % ABV`}
            detail={`+${formatNumber(cases.worst.alcohol.addedAbvPercent, 2)} % from this sugar · limit ${formatNumber(limitPercent, 1)} %`}
          />
        </View>
      </Card>
      <Card title="Findings">
        <FindingList findings={answer.findings} />
      </Card>
      <Card title="Pressure in the bottle">
        <Table
          label="Pressure at each temperature"
          columns={columns}
          rows={rows}
          rowKey={(r) => `${r.name}-${r.tempC}`}
        />
        {chart ? (
          <PressureChart
            units={units}
            ratingBar={rating}
            worst={chart.pressures.map((p, i) => ({ tempC: p.tempC, gaugeBar: chart.cases.worst.gaugeBar[i] }))}
            expected={chart.pressures.map((p, i) => ({ tempC: p.tempC, gaugeBar: chart.cases.expected.gaugeBar[i] }))}
            moments={rows
              .filter((r) => !r.full)
              .map((r) => ({
                tempC: r.tempC,
                gaugeBar: r.worst,
                label: r.name === WARM_DAY_NAME ? 'Warm day' : r.name,
              }))}
          />
        ) : null}
        <Cautions />
      </Card>
      <Card title="How these numbers are worked out">
        {answer.assumptions.map((a) => (
          <Text key={a.name}>
            <Text style={styles.term}>{a.name}.</Text> {inUnits(a.value, units)}
          </Text>
        ))}
        <Text variant="label" level={3}>
          Sources
        </Text>
        {answer.assumptions.map((a) => (
          <Text key={a.name} variant="small">
            {a.name}: {a.source}
          </Text>
        ))}
      </Card>
    </View>
  );
}

/** The rating the pressure finding compared against, when it came from the request rather than a format. */
function answerRating(answer: CarbonationAnswer): number | null {
  const finding = answer.findings.find((f) => f.values && 'ratingBar' in f.values);
  return finding?.values?.ratingBar ?? null;
}

function Figure({ label, value, detail }: { label: string; value: string; detail: string }) {
  return (
    <View style={styles.figure}>
      <Text variant="small">{label}</Text>
      <Text variant="subheading">{value}</Text>
      <Text variant="small">{detail}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  column: { gap: space.lg },
  figures: { flexDirection: 'row', flexWrap: 'wrap', gap: space.lg },
  figure: { flexGrow: 1, flexBasis: 200, gap: 2 },
  over: { color: colors.danger, fontFamily: fonts.semibold },
  term: { fontFamily: fonts.semibold },
});
