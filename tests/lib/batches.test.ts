import { type BatchFacts, checkReading, predictedGaugeBar } from '@/lib/batches/checks';
import { parseQuantity } from '@/lib/batches/quantity';
import { standingDangers } from '@/lib/batches/standing';

describe('quantities as people write them', () => {
  it('reads mass and volume with their units into grams and litres', () => {
    // NIST SP 811 / Handbook 44: 1 lb = 0.45359237 kg exactly, 1 US gal = 3.785411784 L, 1 US fl oz = 29.5735295625 mL.
    expect(parseQuantity('2 kg')).toEqual({ value: 2000, unit: 'g' });
    expect(parseQuantity('5 lb')?.value).toBeCloseTo(2267.96185, 5);
    expect(parseQuantity('3 gal')?.value).toBeCloseTo(11.356235352, 8);
    expect(parseQuantity('12 fl oz')?.value).toBeCloseTo(0.354882355, 8);
    expect(parseQuantity('2,5 kg')).toEqual({ value: 2500, unit: 'g' });
    expect(parseQuantity('250g')).toEqual({ value: 250, unit: 'g' });
  });

  it('refuses what is not a quantity', () => {
    for (const text of ['', 'two kilos', '5', '3 m', 'kg 2', '-2 kg', '0 g', '2 kg; drop table'])
      expect(parseQuantity(text)).toBeNull();
  });
});

// 500 mL with 25 mL of headspace, sealed at 20 °C, 2.5 volumes in the worst case: at 20 °C the gauge reads
// 2.7397 bar by hand (tests/lib/chemistry/pressure.test.ts, Bunsen 0.878 from Lange's Handbook).
const facts: BatchFacts = {
  liquidMl: 500,
  headspaceMl: 25,
  sealedTempC: 20,
  ratingBar: 6,
  worstTotalCo2Volumes: 2.5,
  abvLimitPercent: 0.5,
  warmDayTempC: 35,
};

describe('readings checked as they are entered', () => {
  it('judges pH against 4.2: above is danger with what to do, from 4.0 caution', () => {
    expect(checkReading({ kind: 'ph', value: 4.3 }, facts)).toMatchObject({
      level: 'danger',
      message: expect.stringMatching(/Do not flavour; add starter and re-test/),
    });
    expect(checkReading({ kind: 'ph', value: 4.2 }, facts).level).toBe('caution');
    expect(checkReading({ kind: 'ph', value: 4.0 }, facts).level).toBe('caution');
    expect(checkReading({ kind: 'ph', value: 3.1 }, facts).level).toBe('ok');
  });

  it('compares a test bottle with the rating (danger at it, caution from 75 %) and with the predicted worst case', () => {
    expect(Math.abs(predictedGaugeBar(facts, 20) - 2.7397) / 2.7397).toBeLessThan(0.005);
    expect(checkReading({ kind: 'gauge-pressure', value: 6, tempC: 20 }, facts)).toMatchObject({
      level: 'danger',
      message: expect.stringMatching(/chill every bottle now/),
    });
    // 75 % of 6 bar = 4.5 bar.
    expect(checkReading({ kind: 'gauge-pressure', value: 4.5, tempC: 20 }, facts).level).toBe('caution');
    const above = checkReading({ kind: 'gauge-pressure', value: 3.2, tempC: 20 }, facts);
    expect(above).toMatchObject({ level: 'caution', message: expect.stringMatching(/fermenting more than planned/) });
    expect(above.predictedGaugeBar).toBeCloseTo(2.74, 1);
    expect(checkReading({ kind: 'gauge-pressure', value: 2.5, tempC: 20 }, facts).level).toBe('ok');
  });

  it('holds alcohol at the limit as danger (27 CFR 7.1: "0.5 percent or more")', () => {
    expect(checkReading({ kind: 'abv', value: 0.5 }, facts)).toMatchObject({
      level: 'danger',
      message: expect.stringMatching(/the batch is held/),
    });
    expect(checkReading({ kind: 'abv', value: 0.4 }, facts).level).toBe('caution');
    expect(checkReading({ kind: 'abv', value: 0.2 }, facts).level).toBe('ok');
  });

  it('turns Brix into sugar per litre with the engine’s sucrose table', () => {
    // CRC sucrose table (from memory): 10 °Bx is 103.8 g of sucrose per litre of solution at 20 °C.
    expect(checkReading({ kind: 'brix', value: 10 }, facts).message).toMatch(/about 103\.\d+ g of sugar per litre/);
  });
});

describe('danger readings that stand', () => {
  const r = (
    id: number,
    kind: string,
    stage: string,
    level: 'ok' | 'caution' | 'danger',
    correctsId: number | null = null,
  ) => ({ id, kind, stage, level, correctsId });

  it('stand until a later ok reading of the same kind and stage, a correction or a deviation answers them', () => {
    expect(standingDangers([r(1, 'ph', 'base', 'danger')], [])).toEqual([1]);
    expect(standingDangers([r(1, 'ph', 'base', 'danger'), r(2, 'ph', 'base', 'ok')], [])).toEqual([]);
    // An ok reading at another stage does not answer it.
    expect(standingDangers([r(1, 'ph', 'base', 'danger'), r(2, 'ph', 'finished', 'ok')], [])).toEqual([1]);
    expect(standingDangers([r(1, 'abv', 'finished', 'danger'), r(2, 'abv', 'finished', 'ok', 1)], [])).toEqual([]);
    expect(standingDangers([r(1, 'gauge-pressure', 'conditioning', 'danger')], [1])).toEqual([]);
    // An ok reading before the danger does not answer it.
    expect(standingDangers([r(1, 'ph', 'base', 'ok'), r(2, 'ph', 'base', 'danger')], [])).toEqual([2]);
  });
});
