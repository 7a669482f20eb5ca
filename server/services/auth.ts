import { Op } from 'sequelize';

import type { InvitationPreview, Session } from '@/lib/api/types';
import { FOUNDER_ROLE } from '@/lib/roles';
import type { AcceptInvitationInput, ResetPasswordInput, SignInInput, SignUpInput } from '@/lib/schemas/auth';
import { Invitation, Organisation, PasswordReset, PendingSignUp, transaction, User } from '@/server/db';
import { conflict, gone, HttpError, notFound } from '@/server/errors';
import { mailer } from '@/server/mail/mailer';
import {
  confirmSignUpUrl,
  passwordResetMail,
  resetPasswordUrl,
  signUpAttemptMail,
  signUpConfirmationMail,
} from '@/server/mail/templates';

import { seedStarterFormats } from './bottle-formats';
import { redactUsedLink } from './outbox';
import { checkPassword, decoyPasswordHash, hashPassword } from './passwords';
import { invitationStatus, toSession } from './serialize';
import { hashToken, HOUR_MS, newOneTimeToken } from './tokens';

/** One answer for an unknown address, a wrong password and a deactivated account, so none can be told apart. */
const WRONG_CREDENTIALS =
  'That e-mail and password do not match an account. If your account was deactivated, ask an owner of your brewery.';

/** How long a sign-up confirmation link works. */
const SIGN_UP_TTL_MS = 24 * HOUR_MS;

/**
 * Starts a sign-up. The brewery and its owner are created when the address is confirmed (`confirmSignUp`). When the
 * address already has an account, that address is told by e-mail instead and nothing is created; the caller's answer
 * is the same either way, and so is the work (one password hash, one stored message).
 */
export async function signUp(input: SignUpInput): Promise<void> {
  const passwordHash = await hashPassword(input.password);
  const existing = await User.findOne({ where: { email: input.email } });
  if (existing) {
    const mail = signUpAttemptMail({ name: existing.name });
    await mailer.send({
      ...mail,
      to: existing.email,
      kind: 'sign-up-attempt',
      organisationId: existing.organisationId,
      userId: existing.id,
    });
    return;
  }
  const { token, tokenHash } = newOneTimeToken();
  const expiresAt = new Date(Date.now() + SIGN_UP_TTL_MS);
  await PendingSignUp.create({
    email: input.email,
    name: input.name,
    breweryName: input.breweryName,
    passwordHash,
    tokenHash,
    expiresAt,
  });
  const mail = signUpConfirmationMail({ name: input.name, breweryName: input.breweryName, token });
  await mailer.send({
    ...mail,
    to: input.email,
    kind: 'sign-up',
    organisationId: null,
    link: { tokenHash, expiresAt },
  });
}

/** Follows a sign-up confirmation link: creates the brewery and its owner, once. */
export async function confirmSignUp(token: string): Promise<{ user: User; session: Session }> {
  const tokenHash = hashToken(token);
  const pending = await PendingSignUp.findOne({ where: { tokenHash } });
  if (!pending) throw notFound('This confirmation link is not valid. Sign up again to get a new one.');
  if (pending.usedAt) throw gone('This confirmation link has already been used. Sign in instead.');
  if (pending.expiresAt.getTime() <= Date.now())
    throw gone('This confirmation link has expired (links last 24 hours). Sign up again.');
  const user = await transaction(async (t) => {
    const [claimed] = await PendingSignUp.update(
      { usedAt: new Date() },
      { where: { id: pending.id, usedAt: { [Op.is]: null } }, transaction: t },
    );
    if (claimed !== 1) throw gone('This confirmation link has already been used. Sign in instead.');
    if ((await User.count({ where: { email: pending.email }, transaction: t })) > 0) {
      throw conflict('An account with this e-mail already exists. Sign in instead.');
    }
    const organisation = await Organisation.create({ name: pending.breweryName }, { transaction: t });
    await seedStarterFormats(organisation.id, t);
    return User.create(
      {
        organisationId: organisation.id,
        email: pending.email,
        name: pending.name,
        role: FOUNDER_ROLE,
        passwordHash: pending.passwordHash,
      },
      { transaction: t },
    );
  });
  await redactUsedLink(tokenHash);
  return { user, session: await sessionFor(user.id) };
}

/** Checks e-mail and password. An unknown e-mail, a wrong password and a deactivated account get the same answer. */
export async function signIn(input: SignInInput): Promise<{ user: User; session: Session }> {
  const user = await User.findOne({
    where: { email: input.email },
    include: [{ model: Organisation, as: 'organisation' }],
  });
  const matches = await checkPassword(input.password, user?.passwordHash ?? (await decoyPasswordHash()));
  if (!user || !matches || !user.active) throw new HttpError(401, 'wrong_credentials', WRONG_CREDENTIALS);
  // Included above; every user belongs to a brewery (a foreign key that is never null).
  return { user, session: toSession(user, user.organisation!) };
}

