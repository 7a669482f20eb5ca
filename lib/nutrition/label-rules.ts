/**
 * The US rules for a Nutrition Facts panel (21 CFR 101.9 and 101.12): which nutrients it declares, their daily
 * values, how each amount is rounded, and how big a serving is. Pure: amounts in, declared strings out. Each rule
 * names its paragraph; tests check them at every boundary the paragraphs name.
 */

/** The nutrients of the panel, in the order 21 CFR 101.9(d) lists them. */
export const LABEL_NUTRIENTS = [
  'calories',
  'totalFat',
  'saturatedFat',
  'transFat',
  'cholesterol',
  'sodium',
  'totalCarbohydrate',
  'dietaryFiber',
  'totalSugars',
  'addedSugars',
  'protein',
  'vitaminD',
  'calcium',
  'iron',
  'potassium',
] as const;
export type LabelNutrient = (typeof LABEL_NUTRIENTS)[number];
/** Amounts of every label nutrient, each in its unit (NUTRIENT_UNITS). */
export type NutrientAmounts = Record<LabelNutrient, number>;

export type NutrientUnit = 'kcal' | 'g' | 'mg' | 'mcg';

export const NUTRIENT_UNITS: Record<LabelNutrient, NutrientUnit> = {
  calories: 'kcal',
  totalFat: 'g',
  saturatedFat: 'g',
  transFat: 'g',
  cholesterol: 'mg',
  sodium: 'mg',
  totalCarbohydrate: 'g',
  dietaryFiber: 'g',
  totalSugars: 'g',
  addedSugars: 'g',
  protein: 'g',
  vitaminD: 'mcg',
  calcium: 'mg',
  iron: 'mg',
  potassium: 'mg',
};

/** The names the panel prints (21 CFR 101.9(c) and (d)), US spelling as the rule has it. */
export const NUTRIENT_NAMES: Record<LabelNutrient, string> = {
  calories: 'Calories',
  totalFat: 'Total Fat',
  saturatedFat: 'Saturated Fat',
  transFat: 'Trans Fat',
  cholesterol: 'Cholesterol',
  sodium: 'Sodium',
  totalCarbohydrate: 'Total Carbohydrate',
  dietaryFiber: 'Dietary Fiber',
  totalSugars: 'Total Sugars',
  addedSugars: 'Added Sugars',
  protein: 'Protein',
  vitaminD: 'Vitamin D',
  calcium: 'Calcium',
  iron: 'Iron',
  potassium: 'Potassium',
};

/**
 * Daily values for adults and children 4 years and older: DRVs of 21 CFR 101.9(c)(9) (fat 78 g, saturated fat 20 g,
 * cholesterol 300 mg, sodium 2,300 mg, total carbohydrate 275 g, dietary fiber 28 g, added sugars 50 g, protein 50 g)
 * and RDIs of 101.9(c)(8)(iv) (vitamin D 20 mcg, calcium 1,300 mg, iron 18 mg, potassium 4,700 mg). Trans fat and
 * total sugars have none; protein's %DV is left off, as 101.9(c)(7)(i) allows unless a protein claim is made.
 */
export const DAILY_VALUES: Partial<Record<LabelNutrient, number>> = {
  totalFat: 78,
  saturatedFat: 20,
  cholesterol: 300,
  sodium: 2300,
  totalCarbohydrate: 275,
  dietaryFiber: 28,
  addedSugars: 50,
  vitaminD: 20,
  calcium: 1300,
  iron: 18,
  potassium: 4700,
};

/** The vitamins and minerals, whose %DV follows 101.9(c)(8)(iii) rather than (d)(7)(ii). */
export const VITAMINS_AND_MINERALS: readonly LabelNutrient[] = ['vitaminD', 'calcium', 'iron', 'potassium'];

/** One declared amount: the text the panel prints and the number it stands for (null for "less than" texts). */
export interface Declared {
  text: string;
  value: number | null;
}

/**
 * `value` to the nearest multiple of `step`, halves going up ("nearest increment" as FDA's labeling guide reads it:
 * 2.50 to 2.99 rounds up). The small allowance keeps 0.1 + 0.2 style float noise from deciding a half.
 */
export function nearest(value: number, step: number): number {
  const steps = Math.floor(value / step + 0.5 + 1e-9);
  return Number((steps * step).toFixed(6));
}

