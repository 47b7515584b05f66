import type { DataSource } from 'typeorm';
import { z } from 'zod';
import type { Reading } from '../../../shared/engine';
import type { CreateKeeperRequest } from '../../../shared/contracts/keepers';
import { notFound } from '../../lib/errors';
import type { KeeperEntity } from './keeper.entity';
import { scoredColumns, type NoteFacts } from './keeper-reading';

/** What a new keeper starts from: a note logged in a hunt, or a serial typed in by hand. */
export interface KeeperSource {
  serial: string;
  star: boolean;
  district: string | null;
  denomination: number | null;
  huntId: string | null;
  foundAt: Date;
  starRunSize: number | null;
}

const loggedNoteRow = z.object({
  serial: z.string(),
  star: z.boolean(),
  district: z.string().nullable(),
  hunt_id: z.string(),
  scanned_at: z.date(),
  star_run_size: z.number().nullable(),
  denomination: z.number(),
});

/** A logged note of a hunt the hunter belongs to (crew may keep the owner's notes); 404 otherwise. */
export async function loggedNote(dataSource: DataSource, userId: string, scanId: string): Promise<KeeperSource> {
  const rows: unknown[] = await dataSource.query(
    `SELECT s.serial, s.star, s.district, s.hunt_id, s.scanned_at, s.star_run_size, h.denomination
       FROM scans s JOIN hunts h ON h.id = s.hunt_id JOIN hunt_members m ON m.hunt_id = s.hunt_id AND m.user_id = $2
      WHERE s.id = $1`,
    [scanId, userId],
  );
  if (!rows[0]) throw notFound('No such note');
  const row = loggedNoteRow.parse(rows[0]);
  return {
    serial: row.serial,
    star: row.star,
    district: row.district,
    denomination: row.denomination,
    huntId: row.hunt_id,
    foundAt: row.scanned_at,
    starRunSize: row.star_run_size,
  };
}

/** A serial typed in: no hunt, found now, nothing known beyond the serial itself. */
export function typedNote(serial: string): KeeperSource {
  return { serial, star: false, district: null, denomination: null, huntId: null, foundAt: new Date(), starRunSize: null };
}

/** What the hunter said wins over what the source note knew; an explicit null clears it. */
export function factsOf(source: KeeperSource, request: CreateKeeperRequest): NoteFacts {
  return {
    serial: source.serial,
    star: request.star ?? source.star,
    series: request.series ?? null,
    district: request.district !== undefined ? request.district : source.district,
    facility: request.facility ?? null,
    denomination: request.denomination !== undefined ? request.denomination : source.denomination,
    starRunSize: request.starRunSize !== undefined ? request.starRunSize : source.starRunSize,
  };
}

/** Every column of the new keeper's row, from its facts, its reading and the rest of the request. */
export function newKeeperColumns(userId: string, source: KeeperSource, facts: NoteFacts, scored: Reading, request: CreateKeeperRequest): Partial<KeeperEntity> {
  return {
    ...facts,
    userId,
    scanId: request.scanId ?? null,
    huntId: source.huntId,
    ...scoredColumns(scored),
    grade: request.grade ?? null,
    originalPaper: request.originalPaper ?? null,
    starRunSize: request.starRunSize ?? source.starRunSize,
    estimatedValueCents: request.estimatedValueCents ?? null,
    status: request.status ?? 'kept',
    notes: request.notes || null,
    foundAt: request.foundAt ? new Date(request.foundAt) : source.foundAt,
  };
}
