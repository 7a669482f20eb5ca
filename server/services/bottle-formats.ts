import { Op, type Transaction } from 'sequelize';

import type { BottleFormat as BottleFormatShape } from '@/lib/api/types';
import type { BottleFormatInput } from '@/lib/schemas/bottle-formats';
import { BottleFormat } from '@/server/db';
import { conflict, notFound } from '@/server/errors';
import { STARTER_BOTTLE_FORMATS } from '@/server/seed/bottle-formats';

export type BottleFormatDto = BottleFormatShape;

const toDto = (f: BottleFormat): BottleFormatDto => ({
  id: f.id,
  name: f.name,
  liquidMl: f.liquidMl,
  headspaceMl: f.headspaceMl,
  closure: f.closure,
  material: f.material,
  maxWorkingPressureBar: f.maxWorkingPressureBar,
  pressureSource: f.pressureSource,
  notes: f.notes,
  archived: f.archivedAt !== null,
});

/** Gives a new brewery the starter formats. */
export async function seedStarterFormats(organisationId: number, transaction?: Transaction): Promise<void> {
  await BottleFormat.bulkCreate(
    STARTER_BOTTLE_FORMATS.map((f) => ({ ...f, organisationId })),
    { transaction },
  );
}

export async function listBottleFormats(organisationId: number, includeArchived = false): Promise<BottleFormatDto[]> {
  const rows = await BottleFormat.findAll({
    where: { organisationId, ...(includeArchived ? {} : { archivedAt: { [Op.is]: null } }) },
    order: [
      ['liquidMl', 'ASC'],
      ['name', 'ASC'],
    ],
  });
  return rows.map(toDto);
}

/** A format of this brewery (archived ones too: old calculations still name them). */
export async function findBottleFormat(organisationId: number, id: number): Promise<BottleFormat> {
  const format = await BottleFormat.findOne({ where: { id, organisationId } });
  if (!format) throw notFound('No such bottle format in your brewery.');
  return format;
}

async function assertNameFree(organisationId: number, name: string, exceptId?: number): Promise<void> {
  const clash = await BottleFormat.findOne({
    where: { organisationId, name, ...(exceptId ? { id: { [Op.ne]: exceptId } } : {}) },
  });
  if (clash)
    throw conflict('Another bottle format already has this name.', {
      name: 'Another bottle format already has this name.',
    });
}

export async function createBottleFormat(organisationId: number, input: BottleFormatInput): Promise<BottleFormatDto> {
  await assertNameFree(organisationId, input.name);
  return toDto(await BottleFormat.create({ ...input, organisationId }));
}

export async function updateBottleFormat(
  organisationId: number,
  id: number,
  input: BottleFormatInput,
): Promise<BottleFormatDto> {
  const format = await findBottleFormat(organisationId, id);
  await assertNameFree(organisationId, input.name, id);
  await format.update(input);
  return toDto(format);
}

/** Archived formats disappear from pickers but stay readable; nothing is deleted. */
export async function setBottleFormatArchived(
  organisationId: number,
  id: number,
  archived: boolean,
): Promise<BottleFormatDto> {
  const format = await findBottleFormat(organisationId, id);
  await format.update({ archivedAt: archived ? new Date() : null });
  return toDto(format);
}
