import type { RecipeContent } from '@/lib/schemas/recipes';
import { formatNumber, formatTemp, type UnitSystem } from '@/lib/units';

export interface Stage {
  title: string;
  detail: string;
  hours: number;
  tempC: number | null;
}

/**
 * The steps a recipe's process makes, in order, with durations and temperatures: the timeline on the recipe and
 * the numbered steps of a batch.
 */
export function processStages(content: RecipeContent): Stage[] {
  const p = content.process;
  const stages: Stage[] = [];
  if (p.method === 'steep-strain') {
    stages.push({
      title: 'Steep',
      detail: 'Add the ingredients to the base and leave them to steep.',
      hours: p.steepHours,
      tempC: p.steepTempC,
    });
    stages.push({
      title: 'Strain',
      detail: `Strain out the solids; expect to lose about ${p.strainLossPct} % of the liquid.`,
      hours: 0,
      tempC: null,
    });
    stages.push({
      title: 'Top up and sugar',
      detail: 'Top up with fresh base to the batch volume, then dissolve the added sugar.',
      hours: 0,
      tempC: null,
    });
  } else {
    stages.push({
      title: 'Fill',
      detail: 'Share the ingredients and sugar between the bottles, fill with base and cap.',
      hours: 0,
      tempC: null,
    });
  }
  stages.push({
    title: 'Carbonate',
    detail:
      p.method === 'in-bottle'
        ? 'Keep sealed and warm while the sugar ferments; the solids keep feeding it.'
        : 'Bottle, cap and keep warm while the sugar ferments.',
    hours: p.carbonateHours,
    tempC: p.carbonateTempC,
  });
  stages.push({
    title: 'Chill',
    detail: 'Open a test bottle; once the fizz is right, move every bottle to cold store.',
    hours: 0,
    tempC: p.coldStoreTempC,
  });
  return stages;
}

/** The usual process: a two-day cold steep (when steeped), three days' carbonating at 22 °C, cold store at 4 °C. */
export function defaultProcess(
  method: RecipeContent['process']['method'],
  strainLossPct = 10,
): RecipeContent['process'] {
  const steep = method === 'steep-strain';
  return {
    method,
    steepHours: steep ? 48 : 0,
    steepTempC: 4,
    strainLossPct: steep ? strainLossPct : 0,
    carbonateHours: 72,
    carbonateTempC: 22,
    coldStoreTempC: 4,
  };
}

/** A sensible new recipe: a 473 mL bottle's worth of defaults a developer then changes. */
export function defaultContent(bottleFormatId: number, method: RecipeContent['process']['method']): RecipeContent {
  return {
    baseBrew: {
      name: 'House base',
      residualSugarGPerL: 0,
      ph: null,
      abvPercent: 0.1,
      residualCo2Volumes: null,
      lastOpenTempC: 22,
    },
    lines: [],
    sugars: [{ type: 'sucrose', gPerL: 0 }],
    process: defaultProcess(method),
    bottleFormatId,
    targetVolumes: 2.5,
    sweetnessNote: '',
    highestTempC: 30,
  };
}

/** Decimals that show a rounding resolution: 0.01 → 2, 5 → 0. */
export const resolutionDigits = (resolution: number) => Math.max(0, -Math.floor(Math.log10(resolution) + 1e-9));

/** An amount as written on a batch sheet, e.g. "5.68 kg" (the rounding resolution decides the decimals). */
export function formatRounded(r: { value: number; unit: string; resolution: number }): string {
  return `${formatNumber(r.value, resolutionDigits(r.resolution))} ${r.unit}`;
}

interface ScaledParts {
  bottles: number;
  finishedLitres: { value: number; unit: string; resolution: number };
  topUpLitres: { value: number; unit: string; resolution: number; exact: number };
  lines: { name: string; value: number; unit: string; resolution: number; exactBase: number }[];
  sugars: { name: string; value: number; unit: string; resolution: number; exactBase: number }[];
}

/** Grams in an avoirdupois ounce (NIST Handbook 44: 1 oz = 28.349523125 g, exact). */
const G_PER_OZ = 28.349523125;

/**
 * What one bottle takes of an amount when the flavour goes in the bottle: grams to 0.1 g under 100 g (a pocket
 * scale), whole grams above; ounces to 0.01 oz when the batch is in US units.
 */
export function perBottleAmount(item: { unit: string; exactBase: number }, bottles: number): string {
  const grams = item.exactBase / bottles;
  const us = item.unit === 'oz' || item.unit === 'lb';
  return us ? `${formatNumber(grams / G_PER_OZ, 2)} oz` : `${formatNumber(grams, grams < 100 ? 1 : 0)} g`;
}

/** Every amount of one bottle in a line: "18.0 g raspberries, 1.5 g sucrose". */
export function perBottleAmounts(items: { name: string; unit: string; exactBase: number }[], bottles: number): string {
  return items.map((i) => `${perBottleAmount(i, bottles)} ${i.name.toLowerCase()}`).join(', ');
}

/** The numbered steps of a batch, with its amounts written in: what the screen and the printed card list. */
export function batchSteps(
  content: RecipeContent,
  scaled: ScaledParts,
  bottleName: string,
  units: UnitSystem = 'metric',
): string[] {
  const t = (tempC: number) => formatTemp(tempC, units);
  const list = (items: { name: string; value: number; unit: string; resolution: number }[]) =>
    items.length === 0 ? 'nothing' : items.map((i) => `${formatRounded(i)} ${i.name.toLowerCase()}`).join(', ');
  const p = content.process;
  const finished = formatRounded(scaled.finishedLitres);
  const sugars = scaled.sugars.filter((s) => s.value > 0);
  const steps: string[] = [];
  if (p.method === 'steep-strain') {
    steps.push(
      `Steep ${list(scaled.lines)} in ${finished} of ${content.baseBrew.name} at ${t(p.steepTempC)} for ${p.steepHours} h.`,
    );
    steps.push(
      `Strain out the solids; about ${p.strainLossPct} % of the liquid (${formatRounded(scaled.topUpLitres)}) stays in them.`,
    );
    steps.push(
      `Top up with ${formatRounded(scaled.topUpLitres)} of fresh base to ${finished}${sugars.length ? ` and dissolve ${list(sugars)}` : ''}.`,
    );
    steps.push(
      `Fill ${scaled.bottles} bottles (${bottleName}), cap and keep at ${t(p.carbonateTempC)} for ${p.carbonateHours} h.`,
    );
  } else {
    const parts = [...scaled.lines, ...sugars];
    steps.push(
      `Into each of the ${scaled.bottles} bottles (${bottleName}): ${parts.length ? perBottleAmounts(parts, scaled.bottles) : 'nothing'}. In all: ${list(scaled.lines)}${sugars.length ? ` and ${list(sugars)}` : ''}.`,
    );
    steps.push(`Fill with ${finished} of ${content.baseBrew.name} and cap.`);
    steps.push(
      `Keep at ${t(p.carbonateTempC)} for ${p.carbonateHours} h; the solids keep feeding the yeast, so check a test bottle.`,
    );
  }
  steps.push(`Open a test bottle; once the fizz is right, move every bottle to cold store at ${t(p.coldStoreTempC)}.`);
  return steps;
}
