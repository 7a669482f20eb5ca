import { Router } from 'express';

import { changePasswordSchema, organisationSchema, preferencesSchema, profileSchema } from '@/lib/schemas/team';
import { allow, authOf } from '@/server/middleware/access';
import { accountKeys, perAccountLimit, perAddressLimit } from '@/server/middleware/rate-limits';
import { validate } from '@/server/middleware/validate';
import { sessionFor } from '@/server/services/auth';
import { changePassword, updateOrganisation, updatePreferences, updateProfile } from '@/server/services/profile';
import { SESSION_COOKIE, sessionCookieOptions, signSessionToken } from '@/server/services/sessions';

export const profileRouter = Router();

profileRouter.patch(
  '/',
  allow('signed-in'),
  validate({ body: profileSchema }, async ({ body }, res) => {
    res.json(await updateProfile(authOf(res).userId, body));
  }),
);

profileRouter.patch(
  '/preferences',
  allow('signed-in'),
  validate({ body: preferencesSchema }, async ({ body }, res) => {
    res.json(await updatePreferences(authOf(res).userId, body));
  }),
);

/** Mounted at /api/organisation: the brewery's settings. */
export const organisationRouter = Router();

organisationRouter.patch(
  '/',
  allow('brewery.settings'),
  validate({ body: organisationSchema }, async ({ body }, res) => {
    const auth = authOf(res);
    res.json(await updateOrganisation(auth.organisationId, auth.userId, body));
  }),
);

const passwordChanges = [perAddressLimit('password-change'), perAccountLimit('password-change', accountKeys.signedIn)];

profileRouter.post(
  '/password',
  allow('signed-in'),
  ...passwordChanges,
  validate({ body: changePasswordSchema }, async ({ body }, res) => {
    const user = await changePassword(authOf(res).userId, body);
    // Other sessions end with the password change; this one goes on with a fresh token.
    res.cookie(SESSION_COOKIE, signSessionToken(user), sessionCookieOptions());
    res.json(await sessionFor(user.id));
  }),
);
