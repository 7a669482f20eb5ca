import { setTimeout as sleep } from 'node:timers/promises';

import { type Response, Router } from 'express';

import {
  acceptInvitationSchema,
  confirmSignUpSchema,
  forgotPasswordSchema,
  invitationTokenParams,
  resetPasswordSchema,
  signInSchema,
  signUpSchema,
} from '@/lib/schemas/auth';
import { config } from '@/server/config';
import { allow, authOf, tokenFrom } from '@/server/middleware/access';
import { accountKeys, perAccountLimit, perAddressLimit } from '@/server/middleware/rate-limits';
import { validate } from '@/server/middleware/validate';
import type { User } from '@/server/models/user';
import * as auth from '@/server/services/auth';
import { revokeToken, SESSION_COOKIE, sessionCookieOptions, signSessionToken } from '@/server/services/sessions';

export const authRouter = Router();

const byAddress = perAddressLimit('auth');
const limits = {
  signIn: perAccountLimit('sign-in', accountKeys.email, { countSuccess: false }),
  signUp: perAccountLimit('sign-up', accountKeys.email),
  forgot: perAccountLimit('forgot', accountKeys.email),
  reset: perAccountLimit('reset', accountKeys.bodyToken),
  confirm: perAccountLimit('confirm', accountKeys.bodyToken),
  accept: perAccountLimit('accept', accountKeys.bodyToken),
  preview: perAccountLimit('preview', accountKeys.paramToken),
};

function startSession(res: Response, user: User): void {
  res.cookie(SESSION_COOKIE, signSessionToken(user), sessionCookieOptions());
}

/** Runs work and answers no sooner than the floor, so the time taken does not tell whether an address has an account. */
async function atLeastFloor<T>(work: () => Promise<T>): Promise<T> {
  const started = Date.now();
  try {
    return await work();
  } finally {
    const left = config.authResponseFloorMs - (Date.now() - started);
    if (left > 0) await sleep(left);
  }
}

authRouter.post(
  '/sign-up',
  allow('public'),
  byAddress,
  limits.signUp,
  validate({ body: signUpSchema }, async ({ body }, res) => {
    await atLeastFloor(() => auth.signUp(body));
    res.status(202).json({ message: 'We sent a link to finish creating the brewery account. It works for 24 hours.' });
  }),
);

authRouter.post(
  '/confirm-sign-up',
  allow('public'),
  byAddress,
  limits.confirm,
  validate({ body: confirmSignUpSchema }, async ({ body }, res) => {
    const { user, session } = await auth.confirmSignUp(body.token);
    startSession(res, user);
    res.status(201).json(session);
  }),
);

authRouter.post(
  '/sign-in',
  allow('public'),
  byAddress,
  limits.signIn,
  validate({ body: signInSchema }, async ({ body }, res) => {
    const { user, session } = await auth.signIn(body);
    startSession(res, user);
    res.json(session);
  }),
);

/** Ends this session on the server too: the same token is refused from now on, even if someone kept a copy. */
authRouter.post('/sign-out', allow('public'), async (req, res) => {
  const token = tokenFrom(req);
  if (token) await revokeToken(token);
  const { maxAge: _maxAge, ...options } = sessionCookieOptions();
  res.clearCookie(SESSION_COOKIE, options);
  res.status(204).end();
});

authRouter.get('/session', allow('signed-in'), async (_req, res) => {
  res.json(await auth.sessionFor(authOf(res).userId));
});

authRouter.post(
  '/forgot-password',
  allow('public'),
  byAddress,
  limits.forgot,
  validate({ body: forgotPasswordSchema }, async ({ body }, res) => {
    await atLeastFloor(() => auth.requestPasswordReset(body.email));
    res
      .status(202)
      .json({ message: 'If an account uses this address, a reset link is on its way. It works for 1 hour.' });
  }),
);

authRouter.post(
  '/reset-password',
  allow('public'),
  byAddress,
  limits.reset,
  validate({ body: resetPasswordSchema }, async ({ body }, res) => {
    const { user, session } = await auth.resetPassword(body);
    startSession(res, user);
    res.json(session);
  }),
);

authRouter.get(
  '/invitations/:token',
  allow('public'),
  byAddress,
  limits.preview,
  validate({ params: invitationTokenParams }, async ({ params }, res) => {
    res.json(await auth.previewInvitation(params.token));
  }),
);

authRouter.post(
  '/accept-invitation',
  allow('public'),
  byAddress,
  limits.accept,
  validate({ body: acceptInvitationSchema }, async ({ body }, res) => {
    const { user, session } = await auth.acceptInvitation(body);
    startSession(res, user);
    res.status(201).json(session);
  }),
);
