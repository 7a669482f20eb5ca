import {
  type CarbonationInput,
  computeCarbonation,
  computePriming,
  residualVolumes,
} from '@/lib/chemistry/carbonation';

// A 500 mL bottle with 2.5 g of sucrose, sealed at 20 °C, nothing said about the CO2 already in the base.
const bottle: CarbonationInput = {
  liquidMl: 500,
  headspaceMl: 25,
  sugars: [{ type: 'sucrose', grams: 2.5 }],
  ingredients: [],
  residualCo2Volumes: null,
  lastOpenTempC: null,
  sealedTempC: 20,
  temperaturesC: [4, 20, 35],
  maxWorkingPressureBar: 3,
  baseAbvPercent: 0,
  yield: 'worst',
  abvLimitPercent: 0.5,
};

describe('residual CO2 of the base when it is not given', () => {
  it('is saturation under 1 atm at the sealing temperature, never zero', () => {
    // Bunsen coefficient of CO2 in water at 20 °C: 0.878 L/L (Lange's Handbook of Chemistry, from memory);
    // at 4 °C about 1.50 L/L (same table, between 0 °C 1.713 and 5 °C 1.424).
    expect(residualVolumes(bottle)).toBeCloseTo(0.878, 1);
    expect(residualVolumes({ ...bottle, sealedTempC: 4 })).toBeGreaterThan(1.4);
    expect(residualVolumes({ ...bottle, residualCo2Volumes: 0 })).toBe(0);
  });

  it('raises the answer above the zero-residual one by the saturation volumes, and says so', () => {
    const unknown = computeCarbonation(bottle);
    const zero = computeCarbonation({ ...bottle, residualCo2Volumes: 0 });
    // By hand: 2.5 g sucrose in 0.5 L = 5 g/L × 0.51428 g CO2/g ÷ 1.9635 g/L per volume = 1.3096 volumes from sugar;
    // with the base saturated at 20 °C (0.878) the total is about 2.19 volumes.
    expect(zero.co2.totalVolumes).toBeCloseTo(1.3096, 3);
    expect(unknown.co2.totalVolumes).toBeCloseTo(1.3096 + 0.878, 1);
    expect(unknown.pressures[2].gaugeBar).toBeGreaterThan(zero.pressures[2].gaugeBar + 1);
    expect(unknown.assumptions[0].name).toMatch(/Residual CO2 of the base \(not given\)/);
    expect(
      computeCarbonation({ ...bottle, residualCo2Volumes: 0.5 }).assumptions.some((a) => /not given/.test(a.name)),
    ).toBe(false);
  });

  it('asks less sugar for a target and allows less at most, in the priming helper', () => {
    const priming = {
      liquidMl: 500,
      headspaceMl: 25,
      targetVolumes: 2.5,
      sugarType: 'sucrose' as const,
      sealedTempC: 20,
      highestTempC: 35,
      maxWorkingPressureBar: 3,
      baseAbvPercent: 0,
      abvLimitPercent: 0.5,
      yield: 'worst' as const,
    };
    const unknown = computePriming(priming);
    const zero = computePriming({ ...priming, residualCo2Volumes: 0 });
    // By hand: (2.5 − 0.878) volumes × 1.9635 g/L ÷ 0.51428 × 0.5 L = 3.10 g, against 2.5 × 1.9635 ÷ 0.51428 × 0.5 = 4.77 g.
    expect(zero.sugarG).toBeCloseTo(4.77, 1);
    expect(unknown.sugarG).toBeCloseTo(3.1, 1);
    expect(unknown.maxSafeSugarG!).toBeLessThan(zero.maxSafeSugarG!);
    expect(unknown.assumptions).toHaveLength(1);
  });
});

