/**
 * Ingredient vocabulary shared by the forms, the server and the importer.
 */
export const CATEGORIES = [
  'fruit',
  'juice',
  'puree',
  'dried-fruit',
  'herb',
  'spice',
  'sugar-syrup',
  'baked-good',
  'dairy',
  'other',
] as const;
export type Category = (typeof CATEGORIES)[number];

export const CATEGORY_LABELS: Record<Category, string> = {
  fruit: 'Fruit',
  juice: 'Juice',
  puree: 'Purée',
  'dried-fruit': 'Dried fruit',
  herb: 'Herb or flower',
  spice: 'Spice',
  'sugar-syrup': 'Sugar or syrup',
  'baked-good': 'Baked good or sweet',
  dairy: 'Dairy',
  other: 'Other',
};

/** The US major food allergens (FALCPA 2004 plus sesame, FASTER Act 2021). */
export const ALLERGENS = [
  'milk',
  'eggs',
  'fish',
  'crustacean-shellfish',
  'tree-nuts',
  'peanuts',
  'wheat',
  'soybeans',
  'sesame',
] as const;
export type Allergen = (typeof ALLERGENS)[number];

export const ALLERGEN_LABELS: Record<Allergen, string> = {
  milk: 'Milk',
  eggs: 'Eggs',
  fish: 'Fish',
  'crustacean-shellfish': 'Crustacean shellfish',
  'tree-nuts': 'Tree nuts',
  peanuts: 'Peanuts',
  wheat: 'Wheat',
  soybeans: 'Soybeans',
  sesame: 'Sesame',
};

/**
 * Share of an ingredient's sugars that yeast can ferment, by category. Fruit sugars and sucrose ferment fully;
 * milk's sugar is lactose, which brewing yeasts do not ferment (from memory), so dairy starts at 0.
 */
export const DEFAULT_FERMENTABLE_SHARE: Record<Category, number> = {
  fruit: 1,
  juice: 1,
  puree: 1,
  'dried-fruit': 1,
  herb: 1,
  spice: 1,
  'sugar-syrup': 1,
  'baked-good': 1,
  dairy: 0,
  other: 1,
};

/**
 * Share of an ingredient's sugar that reaches the liquid when it is steeped and strained, by category.
 * Common practice, no source: liquids and dissolved sugars pass entirely; whole or dried fruit gives up about
 * half its sugar in a cold steep of a few days; purée most of it. A developer sets the real figure per recipe.
 */
export const DEFAULT_STEEP_SHARE: Record<Category, number> = {
  fruit: 0.5,
  juice: 1,
  puree: 0.8,
  'dried-fruit': 0.5,
  herb: 0.5,
  spice: 0.5,
  'sugar-syrup': 1,
  'baked-good': 0.6,
  dairy: 1,
  other: 0.5,
};

/** A household measure: "1 cup" weighs `grams`. */
export interface Measure {
  label: string;
  grams: number;
}
