import { z } from 'zod';
import { cursorQuery, isoDateTime, page, patternId, queryInt, serialDigits, serialText, starRunSize, uuid } from './common';

export const MAX_SCAN_BATCH = 1000;

export const entryMethod = z.enum(['keypad', 'camera'], { message: 'must be keypad or camera' });
export type EntryMethod = z.infer<typeof entryMethod>;

/**
 * One logged note as the device sends it. Only these fields are read: any patterns or score the client
 * adds are ignored, because the server reads the serial again with the engine.
 */
export const scanInput = z.object({
  /** Made on the device (a v4 uuid), so a retried upload never stores the note twice. */
  id: uuid,
  huntId: uuid,
  strap: z.number({ message: 'must be a whole number' }).int('must be a whole number').min(1, 'must be at least 1').max(1000, 'must be at most 1000'),
  serial: serialText,
  star: z.boolean().optional(),
  pulled: z.boolean().optional(),
  scannedAt: isoDateTime,
  /** Typed on the keypad (the default) or read by the camera. */
  entryMethod: entryMethod.optional(),
  /** The camera's confidence in the whole serial, 0–1; only for camera notes. */
  cameraConfidence: z.number({ message: 'must be a number from 0 to 1' }).min(0, 'must be 0 or more').max(1, 'must be 1 or less').optional(),
  /** For a star note: the size of its printing run, as the hunter looked it up. */
  starRunSize: starRunSize.optional(),
});
export type ScanInput = z.infer<typeof scanInput>;

export const scanBatchRequest = z.object({
  scans: z.array(scanInput).min(1, 'must hold at least one note').max(MAX_SCAN_BATCH, 'must hold at most 1,000 notes'),
});
export type ScanBatchRequest = z.infer<typeof scanBatchRequest>;

/**
 * What the server parses first: the envelope and each scan's id. A scan with a good id but other
 * problems comes back in `rejected` instead of failing the whole batch, so one bad note never blocks a
 * device's queue.
 */
export const scanBatchEnvelope = z.object({
  scans: z
    .array(z.object({ id: uuid }).passthrough())
    .min(1, 'must hold at least one note')
    .max(MAX_SCAN_BATCH, 'must hold at most 1,000 notes'),
});

export const rejectedScan = z.object({
  id: uuid,
  /** invalid | unreadable-serial | hunt-not-found | hunt-closed */
  code: z.string(),
  /** A sentence for the hunter. */
  error: z.string(),
});
export type RejectedScan = z.infer<typeof rejectedScan>;

/** Every id sent appears in exactly one list. `duplicates` were already stored (or deleted): drop them from the queue. */
export const scanBatchResponse = z.object({
  stored: z.array(uuid),
  duplicates: z.array(uuid),
  rejected: z.array(rejectedScan),
});
export type ScanBatchResponse = z.infer<typeof scanBatchResponse>;

/** A stored note with the server's own reading: patterns, points and keep as scored for whoever logged it. */
export const scanView = z.object({
  id: uuid,
  huntId: uuid,
  strap: z.number().int(),
  serial: z.string(),
  digits: serialDigits,
  prefix: z.string(),
  suffix: z.string(),
  star: z.boolean(),
  district: z.string().nullable(),
  pulled: z.boolean(),
  patterns: z.array(patternId),
  points: z.number(),
  keep: z.boolean(),
  scannedAt: isoDateTime,
  entryMethod,
  cameraConfidence: z.number().nullable(),
  starRunSize: z.number().int().nullable(),
  loggedBy: z.object({ id: uuid, displayName: z.string() }),
});
export type ScanView = z.infer<typeof scanView>;

export const scanListQuery = cursorQuery.extend({ strap: queryInt(1, 1000).optional() });
export type ScanListQuery = z.infer<typeof scanListQuery>;

/** Newest first. */
export const scanPage = page(scanView);
export type ScanPage = z.infer<typeof scanPage>;
