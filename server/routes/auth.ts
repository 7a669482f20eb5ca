import { Router, type Response } from 'express';
import { rateLimit } from 'express-rate-limit';

import {
  acceptInvitationSchema,
  forgotPasswordSchema,
  invitationTokenParams,
  resetPasswordSchema,
  signInSchema,
  signUpSchema,
  type AcceptInvitationInput,
  type ForgotPasswordInput,
  type ResetPasswordInput,
  type SignInInput,
  type SignUpInput,
} from '../../lib/schemas/auth';
import { config } from '../config';
import { HttpError } from '../errors';
import { allow, authOf } from '../middleware/access';
import { validate } from '../middleware/validate';
import * as auth from '../services/auth';
import { SESSION_COOKIE, sessionCookieOptions, signSessionToken } from '../services/sessions';
import type { User } from '../models/user';

export const authRouter = Router();

const limiter = rateLimit({
  windowMs: 60_000,
  limit: config.authRateLimitPerMinute,
  standardHeaders: 'draft-8',
  legacyHeaders: false,
  handler: (_req, _res, next) => next(new HttpError(429, 'too_many_requests', 'Too many attempts. Wait a minute and try again.')),
});

function startSession(res: Response, user: User): void {
  res.cookie(SESSION_COOKIE, signSessionToken(user), sessionCookieOptions());
}

authRouter.post('/sign-up', allow('public'), limiter, validate({ body: signUpSchema }), async (_req, res) => {
  const { user, session } = await auth.signUp(res.locals.body as SignUpInput);
  startSession(res, user);
  res.status(201).json(session);
});

authRouter.post('/sign-in', allow('public'), limiter, validate({ body: signInSchema }), async (_req, res) => {
  const { user, session } = await auth.signIn(res.locals.body as SignInInput);
  startSession(res, user);
  res.json(session);
});

authRouter.post('/sign-out', allow('public'), (_req, res) => {
  const { maxAge: _maxAge, ...options } = sessionCookieOptions();
  res.clearCookie(SESSION_COOKIE, options);
  res.status(204).end();
});

authRouter.get('/session', allow('signed-in'), async (_req, res) => {
  res.json(await auth.sessionFor(authOf(res).userId));
});

authRouter.post('/forgot-password', allow('public'), limiter, validate({ body: forgotPasswordSchema }), async (_req, res) => {
  await auth.requestPasswordReset((res.locals.body as ForgotPasswordInput).email);
  res.status(202).json({ message: 'If an account uses this address, a reset link is on its way. It works for 1 hour.' });
});

authRouter.post('/reset-password', allow('public'), limiter, validate({ body: resetPasswordSchema }), async (_req, res) => {
  const { user, session } = await auth.resetPassword(res.locals.body as ResetPasswordInput);
  startSession(res, user);
  res.json(session);
});

authRouter.get('/invitations/:token', allow('public'), limiter, validate({ params: invitationTokenParams }), async (_req, res) => {
  res.json(await auth.previewInvitation((res.locals.params as { token: string }).token));
});

authRouter.post('/accept-invitation', allow('public'), limiter, validate({ body: acceptInvitationSchema }), async (_req, res) => {
  const { user, session } = await auth.acceptInvitation(res.locals.body as AcceptInvitationInput);
  startSession(res, user);
  res.status(201).json(session);
});
