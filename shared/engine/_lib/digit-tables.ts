/**
 * Per-half tables: a serial is split into its first and last four digits
 * (hi = value / 10000, lo = value % 10000), and every pattern test becomes one
 * or two lookups on 10,000-entry tables instead of eight divisions.
 */
export interface DigitTables {
  /** Bit d set when digit d occurs in the 4-digit block (leading zeros count). */
  digitMask: Uint16Array;
  /** The block read backwards: 0012 → 2100. */
  reversed: Uint16Array;
  /** The block turned 180° (read backwards, 6↔9), or -1 when a digit has no turned form. */
  turned: Int16Array;
  /** Number of set bits of a 10-bit digit mask. */
  popcount: Uint8Array;
}

const TURN = [0, 1, -1, -1, -1, -1, 9, -1, 8, 6] as const;

let tables: DigitTables | null = null;

function build(): DigitTables {
  const digitMask = new Uint16Array(10000);
  const reversed = new Uint16Array(10000);
  const turned = new Int16Array(10000);
  for (let h = 0; h < 10000; h++) {
    const a = (h / 1000) | 0;
    const b = ((h / 100) | 0) % 10;
    const c = ((h / 10) | 0) % 10;
    const d = h % 10;
    digitMask[h] = (1 << a) | (1 << b) | (1 << c) | (1 << d);
    reversed[h] = d * 1000 + c * 100 + b * 10 + a;
    const ta = TURN[a];
    const tb = TURN[b];
    const tc = TURN[c];
    const td = TURN[d];
    turned[h] = ta < 0 || tb < 0 || tc < 0 || td < 0 ? -1 : td * 1000 + tc * 100 + tb * 10 + ta;
  }
  const popcount = new Uint8Array(1024);
  for (let m = 1; m < 1024; m++) popcount[m] = popcount[m >> 1]! + (m & 1);
  return { digitMask, reversed, turned, popcount };
}

export function digitTables(): DigitTables {
  tables ??= build();
  return tables;
}

/** The turned form of one digit, or -1. */
export function turnDigit(d: number): number {
  return TURN[d as 0] ?? -1;
}
