import type { Transaction } from 'sequelize';

import { Recipe } from '@/server/db';
import { HttpError, notFound } from '@/server/errors';

import type { AuthContext } from './sessions';

/**
 * A recipe of the asking person's brewery, or 404: another brewery's id answers exactly like an id that does not
 * exist. `active` also refuses an archived recipe (409), for the steps that change it.
 */
export async function findOwnRecipe(
  auth: AuthContext,
  id: number,
  options: { transaction?: Transaction; active?: boolean } = {},
): Promise<Recipe> {
  const recipe = await Recipe.findOne({
    where: { id, organisationId: auth.organisationId },
    transaction: options.transaction,
  });
  if (!recipe) throw notFound('No such recipe in your brewery.');
  if (options.active && recipe.archivedAt) throw new HttpError(409, 'wrong_state', 'This recipe is archived.');
  return recipe;
}
