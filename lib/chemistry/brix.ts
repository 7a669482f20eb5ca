import { waterDensityGPerL } from './water';

/**
 * Specific gravity (20 °C/20 °C) of a sucrose solution of `brix` °Bx (g sucrose per 100 g solution).
 * The widely used fit SG = 1 + B / (258.6 − 227.1·B/258.2) (from memory); the tests check it against the
 * CRC Handbook's table of sucrose solution densities.
 */
export function brixToSpecificGravity(brix: number): number {
  return 1 + brix / (258.6 - (brix / 258.2) * 227.1);
}

/** °Bx of a sucrose solution of the given specific gravity (20/20 °C), the exact inverse of brixToSpecificGravity. */
export function specificGravityToBrix(specificGravity: number): number {
  if (specificGravity <= 1) return 0;
  let low = 0;
  let high = 95;
  for (let i = 0; i < 60; i++) {
    const mid = (low + high) / 2;
    if (brixToSpecificGravity(mid) < specificGravity) low = mid;
    else high = mid;
  }
  return (low + high) / 2;
}

/** Grams of sugar per litre of a sucrose solution at 20 °C: °Bx/100 × its density. */
export function brixToSugarGPerL(brix: number): number {
  return (brix / 100) * brixToSpecificGravity(brix) * waterDensityGPerL(20);
}

/** Why a reading of a fermented drink is only an estimate (shown wherever a reading is converted). */
export const READING_CAUTION =
  'Acids and alcohol change refractometer and hydrometer readings of fermented tea, so sugar from a reading is an estimate.';
