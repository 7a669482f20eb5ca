import type { RequestHandler } from 'express';
import multer from 'multer';

import { config } from '@/server/config';
import * as attachments from '@/server/services/attachments';

/**
 * One file in the field "file" and nothing much else: every part, field and header is bounded, so a request of
 * hundreds of large text fields is refused before it fills memory.
 */
const upload = multer({
  storage: multer.memoryStorage(),
  limits: {
    fileSize: config.uploadMaxBytes,
    files: 1,
    fields: 5,
    fieldSize: 8 * 1024,
    fieldNameSize: 100,
    parts: 6,
    headerPairs: 50,
  },
});

/** Multer's and busboy's errors (limits, a truncated body, no boundary) are the sender's: never a 500. */
export const receiveFile: RequestHandler = (req, res, next) => {
  upload.single('file')(req, res, (error: unknown) => next(error ? attachments.uploadError(error) : undefined));
};
