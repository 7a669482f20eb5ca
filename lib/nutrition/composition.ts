import { fermentableSugars, type IngredientSugar } from '@/lib/chemistry/carbonation';
import { ETHANOL_DENSITY_20C_G_PER_ML } from '@/lib/chemistry/constants';
import { fermentationProducts } from '@/lib/chemistry/fermentation';
import { SUGARS, type SugarType } from '@/lib/chemistry/sugars';
import { type Allergen, type Category, type LabelNutrientValues } from '@/lib/ingredients';
import { ingredientContribution, type IngredientNutrients } from '@/lib/recipes/ingredient-sugar';
import { gramsPerLitre } from '@/lib/recipes/scaling';
import type { RecipeContent } from '@/lib/schemas/recipes';

import { LABEL_NUTRIENTS, type LabelNutrient, type NutrientAmounts } from './label-rules';

/** What the panel needs to know of an ingredient, per 100 g (null: not measured). */
export interface LabelIngredientFacts extends IngredientNutrients, LabelNutrientValues {
  category: Category;
  proteinG: number | null;
  /** House ingredients carry their label's added sugars; dataset foods are judged by `addedSugarShare`. */
  house: boolean;
  allergens: Allergen[];
}

/** Every label nutrient per litre of drink, with the alcohol behind part of its calories. */
export type LitreComposition = NutrientAmounts & { alcoholG: number };

/**
 * General factors of 21 CFR 101.9(c)(1)(i)(B): 4 kcal/g for protein and for total carbohydrate, 9 kcal/g for fat.
 * Alcohol at 7 kcal/g, Atwater's general factor (FAO 2003, Food energy: methods of analysis and conversion factors,
 * table 3.1, 29 kJ/g; from memory).
 */
export const KCAL_PER_G = { protein: 4, carbohydrate: 4, fat: 9, alcohol: 7 } as const;

/** Calories of an amount, by the factors above. */
export function caloriesOf(c: Pick<LitreComposition, 'protein' | 'totalCarbohydrate' | 'totalFat' | 'alcoholG'>) {
  return (
    KCAL_PER_G.protein * c.protein +
    KCAL_PER_G.carbohydrate * c.totalCarbohydrate +
    KCAL_PER_G.fat * c.totalFat +
    KCAL_PER_G.alcohol * c.alcoholG
  );
}

/**
 * Per 100 g of the sugars the designer adds by weight, besides their sugars (which come from `SUGARS`, the engine's
 * one table): USDA SR25 NDB 19335 (sugars, granulated), 19296 (honey), 19353 (syrups, maple), 19912 (sweetener,
 * syrup, agave). Glucose, fructose and lactose are taken as the pure substance: all carbohydrate, nothing else.
 */
export const SUGAR_LABEL_FACTS: Record<
  SugarType,
  {
    carbohydrateG: number;
    proteinG: number;
    fatG: number;
    sodiumMg: number;
    potassiumMg: number;
    calciumMg: number;
    ironMg: number;
  }
> = {
  sucrose: { carbohydrateG: 99.98, proteinG: 0, fatG: 0, sodiumMg: 1, potassiumMg: 2, calciumMg: 1, ironMg: 0.05 },
  glucose: { carbohydrateG: 100, proteinG: 0, fatG: 0, sodiumMg: 0, potassiumMg: 0, calciumMg: 0, ironMg: 0 },
  fructose: { carbohydrateG: 100, proteinG: 0, fatG: 0, sodiumMg: 0, potassiumMg: 0, calciumMg: 0, ironMg: 0 },
  honey: { carbohydrateG: 82.4, proteinG: 0.3, fatG: 0, sodiumMg: 4, potassiumMg: 52, calciumMg: 6, ironMg: 0.42 },
  'maple-syrup': {
    carbohydrateG: 67.04,
    proteinG: 0.04,
    fatG: 0.06,
    sodiumMg: 12,
    potassiumMg: 212,
    calciumMg: 102,
    ironMg: 0.11,
  },
  'agave-syrup': {
    carbohydrateG: 76.37,
    proteinG: 0.09,
    fatG: 0.45,
    sodiumMg: 4,
    potassiumMg: 4,
    calciumMg: 1,
    ironMg: 0.09,
  },
  lactose: { carbohydrateG: 100, proteinG: 0, fatG: 0, sodiumMg: 0, potassiumMg: 0, calciumMg: 0, ironMg: 0 },
};

