/** Helpers for serials packed as BCD: one nibble per digit, d1 in the top nibble. */

/** Bit i set when nibble i (i = 0 for d8) of x is non-zero. */
export function nibbleMask(x: number): number {
  const n = (x | (x >>> 1) | (x >>> 2) | (x >>> 3)) & 0x11111111;
  return (
    (n & 1) |
    ((n >>> 3) & 2) |
    ((n >>> 6) & 4) |
    ((n >>> 9) & 8) |
    ((n >>> 12) & 16) |
    ((n >>> 15) & 32) |
    ((n >>> 18) & 64) |
    ((n >>> 21) & 128)
  );
}
