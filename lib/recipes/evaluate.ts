import { type CarbonationResult, computeCarbonation } from '@/lib/chemistry/carbonation';
import type { YieldCase } from '@/lib/chemistry/fermentation';
import type { Allergen } from '@/lib/ingredients';
import type { RecipeContent } from '@/lib/schemas/recipes';

import { ingredientContribution, type IngredientNutrients } from './ingredient-sugar';
import { gramsPerLitre } from './scaling';

/** What the recipe needs to know of each ingredient it uses. */
export interface IngredientFacts extends IngredientNutrients {
  id: number;
  allergens: Allergen[];
  costPerKg: number | null;
}

export interface BottleFacts {
  liquidMl: number;
  headspaceMl: number;
  maxWorkingPressureBar: number;
}

export interface RecipeEvaluation {
  carbonation: CarbonationResult;
  /** Grams per bottle of each ingredient line, and the sugar it brings into the liquid. */
  lines: { ingredientId: number; name: string; gramsPerBottle: number; sugarToLiquidG: number }[];
  allergens: Allergen[];
  /** Ingredient cost; null when a line has no cost per kg. */
  cost: { perBottle: number | null; perLitre: number | null; missing: string[] };
  /** Temperatures reported, in order: carbonating, cold store, highest, and the brewery's warm day when hotter. */
  temperatureNames: string[];
}

/** What the warm-day pressure is called where it is shown. */
export const WARM_DAY_NAME = 'Warmest the bottles may meet';

/** An ingredient the library no longer knows: nothing measured, so its sugar is a danger finding, never zero. */
const UNKNOWN_INGREDIENT: IngredientNutrients = {
  name: 'Unknown ingredient',
  sugarsG: null,
  carbohydrateG: null,
  fibreG: null,
  fatG: null,
  fermentableShare: 1,
};

/**
 * A recipe's numbers for one bottle of its format: the sugar from the base's residual sugar, the ingredients and
 * the added sugars, then the engine's carbonation, pressure and alcohol with its findings. In the bottle the solids
 * stay and all their sugar counts; steeped and strained, each line's extraction share counts.
 */
export function evaluateRecipe(
  content: RecipeContent,
  bottle: BottleFacts,
  ingredients: Map<number, IngredientFacts>,
  abvLimitPercent: number,
  yieldCase: YieldCase = 'worst',
  options: { phRequired?: boolean; warmDayTempC?: number | null } = {},
): RecipeEvaluation {
  const litresPerBottle = bottle.liquidMl / 1000;
  const inBottle = content.process.method === 'in-bottle';
  const lines = content.lines.map((line) => {
    const facts = ingredients.get(line.ingredientId);
    const gramsPerBottle =
      gramsPerLitre({ name: '', amount: line.amount, unit: line.unit as never }, bottle.liquidMl) * litresPerBottle;
    const contribution = ingredientContribution(facts ?? UNKNOWN_INGREDIENT, gramsPerBottle, {
      inBottle,
      extractionShare: line.extractionPct / 100,
    });
    return { line, facts, gramsPerBottle, contribution, sugarToLiquidG: contribution.sugarG };
  });
  const carbonation = computeCarbonation({
    liquidMl: bottle.liquidMl,
    headspaceMl: bottle.headspaceMl,
    sugars: [
      // The base's own residual sugar keeps fermenting in the bottle (counted as sucrose: the worst case per gram).
      { type: 'sucrose', grams: content.baseBrew.residualSugarGPerL * litresPerBottle },
      ...content.sugars.map((s) => ({ type: s.type, grams: s.gPerL * litresPerBottle })),
    ],
    ingredients: lines.map(({ contribution }) => contribution),
    residualCo2Volumes: content.baseBrew.residualCo2Volumes,
    lastOpenTempC: content.baseBrew.lastOpenTempC,
    sealedTempC: content.process.carbonateTempC,
    temperaturesC: [content.process.carbonateTempC, content.process.coldStoreTempC, content.highestTempC],
    maxWorkingPressureBar: bottle.maxWorkingPressureBar,
    baseAbvPercent: content.baseBrew.abvPercent,
    ph: content.baseBrew.ph,
    phRequired: options.phRequired,
    warmDayTempC: options.warmDayTempC,
    yield: yieldCase,
    abvLimitPercent,
  });
  const missing = lines
    .filter(({ facts }) => facts?.costPerKg === null || facts?.costPerKg === undefined)
    .map(({ facts }) => facts?.name ?? 'Unknown ingredient');
  const perBottle =
    missing.length > 0
      ? null
      : lines.reduce((sum, { facts, gramsPerBottle }) => sum + (gramsPerBottle / 1000) * (facts!.costPerKg ?? 0), 0);
  const allergens = [...new Set(lines.flatMap(({ facts }) => facts?.allergens ?? []))].sort();
  return {
    carbonation,
    lines: lines.map(({ line, facts, gramsPerBottle, sugarToLiquidG }) => ({
      ingredientId: line.ingredientId,
      name: facts?.name ?? 'Unknown ingredient',
      gramsPerBottle,
      sugarToLiquidG,
    })),
    allergens,
    cost: { perBottle, perLitre: perBottle === null ? null : perBottle / litresPerBottle, missing },
    temperatureNames: [
      'Carbonating',
      'Cold store',
      'Highest',
      ...(carbonation.warmDayTempC !== null ? [WARM_DAY_NAME] : []),
    ],
  };
}
