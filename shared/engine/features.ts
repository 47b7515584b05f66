import { digitsOf, serialValue } from './_lib/serial-value';
import { LOW_LIMITS } from './patterns';
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
  for (const tier of LOW_LIMITS) if (value <= tier) return tier;
  return null;
}

/** Features of a value already known to be a serial (no validation: internal callers). */
export function featuresOfValue(value: number): Features {
  const d = digitsOf(value);
  const counts = [0, 0, 0, 0, 0, 0, 0, 0, 0, 0];
  let runDigit = d[0]!;
  let runLength = 1;
  let runStart = 0;
  let current = 1;
  counts[d[0]!]++;
  for (let i = 1; i < 8; i++) {
    counts[d[i]!]++;
    current = d[i] === d[i - 1] ? current + 1 : 1;
    // Strictly longer keeps the leftmost run on ties, so the result is deterministic.
    if (current > runLength) {
      runLength = current;
      runDigit = d[i]!;
      runStart = i - current + 1;
    }
  }
  let distinct = 0;
  let countDigit = 0;
  let maxCount = 0;
  for (let digit = 0; digit < 10; digit++) {
    const c = counts[digit]!;
    if (c > 0) distinct++;
    if (c > maxCount) {
      maxCount = c;
      countDigit = digit;
    }
  }
  return {
    distinctDigits: distinct,
    longestRun: runLength,
    maxDigitCount: maxCount,
    lowTier: lowTier(value),
    run: runLength >= RUN_MIN ? { digit: runDigit, length: runLength, start: runStart + 1 } : null,
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
