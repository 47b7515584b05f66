import { z } from 'zod';

export const uuid = z.string().uuid('must be an id');
export const isoDateTime = z.string().datetime({ offset: true, message: 'must be an ISO date and time' });

export const errorBody = z.object({
  error: z.object({
    code: z.string(),
    message: z.string(),
    fields: z.record(z.string(), z.string()).optional(),
  }),
});
export type ErrorBody = z.infer<typeof errorBody>;

export const idParams = z.object({ id: uuid });

/** Keyset pages: the server hands back an opaque cursor; null means the last page. */
export function page<T extends z.ZodTypeAny>(item: T) {
  return z.object({ items: z.array(item), nextCursor: z.string().nullable() });
}

export const cursorQuery = z.object({
  cursor: z.string().max(200).optional(),
  limit: z.coerce.number().int().min(1).max(200).default(50),
});

export const healthResponse = z.object({ ok: z.boolean(), db: z.enum(['up', 'down']), version: z.string() });

/** Face values of the small notes hunters buy in straps, in whole dollars. */
export const DENOMINATIONS = [1, 2, 5, 10, 20, 50, 100] as const;
export const denomination = z
  .number({ message: 'must be a face value in dollars' })
  .int('must be a face value in dollars')
  .refine((value) => (DENOMINATIONS as readonly number[]).includes(value), 'must be 1, 2, 5, 10, 20, 50 or 100');

/** Ids of the engine's patterns, in the engine's canonical order (PATTERN_IDS). */
export const PATTERN_ID_LIST = [
  'solid',
  'ladder',
  'radar',
  'repeater',
  'super-repeater',
  'rotator',
  'binary',
  'trinary',
  'low',
  'high',
] as const;
export const patternId = z.enum(PATTERN_ID_LIST);

/** Whole numbers in a query string arrive as text. */
export const queryInt = (min: number, max: number) =>
  z.coerce.number({ message: 'must be a whole number' }).int('must be a whole number').min(min, `must be at least ${min}`).max(max, `must be at most ${max}`);

/** 8 digits of a serial, leading zeros kept. */
export const serialDigits = z.string().regex(/^\d{8}$/);

/** A serial as a hunter types or pastes it; the engine decides whether it is one. */
export const serialText = z.string().trim().min(1, 'is required').max(40, 'must be at most 40 characters');

/** Series as printed on a note: a year, optionally with a letter (2013, 1988A). */
export const seriesField = z
  .string()
  .trim()
  .toUpperCase()
  .regex(/^\d{4}[A-Z]?$/, 'must be a series like 2013 or 1988A');

/** A Federal Reserve district letter, A–L. */
export const districtField = z
  .string()
  .trim()
  .toUpperCase()
  .regex(/^[A-L]$/, 'must be a district letter A–L');

/**
 * The size of a star note's printing run, as the hunter looked it up in a published run list; the app
 * ships no run data. The largest runs are 3,200,000 or 6,400,000 notes (common practice among hunters).
 */
export const starRunSize = z
  .number({ message: 'must be a whole number of notes' })
  .int('must be a whole number of notes')
  .min(1, 'must be at least 1')
  .max(100_000_000, 'must be at most 100,000,000');
