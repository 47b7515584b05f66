import { isPatternId } from './_lib/pattern-bits';
import { DOMAIN_LAST } from './_lib/serial-value';
import { verdictOf } from './_lib/verdict';
import { DEFAULT_LOW_LIMIT, PATTERN_IDS, isLowLimit } from './patterns';
import { membersIn } from './sweep';
import type { ExpectedHits, ExpectedRow, LowLimit, PatternId, RunDistribution } from './types';

/** Shown with sequential figures: what they compare against, and why not Poisson. */
export const SEQUENTIAL_CAVEAT =
  'New notes in sequence are not independent draws: finds come in clumps (a strap holds at most one radar, ' +
  'and a brick whose first four digits all differ holds no trinary). So these figures compare your finds with ' +
  'every run of the same length, from every possible starting serial, counted exactly.';

const MAX_RUN = 10_000_000;


/**
 * Over every start s = 1 … last − L + 1, the count of members in s … s + L − 1.
 * That count rises by one where a member m enters the window (s = m − L + 1)
 * and falls by one where it leaves (s = m + 1); both event lists are sorted, so
 * one merge walks the whole domain in O(members), exactly.
 */
function histogram(list: Uint32Array, runLength: number, last: number): { counts: Float64Array; starts: number } {
  const starts = last - runLength + 1;
  const counts = new Float64Array(Math.min(runLength, list.length) + 1);
  let inWindow = 0;
  let position = 1;
  let enter = 0;
  let leave = 0;
  while (position <= starts) {
    const nextEnter = enter < list.length ? Math.max(1, list[enter]! - runLength + 1) : Infinity;
    const nextLeave = leave < list.length ? list[leave]! + 1 : Infinity;
    const next = Math.min(nextEnter, nextLeave, starts + 1);
    if (next > position) {
      counts[inWindow]! += next - position;
      position = next;
    }
    if (position > starts) break;
    if (nextEnter === position) {
      inWindow++;
      enter++;
    } else if (nextLeave === position) {
      inWindow--;
      leave++;
    }
  }
  return { counts, starts };
}

const cache = new Map<string, RunDistribution>();

/**
 * The exact distribution of a pattern's count in a run of `runLength`
 * consecutive serials, over every possible starting serial of the domain
 * (1 … domainLast − runLength + 1): `probabilities[k]` is the share of starts
 * whose run holds k members. Exact, never sampled; cached per pattern, length,
 * low limit and domain.
 *
 * @example
 * runDistribution('solid', 100).probabilities[1] // 900 / 99,999,900: nine solids, 100 starts each
 */
export function runDistribution(
  id: PatternId,
  runLength: number,
  options: { lowLimit?: LowLimit; domainLast?: number } = {},
): RunDistribution {
  if (!isPatternId(id)) throw new RangeError(`runDistribution: unknown pattern ${JSON.stringify(id)}`);
  const lowLimit = options.lowLimit ?? DEFAULT_LOW_LIMIT;
  if (!isLowLimit(lowLimit)) throw new RangeError('runDistribution: lowLimit must be 9, 99, 999, 9999 or 99999');
  const last = options.domainLast ?? DOMAIN_LAST;
  if (!Number.isInteger(last) || last < 1 || last > DOMAIN_LAST) throw new RangeError('runDistribution: domainLast must be 1…99999999');
  if (!Number.isInteger(runLength) || runLength < 1 || runLength > Math.min(MAX_RUN, last)) {
    throw new RangeError(`runDistribution: runLength must be a whole number 1…${Math.min(MAX_RUN, last)}, got ${String(runLength)}`);
  }
  const key = `${id}:${runLength}:${lowLimit}:${last}`;
  const known = cache.get(key);
  if (known) return known;
  const { counts, starts } = histogram(membersIn(id, 1, last, lowLimit), runLength, last);
  let top = counts.length - 1;
  while (top > 0 && counts[top] === 0) top--;
  const probabilities = new Array<number>(top + 1);
  let mean = 0;
  for (let k = 0; k <= top; k++) {
    probabilities[k] = counts[k]! / starts;
    mean += k * probabilities[k]!;
  }
  const result: RunDistribution = { id, runLength, starts, probabilities, mean };
  if (cache.size >= 200) cache.clear();
  cache.set(key, result);
  return result;
}

function tails(probabilities: readonly number[], k: number): { atLeast: number; atMost: number } {
  let atMost = 0;
  for (let j = 0; j <= Math.min(k, probabilities.length - 1); j++) atMost += probabilities[j]!;
  let atLeast = 0;
  for (let j = Math.max(0, k); j < probabilities.length; j++) atLeast += probabilities[j]!;
  return { atLeast: Math.min(1, atLeast), atMost: Math.min(1, atMost) };
}

function lowestAndHighest(probabilities: readonly number[]): { lowest: number; highest: number } {
  let lo = 0;
  while (lo < probabilities.length - 1 && probabilities[lo] === 0) lo++;
  return { lowest: probabilities[lo]!, highest: probabilities[probabilities.length - 1]! };
}

/**
 * For a run of `notes` new notes in sequence, each pattern's expected count
 * and, when actual counts are given, how they compare with the exact
 * distribution over every starting serial (`runDistribution`): the tails
 * P(X ≥ actual) and P(X ≤ actual), and a verdict at the 95% level: `more`,
 * `fewer`, `as-chance`, or `no-comparison` where no count on that side could
 * be unusual (most runs of a strap hold no radar, so holding none says nothing).
 *
 * @example
 * sequentialHits(4000, { trinary: 0 }).rows.find((r) => r.id === 'trinary')?.verdict // 'no-comparison'
 */
export function sequentialHits(
  notes: number,
  actualCounts: Partial<Record<PatternId, number>> = {},
  options: { lowLimit?: LowLimit; domainLast?: number } = {},
): ExpectedHits {
  if (!Number.isInteger(notes) || notes < 0) throw new RangeError(`sequentialHits: notes must be a whole number ≥ 0, got ${String(notes)}`);
  const lowLimit = options.lowLimit ?? DEFAULT_LOW_LIMIT;
  const last = options.domainLast ?? DOMAIN_LAST;
  const runLength = Math.min(notes, MAX_RUN, last);
  const rows: ExpectedRow[] = PATTERN_IDS.map((id) => {
    const given = actualCounts[id];
    const actual = typeof given === 'number' && Number.isInteger(given) && given >= 0 ? given : null;
    if (runLength === 0) {
      return { id, probability: 0, expected: 0, actual, pAtLeast: actual === null ? null : actual === 0 ? 1 : 0, pAtMost: actual === null ? null : 1, verdict: actual === null ? null : 'no-comparison' };
    }
    const dist = runDistribution(id, runLength, { lowLimit, domainLast: last });
    const row: ExpectedRow = { id, probability: dist.mean / runLength, expected: dist.mean, actual, pAtLeast: null, pAtMost: null, verdict: null };
    if (actual !== null) {
      const { atLeast, atMost } = tails(dist.probabilities, actual);
      const { lowest, highest } = lowestAndHighest(dist.probabilities);
      row.pAtLeast = atLeast;
      row.pAtMost = atMost;
      row.verdict = verdictOf(atLeast, atMost, lowest, highest, actual < dist.mean);
    }
    return row;
  });
  return { notes, lowLimit, inSequence: true, rows, caveat: SEQUENTIAL_CAVEAT };
}
