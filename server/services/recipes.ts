import { Op, type Transaction } from 'sequelize';

import type { RecipeDetail, RecipeSummary, TastingEntry, VersionEntry } from '@/lib/api/types';
import { SUGARS } from '@/lib/chemistry/sugars';
import { type Change, diffRecipes } from '@/lib/recipes/diff';
import { evaluateRecipe, type IngredientFacts, type RecipeEvaluation } from '@/lib/recipes/evaluate';
import { type ScaledRecipe, scaleRecipe } from '@/lib/recipes/scaling';
import { withSugarAddition } from '@/lib/recipes/tasting';
import type {
  CreateRecipeInput,
  RecipeContent,
  RecipeListFilter,
  SaveRecipeInput,
  ScaleRequest,
  TastingInput,
} from '@/lib/schemas/recipes';
import { Ingredient, likeOp, Recipe, RecipeReview, RecipeVersion, Tasting, transaction, User } from '@/server/db';
import { badRequest, HttpError, notFound } from '@/server/errors';

import { cachedAbvLimit, cachedBottleFormat, cachedWarmestTemp } from './brewery-cache';
import { displayNames, usableIngredients } from './ingredients';
import { findOwnRecipe } from './own-recipe';
import { reviewState } from './review-state';
import type { AuthContext } from './sessions';

const summary = (r: Recipe, returnedCurrent = false): RecipeSummary => ({
  id: r.id,
  name: r.name,
  flavourNotes: r.flavourNotes,
  status: r.archivedAt ? 'archived' : 'draft',
  currentVersion: r.currentVersion,
  submittedVersion: r.submittedVersion ?? null,
  approvedVersion: r.approvedVersion ?? null,
  reviewState: reviewState(r, returnedCurrent ? 'returned' : null),
  updatedAt: r.updatedAt.toISOString(),
});

const ownRecipe = (auth: AuthContext, id: number) => findOwnRecipe(auth, id);

/** Ingredient facts for the lines, refusing ingredients this brewery may not use (another brewery's house ones). */
async function ingredientFacts(
  auth: AuthContext,
  content: RecipeContent,
  strict: boolean,
): Promise<Map<number, IngredientFacts>> {
  const usable = await usableIngredients(
    auth,
    content.lines.map((l) => l.ingredientId),
  );
  const facts = new Map(
    usable.map(({ ingredient: r, name }) => [
      r.id,
      {
        id: r.id,
        name,
        sugarsG: r.sugarsG,
        carbohydrateG: r.carbohydrateG,
        fibreG: r.fibreG,
        fatG: r.fatG,
        fermentableShare: r.fermentableShare,
        allergens: r.allergens,
        costPerKg: r.costPerKg,
      },
    ]),
  );
  if (strict) {
    const fields: Record<string, string> = {};
    content.lines.forEach((line, i) => {
      if (!facts.has(line.ingredientId))
        fields[`content.lines[${i}].ingredientId`] = 'No such ingredient in your library.';
    });
    if (Object.keys(fields).length > 0) throw badRequest('Some ingredients are not in your library.', fields);
  }
  return facts;
}

async function bottleFacts(auth: AuthContext, content: RecipeContent) {
  const format = await cachedBottleFormat(auth.organisationId, content.bottleFormatId);
  if (!format)
    throw badRequest('No such bottle format in your brewery.', {
      'content.bottleFormatId': 'No such bottle format in your brewery.',
    });
  return format;
}

/** Checks what a version may refer to before it is stored. */
async function assertUsable(auth: AuthContext, content: RecipeContent): Promise<void> {
  await bottleFacts(auth, content);
  await ingredientFacts(auth, content, true);
}

