import {
  batchLitres,
  gramsPerLitre,
  roundMass,
  roundVolume,
  type ScaleInput,
  scaleRecipe,
} from '@/lib/recipes/scaling';

// Hand-worked examples. Conversions by NIST SP 811: 1 lb = 453.59237 g, 1 oz = 28.349523 g, 1 US gal = 3.785412 L.
const recipe = (
  batch: ScaleInput['batch'],
  units: ScaleInput['units'] = 'metric',
  process: ScaleInput['process'] = { method: 'in-bottle' },
): ScaleInput => ({
  lines: [
    { name: 'Strawberries', amount: 40, unit: 'g-per-l' },
    { name: 'Ginger root', amount: 0.8, unit: 'g-per-l' },
    { name: 'Vanilla extract', amount: 0.2, unit: 'g-per-bottle' },
  ],
  sugars: [{ name: 'Sucrose', gPerL: 6 }],
  bottleLiquidMl: 473,
  process,
  batch,
  units,
});

describe('batch sizes', () => {
  it('converts litres, US gallons and bottles of the recipe format', () => {
    expect(batchLitres({ kind: 'litres', value: 20 }, 473)).toBe(20);
    expect(batchLitres({ kind: 'us-gallons', value: 5 }, 473)).toBeCloseTo(18.92706, 4);
    // 120 bottles × 473 mL = 56.76 L.
    expect(batchLitres({ kind: 'bottles', value: 120 }, 473)).toBeCloseTo(56.76, 10);
  });

  it('turns every amount unit into grams per litre', () => {
    expect(gramsPerLitre({ name: 'a', amount: 0.2, unit: 'g-per-bottle' }, 473)).toBeCloseTo(0.42283, 4); // 0.2 g × 1000/473
    expect(gramsPerLitre({ name: 'b', amount: 2.5, unit: 'pct-weight' }, 473)).toBe(25); // 2.5 % of 1000 g
  });
});

describe('rounding to what a scale reads', () => {
  it('chooses the scale step from the amount, so rounding moves it by half a percent at most', () => {
    expect(roundMass(5.28, 'metric')).toMatchObject({ value: 5.3, unit: 'g', resolution: 0.1, warn: false });
    // 187.5 g of sugar reads 188 g on a 1 g kitchen scale (0.27 % off), not 190 g (1.3 % off).
    expect(roundMass(187.5, 'metric')).toMatchObject({ value: 188, unit: 'g', resolution: 1, warn: false });
    expect(roundMass(99.96, 'metric')).toMatchObject({ value: 100, unit: 'g', resolution: 0.1 });
    // Worst spots of each step, by hand: 100.5 g at 1 g is 0.5 % off; 1005 g at 0.01 kg is 0.5 % off.
    expect(roundMass(100.5, 'metric').offPct).toBeLessThanOrEqual(0.5);
    expect(roundMass(1005, 'metric').offPct).toBeLessThanOrEqual(0.5);
    expect(roundMass(340.56, 'metric')).toMatchObject({ value: 341, unit: 'g', resolution: 1 });
    expect(roundMass(2270.4, 'metric')).toMatchObject({ value: 2.27, unit: 'kg', resolution: 0.01 });
    expect(roundMass(8000, 'metric')).toMatchObject({ value: 8, unit: 'kg' });
  });

  it('warns when the rounded amount is more than 1 % off', () => {
    // 0.14 g read to 0.1 g is 0.1, 28.6 % off: weigh it on a finer scale.
    expect(roundMass(0.14, 'metric')).toMatchObject({ value: 0.1, warn: true });
    expect(roundMass(0.14, 'metric').offPct).toBeCloseTo(28.57, 1);
  });

  it('uses ounces below 1 lb and pounds above in US units', () => {
    // 340.56 g ÷ 28.349523 = 12.013 oz → 12.0 oz; 2270.4 g ÷ 453.59237 = 5.0054 lb → 5.01 lb.
    expect(roundMass(340.56, 'us')).toMatchObject({ value: 12, unit: 'oz', resolution: 0.1 });
    // 45.41 g ÷ 28.349523 = 1.6018 oz → 1.60 oz on a 0.01 oz pocket scale.
    expect(roundMass(45.41, 'us')).toMatchObject({ value: 1.6, unit: 'oz', resolution: 0.01 });
    expect(roundMass(2270.4, 'us')).toMatchObject({ value: 5.01, unit: 'lb', resolution: 0.01 });
    expect(roundVolume(56.76, 'us')).toMatchObject({ value: 14.99, unit: 'US gal' });
  });
});

