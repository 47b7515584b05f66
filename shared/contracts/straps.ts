import { z } from 'zod';
import { isoDateTime, queryInt, uuid } from './common';

export const strapParams = z.object({ id: uuid, n: queryInt(1, 1000) });

/**
 * What the hunter records for one strap. `swappedIn`: notes from their own cash put in for pulled ones.
 * `shortOver`: how far the strap was from 100 notes when it came from the bank (−1 one short, +1 one over).
 */
export const updateStrapRequest = z
  .object({
    swappedIn: z.number({ message: 'must be a whole number' }).int('must be a whole number').min(0, 'must be 0 or more').max(100, 'must be at most 100').optional(),
    shortOver: z.number({ message: 'must be a whole number' }).int('must be a whole number').min(-100, 'must be at least −100').max(100, 'must be at most 100').optional(),
    note: z.string().trim().max(200, 'must be at most 200 characters').nullable().optional(),
  })
  .strict()
  .refine((body) => Object.keys(body).length > 0, { message: 'name at least one field to change', path: ['_'] });
export type UpdateStrapRequest = z.infer<typeof updateStrapRequest>;

/**
 * One line of the strap sheet. `notesBack` = 100 + shortOver − pulled + swappedIn;
 * `complete` when that is exactly 100, the count the teller expects back.
 */
export const strapRow = z.object({
  number: z.number().int(),
  searched: z.number().int(),
  pulled: z.number().int(),
  swappedIn: z.number().int(),
  shortOver: z.number().int(),
  /** Notes in the strap as it came from the bank: 100 + shortOver. */
  received: z.number().int(),
  notesBack: z.number().int(),
  complete: z.boolean(),
  /** True once as many notes were logged as the strap held. */
  fullySearched: z.boolean(),
  note: z.string().nullable(),
  firstScanAt: isoDateTime.nullable(),
  lastScanAt: isoDateTime.nullable(),
});
export type StrapRow = z.infer<typeof strapRow>;

/** Straps 1…plannedStraps, plus any higher strap that has notes or an entry. */
export const strapSheet = z.object({
  huntId: uuid,
  title: z.string(),
  source: z.string(),
  denomination: z.number().int(),
  plannedStraps: z.number().int(),
  straps: z.array(strapRow),
  totals: z.object({
    searched: z.number().int(),
    pulled: z.number().int(),
    swappedIn: z.number().int(),
    notesBack: z.number().int(),
    completeStraps: z.number().int(),
    straps: z.number().int(),
  }),
});
export type StrapSheet = z.infer<typeof strapSheet>;
