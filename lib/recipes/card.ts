import type { FindingLevel } from '@/lib/chemistry/carbonation';
import { CAUTION_SHARE_OF_RATING, PH_LIMIT } from '@/lib/chemistry/carbonation';
import { SAFETY_CAUTIONS } from '@/lib/chemistry/cautions';
import { type Allergen, ALLERGEN_LABELS } from '@/lib/ingredients';
import type { RecipeContent } from '@/lib/schemas/recipes';
import { formatNumber, formatPressure, formatTemp, inUnits, type UnitSystem } from '@/lib/units';

import type { RecipeEvaluation } from './evaluate';
import type { BatchSize, Rounded, ScaledRecipe } from './scaling';
import { batchSteps, formatRounded, perBottleAmount, resolutionDigits } from './stages';

/** One amount to weigh: the batch total, what each bottle takes (flavoured in the bottle), and a rounding note. */
export interface CardAmount {
  name: string;
  amount: string;
  /** What one bottle takes, when the flavour goes in the bottle; null when steeped. */
  perBottle: string | null;
  /** Said when rounding to the scale step moved the amount more than 1 %. */
  roundingNote: string | null;
}

/** A reading the floor writes in by hand, with the target or limit it is checked against. */
export interface CardCheckpoint {
  label: string;
  /** The target or limit beside the box; empty when there is none (a lot code, initials). */
  target: string;
}

/** Everything a printed recipe card or batch sheet shows, in the order it shows it; the web page and the PDF both render this. */
export interface RecipeCard {
  brewery: string;
  recipeName: string;
  version: number;
  approval: {
    by: string | null;
    at: string;
    selfApproved: boolean;
    comment: string;
    /** The owner's written reason when the version was approved over a danger finding; null otherwise. */
    overrideReason: string | null;
  } | null;
  /** The worst finding, and the bottle's rating against the worst-case pressure, as the floor must see them. */
  safety: { level: FindingLevel; headline: string; rating: string };
  batch: string;
  bottles: number;
  base: string;
  amounts: CardAmount[];
  steps: string[];
  checkpoints: CardCheckpoint[];
  keyNumbers: { label: string; value: string }[];
  allergens: string[];
  cautions: string[];
  code: string;
}

const KIND_LETTER: Record<BatchSize['kind'], string> = { bottles: 'b', litres: 'l', 'us-gallons': 'g' };

/** The short code printed on a card: recipe, version and batch, e.g. "12-3-b150". */
export function cardCode(recipeId: number, version: number, batch: BatchSize): string {
  return `${recipeId}-${version}-${KIND_LETTER[batch.kind]}${batch.value}`;
}

/** Reads a short code back; null when it is not one. */
export function parseCardCode(code: string): { recipeId: number; version: number; batch: BatchSize } | null {
  const match = /^(\d+)-(\d+)-([blg])(\d+(?:\.\d+)?)$/i.exec(code.trim());
  if (!match) return null;
  const kind = ({ b: 'bottles', l: 'litres', g: 'us-gallons' } as const)[match[3].toLowerCase() as 'b' | 'l' | 'g'];
  return { recipeId: Number(match[1]), version: Number(match[2]), batch: { kind, value: Number(match[4]) } };
}

