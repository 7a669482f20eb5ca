import { M_HEXOSE, M_SUCROSE } from './constants';

/** Sugars a recipe can add by weight. */
export const SUGAR_TYPES = [
  'sucrose',
  'glucose',
  'fructose',
  'honey',
  'maple-syrup',
  'agave-syrup',
  'lactose',
] as const;
export type SugarType = (typeof SUGAR_TYPES)[number];

export interface SugarInfo {
  label: string;
  /** Grams of sugars per gram of the product as weighed. */
  sugarFraction: number;
  /** Share of those sugars that yeast can ferment (0–1). */
  fermentableShare: number;
  /** Molar mass of the sugar (g/mol) and moles of CO2 (and of ethanol) per mole when fully fermented. */
  molarMass: number;
  co2PerMole: number;
  source: string;
}

/**
 * What each sugar brings. Mixed sugars (honey, syrups, fruit) are counted with sucrose's yield per gram, the
 * highest of the common sugars (0.514 g CO2/g against 0.489 for a hexose), so that the worst case stays a worst case.
 */
export const SUGARS: Record<SugarType, SugarInfo> = {
  sucrose: {
    label: 'Sucrose (table sugar)',
    sugarFraction: 1,
    fermentableShare: 1,
    molarMass: M_SUCROSE,
    co2PerMole: 4,
    source: 'C12H22O11 + H2O → 4 C2H5OH + 4 CO2',
  },
  glucose: {
    label: 'Glucose (dextrose)',
    sugarFraction: 1,
    fermentableShare: 1,
    molarMass: M_HEXOSE,
    co2PerMole: 2,
    source: 'C6H12O6 → 2 C2H5OH + 2 CO2',
  },
  fructose: {
    label: 'Fructose',
    sugarFraction: 1,
    fermentableShare: 1,
    molarMass: M_HEXOSE,
    co2PerMole: 2,
    source: 'C6H12O6 → 2 C2H5OH + 2 CO2',
  },
  honey: {
    label: 'Honey',
    sugarFraction: 0.8212,
    fermentableShare: 1,
    molarMass: M_SUCROSE,
    co2PerMole: 4,
    source: 'USDA SR25 NDB 19296 (honey): 82.12 g total sugars per 100 g',
  },
  'maple-syrup': {
    label: 'Maple syrup',
    sugarFraction: 0.679,
    fermentableShare: 1,
    molarMass: M_SUCROSE,
    co2PerMole: 4,
    source: 'USDA SR25 NDB 19353 (syrups, maple): 67.90 g total sugars per 100 g',
  },
  'agave-syrup': {
    label: 'Agave syrup',
    sugarFraction: 0.6803,
    fermentableShare: 1,
    molarMass: M_SUCROSE,
    co2PerMole: 4,
    source: 'USDA SR25 NDB 19912 (sweetener, syrup, agave): 68.03 g total sugars per 100 g',
  },
  lactose: {
    label: 'Lactose (sweetness only)',
    sugarFraction: 1,
    fermentableShare: 0,
    molarMass: M_SUCROSE,
    co2PerMole: 4,
    // From memory.
    source: 'Saccharomyces and the usual kombucha yeasts do not ferment lactose',
  },
};

/** Grams of CO2 per gram of a fermentable sugar at theoretical yield (Gay-Lussac stoichiometry). */
export function co2GramsPerGram(molarMass: number, co2PerMole: number, mCo2: number): number {
  return (co2PerMole * mCo2) / molarMass;
}

/** The sugars as a picker lists them: short names, in the order of SUGAR_TYPES. */
export const SHORT_SUGAR_LABELS: Record<SugarType, string> = {
  sucrose: 'Sucrose',
  glucose: 'Glucose',
  fructose: 'Fructose',
  honey: 'Honey',
  'maple-syrup': 'Maple syrup',
  'agave-syrup': 'Agave syrup',
  lactose: 'Lactose',
};
export const SUGAR_OPTIONS = SUGAR_TYPES.map((type) => ({ value: type, label: SHORT_SUGAR_LABELS[type] }));
