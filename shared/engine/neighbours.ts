import { NEIGHBOUR_PATTERNS, membersOf } from './_lib/members';
import { digitText } from './_lib/digit-text';
import { DOMAIN_LAST, serialValue } from './_lib/serial-value';
import type { Neighbour, NeighbourPatternId, Neighbours, SerialInput } from './types';

/** Patterns that have neighbours (every pattern but `low` and `high`). */
export const NEIGHBOUR_PATTERN_IDS: readonly NeighbourPatternId[] = NEIGHBOUR_PATTERNS;

// Member lists held here by index once built, so a reading's eight look-ups
// are array reads rather than map and cross-module calls. Each list also gets
// a bucket index by the first four digits (starts[b] = first member ≥ b·10,000),
// so a search touches a few cache lines instead of twenty scattered ones.
interface Indexed {
  list: Uint32Array;
  starts: Uint32Array;
  /** Member texts for the smaller lists (strings are immutable, so sharing them is safe). */
  texts: string[] | null;
}

/** Lists up to this size keep their members' texts: about 32,000 strings in all, trinaries excluded. */
const TEXT_CACHE_LIMIT = 20_000;

let indexed: Indexed[] | null = null;

function buildIndex(list: Uint32Array): Indexed {
  const starts = new Uint32Array(10001);
  let i = 0;
  for (let b = 0; b <= 10000; b++) {
    const floor = b * 10000;
    while (i < list.length && list[i]! < floor) i++;
    starts[b] = i;
  }
  const texts = list.length <= TEXT_CACHE_LIMIT ? Array.from(list, digitText) : null;
  return { list, starts, texts };
}

/** Builds every list with its index and texts; returns the bytes they hold. */
export function warmNeighbourTables(): number {
  let bytes = 0;
  for (const { list, starts, texts } of allIndexed()) bytes += list.byteLength + starts.byteLength + (texts ? texts.length * 32 : 0);
  return bytes;
}

function allIndexed(): Indexed[] {
  indexed ??= NEIGHBOUR_PATTERNS.map((p) => buildIndex(membersOf(p)));
  return indexed;
}

function textAt({ list, texts }: Indexed, i: number): string {
  return texts === null ? digitText(list[i]!) : texts[i]!;
}

/** Index of the first member ≥ value, searched within its bucket. */
function firstAtLeast({ list, starts }: Indexed, value: number): number {
  const bucket = (value / 10000) | 0;
  let lo = starts[bucket]!;
  let hi = starts[bucket + 1]!;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (list[mid]! < value) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

/**
 * Neighbours no further than `last`: a note's run end (TRADE.md), past which
 * no circulating note of its denomination exists. A serial above `last` still
 * gets the nearest member at or below it.
 */
function around(ix: Indexed, value: number, last: number): Neighbours {
  const { list } = ix;
  const lo = firstAtLeast(ix, value);
  const above = lo < list.length && list[lo] === value ? lo + 1 : lo;
  let belowAt = lo - 1;
  if (value > last) belowAt = firstAtLeast(ix, last + 1) - 1;
  let below: Neighbour | null = null;
  if (belowAt >= 0) below = { serial: textAt(ix, belowAt), notesAway: value - list[belowAt]! };
  let after: Neighbour | null = null;
  if (above < list.length && list[above]! <= last) after = { serial: textAt(ix, above), notesAway: list[above]! - value };
  return { below, above: after };
}

/** Neighbours for every pattern that has them, as a reading carries them, none past `last`. */
export function allNeighboursOfValue(value: number, last: number = DOMAIN_LAST): Record<NeighbourPatternId, Neighbours> {
  const l = allIndexed();
  return {
    solid: around(l[0]!, value, last),
    ladder: around(l[1]!, value, last),
    radar: around(l[2]!, value, last),
    repeater: around(l[3]!, value, last),
    'super-repeater': around(l[4]!, value, last),
    rotator: around(l[5]!, value, last),
    binary: around(l[6]!, value, last),
    trinary: around(l[7]!, value, last),
    'super-radar': around(l[8]!, value, last),
    'true-binary': around(l[9]!, value, last),
  };
}

/**
 * The nearest member of `pattern` strictly below and strictly above a serial,
 * with how many notes away each is, or null when there is none (00000000 is
 * never a neighbour). Binary search over the pattern's sorted member list, so
 * it answers in well under a microsecond for any serial. Throws RangeError for
 * a non-serial or for `low`/`high`, whose neighbours are just the band edges.
 * `options.last` (a run end, see `runEndFor`) keeps neighbours at or below it.
 *
 * @example
 * neighbours('11111112', 'solid')
 * // { below: { serial: '11111111', notesAway: 1 }, above: { serial: '22222222', notesAway: 11111110 } }
 * neighbours('95999999', 'solid', { last: 96_000_000 }).above // null: 99999999 is past the $1–$20 run end
 */
export function neighbours(digits: SerialInput, pattern: NeighbourPatternId, options: { last?: number } = {}): Neighbours {
  const value = serialValue(digits, 'neighbours');
  const last = options.last ?? DOMAIN_LAST;
  if (!Number.isInteger(last) || last < 1 || last > DOMAIN_LAST) {
    throw new RangeError(`neighbours: last must be a whole number 1…99999999, got ${String(last)}`);
  }
  const index = NEIGHBOUR_PATTERNS.indexOf(pattern);
  if (index < 0) {
    throw new RangeError(`neighbours: no neighbours for pattern ${JSON.stringify(pattern)}; use one of ${NEIGHBOUR_PATTERNS.join(', ')}`);
  }
  return around(allIndexed()[index]!, value, last);
}