export function buildCard(input: {
  brewery: string;
  recipeId: number;
  recipeName: string;
  version: number;
  content: RecipeContent;
  scaled: ScaledRecipe;
  bottleName: string;
  /** Liquid in one bottle, mL: turns the per-bottle sugar into g/L for the reading after straining. */
  bottleLiquidMl: number;
  evaluation: RecipeEvaluation;
  approval: RecipeCard['approval'];
  batch: BatchSize;
  units: UnitSystem;
}): RecipeCard {
  const { content, scaled, evaluation, units } = input;
  const c = evaluation.carbonation;
  const steeped = content.process.method === 'steep-strain';
  // The test bottle's targets, from the engine and the bottle: the expected pressure at the carbonating temperature
  // (time to chill), and the caution line at 75 % of the rating, which it must never pass.
  const carbonating = c.pressures.findIndex((p) => p.tempC === content.process.carbonateTempC);
  const chillAt = carbonating >= 0 ? c.cases.expected.gaugeBar[carbonating] : null;
  const rated = c.findings.find((f) => f.values?.ratingBar !== undefined)?.values?.ratingBar;
  const testBottle = [
    chillAt !== null
      ? `chill when it reads about ${formatPressure(chillAt, units)} at ${formatTemp(content.process.carbonateTempC, units)}`
      : '',
    rated !== undefined ? `never above ${formatPressure(rated * CAUTION_SHARE_OF_RATING, units)}` : '',
  ].filter(Boolean);
  const checkpoints: CardCheckpoint[] = [
    { label: 'pH of the base before flavouring', target: `${PH_LIMIT} or below; never flavour above it` },
    ...(steeped ? [{ label: 'Sugar after straining', target: strainedSugarTarget(content, input) }] : []),
    {
      label: 'Gauge pressure of a test bottle',
      target: testBottle.length ? `${testBottle.join('; ')}` : 'no bottle rating given: choose a bottle format',
    },
    { label: 'Bottles filled', target: `${scaled.bottles} planned` },
    { label: 'Lot code', target: '' },
    { label: 'Initials and date', target: '' },
  ];
  const rank: Record<FindingLevel, number> = { ok: 0, caution: 1, danger: 2 };
  const worstFinding = c.findings.reduce(
    (a, b) => (rank[b.level] > rank[a.level] ? b : a),
    c.findings[0] ?? { level: 'ok' as const, code: '', message: '' },
  );
  const hottestIndex = c.pressures.reduce((best, p, i) => (p.tempC > c.pressures[best].tempC ? i : best), 0);
  const hottest = c.pressures[hottestIndex];
  const ratingBar =
    worstFinding.values?.ratingBar ?? c.findings.find((f) => f.values?.ratingBar !== undefined)?.values?.ratingBar;
  const rating =
    hottest === undefined
      ? 'No pressure worked out.'
      : `Bottle rating ${ratingBar !== undefined ? formatPressure(ratingBar, units) : 'not given'}; worst case ${hottest.liquidFills ? 'the liquid fills the bottle' : formatPressure(c.cases.worst.gaugeBar[hottestIndex], units)} at ${formatTemp(hottest.tempC, units)}.`;
  const temps = c.pressures.map(
    (p, i) =>
      `${evaluation.temperatureNames[i] ?? ''} ${formatTemp(p.tempC, units)}: ${p.liquidFills ? 'bottle full, no gas space' : formatPressure(c.cases.worst.gaugeBar[i], units)}`,
  );
  return {
    brewery: input.brewery,
    recipeName: input.recipeName,
    version: input.version,
    approval: input.approval,
    safety: { level: worstFinding.level, headline: inUnits(worstFinding.message, units), rating },
    batch: `${formatRounded(scaled.finishedLitres)} of finished drink, ${scaled.bottles} bottles of ${input.bottleName}`,
    bottles: scaled.bottles,
    base: `${formatRounded(scaled.baseLitres)} of ${content.baseBrew.name}${scaled.topUpLitres.exact > 0 ? ` (${formatRounded(scaled.topUpLitres)} of it to top up after straining)` : ''}`,
    amounts: [...scaled.lines, ...scaled.sugars.filter((s) => s.value > 0)].map((r) => ({
      name: r.name,
      amount: formatRounded(r),
      perBottle: steeped ? null : perBottleAmount(r, scaled.bottles),
      roundingNote: roundingNote(r),
    })),
    steps: batchSteps(content, scaled, input.bottleName, units),
    checkpoints,
    keyNumbers: [
      {
        label: 'Carbonation',
        value: `${formatNumber(c.cases.worst.co2.totalVolumes, 2)} volumes worst case, ${formatNumber(c.cases.expected.co2.totalVolumes, 2)} expected`,
      },
      { label: 'Gauge pressure (worst case)', value: temps.join(' · ') },
      { label: 'Alcohol', value: `${formatNumber(c.cases.worst.alcohol.totalAbvPercent, 2)} % ABV worst case` },
    ],
    allergens: evaluation.allergens.map((a: Allergen) => ALLERGEN_LABELS[a]),
    cautions: [...SAFETY_CAUTIONS],
    code: cardCode(input.recipeId, input.version, input.batch),
  };
}

/** Said beside an amount that rounding to its scale step moved more than 1 %. */
export function roundingNote(r: Rounded): string | null {
  if (!r.warn) return null;
  const exact = `${formatNumber(r.exact, resolutionDigits(r.resolution) + 2)} ${r.unit}`;
  return `Rounded from ${exact} (${formatNumber(r.offPct, 1)} % off): weigh it on a finer scale.`;
}

/**
 * What the liquid should read after straining, before the top-up sugar: the base's residual sugar and the sugar the
 * ingredients give up in the expected case, per litre. As °Bx, the rise over the base's own reading, taking 10 g/L
 * as 1 °Bx (a solution this weak weighs within 1 % of water: common practice, no source).
 */
function strainedSugarTarget(content: RecipeContent, input: { evaluation: RecipeEvaluation; bottleLiquidMl: number }) {
  const fromIngredients =
    (input.evaluation.lines.reduce((sum, l) => sum + l.sugarToLiquidG, 0) * 1000) / input.bottleLiquidMl;
  const total = content.baseBrew.residualSugarGPerL + fromIngredients;
  return `expected about ${formatNumber(total, 1)} g/L of sugar, about ${formatNumber(fromIngredients / 10, 1)} °Bx above the base's own reading`;
}
