import type { ChanceVerdict } from '@shared/engine';
import type { TallyPatternRow } from '@shared/contracts';

// The shared formatters live in src/lib/format.ts; re-exported for the tally's components.
export { formatChance, formatCount, formatExpected, formatRate } from '@/lib/format';

/** What a tally row carries about chance: the server's tails and verdict (Poisson or the exact run distribution). */
export type ChanceRow = Pick<TallyPatternRow, 'hits' | 'expected' | 'pAtLeast' | 'pAtMost' | 'verdict'>;

/**
 * The chance by luck alone of a count at least this far from the expected one, in its direction:
 * P(X ≥ hits) above the expected count, P(X ≤ hits) below it. Null when nothing was found and chance
 * made nothing the likely outcome, where a "100%" would only be noise.
 *
 * @example
 * luck({ hits: 4, expected: 0.4572, pAtLeast: 0.0012665, pAtMost: 0.9999, verdict: 'more' }) // { p: 0.0012665, direction: 'at least' }
 */
export function luck(row: ChanceRow): { p: number; direction: 'at least' | 'at most' } | null {
  if (row.hits >= row.expected) return row.hits === 0 ? null : { p: row.pAtLeast, direction: 'at least' };
  if (row.hits === 0 && row.pAtMost >= 0.5) return null;
  return { p: row.pAtMost, direction: 'at most' };
}

export type Verdict = ChanceVerdict;

/**
 * Whether a count stands out from chance, as the server judged it at the 95% level: for circulated notes
 * against Poisson, for new notes in sequence against every run of the same length.
 *
 * @example
 * verdict({ hits: 5, expected: 0.5, pAtLeast: 0.00017, pAtMost: 1, verdict: 'more' }) // 'more'
 */
export function verdict(row: ChanceRow): Verdict {
  return row.verdict;
}

export const VERDICT_TEXT: Record<Verdict, string> = {
  more: 'more than chance',
  fewer: 'fewer than chance',
  'as-chance': 'about chance',
  'no-comparison': 'no comparison: chance alone often gives this',
};

export { formatDate, formatShortDate } from '@/lib/format';
