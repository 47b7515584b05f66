import type { DataSource } from 'typeorm';
import { scanInput, type EntryMethod, type RejectedScan, type ScanBatchResponse, type ScanListQuery, type ScanPage } from '../../../shared/contracts/scans';
import { HttpError, fieldsFromZod, forbidden, notFound } from '../../lib/errors';
import { afterCursor, decodeCursor, keysetPage, timeIdCursor } from '../../lib/cursor';
import { idsOf, maskOf } from '../../lib/patterns';
import { huntAccess } from '../crew/hunt-access';
import type { HuntStatus } from '../hunts/hunt.entity';
import type { WatchPattern, WeightTable } from '../../../shared/engine';
import type { ReadingContext, WeightsService } from '../weights/weights.service';
import { storedReading, type StoredReading } from './scan-reading';

interface VisibleHunt {
  id: string;
  status: HuntStatus;
  closed_at: Date | null;
}

/** One scan ready to insert: the device's facts plus the server's own reading. */
interface Prepared {
  id: string;
  huntId: string;
  strap: number;
  serial: string;
  pulled: boolean;
  scannedAt: string;
  entryMethod: EntryMethod;
  cameraConfidence: number | null;
  starRunSize: number | null;
  reading: StoredReading;
}

function fieldSummary(fields: Record<string, string>): string {
  return Object.entries(fields)
    .map(([field, message]) => `${field} ${message}`)
    .join('; ');
}

/** A row of the hunt's note list as PostgreSQL returns it (pg gives timestamptz as Date, numeric as text). */
interface ScanListRow {
  id: string;
  hunt_id: string;
  strap: number;
  serial: string;
  digits: string;
  prefix: string;
  suffix: string;
  star: boolean;
  district: string | null;
  pulled: boolean;
  pattern_mask: number;
  points: string | number;
  keep: boolean;
  scanned_at: Date;
  entry_method: EntryMethod;
  /** numeric comes back as text. */
  camera_confidence: string | number | null;
  star_run_size: number | null;
  user_id: string;
  display_name: string;
}

function toScanItem(row: ScanListRow): ScanPage['items'][number] {
  return {
    id: row.id,
    huntId: row.hunt_id,
    strap: row.strap,
    serial: row.serial,
    digits: row.digits,
    prefix: row.prefix,
    suffix: row.suffix,
    star: row.star,
    district: row.district ?? null,
    pulled: row.pulled,
    patterns: idsOf(row.pattern_mask),
    points: Number(row.points),
    keep: row.keep,
    scannedAt: row.scanned_at.toISOString(),
    entryMethod: row.entry_method,
    cameraConfidence: row.camera_confidence === null ? null : Number(row.camera_confidence),
    starRunSize: row.star_run_size ?? null,
    loggedBy: { id: row.user_id, displayName: row.display_name },
  };
}

