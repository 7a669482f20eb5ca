import { Router } from 'express';
import * as yup from 'yup';

import { idParam } from '../../lib/schemas/common';
import { numberField } from '../../lib/schemas/numbers';
import {
  createRecipeSchema,
  recipeContentSchema,
  saveRecipeSchema,
  scaleRequestSchema,
  tastingSchema,
  type CreateRecipeInput,
  type RecipeContent,
  type SaveRecipeInput,
  type ScaleRequest,
  type TastingInput,
} from '../../lib/schemas/recipes';
import { allow, authOf } from '../middleware/access';
import { validate } from '../middleware/validate';
import { approveSchema, returnSchema, submitSchema, withdrawSchema, type ApproveInput, type ReturnInput, type SubmitInput, type WithdrawInput } from '../../lib/schemas/reviews';
import { cardPdf, recipeCard } from '../services/cards';
import * as recipes from '../services/recipes';
import * as reviews from '../services/reviews';

export const recipesRouter = Router();

const EDITORS = ['owner', 'developer'] as const;
const id = (locals: { params?: unknown }) => (locals.params as { id: number }).id;
const listQuery = yup.object({
  q: yup.string().trim().max(100).default(''),
  status: yup.string().oneOf(['draft', 'archived', 'approved', 'all'] as const, 'Choose draft, archived, approved or all.').default('draft'),
});
const versionQuery = yup.object({ version: yup.number().typeError('Version must be a number.').integer().positive().optional() });
const diffQuery = yup.object({
  from: yup.number().typeError('From must be a version number.').integer().positive().required('Give the version to compare from.'),
  to: yup.number().typeError('To must be a version number.').integer().positive().required('Give the version to compare to.'),
});
const restoreBody = yup.object({ version: numberField('Version').integer().positive().required('Give the version to restore.') });

recipesRouter.get('/', allow('signed-in'), validate({ query: listQuery }), async (_req, res) => {
  const { q, status } = res.locals.query as yup.InferType<typeof listQuery>;
  res.json(await recipes.listRecipes(authOf(res), q, status));
});

recipesRouter.post('/', allow(EDITORS), validate({ body: createRecipeSchema }), async (_req, res) => {
  res.status(201).json(await recipes.createRecipe(authOf(res), res.locals.body as CreateRecipeInput));
});

/** The numbers of a recipe being edited, before it is saved. */
recipesRouter.post('/evaluate', allow('signed-in'), validate({ body: yup.object({ content: recipeContentSchema.required() }) }), async (_req, res) => {
  res.json(await recipes.evaluate(authOf(res), (res.locals.body as { content: RecipeContent }).content));
});

recipesRouter.get('/:id', allow('signed-in'), validate({ params: idParam, query: versionQuery }), async (_req, res) => {
  res.json(await recipes.getRecipe(authOf(res), id(res.locals), (res.locals.query as { version?: number }).version));
});

recipesRouter.put('/:id', allow(EDITORS), validate({ params: idParam, body: saveRecipeSchema }), async (_req, res) => {
  res.json(await recipes.saveRecipe(authOf(res), id(res.locals), res.locals.body as SaveRecipeInput));
});

recipesRouter.get('/:id/versions', allow('signed-in'), validate({ params: idParam }), async (_req, res) => {
  res.json(await recipes.listVersions(authOf(res), id(res.locals)));
});

recipesRouter.get('/:id/diff', allow('signed-in'), validate({ params: idParam, query: diffQuery }), async (_req, res) => {
  const { from, to } = res.locals.query as { from: number; to: number };
  res.json(await recipes.diffVersions(authOf(res), id(res.locals), from, to));
});

recipesRouter.post('/:id/restore', allow(EDITORS), validate({ params: idParam, body: restoreBody }), async (_req, res) => {
  res.json(await recipes.restoreVersion(authOf(res), id(res.locals), (res.locals.body as { version: number }).version));
});

