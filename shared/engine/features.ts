import { nibbleMask } from './_lib/bcd';
import { digitTables } from './_lib/digit-tables';
import { serialValue } from './_lib/serial-value';
import type { Features, LowLimit, SerialInput } from './types';

/** Runs this long or longer count as the "runs" feature. */
export const RUN_MIN = 3;
/** A digit appearing this often or more counts as the "count" feature. */
export const COUNT_MIN = 4;

/**
 * The smallest low tier (9, 99, 999, 9,999, 99,999) the value is at or under, else null.
 *
 * @example
 * lowTier(500) // 999
 */
export function lowTier(value: number): LowLimit | null {
  if (value > 99999) return null;
  return value <= 9 ? 9 : value <= 99 ? 99 : value <= 999 ? 999 : value <= 9999 ? 9999 : 99999;
}

/**
 * For each 7-bit mask of equal neighbours (bit j: digit j from the right
 * equals digit j+1), the longest run and the nibble where its leftmost
 * instance starts; built once.
 */
let runLengthOf: Uint8Array | null = null;
let runTopOf: Uint8Array = new Uint8Array(0);

function buildRuns(): Uint8Array {
  const length = new Uint8Array(128);
  const top = new Uint8Array(128);
  for (let m = 0; m < 128; m++) {
    let best = 0;
    let bestTop = 7;
    let streak = 0;
    for (let j = 0; j < 7; j++) {
      streak = m & (1 << j) ? streak + 1 : 0;
      // ≥ so that, scanning right to left, the leftmost of equally long runs wins.
      if (streak > 0 && streak >= best) {
        best = streak;
        bestTop = j + 1;
      }
    }
    length[m] = best + 1;
    top[m] = best === 0 ? 7 : bestTop;
  }
  runTopOf = top;
  runLengthOf = length;
  return length;
}

/** Features of a value already known to be a serial (no validation: internal callers). */
export function featuresOfValue(value: number): Features {
  const t = digitTables();
  const runLength = runLengthOf ?? buildRuns();
  const v = value | 0;
  const hi = (v / 10000) | 0;
  const lo = v - hi * 10000;
  const bcd = (t.bcd[hi]! << 16) | t.bcd[lo]!;
  const equalNext = ~nibbleMask(bcd ^ (bcd >>> 4)) & 0x7f;
  const longest = runLength[equalNext]!;
  const top = runTopOf[equalNext]!;
  const countsLow = t.countsLow[hi]! + t.countsLow[lo]!;
  const countsHigh = t.countsHigh[hi]! + t.countsHigh[lo]!;
  let countDigit = 0;
  let maxCount = 0;
  for (let digit = 0; digit < 10; digit++) {
    const c = digit < 8 ? (countsLow >>> (4 * digit)) & 15 : (countsHigh >>> (4 * (digit - 8))) & 15;
    if (c > maxCount) {
      maxCount = c;
      countDigit = digit;
    }
  }
  return {
    distinctDigits: t.popcount[t.digitMask[hi]! | t.digitMask[lo]!]!,
    longestRun: longest,
    maxDigitCount: maxCount,
    lowTier: lowTier(v),
    run: longest >= RUN_MIN ? { digit: (bcd >>> (4 * top)) & 15, length: longest, start: 8 - top } : null,
    count: maxCount >= COUNT_MIN ? { digit: countDigit, times: maxCount } : null,
  };
}

/**
 * Digit features of a serial: distinct digits, the longest run of one digit,
 * the most frequent digit's count, the low tier, and the "runs" (≥ 3) and
 * "count" (≥ 4) features. Ties go to the leftmost run and the smallest digit.
 *
 * @example
 * features('00777012')
 * // { distinctDigits: 4, longestRun: 3, maxDigitCount: 3, lowTier: null,
 * //   run: { digit: 7, length: 3, start: 3 }, count: null }
 */
export function features(digits: SerialInput): Features {
  return featuresOfValue(serialValue(digits, 'features'));
}
