import { BIT, PATTERN_ORDER, maskToIds } from './_lib/pattern-bits';
import { digitTables } from './_lib/digit-tables';
import { serialValue } from './_lib/serial-value';
import type { LowLimit, PatternId, SerialInput } from './types';

/**
 * Every pattern id in canonical order: the engine's first ten (rarest-looking
 * first, bands last), then the trade patterns added later. Bit i of every
 * pattern mask, stored ones included, is PATTERN_IDS[i]; the contracts' enum
 * and the server's bit masks derive from this list.
 */
export const PATTERN_IDS = PATTERN_ORDER;

/** Display names, as a hunter says them. */
export const PATTERN_NAMES: Readonly<Record<PatternId, string>> = {
  solid: 'solid',
  ladder: 'ladder',
  radar: 'radar',
  repeater: 'repeater',
  'super-repeater': 'super repeater',
  rotator: 'rotator',
  binary: 'binary',
  trinary: 'trinary',
  low: 'low serial',
  high: 'high serial',
  'super-radar': 'super radar',
  'true-binary': 'true binary',
};

/** One-line definitions the app can show beside each pattern. */
export const PATTERN_DEFINITIONS: Readonly<Record<PatternId, string>> = {
  solid: 'all eight digits the same, e.g. 44444444',
  ladder: 'steps of +1 or −1 through all eight digits: 01234567, 12345678, 23456789 and the same backwards',
  radar: 'reads the same backwards (a palindrome), e.g. 38055083',
  repeater: 'the first four digits repeated, e.g. 47104710',
  'super-repeater': 'one two-digit block four times, e.g. 27272727',
  rotator: 'reads the same turned 180°: digits 0 1 6 8 9 only, with 6 and 9 trading places, e.g. 10688901',
  binary: 'exactly two different digits, e.g. 30033303',
  trinary: 'exactly three different digits, e.g. 52252922',
  low: 'at or below the low limit (9, 99, 999, 9,999 or 99,999; 999 unless the weight table says otherwise)',
  high:
    'at or above 99,990,000: past every circulating run end (96,000,000 for $1–$20, 99,200,000 for $50 and $100), so uncut-sheet territory rather than a strap find',
  'super-radar': 'a radar whose six inner digits are one digit, e.g. 38888883 (90 serials)',
  'true-binary':
    'a binary of the digits 0 and 1 only, e.g. 10011001 (254 serials); many sellers call only these "binary", so a "binary" here is the wider pattern of any two digits',
};

/** The low limits a weight table may choose, smallest first. */
export const LOW_LIMITS: readonly LowLimit[] = [9, 99, 999, 9999, 99999];

export const DEFAULT_LOW_LIMIT: LowLimit = 999;

/** Smallest high serial. */
export const HIGH_FROM = 99_990_000;

/** The six ladders, ascending. */
export const LADDERS: readonly number[] = [1234567, 12345678, 23456789, 76543210, 87654321, 98765432];

/**
 * True when `value` is one of the allowed low limits.
 *
 * @example
 * isLowLimit(9999) // true
 * isLowLimit(500) // false
 */
export function isLowLimit(value: unknown): value is LowLimit {
  return value === 9 || value === 99 || value === 999 || value === 9999 || value === 99999;
}

// Bit values repeated here as plain constants (not imported) because this is the
// hottest function of the engine: under CommonJS interop every imported binding
// is a getter call, which tripled its cost. The test suite checks they agree with
// PATTERN_IDS order through classify.
const SOLID = 1;
const LADDER = 2;
const RADAR = 4;
const REPEATER = 8;
const SUPER_REPEATER = 16;
const ROTATOR = 32;
const BINARY = 64;
const TRINARY = 128;
const LOW = 256;
const HIGH = 512;
const SUPER_RADAR = 1024;
const TRUE_BINARY = 2048;
/** Digit mask of {0, 1}: a binary with exactly these digits is a true binary. */
const ZERO_ONE = 3;

