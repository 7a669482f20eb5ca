import { Router } from 'express';

import { type NutritionAnswer, nutritionCsv } from '@/lib/nutrition/panel';
import { idParam } from '@/lib/schemas/common';
import { labValuesSchema, nutritionFileQuerySchema, nutritionQuerySchema } from '@/lib/schemas/nutrition';
import {
  type CardQuery,
  cardQuerySchema,
  createRecipeSchema,
  diffQuerySchema,
  evaluateBodySchema,
  recipeListQuerySchema,
  restoreVersionSchema,
  saveRecipeSchema,
  scaleRequestSchema,
  tastingSchema,
  versionQuerySchema,
} from '@/lib/schemas/recipes';
import { approveSchema, returnSchema, submitSchema, withdrawSchema } from '@/lib/schemas/reviews';
import { allow, authOf } from '@/server/middleware/access';
import { validate } from '@/server/middleware/validate';
import { cardPdf, recipeCard } from '@/server/services/cards';
import * as nutrition from '@/server/services/nutrition';
import { fileBasis, nutritionPdf, nutritionPng } from '@/server/services/nutrition-files';
import * as recipes from '@/server/services/recipes';
import * as reviews from '@/server/services/reviews';
import type { AuthContext } from '@/server/services/sessions';

export const recipesRouter = Router();

recipesRouter.get(
  '/',
  allow('signed-in'),
  validate({ query: recipeListQuerySchema }, async ({ query }, res) => {
    const { q, status } = query;
    res.json(await recipes.listRecipes(authOf(res), q, status));
  }),
);

recipesRouter.post(
  '/',
  allow('recipes.edit'),
  validate({ body: createRecipeSchema }, async ({ body }, res) => {
    res.status(201).json(await recipes.createRecipe(authOf(res), body));
  }),
);

/** The numbers of a recipe being edited, before it is saved. */
recipesRouter.post(
  '/evaluate',
  allow('signed-in'),
  validate({ body: evaluateBodySchema }, async ({ body }, res) => {
    res.json(await recipes.evaluate(authOf(res), body.content));
  }),
);

recipesRouter.get(
  '/:id',
  allow('signed-in'),
  validate({ params: idParam, query: versionQuerySchema }, async ({ params, query }, res) => {
    res.json(await recipes.getRecipe(authOf(res), params.id, query.version));
  }),
);

recipesRouter.put(
  '/:id',
  allow('recipes.edit'),
  validate({ params: idParam, body: saveRecipeSchema }, async ({ params, body }, res) => {
    res.json(await recipes.saveRecipe(authOf(res), params.id, body));
  }),
);

recipesRouter.get(
  '/:id/versions',
  allow('signed-in'),
  validate({ params: idParam }, async ({ params }, res) => {
    res.json(await recipes.listVersions(authOf(res), params.id));
  }),
);

recipesRouter.get(
  '/:id/diff',
  allow('signed-in'),
  validate({ params: idParam, query: diffQuerySchema }, async ({ params, query }, res) => {
    const { from, to } = query;
    res.json(await recipes.diffVersions(authOf(res), params.id, from, to));
  }),
);

recipesRouter.post(
  '/:id/restore',
  allow('recipes.edit'),
  validate({ params: idParam, body: restoreVersionSchema }, async ({ params, body }, res) => {
    res.json(await recipes.restoreVersion(authOf(res), params.id, body.version));
  }),
);

recipesRouter.post(
  '/:id/duplicate',
  allow('recipes.edit'),
  validate({ params: idParam }, async ({ params }, res) => {
    res.status(201).json(await recipes.duplicateRecipe(authOf(res), params.id));
  }),
);

recipesRouter.post(
  '/:id/archive',
  allow('recipes.edit'),
  validate({ params: idParam }, async ({ params }, res) => {
    res.json(await recipes.setRecipeArchived(authOf(res), params.id, true));
  }),
);

recipesRouter.post(
  '/:id/restore-archived',
  allow('recipes.edit'),
  validate({ params: idParam }, async ({ params }, res) => {
    res.json(await recipes.setRecipeArchived(authOf(res), params.id, false));
  }),
);

recipesRouter.post(
  '/:id/scale',
  allow('signed-in'),
  validate({ params: idParam, body: scaleRequestSchema }, async ({ params, body }, res) => {
    res.json(await recipes.scale(authOf(res), params.id, body));
  }),
);

recipesRouter.get(
  '/:id/tastings',
  allow('signed-in'),
  validate({ params: idParam }, async ({ params }, res) => {
    res.json(await recipes.listTastings(authOf(res), params.id));
  }),
);

recipesRouter.post(
  '/:id/tastings',
  allow('recipes.edit'),
  validate({ params: idParam, body: tastingSchema }, async ({ params, body }, res) => {
    res.status(201).json(await recipes.addTasting(authOf(res), params.id, body));
  }),
);

