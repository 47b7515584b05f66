import type { DataSource } from 'typeorm';
import type { StrapRow, StrapSheet, UpdateStrapRequest } from '../../../shared/contracts/straps';
import { strapFigures } from '../../../shared/straps';
import { int, iso } from '../../lib/patterns';
import { huntAccess } from '../crew/hunt-access';

interface ScanCounts {
  searched: number;
  pulled: number;
  first: Date | null;
  last: Date | null;
}

interface Recorded {
  swappedIn: number;
  shortOver: number;
  note: string | null;
}

function strapRow(number: number, counts: ScanCounts | undefined, recorded: Recorded | undefined): StrapRow {
  const searched = counts?.searched ?? 0;
  const pulled = counts?.pulled ?? 0;
  const swappedIn = recorded?.swappedIn ?? 0;
  const shortOver = recorded?.shortOver ?? 0;
  const { received, notesBack, complete } = strapFigures({ pulled, swappedIn, shortOver });
  return {
    number,
    searched,
    pulled,
    swappedIn,
    shortOver,
    received,
    notesBack,
    complete,
    fullySearched: searched >= received,
    note: recorded?.note ?? null,
    firstScanAt: iso(counts?.first),
    lastScanAt: iso(counts?.last),
  };
}

export class StrapsService {
  constructor(private readonly dataSource: DataSource) {}

  async sheet(userId: string, huntId: string): Promise<StrapSheet> {
    const { hunt } = await huntAccess(this.dataSource, huntId, userId);
    const [counts, recorded] = await Promise.all([this.scanCounts(huntId), this.recorded(huntId)]);
    const highest = Math.max(hunt.plannedStraps, ...counts.keys(), ...recorded.keys());
    const straps: StrapRow[] = [];
    for (let number = 1; number <= highest; number++) straps.push(strapRow(number, counts.get(number), recorded.get(number)));
    return {
      huntId: hunt.id,
      title: hunt.title,
      source: hunt.source,
      denomination: hunt.denomination,
      plannedStraps: hunt.plannedStraps,
      straps,
      totals: {
        searched: straps.reduce((sum, s) => sum + s.searched, 0),
        pulled: straps.reduce((sum, s) => sum + s.pulled, 0),
        swappedIn: straps.reduce((sum, s) => sum + s.swappedIn, 0),
        notesBack: straps.reduce((sum, s) => sum + s.notesBack, 0),
        completeStraps: straps.filter((s) => s.complete).length,
        straps: straps.length,
      },
    };
  }

  /**
   * Any member records swaps and counts for a strap: crew sift their own straps into a shared hunt
   * and must be able to square them before they go back to the teller.
   */
  async update(userId: string, huntId: string, number: number, change: UpdateStrapRequest): Promise<StrapRow> {
    await huntAccess(this.dataSource, huntId, userId);
    await this.dataSource.query(
      `INSERT INTO straps (hunt_id, number, swapped_in, short_over, note, updated_at)
       VALUES ($1, $2, COALESCE($3, 0), COALESCE($4, 0), $5, now())
       ON CONFLICT (hunt_id, number) DO UPDATE SET
         swapped_in = COALESCE($3, straps.swapped_in),
         short_over = COALESCE($4, straps.short_over),
         note = CASE WHEN $6 THEN EXCLUDED.note ELSE straps.note END,
         updated_at = now()`,
      [huntId, number, change.swappedIn ?? null, change.shortOver ?? null, change.note || null, change.note !== undefined],
    );
    const [counts, recorded] = await Promise.all([this.scanCounts(huntId, number), this.recorded(huntId, number)]);
    return strapRow(number, counts.get(number), recorded.get(number));
  }

  private async scanCounts(huntId: string, number?: number): Promise<Map<number, ScanCounts>> {
    const rows: Array<Record<string, unknown>> = await this.dataSource.query(
      `SELECT strap, count(*)::int AS searched, count(*) FILTER (WHERE pulled)::int AS pulled,
              min(scanned_at) AS first, max(scanned_at) AS last
         FROM scans WHERE hunt_id = $1 AND ($2::int IS NULL OR strap = $2)
        GROUP BY strap`,
      [huntId, number ?? null],
    );
    return new Map(
      rows.map((row) => [
        row.strap as number,
        { searched: int(row.searched), pulled: int(row.pulled), first: row.first as Date | null, last: row.last as Date | null },
      ]),
    );
  }

  private async recorded(huntId: string, number?: number): Promise<Map<number, Recorded>> {
    const rows: Array<{ number: number; swapped_in: number; short_over: number; note: string | null }> = await this.dataSource.query(
      `SELECT number, swapped_in, short_over, note FROM straps WHERE hunt_id = $1 AND ($2::int IS NULL OR number = $2)`,
      [huntId, number ?? null],
    );
    return new Map(rows.map((row) => [row.number, { swappedIn: row.swapped_in, shortOver: row.short_over, note: row.note }]));
  }
}
