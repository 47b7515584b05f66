import { isAllZero, nearMissBetween } from './_lib/near-miss-build';
import { digitsOf, serialValue } from './_lib/serial-value';
import { LADDERS } from './patterns';
import type { NearMiss, NearMissPatternId, SerialInput } from './types';

/** Patterns with near misses, in the order readings list them. */
export const NEAR_MISS_PATTERN_IDS: readonly NearMissPatternId[] = [
  'binary',
  'trinary',
  'solid',
  'radar',
  'repeater',
  'ladder',
];

function countDigits(d: readonly number[]): number[] {
  const counts = [0, 0, 0, 0, 0, 0, 0, 0, 0, 0];
  for (let i = 0; i < 8; i++) counts[d[i]!]++;
  return counts;
}

/** Digits ordered by count, most frequent first; ties go to the smaller digit. */
function byFrequency(counts: readonly number[]): number[] {
  return [0, 1, 2, 3, 4, 5, 6, 7, 8, 9].sort((a, b) => counts[b]! - counts[a]! || a - b);
}

function solidMiss(d: readonly number[]): NearMiss {
  const counts = countDigits(d);
  // 0 is left out: 00000000 is not a serial, so the nearest solid of 00000001 is 7 changes away.
  let best = 1;
  for (let digit = 2; digit <= 9; digit++) if (counts[digit]! > counts[best]!) best = digit;
  return nearMissBetween(d, [best, best, best, best, best, best, best, best]);
}

/**
 * Exactly k distinct digits: keep the k most frequent digits and turn every
 * other digit into the most frequent one; when fewer than k digits occur,
 * introduce the missing ones from the right, taking positions of the most
 * frequent digit. The distance is max(8 − (top-k counts), k − distinct), the
 * proven minimum for "exactly k".
 */
function exactlyKMiss(d: readonly number[], k: number): NearMiss {
  const counts = countDigits(d);
  const order = byFrequency(counts);
  const distinct = counts.filter((c) => c > 0).length;
  const keep = new Set(order.slice(0, Math.min(k, distinct)));
  const top = order[0]!;
  const target = d.map((digit) => (keep.has(digit) ? digit : top));
  if (distinct < k) {
    const fresh = [0, 1, 2, 3, 4, 5, 6, 7, 8, 9].filter((digit) => counts[digit] === 0);
    let need = k - distinct;
    for (let i = 7; i >= 0 && need > 0; i--) {
      if (target[i] === top) {
        target[i] = fresh[k - distinct - need]!;
        need--;
      }
    }
  }
  return nearMissBetween(d, target);
}

/**
 * Mirror pairs (palindrome: i ↔ 7−i; repeater: i ↔ i+4). Each unequal pair
 * costs one change; the right digit copies the left unless that would make
 * 00000000, in which case one pair copies the other way (its right digit is
 * non-zero, so the target is a serial and the count stays minimal).
 */
function pairedMiss(d: readonly number[], partner: (i: number) => number): NearMiss {
  const target = d.slice();
  let firstUnequal = -1;
  for (let i = 0; i < 4; i++) {
    const j = partner(i);
    if (d[i] !== d[j]) {
      if (firstUnequal < 0) firstUnequal = i;
      target[j] = d[i]!;
    }
  }
  if (firstUnequal >= 0 && isAllZero(target)) {
    const j = partner(firstUnequal);
    target[j] = d[j]!;
    target[firstUnequal] = d[j]!;
  }
  return nearMissBetween(d, target);
}

function ladderMiss(d: readonly number[]): NearMiss {
  let best: NearMiss | null = null;
  for (const ladder of LADDERS) {
    const miss = nearMissBetween(d, digitsOf(ladder));
    if (best === null || miss.distance < best.distance) best = miss;
  }
  return best!;
}

/** Near miss of one pattern for a value already known to be a serial. */
export function nearMissOfValue(value: number, pattern: NearMissPatternId): NearMiss {
  const d = digitsOf(value);
  switch (pattern) {
    case 'binary':
      return exactlyKMiss(d, 2);
    case 'trinary':
      return exactlyKMiss(d, 3);
    case 'solid':
      return solidMiss(d);
    case 'radar':
      return pairedMiss(d, (i) => 7 - i);
    case 'repeater':
      return pairedMiss(d, (i) => i + 4);
    case 'ladder':
      return ladderMiss(d);
  }
}

/** All six near misses of a value already known to be a serial. */
export function nearMissesOfValue(value: number): Record<NearMissPatternId, NearMiss> {
  return {
    binary: nearMissOfValue(value, 'binary'),
    trinary: nearMissOfValue(value, 'trinary'),
    solid: nearMissOfValue(value, 'solid'),
    radar: nearMissOfValue(value, 'radar'),
    repeater: nearMissOfValue(value, 'repeater'),
    ladder: nearMissOfValue(value, 'ladder'),
  };
}

/**
 * How close a serial comes to binary, trinary, solid, radar, repeater and
 * ladder: for each, the fewest digit changes that reach a member (`distance`),
 * one member at that distance (`target`, never 00000000) and the 1-based
 * positions that change. When the serial already is a member the distance is
 * 0, the target is the serial and no position changes; so a solid, which has
 * one distinct digit, is 1 change from a binary and 2 from a trinary.
 * Ties between equally near targets go to the most frequent digits (smaller
 * digit on equal counts) and, for ladders, the smallest ladder.
 *
 * @example
 * nearMiss('33333533').solid // { distance: 1, target: '33333333', positions: [6] }
 * nearMiss('00000001').solid.distance // 7
 */
export function nearMiss(digits: SerialInput): Record<NearMissPatternId, NearMiss> {
  return nearMissesOfValue(serialValue(digits, 'nearMiss'));
}
