import { Op, type WhereOptions } from 'sequelize';

import type { OutboxMessage as OutboxMessageDto } from '../../lib/api/types';
import { OutboxMessage } from '../db';
import { notFound } from '../errors';
import type { AuthContext } from './sessions';

/**
 * Which stored messages a reader may see. In development (outbox open) everything, as a local mail catcher
 * would. Otherwise an owner sees the brewery's messages except other people's password resets, and everyone
 * sees the messages addressed to them.
 */
function visibleTo(reader: AuthContext | undefined, open: boolean): WhereOptions<OutboxMessage> | null {
  if (open) return {};
  if (!reader) return null;
  if (reader.role === 'owner') {
    return {
      organisationId: reader.organisationId,
      [Op.or]: [{ kind: { [Op.ne]: 'password-reset' } }, { userId: reader.userId }],
    };
  }
  return { organisationId: reader.organisationId, userId: reader.userId };
}

const toDto = (m: OutboxMessage): OutboxMessageDto => ({
  id: m.id,
  to: m.to,
  subject: m.subject,
  text: m.text,
  kind: m.kind,
  createdAt: m.createdAt.toISOString(),
});

export async function listOutbox(reader: AuthContext | undefined, open: boolean, limit = 100): Promise<OutboxMessageDto[] | null> {
  const where = visibleTo(reader, open);
  if (!where) return null;
  const rows = await OutboxMessage.findAll({ where, order: [['id', 'DESC']], limit });
  return rows.map(toDto);
}

export async function readOutboxMessage(reader: AuthContext | undefined, open: boolean, id: number): Promise<OutboxMessageDto | null> {
  const where = visibleTo(reader, open);
  if (!where) return null;
  const row = await OutboxMessage.findOne({ where: { ...where, id } });
  if (!row) throw notFound('No such message in the outbox.');
  return toDto(row);
}