recipesRouter.get(
  '/:id/review',
  allow('signed-in'),
  validate({ params: idParam }, async ({ params }, res) => {
    res.json(await reviews.reviewTimeline(authOf(res), params.id));
  }),
);

recipesRouter.post(
  '/:id/submit',
  allow('recipes.submit'),
  validate({ params: idParam, body: submitSchema }, async ({ params, body }, res) => {
    res.json(await reviews.submit(authOf(res), params.id, body));
  }),
);

recipesRouter.post(
  '/:id/approve',
  allow('recipes.approve'),
  validate({ params: idParam, body: approveSchema }, async ({ params, body }, res) => {
    res.json(await reviews.approve(authOf(res), params.id, body));
  }),
);

recipesRouter.post(
  '/:id/return',
  allow('recipes.approve'),
  validate({ params: idParam, body: returnSchema }, async ({ params, body }, res) => {
    res.json(await reviews.returnForChanges(authOf(res), params.id, body));
  }),
);

recipesRouter.post(
  '/:id/withdraw',
  allow('recipes.approve'),
  validate({ params: idParam, body: withdrawSchema }, async ({ params, body }, res) => {
    res.json(await reviews.withdraw(authOf(res), params.id, body));
  }),
);

const cardOf = (auth: AuthContext, id: number, q: CardQuery) =>
  recipeCard(auth, id, { version: q.version ?? null, batch: { kind: q.kind, value: q.value }, units: q.units });

recipesRouter.get(
  '/:id/card',
  allow('signed-in'),
  validate({ params: idParam, query: cardQuerySchema }, async ({ params, query }, res) => {
    res.json(await cardOf(authOf(res), params.id, query));
  }),
);

recipesRouter.get(
  '/:id/card.pdf',
  allow('signed-in'),
  validate({ params: idParam, query: cardQuerySchema }, async ({ params, query }, res, req) => {
    const card = await cardOf(authOf(res), params.id, query);
    const paper = query.paper ?? (query.units === 'us' ? 'letter' : 'a4');
    res.setHeader('Content-Type', 'application/pdf');
    res.setHeader('Content-Disposition', `inline; filename="card-${card.code}-${paper}.pdf"`);
    cardPdf(card, { paper, locale: req.acceptsLanguages()[0] }).pipe(res);
  }),
);

recipesRouter.get(
  '/:id/nutrition',
  allow('signed-in'),
  validate({ params: idParam, query: nutritionQuerySchema }, async ({ params, query }, res) => {
    res.json(await nutrition.recipeNutrition(authOf(res), params.id, query));
  }),
);

recipesRouter.put(
  '/:id/nutrition/lab',
  allow('recipes.label'),
  validate({ params: idParam, body: labValuesSchema }, async ({ params, body }, res) => {
    res.json(await nutrition.setLabValues(authOf(res), params.id, body));
  }),
);

const panelFileName = (answer: NutritionAnswer, basis: string, ext: string) =>
  `nutrition-${answer.recipeId}-v${answer.version}-${basis}.${ext}`;

recipesRouter.get(
  '/:id/nutrition.pdf',
  allow('signed-in'),
  validate({ params: idParam, query: nutritionFileQuerySchema }, async ({ params, query }, res) => {
    const answer = await nutrition.recipeNutrition(authOf(res), params.id, query);
    const basis = fileBasis(answer, query.basis);
    res.setHeader('Content-Type', 'application/pdf');
    res.setHeader('Content-Disposition', `attachment; filename="${panelFileName(answer, basis, 'pdf')}"`);
    nutritionPdf(answer, basis).pipe(res);
  }),
);

recipesRouter.get(
  '/:id/nutrition.png',
  allow('signed-in'),
  validate({ params: idParam, query: nutritionFileQuerySchema }, async ({ params, query }, res) => {
    const answer = await nutrition.recipeNutrition(authOf(res), params.id, query);
    const basis = fileBasis(answer, query.basis);
    res.setHeader('Content-Type', 'image/png');
    res.setHeader('Content-Disposition', `attachment; filename="${panelFileName(answer, basis, 'png')}"`);
    res.send(await nutritionPng(answer, basis));
  }),
);

recipesRouter.get(
  '/:id/nutrition.csv',
  allow('signed-in'),
  validate({ params: idParam, query: nutritionQuerySchema }, async ({ params, query }, res) => {
    const answer = await nutrition.recipeNutrition(authOf(res), params.id, query);
    res.setHeader('Content-Type', 'text/csv; charset=utf-8');
    res.setHeader('Content-Disposition', `attachment; filename="${panelFileName(answer, 'values', 'csv')}"`);
    res.send(nutritionCsv(answer));
  }),
);
