import { AIR_GASES, bunsenCoefficient } from './air';
import { ATM_BAR, MOLAR_VOLUME_STP_L, R_L_ATM, ZERO_C_K } from './constants';
import { co2SolubilityMolPerKgAtm } from './solubility';
import { waterDensityGPerL, waterVapourPressureAtm } from './water';

export const PSI_PER_BAR = 14.503773773; // NIST SP 811: 1 psi = 6.894757 kPa

/** A sealed container: its liquid and the gas space above it, both measured when the cap goes on, and that temperature. */
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
  /** CO2 dissolved in the liquid at this temperature, volumes (L at 0 °C, 1 atm per L of liquid as filled). */
  dissolvedVolumes: number;
  /** The gas space left at this temperature once the liquid has expanded or shrunk, mL. */
  headspaceMl: number;
  /**
   * True when the warmed liquid fills the bottle. The pressure then is no longer set by the gases: the liquid presses
   * on the glass directly and the figure above (the gases' pressure with no headspace) is far below the real one.
   */
  liquidFills: boolean;
}

/**
 * Liquid and gas space at `tempC`. The liquid expands as water does (its density, Tanaka et al. 2001); the glass is
 * taken not to expand, which leaves less room and so errs high (soda-lime glass grows by about 3 × 9·10⁻⁶ of its volume
 * per kelvin, a tenth of water's 2·10⁻⁴ near 20 °C; from memory).
 */
export function volumesAt(
  container: Container,
  tempC: number,
): { liquidMl: number; headspaceMl: number; liquidFills: boolean } {
  const liquidMl = (container.liquidMl * waterDensityGPerL(container.sealedTempC)) / waterDensityGPerL(tempC);
  const headspaceMl = container.liquidMl + container.headspaceMl - liquidMl;
  return { liquidMl, headspaceMl: Math.max(0, headspaceMl), liquidFills: headspaceMl <= 0 };
}

/** kg of liquid in the container (taken as water's density at the sealing temperature). */
const liquidKg = (container: Container) =>
  (container.liquidMl / 1000) * (waterDensityGPerL(container.sealedTempC) / 1000);

/**
 * Partial pressure of the sealed-in air at `tempC`, atm. When the cap goes on, the headspace holds air and water
 * vapour at 1 atm and the liquid is saturated with that air. Each of air's gases then shares its fixed amount between
 * the liquid (Bunsen coefficient, Weiss 1970) and the headspace (ideal gas) at every temperature, so the pressure does
 * not vanish as the headspace goes to zero.
 */
export function airPartialAtm(container: Container, tempC: number, now = volumesAt(container, tempC)): number {
  const sealedK = container.sealedTempC + ZERO_C_K;
  const dryAirAtm = 1 - waterVapourPressureAtm(container.sealedTempC);
  const sealedLiquidL = container.liquidMl / 1000;
  const sealedGasL = container.headspaceMl / 1000;
  const liquidL = now.liquidMl / 1000;
  const gasL = now.headspaceMl / 1000;
  const k = tempC + ZERO_C_K;
  let total = 0;
  for (const gas of AIR_GASES) {
    const sealedAtm = gas.moleFraction * dryAirAtm;
    const mol =
      (bunsenCoefficient(gas, container.sealedTempC) * sealedAtm * sealedLiquidL) / MOLAR_VOLUME_STP_L +
      (sealedAtm * sealedGasL) / (R_L_ATM * sealedK);
    total += mol / ((bunsenCoefficient(gas, tempC) * liquidL) / MOLAR_VOLUME_STP_L + gasL / (R_L_ATM * k));
  }
  return total;
}

/** mol of CO2 the container holds per atm of CO2 partial pressure at `tempC`: dissolved (Henry, Weiss 1974) plus headspace (ideal gas). */
function co2CapacityMolPerAtm(container: Container, tempC: number, now = volumesAt(container, tempC)): number {
  const gasL = now.headspaceMl / 1000;
  return co2SolubilityMolPerKgAtm(tempC) * liquidKg(container) + gasL / (R_L_ATM * (tempC + ZERO_C_K));
}

