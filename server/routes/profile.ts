import { Router } from 'express';

import { changePasswordSchema, profileSchema, type ChangePasswordInput, type ProfileInput } from '../../lib/schemas/team';
import { allow, authOf } from '../middleware/access';
import { validate } from '../middleware/validate';
import { sessionFor } from '../services/auth';
import { changePassword, updateProfile } from '../services/profile';
import { SESSION_COOKIE, sessionCookieOptions, signSessionToken } from '../services/sessions';

export const profileRouter = Router();

profileRouter.patch('/', allow('signed-in'), validate({ body: profileSchema }), async (_req, res) => {
  res.json(await updateProfile(authOf(res).userId, res.locals.body as ProfileInput));
});

profileRouter.post('/password', allow('signed-in'), validate({ body: changePasswordSchema }), async (_req, res) => {
  const user = await changePassword(authOf(res).userId, res.locals.body as ChangePasswordInput);
  // Other sessions end with the password change; this one goes on with a fresh token.
  res.cookie(SESSION_COOKIE, signSessionToken(user), sessionCookieOptions());
  res.json(await sessionFor(user.id));
});
