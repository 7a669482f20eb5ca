import convert from 'convert-units';

/**
 * Unit conversion for display and input. The API and the engine speak g, mL, L, °C and bar; the screens convert
 * here, and nowhere else, when a person works in US units.
 */
export type UnitSystem = 'metric' | 'us';
export const UNIT_SYSTEMS: UnitSystem[] = ['metric', 'us'];

type Unit = 'g' | 'kg' | 'oz' | 'lb' | 'ml' | 'l' | 'fl-oz' | 'gal' | 'C' | 'F' | 'bar' | 'psi' | 'kPa';

/** Converts between any two units of the same kind. */
export function convertUnit(value: number, from: Unit, to: Unit): number {
  if (from === to) return value;
  return convert(value).from(from).to(to);
}

export const cToF = (c: number) => convertUnit(c, 'C', 'F');
export const fToC = (f: number) => convertUnit(f, 'F', 'C');
export const barToPsi = (bar: number) => convertUnit(bar, 'bar', 'psi');
export const mlToFlOz = (ml: number) => convertUnit(ml, 'ml', 'fl-oz');
export const flOzToMl = (flOz: number) => convertUnit(flOz, 'fl-oz', 'ml');
export const litresToGallons = (l: number) => convertUnit(l, 'l', 'gal');
export const gallonsToLitres = (gal: number) => convertUnit(gal, 'gal', 'l');
export const gramsToOunces = (g: number) => convertUnit(g, 'g', 'oz');

/** How a quantity of each kind is shown in each unit system. */
export const displayUnits: Record<
  UnitSystem,
  { temperature: 'C' | 'F'; smallVolume: 'ml' | 'fl-oz'; pressure: 'bar' | 'psi' }
> = {
  metric: { temperature: 'C', smallVolume: 'ml', pressure: 'bar' },
  us: { temperature: 'F', smallVolume: 'fl-oz', pressure: 'psi' },
};

export const unitLabels: Record<Unit, string> = {
  g: 'g',
  kg: 'kg',
  oz: 'oz',
  lb: 'lb',
  ml: 'mL',
  l: 'L',
  'fl-oz': 'US fl oz',
  gal: 'US gal',
  C: '°C',
  F: '°F',
  bar: 'bar',
  psi: 'psi',
  kPa: 'kPa',
};

/** A number rounded for reading: `digits` decimals, trailing zeros kept so columns line up. */
export function formatNumber(value: number, digits = 1): string {
  if (!Number.isFinite(value)) return '–';
  return value.toLocaleString('en-US', { minimumFractionDigits: digits, maximumFractionDigits: digits });
}

/** A temperature in the person's units, e.g. "35 °C" or "95 °F". */
export function formatTemp(tempC: number, units: UnitSystem, digits = 0): string {
  return units === 'us' ? `${formatNumber(cToF(tempC), digits)} °F` : `${formatNumber(tempC, digits)} °C`;
}

/** A gauge pressure in the person's units first and the other in brackets: "2.10 bar (30 psi)". */
export function formatPressure(bar: number, units: UnitSystem): string {
  const psi = `${formatNumber(barToPsi(bar), 0)} psi`;
  const inBar = `${formatNumber(bar, 2)} bar`;
  return units === 'us' ? `${psi} (${inBar})` : `${inBar} (${psi})`;
}

/** A bottle-sized volume: "500 mL" or "16.9 US fl oz". */
export function formatSmallVolume(ml: number, units: UnitSystem): string {
  return units === 'us' ? `${formatNumber(mlToFlOz(ml), 1)} US fl oz` : `${formatNumber(ml, 0)} mL`;
}

const NUMBER = String.raw`(-?\d+(?:[.,]\d+)?)`;

/**
 * A message the engine wrote in °C, bar and mL, in the person's units: "35 °C" becomes "95 °F", "3 bar" becomes
 * "44 psi (3.00 bar)", "2 mL" becomes "0.07 US fl oz (2 mL)". Ranges ("0–40 °C") convert both ends. Metric is
 * returned as written.
 */
export function inUnits(message: string, units: UnitSystem): string {
  if (units === 'metric') return message;
  const num = (s: string) => Number(s.replace(',', ''));
  return (
    message
      .replace(
        new RegExp(`${NUMBER}\\s?[–-]\\s?${NUMBER} °C`, 'g'),
        (_, a: string, b: string) => `${formatNumber(cToF(num(a)), 0)}–${formatNumber(cToF(num(b)), 0)} °F`,
      )
      .replace(new RegExp(`${NUMBER} °C`, 'g'), (_, t: string) => formatTemp(num(t), 'us'))
      // "2.93 bar (42 psi)", as formatPressure writes it, or a bare "3 bar": either way psi first, bar after.
      .replace(new RegExp(`${NUMBER} bar(?: \\(-?\\d+ psi\\))?`, 'g'), (_, p: string) => formatPressure(num(p), 'us'))
      .replace(
        new RegExp(`${NUMBER} mL\\b`, 'g'),
        (_, v: string) => `${formatNumber(mlToFlOz(num(v)), 2)} US fl oz (${v} mL)`,
      )
  );
}
