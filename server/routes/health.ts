import { Router } from 'express';

import type { ServerInfo } from '@/lib/api/types';
import { config } from '@/server/config';
import { databaseIsUp, dialect } from '@/server/db';
import { HttpError } from '@/server/errors';
import { mailer } from '@/server/mail/mailer';
import { allow } from '@/server/middleware/access';
import { storageInfo } from '@/server/services/object-store';

export const healthRouter = Router();

healthRouter.get('/', allow('public'), async (_req, res) => {
  if (!(await databaseIsUp())) throw new HttpError(503, 'db_unavailable', 'The database does not answer.');
  const body: ServerInfo = {
    status: 'ok',
    db: 'ok',
    dialect: dialect(),
    storage: await storageInfo(),
    version: config.version,
    outbox: mailer.usesOutbox,
    outboxOpen: config.outboxOpen,
  };
  res.json(body);
});
