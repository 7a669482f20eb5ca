import { Op } from 'sequelize';

import type { Invitation as InvitationDto, Member, Team } from '@/lib/api/types';
import { can, type Role, rolesWith } from '@/lib/roles';
import type { InviteInput } from '@/lib/schemas/team';
import { Invitation, Organisation, transaction, User } from '@/server/db';
import { badRequest, conflict, gone, notFound } from '@/server/errors';
import { mailer } from '@/server/mail/mailer';
import { invitationMail } from '@/server/mail/templates';

import { redactUsedLink } from './outbox';
import { invitationStatus, toInvitation, toMember } from './serialize';
import type { AuthContext } from './sessions';
import { DAY_MS, newOneTimeToken } from './tokens';

const INVITATION_TTL_MS = 7 * DAY_MS;

export async function listTeam(organisationId: number): Promise<Team> {
  const [members, invitations] = await Promise.all([
    User.findAll({
      where: { organisationId },
      order: [
        ['active', 'DESC'],
        ['name', 'ASC'],
      ],
    }),
    Invitation.findAll({
      where: { organisationId, acceptedAt: { [Op.is]: null }, revokedAt: { [Op.is]: null } },
      include: [{ model: User, as: 'invitedBy', attributes: ['name'] }],
      order: [['createdAt', 'DESC']],
    }),
  ]);
  return { members: members.map(toMember), invitations: invitations.map(toInvitation) };
}

async function sendInvitation(invitation: Invitation, token: string, inviter: AuthContext): Promise<void> {
  const link = { tokenHash: invitation.tokenHash, expiresAt: invitation.expiresAt };
  const [organisation, invitedBy] = await Promise.all([
    Organisation.findByPk(inviter.organisationId, { rejectOnEmpty: true }),
    User.findByPk(inviter.userId, { attributes: ['name'] }),
  ]);
  const mail = invitationMail({
    breweryName: organisation.name,
    inviterName: invitedBy?.name ?? null,
    role: invitation.role,
    token,
  });
  await mailer.send({
    ...mail,
    to: invitation.email,
    kind: 'invitation',
    organisationId: inviter.organisationId,
    link,
  });
}

/**
 * Invites a person by e-mail with a role. One open invitation per address and brewery (a unique index holds it
 * against races). An address with an account in another brewery is invited like any other, so the answer never
 * tells that it has one; accepting then says to sign in instead.
 */
export async function invite(inviter: AuthContext, input: InviteInput): Promise<InvitationDto> {
  if ((await User.count({ where: { email: input.email, organisationId: inviter.organisationId } })) > 0) {
    throw conflict('This person is already a member of your brewery.', { email: 'Already a member of your brewery.' });
  }
  const alreadyInvited = () =>
    conflict('This address already has an open invitation. Resend it from the list instead.', {
      email: 'Already invited: resend the invitation from the list.',
    });
  const { token, tokenHash } = newOneTimeToken();
  const { invitation, closed } = await transaction(async (t) => {
    const open = await Invitation.findAll({
      where: {
        organisationId: inviter.organisationId,
        email: input.email,
        acceptedAt: { [Op.is]: null },
        revokedAt: { [Op.is]: null },
      },
      transaction: t,
    });
    if (open.some((inv) => invitationStatus(inv) === 'pending')) throw alreadyInvited();
    // Expired invitations to the same address are closed so that only the new link can be used.
    await Invitation.update({ revokedAt: new Date() }, { where: { id: open.map((inv) => inv.id) }, transaction: t });
    const created = await Invitation.create(
      {
        organisationId: inviter.organisationId,
        invitedById: inviter.userId,
        email: input.email,
        role: input.role,
        tokenHash,
        expiresAt: new Date(Date.now() + INVITATION_TTL_MS),
      },
      { transaction: t },
    );
    return { invitation: created, closed: open };
  });
  for (const old of closed) await redactUsedLink(old.tokenHash);
  await sendInvitation(invitation, token, inviter);
  return toInvitation(await invitation.reload({ include: [{ model: User, as: 'invitedBy', attributes: ['name'] }] }));
}

async function openInvitation(organisationId: number, id: number): Promise<Invitation> {
  const invitation = await Invitation.findOne({ where: { id, organisationId } });
  if (!invitation) throw notFound('No such invitation in your brewery.');
  if (invitation.acceptedAt) throw gone('This invitation has already been accepted.');
  if (invitation.revokedAt) throw gone('This invitation was revoked.');
  return invitation;
}

/** Sends a fresh link (the old one stops working) valid for another 7 days. */
export async function resendInvitation(inviter: AuthContext, id: number): Promise<InvitationDto> {
  const invitation = await openInvitation(inviter.organisationId, id);
  const { token, tokenHash } = newOneTimeToken();
  await redactUsedLink(invitation.tokenHash);
  await invitation.update({
    tokenHash,
    expiresAt: new Date(Date.now() + INVITATION_TTL_MS),
    invitedById: inviter.userId,
  });
  await sendInvitation(invitation, token, inviter);
  return toInvitation(await invitation.reload({ include: [{ model: User, as: 'invitedBy', attributes: ['name'] }] }));
}

export async function revokeInvitation(organisationId: number, id: number): Promise<void> {
  const invitation = await openInvitation(organisationId, id);
  await invitation.update({ revokedAt: new Date() });
  await redactUsedLink(invitation.tokenHash);
}

async function memberOf(organisationId: number, id: number): Promise<User> {
  const member = await User.findOne({ where: { id, organisationId } });
  if (!member) throw notFound('No such member in your brewery.');
  return member;
}

async function assertAnotherActiveOwner(organisationId: number, exceptUserId: number): Promise<void> {
  const owners = await User.count({
    where: { organisationId, role: [...rolesWith('team.manage')], active: true, id: { [Op.ne]: exceptUserId } },
  });
  if (owners === 0) throw badRequest('A brewery needs at least one active owner. Make someone else owner first.');
}

export async function changeRole(actor: AuthContext, memberId: number, role: Role): Promise<Member> {
  const member = await memberOf(actor.organisationId, memberId);
  if (can(member.role, 'team.manage') && !can(role, 'team.manage'))
    await assertAnotherActiveOwner(actor.organisationId, member.id);
  await member.update({ role });
  return toMember(member);
}

/**
 * Deactivated members can no longer sign in, and their open sessions stop at once. Deactivation also raises the
 * token version, so reactivating someone later does not bring back the sessions they had before.
 */
export async function setMemberActive(actor: AuthContext, memberId: number, active: boolean): Promise<Member> {
  const member = await memberOf(actor.organisationId, memberId);
  if (!active && member.id === actor.userId) throw badRequest('You cannot deactivate yourself.');
  if (!active && can(member.role, 'team.manage')) await assertAnotherActiveOwner(actor.organisationId, member.id);
  await member.update(active ? { active } : { active, tokenVersion: member.tokenVersion + 1 });
  return toMember(member);
}