describe('scaleRecipe', () => {
  it('scales to 120 bottles of 473 mL', () => {
    const scaled = scaleRecipe(recipe({ kind: 'bottles', value: 120 }));
    expect(scaled.bottles).toBe(120);
    expect(scaled.finishedLitres).toMatchObject({ value: 56.8, unit: 'L' });
    // 40 g/L × 56.76 L = 2270.4 g → 2.27 kg; 0.8 × 56.76 = 45.41 g → 45.4 g; 0.2 g × 120 = 24 g; 6 × 56.76 = 340.56 g → 341 g.
    expect(scaled.lines.map((l) => [l.name, l.value, l.unit])).toEqual([
      ['Strawberries', 2.27, 'kg'],
      ['Ginger root', 45.4, 'g'],
      ['Vanilla extract', 24, 'g'],
    ]);
    expect(scaled.sugars[0]).toMatchObject({ value: 341, unit: 'g' });
    expect(scaled.topUpLitres.exact).toBe(0);
  });

  it('scales 20 L to whole bottles, and counts the base and the top-up when steeped and strained', () => {
    // 20 L with 12 % strain loss: steep in 20 L, 2.4 L stays in the solids, top up 2.4 L: 22.4 L of base in all.
    const scaled = scaleRecipe(
      recipe({ kind: 'litres', value: 20 }, 'metric', { method: 'steep-strain', strainLossPct: 12 }),
    );
    expect(scaled.bottles).toBe(42); // 20 000 mL ÷ 473 mL = 42.28
    expect(scaled.baseLitres).toMatchObject({ value: 22.4, unit: 'L' });
    expect(scaled.topUpLitres).toMatchObject({ value: 2.4, unit: 'L' });
    expect(scaled.lines[0]).toMatchObject({ value: 800, unit: 'g' });
  });

  it('refuses a batch of zero or of a billion litres', () => {
    expect(() => scaleRecipe(recipe({ kind: 'litres', value: 0 }))).toThrow(RangeError);
    expect(() => scaleRecipe(recipe({ kind: 'litres', value: 1e9 }))).toThrow(/at most 20000 L/);
  });
});

describe('batchSteps', () => {
  const { batchSteps } = require('@/lib/recipes/stages') as typeof import('@/lib/recipes/stages');
  it('writes the batch amounts into the numbered steps of a steeped recipe', () => {
    const content = {
      baseBrew: {
        name: 'black tea base',
        residualSugarGPerL: 1,
        ph: 3.2,
        abvPercent: 0.1,
        residualCo2Volumes: null,
        lastOpenTempC: 21,
      },
      lines: [],
      sugars: [],
      process: {
        method: 'steep-strain',
        steepHours: 48,
        steepTempC: 4,
        strainLossPct: 12,
        carbonateHours: 72,
        carbonateTempC: 22,
        coldStoreTempC: 4,
      },
      bottleFormatId: 1,
      targetVolumes: 2.5,
      sweetnessNote: '',
      highestTempC: 30,
    } as const;
    const scaled = scaleRecipe(
      recipe({ kind: 'litres', value: 20 }, 'metric', { method: 'steep-strain', strainLossPct: 12 }),
    );
    const steps = batchSteps(content as never, scaled, 'Glass crown cap 473 mL');
    expect(steps[0]).toBe(
      'Steep 800 g strawberries, 16.0 g ginger root, 8.5 g vanilla extract in 20.0 L of black tea base at 4 °C for 48 h.',
    );
    expect(steps[2]).toBe('Top up with 2.40 L of fresh base to 20.0 L and dissolve 120 g sucrose.');
    expect(steps[3]).toMatch(/^Fill 42 bottles/);
    expect(steps).toHaveLength(5);
  });

  it('gives the amounts for each bottle when the flavour goes in the bottle, beside the batch totals', () => {
    const content = {
      baseBrew: {
        name: 'black tea base',
        residualSugarGPerL: 1,
        ph: 3.2,
        abvPercent: 0.1,
        residualCo2Volumes: null,
        lastOpenTempC: 21,
      },
      process: {
        method: 'in-bottle',
        steepHours: 0,
        steepTempC: 4,
        strainLossPct: 0,
        carbonateHours: 72,
        carbonateTempC: 22,
        coldStoreTempC: 4,
      },
    };
    // By hand, per 473 mL bottle: strawberries 40 g/L × 0.473 L = 18.92 g; ginger 0.8 × 0.473 = 0.378 g; vanilla
    // 0.2 g per bottle as written; sucrose 6 × 0.473 = 2.838 g.
    const metric = batchSteps(
      content as never,
      scaleRecipe(recipe({ kind: 'bottles', value: 150 })),
      'Glass crown cap 473 mL',
    );
    expect(metric[0]).toMatch(
      /^Into each of the 150 bottles \(Glass crown cap 473 mL\): 18\.9 g strawberries, 0\.4 g ginger root, 0\.2 g vanilla extract, 2\.8 g sucrose\. In all: /,
    );
    // In US units: 18.92 g ÷ 28.349523125 g per oz (NIST Handbook 44) = 0.667 oz.
    const us = batchSteps(
      content as never,
      scaleRecipe(recipe({ kind: 'bottles', value: 150 }, 'us')),
      'Glass crown cap 473 mL',
    );
    expect(us[0]).toMatch(/: 0\.67 oz strawberries, /);
  });
});
