import type { DataSource } from 'typeorm';
import { combinedHits } from '../../../shared/engine';
import type { LowLimit, PatternId, TallyPart, WeightTable } from '../../../shared/engine';
import { runEndFor } from '../../../shared/trade';
import type { HuntTally, PeriodTally, TallyQuery } from '../../../shared/contracts/tally';
import { HttpError } from '../../lib/errors';
import { NON_LOW_MASK, PATTERN_BIT, PATTERN_IDS, PATTERN_NAMES, int } from '../../lib/patterns';
import { huntAccess, type HuntAccess } from '../crew/hunt-access';
import type { WeightsService } from '../weights/weights.service';

type Figures = Omit<HuntTally, 'huntId'>;

/**
 * Every count a tally needs in one pass over the scans. `$lowParam` is the caller's low limit:
 * `low` is judged again from the value so actual and expected use the same limit.
 */
function figureColumns(lowParam: string): string {
  const perPattern = PATTERN_IDS.map((id) =>
    id === 'low'
      ? `count(*) FILTER (WHERE value <= ${lowParam})::int AS "low"`
      : `count(*) FILTER (WHERE (pattern_mask & ${PATTERN_BIT[id]}) <> 0)::int AS "${id}"`,
  );
  return [
    'count(*)::int AS notes',
    `count(*) FILTER (WHERE (pattern_mask & ${NON_LOW_MASK}) <> 0 OR value <= ${lowParam})::int AS hits`,
    'count(*) FILTER (WHERE keep)::int AS keeps',
    'count(*) FILTER (WHERE pulled)::int AS pulled',
    "count(*) FILTER (WHERE entry_method = 'camera')::int AS camera_notes",
    ...perPattern,
  ].join(',\n');
}

const perThousand = (hits: number, notes: number): number => (notes > 0 ? (hits * 1000) / notes : 0);

/** A hunt's notes as one tally part: in sequence (one run up to its denomination's run end) or circulated. */
function partOf(row: Record<string, unknown>): TallyPart {
  return { notes: int(row.notes), inSequence: row.in_sequence === true, domainLast: runEndFor(int(row.denomination))?.last };
}

function basisOf(parts: readonly TallyPart[]): Figures['basis'] {
  const inSequence = parts.some((part) => part.inSequence && part.notes > 0);
  const circulated = parts.some((part) => !part.inSequence && part.notes > 0);
  return inSequence ? (circulated ? 'mixed' : 'sequence') : 'poisson';
}

function figures(row: Record<string, unknown> | undefined, lowLimit: LowLimit, parts: readonly TallyPart[]): Figures {
  const notes = int(row?.notes);
  const actual = Object.fromEntries(PATTERN_IDS.map((id) => [id, int(row?.[id])])) as Record<PatternId, number>;
  // Sequential hunts are compared with the exact run distribution, circulated notes with Poisson (TRADE.md).
  const expected = combinedHits(parts, actual, { lowLimit });
  const hits = int(row?.hits);
  return {
    notes,
    hits,
    keeps: int(row?.keeps),
    pulled: int(row?.pulled),
    entered: { keypad: notes - int(row?.camera_notes), camera: int(row?.camera_notes) },
    perThousand: perThousand(hits, notes),
    lowLimit,
    patterns: expected.rows.map((r) => ({
      id: r.id,
      name: PATTERN_NAMES[r.id],
      hits: actual[r.id],
      perThousand: perThousand(actual[r.id], notes),
      probability: r.probability,
      expected: r.expected,
      pAtLeast: r.pAtLeast ?? 1,
      pAtMost: r.pAtMost ?? 1,
      verdict: r.verdict ?? 'no-comparison',
    })),
    basis: basisOf(parts),
    caveat: expected.caveat,
  };
}

const DAY_MS = 24 * 60 * 60 * 1000;

/** A bare date means its whole UTC day: from its first millisecond, to its last. */
function bound(value: string | undefined, end: boolean): Date | null {
  if (!value) return null;
  if (/^\d{4}-\d{2}-\d{2}$/.test(value)) {
    const start = new Date(`${value}T00:00:00.000Z`);
    return end ? new Date(start.getTime() + DAY_MS - 1) : start;
  }
  return new Date(value);
}

