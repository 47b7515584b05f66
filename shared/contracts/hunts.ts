import { z } from 'zod';
import { cursorQuery, denomination, isoDateTime, page, patternId, serialDigits, seriesField, uuid } from './common';
import { memberRole } from './crew';

export const huntStatus = z.enum(['open', 'closed']);
export type HuntStatus = z.infer<typeof huntStatus>;

const title = z.string().trim().min(1, 'is required').max(120, 'must be at most 120 characters');
// Optional, so a first hunt is one tap away; the client remembers the last one given.
const source = z.string().trim().max(120, 'must be at most 120 characters');
const plannedStraps = z
  .number({ message: 'must be a whole number' })
  .int('must be a whole number')
  .min(1, 'must be at least 1')
  .max(400, 'must be at most 400');

export const createHuntRequest = z
  .object({
    title,
    /** Where the notes came from, e.g. a branch of the hunter's bank; empty when not given. */
    source: source.default(''),
    denomination,
    plannedStraps,
    /** Defaults to now; set it when logging a hunt after the fact. */
    startedAt: isoDateTime.optional(),
    /** New notes in serial order rather than circulated ones (defaults to circulated). */
    inSequence: z.boolean().optional(),
    /** The series printed on the notes, when known. */
    series: seriesField.nullable().optional(),
  })
  .strict();
export type CreateHuntRequest = z.infer<typeof createHuntRequest>;

export const updateHuntRequest = z
  .object({
    title: title.optional(),
    source: source.optional(),
    denomination: denomination.optional(),
    plannedStraps: plannedStraps.optional(),
    startedAt: isoDateTime.optional(),
    inSequence: z.boolean().optional(),
    series: seriesField.nullable().optional(),
  })
  .strict()
  .refine((body) => Object.keys(body).length > 0, { message: 'name at least one field to change', path: ['_'] });
export type UpdateHuntRequest = z.infer<typeof updateHuntRequest>;

/** The note with the most points in a hunt (points as scored for whoever logged it). */
export const bestFind = z.object({
  scanId: uuid,
  serial: z.string(),
  digits: serialDigits,
  patterns: z.array(patternId),
  points: z.number(),
});
export type BestFind = z.infer<typeof bestFind>;

/**
 * One hunt as lists and the hunt page show it. `hits` counts notes with at least one pattern
 * (low judged against the caller's active low limit); `keeps` counts notes whose score reached the
 * keep threshold when they were logged; `strapCount` counts straps with at least one note logged.
 */
export const huntSummary = z.object({
  id: uuid,
  title: z.string(),
  source: z.string(),
  denomination: z.number().int(),
  plannedStraps: z.number().int(),
  inSequence: z.boolean(),
  series: z.string().nullable(),
  status: huntStatus,
  /** The caller's place in the hunt. */
  role: memberRole,
  owner: z.object({ id: uuid, displayName: z.string() }),
  memberCount: z.number().int(),
  startedAt: isoDateTime,
  closedAt: isoDateTime.nullable(),
  lastScanAt: isoDateTime.nullable(),
  notesSearched: z.number().int(),
  hits: z.number().int(),
  keeps: z.number().int(),
  pulled: z.number().int(),
  strapCount: z.number().int(),
  bestFind: bestFind.nullable(),
});
export type HuntSummary = z.infer<typeof huntSummary>;

/** The hunt page: the same figures as the list, for one hunt. */
export const huntDetail = huntSummary;
export type HuntDetail = z.infer<typeof huntDetail>;

export const huntListQuery = cursorQuery.extend({ status: huntStatus.optional() });
export type HuntListQuery = z.infer<typeof huntListQuery>;

/** Newest first (by startedAt). */
export const huntList = page(huntSummary);
export type HuntList = z.infer<typeof huntList>;