export async function sessionFor(userId: number): Promise<Session> {
  const user = await User.findByPk(userId, { include: [{ model: Organisation, as: 'organisation' }] });
  if (!user?.organisation) throw notFound();
  return toSession(user, user.organisation);
}

async function newPasswordReset(user: User): Promise<{ token: string; tokenHash: string; expiresAt: Date }> {
  const { token, tokenHash } = newOneTimeToken();
  const expiresAt = new Date(Date.now() + HOUR_MS);
  await PasswordReset.create({ userId: user.id, tokenHash, expiresAt });
  return { token, tokenHash, expiresAt };
}

/** Sends a reset link when the address belongs to an active account; says nothing either way. */
export async function requestPasswordReset(email: string): Promise<void> {
  const user = await User.findOne({ where: { email, active: true } });
  if (!user) return;
  const { token, tokenHash, expiresAt } = await newPasswordReset(user);
  const mail = passwordResetMail({ name: user.name, token });
  await mailer.send({
    ...mail,
    to: user.email,
    kind: 'password-reset',
    organisationId: user.organisationId,
    userId: user.id,
    link: { tokenHash, expiresAt },
  });
}

/**
 * For the server's own console (`npm run reset-link`), where nobody can read e-mail: a fresh one-time link for an
 * address. A reset link (1 hour) for an active account; for a sign-up still waiting, a new confirmation link (the
 * old one stops working). Null when the address has neither.
 */
export async function consoleLink(email: string): Promise<{ kind: 'reset' | 'sign-up'; url: string } | null> {
  const user = await User.findOne({ where: { email, active: true } });
  if (user) return { kind: 'reset', url: resetPasswordUrl((await newPasswordReset(user)).token) };
  if ((await User.count({ where: { email } })) > 0) return null;
  const pending = await PendingSignUp.findOne({ where: { email, usedAt: { [Op.is]: null } }, order: [['id', 'DESC']] });
  if (!pending) return null;
  const { token, tokenHash } = newOneTimeToken();
  await redactUsedLink(pending.tokenHash);
  await pending.update({ tokenHash, expiresAt: new Date(Date.now() + SIGN_UP_TTL_MS) });
  return { kind: 'sign-up', url: confirmSignUpUrl(token) };
}

/** Sets a new password from a reset link. The link works once; every session of the account ends. */
export async function resetPassword(input: ResetPasswordInput): Promise<{ user: User; session: Session }> {
  const reset = await PasswordReset.findOne({ where: { tokenHash: hashToken(input.token) } });
  if (!reset) throw notFound('This reset link is not valid. Ask for a new one.');
  if (reset.usedAt) throw gone('This reset link has already been used. Ask for a new one.');
  if (reset.expiresAt.getTime() <= Date.now())
    throw gone('This reset link has expired (links last 1 hour). Ask for a new one.');
  const passwordHash = await hashPassword(input.password);
  const user = await transaction(async (transaction) => {
    const owner = await User.findByPk(reset.userId, { transaction, rejectOnEmpty: true });
    if (!owner.active)
      throw new HttpError(403, 'deactivated', 'This account has been deactivated. Ask an owner of your brewery.');
    await owner.update({ passwordHash, tokenVersion: owner.tokenVersion + 1 }, { transaction });
    await reset.update({ usedAt: new Date() }, { transaction });
    // Any other open reset links of this account stop working too.
    await PasswordReset.update(
      { usedAt: new Date() },
      { where: { userId: owner.id, usedAt: { [Op.is]: null } }, transaction },
    );
    return owner;
  });
  const voided = await PasswordReset.findAll({ where: { userId: user.id }, attributes: ['tokenHash'] });
  for (const row of voided) await redactUsedLink(row.tokenHash);
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
  if (status === 'expired')
    throw gone('This invitation has expired (invitations last 7 days). Ask the brewery owner to send a new one.');
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
  if ((await User.count({ where: { email: invitation.email } })) > 0)
    throw conflict('An account with this e-mail already exists. Sign in instead.');
  const passwordHash = await hashPassword(input.password);
  const user = await transaction(async (transaction) => {
    const [claimed] = await Invitation.update(
      { acceptedAt: new Date() },
      { where: { id: invitation.id, acceptedAt: { [Op.is]: null }, revokedAt: { [Op.is]: null } }, transaction },
    );
    if (claimed !== 1) throw gone('This invitation has already been used. Sign in instead.');
    return User.create(
      {
        organisationId: invitation.organisationId,
        email: invitation.email,
        name: input.name,
        role: invitation.role,
        passwordHash,
      },
      { transaction },
    );
  });
  await redactUsedLink(invitation.tokenHash);
  return { user, session: await sessionFor(user.id) };
}