/**
 * Equilibrium in a sealed container holding `totalCo2Mol` of CO2 (dissolved and in the headspace together) at
 * `tempC`. Henry's law for the liquid, ideal gas for the headspace, the liquid's expansion shrinking the headspace;
 * the total pressure is CO2 + sealed-in air + water vapour, and the gauge reading is that less 1 atm.
 */
export function equilibriumAt(container: Container, totalCo2Mol: number, tempC: number): Equilibrium {
  // The liquid's volume at this temperature, worked out once for the CO2, the air and the answer.
  const now = volumesAt(container, tempC);
  const co2PartialAtm = totalCo2Mol / co2CapacityMolPerAtm(container, tempC, now);
  const totalAtm = co2PartialAtm + airPartialAtm(container, tempC, now) + waterVapourPressureAtm(tempC);
  const gaugeBar = (totalAtm - 1) * ATM_BAR;
  return {
    tempC,
    co2PartialAtm,
    gaugeBar,
    gaugePsi: gaugeBar * PSI_PER_BAR,
    dissolvedVolumes:
      (co2SolubilityMolPerKgAtm(tempC) * liquidKg(container) * co2PartialAtm * MOLAR_VOLUME_STP_L) /
      (container.liquidMl / 1000),
    headspaceMl: now.headspaceMl,
    liquidFills: now.liquidFills,
  };
}

/**
 * The most CO2 (mol) the container may hold so that its gauge pressure at `tempC` stays at or below `gaugeBar`; none
 * when the warmed liquid fills the bottle there.
 */
export function maxCo2MolForGauge(container: Container, gaugeBar: number, tempC: number): number {
  const now = volumesAt(container, tempC);
  if (now.liquidFills) return 0;
  const allowedCo2Atm = gaugeBar / ATM_BAR + 1 - airPartialAtm(container, tempC, now) - waterVapourPressureAtm(tempC);
  return Math.max(0, allowedCo2Atm * co2CapacityMolPerAtm(container, tempC, now));
}

/**
 * Whether the liquid fills the bottle at any of `temperaturesC`: the temperature at which it first does (found by
 * bisection on water's density between the sealing temperature and the coolest filling temperature above it), and the
 * least headspace that keeps a gas space at all of them in a bottle of the same brimful volume. Null when a gas
 * space remains at every temperature.
 */
export function liquidFills(
  container: Container,
  temperaturesC: number[],
): { tempC: number; leastHeadspaceMl: number } | null {
  const filling = temperaturesC.filter((t) => volumesAt(container, t).liquidFills);
  if (filling.length === 0) return null;
  const brimfulMl = container.liquidMl + container.headspaceMl;
  const sealedDensity = waterDensityGPerL(container.sealedTempC);
  // Filled at the sealing temperature, V mL of liquid takes V·ρ(sealed)/ρ(T) mL at T; it fits when that is at most the
  // brimful volume, so the headspace must be at least brimful × (1 − ρ(T)/ρ(sealed)).
  const leastHeadspaceMl = Math.max(
    0,
    ...temperaturesC.map((t) => brimfulMl * (1 - waterDensityGPerL(t) / sealedDensity)),
  );
  const warmer = filling.filter((t) => t > container.sealedTempC);
  if (warmer.length === 0 || volumesAt(container, container.sealedTempC).liquidFills)
    return { tempC: Math.min(...filling), leastHeadspaceMl };
  let low = container.sealedTempC;
  let high = Math.min(...warmer);
  for (let i = 0; i < 40; i++) {
    const mid = (low + high) / 2;
    if (volumesAt(container, mid).liquidFills) high = mid;
    else low = mid;
  }
  return { tempC: high, leastHeadspaceMl };
}

/** mol of CO2 in `liquidMl` of liquid carrying `volumes` volumes of CO2. */
export function volumesToMol(volumes: number, liquidMl: number): number {
  return (volumes * liquidMl) / 1000 / MOLAR_VOLUME_STP_L;
}

/** Volumes of CO2 that `mol` of CO2 make in `liquidMl` of liquid. */
export function molToVolumes(mol: number, liquidMl: number): number {
  return liquidMl > 0 ? (mol * MOLAR_VOLUME_STP_L * 1000) / liquidMl : 0;
}
