import { type CarbonationInput, computeCarbonation, computePriming, ratingLevel } from '@/lib/chemistry/carbonation';
import { equilibriumAt, liquidFills, maxCo2MolForGauge, volumesToMol } from '@/lib/chemistry/pressure';

const within = (actual: number, expected: number, relative: number) => {
  expect(Math.abs(actual - expected) / Math.abs(expected)).toBeLessThanOrEqual(relative);
};

// Values used by hand below: Bunsen coefficient of CO2 at 20 °C 0.878 L/L (Lange's Handbook, from memory); ideal molar
// volume 22.41397 L/mol and R = 0.0820574 L·atm/(mol·K) (CODATA 2018); water density 998.2067 kg/m³ at 20 °C,
// 995.6488 at 30 °C, 994.0319 at 35 °C (CIPM table, Tanaka et al. 2001, Metrologia 38:301, Table 4).
describe('pressure of a sealed container', () => {
  const twoAndHalfIn500 = volumesToMol(2.5, 500); // 2.5 × 0.5 L ÷ 22.41397 = 0.0557688 mol

  it('at the sealing temperature is the CO2 pressure alone: air and vapour make up the 1 atm the gauge subtracts', () => {
    // 500 mL with 25 mL of headspace at 20 °C holds 0.0557688 mol of CO2:
    // liquid 0.878 ÷ 22.41397 × 0.5 L = 0.0195860 mol/atm; headspace 0.025 L ÷ (0.0820574 × 293.15) = 0.0010393 mol/atm;
    // p(CO2) = 0.0557688 ÷ 0.0206253 = 2.70391 atm. The sealed-in air and vapour are again at 1 atm together, so the
    // gauge reads 2.70391 atm = 2.7397 bar.
    within(
      equilibriumAt({ liquidMl: 500, headspaceMl: 25, sealedTempC: 20 }, twoAndHalfIn500, 20).gaugeBar,
      2.7397,
      0.005,
    );
    // With no headspace: 2.5 ÷ 0.878 = 2.84738 atm = 2.8851 bar.
    within(
      equilibriumAt({ liquidMl: 500, headspaceMl: 0, sealedTempC: 20 }, twoAndHalfIn500, 20).gaugeBar,
      2.8851,
      0.005,
    );
  });

  it('is continuous as the headspace goes to zero, because the air dissolved in the liquid stays', () => {
    // Before, the sealed-in air vanished at exactly 0 mL and the gauge dropped by about 1 bar.
    for (const tempC of [4, 20]) {
      const none = equilibriumAt({ liquidMl: 500, headspaceMl: 0, sealedTempC: 20 }, twoAndHalfIn500, tempC).gaugeBar;
      const hair = equilibriumAt(
        { liquidMl: 500, headspaceMl: 0.01, sealedTempC: 20 },
        twoAndHalfIn500,
        tempC,
      ).gaugeBar;
      expect(Math.abs(none - hair)).toBeLessThan(0.005);
    }
  });

  it('shrinks the headspace as the liquid expands', () => {
    // 750 mL filled at 20 °C takes 750 × 998.2067 ÷ 994.0319 = 753.150 mL at 35 °C: of 30 mL, 26.850 mL remain.
    const warm = equilibriumAt({ liquidMl: 750, headspaceMl: 30, sealedTempC: 20 }, volumesToMol(2.5, 750), 35);
    expect(warm.headspaceMl).toBeCloseTo(26.85, 2);
    expect(warm.liquidFills).toBe(false);
  });

  it('finds where the warmed liquid fills the bottle, and the headspace to leave', () => {
    // 750 mL with 2 mL of headspace fills when ρ(T) = 998.2067 × 750 ÷ 752 = 995.5519 kg/m³: between 30 °C (995.6488)
    // and 35 °C (994.0319), at 30 + 5 × 0.0969 ÷ 1.6169 = 30.30 °C by linear interpolation.
    const bottle = { liquidMl: 750, headspaceMl: 2, sealedTempC: 20 };
    const fills = liquidFills(bottle, [4, 20, 35])!;
    expect(Math.abs(fills.tempC - 30.3)).toBeLessThan(0.05);
    // To keep a gas space at 35 °C: 752 × (1 − 994.0319 ÷ 998.2067) = 3.145 mL.
    expect(fills.leastHeadspaceMl).toBeCloseTo(3.145, 2);
    expect(liquidFills(bottle, [4, 20, 25])).toBeNull();
    expect(equilibriumAt(bottle, volumesToMol(2.5, 750), 35).liquidFills).toBe(true);
    // No CO2 at all is safe in a bottle the liquid fills.
    expect(maxCo2MolForGauge(bottle, 6, 35)).toBe(0);
  });
});

describe('gauge pressure against the bottle rating', () => {
  it('is caution from exactly 75 % of the rating and danger from exactly 100 % of it', () => {
    expect(ratingLevel(2.999, 4)).toBe('ok');
    expect(ratingLevel(3, 4)).toBe('caution');
    expect(ratingLevel(3.999, 4)).toBe('caution');
    expect(ratingLevel(4, 4)).toBe('danger');
  });
});

