import type { SerialInput } from '../types';

export const DOMAIN_FIRST = 1;
export const DOMAIN_LAST = 99_999_999;
export const DOMAIN_SIZE = DOMAIN_LAST - DOMAIN_FIRST + 1;

function isEightDigits(text: string): boolean {
  if (text.length !== 8) return false;
  for (let i = 0; i < 8; i++) {
    const c = text.charCodeAt(i);
    if (c < 48 || c > 57) return false;
  }
  return true;
}

/**
 * The value of an 8-digit string or a serial number, or -1 when it is neither
 * (00000000 included: it is not a serial).
 */
export function serialValueOrMinusOne(input: SerialInput): number {
  if (typeof input === 'number') {
    return Number.isInteger(input) && input >= DOMAIN_FIRST && input <= DOMAIN_LAST ? input : -1;
  }
  if (typeof input !== 'string' || !isEightDigits(input)) return -1;
  let v = 0;
  for (let i = 0; i < 8; i++) v = v * 10 + (input.charCodeAt(i) - 48);
  return v === 0 ? -1 : v;
}

/**
 * The value of a serial given as 8 digits or a number. Throws RangeError for
 * anything else: the engine's calculators take serials, user text goes
 * through `parseSerial`/`read`, which never throw.
 */
export function serialValue(input: SerialInput, fn: string): number {
  const v = serialValueOrMinusOne(input);
  if (v < 0) {
    throw new RangeError(
      `${fn}: expected a serial as 8 digits ("00000001"…"99999999") or a number 1…99999999, got ${describe(input)}`,
    );
  }
  return v;
}

function describe(input: unknown): string {
  if (typeof input === 'string') return JSON.stringify(input.length > 40 ? `${input.slice(0, 40)}…` : input);
  return String(input);
}

/** 8-digit text of a value 0…99,999,999. */
export { digitText as toDigits } from './digit-text';

/** The 8 digits of a value, leftmost first, into a fresh array. */
export function digitsOf(value: number): number[] {
  const out = new Array<number>(8);
  let v = value;
  for (let i = 7; i >= 0; i--) {
    out[i] = v % 10;
    v = (v / 10) | 0;
  }
  return out;
}
