import { nibbleMask } from './_lib/bcd';
import { digitTables } from './_lib/digit-tables';
import { digitText } from './_lib/digit-text';
import { serialValue } from './_lib/serial-value';
import type { NearMiss, NearMissPatternId, SerialInput } from './types';

/** Patterns with near misses, in the order readings list them. */
export const NEAR_MISS_PATTERN_IDS: readonly NearMissPatternId[] = [
  'binary',
  'trinary',
  'solid',
  'radar',
  'repeater',
  'ladder',
  'super-radar',
  'true-binary',
];


/**
 * The near miss from serial digits to target digits (both leftmost first).
 * Shared with watch patterns.
 */
export function nearMissBetween(serial: ArrayLike<number>, target: ArrayLike<number>): NearMiss {
  let value = 0;
  let distance = 0;
  for (let i = 0; i < 8; i++) {
    if (serial[i] !== target[i]) distance++;
    value = value * 10 + target[i]!;
  }
  // Sized once: growing an empty array by push costs a second allocation.
  const positions: number[] = distance === 0 ? [] : new Array<number>(distance);
  for (let i = 0, k = 0; k < distance; i++) if (serial[i] !== target[i]) positions[k++] = i + 1;
  return { distance, target: digitText(value), positions };
}

export function isAllZero(digits: ArrayLike<number>): boolean {
  for (let i = 0; i < 8; i++) if (digits[i] !== 0) return false;
  return true;
}

// The serial under study, packed once per call as BCD (d1 in the top nibble)
// with its digit counts, so each of the six answers is a few XORs and masks.
// Module state, not input: the caller's values are never touched.
let bcdOf: Uint16Array | null = null;
let reversedOf: Uint16Array = new Uint16Array(0);
let countsLowOf: Uint32Array = new Uint32Array(0);
let countsHighOf: Uint8Array = new Uint8Array(0);
let digitMaskOf: Uint16Array = new Uint16Array(0);
let popcountOf: Uint8Array = new Uint8Array(0);
let textOf: string[] = [];
/** positionsOf[m]: 1-based positions of the nibbles set in the 8-bit change mask m. */
let positionsOf: number[][] = [];
let distanceOf: Uint8Array = new Uint8Array(0);

let serialBcd = 0;
let serialHi = 0;
let serialDigits = 0;
let countsLow = 0;
let countsHigh = 0;
let distinctDigits = 0;

function loadTables(): Uint16Array {
  const t = digitTables();
  reversedOf = t.reversed;
  countsLowOf = t.countsLow;
  countsHighOf = t.countsHigh;
  digitMaskOf = t.digitMask;
  popcountOf = t.popcount;
  textOf = t.textByBcd;
  positionsOf = [];
  distanceOf = new Uint8Array(256);
  for (let m = 0; m < 256; m++) {
    const positions: number[] = [];
    for (let nibble = 7; nibble >= 0; nibble--) if (m & (1 << nibble)) positions.push(8 - nibble);
    positionsOf.push(positions);
    distanceOf[m] = positions.length;
  }
  bcdOf = t.bcd;
  return t.bcd;
}

function load(value: number): void {
  const bcd = bcdOf ?? loadTables();
  const v = value | 0;
  const hi = (v / 10000) | 0;
  const lo = v - hi * 10000;
  serialHi = hi;
  serialBcd = (bcd[hi]! << 16) | bcd[lo]!;
  countsLow = countsLowOf[hi]! + countsLowOf[lo]!;
  countsHigh = countsHighOf[hi]! + countsHighOf[lo]!;
  serialDigits = digitMaskOf[hi]! | digitMaskOf[lo]!;
  distinctDigits = popcountOf[serialDigits]!;
  topsReady = false;
}

function countOf(digit: number): number {
  return digit < 8 ? (countsLow >>> (4 * digit)) & 15 : (countsHigh >>> (4 * (digit - 8))) & 15;
}

function bcdText(bcd: number): string {
  return textOf[bcd >>> 16]! + textOf[bcd & 0xffff]!;
}

function missTo(target: number): NearMiss {
  const changed = nibbleMask(serialBcd ^ target);
  return {
    distance: distanceOf[changed]!,
    target: bcdText(target),
    positions: changed === 0 ? [] : positionsOf[changed]!.slice(),
  };
}