const base: CarbonationInput = {
  liquidMl: 500,
  headspaceMl: 25,
  sugars: [{ type: 'sucrose', grams: 3 }],
  ingredients: [],
  residualCo2Volumes: 0.8,
  sealedTempC: 20,
  temperaturesC: [4, 20, 35],
  maxWorkingPressureBar: 3,
  baseAbvPercent: 0.2,
  yield: 'worst',
  abvLimitPercent: 0.5,
};

describe('computeCarbonation', () => {
  it('adds up sugar, volumes and alcohol for a 500 mL bottle with 3 g of sucrose', () => {
    const result = computeCarbonation(base);
    expect(result.sugar.fermentableG).toBe(3);
    expect(result.sugar.fermentableGPerL).toBe(6);
    // By hand: 6 g/L × 0.51428 = 3.0857 g/L CO2 ÷ 1.9635 = 1.5715 volumes; total 0.8 + 1.5715 = 2.3715.
    expect(result.co2.fromSugarVolumes).toBeCloseTo(1.5715, 3);
    expect(result.co2.totalVolumes).toBeCloseTo(2.3715, 3);
    // By hand: 6 g/L × 0.53834 = 3.2300 g/L ethanol ÷ 0.78924 = 4.0926 mL/L = 0.409 % ABV, total 0.609 %.
    expect(result.alcohol.addedAbvPercent).toBeCloseTo(0.4093, 3);
    expect(result.alcohol.totalAbvPercent).toBeCloseTo(0.6093, 3);
    expect(result.cases.expected.co2.fromSugarVolumes).toBeCloseTo(1.5715 * 0.95, 3);
    expect(result.pressures.map((p) => p.tempC)).toEqual([4, 20, 35]);
  });

  it('flags alcohol over the limit as danger and judges pressure at the highest temperature', () => {
    const result = computeCarbonation(base);
    expect(result.findings.find((f) => f.code.startsWith('alcohol'))).toMatchObject({
      level: 'danger',
      code: 'alcohol-over-limit',
    });
    // 2.37 volumes at 35 °C: about 2.37 ÷ 0.59 (Bunsen coefficient near 35 °C) ≈ 4 atm of CO2, over a 3 bar rating.
    const pressure = result.findings.find((f) => f.code.startsWith('pressure'))!;
    expect(pressure).toMatchObject({ level: 'danger', code: 'pressure-over-rating' });
    expect(pressure.values?.tempC).toBe(35);
    expect(result.pressures.find((p) => p.tempC === 4)!.overRating).toBe(false);
  });

  it('judges the worst case against the rating on each side of 75 % and 100 % of it', () => {
    // 2.5 volumes in 500 mL + 25 mL, sealed and checked at 20 °C: 2.7397 bar by hand (see "at the sealing temperature"
    // above). Ratings 1 % either side of 2.7397 ÷ 0.75 = 3.6529 bar and of 2.7397 bar itself.
    const at = (rating: number) =>
      computeCarbonation({
        ...base,
        sugars: [],
        residualCo2Volumes: 2.5,
        temperaturesC: [20],
        maxWorkingPressureBar: rating,
      }).findings.find((f) => f.code.startsWith('pressure'))!;
    expect(at(3.6529 * 1.01)).toMatchObject({ level: 'ok', code: 'pressure-within-rating' });
    expect(at(3.6529 * 0.99)).toMatchObject({ level: 'caution', code: 'pressure-near-rating' });
    expect(at(2.7397 * 1.01)).toMatchObject({ level: 'caution', code: 'pressure-near-rating' });
    expect(at(2.7397 * 0.99)).toMatchObject({ level: 'danger', code: 'pressure-over-rating' });
  });

  it('calls a bottle the warmed liquid fills a danger, saying where and how much headspace to leave', () => {
    // 750 mL with 2 mL of headspace, sealed at 20 °C: fills at 30.3 °C and needs 3.145 mL at 35 °C (worked out above).
    const result = computeCarbonation({
      ...base,
      liquidMl: 750,
      headspaceMl: 2,
      temperaturesC: [4, 20],
      warmDayTempC: 35,
      maxWorkingPressureBar: 10,
    });
    const fill = result.findings.find((f) => f.code === 'liquid-fills-bottle')!;
    expect(fill.level).toBe('danger');
    expect(fill.message).toMatch(/At 30\.3 °C the warmed liquid fills the bottle/);
    expect(fill.values).toMatchObject({ leastHeadspaceMl: 4 });
    expect(result.pressures.find((p) => p.tempC === 35)).toMatchObject({ liquidFills: true, overRating: true });
    // A bottle filled to the brim is full from the start.
    expect(
      computeCarbonation({ ...base, headspaceMl: 0 }).findings.find((f) => f.code === 'liquid-fills-bottle')?.message,
    ).toMatch(/^The liquid fills the bottle/);
  });

  it('counts lactose as sweetness only', () => {
    const result = computeCarbonation({ ...base, sugars: [{ type: 'lactose', grams: 5 }] });
    expect(result.sugar.fermentableG).toBe(0);
    expect(result.sugar.sweetOnlyG).toBe(5);
    expect(result.co2.fromSugarVolumes).toBe(0);
  });

  it('estimates residual CO2 from the temperature the base was last open at', () => {
    const result = computeCarbonation({ ...base, residualCo2Volumes: null, lastOpenTempC: 20 });
    // Saturation under 1 atm of CO2 at 20 °C: the Bunsen coefficient, 0.878 (Lange's Handbook, from memory).
    expect(result.co2.residualVolumes).toBeCloseTo(0.878, 1);
  });

  it('warns about solids in the bottle, fatty ingredients and inputs outside the model', () => {
    const result = computeCarbonation({
      ...base,
      temperaturesC: [4, 55],
      ingredients: [{ name: 'Butter shortbread', sugarG: 2, fermentableShare: 1, fatG: 3, inBottle: true }],
    });
    const codes = result.findings.map((f) => f.code);
    expect(codes).toEqual(
      expect.arrayContaining(['solids-in-bottle', 'fatty-ingredients', 'temperature-out-of-range']),
    );
  });
});

