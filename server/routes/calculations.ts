import { Router, type Request } from 'express';

import { brixSchema, carbonationSchema, primingSchema, type BrixRequest, type CarbonationRequest, type PrimingRequest } from '../../lib/schemas/calculations';
import { allow, authOf } from '../middleware/access';
import { validate } from '../middleware/validate';
import * as calculations from '../services/calculations';

export const calculationsRouter = Router();

const headspaceGiven = (req: Request) => typeof (req.body as { headspaceMl?: unknown }).headspaceMl === 'number';

calculationsRouter.post('/carbonation', allow('signed-in'), validate({ body: carbonationSchema }), async (req, res) => {
  res.json(await calculations.carbonation(authOf(res), res.locals.body as CarbonationRequest, headspaceGiven(req)));
});

calculationsRouter.post('/priming', allow('signed-in'), validate({ body: primingSchema }), async (req, res) => {
  res.json(await calculations.priming(authOf(res), res.locals.body as PrimingRequest, headspaceGiven(req)));
});

calculationsRouter.post('/brix', allow('signed-in'), validate({ body: brixSchema }), (_req, res) => {
  res.json(calculations.brix(res.locals.body as BrixRequest));
});
