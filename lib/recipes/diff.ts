import { SHORT_SUGAR_LABELS } from '@/lib/chemistry/sugars';
import { AMOUNT_UNIT_LABELS, METHOD_LABELS, type RecipeContent } from '@/lib/schemas/recipes';

export interface Change {
  area: 'ingredients' | 'sugar' | 'process' | 'bottle' | 'base' | 'targets' | 'name';
  what: string;
  before: string | number | null;
  after: string | number | null;
}

/** The designer's own labels (with the unit), so a change reads as the form reads. */
const PROCESS_FIELDS = {
  method: 'How the flavour goes in',
  steepHours: 'Steep for (h)',
  steepTempC: 'Steep at (°C)',
  strainLossPct: 'Liquid lost when straining (%)',
  carbonateHours: 'Carbonate for (h)',
  carbonateTempC: 'Carbonate at (°C)',
  coldStoreTempC: 'Cold store at (°C)',
} as const;
const BASE_FIELDS = {
  name: 'Base',
  residualSugarGPerL: 'Residual sugar (g/L)',
  residualAddedSugarGPerL: 'Of which added sugar (g/L)',
  ph: 'pH',
  abvPercent: 'Alcohol of the base (% ABV)',
  residualCo2Volumes: 'Residual CO2 (volumes)',
  lastOpenTempC: 'Temperature when last open (°C)',
} as const;
const TARGET_FIELDS = {
  targetVolumes: 'Target carbonation (volumes)',
  highestTempC: 'Highest it may meet (°C)',
  sweetnessNote: 'Sweetness note',
} as const;
const amount = (line: { amount: number; unit: keyof typeof AMOUNT_UNIT_LABELS }) =>
  `${line.amount} ${AMOUNT_UNIT_LABELS[line.unit]}`;

/**
 * What changed between two versions of a recipe: ingredient lines (matched by ingredient), sugars (by type), the
 * process, the bottle, the base and the targets. `names` gives readable ingredient names.
 */
export function diffRecipes(
  a: { name: string; content: RecipeContent },
  b: { name: string; content: RecipeContent },
  names: Map<number, string>,
): Change[] {
  const changes: Change[] = [];
  if (a.name !== b.name) changes.push({ area: 'name', what: 'Name', before: a.name, after: b.name });
  const label = (id: number) => names.get(id) ?? `Ingredient ${id}`;
  const linesA = new Map(a.content.lines.map((l) => [l.ingredientId, l]));
  const linesB = new Map(b.content.lines.map((l) => [l.ingredientId, l]));
  for (const [id, before] of linesA) {
    const after = linesB.get(id);
    if (!after)
      changes.push({
        area: 'ingredients',
        what: `${label(id)} removed`,
        before: amount(before),
        after: null,
      });
    else if (before.amount !== after.amount || before.unit !== after.unit)
      changes.push({
        area: 'ingredients',
        what: label(id),
        before: amount(before),
        after: amount(after),
      });
    else if (before.extractionPct !== after.extractionPct)
      changes.push({
        area: 'ingredients',
        what: `${label(id)}: share reaching the liquid (%)`,
        before: before.extractionPct,
        after: after.extractionPct,
      });
  }
  for (const [id, after] of linesB) {
    if (!linesA.has(id))
      changes.push({
        area: 'ingredients',
        what: `${label(id)} added`,
        before: null,
        after: amount(after),
      });
  }
  const sugarsA = new Map(a.content.sugars.map((s) => [s.type, s.gPerL]));
  const sugarsB = new Map(b.content.sugars.map((s) => [s.type, s.gPerL]));
  for (const type of new Set([...sugarsA.keys(), ...sugarsB.keys()])) {
    if (sugarsA.get(type) !== sugarsB.get(type))
      changes.push({
        area: 'sugar',
        what: `${SHORT_SUGAR_LABELS[type]} (g/L)`,
        before: sugarsA.get(type) ?? null,
        after: sugarsB.get(type) ?? null,
      });
  }
  const shown = (field: string, value: string | number | null | undefined) =>
    field === 'method' && value ? METHOD_LABELS[value as keyof typeof METHOD_LABELS] : (value ?? null);
  for (const [field, what] of Object.entries(PROCESS_FIELDS) as [keyof typeof PROCESS_FIELDS, string][]) {
    if (a.content.process[field] !== b.content.process[field])
      changes.push({
        area: 'process',
        what,
        before: shown(field, a.content.process[field]),
        after: shown(field, b.content.process[field]),
      });
  }
  for (const [field, what] of Object.entries(BASE_FIELDS) as [keyof typeof BASE_FIELDS, string][]) {
    // A field older versions lack reads as null, so saving them again is not a change.
    if ((a.content.baseBrew[field] ?? null) !== (b.content.baseBrew[field] ?? null))
      changes.push({
        area: 'base',
        what,
        before: a.content.baseBrew[field] ?? null,
        after: b.content.baseBrew[field] ?? null,
      });
  }
  if (a.content.bottleFormatId !== b.content.bottleFormatId)
    changes.push({
      area: 'bottle',
      what: 'Bottle format',
      before: a.content.bottleFormatId,
      after: b.content.bottleFormatId,
    });
  for (const [field, what] of Object.entries(TARGET_FIELDS) as [keyof typeof TARGET_FIELDS, string][]) {
    if (a.content[field] !== b.content[field])
      changes.push({ area: 'targets', what, before: a.content[field], after: b.content[field] });
  }
  return changes;
}
