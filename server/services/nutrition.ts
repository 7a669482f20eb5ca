import type { Allergen } from '@/lib/ingredients';
import { composeRecipe, type LabelIngredientFacts } from '@/lib/nutrition/composition';
import { servingFor } from '@/lib/nutrition/label-rules';
import { buildNutrition, type LabEntry, type NutritionAnswer } from '@/lib/nutrition/panel';
import type { LabValuesInput, NutritionQuery } from '@/lib/schemas/nutrition';
import { NutritionLabValue, RecipeVersion, transaction, User } from '@/server/db';
import { badRequest, notFound } from '@/server/errors';

import { cachedAbvLimit, cachedBottleFormat } from './brewery-cache';
import { usableIngredients } from './ingredients';
import { getRecipe } from './recipes';
import type { AuthContext } from './sessions';

/** The label facts of the ingredients a version uses, under the names the brewery reads. */
async function labelFacts(auth: AuthContext, ids: number[]): Promise<Map<number, LabelIngredientFacts>> {
  const usable = await usableIngredients(auth, ids);
  return new Map(
    usable.map(({ ingredient: r, name }) => [
      r.id,
      {
        ...r.get({ plain: true }),
        name,
        allergens: r.allergens,
        house: r.organisationId !== null,
      },
    ]),
  );
}

async function latestLab(recipeId: number, version: number): Promise<LabEntry | null> {
  const row = await NutritionLabValue.findOne({
    where: { recipeId, versionNumber: version },
    include: [{ model: User, as: 'enteredBy', attributes: ['name'] }],
    order: [['id', 'DESC']],
  });
  if (!row) return null;
  return {
    per100Ml: row.per100Ml,
    reference: row.reference,
    enteredBy: row.enteredBy?.name ?? null,
    enteredAt: row.createdAt.toISOString(),
  };
}

/**
 * The nutrition panel of a recipe version (the newest when none is asked): both estimated bases, the lab's values
 * when an owner entered some, and the allergen statement. Another brewery's recipe is a 404.
 */
export async function recipeNutrition(auth: AuthContext, id: number, query: NutritionQuery): Promise<NutritionAnswer> {
  const recipe = await getRecipe(auth, id, query.version);
  const { content } = recipe;
  const format = await cachedBottleFormat(auth.organisationId, content.bottleFormatId);
  if (!format) throw notFound('The bottle format of this version is no longer in your brewery.');
  const facts = await labelFacts(
    auth,
    content.lines.map((l) => l.ingredientId),
  );
  const allergens: Allergen[] = [];
  for (const line of content.lines)
    for (const allergen of facts.get(line.ingredientId)?.allergens ?? [])
      if (!allergens.includes(allergen)) allergens.push(allergen);
  return buildNutrition({
    recipeId: recipe.id,
    version: recipe.version,
    recipeName: recipe.name,
    bottleName: format.name,
    containerMl: format.liquidMl,
    serving: servingFor(format.liquidMl, query.servingMl ?? null),
    servingAskedMl: query.servingMl ?? null,
    composition: composeRecipe(content, format.liquidMl, facts),
    steeped: content.process.method === 'steep-strain',
    allergens,
    lab: await latestLab(recipe.id, recipe.version),
    abvLimitPercent: await cachedAbvLimit(auth.organisationId),
  });
}

/**
 * Records an owner's lab values per 100 mL for a version (a new row each time, so what was declared when stays on
 * record); all values empty clears them. Answers the panel as it now stands.
 */
export async function setLabValues(auth: AuthContext, id: number, input: LabValuesInput): Promise<NutritionAnswer> {
  const recipe = await getRecipe(auth, id);
  const exists = await RecipeVersion.count({ where: { recipeId: recipe.id, number: input.version } });
  if (!exists) throw badRequest('No such version of this recipe.', { version: 'No such version of this recipe.' });
  const per100Ml = Object.fromEntries(
    Object.entries(input.per100Ml).filter(([, value]) => value !== null && value !== undefined),
  );
  await transaction((t) =>
    NutritionLabValue.create(
      {
        recipeId: recipe.id,
        versionNumber: input.version,
        per100Ml,
        reference: input.reference,
        enteredById: auth.userId,
      },
      { transaction: t },
    ),
  );
  return recipeNutrition(auth, id, { version: input.version });
}
