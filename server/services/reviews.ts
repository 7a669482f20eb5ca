import { Op, type Transaction, type WhereOptions } from 'sequelize';

import type { ReviewTimeline } from '@/lib/api/types';
import { rolesWith } from '@/lib/roles';
import type { ApproveInput, ReturnInput, SubmitInput, WithdrawInput } from '@/lib/schemas/reviews';
import { Organisation, Recipe, RecipeReview, RecipeVersion, transaction, User } from '@/server/db';
import { forbidden, HttpError } from '@/server/errors';
import { mailer } from '@/server/mail/mailer';
import { reviewDecisionMail, reviewSubmittedMail } from '@/server/mail/templates';

import { findOwnRecipe } from './own-recipe';
import { evaluate } from './recipes';
import { reviewState } from './review-state';
import type { AuthContext } from './sessions';

const wrongState = (message: string) => new HttpError(409, 'wrong_state', message);

const DECIDED = 'Someone decided on this version a moment ago. Reload to see where it stands.';

/**
 * Moves a recipe from one review state to the next only if it is still in the state the checks saw: a conditional
 * update inside the transaction, so ten identical requests at once make one event and nine 409s.
 */
async function claim(
  changes: Partial<Pick<Recipe, 'submittedVersion' | 'approvedVersion'>>,
  where: WhereOptions<Recipe>,
  t: Transaction,
  message: string,
): Promise<void> {
  const [moved] = await Recipe.update(changes, { where, transaction: t });
  if (moved !== 1) throw wrongState(message);
}

const waitingVersion = (id: number, version: number): WhereOptions<Recipe> => ({
  id,
  archivedAt: null,
  currentVersion: version,
  submittedVersion: version,
});

async function lastAction(recipe: Recipe): Promise<RecipeReview | null> {
  return RecipeReview.findOne({
    where: { recipeId: recipe.id, versionNumber: recipe.currentVersion },
    order: [['id', 'DESC']],
  });
}

const ownRecipe = (auth: AuthContext, id: number) => findOwnRecipe(auth, id, { active: true });

export async function reviewTimeline(auth: AuthContext, id: number): Promise<ReviewTimeline> {
  const recipe = await findOwnRecipe(auth, id);
  const events = await RecipeReview.findAll({
    where: { recipeId: id },
    include: [{ model: User, as: 'user', attributes: ['name'] }],
    order: [['id', 'DESC']],
  });
  const last = await lastAction(recipe);
  return {
    state: reviewState(recipe, last?.action ?? null),
    currentVersion: recipe.currentVersion,
    submittedVersion: recipe.submittedVersion,
    approvedVersion: recipe.approvedVersion,
    events: events.map((e) => ({
      id: e.id,
      version: e.versionNumber,
      action: e.action,
      by: e.user?.name ?? null,
      comment: e.comment,
      overrideReason: e.overrideReason,
      selfApproved: e.selfApproved,
      at: e.createdAt.toISOString(),
    })),
  };
}

async function notify(
  userIds: number[],
  mail: { subject: string; text: string; html: string },
  organisationId: number,
) {
  const people = await User.findAll({ where: { id: userIds, active: true, notifyReviews: true } });
  for (const person of people)
    await mailer.send({ ...mail, to: person.email, kind: 'review', organisationId, userId: person.id });
}

/** A developer (or owner) asks for the newest version to be approved for production. */
export async function submit(auth: AuthContext, id: number, input: SubmitInput): Promise<ReviewTimeline> {
  const recipe = await ownRecipe(auth, id);
  if (input.version !== recipe.currentVersion)
    throw wrongState(`Only the newest version (${recipe.currentVersion}) can be submitted.`);
  const state = reviewState(recipe, (await lastAction(recipe))?.action ?? null);
  if (state === 'submitted') throw wrongState('This version is already waiting for review.');
  if (state === 'approved') throw wrongState('This version is already approved.');
  await transaction(async (transaction) => {
    const v = recipe.currentVersion;
    const notAlready = (field: 'submittedVersion' | 'approvedVersion') => ({
      [Op.or]: [{ [field]: null }, { [field]: { [Op.ne]: v } }],
    });
    await claim(
      { submittedVersion: v },
      {
        id,
        archivedAt: null,
        currentVersion: v,
        [Op.and]: [notAlready('submittedVersion'), notAlready('approvedVersion')],
      },
      transaction,
      'This version was submitted or changed a moment ago. Reload to see where it stands.',
    );
    await RecipeReview.create(
      {
        recipeId: id,
        versionNumber: recipe.currentVersion,
        action: 'submitted',
        userId: auth.userId,
        comment: input.message,
        overrideReason: null,
      },
      { transaction },
    );
  });
  const [author, owners] = await Promise.all([
    User.findByPk(auth.userId),
    User.findAll({
      where: {
        organisationId: auth.organisationId,
        role: [...rolesWith('recipes.approve')],
        id: { [Op.ne]: auth.userId },
      },
    }),
  ]);
  await notify(
    owners.map((o) => o.id),
    reviewSubmittedMail({
      recipeName: recipe.name,
      version: recipe.currentVersion,
      author: author?.name ?? 'Someone',
      message: input.message,
      recipeId: id,
    }),
    auth.organisationId,
  );
  return reviewTimeline(auth, id);
}

