import { nestedFieldErrors, type FieldErrors } from '../../shared/contracts/field-errors';
import type { ErrorRequestHandler, RequestHandler } from 'express';
import { ZodError } from 'zod';
import { logger, scrubUrl } from './logger';

export type { FieldErrors };

/** An error the caller can act on; everything else is answered as a 500 and logged. */
export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields?: FieldErrors,
    /** Seconds a client should wait before trying again; sent as Retry-After with every 429. */
    readonly retryAfterSeconds?: number,
  ) {
    super(message);
  }
}

export const notFound = (what = 'Not found') => new HttpError(404, 'not_found', what);
export const forbidden = (what = 'You may not do that') => new HttpError(403, 'forbidden', what);
export const unauthorized = (what = 'Sign in to continue') => new HttpError(401, 'unauthorized', what);
export const conflict = (what: string) => new HttpError(409, 'conflict', what);

// The API answers with each field's full path, so a bad row in a batch is named exactly.
export const fieldsFromZod = nestedFieldErrors;

export function invalid(error: ZodError, message = 'Some fields need attention'): HttpError {
  return new HttpError(400, 'invalid', message, fieldsFromZod(error));
}

export const apiNotFound: RequestHandler = (req, _res, next) => {
  next(new HttpError(404, 'not_found', `No API route for ${req.method} ${req.originalUrl.split('?')[0]}`));
};

interface BodyParserError extends Error {
  type?: string;
  status?: number;
}

export const errorHandler: ErrorRequestHandler = (err, req, res, _next) => {
  const failure = err as BodyParserError;
  if (err instanceof HttpError) {
    if (err.status === 429) res.setHeader('Retry-After', String(err.retryAfterSeconds ?? 60));
    res.status(err.status).json({ error: { code: err.code, message: err.message, ...(err.fields ? { fields: err.fields } : {}) } });
    return;
  }
  if (err instanceof ZodError) {
    res.status(400).json({ error: { code: 'invalid', message: 'Some fields need attention', fields: fieldsFromZod(err) } });
    return;
  }
  // Errors raised by express.json() and friends carry a client status: bad JSON, too large, wrong charset.
  if (typeof failure.status === 'number' && failure.status >= 400 && failure.status < 500) {
    const code = failure.type === 'entity.too.large' ? 'too_large' : failure.status === 404 ? 'not_found' : 'bad_request';
    const message =
      failure.type === 'entity.parse.failed'
        ? 'The request body is not valid JSON'
        : failure.type === 'entity.too.large'
          ? 'The request body is too large'
          : failure.message;
    res.status(failure.status).json({ error: { code, message } });
    return;
  }
  logger.error({ err, method: req.method, url: scrubUrl(req.originalUrl) }, 'unhandled error');
  res.status(500).json({ error: { code: 'internal', message: 'Something went wrong on our side; nothing you sent was lost' } });
};
