import { LRUCache } from 'lru-cache';

import { DEFAULT_RATING_SHARE, DEFAULT_WARMEST_TEMP_C } from '@/lib/chemistry/carbonation';
import { config } from '@/server/config';
import { BottleFormat } from '@/server/models/bottle-format';
import { Organisation } from '@/server/models/organisation';

/**
 * Per-brewery facts that every calculation reads (the alcohol limit, the bottle formats), kept in memory so that a
 * calculation costs no query. Hooks in db.ts clear a brewery's entry on this instance whenever its rows change;
 * other instances sharing the database read them again within `config.cacheTtlMs`.
 */
interface Entry {
  abvLimitPercent?: number;
  warmestTempC?: number;
  ratingSharePercent?: number;
  formats?: Map<number, BottleFormat>;
}

const cache = new LRUCache<number, Entry>({ max: 10_000, ttl: Math.max(config.cacheTtlMs, 1) });

export function forgetBrewery(organisationId?: number): void {
  if (organisationId === undefined) cache.clear();
  else cache.delete(organisationId);
}

function entry(organisationId: number): Entry {
  let found = cache.get(organisationId);
  if (!found) {
    found = {};
    cache.set(organisationId, found);
  }
  return found;
}

async function loadSettings(organisationId: number): Promise<Entry> {
  const e = entry(organisationId);
  if (e.abvLimitPercent === undefined || e.warmestTempC === undefined || e.ratingSharePercent === undefined) {
    const organisation = await Organisation.findByPk(organisationId, {
      attributes: ['abvLimitPercent', 'warmestTempC', 'ratingSharePercent'],
    });
    e.abvLimitPercent = organisation?.abvLimitPercent ?? 0.5;
    e.warmestTempC = organisation?.warmestTempC ?? DEFAULT_WARMEST_TEMP_C;
    e.ratingSharePercent = organisation?.ratingSharePercent ?? DEFAULT_RATING_SHARE * 100;
  }
  return e;
}

export async function cachedAbvLimit(organisationId: number): Promise<number> {
  return (await loadSettings(organisationId)).abvLimitPercent!;
}

/** The warmest the brewery's bottles may meet, °C. */
export async function cachedWarmestTemp(organisationId: number): Promise<number> {
  return (await loadSettings(organisationId)).warmestTempC!;
}

/** The share of a bottle's rating the most sugar may reach at the warm check, 0–1. */
export async function cachedRatingShare(organisationId: number): Promise<number> {
  return (await loadSettings(organisationId)).ratingSharePercent! / 100;
}

/** A bottle format of the brewery (archived ones included), or undefined. */
export async function cachedBottleFormat(organisationId: number, id: number): Promise<BottleFormat | undefined> {
  const e = entry(organisationId);
  if (!e.formats) {
    const rows = await BottleFormat.findAll({ where: { organisationId } });
    e.formats = new Map(rows.map((row) => [row.id, row]));
  }
  return e.formats.get(id);
}
