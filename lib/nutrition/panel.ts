import { ETHANOL_DENSITY_20C_G_PER_ML } from '@/lib/chemistry/constants';
import { type Allergen, ALLERGEN_LABELS } from '@/lib/ingredients';

import { caloriesOf, type LitreComposition, type RecipeComposition } from './composition';
import {
  declareAmount,
  LABEL_NUTRIENTS,
  type LabelNutrient,
  NUTRIENT_NAMES,
  NUTRIENT_UNITS,
  type NutrientAmounts,
  percentDailyValue,
  type Serving,
} from './label-rules';

/** One basis of the panel (as formulated, after conditioning, or from the lab) for one serving or one container. */
export interface NutritionBasis {
  /** Amounts before rounding, each in its unit (kcal, g, mg, mcg), with the alcohol behind part of the calories. */
  perServing: NutrientAmounts & { alcoholG: number };
  /** What the panel declares: "15", "4 g", "less than 1 g", "0 mg". */
  label: Record<LabelNutrient, string>;
  /** "5%" for the nutrients that have a daily value. */
  percentDailyValue: Partial<Record<LabelNutrient, string>>;
}

/** Lab values per 100 mL of the finished drink, as an owner enters them (any nutrient may be left out). */
export type LabValues = Partial<Record<LabelNutrient, number>>;

export interface LabEntry {
  per100Ml: LabValues;
  reference: string;
  enteredBy: string | null;
  enteredAt: string;
}

export interface NutritionAnswer {
  recipeId: number;
  version: number;
  recipeName: string;
  bottleName: string;
  servingMl: number;
  servingsPerContainer: number;
  serving: Serving;
  asFormulated: NutritionBasis;
  afterConditioning: NutritionBasis;
  /** The after-conditioning estimate with the lab's values put in, when an owner entered some. */
  lab: (NutritionBasis & LabEntry & { fromLab: LabelNutrient[] }) | null;
  /** The basis to put on a package draft: the lab's when there is one. */
  declared: 'lab' | 'afterConditioning';
  /** Per container, for a panel with two columns (21 CFR 101.9(b)(12)(i)). */
  perContainer?: { asFormulated: NutritionBasis; afterConditioning: NutritionBasis; lab: NutritionBasis | null };
  abvPercent: { asFormulated: number; afterConditioning: number };
  allergens: Allergen[];
  /** "Contains: Wheat, Milk", or null when no major allergen is known. */
  allergenStatement: string | null;
  notes: string[];
}

/** A basis for `ml` of drink from its composition per litre. */
export function basisFor(perLitre: LitreComposition, ml: number): NutritionBasis {
  const factor = ml / 1000;
  const perServing = Object.fromEntries(
    Object.entries(perLitre).map(([k, v]) => [k, Number((v * factor).toPrecision(8))]),
  ) as NutritionBasis['perServing'];
  const label = {} as NutritionBasis['label'];
  const percent: NutritionBasis['percentDailyValue'] = {};
  for (const nutrient of LABEL_NUTRIENTS) {
    const declared = declareAmount(nutrient, perServing[nutrient]);
    label[nutrient] = declared.text;
    const dv = percentDailyValue(nutrient, perServing[nutrient], declared);
    if (dv !== null) percent[nutrient] = dv;
  }
  return { perServing, label, percentDailyValue: percent };
}

/**
 * The after-conditioning composition with the lab's values (per 100 mL) put in their place. Calories the lab did not
 * give are worked out again from the merged fat, carbohydrate, protein and the estimated alcohol.
 */
export function withLabValues(estimate: LitreComposition, per100Ml: LabValues): LitreComposition {
  const merged: LitreComposition = { ...estimate };
  for (const nutrient of LABEL_NUTRIENTS) {
    const value = per100Ml[nutrient];
    if (value !== undefined && value !== null) merged[nutrient] = value * 10;
  }
  if (per100Ml.calories === undefined || per100Ml.calories === null) merged.calories = caloriesOf(merged);
  return merged;
}

/** What the allergen statement cannot know: said wherever the statement is shown. */
export const ALLERGEN_CAUTION =
  'Allergens come from the ingredient library’s major allergens. Cross-contact in your kitchen and your suppliers’ own statements are yours to check; name the species of any fish, shellfish or tree nut, as the rule requires.';

