import type { RequestHandler } from 'express';
import multer from 'multer';
import { HttpError } from './errors';

/**
 * One file from a multipart form, held in memory (photos and logs are small), with the limit enforced
 * while the body streams in: a larger file is cut off and answered 413 instead of being read to the end.
 */
export function uploadOne(field: string, maxBytes: number, what: string): RequestHandler {
  const handler = multer({
    storage: multer.memoryStorage(),
    limits: { fileSize: maxBytes, files: 1, fields: 10, fieldSize: 10_000, parts: 12 },
  }).single(field);
  const megabytes = Math.round(maxBytes / (1024 * 1024));
  return (req, res, next) => {
    handler(req, res, (error: unknown) => {
      if (!error) {
        next();
        return;
      }
      if (error instanceof multer.MulterError) {
        if (error.code === 'LIMIT_FILE_SIZE') {
          next(new HttpError(413, 'too_large', `${what} must be at most ${megabytes} MB`, { [field]: `must be at most ${megabytes} MB` }));
          return;
        }
        const reason = error.code === 'LIMIT_UNEXPECTED_FILE' ? `send one file in the "${field}" field` : error.message;
        next(new HttpError(400, 'invalid', 'The upload could not be read', { [error.field ?? field]: reason }));
        return;
      }
      // A malformed multipart body (busboy's own errors) is the caller's mistake, not ours.
      next(new HttpError(400, 'invalid', 'The upload could not be read', { [field]: (error as Error).message ?? 'is malformed' }));
    });
  };
}
