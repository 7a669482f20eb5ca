import { Router } from 'express';

import { idParam } from '@/lib/schemas/common';
import { config } from '@/server/config';
import { unauthorized } from '@/server/errors';
import { allow, optionalAuth } from '@/server/middleware/access';
import { validate } from '@/server/middleware/validate';
import { listOutbox, readOutboxMessage } from '@/server/services/outbox';

export const outboxRouter = Router();

// Public so that, in development, a signed-out person can follow a password-reset link; the service decides
// what each reader may see and answers null when a signed-out reader may see nothing.
outboxRouter.get('/', allow('public'), async (req, res) => {
  const messages = await listOutbox(await optionalAuth(req), config.outboxOpen);
  if (!messages) throw unauthorized();
  res.json({ messages, open: config.outboxOpen });
});

outboxRouter.get(
  '/:id',
  allow('public'),
  validate({ params: idParam }, async ({ params }, res, req) => {
    const message = await readOutboxMessage(await optionalAuth(req), config.outboxOpen, params.id);
    if (!message) throw unauthorized();
    res.json(message);
  }),
);