let digitMaskOf: Uint16Array | null = null;
let reversedOf: Uint16Array = new Uint16Array(0);
let turnedOf: Int16Array = new Int16Array(0);
let popcountOf: Uint8Array = new Uint8Array(0);

function loadTables(): Uint16Array {
  const t = digitTables();
  reversedOf = t.reversed;
  turnedOf = t.turned;
  popcountOf = t.popcount;
  digitMaskOf = t.digitMask;
  return t.digitMask;
}

/**
 * The pattern bit mask of a serial value (1…99,999,999), without building any
 * string or array: the hot path under `classify`, `sweep` and the census.
 * Bit order is PATTERN_IDS. The caller guarantees the value is a serial.
 *
 * @example
 * patternMask(12121212, 999) // bits of repeater, super-repeater, binary
 */
export function patternMask(value: number, lowLimit: number = DEFAULT_LOW_LIMIT): number {
  const dm = digitMaskOf ?? loadTables();
  const hi = (value / 10000) | 0;
  const lo = value - hi * 10000;
  const digits = dm[hi]! | dm[lo]!;
  const distinct = popcountOf[digits]!;
  let mask = 0;
  if (distinct === 1) mask = SOLID;
  else if (distinct === 2) {
    mask = digits === ZERO_ONE ? BINARY | TRUE_BINARY : BINARY;
    // A binary radar whose 2nd–4th digits agree has one inner digit: d1 bbbbbb d1, d1 ≠ b.
    if (reversedOf[hi] === lo && (hi % 1000) % 111 === 0) mask |= SUPER_RADAR;
  } else if (distinct === 3) mask = TRINARY;
  else if (distinct === 8) {
    if (
      value === 12345678 ||
      value === 23456789 ||
      value === 1234567 ||
      value === 98765432 ||
      value === 87654321 ||
      value === 76543210
    ) {
      mask = LADDER;
    }
  }
  if (reversedOf[hi] === lo) mask |= RADAR;
  if (hi === lo) {
    mask |= REPEATER;
    if (hi % 101 === 0) mask |= SUPER_REPEATER;
  }
  if (turnedOf[hi] === lo) mask |= ROTATOR;
  if (value <= lowLimit) mask |= LOW;
  if (value >= HIGH_FROM) mask |= HIGH;
  return mask;
}

/**
 * The patterns a serial has, in PATTERN_IDS order. Throws RangeError when the
 * input is not 8 digits / a number 1…99,999,999 (user text goes through `read`)
 * or the low limit is not one of 9, 99, 999, 9999, 99999.
 *
 * @example
 * classify('12121212') // ['repeater', 'super-repeater', 'binary']
 * classify('00000500') // ['binary', 'low']
 * classify('00000500', { lowLimit: 99 }) // ['binary']
 */
export function classify(digits: SerialInput, options: { lowLimit?: LowLimit } = {}): PatternId[] {
  const value = serialValue(digits, 'classify');
  return maskToIds(patternMask(value, lowLimitOption(options.lowLimit, 'classify')));
}

function lowLimitOption(lowLimit: unknown, fn: string): LowLimit {
  if (lowLimit === undefined) return DEFAULT_LOW_LIMIT;
  if (!isLowLimit(lowLimit)) throw new RangeError(`${fn}: lowLimit must be 9, 99, 999, 9999 or 99999, got ${String(lowLimit)}`);
  return lowLimit;
}

/**
 * True when the serial has the pattern.
 *
 * @example
 * hasPattern('10688901', 'rotator') // true
 */
export function hasPattern(digits: SerialInput, pattern: PatternId, options: { lowLimit?: LowLimit } = {}): boolean {
  const value = serialValue(digits, 'hasPattern');
  const bit = BIT[pattern];
  if (bit === undefined) throw new RangeError(`hasPattern: unknown pattern ${String(pattern)}`);
  return (patternMask(value, lowLimitOption(options.lowLimit, 'hasPattern')) & bit) !== 0;
}
