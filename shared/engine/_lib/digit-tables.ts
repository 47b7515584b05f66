/**
 * Per-half tables: a serial is split into its first and last four digits
 * (hi = value / 10000, lo = value % 10000), and most questions become one or
 * two lookups on 10,000-entry tables instead of eight divisions. Digits are
 * also packed as BCD (one 4-bit nibble per digit, d1 in the top nibble), so
 * comparisons of whole serials are a XOR and a few masks.
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
  /** The block as 16-bit BCD: 0123 → 0x0123. */
  bcd: Uint16Array;
  /** Counts of digits 0–7 in the block, one nibble each (digit d at bits 4d…4d+3). */
  countsLow: Uint32Array;
  /** Counts of digits 8 and 9 in the block (nibbles 0 and 1). */
  countsHigh: Uint8Array;
  /** 4-digit text by BCD value ('' for codes that are not BCD). */
  textByBcd: string[];
}

const TURN = [0, 1, -1, -1, -1, -1, 9, -1, 8, 6] as const;

let tables: DigitTables | null = null;

/** One in digit d's nibble of the low counts word (digits 0–7), else 0; a power of two, not a shift, above bit 30. */
function nibbleCount(digit: number): number {
  return digit < 8 ? 2 ** (4 * digit) : 0;
}

function build(): DigitTables {
  const digitMask = new Uint16Array(10000);
  const reversed = new Uint16Array(10000);
  const turned = new Int16Array(10000);
  const bcd = new Uint16Array(10000);
  const countsLow = new Uint32Array(10000);
  const countsHigh = new Uint8Array(10000);
  const textByBcd = new Array<string>(65536).fill('');
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
    bcd[h] = (a << 12) | (b << 8) | (c << 4) | d;
    countsLow[h] = nibbleCount(a) + nibbleCount(b) + nibbleCount(c) + nibbleCount(d);
    countsHigh[h] = (a >= 8 ? 1 << (4 * (a - 8)) : 0) + (b >= 8 ? 1 << (4 * (b - 8)) : 0) +
      (c >= 8 ? 1 << (4 * (c - 8)) : 0) + (d >= 8 ? 1 << (4 * (d - 8)) : 0);
    textByBcd[bcd[h]!] = `${a}${b}${c}${d}`;
  }
  const popcount = new Uint8Array(1024);
  for (let m = 1; m < 1024; m++) popcount[m] = popcount[m >> 1]! + (m & 1);
  return { digitMask, reversed, turned, popcount, bcd, countsLow, countsHigh, textByBcd };
}

export function digitTables(): DigitTables {
  tables ??= build();
  return tables;
}
