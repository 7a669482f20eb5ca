import { Router } from 'express';

import { idParam } from '@/lib/schemas/common';
import { changeRoleSchema, inviteSchema } from '@/lib/schemas/team';
import { allow, authOf } from '@/server/middleware/access';
import { validate } from '@/server/middleware/validate';
import * as team from '@/server/services/team';

export const teamRouter = Router();

teamRouter.get('/', allow('team.manage'), async (_req, res) => {
  res.json(await team.listTeam(authOf(res).organisationId));
});

teamRouter.post(
  '/invitations',
  allow('team.manage'),
  validate({ body: inviteSchema }, async ({ body }, res) => {
    res.status(201).json(await team.invite(authOf(res), body));
  }),
);

teamRouter.post(
  '/invitations/:id/resend',
  allow('team.manage'),
  validate({ params: idParam }, async ({ params }, res) => {
    res.json(await team.resendInvitation(authOf(res), params.id));
  }),
);

teamRouter.delete(
  '/invitations/:id',
  allow('team.manage'),
  validate({ params: idParam }, async ({ params }, res) => {
    await team.revokeInvitation(authOf(res).organisationId, params.id);
    res.status(204).end();
  }),
);

teamRouter.patch(
  '/members/:id',
  allow('team.manage'),
  validate({ params: idParam, body: changeRoleSchema }, async ({ params, body }, res) => {
    res.json(await team.changeRole(authOf(res), params.id, body.role));
  }),
);

teamRouter.post(
  '/members/:id/deactivate',
  allow('team.manage'),
  validate({ params: idParam }, async ({ params }, res) => {
    res.json(await team.setMemberActive(authOf(res), params.id, false));
  }),
);

teamRouter.post(
  '/members/:id/reactivate',
  allow('team.manage'),
  validate({ params: idParam }, async ({ params }, res) => {
    res.json(await team.setMemberActive(authOf(res), params.id, true));
  }),
);
