import { HOBBY_PRESS_DUPLICATES } from './references';
import type { Sourced } from './types';

export interface DuplicateStarRange extends Sourced {
  series: string;
  denomination: number;
  district: string;
  /** First and last serial value of the range, both included. */
  first: number;
  last: number;
}

const SOURCE = { source: 'published', reference: HOBBY_PRESS_DUPLICATES } as const;

/**
 * Series 2013 $1 New York star notes printed at both facilities over the same
 * serials (TRADE.md). Outside these ranges there is no duplicate.
 */
export const DUPLICATE_STAR_RANGES: readonly DuplicateStarRange[] = [
  { series: '2013', denomination: 1, district: 'B', first: 1, last: 250_000, ...SOURCE },
  { series: '2013', denomination: 1, district: 'B', first: 3_200_001, last: 9_600_000, ...SOURCE },
];

/**
 * The duplicated range a star note falls in, or null. An unknown denomination
 * is given the benefit of the doubt (the warning names $1); a known one must be 1.
 *
 * @example
 * duplicateStarRange({ series: '2013', district: 'B', star: true, denomination: 1, value: 250_000 })?.last // 250000
 * duplicateStarRange({ series: '2013', district: 'B', star: true, denomination: 1, value: 250_001 }) // null
 */
export function duplicateStarRange(facts: {
  series?: string;
  district?: string | null;
  star?: boolean;
  denomination?: number;
  value?: number;
}): DuplicateStarRange | null {
  if (!facts.star || facts.value === undefined || facts.series === undefined) return null;
  const series = facts.series.replace(/\s+/g, '').toUpperCase();
  return (
    DUPLICATE_STAR_RANGES.find(
      (r) =>
        r.series === series &&
        r.district === facts.district &&
        (facts.denomination === undefined || facts.denomination === r.denomination) &&
        facts.value! >= r.first &&
        facts.value! <= r.last,
    ) ?? null
  );
}
