import { lowerBound, membersOf } from './_lib/members';
import { MASK_COUNT, idsToMask, isPatternId, maskToIds } from './_lib/pattern-bits';
import { DOMAIN_LAST, serialValue, toDigits } from './_lib/serial-value';
import { DEFAULT_LOW_LIMIT, HIGH_FROM, PATTERN_IDS, isLowLimit, patternMask } from './patterns';
import type { LowLimit, PatternId, SerialInput, SweepHit, SweepResult } from './types';

/** Longest range one sweep covers: a brick is 4,000 notes, so this is generous. */
export const MAX_SWEEP = 10_000_000;

let sharedIds: ReadonlyArray<readonly PatternId[]> | null = null;

/** One frozen id list per mask, shared by all hits: a sweep can return 80,000 hits. */
function idsFor(mask: number): readonly PatternId[] {
  sharedIds ??= Array.from({ length: MASK_COUNT }, (_, m) => Object.freeze(maskToIds(m)));
  return sharedIds[mask]!;
}

/** Members of `id` in [first, last], ascending (the low and high bands are plain intervals). */
export function membersIn(id: PatternId, first: number, last: number, lowLimit: number): Uint32Array {
  if (id === 'low' || id === 'high') {
    const from = id === 'low' ? first : Math.max(first, HIGH_FROM);
    const to = id === 'low' ? Math.min(last, lowLimit) : last;
    const out = new Uint32Array(Math.max(0, to - from + 1));
    for (let i = 0; i < out.length; i++) out[i] = from + i;
    return out;
  }
  const list = membersOf(id);
  return list.subarray(lowerBound(list, first), lowerBound(list, last + 1));
}

/** Sorted union of sorted lists, without repeats. */
function union(lists: Uint32Array[]): Uint32Array {
  if (lists.length === 1) return lists[0]!;
  // The big list (trinaries) is merged once with the sorted rest, which are small.
  lists.sort((a, b) => b.length - a.length);
  const big = lists[0]!;
  let restSize = 0;
  for (let i = 1; i < lists.length; i++) restSize += lists[i]!.length;
  const rest = new Uint32Array(restSize);
  let at = 0;
  for (let i = 1; i < lists.length; i++) {
    rest.set(lists[i]!, at);
    at += lists[i]!.length;
  }
  rest.sort();
  const out = new Uint32Array(big.length + rest.length);
  let i = 0;
  let j = 0;
  let n = 0;
  let previous = -1;
  while (i < big.length || j < rest.length) {
    const v = j >= rest.length || (i < big.length && big[i]! <= rest[j]!) ? big[i++]! : rest[j++]!;
    if (v !== previous) out[n++] = v;
    previous = v;
  }
  return out.subarray(0, n);
}

/**
 * Every serial in first … first + count − 1 that has any of `patterns` (all
 * patterns by default), ascending, each with the requested patterns it has.
 * Jumps from member to member by merging the patterns' sorted member lists
 * (the low and high bands are plain intervals), so the cost follows the number
 * of hits, not the length of the range. A range that would pass 99999999,
 * or `options.last` (a denomination's run end, see `runEndFor`), stops there
 * (`truncated: true`). Each hit's `patterns` list is frozen and
 * shared between hits with the same patterns (a sweep can return 80,000 hits).
 * Throws RangeError when `first` is not a
 * serial, `count` is not 1…10,000,000, `last` is below `first` or a pattern
 * id is unknown.
 *
 * @example
 * sweep('11111100', 100, ['solid', 'binary']).hits.map((h) => h.serial)
 * // ['11111100', '11111101', '11111110', '11111111', '11111112', …]
 */
export function sweep(
  first: SerialInput,
  count: number,
  patterns: readonly PatternId[] = PATTERN_IDS,
  options: { lowLimit?: LowLimit; last?: number } = {},
): SweepResult {
  const start = serialValue(first, 'sweep');
  if (!Number.isInteger(count) || count < 1 || count > MAX_SWEEP) {
    throw new RangeError(`sweep: count must be a whole number 1…${MAX_SWEEP}, got ${String(count)}`);
  }
  if (!Array.isArray(patterns)) throw new RangeError('sweep: patterns must be a list of pattern ids');
  for (const id of patterns) if (!isPatternId(id)) throw new RangeError(`sweep: unknown pattern ${JSON.stringify(id)}`);
  const lowLimit = options.lowLimit ?? DEFAULT_LOW_LIMIT;
  if (!isLowLimit(lowLimit)) throw new RangeError('sweep: lowLimit must be 9, 99, 999, 9999 or 99999');
  const end = options.last ?? DOMAIN_LAST;
  if (!Number.isInteger(end) || end < start || end > DOMAIN_LAST) {
    throw new RangeError(`sweep: last must be a whole number from the first serial to 99999999, got ${String(options.last)}`);
  }
  const wanted = PATTERN_IDS.filter((id) => patterns.includes(id));
  const last = Math.min(end, start + count - 1);
  const wantedMask = idsToMask(wanted);
  const values = wanted.length === 0 ? new Uint32Array(0) : union(wanted.map((id) => membersIn(id, start, last, lowLimit)));
  // Each serial's requested patterns come from its own mask: exact, and no bookkeeping across lists.
  const hits = new Array<SweepHit>(values.length);
  for (let k = 0; k < values.length; k++) {
    const value = values[k]!;
    hits[k] = { serial: toDigits(value), value, patterns: idsFor(patternMask(value, lowLimit) & wantedMask) };
  }
  return {
    first: start,
    last,
    count: last - start + 1,
    truncated: start + count - 1 > end,
    patterns: wanted,
    hits,
  };
}
