import { z } from 'zod';
import { denomination, isoDateTime, patternId, serialText, starRunSize as starRun, uuid, districtField, seriesField } from './common';
import { huntStatus } from './hunts';
import { facility, keeperStatus } from './keepers';
import { PHOTO_MAX_BYTES, photoContentType, photoSide } from './photos';
import { entryMethod } from './scans';
import { weightTableValues } from './weights';

/**
 * The full export archive (`GET /api/export/archive`): a zip holding `strapsift.json` (this contract),
 * `photos/<keeperId>-<side>.<ext>` with the original photo bytes and a `README.txt`. The version goes up
 * whenever a field changes meaning; a restore refuses versions it does not know.
 */
export const ARCHIVE_FORMAT = 'strapsift-archive';
export const ARCHIVE_VERSION = 1;
export const ARCHIVE_JSON = 'strapsift.json';
export const ARCHIVE_README = 'README.txt';

/** Limits a restore holds an uploaded archive to, whatever its entries claim about their own sizes. */
export const ARCHIVE_LIMITS = {
  /** The upload itself. */
  uploadBytes: 512 * 1024 * 1024,
  /** Files inside (two per keeper with photos, plus the JSON and the README). */
  entries: 50_000,
  /** Everything inside once decompressed: a zip bomb is stopped here, while it inflates. */
  totalBytes: 2 * 1024 * 1024 * 1024,
  /** strapsift.json once decompressed. */
  jsonBytes: 512 * 1024 * 1024,
  /** One record (a hunt with its straps, a note, a keeper) in strapsift.json. */
  recordBytes: 1024 * 1024,
  /** One photo, as the photo upload allows. */
  photoBytes: PHOTO_MAX_BYTES,
  readmeBytes: 64 * 1024,
} as const;
export type ArchiveLimits = { [K in keyof typeof ARCHIVE_LIMITS]: number };

/** Names an archive may hold; anything else (and so any `..`, absolute path or backslash) is refused. */
export const ARCHIVE_PHOTO_NAME = /^photos\/([0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12})-(front|back)\.(jpg|png|webp)$/;
export const PHOTO_EXTENSION = { 'image/jpeg': 'jpg', 'image/png': 'png', 'image/webp': 'webp' } as const;

const when = isoDateTime;
const count = z.number().int().min(0);
const starRunSize = starRun.nullable().default(null);

export const archiveHeader = z
  .object({
    format: z.literal(ARCHIVE_FORMAT, { message: `must be ${ARCHIVE_FORMAT}` }),
    version: z.literal(ARCHIVE_VERSION, { message: `must be ${ARCHIVE_VERSION}; this Strapsift reads version ${ARCHIVE_VERSION} archives` }),
  })
  .strict();

export const archiveAccount = z
  .object({
    id: uuid,
    email: z.string().max(254),
    displayName: z.string().trim().min(1).max(80),
    createdAt: when,
  })
  .strict();

export const archiveWeightTable = z.object({ name: z.string().trim().min(1).max(60), active: z.boolean(), weights: weightTableValues }).strict();

export const archiveWatchPattern = z
  .object({ text: z.string().trim().min(1).max(64), label: z.string().max(60).nullable(), createdAt: when })
  .strict();

export const archiveStrap = z
  .object({
    number: z.number().int().min(1).max(1000),
    swappedIn: z.number().int().min(0).max(1000),
    shortOver: z.number().int().min(-1000).max(1000),
    note: z.string().max(200).nullable(),
  })
  .strict();

export const archiveHunt = z
  .object({
    id: uuid,
    title: z.string().trim().min(1).max(120),
    source: z.string().trim().min(1).max(120),
    denomination,
    plannedStraps: z.number().int().min(1).max(1000),
    status: huntStatus,
    startedAt: when,
    closedAt: when.nullable(),
    inSequence: z.boolean().default(false),
    series: seriesField.nullable().default(null),
    /** The exporter's own place in the hunt; crew hunts come back as the importer's own. */
    role: z.enum(['owner', 'crew']),
    /** The others in the hunt when it was exported, for the record; they are not restored. */
    crew: z.array(z.object({ displayName: z.string().max(80), role: z.enum(['owner', 'crew']) }).strict()).max(1000),
    straps: z.array(archiveStrap).max(1000),
  })
  .strict();

