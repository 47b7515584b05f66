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
  if (!parsed.success) throw badCursor();
  return parsed.data;
}

export const badCursor = () => new HttpError(400, 'invalid', 'Some fields need attention', { cursor: 'is not a cursor from this list' });

/**
 * A sort value from a cursor must be of the sort's own kind before it is cast in SQL: a word where a time
 * is expected would otherwise fail in PostgreSQL as a 500.
 */
export function assertCursorKind(value: string | number, kind: 'time' | 'number' | 'text'): void {
  const fits =
    kind === 'time' ? typeof value === 'string' && cursorTime.safeParse(value).success : kind === 'number' ? typeof value === 'number' : typeof value === 'string';
  if (!fits) throw badCursor();
}

// Years PostgreSQL can take as a timestamptz literal (year 0000 is not one): a forged cursor gets a 400, not a 500.
const cursorTime = z
  .string()
  .datetime({ offset: true })
  .refine((value) => /^\d{4}-/.test(value) && !value.startsWith('0000') && Number.isFinite(Date.parse(value)), 'is not a time');

export const timeIdCursor = z.tuple([cursorTime, z.string().uuid()]);

/**
 * The keyset condition for rows after a cursor, e.g. `(h.started_at, h.id) < ($2::timestamptz, $3::uuid)`,
 * with the cursor's values pushed onto the query's parameters. `casts` gives each value's SQL type.
 *
 * @example
 * afterCursor(params, ['s.scanned_at', 's.id'], ['timestamptz', 'uuid'], after, 'DESC')
 */
export function afterCursor(params: unknown[], columns: readonly string[], casts: readonly string[], values: readonly unknown[], direction: 'ASC' | 'DESC'): string {
  const placeholders = values.map((value, i) => {
    params.push(value);
    return `$${params.length}::${casts[i]}`;
  });
  return `(${columns.join(', ')}) ${direction === 'DESC' ? '<' : '>'} (${placeholders.join(', ')})`;
}

/**
 * A keyset query fetches one row more than the page: if it came, there is a next page, and its
 * cursor is the sort key of the page's last row (null when that key is missing).
 *
 * @example
 * keysetPage(rows, 50, (last) => [last.started_at.toISOString(), last.id])
 */
export function keysetPage<R>(rows: readonly R[], limit: number, keyOf: (last: R) => readonly (string | number)[] | null): { page: R[]; nextCursor: string | null } {
  const page = rows.slice(0, limit);
  const last = page[page.length - 1];
  const key = rows.length > limit && last !== undefined ? keyOf(last) : null;
  return { page, nextCursor: key ? encodeCursor(key) : null };
}
