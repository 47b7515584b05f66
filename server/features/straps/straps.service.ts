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
    // The counts run beside the access check; their answer is only used once access is confirmed.
    const [{ hunt }, { counts, recorded }] = await Promise.all([huntAccess(this.dataSource, huntId, userId), this.strapFacts(huntId)]);
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
    const { counts, recorded } = await this.strapFacts(huntId, number);
    return strapRow(number, counts.get(number), recorded.get(number));
  }

  /** Per strap, the notes logged and what the hunter recorded, in one statement (one strap, or all). */
  private async strapFacts(huntId: string, number?: number): Promise<{ counts: Map<number, ScanCounts>; recorded: Map<number, Recorded> }> {
    const rows: Array<{
      kind: 'counts' | 'recorded';
      number: number;
      searched: number | null;
      pulled: number | null;
      first: Date | null;
      last: Date | null;
      swapped_in: number | null;
      short_over: number | null;
      note: string | null;
    }> = await this.dataSource.query(
      `SELECT 'counts' AS kind, strap AS number, count(*)::int AS searched, count(*) FILTER (WHERE pulled)::int AS pulled,
              min(scanned_at) AS first, max(scanned_at) AS last, NULL::int AS swapped_in, NULL::int AS short_over, NULL::text AS note
         FROM scans WHERE hunt_id = $1 AND ($2::int IS NULL OR strap = $2)
        GROUP BY strap
       UNION ALL
       SELECT 'recorded', number, NULL, NULL, NULL, NULL, swapped_in, short_over, note
         FROM straps WHERE hunt_id = $1 AND ($2::int IS NULL OR number = $2)`,
      [huntId, number ?? null],
    );
    const counts = new Map<number, ScanCounts>();
    const recorded = new Map<number, Recorded>();
    for (const row of rows) {
      if (row.kind === 'counts') counts.set(row.number, { searched: int(row.searched), pulled: int(row.pulled), first: row.first, last: row.last });
      else recorded.set(row.number, { swappedIn: row.swapped_in ?? 0, shortOver: row.short_over ?? 0, note: row.note });
    }
    return { counts, recorded };
  }
}
