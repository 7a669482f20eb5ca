/**
 * Physical constants and molar masses used by the engine, each with its source.
 * Molar masses from the IUPAC 2021 standard atomic weights (abridged): C 12.011, H 1.008, O 15.999.
 */

/** g/mol, C12H22O11. */
export const M_SUCROSE = 12 * 12.011 + 22 * 1.008 + 11 * 15.999;
/** g/mol, C6H12O6 (glucose and fructose). */
export const M_HEXOSE = 6 * 12.011 + 12 * 1.008 + 6 * 15.999;
/** g/mol, C12H22O11 (lactose, same formula as sucrose). */
export const M_LACTOSE = M_SUCROSE;
/** g/mol, C2H5OH. */
export const M_ETHANOL = 2 * 12.011 + 6 * 1.008 + 15.999;
/** g/mol, CO2. */
export const M_CO2 = 12.011 + 2 * 15.999;

/** Molar gas constant in L·atm/(mol·K) (CODATA 2018: 8.314462618 J/(mol·K) ÷ 101.325 J/(L·atm)). */
export const R_L_ATM = 8.314462618 / 101.325;

/** Molar volume of an ideal gas at 0 °C and 1 atm, L/mol (CODATA 2018: 22.413 969 54 L/mol). */
export const MOLAR_VOLUME_STP_L = 22.41396954;

/** 0 °C in kelvin. */
export const ZERO_C_K = 273.15;

/** 1 standard atmosphere in bar (exact by definition: 101 325 Pa). */
export const ATM_BAR = 1.01325;

/** Density of ethanol at 20 °C, g/mL (CRC Handbook of Chemistry and Physics, "Physical constants of organic compounds"). */
export const ETHANOL_DENSITY_20C_G_PER_ML = 0.78924;

/** Mass of one "volume" of CO2: 1 L of ideal gas at 0 °C and 1 atm, in grams (M_CO2 / molar volume). */
export const CO2_G_PER_VOLUME = M_CO2 / MOLAR_VOLUME_STP_L;
