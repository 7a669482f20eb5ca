import { Router } from 'express';

import { bottleFormatListQuerySchema, bottleFormatSchema } from '@/lib/schemas/bottle-formats';
import { idParam } from '@/lib/schemas/common';
import { allow, authOf } from '@/server/middleware/access';
import { validate } from '@/server/middleware/validate';
import * as formats from '@/server/services/bottle-formats';

export const bottleFormatsRouter = Router();

bottleFormatsRouter.get(
  '/',
  allow('signed-in'),
  validate({ query: bottleFormatListQuerySchema }, async ({ query }, res) => {
    res.json(await formats.listBottleFormats(authOf(res).organisationId, query.archived));
  }),
);

bottleFormatsRouter.post(
  '/',
  allow('bottles.edit'),
  validate({ body: bottleFormatSchema }, async ({ body }, res) => {
    res.status(201).json(await formats.createBottleFormat(authOf(res).organisationId, body));
  }),
);

bottleFormatsRouter.put(
  '/:id',
  allow('bottles.edit'),
  validate({ params: idParam, body: bottleFormatSchema }, async ({ params, body }, res) => {
    res.json(await formats.updateBottleFormat(authOf(res).organisationId, params.id, body));
  }),
);

bottleFormatsRouter.post(
  '/:id/archive',
  allow('bottles.edit'),
  validate({ params: idParam }, async ({ params }, res) => {
    res.json(await formats.setBottleFormatArchived(authOf(res).organisationId, params.id, true));
  }),
);

bottleFormatsRouter.post(
  '/:id/restore',
  allow('bottles.edit'),
  validate({ params: idParam }, async ({ params }, res) => {
    res.json(await formats.setBottleFormatArchived(authOf(res).organisationId, params.id, false));
  }),
);