const grams = (value: number): Declared => ({ text: `${value} g`, value });

/** Calories, 101.9(c)(1): below 5 as 0; to 50 in 5-calorie steps; above 50 in 10-calorie steps. */
export function declareCalories(kcal: number): Declared {
  const value = kcal < 5 ? 0 : kcal <= 50 ? nearest(kcal, 5) : nearest(kcal, 10);
  return { text: String(value), value };
}

/**
 * Total, saturated and trans fat, 101.9(c)(2), (c)(2)(i) and (c)(2)(ii): below 0.5 g as 0; below 5 g in 0.5 g
 * steps; from 5 g in 1 g steps.
 */
export function declareFat(g: number): Declared {
  return grams(g < 0.5 ? 0 : g < 5 ? nearest(g, 0.5) : nearest(g, 1));
}

/** Cholesterol, 101.9(c)(3): below 2 mg as 0; 2 to 5 mg "less than 5 mg"; above 5 mg in 5 mg steps. */
export function declareCholesterol(mg: number): Declared {
  if (mg < 2) return { text: '0 mg', value: 0 };
  if (mg <= 5) return { text: 'less than 5 mg', value: null };
  const value = nearest(mg, 5);
  return { text: `${value} mg`, value };
}

/** Sodium, 101.9(c)(4): below 5 mg as 0; 5 to 140 mg in 5 mg steps; above 140 mg in 10 mg steps. */
export function declareSodium(mg: number): Declared {
  const value = mg < 5 ? 0 : mg <= 140 ? nearest(mg, 5) : nearest(mg, 10);
  return { text: `${value} mg`, value };
}

/**
 * Total carbohydrate, dietary fiber, total and added sugars, 101.9(c)(6), (c)(6)(i)–(iii), and protein, (c)(7):
 * below 0.5 g as 0; below 1 g "less than 1 g"; from 1 g in 1 g steps.
 */
export function declareGramsToWhole(g: number): Declared {
  if (g < 0.5) return grams(0);
  if (g < 1) return { text: 'less than 1 g', value: null };
  return grams(nearest(g, 1));
}

/**
 * Quantitative amounts of vitamin D, calcium, iron and potassium. Below 2 % of the RDI they may be declared as zero
 * (101.9(c)(8)(iii)), which is done here. Above it, FDA's guidance on the quantitative amounts (December 2019, as
 * summarised by label-software publishers; not the regulation's own words): an RDI under 25 units to the nearest
 * 0.1 (vitamin D 20 mcg, iron 18 mg); an RDI of 250 or more to the nearest 10 (calcium 1,300 mg, potassium 4,700 mg).
 */
export function declareVitaminOrMineral(nutrient: LabelNutrient, amount: number): Declared {
  const unit = NUTRIENT_UNITS[nutrient];
  const rdi = DAILY_VALUES[nutrient]!;
  if ((amount / rdi) * 100 < 2) return { text: `0 ${unit}`, value: 0 };
  const value = rdi < 25 ? nearest(amount, 0.1) : rdi < 250 ? nearest(amount, 1) : nearest(amount, 10);
  return { text: `${value} ${unit}`, value };
}

/** The declared amount of any label nutrient, by its paragraph of 101.9(c). */
export function declareAmount(nutrient: LabelNutrient, amount: number): Declared {
  const safe = Math.max(0, amount);
  switch (nutrient) {
    case 'calories':
      return declareCalories(safe);
    case 'totalFat':
    case 'saturatedFat':
    case 'transFat':
      return declareFat(safe);
    case 'cholesterol':
      return declareCholesterol(safe);
    case 'sodium':
      return declareSodium(safe);
    case 'vitaminD':
    case 'calcium':
    case 'iron':
    case 'potassium':
      return declareVitaminOrMineral(nutrient, safe);
    default:
      return declareGramsToWhole(safe);
  }
}

/**
 * Percent of the daily value, or null where the panel shows none (calories, trans fat, total sugars, protein).
 * Vitamins and minerals, 101.9(c)(8)(iii): below 2 % as 0 (the zero the rule allows); up to and including 10 % in
 * 2 % steps, above 10 % up to and including 50 % in 5 % steps, above 50 % in 10 % steps, from the actual amount.
 * Other nutrients, 101.9(d)(7)(ii): to the nearest 1 %, from the declared amount (the rule allows either the declared
 * or the actual amount; the declared one keeps "0 g" beside "0%"); a "less than" declaration uses the actual amount.
 */
