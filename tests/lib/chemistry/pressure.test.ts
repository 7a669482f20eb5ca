import { computeCarbonation, computePriming, type CarbonationInput } from '@/lib/chemistry/carbonation';
import { R_L_ATM } from '@/lib/chemistry/constants';
import { equilibriumAt, maxCo2MolForGauge, volumesToMol } from '@/lib/chemistry/pressure';
import { co2SolubilityMolPerLAtm } from '@/lib/chemistry/solubility';
import { waterVapourPressureAtm } from '@/lib/chemistry/water';

describe('pressure of a sealed container', () => {
  // Bunsen coefficients of CO2 in water (Lange's Handbook, from memory): 0 °C 1.713, 20 °C 0.878, 40 °C 0.530.
  // With no headspace, Henry's law gives the CO2 pressure as volumes ÷ Bunsen coefficient (atm); the gauge reads
  // that plus the water's vapour pressure (CRC: 0.6113 kPa at 0 °C, 2.3393 at 20 °C, 7.3851 at 40 °C) less 1 atm.
  const bottle = { liquidMl: 500, headspaceMl: 0, sealedTempC: 20 };
  const cases: [number, number, number][] = [
    [0, 1.713, 0.6113],
    [20, 0.878, 2.3393],
    [40, 0.53, 7.3851],
  ];

  it.each(cases)('holds 2.5 volumes at %s °C at the pressure the Bunsen table implies', (tempC, bunsen, vapourKPa) => {
    const expectedGaugeAtm = 2.5 / bunsen + vapourKPa / 101.325 - 1;
    const eq = equilibriumAt(bottle, volumesToMol(2.5, bottle.liquidMl), tempC);
    expect(Math.abs(eq.gaugeBar / 1.01325 - expectedGaugeAtm)).toBeLessThan(0.04 * (expectedGaugeAtm + 1));
    expect(eq.dissolvedVolumes).toBeCloseTo(2.5, 6);
  });

  it('rises steeply with temperature: about 1.9 bar at 20 °C and 4.0 bar at 40 °C for 2.5 volumes', () => {
    // Worked from the same Bunsen coefficients: 2.5/0.878 + 0.0231 − 1 = 1.87 atm = 1.90 bar; 2.5/0.530 + 0.0729 − 1 = 3.79 atm = 3.84 bar.
    expect(equilibriumAt(bottle, volumesToMol(2.5, 500), 20).gaugeBar).toBeCloseTo(1.9, 1);
    expect(equilibriumAt(bottle, volumesToMol(2.5, 500), 40).gaugeBar).toBeGreaterThan(3.7);
    expect(equilibriumAt(bottle, volumesToMol(2.5, 500), 40).gaugeBar).toBeLessThan(4.1);
  });

  it('shares CO2 with the headspace, conserving every mole, and adds the sealed-in air', () => {
    const withHeadspace = { liquidMl: 500, headspaceMl: 50, sealedTempC: 20 };
    const totalMol = volumesToMol(3, 500);
    const eq = equilibriumAt(withHeadspace, totalMol, 30);
    // Mass balance by hand: dissolved = K(30 °C)·p·V_L, gas = p·V_G/(R·T).
    const dissolvedMol = co2SolubilityMolPerLAtm(30) * eq.co2PartialAtm * 0.5;
    const gasMol = (eq.co2PartialAtm * 0.05) / (R_L_ATM * 303.15);
    expect(dissolvedMol + gasMol).toBeCloseTo(totalMol, 10);
    // Gauge = CO2 + air (1 atm less vapour at sealing, warmed from 20 to 30 °C) + vapour at 30 °C − 1 atm.
    const airAtm = (1 - waterVapourPressureAtm(20)) * (303.15 / 293.15);
    expect(eq.gaugeBar / 1.01325).toBeCloseTo(eq.co2PartialAtm + airAtm + waterVapourPressureAtm(30) - 1, 10);
    // The headspace takes some CO2 out of the liquid, so the CO2 pressure is lower than with no headspace.
    expect(eq.co2PartialAtm).toBeLessThan(equilibriumAt({ ...withHeadspace, headspaceMl: 0 }, totalMol, 30).co2PartialAtm);
  });

  it('inverts: the most CO2 for a rating gives exactly that rating', () => {
    const container = { liquidMl: 330, headspaceMl: 20, sealedTempC: 18 };
    const mol = maxCo2MolForGauge(container, 3, 35);
    expect(equilibriumAt(container, mol, 35).gaugeBar).toBeCloseTo(3, 10);
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
    expect(result.findings.find((f) => f.code.startsWith('alcohol'))).toMatchObject({ level: 'danger', code: 'alcohol-over-limit' });
    // 2.37 volumes at 35 °C: about 2.37 ÷ 0.59 (Bunsen coefficient near 35 °C) ≈ 4 atm of CO2, over a 3 bar rating.
    const pressure = result.findings.find((f) => f.code.startsWith('pressure'))!;
    expect(pressure).toMatchObject({ level: 'danger', code: 'pressure-over-rating' });
    expect(pressure.values?.tempC).toBe(35);
    expect(result.pressures.find((p) => p.tempC === 4)!.overRating).toBe(false);
  });

  it('calls pressure over the rating danger and within 25 % of it caution', () => {
    const heavy = computeCarbonation({ ...base, sugars: [{ type: 'sucrose', grams: 6 }], baseAbvPercent: 0 });
    expect(heavy.findings.find((f) => f.code === 'pressure-over-rating')?.level).toBe('danger');
    const worstAt35 = heavy.pressures.find((p) => p.tempC === 35)!;
    expect(worstAt35.overRating).toBe(true);
    const near = computeCarbonation({ ...base, maxWorkingPressureBar: worstAt35.gaugeBar * 1.2, sugars: [{ type: 'sucrose', grams: 6 }] });
    expect(near.findings.find((f) => f.code === 'pressure-near-rating')?.level).toBe('caution');
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
    expect(codes).toEqual(expect.arrayContaining(['solids-in-bottle', 'fatty-ingredients', 'temperature-out-of-range']));
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

  it('finds the sugar for a target, which the forward model confirms', () => {
    const result = computePriming(input);
    // By hand: (2.5 − 0.9) volumes × 1.9635 g = 3.1416 g/L CO2 ÷ 0.51428 = 6.1087 g/L sucrose → 3.054 g per 500 mL.
    expect(result.sugarGPerL).toBeCloseTo(6.109, 2);
    const check = computeCarbonation({ ...base, sugars: [{ type: 'sucrose', grams: result.sugarG }], residualCo2Volumes: 0.9 });
    expect(check.co2.totalVolumes).toBeCloseTo(2.5, 4);
  });

  it('finds the most sugar the bottle takes at the highest temperature, keeping 80 % of the rating', () => {
    const result = computePriming(input);
    expect(result.maxSafeSugarG).not.toBeNull();
    const atLimit = computeCarbonation({ ...base, sugars: [{ type: 'sucrose', grams: result.maxSafeSugarG! }], residualCo2Volumes: 0.9, temperaturesC: [35] });
    // 80 % of the 3 bar rating: 0.8 × 3 = 2.4 bar (the margin, common practice, no source).
    expect(atLimit.pressures[0].gaugeBar).toBeCloseTo(2.4, 4);
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
