import { mkdirSync } from 'node:fs';
import { rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { randomUUID } from 'node:crypto';
import type { RequestHandler } from 'express';
import multer from 'multer';
import { HttpError } from '../../../lib/errors';

/**
 * The uploaded archive goes to a temporary file, never into memory: a restore reads it from disk several
 * times (check, records, photos), and an account with years of photos is far larger than one request
 * should hold. The size limit is enforced while the body streams in.
 */
export function archiveUpload(field: string, maxBytes: number): RequestHandler {
  const folder = join(tmpdir(), 'strapsift-archives');
  mkdirSync(folder, { recursive: true });
  const handler = multer({
    storage: multer.diskStorage({ destination: folder, filename: (_req, _file, done) => done(null, `${randomUUID()}.zip`) }),
    limits: { fileSize: maxBytes, files: 1, fields: 5, fieldSize: 1000, parts: 6 },
  }).single(field);
  const megabytes = Math.round(maxBytes / (1024 * 1024));
  return (req, res, next) => {
    res.on('close', () => {
      if (req.file?.path) void rm(req.file.path, { force: true });
    });
    handler(req, res, (error: unknown) => {
      if (!error) return next();
      if (error instanceof multer.MulterError && error.code === 'LIMIT_FILE_SIZE') {
        return next(new HttpError(413, 'too_large', `An archive must be at most ${megabytes} MB`, { [field]: `must be at most ${megabytes} MB` }));
      }
      const reason = error instanceof multer.MulterError && error.code === 'LIMIT_UNEXPECTED_FILE' ? `send one file in the "${field}" field` : 'is malformed';
      next(new HttpError(400, 'invalid', 'The upload could not be read', { [field]: reason }));
    });
  };
}