export function percentDailyValue(nutrient: LabelNutrient, amount: number, declared: Declared): string | null {
  const dv = DAILY_VALUES[nutrient];
  if (dv === undefined) return null;
  if (VITAMINS_AND_MINERALS.includes(nutrient)) {
    const pct = (Math.max(0, amount) / dv) * 100;
    const value = pct < 2 ? 0 : pct <= 10 ? nearest(pct, 2) : pct <= 50 ? nearest(pct, 5) : nearest(pct, 10);
    return `${value}%`;
  }
  const basis = declared.value ?? Math.max(0, amount);
  return `${nearest((basis / dv) * 100, 1)}%`;
}

// ---------------------------------------------------------------- serving size

/** Reference amount customarily consumed for beverages, 21 CFR 101.12(b) table 2: 360 mL (12 fl oz). */
export const BEVERAGE_RACC_ML = 360;
/** 1 fl oz is 30 mL for nutrition labeling, 21 CFR 101.9(b)(5)(viii). */
export const LABEL_ML_PER_FL_OZ = 30;

export type PanelLayout = 'single-serving' | 'dual-column' | 'per-serving';

export interface Serving {
  servingMl: number;
  containerMl: number;
  /** Servings per container as declared (rounded by 101.9(b)(8)). */
  servingsPerContainer: number;
  /** "1 serving per container", "about 2 servings per container". */
  servingsText: string;
  /** The household measure and the metric one: "1 bottle" and "473 mL", or "12 fl oz" and "360 mL". */
  household: string;
  metric: string;
  layout: PanelLayout;
  /** The container as a share of the reference amount, % (for the notes). */
  shareOfReferencePct: number;
}

const flOz = (ml: number) => {
  const oz = ml / LABEL_ML_PER_FL_OZ;
  return Number.isInteger(oz) ? String(oz) : String(nearest(oz, 0.5));
};

/**
 * Servings per container, 101.9(b)(8)(i): between 2 and 5 to the nearest 0.5 serving, otherwise to the nearest whole
 * serving; "about" when rounding changed the number.
 */
export function servingsPerContainer(exact: number): { value: number; text: string } {
  const value = exact >= 2 && exact <= 5 ? nearest(exact, 0.5) : Math.max(1, nearest(exact, 1));
  const about = Math.abs(value - exact) > 1e-9 ? 'about ' : '';
  return { value, text: `${about}${value} serving${value === 1 ? '' : 's'} per container` };
}

/**
 * The serving and the panel's layout for a container of `containerMl` (a beverage, so the reference amount is
 * 360 mL):
 * - under 200 % of it, the container is one serving (101.9(b)(6)): "1 bottle (473 mL)";
 * - from 200 % up to and including 300 %, a serving is the reference amount and the panel has two columns, per
 *   serving and per container (101.9(b)(12)(i));
 * - above 300 %, a serving is the reference amount and the panel gives it alone.
 * A serving asked for (`servingMl`) replaces the reference amount where the container holds several; a one-serving
 * container stays one serving.
 */
export function servingFor(containerMl: number, servingMl?: number | null): Serving {
  const share = containerMl / BEVERAGE_RACC_ML;
  const shareOfReferencePct = Number((share * 100).toFixed(1));
  if (share < 2) {
    return {
      servingMl: containerMl,
      containerMl,
      servingsPerContainer: 1,
      servingsText: '1 serving per container',
      household: '1 bottle',
      metric: `${Math.round(containerMl)} mL`,
      layout: 'single-serving',
      shareOfReferencePct,
    };
  }
  const serving = servingMl ?? BEVERAGE_RACC_ML;
  const servings = servingsPerContainer(containerMl / serving);
  return {
    servingMl: serving,
    containerMl,
    servingsPerContainer: servings.value,
    servingsText: servings.text,
    household: `${flOz(serving)} fl oz`,
    metric: `${Math.round(serving)} mL`,
    layout: share <= 3 ? 'dual-column' : 'per-serving',
    shareOfReferencePct,
  };
}
