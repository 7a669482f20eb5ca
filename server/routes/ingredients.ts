import { Router, type RequestHandler } from 'express';
import multer from 'multer';
import * as yup from 'yup';

import { idParam } from '../../lib/schemas/common';
import { houseIngredientSchema, ingredientSearchSchema, type HouseIngredientInput, type IngredientSearch } from '../../lib/schemas/ingredients';
import { allow, authOf } from '../middleware/access';
import { validate } from '../middleware/validate';
import { config } from '../config';
import * as attachments from '../services/attachments';
import * as ingredients from '../services/ingredients';

export const ingredientsRouter = Router();

const EDITORS = ['owner', 'developer'] as const;
const id = (locals: { params?: unknown }) => (locals.params as { id: number }).id;
const copySchema = yup.object({ name: houseIngredientSchema.fields.name });

ingredientsRouter.get('/', allow('signed-in'), validate({ query: ingredientSearchSchema }), async (_req, res) => {
  res.json(await ingredients.searchIngredients(authOf(res), res.locals.query as IngredientSearch));
});

ingredientsRouter.get('/:id', allow('signed-in'), validate({ params: idParam }), async (_req, res) => {
  res.json(ingredients.toIngredientDto(await ingredients.visibleIngredient(authOf(res), id(res.locals))));
});

ingredientsRouter.get('/:id/changes', allow('signed-in'), validate({ params: idParam }), async (_req, res) => {
  res.json(await ingredients.ingredientChanges(authOf(res), id(res.locals)));
});

ingredientsRouter.post('/', allow(EDITORS), validate({ body: houseIngredientSchema }), async (_req, res) => {
  res.status(201).json(await ingredients.createHouseIngredient(authOf(res), res.locals.body as HouseIngredientInput));
});

ingredientsRouter.put('/:id', allow(EDITORS), validate({ params: idParam, body: houseIngredientSchema }), async (_req, res) => {
  res.json(await ingredients.updateHouseIngredient(authOf(res), id(res.locals), res.locals.body as HouseIngredientInput));
});

ingredientsRouter.post('/:id/copy', allow(EDITORS), validate({ params: idParam, body: copySchema }), async (_req, res) => {
  res.status(201).json(await ingredients.copyToHouse(authOf(res), id(res.locals), (res.locals.body as { name: string }).name));
});

ingredientsRouter.post('/:id/archive', allow(EDITORS), validate({ params: idParam }), async (_req, res) => {
  res.json(await ingredients.setHouseIngredientArchived(authOf(res), id(res.locals), true));
});

ingredientsRouter.post('/:id/restore', allow(EDITORS), validate({ params: idParam }), async (_req, res) => {
  res.json(await ingredients.setHouseIngredientArchived(authOf(res), id(res.locals), false));
});

/**
 * One file in the field "file" and nothing much else: every part, field and header is bounded, so a request of
 * hundreds of large text fields is refused before it fills memory.
 */
const upload = multer({
  storage: multer.memoryStorage(),
  limits: { fileSize: config.uploadMaxBytes, files: 1, fields: 5, fieldSize: 8 * 1024, fieldNameSize: 100, parts: 6, headerPairs: 50 },
});

/** Multer's and busboy's errors (limits, a truncated body, no boundary) are the sender's: never a 500. */
const receiveFile: RequestHandler = (req, res, next) => {
  upload.single('file')(req, res, (error: unknown) => next(error ? attachments.uploadError(error) : undefined));
};

ingredientsRouter.get('/:id/attachments', allow('signed-in'), validate({ params: idParam }), async (_req, res) => {
  res.json(await attachments.listAttachments(authOf(res), id(res.locals)));
});

ingredientsRouter.post('/:id/attachments', allow(EDITORS, { accepts: 'multipart' }), validate({ params: idParam }), receiveFile, async (req, res) => {
  res.status(201).json(await attachments.addAttachment(authOf(res), id(res.locals), req.file));
});

/** Mounted at /api/attachments: files are served only to members of the brewery that owns them. */
export const attachmentsRouter = Router();

attachmentsRouter.get('/:id', allow('signed-in'), validate({ params: idParam }), async (_req, res) => {
  const file = await attachments.attachmentFile(authOf(res), id(res.locals));
  res.setHeader('Content-Type', file.mimeType);
  res.setHeader('Content-Disposition', `inline; filename="${file.name.replace(/"/g, '')}"`);
  res.sendFile(file.path);
});

attachmentsRouter.delete('/:id', allow(EDITORS), validate({ params: idParam }), async (_req, res) => {
  await attachments.deleteAttachment(authOf(res), id(res.locals));
  res.status(204).end();
});