const SWEETENED =
  /\b(sweetened|syrup|with added sugar|sugared|candied|glazed|frosted|jam|jelly|preserves|marmalade)\b/i;
const UNSWEETENED = /\b(unsweetened|without added sugar|no sugar added)\b/i;
const CONCENTRATE = /\bconcentrate\b/i;

/**
 * Share of an ingredient's sugars that count as added sugars by FDA's definition (21 CFR 101.9(c)(6)(iii)): sugars
 * added in processing (table sugar, honey, syrups), and sugars of juice concentrated beyond single strength; a fruit's
 * own sugars are not. A house ingredient's label says how much; dataset foods are judged by category and name,
 * erring towards declaring more:
 * - sugars, syrups and honey, and baked goods and sweets (the dataset does not split their sugars): all added;
 * - a name that says sweetened, in syrup, jam or candied: all added (the dataset does not split them either);
 * - a concentrate not diluted back: all added (the excess over single strength is not known);
 * - fruit, juice, herbs, spices, dairy and the rest: none.
 * A house ingredient whose label value is missing counts all its sugars as added.
 */
export function addedSugarShare(
  facts: Pick<LabelIngredientFacts, 'name' | 'category' | 'house' | 'sugarsG' | 'addedSugarsG'>,
): {
  share: number;
  basis: 'label' | 'sugar-or-sweet' | 'sweetened' | 'concentrate' | 'own-sugars' | 'house-unknown';
} {
  if (facts.house) {
    if (facts.addedSugarsG === null) return { share: 1, basis: 'house-unknown' };
    const sugars = facts.sugarsG ?? 0;
    return { share: sugars > 0 ? Math.min(1, facts.addedSugarsG / sugars) : 0, basis: 'label' };
  }
  if (facts.category === 'sugar-syrup' || facts.category === 'baked-good') return { share: 1, basis: 'sugar-or-sweet' };
  if (SWEETENED.test(facts.name) && !UNSWEETENED.test(facts.name)) return { share: 1, basis: 'sweetened' };
  if (CONCENTRATE.test(facts.name) && !/\bdiluted\b/i.test(facts.name)) return { share: 1, basis: 'concentrate' };
  return { share: 0, basis: 'own-sugars' };
}

export interface RecipeComposition {
  asFormulated: LitreComposition;
  afterConditioning: LitreComposition;
  /** Fermentable sugar taken as fermented, g/L, and the alcohol it makes, g/L. */
  fermentedSugarGPerL: number;
  ethanolFormedGPerL: number;
  /** For each nutrient, the ingredients with no value for it (counted as nothing: the figure may be low). */
  missing: Partial<Record<LabelNutrient, string[]>>;
  /** Ingredients whose sugars were estimated from their available carbohydrate. */
  sugarsEstimated: string[];
  /** Ingredients counted with all their sugars as added, and why. */
  addedSugarsAssumed: { name: string; basis: ReturnType<typeof addedSugarShare>['basis'] }[];
}

const ZERO = (): LitreComposition =>
  Object.assign(Object.fromEntries(LABEL_NUTRIENTS.map((n) => [n, 0])) as NutrientAmounts, { alcoholG: 0 });

/** Ingredient fields behind each label nutrient, per 100 g (sugars and calories are worked out apart). */
const FIELD_OF: Partial<Record<LabelNutrient, keyof LabelIngredientFacts>> = {
  totalFat: 'fatG',
  saturatedFat: 'saturatedFatG',
  transFat: 'transFatG',
  cholesterol: 'cholesterolMg',
  sodium: 'sodiumMg',
  dietaryFiber: 'fibreG',
  protein: 'proteinG',
  vitaminD: 'vitaminDMcg',
  calcium: 'calciumMg',
  iron: 'ironMg',
  potassium: 'potassiumMg',
};

/**
 * A recipe's nutrients per litre of drink, two ways:
 * - as formulated: the base's residual sugar and alcohol, the added sugars, and each ingredient line (all of it in
 *   the bottle; steeped and strained, every nutrient at the line's share reaching the liquid);
 * - after conditioning: all the fermentable sugar in the liquid fermented at the theoretical yield (the most alcohol
 *   and the fewest sugars it can leave), its alcohol added; the sugar used comes out of the ingredients' own sugars
 *   first, so added sugars stay as high as the total allows.
 * Calories by `caloriesOf`. A value an ingredient lacks counts as nothing and is listed in `missing`.
 */