export async function listRecipes(auth: AuthContext, q: string, status: RecipeListFilter): Promise<RecipeSummary[]> {
  const where: Record<string | symbol, unknown> = { organisationId: auth.organisationId };
  if (q) {
    const like = `%${q.replace(/[%_]/g, '')}%`;
    where[Op.or] = [{ name: { [likeOp()]: like } }, { flavourNotes: { [likeOp()]: like } }];
  }
  if (status === 'draft') where.archivedAt = { [Op.is]: null };
  if (status === 'archived') where.archivedAt = { [Op.not]: null };
  if (status === 'approved')
    Object.assign(where, { archivedAt: { [Op.is]: null }, approvedVersion: { [Op.not]: null } });
  const rows = await Recipe.findAll({ where, order: [['updatedAt', 'DESC']] });
  const returned = rows.length
    ? await RecipeReview.findAll({
        where: { recipeId: rows.map((r) => r.id), action: 'returned' },
        attributes: ['recipeId', 'versionNumber'],
      })
    : [];
  const returnedCurrent = new Set(
    returned
      .filter((e) => rows.find((r) => r.id === e.recipeId)?.currentVersion === e.versionNumber)
      .map((e) => e.recipeId),
  );
  const levels = await safetyLevels(auth, rows, status === 'approved');
  return rows.map((r) => ({ ...summary(r, returnedCurrent.has(r.id)), safetyLevel: levels.get(r.id) }));
}

const RANK = { ok: 0, caution: 1, danger: 2 } as const;

/**
 * The worst finding of each recipe's version that matters (the approved one for production lists), as judged for
 * review. A version that cannot be evaluated (an ingredient gone from the library) counts as danger.
 */
async function safetyLevels(
  auth: AuthContext,
  rows: Recipe[],
  approved: boolean,
): Promise<Map<number, 'ok' | 'caution' | 'danger'>> {
  const wanted = rows.map((r) => ({
    recipeId: r.id,
    number: approved ? (r.approvedVersion ?? r.currentVersion) : r.currentVersion,
  }));
  const versions = wanted.length
    ? await RecipeVersion.findAll({ where: { [Op.or]: wanted }, attributes: ['recipeId', 'number', 'content'] })
    : [];
  const levels = new Map<number, 'ok' | 'caution' | 'danger'>();
  for (const version of versions) {
    try {
      const result = await evaluate(auth, version.content, { forReview: true });
      levels.set(
        version.recipeId,
        result.carbonation.findings.reduce<'ok' | 'caution' | 'danger'>(
          (worst, f) => (RANK[f.level] > RANK[worst] ? f.level : worst),
          'ok',
        ),
      );
    } catch {
      levels.set(version.recipeId, 'danger');
    }
  }
  return levels;
}

async function detail(recipe: Recipe, number = recipe.currentVersion): Promise<RecipeDetail> {
  const version = await RecipeVersion.findOne({
    where: { recipeId: recipe.id, number },
    include: [{ model: User, as: 'createdBy', attributes: ['name'] }],
  });
  if (!version) throw notFound('No such version of this recipe.');
  const ids = version.content.lines.map((l) => l.ingredientId);
  const rows = ids.length
    ? await Ingredient.findAll({ where: { id: ids }, attributes: ['id', 'name', 'organisationId'] })
    : [];
  const names = await displayNames(recipe.organisationId, rows);
  const { reviewState: _state, ...head } = summary(recipe);
  return {
    ...head,
    version: version.number,
    name: version.name,
    flavourNotes: version.flavourNotes,
    content: version.content,
    versionNote: version.note,
    savedBy: version.createdBy?.name ?? null,
    savedAt: version.createdAt.toISOString(),
    ingredientNames: Object.fromEntries(names),
  };
}

export async function getRecipe(auth: AuthContext, id: number, version?: number): Promise<RecipeDetail> {
  return detail(await ownRecipe(auth, id), version);
}

export async function createRecipe(auth: AuthContext, input: CreateRecipeInput): Promise<RecipeDetail> {
  await assertUsable(auth, input.content);
  const recipe = await transaction(async (transaction) => {
    const created = await Recipe.create(
      { organisationId: auth.organisationId, name: input.name, flavourNotes: input.flavourNotes, currentVersion: 1 },
      { transaction },
    );
    await RecipeVersion.create(
      {
        recipeId: created.id,
        number: 1,
        name: input.name,
        flavourNotes: input.flavourNotes,
        content: input.content,
        note: 'First version',
        createdById: auth.userId,
      },
      { transaction },
    );
    return created;
  });
  return detail(recipe);
}