/** "Contains: Wheat, Milk" from the allergens in the order their ingredients first appear; null when none. */
export function allergenStatement(allergens: Allergen[]): string | null {
  if (allergens.length === 0) return null;
  return `Contains: ${allergens.map((a) => ALLERGEN_LABELS[a]).join(', ')}`;
}

// ---------------------------------------------------------------- the panel's lines, for every way of drawing it

/** One line of a drawn panel, in the order and with the emphasis of 21 CFR 101.9(d). */
export interface PanelLine {
  nutrient: Exclude<LabelNutrient, 'calories'>;
  /** Name as printed ("Total Fat"; added sugars read "Includes 10 g Added Sugars" with the amount inside). */
  name: string;
  amount: string;
  dv: string | null;
  indent: 0 | 1 | 2;
  bold: boolean;
  /** A thick rule goes above vitamin D, separating the vitamins and minerals. */
  thickRuleAbove: boolean;
  perContainer?: { amount: string; dv: string | null };
}

const INDENT: Partial<Record<LabelNutrient, 1 | 2>> = {
  saturatedFat: 1,
  transFat: 1,
  dietaryFiber: 1,
  totalSugars: 1,
  addedSugars: 2,
};
const BOLD = new Set<LabelNutrient>(['totalFat', 'cholesterol', 'sodium', 'totalCarbohydrate', 'protein']);

/** The lines of a panel for one basis (and, for two columns, the same basis per container). */
export function panelLines(basis: NutritionBasis, perContainer?: NutritionBasis): PanelLine[] {
  return LABEL_NUTRIENTS.filter((n): n is PanelLine['nutrient'] => n !== 'calories').map((nutrient) => {
    const added = nutrient === 'addedSugars';
    const text = (b: NutritionBasis) => (added ? `Includes ${b.label.addedSugars} Added Sugars` : b.label[nutrient]);
    return {
      nutrient,
      name: added ? text(basis) : NUTRIENT_NAMES[nutrient],
      amount: added ? '' : basis.label[nutrient],
      dv: basis.percentDailyValue[nutrient] ?? null,
      indent: INDENT[nutrient] ?? 0,
      bold: BOLD.has(nutrient),
      thickRuleAbove: nutrient === 'vitaminD',
      perContainer: perContainer
        ? { amount: text(perContainer), dv: perContainer.percentDailyValue[nutrient] ?? null }
        : undefined,
    };
  });
}

/** The footnote of 21 CFR 101.9(d)(9), as the rule words it for the general population. */
export const DV_FOOTNOTE =
  '* The % Daily Value (DV) tells you how much a nutrient in a serving of food contributes to a daily diet. 2,000 calories a day is used for general nutrition advice.';

/** What each basis is called where people read it. */
export const BASIS_NAMES = {
  asFormulated: 'As formulated (estimate)',
  afterConditioning: 'After conditioning (estimate)',
  lab: 'From the lab',
} as const;
export type BasisKey = keyof typeof BASIS_NAMES;

/** The basis a drawing shows, with its per-container twin when the panel has two columns. */
export function basisOf(
  answer: NutritionAnswer,
  key: BasisKey,
): { basis: NutritionBasis; perContainer?: NutritionBasis } {
  const basis = key === 'lab' && answer.lab ? answer.lab : answer[key === 'lab' ? 'afterConditioning' : key];
  const twin = answer.perContainer ? (answer.perContainer[key] ?? answer.perContainer.afterConditioning) : undefined;
  return { basis, perContainer: twin ?? undefined };
}

// ---------------------------------------------------------------- CSV