describe('alcohol exactly at the limit', () => {
  // 27 CFR 7.1 (and 26 U.S.C. 5052 for beer): a malt beverage is one of "0.5 percent or more of alcohol by volume".
  // By hand: sucrose → 4 ethanol per C12H22O11, 4 × 46.069 / 342.30 = 0.53834 g ethanol per g; ÷ 0.78924 g/mL
  // (CRC) = 0.68210 mL per g. In 1 L, x g of sucrose add 0.068210·x % ABV, so 0.5 % needs 7.3303 g.
  const oneLitre: CarbonationInput = {
    ...bottle,
    liquidMl: 1000,
    headspaceMl: 40,
    residualCo2Volumes: 0,
    maxWorkingPressureBar: 20,
    baseAbvPercent: 0,
    temperaturesC: [20],
  };
  const level = (grams: number) =>
    computeCarbonation({ ...oneLitre, sugars: [{ type: 'sucrose', grams }] }).findings.find((f) =>
      f.code.startsWith('alcohol'),
    )!;

  it('is danger at 0.500 % and just above; caution from 80 % of it (0.400 %)', () => {
    expect(level(7.3303).level).toBe('danger');
    expect(level(7.3303).values!.worstTotalAbvPercent).toBeCloseTo(0.5, 3);
    expect(level(7.32).level).toBe('caution');
    // 0.4 % ÷ 0.068210 = 5.8642 g: at 80 % of the limit a caution, just under it ok.
    expect(level(5.8643).level).toBe('caution');
    expect(level(5.85).level).toBe('ok');
  });
});

describe('temperatures the model does not cover', () => {
  // Weiss (1974) fitted the solubility equation from −1 to 40 °C.
  const codes = (temperaturesC: number[]) =>
    computeCarbonation({ ...bottle, temperaturesC }).findings.map((f) => f.code);

  it('gives a caution above 40 °C and a freezing caution below 0 °C, none at 0 and 40 °C', () => {
    expect(codes([0, 40])).not.toContain('temperature-out-of-range');
    expect(codes([0, 40])).not.toContain('freezing');
    expect(codes([40.5])).toContain('temperature-out-of-range');
    expect(codes([-1])).toEqual(expect.arrayContaining(['temperature-out-of-range', 'freezing']));
  });
});

describe('pH of the base', () => {
  // Public-health guidance for kombucha: pH 4.2 or below (FDA Food Code 2022, kombucha variances under 3-502.11,
  // from memory); 4.0 up to 4.2 a caution (common practice, no source).
  const ph = (value: number | null, phRequired = false) =>
    computeCarbonation({ ...bottle, ph: value, phRequired }).findings.find((f) => f.code.startsWith('ph-'));

  it('is danger just above 4.2, caution at 4.2 and from 4.0, ok below 4.0', () => {
    expect(ph(4.21)?.level).toBe('danger');
    expect(ph(4.2)?.level).toBe('caution');
    expect(ph(4.0)?.level).toBe('caution');
    expect(ph(3.99)?.level).toBe('ok');
  });

  it('is a caution when missing on a version for review, and says nothing while designing', () => {
    expect(ph(null, true)).toMatchObject({ level: 'caution', code: 'ph-missing' });
    expect(ph(null)).toBeUndefined();
  });
});

describe('the warm day', () => {
  it('is checked when every asked temperature is colder, and the findings are judged there', () => {
    const cold = computeCarbonation({ ...bottle, temperaturesC: [4, 10], warmDayTempC: 35 });
    expect(cold.warmDayTempC).toBe(35);
    expect(cold.pressures.map((p) => p.tempC)).toEqual([4, 10, 35]);
    expect(cold.findings.find((f) => f.code.startsWith('pressure'))!.values!.tempC).toBe(35);
    // Already asked at or above it: nothing is added.
    expect(computeCarbonation({ ...bottle, temperaturesC: [4, 38], warmDayTempC: 35 }).warmDayTempC).toBeNull();
  });

  it('judges the most sugar of the priming helper at the hotter of the highest temperature and the warm day', () => {
    const priming = {
      liquidMl: 500,
      headspaceMl: 25,
      targetVolumes: 2.5,
      sugarType: 'sucrose' as const,
      residualCo2Volumes: 0,
      sealedTempC: 20,
      highestTempC: 20,
      maxWorkingPressureBar: 3,
      baseAbvPercent: 0,
      abvLimitPercent: 0.5,
      yield: 'worst' as const,
    };
    const warm = computePriming({ ...priming, warmDayTempC: 35 });
    expect(warm.checkedTempC).toBe(35);
    // Gas is less soluble when warm, so the bottle takes less sugar at 35 °C than at 20 °C.
    expect(warm.maxSafeSugarG!).toBeLessThan(computePriming(priming).maxSafeSugarG!);
  });
});