/**
 * Saves a new version. When someone else saved since the editor loaded `baseVersion`, nothing is written and the
 * answer says so (409), so that neither change is lost silently.
 */
export async function saveRecipe(auth: AuthContext, id: number, input: SaveRecipeInput): Promise<RecipeDetail> {
  await assertUsable(auth, input.content);
  const recipe = await transaction((t) => writeVersion(auth, id, input, t));
  return detail(recipe);
}

/** Writes the next version inside a write transaction, after the stale-version check. Answers the recipe row. */
async function writeVersion(
  auth: AuthContext,
  id: number,
  input: SaveRecipeInput,
  transaction: Transaction,
): Promise<Recipe> {
  const found = await findOwnRecipe(auth, id, { transaction });
  if (found.archivedAt)
    throw new HttpError(409, 'archived', 'This recipe is archived. Restore it or duplicate it to change it.');
  if (found.currentVersion !== input.baseVersion) {
    throw new HttpError(
      409,
      'stale_version',
      `Someone saved version ${found.currentVersion} while you were editing version ${input.baseVersion}. Reload to see it; your changes are still in the form.`,
    );
  }
  const number = found.currentVersion + 1;
  await RecipeVersion.create(
    {
      recipeId: found.id,
      number,
      name: input.name,
      flavourNotes: input.flavourNotes,
      content: input.content,
      note: input.note,
      createdById: auth.userId,
    },
    { transaction },
  );
  await found.update({ name: input.name, flavourNotes: input.flavourNotes, currentVersion: number }, { transaction });
  return found;
}

export async function listVersions(auth: AuthContext, id: number): Promise<VersionEntry[]> {
  const recipe = await ownRecipe(auth, id);
  const versions = await RecipeVersion.findAll({
    where: { recipeId: recipe.id },
    include: [{ model: User, as: 'createdBy', attributes: ['name'] }],
    order: [['number', 'DESC']],
  });
  return versions.map((v) => ({
    number: v.number,
    note: v.note,
    savedBy: v.createdBy?.name ?? null,
    savedAt: v.createdAt.toISOString(),
  }));
}

export async function diffVersions(auth: AuthContext, id: number, from: number, to: number): Promise<Change[]> {
  const recipe = await ownRecipe(auth, id);
  const [a, b] = await Promise.all([
    RecipeVersion.findOne({ where: { recipeId: recipe.id, number: from } }),
    RecipeVersion.findOne({ where: { recipeId: recipe.id, number: to } }),
  ]);
  if (!a || !b) throw notFound('No such version of this recipe.');
  const ids = [...a.content.lines, ...b.content.lines].map((l) => l.ingredientId);
  const rows = ids.length
    ? await Ingredient.findAll({ where: { id: ids }, attributes: ['id', 'name', 'organisationId'] })
    : [];
  return diffRecipes(a, b, await displayNames(auth.organisationId, rows));
}

/** Any version becomes the newest version again, as a new version: history is never rewritten. */
export async function restoreVersion(auth: AuthContext, id: number, number: number): Promise<RecipeDetail> {
  const recipe = await ownRecipe(auth, id);
  const version = await RecipeVersion.findOne({ where: { recipeId: recipe.id, number } });
  if (!version) throw notFound('No such version of this recipe.');
  return saveRecipe(auth, id, {
    name: version.name,
    flavourNotes: version.flavourNotes,
    content: version.content,
    baseVersion: recipe.currentVersion,
    note: `Restored version ${number}`,
  });
}

export async function duplicateRecipe(auth: AuthContext, id: number): Promise<RecipeDetail> {
  const source = await getRecipe(auth, id);
  return createRecipe(auth, {
    name: `${source.name} (variation)`.slice(0, 100),
    flavourNotes: source.flavourNotes,
    content: source.content,
  });
}

