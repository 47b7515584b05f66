import { PATTERN_NAMES } from './patterns';
import { watchText } from './watch';
import type { NearMiss, NearMissPatternId, Neighbour, WatchPattern } from './types';

const COUNT_WORDS = ['no', 'one', 'two', 'three', 'four', 'five', 'six', 'seven', 'eight'];

/**
 * 1st, 2nd, 3rd, 4th … for a 1-based position.
 *
 * @example
 * ordinal(2) // '2nd'
 */
export function ordinal(n: number): string {
  const suffix = n % 10 === 1 && n % 100 !== 11 ? 'st' : n % 10 === 2 && n % 100 !== 12 ? 'nd' : n % 10 === 3 && n % 100 !== 13 ? 'rd' : 'th';
  return `${n}${suffix}`;
}

function what(pattern: NearMissPatternId | WatchPattern): string {
  if (typeof pattern === 'string') return `a ${PATTERN_NAMES[pattern]}`;
  return pattern.label ? `your watch pattern “${pattern.label}”` : `your watch pattern ${watchText(pattern)}`;
}

/**
 * A near miss as a sentence: which pattern, how many digits, and for each
 * position the digit it would need.
 *
 * @example
 * describeNearMiss('binary', { distance: 1, target: '55155515', positions: [6] })
 * // 'one digit from a binary: 6th → 5'
 * describeNearMiss('radar', { distance: 0, target: '12344321', positions: [] })
 * // 'already a radar'
 */
export function describeNearMiss(pattern: NearMissPatternId | WatchPattern, miss: NearMiss): string {
  if (miss.distance === 0) return typeof pattern === 'string' ? `already ${what(pattern)}` : `matches ${what(pattern)}`;
  const count = COUNT_WORDS[miss.distance] ?? String(miss.distance);
  const changes = miss.positions.map((p) => `${ordinal(p)} → ${miss.target[p - 1]}`).join(', ');
  return `${count} digit${miss.distance === 1 ? '' : 's'} from ${what(pattern)}: ${changes}`;
}

/**
 * A neighbour as a short phrase.
 *
 * @example
 * describeNeighbour({ serial: '22222222', notesAway: 3 }, 'above') // '22222222, 3 notes above'
 */
export function describeNeighbour(n: Neighbour | null, side: 'below' | 'above'): string {
  if (n === null) return `none ${side}`;
  return `${n.serial}, ${n.notesAway.toLocaleString('en-US')} note${n.notesAway === 1 ? '' : 's'} ${side}`;
}
