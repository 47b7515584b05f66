import { z } from 'zod';
import { isoDateTime, serialText, uuid, districtField, seriesField } from './common';

/** The CSV files an export offers, one per kind of record; `GET /api/export/json` holds them all. */
export const exportKind = z.enum(['hunts', 'scans', 'keepers'], { message: 'must be hunts, scans or keepers' });
export type ExportKind = z.infer<typeof exportKind>;
export const exportCsvParams = z.object({ kind: exportKind });

/** Rows per import request: the client sends a large file in parts and shows progress between them. */
export const IMPORT_CHUNK_ROWS = 500;
/** Most rows one file may bring (a thousand straps of a hundred notes). */
export const MAX_IMPORT_ROWS = 100_000;

/** Columns an old log may have; only `serial` is required. */
export const IMPORT_FIELDS = ['serial', 'date', 'strap', 'series', 'district', 'star', 'pulled', 'note', 'entryMethod', 'cameraConfidence'] as const;
export const importField = z.enum(IMPORT_FIELDS);
export type ImportField = z.infer<typeof importField>;

const strap = z.number({ message: 'must be a whole number' }).int('must be a whole number').min(1, 'must be 1–1000').max(1000, 'must be 1–1000');

/**
 * One row of an old log after the column mapping, as the client sends it. `line` is the row's line in
 * the file (for messages); `occurrence` counts earlier rows of the same file with the same serial and
 * date, so a note logged twice in one file stays two notes while the same file imported again adds none.
 */
export const importRow = z
  .object({
    line: z.number().int().min(1),
    occurrence: z.number().int().min(0).max(MAX_IMPORT_ROWS).default(0),
    serial: serialText,
    date: isoDateTime.nullable().optional(),
    strap: strap.nullable().optional(),
    series: seriesField.nullable().optional(),
    district: districtField.nullable().optional(),
    star: z.boolean().nullable().optional(),
    pulled: z.boolean().nullable().optional(),
    note: z.string().max(2000, 'must be at most 2,000 characters').nullable().optional(),
    /** From Strapsift's own export: keypad or camera, and the camera's confidence (0–1). */
    entryMethod: z.enum(['keypad', 'camera'], { message: 'must be keypad or camera' }).nullable().optional(),
    cameraConfidence: z.number({ message: 'must be a number from 0 to 1' }).min(0, 'must be 0 or more').max(1, 'must be 1 or less').nullable().optional(),
  })
  .strict();
export type ImportRow = z.infer<typeof importRow>;

export const importRowsRequest = z
  .object({
    huntId: uuid,
    rows: z.array(importRow).min(1, 'must hold at least one row').max(IMPORT_CHUNK_ROWS, `must hold at most ${IMPORT_CHUNK_ROWS} rows`),
  })
  .strict();
export type ImportRowsRequest = z.infer<typeof importRowsRequest>;

/**
 * What one part of an import did. `duplicates` were already in Strapsift (an earlier import of the same
 * file, or the same note with the same time); `keepers` counts pulled notes added to the keeper log.
 */
export const importRowsResponse = z.object({
  stored: z.number().int(),
  duplicates: z.number().int(),
  keepers: z.number().int(),
  rejected: z.array(z.object({ line: z.number().int(), reason: z.string() })),
});
export type ImportRowsResponse = z.infer<typeof importRowsResponse>;
