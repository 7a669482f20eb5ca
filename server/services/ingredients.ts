import { isDeepStrictEqual } from 'node:util';

import { Op, QueryTypes, type Transaction } from 'sequelize';

import type { Ingredient as IngredientDtoShape, IngredientChangeEntry, IngredientPage } from '@/lib/api/types';
import { CATEGORIES, LABEL_NUTRIENT_FIELDS, type Measure, shortIngredientName } from '@/lib/ingredients';
import { addedSugarShare } from '@/lib/nutrition/composition';
import { type HouseIngredientInput, type IngredientSearch, per100g } from '@/lib/schemas/ingredients';
import {
  dialect,
  Ingredient,
  IngredientChange,
  IngredientDisplayName,
  sequelize,
  transaction,
  User,
} from '@/server/db';
import { conflict, forbidden, notFound } from '@/server/errors';
import type { DatasetIngredient } from '@/server/usda/sr-files';

import type { AuthContext } from './sessions';

export type IngredientDto = IngredientDtoShape;

const div100 = (v: number | null) => (v === null ? null : v / 100);

/**
 * The names a brewery reads for these ingredients: its own short name for a dataset row when it set one, else the
 * short name made from the dataset's description; a house ingredient's own name.
 */
export async function displayNames(
  organisationId: number,
  rows: Pick<Ingredient, 'id' | 'name' | 'organisationId'>[],
  transaction?: Transaction,
): Promise<Map<number, string>> {
  const dataset = rows.filter((r) => r.organisationId === null).map((r) => r.id);
  const chosen = dataset.length
    ? await IngredientDisplayName.findAll({
        where: { organisationId, ingredientId: dataset },
        attributes: ['ingredientId', 'name'],
        transaction,
      })
    : [];
  const own = new Map(chosen.map((c) => [c.ingredientId, c.name]));
  return new Map(
    rows.map((r) => [r.id, r.organisationId === null ? (own.get(r.id) ?? shortIngredientName(r.name)) : r.name]),
  );
}

export function toIngredientDto(i: Ingredient, displayName?: string): IngredientDto {
  return {
    id: i.id,
    scope: i.organisationId === null ? 'dataset' : 'house',
    name: i.name,
    displayName: displayName ?? (i.organisationId === null ? shortIngredientName(i.name) : i.name),
    category: i.category,
    per100g: {
      energyKcal: i.energyKcal,
      carbohydrateG: i.carbohydrateG,
      sugarsG: i.sugarsG,
      fibreG: i.fibreG,
      fatG: i.fatG,
      proteinG: i.proteinG,
    },
    labelPer100g: Object.fromEntries(LABEL_NUTRIENT_FIELDS.map((f) => [f, i[f]])) as IngredientDtoShape['labelPer100g'],
    perGram: {
      sugarsG: div100(i.sugarsG),
      fermentableSugarsG: i.sugarsG === null ? null : (i.sugarsG / 100) * i.fermentableShare,
      fatG: div100(i.fatG),
    },
    fermentableSharePct: i.fermentableShare * 100,
    steepSharePct: i.steepShare * 100,
    allergens: i.allergens,
    measures: i.measures,
    costPerKg: i.costPerKg,
    notes: i.notes,
    source: i.sourceDataset ? `${i.sourceDataset} record ${i.sourceRecord}` : 'house',
    archived: i.archivedAt !== null,
  };
}

// ---------------------------------------------------------------- dataset import

const COMPARED: (keyof DatasetIngredient)[] = [
  'name',
  'category',
  'energyKcal',
  'carbohydrateG',
  'sugarsG',
  'fibreG',
  'fatG',
  'proteinG',
  ...LABEL_NUTRIENT_FIELDS,
  'fermentableShare',
  'steepShare',
  'allergens',
  'measures',
  'notes',
];
/** Equal in value: JSONB hands objects back with their keys in its own order, so key order must not count. */
const same = (a: unknown, b: unknown) => isDeepStrictEqual(a, b);

