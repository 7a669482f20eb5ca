/**
 * Dates and money as people read them: one format for each, from the reader's locale (the browser's on screen, the
 * request's Accept-Language on a PDF). Stored dates stay ISO 8601.
 */

/** The currencies a brewery may keep its costs in (ISO 4217 codes). */
export const CURRENCIES = [
  'USD',
  'CAD',
  'MXN',
  'EUR',
  'GBP',
  'CHF',
  'SEK',
  'NOK',
  'DKK',
  'AUD',
  'NZD',
  'JPY',
  'ZAR',
] as const;
export type Currency = (typeof CURRENCIES)[number];

const safeLocale = (locale?: string) => {
  try {
    return locale ? Intl.getCanonicalLocales(locale)[0] : undefined;
  } catch {
    return undefined;
  }
};

const asDate = (value: string | Date) => (value instanceof Date ? value : new Date(value));

/** A day, e.g. "2 Dec 2026" or "Dec 2, 2026" by locale. A bare "YYYY-MM-DD" is that calendar day, not UTC midnight. */
export function formatDate(value: string | Date, locale?: string): string {
  const day = typeof value === 'string' && /^\d{4}-\d{2}-\d{2}$/.test(value);
  return new Intl.DateTimeFormat(safeLocale(locale), {
    dateStyle: 'medium',
    ...(day ? { timeZone: 'UTC' } : {}),
  }).format(day ? new Date(`${value}T00:00:00Z`) : asDate(value));
}

/** A moment, e.g. "2 Dec 2026, 14:05" or "Dec 2, 2026, 2:05 PM" by locale. */
export function formatDateTime(value: string | Date, locale?: string): string {
  return new Intl.DateTimeFormat(safeLocale(locale), { dateStyle: 'medium', timeStyle: 'short' }).format(asDate(value));
}

/** An amount of money in the brewery's currency, e.g. "$0.412" or "0,41 €"; `digits` decimals. */
export function formatMoney(amount: number, currency: string, digits = 2, locale?: string): string {
  return new Intl.NumberFormat(safeLocale(locale), {
    style: 'currency',
    currency,
    minimumFractionDigits: digits,
    maximumFractionDigits: digits,
  }).format(amount);
}

/**
 * An e-mail address that wraps at its sensible points when a column is narrow: before the "@" and before each dot
 * (zero-width spaces: a line break may fall there, and nowhere inside a word).
 */
export function breakableEmail(email: string): string {
  return email.replace(/([@.])/g, '\u200B$1');
}
