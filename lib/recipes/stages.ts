import type { RecipeContent } from '../schemas/recipes';

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
    stages.push({ title: 'Steep', detail: 'Add the ingredients to the base and leave them to steep.', hours: p.steepHours, tempC: p.steepTempC });
    stages.push({ title: 'Strain', detail: `Strain out the solids; expect to lose about ${p.strainLossPct} % of the liquid.`, hours: 0, tempC: null });
    stages.push({ title: 'Top up and sugar', detail: 'Top up with fresh base to the batch volume, then dissolve the added sugar.', hours: 0, tempC: null });
  } else {
    stages.push({ title: 'Fill', detail: 'Share the ingredients and sugar between the bottles, fill with base and cap.', hours: 0, tempC: null });
  }
  stages.push({
    title: 'Carbonate',
    detail: p.method === 'in-bottle' ? 'Keep sealed and warm while the sugar ferments; the solids keep feeding it.' : 'Bottle, cap and keep warm while the sugar ferments.',
    hours: p.carbonateHours,
    tempC: p.carbonateTempC,
  });
  stages.push({ title: 'Chill', detail: 'Open a test bottle; once the fizz is right, move every bottle to cold store.', hours: 0, tempC: p.coldStoreTempC });
  return stages;
}

/** A sensible new recipe: a 473 mL bottle's worth of defaults a developer then changes. */
export function defaultContent(bottleFormatId: number, method: RecipeContent['process']['method']): RecipeContent {
  return {
    baseBrew: { name: 'House base', residualSugarGPerL: 0, ph: null, abvPercent: 0.1, residualCo2Volumes: null, lastOpenTempC: 22 },
    lines: [],
    sugars: [{ type: 'sucrose', gPerL: 0 }],
    process: {
      method,
      steepHours: method === 'steep-strain' ? 48 : 0,
      steepTempC: 4,
      strainLossPct: method === 'steep-strain' ? 10 : 0,
      carbonateHours: 72,
      carbonateTempC: 22,
      coldStoreTempC: 4,
    },
    bottleFormatId,
    targetVolumes: 2.5,
    sweetnessNote: '',
    highestTempC: 30,
  };
}
