import { pipeline } from 'node:stream/promises';

import { Router } from 'express';

import { idParam } from '@/lib/schemas/common';
import {
  copyIngredientSchema,
  displayNameSchema,
  houseIngredientSchema,
  ingredientSearchSchema,
} from '@/lib/schemas/ingredients';
import { allow, authOf } from '@/server/middleware/access';
import { receiveFile } from '@/server/middleware/upload';
import { validate } from '@/server/middleware/validate';
import * as attachments from '@/server/services/attachments';
import * as ingredients from '@/server/services/ingredients';

export const ingredientsRouter = Router();

ingredientsRouter.get(
  '/',
  allow('signed-in'),
  validate({ query: ingredientSearchSchema }, async ({ query }, res) => {
    res.json(await ingredients.searchIngredients(authOf(res), query));
  }),
);

ingredientsRouter.get(
  '/:id',
  allow('signed-in'),
  validate({ params: idParam }, async ({ params }, res) => {
    res.json(await ingredients.ingredientFor(authOf(res), params.id));
  }),
);

ingredientsRouter.get(
  '/:id/changes',
  allow('signed-in'),
  validate({ params: idParam }, async ({ params }, res) => {
    res.json(await ingredients.ingredientChanges(authOf(res), params.id));
  }),
);

ingredientsRouter.post(
  '/',
  allow('ingredients.edit'),
  validate({ body: houseIngredientSchema }, async ({ body }, res) => {
    res.status(201).json(await ingredients.createHouseIngredient(authOf(res), body));
  }),
);

ingredientsRouter.put(
  '/:id',
  allow('ingredients.edit'),
  validate({ params: idParam, body: houseIngredientSchema }, async ({ params, body }, res) => {
    res.json(await ingredients.updateHouseIngredient(authOf(res), params.id, body));
  }),
);

ingredientsRouter.put(
  '/:id/display-name',
  allow('ingredients.edit'),
  validate({ params: idParam, body: displayNameSchema }, async ({ params, body }, res) => {
    res.json(await ingredients.setDisplayName(authOf(res), params.id, body.displayName));
  }),
);

ingredientsRouter.post(
  '/:id/copy',
  allow('ingredients.edit'),
  validate({ params: idParam, body: copyIngredientSchema }, async ({ params, body }, res) => {
    res.status(201).json(await ingredients.copyToHouse(authOf(res), params.id, body.name));
  }),
);

ingredientsRouter.post(
  '/:id/archive',
  allow('ingredients.edit'),
  validate({ params: idParam }, async ({ params }, res) => {
    res.json(await ingredients.setHouseIngredientArchived(authOf(res), params.id, true));
  }),
);

ingredientsRouter.post(
  '/:id/restore',
  allow('ingredients.edit'),
  validate({ params: idParam }, async ({ params }, res) => {
    res.json(await ingredients.setHouseIngredientArchived(authOf(res), params.id, false));
  }),
);

ingredientsRouter.get(
  '/:id/attachments',
  allow('signed-in'),
  validate({ params: idParam }, async ({ params }, res) => {
    res.json(await attachments.listAttachments(authOf(res), params.id));
  }),
);

ingredientsRouter.post(
  '/:id/attachments',
  allow('ingredients.edit', { accepts: 'multipart' }),
  receiveFile,
  validate({ params: idParam }, async ({ params }, res, req) => {
    res.status(201).json(await attachments.addAttachment(authOf(res), params.id, req.file));
  }),
);

/** Mounted at /api/attachments: files are served only to members of the brewery that owns them. */
export const attachmentsRouter = Router();

attachmentsRouter.get(
  '/:id',
  allow('signed-in'),
  validate({ params: idParam }, async ({ params }, res) => {
    const file = await attachments.attachmentFile(authOf(res), params.id);
    res.setHeader('Content-Type', file.mimeType);
    res.setHeader('Content-Disposition', `inline; filename="${file.name.replace(/"/g, '')}"`);
    res.setHeader('Content-Length', String(file.sizeBytes));
    await pipeline(file.body, res);
  }),
);

attachmentsRouter.delete(
  '/:id',
  allow('ingredients.edit'),
  validate({ params: idParam }, async ({ params }, res) => {
    await attachments.deleteAttachment(authOf(res), params.id);
    res.status(204).end();
  }),
);
