import { Router } from 'express';

import { idParam } from '../../lib/schemas/common';
import { config } from '../config';
import { unauthorized } from '../errors';
import { allow, optionalAuth } from '../middleware/access';
import { validate } from '../middleware/validate';
import { listOutbox, readOutboxMessage } from '../services/outbox';

export const outboxRouter = Router();

// Public so that, in development, a signed-out person can follow a password-reset link; the service decides
// what each reader may see and answers null when a signed-out reader may see nothing.
outboxRouter.get('/', allow('public'), async (req, res) => {
  const messages = await listOutbox(await optionalAuth(req), config.outboxOpen);
  if (!messages) throw unauthorized();
  res.json({ messages, open: config.outboxOpen });
});

outboxRouter.get('/:id', allow('public'), validate({ params: idParam }, async ({ params }, res, req) => {
  const message = await readOutboxMessage(await optionalAuth(req), config.outboxOpen, params.id);
  if (!message) throw unauthorized();
  res.json(message);
}));
