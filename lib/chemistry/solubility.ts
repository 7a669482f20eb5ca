import { MOLAR_VOLUME_STP_L, ZERO_C_K } from './constants';
import { waterDensityGPerL } from './water';

/**
 * Solubility of CO2 in fresh water (Henry's law constant K0) in mol/(kg·atm).
 * Weiss, R. F. (1974), "Carbon dioxide in water and seawater: the solubility of a non-ideal gas",
 * Marine Chemistry 2:203–215, equation 12 with the mol/(kg·atm) coefficients of its Table 1 and salinity 0:
 * ln K0 = −60.2409 + 93.4517·(100/T) + 23.3585·ln(T/100). Fitted for −1 to 40 °C.
 */
export function co2SolubilityMolPerKgAtm(tempC: number): number {
  const t100 = (tempC + ZERO_C_K) / 100;
  return Math.exp(-60.2409 + 93.4517 / t100 + 23.3585 * Math.log(t100));
}

/** The same solubility per litre of liquid, mol/(L·atm), using the density of water at that temperature. */
export function co2SolubilityMolPerLAtm(tempC: number): number {
  return (co2SolubilityMolPerKgAtm(tempC) * waterDensityGPerL(tempC)) / 1000;
}

/**
 * Volumes of CO2 (litres of gas at 0 °C and 1 atm per litre of liquid) dissolved at equilibrium with a CO2
 * partial pressure of `partialPressureAtm` at `tempC`. At 1 atm this is the Bunsen coefficient.
 */
export function dissolvedVolumes(tempC: number, partialPressureAtm: number): number {
  return co2SolubilityMolPerLAtm(tempC) * partialPressureAtm * MOLAR_VOLUME_STP_L;
}

/**
 * CO2 left in a liquid that last stood open to the air at `tempC`: saturation under 1 atm of CO2.
 * Common practice, no source: a fermenting or freshly fermented liquid keeps a blanket of CO2 over it, so it is
 * taken as saturated at 1 atm of CO2 rather than at the 0.04 % of CO2 in air.
 */
export function residualVolumesAfterOpen(tempC: number): number {
  return dissolvedVolumes(tempC, 1);
}
