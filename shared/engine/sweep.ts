import { lowerBound, membersOf } from './_lib/members';
import { BIT, isPatternId, maskToIds } from './_lib/pattern-bits';
import { DOMAIN_LAST, serialValue, toDigits } from './_lib/serial-value';
import { DEFAULT_LOW_LIMIT, HIGH_FROM, PATTERN_IDS, isLowLimit } from './patterns';
import type { LowLimit, PatternId, SerialInput, SweepHit, SweepResult } from './types';

/** Longest range one sweep covers: a brick is 4,000 notes, so this is generous. */
export const MAX_SWEEP = 10_000_000;

/** A sorted run of members inside the range: an index window on a member list, or a band of values. */
interface Source {
  bit: number;
  list: Uint32Array | null;
  next: number;
  end: number;
}

function sourceFor(id: PatternId, first: number, last: number, lowLimit: number): Source {
  if (id === 'low' || id === 'high') {
    const from = id === 'low' ? first : Math.max(first, HIGH_FROM);
    const to = id === 'low' ? Math.min(last, lowLimit) : last;
    return { bit: BIT[id], list: null, next: from, end: to + 1 };
  }
  const list = membersOf(id);
  return { bit: BIT[id], list, next: lowerBound(list, first), end: lowerBound(list, last + 1) };
}

function head(s: Source): number {
  return s.list === null ? s.next : s.list[s.next]!;
}

/**
 * Every serial in first … first + count − 1 that has any of `patterns` (all
 * patterns by default), ascending, each with the requested patterns it has.
 * Jumps from member to member by merging the patterns' sorted member lists
 * (the low and high bands are plain intervals), so the cost follows the number
 * of hits, not the length of the range. A range that would pass 99999999
 * stops there (`truncated: true`). Throws RangeError when `first` is not a
 * serial, `count` is not 1…10,000,000 or a pattern id is unknown.
 *
 * @example
 * sweep('11111100', 100, ['solid', 'binary']).hits.map((h) => h.serial)
 * // ['11111100', '11111101', '11111110', '11111111', '11111112', …]
 */
export function sweep(
  first: SerialInput,
  count: number,
  patterns: readonly PatternId[] = PATTERN_IDS,
  options: { lowLimit?: LowLimit } = {},
): SweepResult {
  const start = serialValue(first, 'sweep');
  if (!Number.isInteger(count) || count < 1 || count > MAX_SWEEP) {
    throw new RangeError(`sweep: count must be a whole number 1…${MAX_SWEEP}, got ${String(count)}`);
  }
  if (!Array.isArray(patterns)) throw new RangeError('sweep: patterns must be a list of pattern ids');
  for (const id of patterns) if (!isPatternId(id)) throw new RangeError(`sweep: unknown pattern ${JSON.stringify(id)}`);
  const lowLimit = options.lowLimit ?? DEFAULT_LOW_LIMIT;
  if (!isLowLimit(lowLimit)) throw new RangeError('sweep: lowLimit must be 9, 99, 999, 9999 or 99999');
  const wanted = PATTERN_IDS.filter((id) => patterns.includes(id));
  const last = Math.min(DOMAIN_LAST, start + count - 1);
  const sources = wanted.map((id) => sourceFor(id, start, last, lowLimit)).filter((s) => s.next < s.end);
  const hits: SweepHit[] = [];
  while (sources.length > 0) {
    let value = Infinity;
    for (const s of sources) {
      const h = head(s);
      if (h < value) value = h;
    }
    let mask = 0;
    for (let i = sources.length - 1; i >= 0; i--) {
      const s = sources[i]!;
      if (head(s) === value) {
        mask |= s.bit;
        s.next++;
        if (s.next >= s.end) sources.splice(i, 1);
      }
    }
    hits.push({ serial: toDigits(value), value, patterns: maskToIds(mask) });
  }
  return {
    first: start,
    last,
    count: last - start + 1,
    truncated: start + count - 1 > DOMAIN_LAST,
    patterns: wanted,
    hits,
  };
}
