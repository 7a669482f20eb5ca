import crypto from 'node:crypto';
import path from 'node:path';
import type { Readable } from 'node:stream';

import type { Transaction } from 'sequelize';

import type { Attachment } from '@/lib/api/types';
import { config } from '@/server/config';
import { Attachment as AttachmentRow, transaction, User } from '@/server/db';
import { badRequest, forbidden, HttpError, notFound } from '@/server/errors';
import { logger } from '@/server/logger';

import { visibleIngredient } from './ingredients';
import { deleteObject, getObject, listObjects, putObject, STORED_NAME } from './object-store';
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

export const toAttachmentDto = (a: AttachmentRow & { uploadedBy?: User | null }): AttachmentDto => ({
  id: a.id,
  name: a.originalName,
  mimeType: a.mimeType,
  sizeBytes: a.sizeBytes,
  uploadedBy: a.uploadedBy?.name ?? null,
  createdAt: a.createdAt.toISOString(),
  url: `/api/attachments/${a.id}`,
});

/** Keeps a spec sheet or label photo of a house ingredient, checked by content, under a generated name. */
export async function addAttachment(
  auth: AuthContext,
  ingredientId: number,
  file: { buffer: Buffer; originalname: string } | undefined,
): Promise<AttachmentDto> {
  const ingredient = await visibleIngredient(auth, ingredientId);
  if (ingredient.organisationId === null) throw forbidden('Files can be attached to house ingredients only.');
  return storeFile(auth, { ingredientId: ingredient.id }, file);
}

/**
 * Keeps a file for what it belongs to (a house ingredient, or a batch's ABV reading): checked by its content, stored
 * under a generated name, counted against the brewery's quota in the same write transaction as its row.
 */
export async function storeFile(
  auth: AuthContext,
  owner: { ingredientId?: number; batchReadingId?: number },
  file: { buffer: Buffer; originalname: string } | undefined,
): Promise<AttachmentDto> {
  if (!file) throw badRequest('Choose a file to attach.', { file: 'Choose a file to attach.' });
  const type = sniffFileType(file.buffer);
  if (!type)
    throw badRequest('Attach a PDF, JPEG or PNG file.', {
      file: 'This file is not a PDF, JPEG or PNG (checked by its content, not its name).',
    });
  const storedName = `${crypto.randomBytes(16).toString('hex')}.${type.ext}`;
  const originalName =
    path
      .basename(file.originalname)
      .replace(/[^\w .()-]+/g, '_')
      .slice(0, 200) || `file.${type.ext}`;
  const usedBy = (t?: Transaction) =>
    AttachmentRow.sum('sizeBytes', { where: { organisationId: auth.organisationId }, transaction: t }).then(
      (n) => n ?? 0,
    );
  // A first look without the write lock refuses a full store before any bytes are sent to it.
  const usedBefore = await usedBy();
  if (usedBefore + file.buffer.length > config.uploadQuotaBytes) throw quotaFull(usedBefore);
  // The file is stored before the write transaction, so the lock every instance shares is not held during the
  // transfer; a crash between the two leaves a file without a row, which removeOrphanUploads takes away.
  await putObject(storedName, file.buffer, type.mime);
  try {
    // The quota is checked again and the row written in one write transaction, so two uploads at once cannot both pass.
    const created = await transaction(async (t) => {
      const used = await usedBy(t);
      if (used + file.buffer.length > config.uploadQuotaBytes) throw quotaFull(used);
      return AttachmentRow.create(
        {
          organisationId: auth.organisationId,
          ingredientId: owner.ingredientId ?? null,
          batchReadingId: owner.batchReadingId ?? null,
          uploadedById: auth.userId,
          storedName,
          originalName,
          mimeType: type.mime,
          sizeBytes: file.buffer.length,
        },
        { transaction: t },
      );
    });
    return toAttachmentDto(
      await created.reload({ include: [{ model: User, as: 'uploadedBy', attributes: ['name'] }] }),
    );
  } catch (error) {
    await deleteObject(storedName).catch(() => undefined);
    throw error;
  }
}

const megabytes = (bytes: number) => `${(bytes / 1024 / 1024).toFixed(1)} MB`;