function solidMiss(): NearMiss {
  // 0 is left out: 00000000 is not a serial, so the nearest solid of 00000001 is 7 changes away.
  let best = 1;
  let bestCount = countOf(1);
  for (let digit = 2; digit <= 9; digit++) {
    const c = countOf(digit);
    if (c > bestCount) {
      best = digit;
      bestCount = c;
    }
  }
  return missTo(Math.imul(best, 0x11111111));
}

// The three most frequent digits (ties to the smaller), found once per serial
// and shared by the binary and trinary answers.
let topsReady = false;
let top0 = -1;
let top1 = -1;
let top2 = -1;

function findTops(): void {
  let t0 = -1;
  let t1 = -1;
  let t2 = -1;
  let c0 = 0;
  let c1 = 0;
  let c2 = 0;
  let low = countsLow;
  for (let digit = 0; digit < 10; digit++) {
    let c: number;
    if (digit < 8) {
      c = low & 15;
      low >>>= 4;
    } else {
      c = (countsHigh >>> (4 * (digit - 8))) & 15;
    }
    if (c > c0) {
      t2 = t1;
      c2 = c1;
      t1 = t0;
      c1 = c0;
      t0 = digit;
      c0 = c;
    } else if (c > c1) {
      t2 = t1;
      c2 = c1;
      t1 = digit;
      c1 = c;
    } else if (c > c2) {
      t2 = digit;
      c2 = c;
    }
  }
  top0 = t0;
  top1 = t1;
  top2 = t2;
  topsReady = true;
}

/** Nibble mask (0xF per position) for each 8-bit position mask. */
let nibblesOf: Int32Array | null = null;

function buildNibbles(): Int32Array {
  const out = new Int32Array(256);
  for (let m = 0; m < 256; m++) {
    let x = 0;
    for (let i = 0; i < 8; i++) if (m & (1 << i)) x |= 15 << (4 * i);
    out[m] = x;
  }
  nibblesOf = out;
  return out;
}

/** 8-bit mask of the positions holding `digit`. */
function positionsOfDigit(digit: number): number {
  return ~nibbleMask(serialBcd ^ Math.imul(digit, 0x11111111)) & 0xff;
}

/**
 * Exactly k distinct digits: keep the k most frequent digits (ties to the
 * smaller digit) and turn every other digit into the most frequent one; when
 * fewer than k digits occur, introduce the smallest missing digits from the
 * right, taking positions of the most frequent digit. The distance is
 * max(8 − (top-k counts), k − distinct), the minimum for "exactly k".
 */
function exactlyKMiss(k: number): NearMiss {
  if (distinctDigits === k) return missTo(serialBcd);
  if (!topsReady) findTops();
  const t0 = top0;
  const t1 = top1;
  const t2 = top2;
  let target = serialBcd;
  if (distinctDigits > k) {
    // Keep the positions of the top k digits; every other position becomes the top digit.
    const keep = positionsOfDigit(t0) | positionsOfDigit(t1) | (k === 3 ? positionsOfDigit(t2) : 0);
    const kept = (nibblesOf ?? buildNibbles())[keep]!;
    target = (serialBcd & kept) | (Math.imul(t0, 0x11111111) & ~kept);
  } else {
    let fresh = 0;
    let need = k - distinctDigits;
    for (let nibble = 0; nibble < 8 && need > 0; nibble++) {
      const shift = 4 * nibble;
      if (((serialBcd >>> shift) & 15) !== t0) continue;
      while (serialDigits & (1 << fresh)) fresh++;
      target = (target & ~(15 << shift)) | (fresh << shift);
      fresh++;
      need--;
    }
  }
  return missTo(target);
}

/**
 * Each unequal pair of a palindrome (or repeater) costs one change; the right
 * half copies the left unless that would make 00000000 (left half 0000). Then
 * the leftmost unequal pair copies the other way: its right digit is non-zero,
 * so the target is a serial and the count stays minimal.
 */
