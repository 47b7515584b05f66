import type { DataSource, EntityManager } from 'typeorm';
import { v5 as uuidV5 } from 'uuid';
import type { ImportRow, ImportRowsRequest, ImportRowsResponse } from '../../../shared/contracts/transfer';
import { parseSerial } from '../../../shared/engine';
import { HttpError } from '../../lib/errors';
import { huntAccess } from '../crew/hunt-access';
import type { KeepersService } from '../keepers/keepers.service';
import type { ScansService } from '../scans/scans.service';

/** Namespace of imported notes' ids (a fixed random UUID; changing it would make old imports import again). */
export const IMPORT_NAMESPACE = '6f1d7c2e-3b5a-4f0e-9a61-2c8d4e7b9f13';

/** Notes without a strap column go 100 to a strap in file order, as they came out of the straps. */
const strapOfLine = (line: number) => Math.min(1000, Math.floor((line - 2) / 100) + 1);

/**
 * Imports an old log, one part (≤ 500 rows) per request. Each note's id is derived from the user and the
 * note itself (serial, star, date and how many times that note came before in the file), and goes in
 * through the scans' own batch insert (ON CONFLICT DO NOTHING), so the same file imported twice, into
 * any hunt, adds nothing the second time. A dated row whose serial is already stored with the very
 * same time (an export of Strapsift imported back) is a duplicate too.
 */
/** The scans and keepers services bound to one transaction's manager. */
export type ScopedWriters = (manager: EntityManager) => { scans: Pick<ScansService, 'storeBatch'>; keepers: Pick<KeepersService, 'create'> };

export class ImportService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly writers: ScopedWriters,
  ) {}

  /**
   * One part is atomic: its notes and keepers go in inside one transaction, so a failure half-way (a
   * database error, a lost connection) leaves none of them, and the client's retry of the part is safe.
   * Rows the checks refuse are reported and skipped; that is a verdict on the row, not a failure.
   */
  async importRows(userId: string, request: ImportRowsRequest): Promise<ImportRowsResponse> {
    return this.dataSource.transaction((manager) => this.importWith(manager, userId, request));
  }

  private async importWith(manager: EntityManager, userId: string, request: ImportRowsRequest): Promise<ImportRowsResponse> {
    const { scans, keepers: keeperWriter } = this.writers(manager);
    const { hunt } = await huntAccess(this.dataSource, request.huntId, userId);
    const rejected: ImportRowsResponse['rejected'] = [];
    const ready: Array<{ id: string; digits: string; row: ImportRow; scannedAt: string }> = [];
    for (const row of request.rows) {
      const parsed = parseSerial(row.serial);
      if (!parsed.ok) {
        rejected.push({ line: row.line, reason: `serial: ${parsed.error.message}` });
        continue;
      }
      const star = row.star ?? parsed.star;
      const id = uuidV5(`${userId}|${parsed.digits}|${parsed.prefix}|${parsed.suffix}|${star}|${row.date ?? ''}|${row.occurrence}`, IMPORT_NAMESPACE);
      // Undated notes keep their file order inside the hunt's first second.
      const scannedAt = row.date ?? new Date(hunt.startedAt.getTime() + Math.min(row.line, 999)).toISOString();
      ready.push({ id, digits: parsed.digits, row: { ...row, star }, scannedAt });
    }

    const dated = ready.filter((item) => item.row.date);
    const sameTime = new Set<string>();
    if (dated.length) {
      const rows: Array<{ digits: string; scanned_at: Date }> = await manager.query(
        `SELECT s.digits, s.scanned_at FROM scans s
           JOIN unnest($2::varchar[], $3::timestamptz[]) AS t(digits, scanned_at) ON t.digits = s.digits AND t.scanned_at = s.scanned_at
          WHERE s.user_id = $1 AND NOT (s.id = ANY($4::uuid[]))`,
        [userId, dated.map((item) => item.digits), dated.map((item) => item.scannedAt), dated.map((item) => item.id)],
      );
      for (const row of rows) sameTime.add(`${row.digits}|${row.scanned_at.toISOString()}`);
    }
    const fresh = ready.filter((item) => !sameTime.has(`${item.digits}|${new Date(item.scannedAt).toISOString()}`));
    let duplicates = ready.length - fresh.length;

    const byId = new Map(fresh.map((item) => [item.id, item]));
    const result = fresh.length
      ? await scans.storeBatch(
          userId,
          fresh.map((item) => ({
            id: item.id,
            huntId: request.huntId,
            strap: item.row.strap ?? strapOfLine(item.row.line),
            serial: item.row.serial,
            star: item.row.star ?? undefined,
            pulled: item.row.pulled === true,
            scannedAt: item.scannedAt,
            entryMethod: item.row.entryMethod ?? undefined,
            cameraConfidence: item.row.cameraConfidence ?? undefined,
          })),
        )
      : { stored: [], duplicates: [], rejected: [] };
    duplicates += result.duplicates.length;
    for (const failure of result.rejected) rejected.push({ line: byId.get(failure.id)?.row.line ?? 0, reason: failure.error });

    // Pulled notes become keepers, with the log's series, district and note. Keeping a stored note is
    // idempotent (one keeper per note), so a retried part or a second import makes no second keeper.
    let keepers = 0;
    for (const id of [...result.stored, ...result.duplicates]) {
      const item = byId.get(id);
      if (!item || item.row.pulled !== true) continue;
      try {
        const { created } = await keeperWriter.create(userId, {
          scanId: id,
          series: item.row.series ?? undefined,
          district: item.row.district ?? undefined,
          notes: item.row.note ?? undefined,
          star: item.row.star ?? undefined,
          foundAt: item.scannedAt,
        });
        if (created) keepers += 1;
      } catch (error) {
        // A duplicate whose note was deleted since, or sits in a hunt the user left: nothing to keep.
        if (!(error instanceof HttpError && error.status === 404)) throw error;
      }
    }
    rejected.sort((a, b) => a.line - b.line);
    return { stored: result.stored.length, duplicates, keepers, rejected };
  }
}