function quotaFull(usedBytes: number): HttpError {
  return new HttpError(
    413,
    'quota_full',
    `Your brewery's file storage is full: ${megabytes(usedBytes)} of ${megabytes(config.uploadQuotaBytes)} used. Delete files you no longer need, or ask whoever runs the server to raise UPLOAD_QUOTA_MB.`,
    { file: 'No room left for this file.' },
  );
}

/** Turns an error of the multipart reader into the sender's error: 413 past a limit, 400 otherwise, naming the file. */
export function uploadError(error: unknown): HttpError {
  if (error instanceof HttpError) return error;
  const code = (error as { code?: string }).code;
  if (code === 'LIMIT_FILE_SIZE')
    return new HttpError(413, 'too_large', `The file is too large: at most ${megabytes(config.uploadMaxBytes)}.`, {
      file: 'This file is too large.',
    });
  if (code?.startsWith('LIMIT_'))
    return new HttpError(413, 'too_large', 'Send one file, in the field "file", with no other large fields.', {
      file: 'Too many or too large parts.',
    });
  return new HttpError(
    400,
    'invalid_upload',
    'The upload could not be read (it may have been cut off). Send one file, in the field "file".',
    { file: 'Send one file.' },
  );
}

/** Deletes an attached file of the brewery: its row and the file itself. */
export async function deleteAttachment(auth: AuthContext, id: number): Promise<void> {
  const storedName = await transaction(async (t) => {
    const attachment = await AttachmentRow.findOne({
      where: { id, organisationId: auth.organisationId },
      transaction: t,
    });
    if (!attachment) throw notFound('No such file.');
    if (attachment.batchReadingId !== null) {
      throw new HttpError(
        409,
        'record_kept',
        'A lab report is part of the batch record and is kept. Record a correction instead.',
      );
    }
    await attachment.destroy({ transaction: t });
    return attachment.storedName;
  });
  await deleteObject(storedName);
}

/** A stored file younger than this may belong to an upload still being written (on any instance): left alone. */
const ORPHAN_AGE_MS = 60 * 60_000;

/**
 * Removes stored files that no row points at (left by a crash between storing the file and committing its row).
 * Run at start; several instances may share the store, so only files older than an hour count. Answers how many it
 * removed.
 */
export async function removeOrphanUploads(now = Date.now()): Promise<number> {
  const known = new Set((await AttachmentRow.findAll({ attributes: ['storedName'] })).map((a) => a.storedName));
  const orphans: string[] = [];
  for await (const object of listObjects()) {
    const age = object.lastModified ? now - object.lastModified.getTime() : Infinity;
    if (STORED_NAME.test(object.key) && !known.has(object.key) && age > ORPHAN_AGE_MS) orphans.push(object.key);
  }
  for (const key of orphans) await deleteObject(key);
  if (orphans.length > 0) logger.info({ removed: orphans.length }, 'uploads without a record removed');
  return orphans.length;
}

export async function listAttachments(auth: AuthContext, ingredientId: number): Promise<AttachmentDto[]> {
  const ingredient = await visibleIngredient(auth, ingredientId);
  const rows = await AttachmentRow.findAll({
    where: { ingredientId: ingredient.id, organisationId: auth.organisationId },
    include: [{ model: User, as: 'uploadedBy', attributes: ['name'] }],
    order: [['id', 'DESC']],
  });
  return rows.map(toAttachmentDto);
}

/** The file for a member of the brewery that owns it; anyone else is told it does not exist. */
export async function attachmentFile(
  auth: AuthContext,
  id: number,
): Promise<{ body: Readable; mimeType: string; name: string; sizeBytes: number }> {
  const attachment = await AttachmentRow.findOne({ where: { id, organisationId: auth.organisationId } });
  if (!attachment) throw notFound('No such file.');
  const body = await getObject(attachment.storedName);
  if (!body) {
    logger.error({ attachment: attachment.id }, 'attached file missing from the object store');
    throw new HttpError(410, 'file_missing', 'This file’s record is kept but the file itself is missing from storage.');
  }
  return { body, mimeType: attachment.mimeType, name: attachment.originalName, sizeBytes: attachment.sizeBytes };
}