export function composeRecipe(
  content: RecipeContent,
  bottleLiquidMl: number,
  ingredients: Map<number, LabelIngredientFacts>,
): RecipeComposition {
  const c = ZERO();
  const missing: Partial<Record<LabelNutrient, string[]>> = {};
  const sugarsEstimated: string[] = [];
  const addedSugarsAssumed: RecipeComposition['addedSugarsAssumed'] = [];
  const note = (nutrient: LabelNutrient, name: string) => {
    const list = (missing[nutrient] ??= []);
    if (!list.includes(name)) list.push(name);
  };

  // The base: its residual sugar (added, unless the base says how much of it is) and its alcohol.
  const residual = content.baseBrew.residualSugarGPerL;
  c.totalSugars += residual;
  c.totalCarbohydrate += residual;
  c.addedSugars += Math.min(residual, content.baseBrew.residualAddedSugarGPerL ?? residual);
  c.alcoholG += content.baseBrew.abvPercent * 10 * ETHANOL_DENSITY_20C_G_PER_ML;

  for (const { type, gPerL } of content.sugars) {
    const sugarsG = gPerL * SUGARS[type].sugarFraction;
    const facts = SUGAR_LABEL_FACTS[type];
    c.totalSugars += sugarsG;
    c.addedSugars += sugarsG;
    c.totalCarbohydrate += Math.max(sugarsG, (gPerL * facts.carbohydrateG) / 100);
    c.protein += (gPerL * facts.proteinG) / 100;
    c.totalFat += (gPerL * facts.fatG) / 100;
    c.sodium += (gPerL * facts.sodiumMg) / 100;
    c.potassium += (gPerL * facts.potassiumMg) / 100;
    c.calcium += (gPerL * facts.calciumMg) / 100;
    c.iron += (gPerL * facts.ironMg) / 100;
  }

  const inBottle = content.process.method === 'in-bottle';
  const contributions: IngredientSugar[] = [];
  for (const line of content.lines) {
    const facts = ingredients.get(line.ingredientId);
    const grams = gramsPerLitre({ name: '', amount: line.amount, unit: line.unit as never }, bottleLiquidMl);
    if (!facts) {
      for (const nutrient of LABEL_NUTRIENTS) if (nutrient !== 'calories') note(nutrient, 'Unknown ingredient');
      continue;
    }
    const share = inBottle ? 1 : Math.min(1, Math.max(0, line.extractionPct / 100));
    const contribution = ingredientContribution(facts, grams, { inBottle, extractionShare: share });
    contributions.push(contribution);
    if (facts.sugarsG === null) sugarsEstimated.push(facts.name);
    c.totalSugars += contribution.sugarG;
    const added = addedSugarShare(facts);
    if (added.share > 0 && added.basis !== 'label') addedSugarsAssumed.push({ name: facts.name, basis: added.basis });
    c.addedSugars += contribution.sugarG * added.share;
    if (facts.carbohydrateG === null) note('totalCarbohydrate', facts.name);
    const carbohydratePer100 = facts.carbohydrateG ?? 0;
    c.totalCarbohydrate += Math.max(contribution.sugarG, (grams * carbohydratePer100 * share) / 100);
    for (const [nutrient, field] of Object.entries(FIELD_OF) as [LabelNutrient, keyof LabelIngredientFacts][]) {
      const per100 = facts[field] as number | null;
      if (per100 === null) note(nutrient, facts.name);
      else c[nutrient] += (grams * per100 * share) / 100;
    }
  }
  c.calories = caloriesOf(c);

  const { portions } = fermentableSugars(
    {
      sugars: [{ type: 'sucrose', grams: residual }, ...content.sugars.map((s) => ({ type: s.type, grams: s.gPerL }))],
      ingredients: contributions,
    },
    'expected',
  );
  const fermented = portions.reduce((sum, p) => sum + p.grams, 0);
  const ethanol = fermentationProducts(portions, 1).ethanolG;
  const after: LitreComposition = { ...c };
  after.totalSugars = Math.max(0, c.totalSugars - fermented);
  after.totalCarbohydrate = Math.max(0, c.totalCarbohydrate - fermented);
  after.addedSugars = Math.min(c.addedSugars, after.totalSugars);
  after.alcoholG = c.alcoholG + ethanol;
  after.calories = caloriesOf(after);

  return {
    asFormulated: c,
    afterConditioning: after,
    fermentedSugarGPerL: fermented,
    ethanolFormedGPerL: ethanol,
    missing,
    sugarsEstimated,
    addedSugarsAssumed,
  };
}
