import { ATM_BAR, MOLAR_VOLUME_STP_L, R_L_ATM, ZERO_C_K } from './constants';
import { co2SolubilityMolPerLAtm } from './solubility';
import { waterVapourPressureAtm } from './water';

export const PSI_PER_BAR = 14.503773773; // NIST SP 811: 1 psi = 6.894757 kPa

/** A sealed container: its liquid, the gas space above it, and the temperature at which it was closed. */
export interface Container {
  liquidMl: number;
  headspaceMl: number;
  sealedTempC: number;
}

export interface Equilibrium {
  tempC: number;
  /** Partial pressure of CO2 in the headspace, atm absolute. */
  co2PartialAtm: number;
  /** Pressure above atmospheric that a gauge on the bottle would read. */
  gaugeBar: number;
  gaugePsi: number;
  /** CO2 dissolved in the liquid at this temperature, volumes (L at 0 °C, 1 atm per L of liquid). */
  dissolvedVolumes: number;
}

/**
 * Partial pressure of the air sealed into the headspace, atm, at `tempC`. The headspace is taken as air plus
 * water vapour at 1 atm when the cap goes on; the air then behaves as an ideal gas of fixed amount and volume.
 */
function airPartialAtm(container: Container, tempC: number): number {
  if (container.headspaceMl <= 0) return 0;
  const sealedK = container.sealedTempC + ZERO_C_K;
  return (1 - waterVapourPressureAtm(container.sealedTempC)) * ((tempC + ZERO_C_K) / sealedK);
}

/** mol of CO2 the container holds per atm of CO2 partial pressure at `tempC`: dissolved (Henry) plus headspace (ideal gas). */
function co2CapacityMolPerAtm(container: Container, tempC: number): number {
  const liquidL = container.liquidMl / 1000;
  const gasL = container.headspaceMl / 1000;
  return co2SolubilityMolPerLAtm(tempC) * liquidL + gasL / (R_L_ATM * (tempC + ZERO_C_K));
}

/**
 * Equilibrium in a sealed container holding `totalCo2Mol` of CO2 (dissolved and in the headspace together) at
 * `tempC`. Henry's law with Weiss (1974) for the liquid, ideal gas for the headspace; the total pressure is
 * CO2 + sealed-in air + water vapour, and the gauge reading is that less 1 atm.
 */
export function equilibriumAt(container: Container, totalCo2Mol: number, tempC: number): Equilibrium {
  const co2PartialAtm = totalCo2Mol / co2CapacityMolPerAtm(container, tempC);
  const totalAtm = co2PartialAtm + airPartialAtm(container, tempC) + waterVapourPressureAtm(tempC);
  const gaugeBar = (totalAtm - 1) * ATM_BAR;
  return {
    tempC,
    co2PartialAtm,
    gaugeBar,
    gaugePsi: gaugeBar * PSI_PER_BAR,
    dissolvedVolumes: co2SolubilityMolPerLAtm(tempC) * co2PartialAtm * MOLAR_VOLUME_STP_L,
  };
}

/** The most CO2 (mol) the container may hold so that its gauge pressure at `tempC` stays at or below `gaugeBar`. */
export function maxCo2MolForGauge(container: Container, gaugeBar: number, tempC: number): number {
  const allowedCo2Atm = gaugeBar / ATM_BAR + 1 - airPartialAtm(container, tempC) - waterVapourPressureAtm(tempC);
  return Math.max(0, allowedCo2Atm * co2CapacityMolPerAtm(container, tempC));
}

/** mol of CO2 in `liquidMl` of liquid carrying `volumes` volumes of CO2. */
export function volumesToMol(volumes: number, liquidMl: number): number {
  return (volumes * liquidMl) / 1000 / MOLAR_VOLUME_STP_L;
}

/** Volumes of CO2 that `mol` of CO2 make in `liquidMl` of liquid. */
export function molToVolumes(mol: number, liquidMl: number): number {
  return liquidMl > 0 ? (mol * MOLAR_VOLUME_STP_L * 1000) / liquidMl : 0;
}
