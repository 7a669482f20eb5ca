import type { RecipeContent } from '@/lib/schemas/recipes';

export interface Change {
  area: 'ingredients' | 'sugar' | 'process' | 'bottle' | 'base' | 'targets' | 'name';
  what: string;
  before: string | number | null;
  after: string | number | null;
}

const PROCESS_FIELDS = [
  'method',
  'steepHours',
  'steepTempC',
  'strainLossPct',
  'carbonateHours',
  'carbonateTempC',
  'coldStoreTempC',
] as const;
const BASE_FIELDS = ['name', 'residualSugarGPerL', 'ph', 'abvPercent', 'residualCo2Volumes', 'lastOpenTempC'] as const;

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
        before: `${before.amount} ${before.unit}`,
        after: null,
      });
    else if (before.amount !== after.amount || before.unit !== after.unit)
      changes.push({
        area: 'ingredients',
        what: label(id),
        before: `${before.amount} ${before.unit}`,
        after: `${after.amount} ${after.unit}`,
      });
    else if (before.extractionPct !== after.extractionPct)
      changes.push({
        area: 'ingredients',
        what: `${label(id)} extraction`,
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
        after: `${after.amount} ${after.unit}`,
      });
  }
  const sugarsA = new Map(a.content.sugars.map((s) => [s.type, s.gPerL]));
  const sugarsB = new Map(b.content.sugars.map((s) => [s.type, s.gPerL]));
  for (const type of new Set([...sugarsA.keys(), ...sugarsB.keys()])) {
    if (sugarsA.get(type) !== sugarsB.get(type))
      changes.push({
        area: 'sugar',
        what: `${type} (g/L)`,
        before: sugarsA.get(type) ?? null,
        after: sugarsB.get(type) ?? null,
      });
  }
  for (const field of PROCESS_FIELDS) {
    if (a.content.process[field] !== b.content.process[field])
      changes.push({
        area: 'process',
        what: field,
        before: a.content.process[field] ?? null,
        after: b.content.process[field] ?? null,
      });
  }
  for (const field of BASE_FIELDS) {
    if (a.content.baseBrew[field] !== b.content.baseBrew[field])
      changes.push({
        area: 'base',
        what: field,
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
  for (const field of ['targetVolumes', 'highestTempC', 'sweetnessNote'] as const) {
    if (a.content[field] !== b.content[field])
      changes.push({ area: 'targets', what: field, before: a.content[field], after: b.content[field] });
  }
  return changes;
}
