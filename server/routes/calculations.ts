import { Router } from 'express';

import { brixSchema, carbonationSchema, primingSchema } from '@/lib/schemas/calculations';
import { allow, authOf } from '@/server/middleware/access';
import { validate } from '@/server/middleware/validate';
import * as calculations from '@/server/services/calculations';

export const calculationsRouter = Router();

calculationsRouter.post(
  '/carbonation',
  allow('signed-in'),
  validate({ body: carbonationSchema }, async ({ body }, res) => {
    res.json(await calculations.carbonation(authOf(res), body));
  }),
);

calculationsRouter.post(
  '/priming',
  allow('signed-in'),
  validate({ body: primingSchema }, async ({ body }, res) => {
    res.json(await calculations.priming(authOf(res), body));
  }),
);

calculationsRouter.post(
  '/brix',
  allow('signed-in'),
  validate({ body: brixSchema }, ({ body }, res) => {
    res.json(calculations.brix(body));
  }),
);
