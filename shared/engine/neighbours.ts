import { NEIGHBOUR_PATTERNS, membersOf } from './_lib/members';
import { digitText } from './_lib/digit-text';
import { serialValue } from './_lib/serial-value';
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

function around({ list, starts, texts }: Indexed, value: number): Neighbours {
  const bucket = (value / 10000) | 0;
  let lo = starts[bucket]!;
  let hi = starts[bucket + 1]!;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (list[mid]! < value) lo = mid + 1;
    else hi = mid;
  }
  const above = lo < list.length && list[lo] === value ? lo + 1 : lo;
  let below: Neighbour | null = null;
  if (lo > 0) {
    const member = list[lo - 1]!;
    below = { serial: texts === null ? digitText(member) : texts[lo - 1]!, notesAway: value - member };
  }
  let after: Neighbour | null = null;
  if (above < list.length) {
    const member = list[above]!;
    after = { serial: texts === null ? digitText(member) : texts[above]!, notesAway: member - value };
  }
  return { below, above: after };
}

/** Neighbours for all eight patterns, as a reading carries them. */
export function allNeighboursOfValue(value: number): Record<NeighbourPatternId, Neighbours> {
  const l = allIndexed();
  return {
    solid: around(l[0]!, value),
    ladder: around(l[1]!, value),
    radar: around(l[2]!, value),
    repeater: around(l[3]!, value),
    'super-repeater': around(l[4]!, value),
    rotator: around(l[5]!, value),
    binary: around(l[6]!, value),
    trinary: around(l[7]!, value),
  };
}

/**
 * The nearest member of `pattern` strictly below and strictly above a serial,
 * with how many notes away each is, or null when there is none (00000000 is
 * never a neighbour). Binary search over the pattern's sorted member list, so
 * it answers in well under a microsecond for any serial. Throws RangeError for
 * a non-serial or for `low`/`high`, whose neighbours are just the band edges.
 *
 * @example
 * neighbours('11111112', 'solid')
 * // { below: { serial: '11111111', notesAway: 1 }, above: { serial: '22222222', notesAway: 11111110 } }
 */
export function neighbours(digits: SerialInput, pattern: NeighbourPatternId): Neighbours {
  const value = serialValue(digits, 'neighbours');
  const index = NEIGHBOUR_PATTERNS.indexOf(pattern);
  if (index < 0) {
    throw new RangeError(`neighbours: no neighbours for pattern ${JSON.stringify(pattern)}; use one of ${NEIGHBOUR_PATTERNS.join(', ')}`);
  }
  return around(allIndexed()[index]!, value);
}
