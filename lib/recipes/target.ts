import type { PrimingResult } from '@/lib/chemistry/carbonation';

export interface TargetAdvice {
  /** False when the target is beyond the brewery's share of the rating or the alcohol limit. */
  reachable: boolean;
  limitedBy: PrimingResult['limitedBy'];
  /** Fermentable sugar the target needs in all (or the most that is safe when it cannot be reached), g/L. */
  totalGPerL: number;
  /** What the base and the ingredients already bring, g/L. */
  fromOthersGPerL: number;
  /** Sucrose to add, g/L: never more than the most that is safe, rounded down to 0.01 g/L so rounding cannot cross it. */
  addGPerL: number;
  addedAbvPercent: number;
  ratingSharePercent: number;
}

/**
 * The sucrose a recipe adds to reach its target fizz. `priming` answers the whole sugar a litre needs (or the most
 * that is safe); the base and the ingredients bring part of it, the added sucrose the rest. `currentAddedGPerL` is the
 * fermentable added sugar the recipe has now, which the helper replaces.
 */
export function targetAdvice(
  priming: PrimingResult,
  liquidMl: number,
  fermentableGPerL: number,
  currentAddedGPerL: number,
): TargetAdvice {
  const fromOthersGPerL = fermentableGPerL - Math.max(0, currentAddedGPerL);
  const totalGPerL = (priming.safeSugarG / liquidMl) * 1000;
  return {
    reachable: priming.targetReachable,
    limitedBy: priming.limitedBy,
    totalGPerL,
    fromOthersGPerL,
    addGPerL: Math.floor(Math.max(0, totalGPerL - fromOthersGPerL) * 100) / 100,
    addedAbvPercent: priming.addedAbvPercent,
    ratingSharePercent: priming.ratingShare * 100,
  };
}