function radarMiss(): NearMiss {
  const left = serialBcd >>> 16;
  if (serialHi !== 0) return missTo((left << 16) | bcdOf![reversedOf[serialHi]!]!);
  for (let i = 0; i < 4; i++) {
    const d = (serialBcd >>> (4 * i)) & 15;
    if (d !== 0) return missTo((d << (4 * (7 - i))) | (d << (4 * i)));
  }
  return missTo(serialBcd);
}

function repeaterMiss(): NearMiss {
  const left = serialBcd >>> 16;
  if (serialHi !== 0) return missTo((left << 16) | left);
  for (let i = 0; i < 4; i++) {
    const d = (serialBcd >>> (4 * (3 - i))) & 15;
    if (d !== 0) return missTo((d << (4 * (7 - i))) | (d << (4 * (3 - i))));
  }
  return missTo(serialBcd);
}

const LADDER_BCD = [0x01234567, 0x12345678, 0x23456789, 0x76543210, 0x87654321 | 0, 0x98765432 | 0];

function ladderMiss(): NearMiss {
  let best = LADDER_BCD[0]!;
  let bestDistance = 9;
  for (const ladder of LADDER_BCD) {
    const distance = distanceOf[nibbleMask(serialBcd ^ ladder)]!;
    if (distance < bestDistance) {
      bestDistance = distance;
      best = ladder;
    }
  }
  return missTo(best);
}


/** The digit at 1-based position p (d1 in the top nibble). */
function digitAt(p: number): number {
  return (serialBcd >>> (4 * (8 - p))) & 15;
}

/**
 * Outer digit a at both ends, inner digit b six times, a ≠ b: every (a, b) is
 * tried (90 targets, a few operations each) and the cheapest kept, ties to the
 * smaller inner digit, then the smaller outer one.
 */
function superRadarMiss(): NearMiss {
  const inner = new Uint8Array(10);
  for (let p = 2; p <= 7; p++) inner[digitAt(p)]!++;
  const first = digitAt(1);
  const last = digitAt(8);
  let best = 0;
  let bestDistance = 9;
  for (let b = 0; b <= 9; b++) {
    for (let a = 0; a <= 9; a++) {
      if (a === b) continue;
      const distance = 6 - inner[b]! + (first === a ? 0 : 1) + (last === a ? 0 : 1);
      if (distance < bestDistance) {
        bestDistance = distance;
        best = (a << 28) | Math.imul(b, 0x0111111) << 4 | a;
      }
    }
  }
  return missTo(best | 0);
}

/**
 * Only 0s and 1s, both present: every other digit becomes the more frequent of
 * 0 and 1 (0 on a tie); when one of them would be missing, the rightmost
 * changed position (or else the rightmost digit) takes it.
 */
function trueBinaryMiss(): NearMiss {
  const zeros = countOf(0);
  const ones = countOf(1);
  const fill = ones > zeros ? 1 : 0;
  let target = 0;
  let lastChanged = -1;
  for (let p = 1; p <= 8; p++) {
    const d = digitAt(p);
    const kept = d === 0 || d === 1 ? d : fill;
    if (kept !== d) lastChanged = p;
    target = (target << 4) | kept;
  }
  const hasZero = zeros > 0 || (fill === 0 && lastChanged > 0);
  const hasOne = ones > 0 || (fill === 1 && lastChanged > 0);
  if (!hasZero || !hasOne) {
    const missing = hasZero ? 1 : 0;
    const p = lastChanged > 0 ? lastChanged : 8;
    const shift = 4 * (8 - p);
    target = (target & ~(15 << shift)) | (missing << shift);
  }
  return missTo(target | 0);
}

/** Every near miss of a value already known to be a serial. */
export function nearMissesOfValue(value: number): Record<NearMissPatternId, NearMiss> {
  load(value);
  return {
    binary: exactlyKMiss(2),
    trinary: exactlyKMiss(3),
    solid: solidMiss(),
    radar: radarMiss(),
    repeater: repeaterMiss(),
    ladder: ladderMiss(),
    'super-radar': superRadarMiss(),
    'true-binary': trueBinaryMiss(),
  };
}

/**
 * How close a serial comes to binary, trinary, solid, radar, repeater,
 * ladder, super radar and true binary: for each, the fewest digit changes that reach a member (`distance`),
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
