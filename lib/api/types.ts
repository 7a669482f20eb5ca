import type { Role } from '../roles';
import type { UnitSystem } from '../units';

/** The uniform error body every API error carries. */
export interface ErrorBody {
  error: { code: string; message: string; fields?: Record<string, string> };
}

export interface Organisation {
  id: number;
  name: string;
  /** The brewery's line between non-alcoholic and alcoholic, % ABV. */
  abvLimitPercent: number;
}

export interface SessionUser {
  id: number;
  name: string;
  email: string;
  role: Role;
  unitSystem: UnitSystem;
}

export interface Session {
  user: SessionUser;
  organisation: Organisation;
}

export interface Member {
  id: number;
  name: string;
  email: string;
  role: Role;
  active: boolean;
  createdAt: string;
}

export type InvitationStatus = 'pending' | 'expired' | 'accepted' | 'revoked';

export interface Invitation {
  id: number;
  email: string;
  role: Role;
  status: InvitationStatus;
  expiresAt: string;
  invitedBy: string | null;
  createdAt: string;
}

export interface Team {
  members: Member[];
  invitations: Invitation[];
}

export interface InvitationPreview {
  email: string;
  role: Role;
  breweryName: string;
  invitedBy: string | null;
}

export interface OutboxMessage {
  id: number;
  to: string;
  subject: string;
  text: string;
  kind: string;
  createdAt: string;
}

export interface ServerInfo {
  status: 'ok';
  db: 'ok';
  version: string;
  /** True when e-mail goes to the local Mail outbox instead of a real mail server. */
  outbox: boolean;
  /** True when anyone, signed in or not, may read the outbox (development only). */
  outboxOpen: boolean;
}
