import type { ChanceVerdict } from '@shared/engine';
import type { TallyPatternRow } from '@shared/contracts';

/** Whole counts with thousands separators: 4,000. */
export const formatCount = (value: number): string => Math.round(value).toLocaleString('en-US');

/** Hits per 1,000 notes, to two places at most: 7.25, 12, 0.5. */
export function formatRate(perThousand: number): string {
  return perThousand.toLocaleString('en-US', { maximumFractionDigits: 2 });
}

/**
 * An expected count. Rare patterns expect millionths of a note in a hunt, so small figures keep two
 * significant digits instead of rounding to a misleading 0, down to a floor below which only "< 0.0001" is honest.
 */
export function formatExpected(value: number): string {
  if (value === 0) return '0';
  // A no-break space keeps the sign and the figure on one line in a narrow cell.
  if (value < 0.0001) return '<\u00a00.0001';
  if (value >= 100) return formatCount(value);
  if (value >= 1) return value.toLocaleString('en-US', { maximumFractionDigits: 1 });
  return value.toLocaleString('en-US', { maximumSignificantDigits: 2 });
}

/** A probability as a person reads it: "32%", "4.1%", then "1 in 250" once it is under 1%. */
export function formatChance(p: number): string {
  if (!Number.isFinite(p)) return '—';
  if (p >= 0.995) return '100%';
  if (p >= 0.1) return `${Math.round(p * 100)}%`;
  if (p >= 0.01) return `${(p * 100).toLocaleString('en-US', { maximumFractionDigits: 1 })}%`;
  if (p <= 0) return '0';
  const oneIn = 1 / p;
  if (oneIn >= 1e9) return 'under 1 in a billion';
  // Past a million the exact figure is noise; millions read at a glance and fit a table cell.
  if (oneIn >= 1e6) return `1 in ${(oneIn / 1e6).toLocaleString('en-US', { maximumFractionDigits: 0 })} million`;
  return `1 in ${formatCount(oneIn)}`;
}

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

/** "Mon, Mar 2, 2026" in the device's time zone. */
export function formatDate(iso: string): string {
  return new Date(iso).toLocaleDateString('en-US', { weekday: 'short', month: 'short', day: 'numeric', year: 'numeric' });
}

export function formatShortDate(iso: string): string {
  return new Date(iso).toLocaleDateString('en-US', { month: 'short', day: 'numeric' });
}
