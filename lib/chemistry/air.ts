import { ZERO_C_K } from './constants';

/**
 * The gases of dry air that dissolve in the liquid before it is sealed, with their share of dry air by volume
 * (U.S. Standard Atmosphere 1976, table 3: N2 78.084 %, O2 20.9476 %, Ar 0.934 %; the 0.04 % of CO2 is left to the
 * CO2 balance) and the coefficients of their solubility in fresh water.
 *
 * Solubility: Weiss, R. F. (1970), "The solubility of nitrogen, oxygen and argon in water and seawater",
 * Deep-Sea Research 17:721–735, equation 4 with the Bunsen-coefficient constants of its Table 2 and salinity 0:
 * ln β = A1 + A2·(100/T) + A3·ln(T/100), β in litres of gas at 0 °C and 1 atm per litre of water per atm.
 * Fitted for −2 to 40 °C.
 */
export const AIR_GASES = [
  { gas: 'N2', moleFraction: 0.78084, a1: -59.6274, a2: 85.7661, a3: 24.3696 },
  { gas: 'O2', moleFraction: 0.209476, a1: -58.3877, a2: 85.8079, a3: 23.8439 },
  { gas: 'Ar', moleFraction: 0.00934, a1: -55.6578, a2: 82.0262, a3: 22.5929 },
] as const;

export type AirGas = (typeof AIR_GASES)[number];

/** Bunsen coefficient of one of air's gases in fresh water at `tempC` (Weiss 1970). */
export function bunsenCoefficient(gas: AirGas, tempC: number): number {
  const t100 = (tempC + ZERO_C_K) / 100;
  return Math.exp(gas.a1 + gas.a2 / t100 + gas.a3 * Math.log(t100));
}