export class TallyService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly weights: WeightsService,
  ) {}

  /**
   * `weights`, when the caller already holds the active table (requireAuth reads it with the sign-in),
   * saves a round trip; the hunt's own facts come with the access check.
   */
  async hunt(userId: string, huntId: string, weights?: WeightTable): Promise<HuntTally> {
    const active = weights ?? (await this.weights.activeWeights(userId));
    // The count runs beside the access check; its answer is only used once access is confirmed.
    const [access, rows]: [HuntAccess, Array<Record<string, unknown>>] = await Promise.all([
      huntAccess(this.dataSource, huntId, userId),
      this.dataSource.query(`SELECT ${figureColumns('$2')} FROM scans WHERE hunt_id = $1`, [huntId, active.lowLimit]),
    ]);
    const part = partOf({ in_sequence: access.hunt.inSequence, denomination: access.hunt.denomination, notes: rows[0]?.notes });
    return { huntId, ...figures(rows[0], active.lowLimit, [part]) };
  }

  /** Over every hunt the caller belongs to (crew's notes included), optionally within a period. */
  async period(userId: string, query: TallyQuery, activeWeights?: WeightTable): Promise<PeriodTally> {
    const from = bound(query.from, false);
    const to = bound(query.to, true);
    if (from && to && from > to) throw new HttpError(400, 'invalid', 'Some fields need attention', { to: 'must not be before from' });
    const weights = activeWeights ?? (await this.weights.activeWeights(userId));
    const scope = `s.hunt_id IN (SELECT hunt_id FROM hunt_members WHERE user_id = $1)
       AND ($2::timestamptz IS NULL OR s.scanned_at >= $2) AND ($3::timestamptz IS NULL OR s.scanned_at <= $3)`;
    const params = [userId, from?.toISOString() ?? null, to?.toISOString() ?? null, weights.lowLimit];
    const [totals, byHunt, overTime] = await Promise.all([
      this.dataSource.query(`SELECT ${figureColumns('$4')} FROM scans s WHERE ${scope}`, params) as Promise<Array<Record<string, unknown>>>,
      this.dataSource.query(
        `SELECT s.hunt_id, h.title, h.started_at, h.in_sequence, h.denomination, count(*)::int AS notes,
                count(*) FILTER (WHERE (s.pattern_mask & ${NON_LOW_MASK}) <> 0 OR s.value <= $4)::int AS hits
           FROM scans s JOIN hunts h ON h.id = s.hunt_id
          WHERE ${scope}
          GROUP BY s.hunt_id, h.title, h.started_at, h.in_sequence, h.denomination
          ORDER BY h.started_at, s.hunt_id`,
        params,
      ) as Promise<Array<Record<string, unknown>>>,
      this.dataSource.query(
        `SELECT date_trunc($5, s.scanned_at AT TIME ZONE 'UTC') AT TIME ZONE 'UTC' AS start, count(*)::int AS notes,
                count(*) FILTER (WHERE (s.pattern_mask & ${NON_LOW_MASK}) <> 0 OR s.value <= $4)::int AS hits
           FROM scans s
          WHERE ${scope}
          GROUP BY 1 ORDER BY 1`,
        [...params, query.bucket],
      ) as Promise<Array<Record<string, unknown>>>,
    ]);
    return {
      ...figures(totals[0], weights.lowLimit, byHunt.map(partOf)),
      from: from?.toISOString() ?? null,
      to: to?.toISOString() ?? null,
      bucket: query.bucket,
      byHunt: byHunt.map((row) => ({
        huntId: row.hunt_id as string,
        title: row.title as string,
        startedAt: (row.started_at as Date).toISOString(),
        notes: int(row.notes),
        hits: int(row.hits),
        perThousand: perThousand(int(row.hits), int(row.notes)),
      })),
      overTime: overTime.map((row) => ({
        start: (row.start as Date).toISOString(),
        notes: int(row.notes),
        hits: int(row.hits),
        perThousand: perThousand(int(row.hits), int(row.notes)),
      })),
    };
  }
}
