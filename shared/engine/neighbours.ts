import { NEIGHBOUR_PATTERNS, lowerBound, membersOf } from './_lib/members';
import { serialValue, toDigits } from './_lib/serial-value';
import type { NeighbourPatternId, Neighbours, SerialInput } from './types';

/** Patterns that have neighbours (every pattern but `low` and `high`). */
export const NEIGHBOUR_PATTERN_IDS: readonly NeighbourPatternId[] = NEIGHBOUR_PATTERNS;

const NEIGHBOUR_SET: ReadonlySet<string> = new Set(NEIGHBOUR_PATTERNS);

/** Neighbours of a value already known to be a serial. */
export function neighboursOfValue(value: number, pattern: NeighbourPatternId): Neighbours {
  const list = membersOf(pattern);
  const i = lowerBound(list, value);
  const belowValue = i > 0 ? list[i - 1]! : -1;
  const aboveIndex = i < list.length && list[i] === value ? i + 1 : i;
  const aboveValue = aboveIndex < list.length ? list[aboveIndex]! : -1;
  return {
    below: belowValue < 0 ? null : { serial: toDigits(belowValue), notesAway: value - belowValue },
    above: aboveValue < 0 ? null : { serial: toDigits(aboveValue), notesAway: aboveValue - value },
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
  if (!NEIGHBOUR_SET.has(pattern)) {
    throw new RangeError(`neighbours: no neighbours for pattern ${JSON.stringify(pattern)}; use one of ${NEIGHBOUR_PATTERNS.join(', ')}`);
  }
  return neighboursOfValue(value, pattern);
}