export interface ImportReport {
  created: number;
  updated: number;
  unchanged: number;
}

/**
 * Imports or updates dataset ingredients in one transaction, matched on dataset and record number. Running it
 * twice changes nothing the second time.
 */
export async function importDatasetIngredients(
  rows: DatasetIngredient[],
  onProgress?: (done: number) => void,
): Promise<ImportReport> {
  const report: ImportReport = { created: 0, updated: 0, unchanged: 0 };
  await transaction(async (transaction) => {
    const existing = new Map(
      (await Ingredient.findAll({ where: { organisationId: null }, transaction })).map((i) => [
        `${i.sourceDataset}|${i.sourceRecord}`,
        i,
      ]),
    );
    const toCreate: DatasetIngredient[] = [];
    for (const [index, row] of rows.entries()) {
      const found = existing.get(`${row.sourceDataset}|${row.sourceRecord}`);
      if (!found) toCreate.push(row);
      else if (COMPARED.some((key) => !same(found.get(key as never), row[key]))) {
        await found.update(Object.fromEntries(COMPARED.map((key) => [key, row[key]])), { transaction });
        report.updated += 1;
      } else report.unchanged += 1;
      if (index % 250 === 0) onProgress?.(index);
    }
    for (let i = 0; i < toCreate.length; i += 500) {
      await Ingredient.bulkCreate(
        toCreate.slice(i, i + 500).map((row) => ({ ...row, organisationId: null })),
        { transaction },
      );
    }
    report.created = toCreate.length;
    onProgress?.(rows.length);
  });
  return report;
}

export async function datasetIngredientCount(): Promise<number> {
  return Ingredient.count({ where: { organisationId: null } });
}

/**
 * The ingredients of `ids` that this brewery may use (dataset foods and its own house ones; another brewery's are
 * left out, as if they did not exist), each under the name the brewery reads.
 */
export async function usableIngredients(
  auth: AuthContext,
  ids: number[],
): Promise<{ ingredient: Ingredient; name: string }[]> {
  const unique = [...new Set(ids)];
  const rows = unique.length
    ? await Ingredient.findAll({
        where: { id: unique, [Op.or]: [{ organisationId: null }, { organisationId: auth.organisationId }] },
      })
    : [];
  const names = await displayNames(auth.organisationId, rows);
  return rows.map((ingredient) => ({ ingredient, name: names.get(ingredient.id) ?? ingredient.name }));
}

/** True when dataset foods exist but none carries a label nutrient: imported before those were read. */
export async function datasetLacksLabelNutrients(): Promise<boolean> {
  const withSodium = await Ingredient.count({ where: { organisationId: null, sodiumMg: { [Op.not]: null } } });
  return withSodium === 0;
}

// ---------------------------------------------------------------- search

/** The words of a search, lower case, at most eight: "Straw, rasp" → ["straw", "rasp"]. */
function searchWords(q: string): string[] {
  return (q.toLowerCase().match(/[\p{L}\p{N}]+/gu) ?? []).slice(0, 8);
}

/** Word prefixes of the query as an FTS5 expression: "straw rasp" → "straw"* OR "rasp"*. */
export function ftsQuery(q: string): string | null {
  const words = searchWords(q);
  return words.length === 0 ? null : words.map((w) => `"${w}"*`).join(' OR ');
}

/** The same as a PostgreSQL tsquery: "straw rasp" → straw:* | rasp:* (the words hold letters and digits only). */
export function tsQuery(q: string): string | null {
  const words = searchWords(q);
  return words.length === 0 ? null : words.map((w) => `${w}:*`).join(' | ');
}

/**
 * The dialect's own full-text search: which rows match, and how well. SQLite: FTS5 with BM25 (CROSS JOIN makes
 * SQLite run the full-text match first and look rows up by id; left to itself it walks every ingredient and probes
 * the index per row, 150 ms instead of 1 ms over the full dataset). PostgreSQL: the trigger-kept tsvector under its
 * GIN index, ranked by ts_rank divided by the name's length (normalisation 2: shorter names first, as BM25 does),
 * negated because BM25 sorts lower as better. Over the SR25 import the two put the same food first for each of
 * ten sample searches (tested in usda-import.test.ts on both).
 */