/** A logged note: what was entered (serial, star, strap, pulled, how) and the reading it got then. */
export const archiveNote = z
  .object({
    id: uuid,
    huntId: uuid,
    strap: z.number().int().min(1).max(1000),
    serial: serialText,
    star: z.boolean(),
    pulled: z.boolean(),
    scannedAt: when,
    entryMethod: entryMethod.default('keypad'),
    cameraConfidence: z.number().min(0).max(1).nullable().default(null),
    starRunSize,
    patterns: z.array(patternId).max(10),
    points: z.number().finite().min(-100_000).max(100_000),
    keep: z.boolean(),
  })
  .strict();

export const archiveKeeper = z
  .object({
    id: uuid,
    scanId: uuid.nullable(),
    huntId: uuid.nullable(),
    serial: serialText,
    star: z.boolean(),
    series: seriesField.nullable(),
    district: districtField.nullable(),
    facility: facility.nullable(),
    denomination: denomination.nullable(),
    grade: z.number().int().min(1).max(70).nullable(),
    estimatedValueCents: z.number().int().min(0).max(1_000_000_000).nullable(),
    status: keeperStatus,
    notes: z.string().max(2000).nullable(),
    originalPaper: z.boolean().nullable().default(null),
    starRunSize,
    patterns: z.array(patternId).max(10),
    points: z.number().finite().min(-100_000).max(100_000),
    foundAt: when,
    createdAt: when,
    updatedAt: when,
  })
  .strict();

export const archivePhoto = z
  .object({
    keeperId: uuid,
    side: photoSide,
    file: z.string().regex(ARCHIVE_PHOTO_NAME, 'must be photos/<keeper id>-<side>.<jpg|png|webp>'),
    contentType: photoContentType,
    byteSize: z.number().int().min(1).max(PHOTO_MAX_BYTES),
    width: z.number().int().min(1),
    height: z.number().int().min(1),
    sha256: z.string().regex(/^[0-9a-f]{64}$/, 'must be a SHA-256 in hex'),
  })
  .strict();

export type ArchiveAccount = z.infer<typeof archiveAccount>;
export type ArchiveWeightTable = z.infer<typeof archiveWeightTable>;
export type ArchiveWatchPattern = z.infer<typeof archiveWatchPattern>;
export type ArchiveHunt = z.infer<typeof archiveHunt>;
export type ArchiveNote = z.infer<typeof archiveNote>;
export type ArchiveKeeper = z.infer<typeof archiveKeeper>;
export type ArchivePhoto = z.infer<typeof archivePhoto>;

/** What the You screen shows before an export: how much there is, to size the progress bar. */
export const archiveSummary = z.object({
  hunts: count,
  notes: count,
  keepers: count,
  photos: count,
  /** A guess of the zip's size: photo bytes as stored plus a typical compressed size per record. */
  estimatedBytes: count,
});
export type ArchiveSummary = z.infer<typeof archiveSummary>;

export const archiveImportQuery = z.object({ preview: z.enum(['1', 'true', '0', 'false']).optional() }).strict();

const kindCounts = z.object({ inArchive: count, add: count, present: count });
export type ArchiveKindCounts = z.infer<typeof kindCounts>;

/**
 * A dry run (`?preview=1`) or a restore. `add` is what the restore adds (or added); `present` is already
 * in this account and is left alone, so a second restore adds nothing. `adoptedHunts` come back as the
 * importer's own: hunts the exporter was crew in, or hunts someone else on this server owns now.
 */
export const archiveImportResult = z.object({
  preview: z.boolean(),
  exportedAt: when,
  exportedBy: z.string(),
  counts: z.object({
    hunts: kindCounts,
    notes: kindCounts,
    keepers: kindCounts,
    photos: kindCounts,
    weightTables: kindCounts,
    watchPatterns: kindCounts,
  }),
  adoptedHunts: z.array(z.object({ title: z.string(), reason: z.enum(['crew', 'owned-here']) })),
  profile: z.object({ displayName: z.string(), changes: z.boolean() }),
  /** What is wrong with the archive, where (a preview lists them; a restore answers 400 with them). */
  problems: z.array(z.object({ where: z.string(), message: z.string() })),
});
export type ArchiveImportResult = z.infer<typeof archiveImportResult>;

/** One line of a restore's progress stream (Accept: application/x-ndjson). */
export const archiveProgressLine = z.union([
  z.object({ phase: z.enum(['checking', 'settings', 'hunts', 'notes', 'keepers', 'photos']), done: count, total: count }),
  z.object({ result: archiveImportResult }),
  z.object({ error: z.object({ code: z.string(), message: z.string() }) }),
]);
export type ArchiveProgressLine = z.infer<typeof archiveProgressLine>;
