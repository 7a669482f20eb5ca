import { Op } from 'sequelize';

import type { InvitationPreview, Session } from '../../lib/api/types';
import type { AcceptInvitationInput, ResetPasswordInput, SignInInput, SignUpInput } from '../../lib/schemas/auth';
import { Invitation, Organisation, PasswordReset, sequelize, User } from '../db';
import { conflict, gone, HttpError, notFound } from '../errors';
import { mailer } from '../mail/mailer';
import { passwordResetMail } from '../mail/templates';
import { seedStarterFormats } from './bottle-formats';
import { checkPassword, decoyPasswordHash, hashPassword } from './passwords';
import { invitationStatus, toSession } from './serialize';
import { hashToken, HOUR_MS, newOneTimeToken } from './tokens';

const WRONG_CREDENTIALS = 'That e-mail and password do not match an account.';

async function emailTaken(email: string): Promise<boolean> {
  return (await User.count({ where: { email } })) > 0;
}

/** Creates a brewery and its first user, its owner. Returns the new user for signing in. */
export async function signUp(input: SignUpInput): Promise<{ user: User; session: Session }> {
  if (await emailTaken(input.email)) {
    throw conflict('An account with this e-mail already exists. Sign in instead.', { email: 'An account with this e-mail already exists.' });
  }
  const passwordHash = await hashPassword(input.password);
  return sequelize.transaction(async (transaction) => {
    const organisation = await Organisation.create({ name: input.breweryName }, { transaction });
    await seedStarterFormats(organisation.id, transaction);
    const user = await User.create(
      { organisationId: organisation.id, email: input.email, name: input.name, role: 'owner', passwordHash },
      { transaction },
    );
    await user.reload({ transaction });
    await organisation.reload({ transaction });
    return { user, session: toSession(user, organisation) };
  });
}

/** Checks e-mail and password. A wrong password and an unknown e-mail get the same answer. */
export async function signIn(input: SignInInput): Promise<{ user: User; session: Session }> {
  const user = await User.findOne({ where: { email: input.email }, include: [{ model: Organisation, as: 'organisation' }] });
  const matches = await checkPassword(input.password, user?.passwordHash ?? (await decoyPasswordHash()));
  if (!user || !matches) throw new HttpError(401, 'wrong_credentials', WRONG_CREDENTIALS);
  if (!user.active) throw new HttpError(403, 'deactivated', 'This account has been deactivated. Ask an owner of your brewery.');
  const organisation = (user as User & { organisation: Organisation }).organisation;
  return { user, session: toSession(user, organisation) };
}

export async function sessionFor(userId: number): Promise<Session> {
  const user = await User.findByPk(userId, { include: [{ model: Organisation, as: 'organisation' }] });
  if (!user) throw notFound();
  return toSession(user, (user as User & { organisation: Organisation }).organisation);
}

/** Sends a reset link when the address belongs to an active account; says nothing either way. */
export async function requestPasswordReset(email: string): Promise<void> {
  const user = await User.findOne({ where: { email, active: true } });
  if (!user) return;
  const { token, tokenHash } = newOneTimeToken();
  await PasswordReset.create({ userId: user.id, tokenHash, expiresAt: new Date(Date.now() + HOUR_MS) });
  const mail = passwordResetMail({ name: user.name, token });
  await mailer.send({ ...mail, to: user.email, kind: 'password-reset', organisationId: user.organisationId, userId: user.id });
}

/** Sets a new password from a reset link. The link works once; every session of the account ends. */
export async function resetPassword(input: ResetPasswordInput): Promise<{ user: User; session: Session }> {
  const reset = await PasswordReset.findOne({ where: { tokenHash: hashToken(input.token) } });
  if (!reset) throw notFound('This reset link is not valid. Ask for a new one.');
  if (reset.usedAt) throw gone('This reset link has already been used. Ask for a new one.');
  if (reset.expiresAt.getTime() <= Date.now()) throw gone('This reset link has expired (links last 1 hour). Ask for a new one.');
  const passwordHash = await hashPassword(input.password);
  const user = await sequelize.transaction(async (transaction) => {
    const owner = await User.findByPk(reset.userId, { transaction, rejectOnEmpty: true });
    if (!owner.active) throw new HttpError(403, 'deactivated', 'This account has been deactivated. Ask an owner of your brewery.');
    await owner.update({ passwordHash, tokenVersion: owner.tokenVersion + 1 }, { transaction });
    await reset.update({ usedAt: new Date() }, { transaction });
    // Any other open reset links of this account stop working too.
    await PasswordReset.update({ usedAt: new Date() }, { where: { userId: owner.id, usedAt: { [Op.is]: null } }, transaction });
    return owner;
  });
  return { user, session: await sessionFor(user.id) };
}

async function usableInvitation(token: string): Promise<Invitation> {
  const invitation = await Invitation.findOne({
    where: { tokenHash: hashToken(token) },
    include: [
      { model: Organisation, as: 'organisation' },
      { model: User, as: 'invitedBy', attributes: ['name'] },
    ],
  });
  if (!invitation) throw notFound('This invitation link is not valid. Ask the brewery owner to send a new one.');
  const status = invitationStatus(invitation);
  if (status === 'accepted') throw gone('This invitation has already been used. Sign in instead.');
  if (status === 'revoked') throw gone('This invitation was withdrawn. Ask the brewery owner to send a new one.');
  if (status === 'expired') throw gone('This invitation has expired (invitations last 7 days). Ask the brewery owner to send a new one.');
  return invitation;
}

export async function previewInvitation(token: string): Promise<InvitationPreview> {
  const invitation = await usableInvitation(token);
  return {
    email: invitation.email,
    role: invitation.role,
    breweryName: invitation.organisation!.name,
    invitedBy: invitation.invitedBy?.name ?? null,
  };
}

/** Turns an invitation into an account with the invited role. The link works once. */
export async function acceptInvitation(input: AcceptInvitationInput): Promise<{ user: User; session: Session }> {
  const invitation = await usableInvitation(input.token);
  if (await emailTaken(invitation.email)) throw conflict('An account with this e-mail already exists. Sign in instead.');
  const passwordHash = await hashPassword(input.password);
  const user = await sequelize.transaction(async (transaction) => {
    const [claimed] = await Invitation.update(
      { acceptedAt: new Date() },
      { where: { id: invitation.id, acceptedAt: { [Op.is]: null }, revokedAt: { [Op.is]: null } }, transaction },
    );
    if (claimed !== 1) throw gone('This invitation has already been used. Sign in instead.');
    return User.create(
      { organisationId: invitation.organisationId, email: invitation.email, name: input.name, role: invitation.role, passwordHash },
      { transaction },
    );
  });
  return { user, session: await sessionFor(user.id) };
}
