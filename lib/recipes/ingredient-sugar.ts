import type { IngredientSugar } from '@/lib/chemistry/carbonation';

/** What the sugar and fat of one ingredient line are worked out from, per 100 g of the ingredient. */
export interface IngredientNutrients {
  name: string;
  sugarsG: number | null;
  carbohydrateG: number | null;
  fibreG: number | null;
  fatG: number | null;
  /** Share of its sugars that yeast can ferment (0–1). */
  fermentableShare: number;
}

/**
 * The sugar and fat one ingredient line brings into one bottle: the one place this is worked out, for the Quick
 * check, the recipe evaluation and the card.
 *
 * - In the bottle, all of its sugar reaches the liquid. Steeped and strained, the expected case takes the
 *   developer's extraction share and the worst case (which drives findings and approval) all of it.
 * - Sugars not measured are never zero: the worst case counts the available carbohydrate (carbohydrate minus
 *   fibre), which errs high, and says so; with no carbohydrate either, the line is marked unknown (a danger finding).
 * - Fat counts whether the ingredient is steeped or left in the bottle (it goes rancid either way).
 */
export function ingredientContribution(
  facts: IngredientNutrients,
  grams: number,
  how: { inBottle: boolean; extractionShare: number },
): IngredientSugar {
  const per100 =
    facts.sugarsG ?? (facts.carbohydrateG !== null ? Math.max(0, facts.carbohydrateG - (facts.fibreG ?? 0)) : 0);
  const sugarBasis: IngredientSugar['sugarBasis'] =
    facts.sugarsG !== null ? 'measured' : facts.carbohydrateG !== null ? 'available-carbohydrate' : 'unknown';
  const allSugarG = grams * (per100 / 100);
  const share = how.inBottle ? 1 : Math.min(1, Math.max(0, how.extractionShare));
  return {
    name: facts.name,
    sugarG: allSugarG * share,
    worstSugarG: allSugarG,
    fermentableShare: facts.fermentableShare,
    fatG: grams * ((facts.fatG ?? 0) / 100),
    inBottle: how.inBottle,
    sugarBasis,
  };
}
