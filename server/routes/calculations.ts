import { Router } from 'express';

import { brixSchema, carbonationSchema, primingSchema, type BrixRequest, type CarbonationRequest, type PrimingRequest } from '../../lib/schemas/calculations';
import { allow, authOf } from '../middleware/access';
import { validate } from '../middleware/validate';
import * as calculations from '../services/calculations';

export const calculationsRouter = Router();

calculationsRouter.post('/carbonation', allow('signed-in'), validate({ body: carbonationSchema }), async (_req, res) => {
  res.json(await calculations.carbonation(authOf(res), res.locals.body as CarbonationRequest));
});

calculationsRouter.post('/priming', allow('signed-in'), validate({ body: primingSchema }), async (_req, res) => {
  res.json(await calculations.priming(authOf(res), res.locals.body as PrimingRequest));
});

calculationsRouter.post('/brix', allow('signed-in'), validate({ body: brixSchema }), (_req, res) => {
  res.json(calculations.brix(res.locals.body as BrixRequest));
});
