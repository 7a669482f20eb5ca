import { ETHANOL_DENSITY_20C_G_PER_ML, M_CO2, M_ETHANOL } from './constants';

/**
 * Share of the theoretical yield reached in practice ("expected" case). Pasteur found about 95 % of fermented
 * sugar as ethanol and CO2, the rest going to glycerol, succinic acid and yeast growth (from memory; the classic
 * figure quoted in winemaking texts). The worst case uses 1: all fermentable sugar converted.
 */
export const EXPECTED_YIELD = 0.95;

export type YieldCase = 'worst' | 'expected';

export const yieldFactor = (which: YieldCase) => (which === 'worst' ? 1 : EXPECTED_YIELD);

/** A portion of fermentable sugar with its stoichiometry. */
export interface FermentableSugar {
  /** Grams of sugar that yeast can ferment. */
  grams: number;
  /** g/mol of the sugar as counted. */
  molarMass: number;
  /** Moles of CO2, and equally of ethanol, per mole of sugar (4 for sucrose with its water, 2 for a hexose). */
  co2PerMole: number;
}

/**
 * CO2 and ethanol from fermenting sugar, in grams (Gay-Lussac: C6H12O6 → 2 C2H5OH + 2 CO2;
 * C12H22O11 + H2O → 4 C2H5OH + 4 CO2), scaled by the yield factor (0–1).
 */
export function fermentationProducts(
  sugars: FermentableSugar[],
  yieldFactorValue: number,
): { co2Mol: number; co2G: number; ethanolG: number } {
  const moles = sugars.reduce((sum, s) => sum + (s.grams / s.molarMass) * s.co2PerMole, 0) * yieldFactorValue;
  return { co2Mol: moles, co2G: moles * M_CO2, ethanolG: moles * M_ETHANOL };
}

/** % ABV of `ethanolG` grams of ethanol in `liquidMl` of drink, by ethanol's density at 20 °C. */
export function abvPercent(ethanolG: number, liquidMl: number): number {
  if (liquidMl <= 0) return 0;
  return (ethanolG / ETHANOL_DENSITY_20C_G_PER_ML / liquidMl) * 100;
}
