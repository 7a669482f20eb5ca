import { convertUnit, type UnitSystem } from '@/lib/units';

/**
 * Scaling a recipe kept per litre of finished drink to a batch, with amounts rounded to what a kitchen or brewery
 * scale reads. The screen and the printed card both use this module, so they always agree.
 */

/** How an ingredient amount is written in a recipe. */
export type AmountUnit = 'g-per-l' | 'g-per-bottle' | 'pct-weight';

export type BatchSize =
  { kind: 'litres'; value: number } | { kind: 'us-gallons'; value: number } | { kind: 'bottles'; value: number };

export interface ScaleLine {
  name: string;
  amount: number;
  unit: AmountUnit;
}

export interface ScaleInput {
  lines: ScaleLine[];
  /** Sugars added by weight per litre of finished drink. */
  sugars: { name: string; gPerL: number }[];
  bottleLiquidMl: number;
  process: { method: 'in-bottle' } | { method: 'steep-strain'; strainLossPct: number };
  batch: BatchSize;
  units: UnitSystem;
}

/** An amount as it will be weighed or measured: rounded value, its unit and resolution, and how far off it is. */
export interface Rounded {
  exact: number;
  /** Exact amount in the base unit (g or L), for arithmetic. */
  exactBase: number;
  value: number;
  unit: 'g' | 'kg' | 'oz' | 'lb' | 'L' | 'US gal';
  resolution: number;
  /** |rounded − exact| ÷ exact, as a percentage. */
  offPct: number;
  /** More than 1 % off: weigh on a finer scale or split the amount. */
  warn: boolean;
}

export interface ScaledRecipe {
  finishedLitres: Rounded;
  bottles: number;
  /** Base brew needed in all: the batch plus, when steeped and strained, what the solids keep back. */
  baseLitres: Rounded;
  /** Base to add after straining to bring the batch back to volume (0 when flavoured in the bottle). */
  topUpLitres: Rounded;
  lines: (Rounded & { name: string })[];
  sugars: (Rounded & { name: string })[];
}

/** Largest batch the app scales to, litres: beyond a small brewery's tanks, and a guard against typos. */
export const MAX_BATCH_L = 20000;

const roundTo = (value: number, step: number) => Math.round(value / step) * step;

function describe(exactBase: number, exact: number, unit: Rounded['unit'], resolution: number): Rounded {
  const value = Number(roundTo(exact, resolution).toFixed(6));
  const offPct = exact === 0 ? 0 : (Math.abs(value - exact) / exact) * 100;
  return { exact, exactBase, value, unit, resolution, offPct, warn: offPct > 1 };
}

/**
 * A mass in grams rounded to a scale step chosen from its size: the step is at most 1 % of the amount, so rounding
 * moves it by half a percent at most (common practice, no source: the readings of pocket, kitchen and platform
 * scales). Metric 0.1 g below 100 g, 1 g below 1 kg, then kg to 0.01 kg (0.05 kg from 20 kg): a 187.5 g sugar dose
 * reads 188 g, not 190 g. US 0.01 oz below 10 oz, 0.1 oz below 1 lb, then lb to 0.01 lb (0.05 lb from 50 lb). Only
 * the smallest amounts (a few grams, a fraction of an ounce) can then round more than 1 % off, and say so.
 */
export function roundMass(grams: number, units: UnitSystem): Rounded {
  if (units === 'us') {
    const oz = convertUnit(grams, 'g', 'oz');
    if (oz < 10) return describe(grams, oz, 'oz', 0.01);
    if (oz < 16) return describe(grams, oz, 'oz', 0.1);
    const lb = convertUnit(grams, 'g', 'lb');
    return describe(grams, lb, 'lb', lb < 50 ? 0.01 : 0.05);
  }
  if (grams < 100) return describe(grams, grams, 'g', 0.1);
  if (grams < 1000) return describe(grams, grams, 'g', 1);
  const kg = grams / 1000;
  return describe(grams, kg, 'kg', kg < 20 ? 0.01 : 0.05);
}

/** A volume in litres rounded for a measuring jug or a tank gauge: 0.01 L below 10 L, then 0.1 L; US gal to 0.01 gal. */
export function roundVolume(litres: number, units: UnitSystem): Rounded {
  if (units === 'us') return describe(litres, convertUnit(litres, 'l', 'gal'), 'US gal', 0.01);
  return describe(litres, litres, 'L', litres < 10 ? 0.01 : 0.1);
}

/** Litres of finished drink in a batch. */
export function batchLitres(batch: BatchSize, bottleLiquidMl: number): number {
  if (batch.kind === 'litres') return batch.value;
  if (batch.kind === 'us-gallons') return convertUnit(batch.value, 'gal', 'l');
  return (batch.value * bottleLiquidMl) / 1000;
}

/**
 * Grams of an ingredient line per litre of finished drink. A % of liquid by weight takes the drink as 1 kg per
 * litre (common practice, no source: kombucha's density is within 1–2 % of water's).
 */
export function gramsPerLitre(line: ScaleLine, bottleLiquidMl: number): number {
  if (line.unit === 'g-per-l') return line.amount;
  if (line.unit === 'g-per-bottle') return (line.amount * 1000) / bottleLiquidMl;
  return (line.amount / 100) * 1000;
}

/**
 * Scales a per-litre recipe to a batch. Steeped and strained, the solids keep back `strainLossPct` % of the liquid,
 * so that much fresh base is added after straining and the batch needs (1 + loss) times its volume of base.
 */
export function scaleRecipe(input: ScaleInput): ScaledRecipe {
  const litres = batchLitres(input.batch, input.bottleLiquidMl);
  if (!(litres > 0) || litres > MAX_BATCH_L)
    throw new RangeError(`A batch must be more than 0 and at most ${MAX_BATCH_L} L.`);
  const loss = input.process.method === 'steep-strain' ? input.process.strainLossPct / 100 : 0;
  const bottles =
    input.batch.kind === 'bottles' ? input.batch.value : Math.floor((litres * 1000) / input.bottleLiquidMl + 1e-9);
  return {
    finishedLitres: roundVolume(litres, input.units),
    bottles,
    baseLitres: roundVolume(litres * (1 + loss), input.units),
    topUpLitres: roundVolume(litres * loss, input.units),
    lines: input.lines.map((line) => ({
      name: line.name,
      ...roundMass(gramsPerLitre(line, input.bottleLiquidMl) * litres, input.units),
    })),
    sugars: input.sugars.map((sugar) => ({ name: sugar.name, ...roundMass(sugar.gPerL * litres, input.units) })),
  };
}