export async function setRecipeArchived(auth: AuthContext, id: number, archived: boolean): Promise<RecipeSummary> {
  const recipe = await ownRecipe(auth, id);
  await recipe.update({ archivedAt: archived ? new Date() : null });
  return summary(recipe);
}

/**
 * The numbers of a recipe (saved or being edited) for one bottle of its format. For review (a submitted version,
 * the approval, the card) a missing pH is a caution of its own.
 */
export async function evaluate(
  auth: AuthContext,
  content: RecipeContent,
  options: { forReview?: boolean } = {},
): Promise<RecipeEvaluation> {
  const format = await bottleFacts(auth, content);
  const facts = await ingredientFacts(auth, content, true);
  return evaluateRecipe(content, format, facts, await cachedAbvLimit(auth.organisationId), 'worst', {
    phRequired: options.forReview === true,
    warmDayTempC: await cachedWarmestTemp(auth.organisationId),
  });
}

export async function scale(
  auth: AuthContext,
  id: number,
  input: ScaleRequest,
): Promise<ScaledRecipe & { version: number; bottleName: string; bottleLiquidMl: number }> {
  const recipe = await getRecipe(auth, id, input.version ?? undefined);
  const format = await bottleFacts(auth, recipe.content);
  const names = recipe.ingredientNames;
  try {
    const scaled = scaleRecipe({
      lines: recipe.content.lines.map((l) => ({
        name: names[l.ingredientId] ?? `Ingredient ${l.ingredientId}`,
        amount: l.amount,
        unit: l.unit as never,
      })),
      sugars: recipe.content.sugars.map((s) => ({ name: SUGARS[s.type].label, gPerL: s.gPerL })),
      bottleLiquidMl: format.liquidMl,
      process:
        recipe.content.process.method === 'steep-strain'
          ? { method: 'steep-strain', strainLossPct: recipe.content.process.strainLossPct }
          : { method: 'in-bottle' },
      batch: input.batch,
      units: input.units,
    });
    return { ...scaled, version: recipe.version, bottleName: format.name, bottleLiquidMl: format.liquidMl };
  } catch (error) {
    if (error instanceof RangeError) throw badRequest(error.message, { 'batch.value': error.message });
    throw error;
  }
}

/**
 * Records a tasting of the newest version. A sugar addition makes the next version; the tasting and that version are
 * written in one transaction, so neither exists without the other.
 */
export async function addTasting(auth: AuthContext, id: number, input: TastingInput): Promise<TastingEntry[]> {
  const recipe = await getRecipe(auth, id);
  const tasted = recipe.currentVersion;
  await transaction(async (t) => {
    let createdVersion: number | null = null;
    if (input.sugarAddition) {
      const { type, grams, toMl } = input.sugarAddition;
      const saved = await writeVersion(
        auth,
        id,
        {
          name: recipe.name,
          flavourNotes: recipe.flavourNotes,
          content: withSugarAddition(recipe.content, input.sugarAddition),
          baseVersion: tasted,
          note: `Tasting ${input.tastedOn}: +${grams} g ${type} to ${toMl} mL`,
        },
        t,
      );
      createdVersion = saved.currentVersion;
    }
    await Tasting.create(
      { recipeId: id, versionNumber: tasted, createdVersion, userId: auth.userId, ...input },
      { transaction: t },
    );
  });
  return listTastings(auth, id);
}

export async function listTastings(auth: AuthContext, id: number): Promise<TastingEntry[]> {
  const recipe = await ownRecipe(auth, id);
  const rows = await Tasting.findAll({
    where: { recipeId: recipe.id },
    include: [{ model: User, as: 'user', attributes: ['name'] }],
    order: [
      ['tastedOn', 'DESC'],
      ['id', 'DESC'],
    ],
  });
  return rows.map((t) => ({
    id: t.id,
    versionNumber: t.versionNumber,
    createdVersion: t.createdVersion,
    tastedOn: t.tastedOn,
    by: t.user?.name ?? null,
    notes: t.notes,
    scores: { sweetness: t.sweetness, sourness: t.sourness, fizz: t.fizz, flavour: t.flavour },
    sugarAddition: t.sugarAddition,
  }));
}
