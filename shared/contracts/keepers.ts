import { z } from 'zod';
import { cursorQuery, denomination, isoDateTime, page, patternId, serialDigits, serialText, starRunSize, uuid, districtField, seriesField } from './common';
import { photoView } from './photos';
import { readingSchema } from './reading';

export const keeperStatus = z.enum(['kept', 'traded', 'sold', 'spent']);
export type KeeperStatus = z.infer<typeof keeperStatus>;

export const facility = z.enum(['DC', 'FW'], { message: 'must be DC (Washington) or FW (Fort Worth)' });

/** Fields a hunter fills in for a kept note; all optional, null clears one. */
const keeperFields = {
  /** Series as printed: a year, optionally with a letter (2013, 1988A). */
  series: seriesField.nullable().optional(),
  district: districtField.nullable().optional(),
  facility: facility.nullable().optional(),
  star: z.boolean().optional(),
  denomination: denomination.nullable().optional(),
  /** The 1–70 grading scale. */
  grade: z.number({ message: 'must be a whole number 1–70' }).int('must be a whole number 1–70').min(1, 'must be 1–70').max(70, 'must be 1–70').nullable().optional(),
  /** The hunter's own estimate, in cents. */
  estimatedValueCents: z
    .number({ message: 'must be a whole number of cents' })
    .int('must be a whole number of cents')
    .min(0, 'must be 0 or more')
    .max(1_000_000_000, 'must be at most 1,000,000,000 cents')
    .nullable()
    .optional(),
  /** The hunter's own judgement: never pressed, washed or repaired. */
  originalPaper: z.boolean().nullable().optional(),
  /** For a star note: the size of its printing run, as the hunter looked it up. */
  starRunSize: starRunSize.nullable().optional(),
  status: keeperStatus.optional(),
  notes: z.string().max(2000, 'must be at most 2,000 characters').nullable().optional(),
  /** When the note was found; from the scan, else now. */
  foundAt: isoDateTime.optional(),
};

/** From a logged note (`scanId`) or typed in (`serial`): exactly one of the two. */
export const createKeeperRequest = z
  .object({ scanId: uuid.optional(), serial: serialText.optional(), ...keeperFields })
  .strict()
  .superRefine((body, ctx) => {
    if (body.scanId && body.serial) ctx.addIssue({ code: 'custom', path: ['serial'], message: 'give a serial or a scanId, not both' });
    if (!body.scanId && !body.serial) ctx.addIssue({ code: 'custom', path: ['serial'], message: 'is required unless a scanId is given' });
  });
export type CreateKeeperRequest = z.infer<typeof createKeeperRequest>;

export const updateKeeperRequest = z
  .object({ serial: serialText.optional(), ...keeperFields })
  .strict()
  .refine((body) => Object.keys(body).length > 0, { message: 'name at least one field to change', path: ['_'] });
export type UpdateKeeperRequest = z.infer<typeof updateKeeperRequest>;

/** `patterns` and `points` as scored with the owner's active table when the keeper was last saved. */
export const keeperSummary = z.object({
  id: uuid,
  serial: z.string(),
  digits: serialDigits,
  prefix: z.string(),
  suffix: z.string(),
  star: z.boolean(),
  series: z.string().nullable(),
  district: z.string().nullable(),
  facility: facility.nullable(),
  denomination: z.number().int().nullable(),
  grade: z.number().int().nullable(),
  originalPaper: z.boolean().nullable(),
  starRunSize: z.number().int().nullable(),
  estimatedValueCents: z.number().int().nullable(),
  status: keeperStatus,
  notes: z.string().nullable(),
  patterns: z.array(patternId),
  points: z.number(),
  huntId: uuid.nullable(),
  scanId: uuid.nullable(),
  foundAt: isoDateTime,
  createdAt: isoDateTime,
  updatedAt: isoDateTime,
  /** API path of a small picture for lists: the front photo's thumbnail, else the back's; null without photos. */
  thumbUrl: z.string().nullable(),
});
export type KeeperSummary = z.infer<typeof keeperSummary>;

/** The keeper page: the summary plus a fresh reading (patterns, odds, near misses, score, trade notes) and its photos. */
export const keeperDetail = keeperSummary.extend({ reading: readingSchema, photos: z.array(photoView) });
export type KeeperDetail = z.infer<typeof keeperDetail>;

export const keeperSort = z.enum(['newest', 'oldest', 'points', 'value', 'grade', 'serial']);
export type KeeperSort = z.infer<typeof keeperSort>;

export const keeperListQuery = cursorQuery.extend({
  /** Matches serial (digits or as typed), series, district and notes. */
  // PostgreSQL refuses text holding NUL, so it is refused here with a 400 rather than failing there.
  query: z.string().trim().max(100, 'must be at most 100 characters').refine((text) => !text.includes('\u0000'), 'must not contain a NUL character').optional(),
  sort: keeperSort.default('newest'),
  status: keeperStatus.optional(),
});
export type KeeperListQuery = z.infer<typeof keeperListQuery>;

export const keeperList = page(keeperSummary);
export type KeeperList = z.infer<typeof keeperList>;
