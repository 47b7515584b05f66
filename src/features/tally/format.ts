import { poissonTail } from '@shared/engine';

// The shared formatters live in src/lib/format.ts; re-exported for the tally's components.
export { formatChance, formatCount, formatExpected, formatRate } from '@/lib/format';

/**
 * The chance by luck alone of a count at least this far from the expected one, in its direction:
 * P(X ≥ hits) above the expected count, P(X ≤ hits) below it. Null when nothing was found and chance
 * expected next to nothing, where a "100%" would only be noise.
 *
 * @example
 * luck(4, 0.4572, 0.0012665) // { p: 0.0012665, direction: 'at least' }
 */
export function luck(hits: number, expected: number, pAtLeast: number): { p: number; direction: 'at least' | 'at most' } | null {
  if (hits >= expected) return hits === 0 ? null : { p: pAtLeast, direction: 'at least' };
  const atMost = 1 - poissonTail(hits + 1, expected);
  if (hits === 0 && atMost >= 0.5) return null;
  return { p: atMost, direction: 'at most' };
}

export type Verdict = 'lucky' | 'thin' | 'chance';

/** Past this, a count is called out as unusual either way (a two-sided reading of the 5% rule of thumb). */
const SURPRISE = 0.025;

/**
 * Whether a count stands out from chance: "lucky" when this many or more was unlikely, "thin" when
 * this few or fewer was unlikely (a picked-over bank), otherwise what chance predicts.
 *
 * @example
 * verdict(5, 0.5, 0.00017) // 'lucky'
 */
export function verdict(hits: number, expected: number, pAtLeast: number): Verdict {
  if (hits > 0 && hits > expected && pAtLeast < SURPRISE) return 'lucky';
  // P(X ≤ hits) = 1 − P(X ≥ hits + 1).
  if (hits < expected && 1 - poissonTail(hits + 1, expected) < SURPRISE) return 'thin';
  return 'chance';
}

export const VERDICT_TEXT: Record<Verdict, string> = {
  lucky: 'more than chance',
  thin: 'fewer than chance',
  chance: 'about chance',
};

export { formatDate, formatShortDate } from '@/lib/format';
