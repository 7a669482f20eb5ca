import { Router } from 'express';

import { idParam } from '../../lib/schemas/common';
import { changeRoleSchema, inviteSchema, type ChangeRoleInput, type InviteInput } from '../../lib/schemas/team';
import { allow, authOf } from '../middleware/access';
import { validate } from '../middleware/validate';
import * as team from '../services/team';

export const teamRouter = Router();

const id = (locals: { params?: unknown }) => (locals.params as { id: number }).id;

teamRouter.get('/', allow(['owner']), async (_req, res) => {
  res.json(await team.listTeam(authOf(res).organisationId));
});

teamRouter.post('/invitations', allow(['owner']), validate({ body: inviteSchema }), async (_req, res) => {
  res.status(201).json(await team.invite(authOf(res), res.locals.body as InviteInput));
});

teamRouter.post('/invitations/:id/resend', allow(['owner']), validate({ params: idParam }), async (_req, res) => {
  res.json(await team.resendInvitation(authOf(res), id(res.locals)));
});

teamRouter.delete('/invitations/:id', allow(['owner']), validate({ params: idParam }), async (_req, res) => {
  await team.revokeInvitation(authOf(res).organisationId, id(res.locals));
  res.status(204).end();
});

teamRouter.patch('/members/:id', allow(['owner']), validate({ params: idParam, body: changeRoleSchema }), async (_req, res) => {
  res.json(await team.changeRole(authOf(res), id(res.locals), (res.locals.body as ChangeRoleInput).role));
});

teamRouter.post('/members/:id/deactivate', allow(['owner']), validate({ params: idParam }), async (_req, res) => {
  res.json(await team.setMemberActive(authOf(res), id(res.locals), false));
});

teamRouter.post('/members/:id/reactivate', allow(['owner']), validate({ params: idParam }), async (_req, res) => {
  res.json(await team.setMemberActive(authOf(res), id(res.locals), true));
});
