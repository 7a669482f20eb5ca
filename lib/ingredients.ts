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

/**
 * Nutrients a Nutrition Facts panel needs beyond those the sugar and fat checks use, per 100 g of the ingredient (null:
 * not measured, never zero). Dataset foods take them from the SR25 abbreviated file (trans fat and added sugars are not
 * in it); house ingredients from their label. The one list the model, the migration, the importer and the form read.
 */
export const LABEL_NUTRIENT_FIELDS = [
  'saturatedFatG',
  'transFatG',
  'cholesterolMg',
  'sodiumMg',
  'addedSugarsG',
  'vitaminDMcg',
  'calciumMg',
  'ironMg',
  'potassiumMg',
] as const;
export type LabelNutrientField = (typeof LABEL_NUTRIENT_FIELDS)[number];
export type LabelNutrientValues = Record<LabelNutrientField, number | null>;

/** What each field is called in forms and on the ingredient's page, with its unit. */
export const LABEL_NUTRIENT_FIELD_INFO: Record<LabelNutrientField, { label: string; unit: 'g' | 'mg' | 'mcg' }> = {
  saturatedFatG: { label: 'Saturated fat', unit: 'g' },
  transFatG: { label: 'Trans fat', unit: 'g' },
  cholesterolMg: { label: 'Cholesterol', unit: 'mg' },
  sodiumMg: { label: 'Sodium', unit: 'mg' },
  addedSugarsG: { label: 'Added sugars', unit: 'g' },
  vitaminDMcg: { label: 'Vitamin D', unit: 'mcg' },
  calciumMg: { label: 'Calcium', unit: 'mg' },
  ironMg: { label: 'Iron', unit: 'mg' },
  potassiumMg: { label: 'Potassium', unit: 'mg' },
};

/** A household measure: "1 cup" weighs `grams`. */
export interface Measure {
  label: string;
  grams: number;
}

/** Parts of a dataset description that say how it was sold or prepared, not what it is (dropped from short names). */
const PREPARATION =
  /^(raw|fresh|uncooked|plain|common|canned|bottled|canned or bottled|commercially prepared|prepared|enriched flour|all .*|with(out)? .*|includes .*|\d.*)$/i;
/** Leading words that name a class, with the thing itself in the next part ("Spices, cardamom"). */
const CLASS_WORDS: Record<string, string | null> = {
  spices: null,
  spice: null,
  sweetener: null,
  sweeteners: null,
  sugars: 'sugar',
  syrups: 'syrup',
};

/**
 * A short name a person reads, made from a dataset's long description: "Cookies, shortbread, commercially prepared,
 * plain" → "Shortbread cookies", "Spices, cinnamon, ground" → "Ground cinnamon", "Syrups, maple" → "Maple syrup". The
 * first describing part goes before the head noun, the others that tell kinds apart after it ("Frozen strawberries,
 * unsweetened"); how it was sold or packed ("raw", "canned", "commercially prepared") and bracketed synonyms are
 * dropped. A brewery can replace it; the full description stays on the ingredient.
 */
export function shortIngredientName(description: string): string {
  let parts = description
    .replace(/\([^)]*\)?/g, '')
    .split(',')
    .map((p) => p.trim())
    .filter(Boolean);
  let head = parts[0] ?? description.trim();
  const klass = CLASS_WORDS[head.toLowerCase()];
  if (klass !== undefined && parts.length > 1) {
    parts = parts.slice(1);
    head = klass === null ? parts[0] : `${parts[0]} ${klass}`;
    return withDescriber(head, parts.slice(1));
  }
  return withDescriber(head, parts.slice(1));
}

function withDescriber(head: string, rest: string[]): string {
  const kept = rest.filter((p) => !PREPARATION.test(p));
  const [describer, ...more] = kept;
  // A describer that names the thing itself ("Cookies, graham crackers") stands alone.
  const itself = describer !== undefined && /\s/.test(describer) && /s$/i.test(describer);
  const named = describer ? (itself ? describer : `${describer} ${head.toLowerCase()}`) : head;
  // What else tells two kinds apart ("reduced fat", "unsweetened") follows after a comma.
  const name = [named, ...more].join(', ');
  const short = name.charAt(0).toUpperCase() + name.slice(1);
  return short.length > 80 ? `${short.slice(0, 79)}…` : short;
}
