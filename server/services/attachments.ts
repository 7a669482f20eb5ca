import crypto from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';

import type { Attachment } from '../../lib/api/types';
import { config } from '../config';
import { Attachment as AttachmentRow, User } from '../db';
import { badRequest, forbidden, notFound } from '../errors';
import { visibleIngredient } from './ingredients';
import type { AuthContext } from './sessions';

/** What a file really is, read from its first bytes (its name and the browser's claim are not trusted). */
const SIGNATURES: { mime: string; ext: string; bytes: number[] }[] = [
  { mime: 'application/pdf', ext: 'pdf', bytes: [0x25, 0x50, 0x44, 0x46, 0x2d] }, // %PDF-
  { mime: 'image/png', ext: 'png', bytes: [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a] },
  { mime: 'image/jpeg', ext: 'jpg', bytes: [0xff, 0xd8, 0xff] },
];

export function sniffFileType(buffer: Buffer): { mime: string; ext: string } | null {
  return SIGNATURES.find((s) => s.bytes.every((byte, i) => buffer[i] === byte)) ?? null;
}

export type AttachmentDto = Attachment;

const toDto = (a: AttachmentRow & { uploadedBy?: User | null }): AttachmentDto => ({
  id: a.id,
  name: a.originalName,
  mimeType: a.mimeType,
  sizeBytes: a.sizeBytes,
  uploadedBy: a.uploadedBy?.name ?? null,
  createdAt: a.createdAt.toISOString(),
  url: `/api/attachments/${a.id}`,
});

/** Keeps a spec sheet or label photo of a house ingredient, checked by content, under a generated name. */
export async function addAttachment(auth: AuthContext, ingredientId: number, file: { buffer: Buffer; originalname: string } | undefined): Promise<AttachmentDto> {
  const ingredient = await visibleIngredient(auth, ingredientId);
  if (ingredient.organisationId === null) throw forbidden('Files can be attached to house ingredients only.');
  if (!file) throw badRequest('Choose a file to attach.', { file: 'Choose a file to attach.' });
  const type = sniffFileType(file.buffer);
  if (!type) throw badRequest('Attach a PDF, JPEG or PNG file.', { file: 'This file is not a PDF, JPEG or PNG (checked by its content, not its name).' });
  const storedName = `${crypto.randomBytes(16).toString('hex')}.${type.ext}`;
  fs.mkdirSync(config.uploadsDir, { recursive: true });
  await fs.promises.writeFile(path.join(config.uploadsDir, storedName), file.buffer, { flag: 'wx' });
  const originalName = path.basename(file.originalname).replace(/[^\w .()-]+/g, '_').slice(0, 200) || `file.${type.ext}`;
  try {
    const created = await AttachmentRow.create({
      organisationId: auth.organisationId,
      ingredientId: ingredient.id,
      uploadedById: auth.userId,
      storedName,
      originalName,
      mimeType: type.mime,
      sizeBytes: file.buffer.length,
    });
    return toDto(await created.reload({ include: [{ model: User, as: 'uploadedBy', attributes: ['name'] }] }));
  } catch (error) {
    await fs.promises.rm(path.join(config.uploadsDir, storedName), { force: true });
    throw error;
  }
}

export async function listAttachments(auth: AuthContext, ingredientId: number): Promise<AttachmentDto[]> {
  const ingredient = await visibleIngredient(auth, ingredientId);
  const rows = await AttachmentRow.findAll({
    where: { ingredientId: ingredient.id, organisationId: auth.organisationId },
    include: [{ model: User, as: 'uploadedBy', attributes: ['name'] }],
    order: [['id', 'DESC']],
  });
  return rows.map(toDto);
}

/** The file for a member of the brewery that owns it; anyone else is told it does not exist. */
export async function attachmentFile(auth: AuthContext, id: number): Promise<{ path: string; mimeType: string; name: string }> {
  const attachment = await AttachmentRow.findOne({ where: { id, organisationId: auth.organisationId } });
  if (!attachment) throw notFound('No such file.');
  return { path: path.join(config.uploadsDir, attachment.storedName), mimeType: attachment.mimeType, name: attachment.originalName };
}
