import { Router } from 'express';

import {
  batchListQuerySchema,
  decisionSchema,
  deviationSchema,
  ingredientLotSchema,
  lotParamsSchema,
  readingParamsSchema,
  readingSchema,
  startBatchSchema,
  stepParamsSchema,
  stepSignOffSchema,
  traceQuerySchema,
} from '@/lib/schemas/batches';
import { idParam } from '@/lib/schemas/common';
import { allow, authOf } from '@/server/middleware/access';
import { receiveFile } from '@/server/middleware/upload';
import { validate } from '@/server/middleware/validate';
import { batchRecordPdf } from '@/server/services/batch-record';
import * as batches from '@/server/services/batches';

export const batchesRouter = Router();

// Who starts and runs which batch (production: owners and brewers; trials: owners and developers) is checked in the
// service against the batch itself; the route lets every member through that may read batches.
batchesRouter.get(
  '/',
  allow('batches.read'),
  validate({ query: batchListQuerySchema }, async ({ query }, res) => {
    res.json(await batches.listBatches(authOf(res), query));
  }),
);

batchesRouter.post(
  '/',
  allow('batches.read'),
  validate({ body: startBatchSchema }, async ({ body }, res) => {
    res.status(201).json(await batches.startBatch(authOf(res), body));
  }),
);

batchesRouter.get(
  '/trace',
  allow('batches.read'),
  validate({ query: traceQuerySchema }, async ({ query }, res) => {
    res.json(await batches.trace(authOf(res), query.supplierLot));
  }),
);

batchesRouter.get(
  '/lot/:lotCode',
  allow('batches.read'),
  validate({ params: lotParamsSchema }, async ({ params }, res) => {
    res.json(await batches.findByLotCode(authOf(res), params.lotCode));
  }),
);

batchesRouter.get(
  '/:id',
  allow('batches.read'),
  validate({ params: idParam }, async ({ params }, res) => {
    res.json(await batches.getBatch(authOf(res), params.id));
  }),
);

batchesRouter.post(
  '/:id/readings',
  allow('batches.read'),
  validate({ params: idParam, body: readingSchema }, async ({ params, body }, res) => {
    res.status(201).json(await batches.addReading(authOf(res), params.id, body));
  }),
);

batchesRouter.post(
  '/:id/readings/:readingId/report',
  allow('batches.read', { accepts: 'multipart' }),
  receiveFile,
  validate({ params: readingParamsSchema }, async ({ params }, res, req) => {
    res.status(201).json(await batches.addLabReport(authOf(res), params.id, params.readingId, req.file));
  }),
);

batchesRouter.post(
  '/:id/steps/:n',
  allow('batches.read'),
  validate({ params: stepParamsSchema, body: stepSignOffSchema }, async ({ params, body }, res) => {
    res.json(await batches.signOffStep(authOf(res), params.id, params.n, body.note));
  }),
);

batchesRouter.post(
  '/:id/ingredient-lots',
  allow('batches.read'),
  validate({ params: idParam, body: ingredientLotSchema }, async ({ params, body }, res) => {
    res.status(201).json(await batches.addIngredientLot(authOf(res), params.id, body));
  }),
);

batchesRouter.post(
  '/:id/deviations',
  allow('batches.read'),
  validate({ params: idParam, body: deviationSchema }, async ({ params, body }, res) => {
    res.status(201).json(await batches.addDeviation(authOf(res), params.id, body));
  }),
);

batchesRouter.post(
  '/:id/release',
  allow('batches.decide'),
  validate({ params: idParam, body: decisionSchema }, async ({ params, body }, res) => {
    res.json(await batches.decide(authOf(res), params.id, body));
  }),
);

batchesRouter.get(
  '/:id/record.pdf',
  allow('batches.read'),
  validate({ params: idParam }, async ({ params }, res, req) => {
    const detail = await batches.getBatch(authOf(res), params.id);
    res.setHeader('Content-Type', 'application/pdf');
    res.setHeader('Content-Disposition', `inline; filename="batch-${detail.lotCode}.pdf"`);
    batchRecordPdf(detail, { locale: req.acceptsLanguages()[0] }).pipe(res);
  }),
);
