import { Router } from 'express';
import * as yup from 'yup';

import { bottleFormatSchema, type BottleFormatInput } from '../../lib/schemas/bottle-formats';
import { idParam } from '../../lib/schemas/common';
import { allow, authOf } from '../middleware/access';
import { validate } from '../middleware/validate';
import * as formats from '../services/bottle-formats';

export const bottleFormatsRouter = Router();

const listQuery = yup.object({ archived: yup.boolean().default(false) });
const id = (locals: { params?: unknown }) => (locals.params as { id: number }).id;

bottleFormatsRouter.get('/', allow('signed-in'), validate({ query: listQuery }), async (_req, res) => {
  res.json(await formats.listBottleFormats(authOf(res).organisationId, (res.locals.query as { archived: boolean }).archived));
});

bottleFormatsRouter.post('/', allow(['owner']), validate({ body: bottleFormatSchema }), async (_req, res) => {
  res.status(201).json(await formats.createBottleFormat(authOf(res).organisationId, res.locals.body as BottleFormatInput));
});

bottleFormatsRouter.put('/:id', allow(['owner']), validate({ params: idParam, body: bottleFormatSchema }), async (_req, res) => {
  res.json(await formats.updateBottleFormat(authOf(res).organisationId, id(res.locals), res.locals.body as BottleFormatInput));
});

bottleFormatsRouter.post('/:id/archive', allow(['owner']), validate({ params: idParam }), async (_req, res) => {
  res.json(await formats.setBottleFormatArchived(authOf(res).organisationId, id(res.locals), true));
});

bottleFormatsRouter.post('/:id/restore', allow(['owner']), validate({ params: idParam }), async (_req, res) => {
  res.json(await formats.setBottleFormatArchived(authOf(res).organisationId, id(res.locals), false));
});
