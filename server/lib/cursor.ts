import { z } from 'zod';
import { HttpError } from './errors';

/**
 * Keyset cursors: the sort values of the last row sent, as base64url JSON. Opaque to the client;
 * the server checks the shape again because a cursor is user input like any other.
 */
export function encodeCursor(values: readonly (string | number)[]): string {
  return Buffer.from(JSON.stringify(values), 'utf8').toString('base64url');
}

export function decodeCursor<T extends z.ZodTypeAny>(cursor: string | undefined, shape: T): z.infer<T> | null {
  if (cursor === undefined || cursor === '') return null;
  let decoded: unknown;
  try {
    decoded = JSON.parse(Buffer.from(cursor, 'base64url').toString('utf8'));
  } catch {
    decoded = undefined;
  }
  const parsed = shape.safeParse(decoded);
  if (!parsed.success) throw new HttpError(400, 'invalid', 'Some fields need attention', { cursor: 'is not a cursor from this list' });
  return parsed.data;
}

export const timeIdCursor = z.tuple([z.string().datetime({ offset: true }), z.string().uuid()]);
