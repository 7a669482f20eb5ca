import { Op, type WhereOptions } from 'sequelize';

import type { OutboxMessage as OutboxMessageDto } from '@/lib/api/types';
import { can } from '@/lib/roles';
import { OutboxMessage } from '@/server/db';
import { notFound } from '@/server/errors';

import type { AuthContext } from './sessions';

/** Kinds of message an owner reads for the whole brewery; everything else only its addressee reads. */
const BREWERY_KINDS = ['invitation', 'review', 'batch'];

/**
 * Which stored messages a reader may see. Under `npm run dev` (outbox open) everything, as a local mail catcher
 * would. Otherwise only signed-in people, each the messages addressed to them; owners also their brewery's
 * invitations and review messages (never another person's password reset); nobody another brewery's mail.
 */
function visibleTo(reader: AuthContext | undefined, open: boolean): WhereOptions<OutboxMessage> | null {
  if (open) return {};
  if (!reader) return null;
  const own = { userId: reader.userId };
  if (can(reader.role, 'outbox.brewery')) {
    return { organisationId: reader.organisationId, [Op.or]: [own, { kind: BREWERY_KINDS }] };
  }
  return { organisationId: reader.organisationId, ...own };
}

const REDACTED = '[this one-time link has been used or has expired]';

/** Removes the working link from a message's text, keeping the rest readable. */
export function redactLinks(text: string): string {
  return text.replace(/https?:\/\/\S*[?&]token=\S+/g, REDACTED);
}

async function redact(where: WhereOptions<OutboxMessage>): Promise<void> {
  const rows = await OutboxMessage.findAll({ where: { ...where, linkTokenHash: { [Op.ne]: null } } });
  for (const row of rows)
    await row.update({ text: redactLinks(row.text), html: null, linkTokenHash: null, linkExpiresAt: null });
}

/** The link with this token hash was used or replaced: its message no longer holds it in clear. */
export function redactUsedLink(tokenHash: string): Promise<void> {
  return redact({ linkTokenHash: tokenHash });
}

/** Messages whose link has expired lose it too; run before the outbox is read and at start. */
export function redactExpiredLinks(now = new Date()): Promise<void> {
  return redact({ linkExpiresAt: { [Op.lte]: now } });
}

const toDto = (m: OutboxMessage): OutboxMessageDto => ({
  id: m.id,
  to: m.to,
  subject: m.subject,
  text: m.text,
  kind: m.kind,
  createdAt: m.createdAt.toISOString(),
});

export async function listOutbox(
  reader: AuthContext | undefined,
  open: boolean,
  limit = 100,
): Promise<OutboxMessageDto[] | null> {
  const where = visibleTo(reader, open);
  if (!where) return null;
  await redactExpiredLinks();
  const rows = await OutboxMessage.findAll({ where, order: [['id', 'DESC']], limit });
  return rows.map(toDto);
}

export async function readOutboxMessage(
  reader: AuthContext | undefined,
  open: boolean,
  id: number,
): Promise<OutboxMessageDto | null> {
  const where = visibleTo(reader, open);
  if (!where) return null;
  await redactExpiredLinks();
  const row = await OutboxMessage.findOne({ where: { ...where, id } });
  if (!row) throw notFound('No such message in the outbox.');
  return toDto(row);
}