describe('computePriming', () => {
  const input = {
    liquidMl: 500,
    headspaceMl: 25,
    targetVolumes: 2.5,
    residualCo2Volumes: 0.9,
    sugarType: 'sucrose' as const,
    sealedTempC: 20,
    highestTempC: 35,
    maxWorkingPressureBar: 3,
    baseAbvPercent: 0,
    abvLimitPercent: 0.5,
    yield: 'worst' as const,
  };

  const primingAtSealing = () => computePriming({ ...input, highestTempC: 20 });

  it('finds the sugar for a target', () => {
    const result = computePriming(input);
    // By hand: (2.5 − 0.9) volumes × 1.9635 g = 3.1416 g/L CO2 ÷ 0.51428 = 6.1087 g/L sucrose → 3.054 g per 500 mL.
    expect(result.sugarGPerL).toBeCloseTo(6.109, 2);
    expect(result.sugarG).toBeCloseTo(3.054, 2);
  });

  it('finds the most sugar the bottle takes, keeping 80 % of the rating', () => {
    // Judged at the sealing temperature, where the gauge reads the CO2 pressure alone (see above). 80 % of 3 bar =
    // 2.4 bar = 2.36862 atm (the margin, common practice, no source); the bottle holds 0.0206253 mol per atm there
    // (worked out above), so 0.048853 mol; 0.9 volumes are already in it (0.9 × 0.5 ÷ 22.41397 = 0.020077 mol), leaving
    // 0.028776 mol from sugar = 0.028776 ÷ 4 × 342.297 g/mol of sucrose = 2.4625 g.
    const result = computePriming({ ...input, highestTempC: 20 });
    within(result.maxSafeSugarG!, 2.4625, 0.01);
    expect(result.targetReachable).toBe(false);
    expect(result.limitedBy).toBe('pressure');
  });

  it('says where this sugar enters the caution and danger bands of the bottle, and reaches the alcohol limit', () => {
    const { bands } = primingAtSealing();
    // As above, at the sealing temperature the bottle holds 0.0206253 mol of CO2 per atm of gauge.
    // Caution from 75 % of 3 bar = 2.25 bar = 2.22058 atm → 0.045801 mol − 0.020077 = 0.025724 mol ÷ 4 × 342.297 = 2.2013 g.
    within(bands.cautionFromG!, 2.2013, 0.01);
    // Danger from 3 bar = 2.96077 atm → 0.061067 mol − 0.020077 = 0.040990 mol ÷ 4 × 342.297 = 3.5077 g.
    within(bands.dangerFromG!, 3.5077, 0.01);
    // 0.5 % ABV of 500 mL = 2.5 mL of ethanol × 0.78924 g/mL (CRC Handbook) = 1.9731 g; sucrose gives 4 × 46.069 g of
    // ethanol per 342.297 g (0.53835 g/g), so 1.9731 ÷ 0.53835 = 3.6651 g of sucrose.
    within(bands.alcoholLimitG, 3.6651, 0.01);
    expect(computePriming({ ...input, maxWorkingPressureBar: null }).bands).toMatchObject({
      cautionFromG: null,
      dangerFromG: null,
    });
  });

  it('shows the alcohol the target fizz costs, and honey needs more weight than sucrose', () => {
    const sucrose = computePriming(input);
    expect(sucrose.addedAbvPercent).toBeCloseTo(0.4167, 2);
    const honey = computePriming({ ...input, sugarType: 'honey' });
    // USDA SR25 NDB 19296: honey is 82.12 % sugars, so it takes 1 / 0.8212 times the weight.
    expect(honey.sugarG / sucrose.sugarG).toBeCloseTo(1 / 0.8212, 6);
  });

  it('calls a target beyond the safe amount danger and offers the most that is safe instead', () => {
    const result = computePriming({ ...input, targetVolumes: 5 });
    expect(result.findings.find((f) => f.code === 'target-over-rating')?.level).toBe('danger');
    expect(result.targetReachable).toBe(false);
    expect(result.safeSugarG).toBe(result.maxSafeSugarG);
    expect(result.safeSugarG).toBeLessThan(result.sugarG);
  });
});