async function submitter(recipe: Recipe): Promise<number | null> {
  const event = await RecipeReview.findOne({
    where: { recipeId: recipe.id, versionNumber: recipe.submittedVersion ?? 0, action: 'submitted' },
    order: [['id', 'DESC']],
  });
  return event?.userId ?? null;
}

function assertWaitingVersion(recipe: Recipe, version: number) {
  if (recipe.submittedVersion === null) throw wrongState('No version of this recipe is waiting for review.');
  if (recipe.currentVersion !== version || recipe.submittedVersion !== version) {
    throw wrongState(
      `The recipe changed since you opened it: version ${recipe.currentVersion} is now the newest. Reload and look again.`,
    );
  }
}

/**
 * An owner approves the submitted version. Nobody approves their own submission unless they are the brewery's
 * only active owner (recorded). A danger finding blocks approval unless the owner writes why they override it.
 */
export async function approve(auth: AuthContext, id: number, input: ApproveInput): Promise<ReviewTimeline> {
  const recipe = await ownRecipe(auth, id);
  assertWaitingVersion(recipe, input.version);
  const author = await submitter(recipe);
  let selfApproved = false;
  if (author === auth.userId) {
    const otherOwners = await User.count({
      where: {
        organisationId: auth.organisationId,
        role: [...rolesWith('recipes.approve')],
        active: true,
        id: { [Op.ne]: auth.userId },
      },
    });
    if (otherOwners > 0) throw forbidden('You submitted this version: another owner must approve it.');
    selfApproved = true;
  }
  const version = await RecipeVersion.findOne({ where: { recipeId: id, number: input.version } });
  const result = await evaluate(auth, version!.content, { forReview: true });
  const dangers = result.carbonation.findings.filter((f) => f.level === 'danger');
  const alcohol = dangers.find((f) => f.code === 'alcohol-over-limit');
  if (alcohol) {
    const brewery = await Organisation.findByPk(auth.organisationId, { attributes: ['licensedForAlcohol'] });
    if (!brewery?.licensedForAlcohol) {
      throw new HttpError(
        409,
        'alcohol_limit',
        `This version cannot be approved: ${alcohol.message} A drink at or over the limit is an alcoholic beverage, which only a brewery licensed to make them may produce. An override does not change that; if your brewery is licensed, an owner can say so in the brewery settings.`,
      );
    }
  }
  if (dangers.length > 0 && !input.overrideReason) {
    throw new HttpError(
      409,
      'danger_finding',
      `Approval is blocked by a danger finding: ${dangers.map((d) => d.message).join(' ')} To approve anyway, write why.`,
      {
        overrideReason: 'Write why you approve despite the danger finding.',
      },
    );
  }
  await transaction(async (transaction) => {
    await claim(
      { approvedVersion: input.version, submittedVersion: null },
      waitingVersion(id, input.version),
      transaction,
      DECIDED,
    );
    await RecipeReview.create(
      {
        recipeId: id,
        versionNumber: input.version,
        action: 'approved',
        userId: auth.userId,
        comment: input.comment,
        overrideReason: dangers.length > 0 ? input.overrideReason : null,
        selfApproved,
      },
      { transaction },
    );
  });
  const owner = await User.findByPk(auth.userId);
  if (author && author !== auth.userId) {
    await notify(
      [author],
      reviewDecisionMail({
        recipeName: recipe.name,
        version: input.version,
        owner: owner?.name ?? 'An owner',
        approved: true,
        comment: input.comment,
        recipeId: id,
      }),
      auth.organisationId,
    );
  }
  return reviewTimeline(auth, id);
}

/** An owner returns the submitted version with the changes to make. */
export async function returnForChanges(auth: AuthContext, id: number, input: ReturnInput): Promise<ReviewTimeline> {
  const recipe = await ownRecipe(auth, id);
  assertWaitingVersion(recipe, input.version);
  const author = await submitter(recipe);
  await transaction(async (transaction) => {
    await claim({ submittedVersion: null }, waitingVersion(id, input.version), transaction, DECIDED);
    await RecipeReview.create(
      {
        recipeId: id,
        versionNumber: input.version,
        action: 'returned',
        userId: auth.userId,
        comment: input.comment,
        overrideReason: null,
      },
      { transaction },
    );
  });
  const owner = await User.findByPk(auth.userId);
  if (author && author !== auth.userId) {
    await notify(
      [author],
      reviewDecisionMail({
        recipeName: recipe.name,
        version: input.version,
        owner: owner?.name ?? 'An owner',
        approved: false,
        comment: input.comment,
        recipeId: id,
      }),
      auth.organisationId,
    );
  }
  return reviewTimeline(auth, id);
}

/** An owner takes an approval back; production has no approved version until one is approved again. */
export async function withdraw(auth: AuthContext, id: number, input: WithdrawInput): Promise<ReviewTimeline> {
  const recipe = await ownRecipe(auth, id);
  if (recipe.approvedVersion === null) throw wrongState('No version of this recipe is approved.');
  const version = recipe.approvedVersion;
  await transaction(async (transaction) => {
    await claim(
      { approvedVersion: null },
      { id, approvedVersion: version },
      transaction,
      'This approval was withdrawn a moment ago. Reload to see where it stands.',
    );
    await RecipeReview.create(
      {
        recipeId: id,
        versionNumber: version,
        action: 'withdrawn',
        userId: auth.userId,
        comment: input.reason,
        overrideReason: null,
      },
      { transaction },
    );
  });
  return reviewTimeline(auth, id);
}
