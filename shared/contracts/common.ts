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