recipesRouter.post('/:id/duplicate', allow(EDITORS), validate({ params: idParam }), async (_req, res) => {
  res.status(201).json(await recipes.duplicateRecipe(authOf(res), id(res.locals)));
});

recipesRouter.post('/:id/archive', allow(EDITORS), validate({ params: idParam }), async (_req, res) => {
  res.json(await recipes.setRecipeArchived(authOf(res), id(res.locals), true));
});

recipesRouter.post('/:id/restore-archived', allow(EDITORS), validate({ params: idParam }), async (_req, res) => {
  res.json(await recipes.setRecipeArchived(authOf(res), id(res.locals), false));
});

recipesRouter.post('/:id/scale', allow('signed-in'), validate({ params: idParam, body: scaleRequestSchema }), async (_req, res) => {
  res.json(await recipes.scale(authOf(res), id(res.locals), res.locals.body as ScaleRequest));
});

recipesRouter.get('/:id/tastings', allow('signed-in'), validate({ params: idParam }), async (_req, res) => {
  res.json(await recipes.listTastings(authOf(res), id(res.locals)));
});

recipesRouter.post('/:id/tastings', allow(EDITORS), validate({ params: idParam, body: tastingSchema }), async (_req, res) => {
  res.status(201).json(await recipes.addTasting(authOf(res), id(res.locals), res.locals.body as TastingInput));
});

recipesRouter.get('/:id/review', allow('signed-in'), validate({ params: idParam }), async (_req, res) => {
  res.json(await reviews.reviewTimeline(authOf(res), id(res.locals)));
});

recipesRouter.post('/:id/submit', allow(EDITORS), validate({ params: idParam, body: submitSchema }), async (_req, res) => {
  res.json(await reviews.submit(authOf(res), id(res.locals), res.locals.body as SubmitInput));
});

recipesRouter.post('/:id/approve', allow(['owner']), validate({ params: idParam, body: approveSchema }), async (_req, res) => {
  res.json(await reviews.approve(authOf(res), id(res.locals), res.locals.body as ApproveInput));
});

recipesRouter.post('/:id/return', allow(['owner']), validate({ params: idParam, body: returnSchema }), async (_req, res) => {
  res.json(await reviews.returnForChanges(authOf(res), id(res.locals), res.locals.body as ReturnInput));
});

recipesRouter.post('/:id/withdraw', allow(['owner']), validate({ params: idParam, body: withdrawSchema }), async (_req, res) => {
  res.json(await reviews.withdraw(authOf(res), id(res.locals), res.locals.body as WithdrawInput));
});

const cardQuery = yup.object({
  version: yup.number().typeError('Version must be a number.').integer().positive().optional(),
  kind: yup.string().oneOf(['litres', 'us-gallons', 'bottles'] as const, 'Choose litres, US gallons or bottles.').default('bottles'),
  value: yup.number().typeError('The batch size must be a number.').positive('The batch size must be more than 0.').max(1000000).required('Give the batch size.'),
  units: yup.string().oneOf(['metric', 'us'] as const, 'Choose metric or US units.').default('metric'),
});
type CardQuery = yup.InferType<typeof cardQuery>;
const cardOf = (res: Parameters<Parameters<typeof recipesRouter.get>[1]>[1]) => {
  const q = res.locals.query as CardQuery;
  return recipeCard(authOf(res), id(res.locals), { version: q.version ?? null, batch: { kind: q.kind, value: q.value }, units: q.units });
};

recipesRouter.get('/:id/card', allow('signed-in'), validate({ params: idParam, query: cardQuery }), async (_req, res) => {
  res.json(await cardOf(res));
});

recipesRouter.get('/:id/card.pdf', allow('signed-in'), validate({ params: idParam, query: cardQuery }), async (_req, res) => {
  const card = await cardOf(res);
  res.setHeader('Content-Type', 'application/pdf');
  res.setHeader('Content-Disposition', `inline; filename="card-${card.code}.pdf"`);
  cardPdf(card).pipe(res);
});
