import type { Invitation as InvitationDto, InvitationStatus, Member, Session } from '@/lib/api/types';
import type { Invitation } from '@/server/models/invitation';
import type { Organisation } from '@/server/models/organisation';
import type { User } from '@/server/models/user';

/** The only shapes in which people and invitations leave the server: no hashes, no tokens. */
export function toMember(user: User): Member {
  return {
    id: user.id,
    name: user.name,
    email: user.email,
    role: user.role,
    active: user.active,
    createdAt: user.createdAt.toISOString(),
  };
}

export function toSession(user: User, organisation: Organisation): Session {
  return {
    user: {
      id: user.id,
      name: user.name,
      email: user.email,
      role: user.role,
      unitSystem: user.unitSystem,
      notifyReviews: user.notifyReviews,
    },
    organisation: {
      id: organisation.id,
      name: organisation.name,
      abvLimitPercent: organisation.abvLimitPercent,
      warmestTempC: organisation.warmestTempC,
      ratingSharePercent: organisation.ratingSharePercent,
      lotPrefix: organisation.lotPrefix,
      currency: organisation.currency,
      licensedForAlcohol: organisation.licensedForAlcohol,
    },
  };
}

export function invitationStatus(invitation: Invitation, now = new Date()): InvitationStatus {
  if (invitation.acceptedAt) return 'accepted';
  if (invitation.revokedAt) return 'revoked';
  if (invitation.expiresAt.getTime() <= now.getTime()) return 'expired';
  return 'pending';
}

export function toInvitation(invitation: Invitation): InvitationDto {
  return {
    id: invitation.id,
    email: invitation.email,
    role: invitation.role,
    status: invitationStatus(invitation),
    expiresAt: invitation.expiresAt.toISOString(),
    invitedBy: invitation.invitedBy?.name ?? null,
    createdAt: invitation.createdAt.toISOString(),
  };
}
