import { Router } from 'express';

import { carbonationSchema } from '@/lib/schemas/calculations';
import { allow } from '@/server/middleware/access';
import { validate } from '@/server/middleware/validate';

/**
 * Reference endpoints for `npm run bench`, mounted only with BENCH_ROUTES=true. /noop runs exactly the middleware
 * of POST /api/calculations/carbonation (session check, JSON body, the same validation) and then does nothing, so
 * the difference between the two is what the calculation itself costs.
 */
export const benchRouter = Router();

benchRouter.post(
  '/noop',
  allow('signed-in'),
  validate({ body: carbonationSchema }, (_values, res) => {
    res.json({ ok: true });
  }),
);

/** The same with no body, signed in and not: the difference is what the session check costs. */
benchRouter.get('/signed-in', allow('signed-in'), (_req, res) => {
  res.json({ ok: true });
});

benchRouter.get('/open', allow('public'), (_req, res) => {
  res.json({ ok: true });
});
