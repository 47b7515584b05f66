import { poissonAtLeast } from './_lib/poisson';
import { verdictOf } from './_lib/verdict';
import { DOMAIN_LAST } from './_lib/serial-value';
import { patternCount } from './odds';
import { DEFAULT_LOW_LIMIT, PATTERN_IDS, isLowLimit } from './patterns';
import type { ExpectedHits, LowLimit, PatternId } from './types';

/** Shown wherever expected hits are: why the Poisson figures are only a guide. */
export const EXPECTED_CAVEAT =
  'For circulated notes: each note is treated as an independent random serial from 00000001–99999999, ' +
  'so the counts follow a Poisson distribution. Notes from a new strap, bundle or brick are sequential, not ' +
  'independent draws: their finds cluster (a strap either holds a repeater or it does not), so hunts of new ' +
  'notes in sequence are compared with the exact distribution for runs of that length instead.';

/**
 * P(X ≥ k) for a Poisson count with the given mean: how surprising it is to
 * see at least k hits when `mean` are expected.
 *
 * @example
 * poissonTail(3, 2) // 0.3233… (1 − 5e^−2)
 */
export function poissonTail(k: number, mean: number): number {
  if (!Number.isFinite(k) || !Number.isFinite(mean) || mean < 0) {
    throw new RangeError(`poissonTail: need a finite k and a mean ≥ 0, got k=${String(k)}, mean=${String(mean)}`);
  }
  return poissonAtLeast(Math.ceil(k), mean);
}

/**
 * For `notes` searched, the expected count of each pattern (notes × its
 * exact probability over the domain) and, when actual counts are given, the
 * Poisson probability of seeing at least that many: small values mean a
 * lucky hunt (or a picked-over bank when actual is far below expected).
 * Counts that are not whole numbers ≥ 0 are treated as not given. For
 * circulated notes only: notes in sequence go to `sequentialHits`.
 *
 * @example
 * expectedHits(10_000, { binary: 3 }).rows.find((r) => r.id === 'binary')
 * // { id: 'binary', probability: 0.0001143…, expected: 1.143…, actual: 3, pAtLeast: 0.108…, pAtMost: 0.96…, verdict: 'as-chance' }
 */
export function expectedHits(
  notes: number,
  actualCounts: Partial<Record<PatternId, number>> = {},
  options: { lowLimit?: LowLimit } = {},
): ExpectedHits {
  if (!Number.isInteger(notes) || notes < 0) {
    throw new RangeError(`expectedHits: notes must be a whole number ≥ 0, got ${String(notes)}`);
  }
  const lowLimit = options.lowLimit ?? DEFAULT_LOW_LIMIT;
  if (!isLowLimit(lowLimit)) throw new RangeError(`expectedHits: lowLimit must be 9, 99, 999, 9999 or 99999`);
  const rows = PATTERN_IDS.map((id) => {
    const probability = patternCount(id, { lowLimit }) / DOMAIN_LAST;
    const expected = notes * probability;
    const given = actualCounts[id];
    const actual = typeof given === 'number' && Number.isInteger(given) && given >= 0 ? given : null;
    if (actual === null) return { id, probability, expected, actual, pAtLeast: null, pAtMost: null, verdict: null };
    const pAtLeast = poissonAtLeast(actual, expected);
    const pAtMost = 1 - poissonAtLeast(actual + 1, expected);
    // Poisson has no highest count, so only the lowest (none at all) can make a side meaningless.
    const verdict = verdictOf(pAtLeast, pAtMost, Math.exp(-expected), 0, actual < expected);
    return { id, probability, expected, actual, pAtLeast, pAtMost, verdict };
  });
  return { notes, lowLimit, inSequence: false, rows, caveat: EXPECTED_CAVEAT };
}