const csvCell = (value: string | number) => {
  const text = String(value);
  return /[",\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
};

/**
 * The panel's values as CSV for a label designer: one row per basis and nutrient, with the amount per 100 mL and per
 * serving before rounding, the declared amount and %DV, and the same per container for a two-column panel.
 */
export function nutritionCsv(answer: NutritionAnswer): string {
  const header = [
    'basis',
    'nutrient',
    'unit',
    'per_100_ml',
    'per_serving',
    'declared_per_serving',
    'percent_dv_per_serving',
    'per_container',
    'declared_per_container',
    'percent_dv_per_container',
  ];
  const rows: (string | number)[][] = [header];
  const keys: BasisKey[] = answer.lab
    ? ['lab', 'afterConditioning', 'asFormulated']
    : ['afterConditioning', 'asFormulated'];
  for (const key of keys) {
    const { basis, perContainer } = basisOf(answer, key);
    for (const nutrient of LABEL_NUTRIENTS) {
      const perServing = basis.perServing[nutrient];
      rows.push([
        key,
        NUTRIENT_NAMES[nutrient],
        NUTRIENT_UNITS[nutrient],
        Number(((perServing / answer.servingMl) * 100).toPrecision(6)),
        Number(perServing.toPrecision(6)),
        basis.label[nutrient],
        basis.percentDailyValue[nutrient] ?? '',
        perContainer ? Number(perContainer.perServing[nutrient].toPrecision(6)) : '',
        perContainer ? perContainer.label[nutrient] : '',
        perContainer ? (perContainer.percentDailyValue[nutrient] ?? '') : '',
      ]);
    }
  }
  return `${rows.map((r) => r.map(csvCell).join(',')).join('\r\n')}\r\n`;
}

/** Everything the composition says that a reader of the panel must know, in plain words. */
export function compositionNotes(composition: RecipeComposition, options: { steeped: boolean }): string[] {
  const notes: string[] = [];
  for (const [nutrient, list] of Object.entries(composition.missing) as [LabelNutrient, string[]][]) {
    notes.push(
      `${NUTRIENT_NAMES[nutrient]}: no value for ${list.join(', ')}; counted as nothing, so the figure may be low.`,
    );
  }
  if (composition.sugarsEstimated.length > 0)
    notes.push(
      `Sugars of ${composition.sugarsEstimated.join(', ')} are not measured: their available carbohydrate counts as sugars.`,
    );
  for (const { name, basis } of composition.addedSugarsAssumed) {
    const why =
      basis === 'house-unknown'
        ? 'its label value for added sugars is not entered'
        : basis === 'concentrate'
          ? 'a concentrate’s sugars beyond single strength are added sugars, and the dataset does not say how much that is'
          : basis === 'sweetened'
            ? 'it is sweetened and the dataset does not split its own sugars from the added ones'
            : 'sugars, syrups, honey and sweet baked goods are added sugars';
    notes.push(`All the sugars of ${name} count as added sugars: ${why}.`);
  }
  if (options.steeped)
    notes.push(
      'Steeped and strained: every nutrient of an ingredient counts at the share of its sugar the recipe says reaches the liquid.',
    );
  return notes;
}

/** The ABV of a composition per litre, % (ethanol's density at 20 °C). */
const abvOf = (perLitre: LitreComposition) => perLitre.alcoholG / ETHANOL_DENSITY_20C_G_PER_ML / 10;

export interface NutritionInput {
  recipeId: number;
  version: number;
  recipeName: string;
  bottleName: string;
  containerMl: number;
  serving: Serving;
  /** The serving asked for, when it differs from the rule's. */
  servingAskedMl: number | null;
  composition: RecipeComposition;
  steeped: boolean;
  allergens: Allergen[];
  lab: LabEntry | null;
  abvLimitPercent: number;
}

/**
 * The answer of `GET /api/recipes/:id/nutrition`: both estimated bases for the serving (and the container, for two
 * columns), the lab's values where an owner entered them, the allergen statement and every note a reader needs.
 */
export function buildNutrition(input: NutritionInput): NutritionAnswer {
  const { composition, serving } = input;
  const labPerLitre =
    input.lab && Object.values(input.lab.per100Ml).some((v) => v !== null && v !== undefined)
      ? withLabValues(composition.afterConditioning, input.lab.per100Ml)
      : null;
  const fromLab = labPerLitre
    ? LABEL_NUTRIENTS.filter((n) => input.lab!.per100Ml[n] !== null && input.lab!.per100Ml[n] !== undefined)
    : [];
  const twoColumns = serving.layout === 'dual-column';
  const abvAfter = abvOf(composition.afterConditioning);
  const notes = [
    'These are estimates from the ingredient table. Values on a package must come from lab analysis of the finished drink: an owner enters the lab’s values per 100 mL below, and they replace the estimate.',
    `After conditioning: all ${round1(composition.fermentedSugarGPerL)} g/L of fermentable sugar is taken as fermented at the theoretical yield, making ${round1(composition.ethanolFormedGPerL)} g/L of alcohol (${round2(abvAfter)} % ABV in all), counted at 7 kcal/g. That is the most alcohol and the least sugar conditioning can leave.`,
    'Sugar used in conditioning comes out of the ingredients’ own sugars first, so Added Sugars stays as high as Total Sugars allows; declaring less needs records of what fermentation used (21 CFR 101.9(g)(10); from memory).',
    'Calories by the general factors of 21 CFR 101.9(c)(1)(i)(B) (4 kcal/g protein and carbohydrate, 9 kcal/g fat) and 7 kcal/g alcohol.',
    ...compositionNotes(composition, { steeped: input.steeped }),
    'Vitamin D, calcium, iron and potassium under 2 % of the daily value are declared as 0, as 21 CFR 101.9(c)(8)(iii) allows.',
    ALLERGEN_CAUTION,
  ];
  if (serving.layout === 'single-serving')
    notes.push(
      `The bottle holds ${serving.shareOfReferencePct} % of the 360 mL reference amount: under 200 % it is one serving (21 CFR 101.9(b)(6)).`,
    );
  else if (twoColumns)
    notes.push(
      `The bottle holds ${serving.shareOfReferencePct} % of the 360 mL reference amount: from 200 % to 300 % the panel gives a serving and the whole container side by side (21 CFR 101.9(b)(12)(i)).`,
    );
  if (input.servingAskedMl !== null && input.servingAskedMl !== serving.servingMl)
    notes.push(
      `A serving of ${input.servingAskedMl} mL was asked, but a bottle under 200 % of the reference amount is one serving: the panel shows the whole bottle.`,
    );
  else if (input.servingAskedMl !== null && input.servingAskedMl !== 360)
    notes.push(
      `The serving is ${input.servingAskedMl} mL as asked, not the 360 mL reference amount of 21 CFR 101.12(b).`,
    );
  if (abvAfter >= input.abvLimitPercent)
    notes.push(
      `At ${round2(abvAfter)} % ABV after conditioning the drink reaches the brewery's alcohol limit (${input.abvLimitPercent} %): a drink of 0.5 % ABV or more is labelled under the alcohol beverage rules, which this panel does not cover.`,
    );
  if (labPerLitre) {
    const estimated = LABEL_NUTRIENTS.filter((n) => !fromLab.includes(n));
    if (estimated.length > 0)
      notes.push(`Not in the lab’s values, so still estimated: ${estimated.map((n) => NUTRIENT_NAMES[n]).join(', ')}.`);
  }
  const container = serving.containerMl;
  return {
    recipeId: input.recipeId,
    version: input.version,
    recipeName: input.recipeName,
    bottleName: input.bottleName,
    servingMl: serving.servingMl,
    servingsPerContainer: serving.servingsPerContainer,
    serving,
    asFormulated: basisFor(composition.asFormulated, serving.servingMl),
    afterConditioning: basisFor(composition.afterConditioning, serving.servingMl),
    lab: labPerLitre && input.lab ? { ...basisFor(labPerLitre, serving.servingMl), ...input.lab, fromLab } : null,
    declared: labPerLitre ? 'lab' : 'afterConditioning',
    perContainer: twoColumns
      ? {
          asFormulated: basisFor(composition.asFormulated, container),
          afterConditioning: basisFor(composition.afterConditioning, container),
          lab: labPerLitre ? basisFor(labPerLitre, container) : null,
        }
      : undefined,
    abvPercent: { asFormulated: round2(abvOf(composition.asFormulated)), afterConditioning: round2(abvAfter) },
    allergens: input.allergens,
    allergenStatement: allergenStatement(input.allergens),
    notes,
  };
}

const round1 = (v: number) => Math.round(v * 10) / 10;
const round2 = (v: number) => Math.round(v * 100) / 100;
