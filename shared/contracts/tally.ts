import { z } from 'zod';
import { isoDateTime, patternId, uuid } from './common';

export const tallyPatternRow = z.object({
  id: patternId,
  name: z.string(),
  hits: z.number().int(),
  perThousand: z.number(),
  /** Chance that one random serial has the pattern (the engine's exact count ÷ domain). */
  probability: z.number(),
  expected: z.number(),
  /** P(X ≥ hits): Poisson for circulated notes, the exact run distribution for notes in sequence. */
  pAtLeast: z.number(),
  /** P(X ≤ hits), the same way. */
  pAtMost: z.number(),
  /** At the 95% level; `no-comparison` where no count on that side could be unusual. */
  verdict: z.enum(['more', 'fewer', 'as-chance', 'no-comparison']),
});
export type TallyPatternRow = z.infer<typeof tallyPatternRow>;

/**
 * Hits set against chance. `hits` counts notes with at least one pattern; `low` is judged against the
 * caller's active low limit, the same one the expected figures use.
 */
export const tallyFigures = z.object({
  notes: z.number().int(),
  hits: z.number().int(),
  keeps: z.number().int(),
  pulled: z.number().int(),
  /** How the notes came in: typed on the keypad or read by the camera. */
  entered: z.object({ keypad: z.number().int(), camera: z.number().int() }),
  perThousand: z.number(),
  lowLimit: z.number().int(),
  patterns: z.array(tallyPatternRow),
  /** What the figures compare against: `poisson` (circulated), `sequence` (new notes in sequence), `mixed`. */
  basis: z.enum(['poisson', 'sequence', 'mixed']),
  caveat: z.string(),
});

export const huntTally = tallyFigures.extend({ huntId: uuid });
export type HuntTally = z.infer<typeof huntTally>;

/** `from` and `to`: an ISO date (whole UTC day) or date and time; both optional and inclusive. */
const dateOrDateTime = z.union([z.iso.date(), isoDateTime], { message: 'must be an ISO date (2026-03-01) or date and time' });
export const tallyQuery = z
  .object({
    from: dateOrDateTime.optional(),
    to: dateOrDateTime.optional(),
    bucket: z.enum(['day', 'week', 'month']).default('week'),
  });
export type TallyQuery = z.infer<typeof tallyQuery>;

export const tallyBucket = z.object({
  /** Start of the day, week (Monday) or month, UTC. */
  start: isoDateTime,
  notes: z.number().int(),
  hits: z.number().int(),
  perThousand: z.number(),
});

export const tallyHuntRow = z.object({
  huntId: uuid,
  title: z.string(),
  startedAt: isoDateTime,
  notes: z.number().int(),
  hits: z.number().int(),
  perThousand: z.number(),
});

/** Every hunt the caller belongs to, over the period, with series for charts over hunts and over time. */
export const periodTally = tallyFigures.extend({
  from: isoDateTime.nullable(),
  to: isoDateTime.nullable(),
  bucket: z.enum(['day', 'week', 'month']),
  byHunt: z.array(tallyHuntRow),
  overTime: z.array(tallyBucket),
});
export type PeriodTally = z.infer<typeof periodTally>;