const FULL_TEXT = {
  sqlite: {
    query: ftsQuery,
    from: 'ingredient_search s CROSS JOIN ingredients i ON i.id = s.rowid',
    match: 'ingredient_search MATCH :match',
    rank: 'bm25(ingredient_search)',
  },
  postgres: {
    query: tsQuery,
    from: 'ingredients i',
    match: "i.search_vector @@ to_tsquery('simple', unaccent(:match))",
    rank: "-ts_rank(i.search_vector, to_tsquery('simple', unaccent(:match)), 2)",
  },
} as const;

/**
 * Ingredients a brewery may use: the dataset and its own house ingredients (house first), ranked by relevance
 * (BM25 over the names) when there is a query, by name otherwise.
 */
/**
 * What people flavour with, shown before the rest of the dataset when nothing is searched: fruit, juices, purées,
 * dried fruit, herbs, spices, sugars and syrups, sweet baked goods (not dairy or the rest of the food table).
 */
const FLAVOUR_CATEGORIES = CATEGORIES.filter((c) => c !== 'dairy' && c !== 'other');

export async function searchIngredients(auth: AuthContext, search: IngredientSearch): Promise<IngredientPage> {
  const fullText = FULL_TEXT[dialect()];
  const match = fullText.query(search.q);
  const filters = [
    '(i.organisation_id IS NULL OR i.organisation_id = :org)',
    search.archived ? 'i.archived_at IS NOT NULL' : 'i.archived_at IS NULL',
  ];
  if (search.category) filters.push('i.category = :category');
  // The name's first part (before its first comma) starting with the first word searched ranks first: "honey" finds
  // "Honey" before "Ham, honey roasted", "vanilla" finds "Vanilla extract".
  const lead = `${(
    search.q
      .trim()
      .toLowerCase()
      .match(/[\p{L}\p{N}]+/u)?.[0] ?? ''
  ).replace(/[%_]/g, '')}%`;
  const replacements = {
    org: auth.organisationId,
    lead,
    flavour: FLAVOUR_CATEGORIES,
    category: search.category,
    match,
    limit: search.pageSize,
    offset: (search.page - 1) * search.pageSize,
  };
  const from = match ? fullText.from : 'ingredients i';
  const where = `${match ? `${fullText.match} AND ` : ''}${filters.join(' AND ')}`;
  const order = match
    ? `(i.organisation_id IS NULL), (lower(i.name) NOT LIKE :lead), ${fullText.rank}, length(i.name), i.id`
    : '(i.organisation_id IS NULL), (i.category NOT IN (:flavour)), i.name, i.id';
  const [ids, [{ total }]] = await Promise.all([
    sequelize.query<{ id: number }>(
      `SELECT i.id FROM ${from} WHERE ${where} ORDER BY ${order} LIMIT :limit OFFSET :offset`,
      { replacements, type: QueryTypes.SELECT },
    ),
    sequelize.query<{ total: number }>(`SELECT count(*) AS total FROM ${from} WHERE ${where}`, {
      replacements,
      type: QueryTypes.SELECT,
    }),
  ]);
  const rows = await Ingredient.findAll({ where: { id: ids.map((r) => r.id) } });
  const byId = new Map(rows.map((r) => [r.id, r]));
  const names = await displayNames(auth.organisationId, rows);
  return {
    items: ids.map((r) => toIngredientDto(byId.get(r.id)!, names.get(r.id))),
    total,
    page: search.page,
    pageSize: search.pageSize,
  };
}

// ---------------------------------------------------------------- one ingredient

