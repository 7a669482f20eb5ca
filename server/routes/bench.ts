import { Router } from 'express';
import * as yup from 'yup';

import { allow } from '../middleware/access';
import { validate } from '../middleware/validate';

/**
 * Reference endpoints for `npm run bench`, mounted only with BENCH_ROUTES=true: the same middleware as a
 * calculation (session check, JSON body, validation) with nothing behind it.
 */
export const benchRouter = Router();

const anything = yup.object({});

benchRouter.post('/noop', allow('signed-in'), validate({ body: anything }), (_req, res) => {
  res.json({ ok: true });
});
