import type { PrimingResult } from '@/lib/chemistry/carbonation';
import { targetAdvice } from '@/lib/recipes/target';

// Only the fields the helper reads; the rest of a priming answer does not matter here.
const answer = (over: Partial<PrimingResult>) =>
  ({
    safeSugarG: 3.054,
    targetReachable: true,
    limitedBy: null,
    addedAbvPercent: 0.42,
    ratingShare: 0.8,
    ...over,
  }) as PrimingResult;

describe('the sugar for the target fizz', () => {
  it('adds what the base and the ingredients do not bring', () => {
    // By hand: 3.054 g in 500 mL = 6.108 g/L in all; the recipe has 10 g/L fermentable of which 6 g/L is added
    // sugar, so the base and the ingredients bring 4 g/L and 2.108 g/L is to add, rounded down to 2.10.
    const advice = targetAdvice(answer({}), 500, 10, 6);
    expect(advice.totalGPerL).toBeCloseTo(6.108, 6);
    expect(advice.fromOthersGPerL).toBe(4);
    expect(advice.addGPerL).toBe(2.1);
    expect(advice.ratingSharePercent).toBe(80);
  });

  it('adds nothing when the base and the ingredients already bring more than is safe', () => {
    // 1.5 g in 500 mL = 3 g/L is the most that is safe; fruit alone brings 4 g/L.
    const advice = targetAdvice(answer({ safeSugarG: 1.5, targetReachable: false, limitedBy: 'pressure' }), 500, 4, 0);
    expect(advice.addGPerL).toBe(0);
    expect(advice.reachable).toBe(false);
  });
});