/** An ingredient this brewery may see (the dataset or its own), archived ones included. */
export async function visibleIngredient(auth: AuthContext, id: number): Promise<Ingredient> {
  const found = await Ingredient.findOne({
    where: { id, [Op.or]: [{ organisationId: null }, { organisationId: auth.organisationId }] },
  });
  if (!found) throw notFound('No such ingredient in your library.');
  return found;
}

async function ownHouseIngredient(auth: AuthContext, id: number, transaction?: Transaction): Promise<Ingredient> {
  const found = await Ingredient.findOne({
    where: { id, [Op.or]: [{ organisationId: null }, { organisationId: auth.organisationId }] },
    transaction,
  });
  if (!found) throw notFound('No such ingredient in your library.');
  if (found.organisationId === null)
    throw forbidden('Dataset ingredients are read-only. Copy it to a house ingredient to change it.');
  return found;
}

/** One ingredient as this brewery reads it, with its display name. */
export async function ingredientFor(auth: AuthContext, id: number): Promise<IngredientDto> {
  const found = await visibleIngredient(auth, id);
  return toIngredientDto(found, (await displayNames(auth.organisationId, [found])).get(found.id));
}

/**
 * Sets the brewery's short name for a dataset ingredient; an empty name goes back to the one made from the dataset's
 * description. House ingredients are renamed on their own form.
 */
export async function setDisplayName(auth: AuthContext, id: number, name: string): Promise<IngredientDto> {
  const found = await visibleIngredient(auth, id);
  if (found.organisationId !== null)
    throw conflict('A house ingredient’s name is its display name: change it on its form.', {
      displayName: 'Change a house ingredient’s name on its form.',
    });
  await transaction(async (t) => {
    const where = { organisationId: auth.organisationId, ingredientId: id };
    const existing = await IngredientDisplayName.findOne({ where, transaction: t });
    if (!name) await existing?.destroy({ transaction: t });
    else if (existing) await existing.update({ name }, { transaction: t });
    else await IngredientDisplayName.create({ ...where, name }, { transaction: t });
  });
  return ingredientFor(auth, id);
}

export async function ingredientChanges(auth: AuthContext, id: number): Promise<IngredientChangeEntry[]> {
  const ingredient = await visibleIngredient(auth, id);
  const rows = await IngredientChange.findAll({
    where: { ingredientId: ingredient.id },
    include: [{ model: User, as: 'user', attributes: ['name'] }],
    order: [['id', 'DESC']],
  });
  return rows.map((c) => ({
    id: c.id,
    action: c.action,
    at: c.createdAt.toISOString(),
    by: c.user?.name ?? null,
    changes: c.changes,
  }));
}

function fromLabel(input: HouseIngredientInput) {
  const grams = input.servingUnit === 'ml' ? input.servingGrams! : input.servingSize;
  return {
    name: input.name,
    category: input.category,
    energyKcal: per100g(input.energyKcal, grams),
    carbohydrateG: per100g(input.carbohydrateG, grams),
    sugarsG: per100g(input.sugarsG, grams),
    fibreG: per100g(input.fibreG, grams),
    fatG: per100g(input.fatG, grams),
    proteinG: per100g(input.proteinG, grams),
    ...Object.fromEntries(LABEL_NUTRIENT_FIELDS.map((f) => [f, per100g(input[f], grams)])),
    fermentableShare: input.fermentableSharePct / 100,
    steepShare: input.steepSharePct / 100,
    allergens: input.allergens,
    costPerKg: input.costPerKg,
    notes: input.notes,
  };
}

async function assertNameFree(auth: AuthContext, name: string, exceptId?: number, transaction?: Transaction) {
  const clash = await Ingredient.findOne({
    where: { organisationId: auth.organisationId, name, ...(exceptId ? { id: { [Op.ne]: exceptId } } : {}) },
    transaction,
  });
  if (clash)
    throw conflict('Your brewery already has an ingredient with this name.', {
      name: 'Your brewery already has an ingredient with this name.',
    });
}