export class ScansService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly weights: WeightsService,
  ) {}

  /**
   * Stores each new note exactly once. The device's id is the primary key and the insert is
   * `ON CONFLICT DO NOTHING RETURNING id`, so a retried batch, or two copies racing each other, store a
   * note once: the first writer stores it, everyone else is told it is a duplicate. Problems with one
   * note reject that note alone. `weights` is the active table when the caller holds it (saves a round
   * trip); `allowance` a limit check already under way, which must pass before anything is stored.
   */
  async storeBatch(
    userId: string,
    scans: ReadonlyArray<{ id: string } & Record<string, unknown>>,
    weights?: WeightTable,
    allowance?: Promise<void>,
  ): Promise<ScanBatchResponse> {
    const rejected: RejectedScan[] = [];
    const duplicates: string[] = [];
    const seen = new Set<string>();
    const candidates: Array<{ id: string; input: ReturnType<typeof scanInput.parse> }> = [];
    for (const raw of scans) {
      if (seen.has(raw.id)) {
        duplicates.push(raw.id);
        continue;
      }
      seen.add(raw.id);
      const parsed = scanInput.safeParse(raw);
      if (!parsed.success) rejected.push({ id: raw.id, code: 'invalid', error: fieldSummary(fieldsFromZod(parsed.error)) });
      else candidates.push({ id: raw.id, input: parsed.data });
    }

    const huntIds = [...new Set(candidates.map((c) => c.input.huntId))];
    const { hunts, context } = await this.batchContext(userId, huntIds, weights);
    // The daily allowance was asked for beside the reads above; nothing is stored before it answers.
    await allowance;
    const huntBy = new Map(hunts.map((hunt) => [hunt.id, hunt]));

    const prepared: Prepared[] = [];
    for (const { id, input } of candidates) {
      const hunt = huntBy.get(input.huntId);
      if (!hunt) {
        rejected.push({ id, code: 'hunt-not-found', error: 'No such hunt, or you are not in its crew' });
        continue;
      }
      // Notes logged before the close still count: a device that was offline may upload them late.
      if (hunt.status === 'closed' && hunt.closed_at && new Date(input.scannedAt) > hunt.closed_at) {
        rejected.push({ id, code: 'hunt-closed', error: 'The hunt was closed before this note was logged' });
        continue;
      }
      const result = storedReading(input.serial, context, { star: input.star, starRunSize: input.starRunSize });
      if (!result.ok) {
        rejected.push({ id, code: 'unreadable-serial', error: result.message });
        continue;
      }
      prepared.push({
        id,
        huntId: input.huntId,
        strap: input.strap,
        serial: input.serial,
        pulled: input.pulled === true,
        scannedAt: new Date(input.scannedAt).toISOString(),
        entryMethod: input.entryMethod ?? 'keypad',
        // A typed note has no camera confidence, whatever a client sends.
        cameraConfidence: input.entryMethod === 'camera' ? (input.cameraConfidence ?? null) : null,
        starRunSize: input.starRunSize ?? null,
        reading: result.reading,
      });
    }

    // A rejected note that was already stored (or deleted after upload) is a duplicate: the device should
    // drop it, not show an error, e.g. when the hunt closed after the first upload.
    const known = await this.knownIds(rejected.map((r) => r.id));
    for (const r of rejected) if (known.has(r.id)) duplicates.push(r.id);
    const stillRejected = rejected.filter((r) => !known.has(r.id));

    const stored = prepared.length ? await this.insert(userId, prepared) : new Set<string>();
    for (const p of prepared) if (!stored.has(p.id)) duplicates.push(p.id);
    return { stored: prepared.filter((p) => stored.has(p.id)).map((p) => p.id), duplicates, rejected: stillRejected };
  }

  /**
   * The batch's hunts the caller may log into and the reading context, in one round trip when the caller
   * already holds the active weight table (requireAuth reads it with the sign-in); else as before.
   */
  private async batchContext(userId: string, huntIds: string[], weights?: WeightTable): Promise<{ hunts: VisibleHunt[]; context: ReadingContext }> {
    if (!weights) {
      const [hunts, context] = await Promise.all([this.visibleHunts(userId, huntIds), this.weights.readingContext(userId)]);
      return { hunts, context };
    }
    const rows: Array<{ hunts: Array<{ id: string; status: HuntStatus; closed_at: string | null }> | null; watch: WatchPattern[] | null }> = await this.dataSource.query(
      `SELECT (SELECT json_agg(json_build_object('id', h.id, 'status', h.status, 'closed_at', h.closed_at))
                 FROM hunts h JOIN hunt_members m ON m.hunt_id = h.id AND m.user_id = $1
                WHERE h.id = ANY($2::uuid[])) AS hunts,
              (SELECT json_agg(w.pattern ORDER BY w.created_at, w.id) FROM watch_patterns w WHERE w.user_id = $1) AS watch`,
      [userId, huntIds],
    );
    const hunts = (rows[0]?.hunts ?? []).map((hunt) => ({ id: hunt.id, status: hunt.status, closed_at: hunt.closed_at === null ? null : new Date(hunt.closed_at) }));
    return { hunts, context: { weights, watch: rows[0]?.watch ?? [] } };
  }

  private async visibleHunts(userId: string, huntIds: string[]): Promise<VisibleHunt[]> {
    if (huntIds.length === 0) return [];
    return this.dataSource.query(
      `SELECT h.id, h.status, h.closed_at
         FROM hunts h JOIN hunt_members m ON m.hunt_id = h.id AND m.user_id = $1
        WHERE h.id = ANY($2::uuid[])`,
      [userId, huntIds],
    );
  }

  private async knownIds(ids: string[]): Promise<Set<string>> {
    if (ids.length === 0) return new Set();
    const rows: Array<{ id: string }> = await this.dataSource.query(
      `SELECT id FROM scans WHERE id = ANY($1::uuid[]) UNION SELECT id FROM scan_tombstones WHERE id = ANY($1::uuid[])`,
      [ids],
    );
    return new Set(rows.map((row) => row.id));
  }

  // One statement over parallel arrays: a fixed number of parameters whatever the batch size. Ids in
  // scan_tombstones were deleted after an earlier upload and must not come back.
  private async insert(userId: string, scans: Prepared[]): Promise<Set<string>> {
    const rows: Array<{ id: string }> = await this.dataSource.query(
      `INSERT INTO scans (id, hunt_id, user_id, strap, serial, digits, value, prefix, suffix, star, district, pulled, pattern_mask, points, keep, scanned_at,
                          entry_method, camera_confidence, star_run_size)
       SELECT t.id, t.hunt_id, $1::uuid, t.strap, t.serial, t.digits, t.value, t.prefix, t.suffix, t.star, t.district, t.pulled,
              t.pattern_mask, t.points, t.keep, t.scanned_at, t.entry_method, t.camera_confidence, t.star_run_size
         FROM unnest($2::uuid[], $3::uuid[], $4::int[], $5::varchar[], $6::varchar[], $7::int[], $8::varchar[], $9::varchar[],
                     $10::bool[], $11::varchar[], $12::bool[], $13::int[], $14::float8[], $15::bool[], $16::timestamptz[],
                     $17::varchar[], $18::real[], $19::int[])
           AS t(id, hunt_id, strap, serial, digits, value, prefix, suffix, star, district, pulled, pattern_mask, points, keep, scanned_at,
                entry_method, camera_confidence, star_run_size)
        WHERE NOT EXISTS (SELECT 1 FROM scan_tombstones d WHERE d.id = t.id)
       ON CONFLICT (id) DO NOTHING
       RETURNING id`,
      [
        userId,
        scans.map((s) => s.id),
        scans.map((s) => s.huntId),
        scans.map((s) => s.strap),
        scans.map((s) => s.serial),
        scans.map((s) => s.reading.digits),
        scans.map((s) => s.reading.value),
        scans.map((s) => s.reading.prefix),
        scans.map((s) => s.reading.suffix),
        scans.map((s) => s.reading.star),
        scans.map((s) => s.reading.district),
        scans.map((s) => s.pulled),
        scans.map((s) => maskOf(s.reading.patterns)),
        scans.map((s) => s.reading.points),
        scans.map((s) => s.reading.keep),
        scans.map((s) => s.scannedAt),
        scans.map((s) => s.entryMethod),
        scans.map((s) => s.cameraConfidence),
        scans.map((s) => s.starRunSize),
      ],
    );
    return new Set(rows.map((row) => row.id));
  }

  async list(userId: string, huntId: string, query: ScanListQuery): Promise<ScanPage> {
    await huntAccess(this.dataSource, huntId, userId);
    const after = decodeCursor(query.cursor, timeIdCursor);
    const params: unknown[] = [huntId];
    const where = ['s.hunt_id = $1'];
    if (query.strap !== undefined) {
      params.push(query.strap);
      where.push(`s.strap = $${params.length}`);
    }
    if (after) where.push(afterCursor(params, ['s.scanned_at', 's.id'], ['timestamptz', 'uuid'], after, 'DESC'));
    params.push(query.limit + 1);
    const rows: ScanListRow[] = await this.dataSource.query(
      `SELECT s.id, s.hunt_id, s.strap, s.serial, s.digits, s.prefix, s.suffix, s.star, s.district, s.pulled,
              s.pattern_mask, s.points, s.keep, s.scanned_at, s.entry_method, s.camera_confidence, s.star_run_size,
              s.user_id, u.display_name
         FROM scans s JOIN users u ON u.id = s.user_id
        WHERE ${where.join(' AND ')}
        ORDER BY s.scanned_at DESC, s.id DESC
        LIMIT $${params.length}`,
      params,
    );
    const { page, nextCursor } = keysetPage(rows, query.limit, (last) => [last.scanned_at.toISOString(), last.id]);
    return { items: page.map(toScanItem), nextCursor };
  }

  /**
   * Takes a note back after upload (undo). The one who logged it or the hunt's owner may; the id is
   * kept as a tombstone so an old queue re-sending it cannot bring it back.
   */
  async remove(userId: string, scanId: string): Promise<void> {
    const rows: Array<{ hunt_id: string; user_id: string }> = await this.dataSource.query(`SELECT hunt_id, user_id FROM scans WHERE id = $1`, [scanId]);
    const scan = rows[0];
    if (!scan) throw notFound('No such note');
    const access = await huntAccess(this.dataSource, scan.hunt_id, userId).catch((error: unknown) => {
      throw error instanceof HttpError && error.status === 404 ? notFound('No such note') : error;
    });
    if (scan.user_id !== userId && access.role !== 'owner') {
      throw forbidden('Only the one who logged this note or the hunt’s owner may delete it');
    }
    await this.dataSource.transaction(async (manager) => {
      await manager.query(`INSERT INTO scan_tombstones (id, user_id) VALUES ($1, $2) ON CONFLICT DO NOTHING`, [scanId, scan.user_id]);
      await manager.query(`DELETE FROM scans WHERE id = $1`, [scanId]);
    });
  }
}