describe('the most sugar a bottle takes', () => {
  const priming = {
    liquidMl: 1000,
    headspaceMl: 40,
    targetVolumes: 2.5,
    sugarType: 'sucrose' as const,
    residualCo2Volumes: 0,
    sealedTempC: 20,
    highestTempC: 20,
    maxWorkingPressureBar: 20,
    baseAbvPercent: 0,
    abvLimitPercent: 0.5,
    yield: 'worst' as const,
  };

  it('stays below the alcohol limit: 7.3303 g of sucrose per litre is 0.500 % ABV, so the most is just under it', () => {
    // By hand (see "alcohol exactly at the limit" above): 0.5 % ÷ 0.068210 % per g = 7.3303 g in 1 L.
    const result = computePriming({ ...priming, targetVolumes: 4 });
    expect(result.limitedBy).toBe('alcohol');
    expect(result.safeSugarG).toBeLessThan(7.3303);
    expect(result.safeSugarG).toBeGreaterThan(7.3303 * 0.99);
    expect(result.findings.find((f) => f.code === 'target-over-alcohol-limit')?.level).toBe('danger');
  });

  it('fills the target itself when it is within both limits', () => {
    // By hand: 2.5 volumes × 1.9635 g/L ÷ 0.51428 = 9.545 g/L — over the alcohol limit; 1.5 volumes need 5.727 g/L.
    const result = computePriming({ ...priming, targetVolumes: 1.5 });
    expect(result.targetReachable).toBe(true);
    expect(result.safeSugarG).toBeCloseTo(5.727, 2);
  });
});

describe('what a new person sees first', () => {
  // The opening states are ok, so that a caution or danger on screen always comes from something the person changed.
  it('the Quick check opens ok, its sugar helper included', () => {
    const { initialQuickCheckValues, toCarbonationRequest, toPrimingRequest } =
      require('@/lib/quick-check') as typeof import('@/lib/quick-check');
    const values = initialQuickCheckValues('metric');
    const carbonation = toCarbonationRequest(values, 'metric').request!;
    const levels = computeCarbonation({
      ...carbonation,
      ingredients: [],
      abvLimitPercent: 0.5,
      maxWorkingPressureBar: carbonation.maxWorkingPressureBar,
      warmDayTempC: 35,
    } as CarbonationInput).findings.map((f) => f.level);
    expect(new Set(levels)).toEqual(new Set(['ok']));
    const priming = toPrimingRequest(values, 'metric').request!;
    const helper = computePriming({ ...priming, abvLimitPercent: 0.5, warmDayTempC: 35 } as Parameters<
      typeof computePriming
    >[0]);
    expect(helper.findings.every((f) => f.level === 'ok')).toBe(true);
  });

  it('a new recipe opens ok in a 3 bar crown-cap bottle', () => {
    const { evaluateRecipe } = require('@/lib/recipes/evaluate') as typeof import('@/lib/recipes/evaluate');
    const { defaultContent } = require('@/lib/recipes/stages') as typeof import('@/lib/recipes/stages');
    for (const method of ['in-bottle', 'steep-strain'] as const) {
      const result = evaluateRecipe(
        defaultContent(1, method),
        { liquidMl: 330, headspaceMl: 20, maxWorkingPressureBar: 3 },
        new Map(),
        0.5,
        'worst',
        { warmDayTempC: 35 },
      );
      expect(result.carbonation.findings.filter((f) => f.level !== 'ok')).toEqual([]);
    }
  });
});