export async function createHouseIngredient(
  auth: AuthContext,
  input: HouseIngredientInput,
  measures: Measure[] = [],
): Promise<IngredientDto> {
  return transaction(async (transaction) => {
    await assertNameFree(auth, input.name, undefined, transaction);
    const values = { ...fromLabel(input), measures, sourceDataset: null, sourceRecord: null };
    const created = await Ingredient.create({ ...values, organisationId: auth.organisationId }, { transaction });
    await IngredientChange.create(
      {
        ingredientId: created.id,
        userId: auth.userId,
        action: 'created',
        changes: Object.fromEntries(
          Object.entries(values).map(([k, v]): [string, [unknown, unknown]] => [k, [null, v]]),
        ),
      },
      { transaction },
    );
    return toIngredientDto(created);
  });
}

export async function updateHouseIngredient(
  auth: AuthContext,
  id: number,
  input: HouseIngredientInput,
): Promise<IngredientDto> {
  return transaction(async (transaction) => {
    const ingredient = await ownHouseIngredient(auth, id, transaction);
    await assertNameFree(auth, input.name, id, transaction);
    const next = fromLabel(input);
    const changes: Record<string, [unknown, unknown]> = {};
    for (const [key, value] of Object.entries(next)) {
      const before = ingredient.get(key as never) as unknown;
      if (!same(before, value)) changes[key] = [before, value];
    }
    if (Object.keys(changes).length > 0) {
      await ingredient.update(next, { transaction });
      await IngredientChange.create(
        { ingredientId: id, userId: auth.userId, action: 'updated', changes },
        { transaction },
      );
    }
    return toIngredientDto(ingredient);
  });
}

/** Archived house ingredients leave search but stay readable wherever they are used. */
export async function setHouseIngredientArchived(
  auth: AuthContext,
  id: number,
  archived: boolean,
): Promise<IngredientDto> {
  return transaction(async (transaction) => {
    const ingredient = await ownHouseIngredient(auth, id, transaction);
    await ingredient.update({ archivedAt: archived ? new Date() : null }, { transaction });
    await IngredientChange.create(
      { ingredientId: id, userId: auth.userId, action: archived ? 'archived' : 'restored', changes: {} },
      { transaction },
    );
    return toIngredientDto(ingredient);
  });
}

/** A copy of any visible ingredient as a new house ingredient, to adjust. */
export async function copyToHouse(auth: AuthContext, id: number, name: string): Promise<IngredientDto> {
  const source = await visibleIngredient(auth, id);
  return transaction(async (transaction) => {
    await assertNameFree(auth, name, undefined, transaction);
    const values = {
      name,
      category: source.category,
      energyKcal: source.energyKcal,
      carbohydrateG: source.carbohydrateG,
      sugarsG: source.sugarsG,
      fibreG: source.fibreG,
      fatG: source.fatG,
      proteinG: source.proteinG,
      ...Object.fromEntries(LABEL_NUTRIENT_FIELDS.map((f) => [f, source[f]])),
      // A copy says outright how much of its sugar is added, as a dataset food is judged (its own sugars are not).
      addedSugarsG:
        source.organisationId === null
          ? (source.sugarsG ?? 0) * addedSugarShare({ ...source.get(), house: false }).share
          : source.addedSugarsG,
      fermentableShare: source.fermentableShare,
      steepShare: source.steepShare,
      allergens: source.allergens,
      measures: source.measures,
      costPerKg: source.costPerKg,
      notes: [
        `Copied from ${source.name} (${source.sourceDataset ? `${source.sourceDataset} record ${source.sourceRecord}` : 'house'}).`,
        source.notes,
      ]
        .filter(Boolean)
        .join(' '),
      sourceDataset: null,
      sourceRecord: null,
    };
    const created = await Ingredient.create({ ...values, organisationId: auth.organisationId }, { transaction });
    await IngredientChange.create(
      { ingredientId: created.id, userId: auth.userId, action: 'created', changes: { copiedFrom: [null, source.id] } },
      { transaction },
    );
    return toIngredientDto(created);
  });
}
