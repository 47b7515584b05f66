import { z } from 'zod';
import { isoDateTime, uuid } from './common';
import { watchPatternSchema } from './reading';

/** Text in the engine's watch syntax (WATCH_SYNTAX): a mask 0704????, a range 1000-2000 or date:2024-07-04. */
export const createWatchRequest = z
  .object({
    pattern: z.string().trim().min(1, 'is required').max(64, 'must be at most 64 characters'),
    label: z.string().trim().max(60, 'must be at most 60 characters').nullable().optional(),
  })
  .strict();
export type CreateWatchRequest = z.infer<typeof createWatchRequest>;

export const watchView = z.object({
  id: uuid,
  /** Canonical text (the engine's watchText), what the pattern was saved as. */
  text: z.string(),
  label: z.string().nullable(),
  pattern: watchPatternSchema,
  createdAt: isoDateTime,
});
export type WatchView = z.infer<typeof watchView>;

export const watchList = z.object({ items: z.array(watchView), syntax: z.string() });
export type WatchList = z.infer<typeof watchList>;
