import { unit as mathUnit } from 'mathjs';

/** A quantity as people write it ("2 kg", "5 lb", "3 gal"), in grams or litres. */
export interface Quantity {
  value: number;
  unit: 'g' | 'L';
}

const GRAM = mathUnit('1 g');
const LITRE = mathUnit('1 L');

/**
 * Reads a quantity with mathjs's units: mass becomes grams, volume litres (US gallons and fluid ounces, as the trade
 * in the US writes them). A comma is taken as the decimal mark. Anything else (no unit, a length, a word) is null.
 */
export function parseQuantity(text: string): Quantity | null {
  const cleaned = text
    .trim()
    .replace(/(\d),(\d)/g, '$1.$2')
    .replace(/\bfl\.?\s*oz\b/gi, 'floz')
    .replace(/\blbs\b/gi, 'lb');
  if (!/^\d/.test(cleaned)) return null;
  try {
    const quantity = mathUnit(cleaned);
    const value = quantity.toNumber();
    if (!Number.isFinite(value) || value <= 0) return null;
    if (quantity.equalBase(GRAM)) return { value: quantity.toNumber('g'), unit: 'g' };
    if (quantity.equalBase(LITRE)) return { value: quantity.toNumber('L'), unit: 'L' };
    return null;
  } catch {
    return null;
  }
}
