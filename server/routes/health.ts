import { Router } from 'express';

import type { ServerInfo } from '@/lib/api/types';
import { config } from '@/server/config';
import { databaseIsUp } from '@/server/db';
import { HttpError } from '@/server/errors';
import { mailer } from '@/server/mail/mailer';
import { allow } from '@/server/middleware/access';

export const healthRouter = Router();

healthRouter.get('/', allow('public'), async (_req, res) => {
  if (!(await databaseIsUp())) throw new HttpError(503, 'db_unavailable', 'The database does not answer.');
  const body: ServerInfo = {
    status: 'ok',
    db: 'ok',
    version: config.version,
    outbox: mailer.usesOutbox,
    outboxOpen: config.outboxOpen,
  };
  res.json(body);
});
