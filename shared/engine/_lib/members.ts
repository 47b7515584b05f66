import { LADDERS } from '../patterns';
import type { NeighbourPatternId } from '../types';
import { digitTables } from './digit-tables';

/**
 * Sorted member lists of every pattern that has neighbours, built on first use
 * and cached. Typed arrays keep the 695,520 trinaries in 2.8 MB and make
 * binary search cheap.
 */
const cache = new Map<NeighbourPatternId, Uint32Array>();

/**
 * Members with exactly `k` distinct digits, ascending. A serial hi·10⁴ + lo
 * qualifies when the digit sets of its halves together hold k digits, so for
 * each digit set of a first half the matching second halves are listed once
 * (ascending), and the first halves are walked in order: the output comes out
 * sorted with no sort and no per-serial test.
 */
function exactlyDistinct(k: number): Uint32Array {
  const t = digitTables();
  const { popcount, digitMask } = t;
  const secondHalves = new Array<Uint16Array | undefined>(1024);
  const scratch = new Uint16Array(10000);
  const matching = (firstMask: number): Uint16Array => {
    let list = secondHalves[firstMask];
    if (!list) {
      let n = 0;
      for (let lo = 0; lo < 10000; lo++) if (popcount[firstMask | digitMask[lo]!] === k) scratch[n++] = lo;
      list = scratch.slice(0, n);
      secondHalves[firstMask] = list;
    }
    return list;
  };
  // Sized exactly before filling: fresh memory is slow to touch, so no growing or trimming copies.
  let size = 0;
  for (let hi = 0; hi < 10000; hi++) {
    const mask = digitMask[hi]!;
    if (popcount[mask]! <= k) size += matching(mask).length;
  }
  const out = new Uint32Array(size);
  let at = 0;
  for (let hi = 0; hi < 10000; hi++) {
    const mask = digitMask[hi]!;
    if (popcount[mask]! > k) continue;
    const los = secondHalves[mask]!;
    const base = hi * 10000;
    for (let i = 0; i < los.length; i++) out[at++] = base + los[i]!;
  }
  // k ≥ 2 never yields 00000000 (one distinct digit), so nothing needs removing.
  return out;
}

function fromHalves(second: (hi: number) => number): Uint32Array {
  const out: number[] = [];
  for (let hi = 0; hi < 10000; hi++) {
    const lo = second(hi);
    if (lo < 0) continue;
    const value = hi * 10000 + lo;
    if (value !== 0) out.push(value);
  }
  return Uint32Array.from(out);
}

function build(pattern: NeighbourPatternId): Uint32Array {
  const t = digitTables();
  switch (pattern) {
    case 'solid':
      return Uint32Array.from([1, 2, 3, 4, 5, 6, 7, 8, 9], (d) => d * 11_111_111);
    case 'ladder':
      return Uint32Array.from(LADDERS);
    case 'radar':
      return fromHalves((hi) => t.reversed[hi]!);
    case 'repeater':
      return fromHalves((hi) => hi);
    case 'super-repeater':
      return fromHalves((hi) => (hi % 101 === 0 ? hi : -1));
    case 'rotator':
      return fromHalves((hi) => t.turned[hi]!);
    case 'binary':
      return exactlyDistinct(2);
    case 'trinary':
      return exactlyDistinct(3);
    case 'super-radar':
      return superRadars();
    case 'true-binary':
      return trueBinaries();
  }
}

/** a bbbbbb a with a ≠ b, ascending: 90 serials (a = 0 included: 01111110 is a serial). */
function superRadars(): Uint32Array {
  const out: number[] = [];
  for (let a = 0; a <= 9; a++) {
    for (let b = 0; b <= 9; b++) if (a !== b) out.push(a * 10_000_001 + b * 1_111_110);
  }
  return Uint32Array.from(out.sort((x, y) => x - y));
}

/** Every 8-digit string of 0s and 1s using both, ascending: 2^8 − 2 = 254. */
function trueBinaries(): Uint32Array {
  const out = new Uint32Array(254);
  let n = 0;
  for (let bits = 1; bits < 255; bits++) {
    let value = 0;
    for (let i = 7; i >= 0; i--) value = value * 10 + ((bits >> i) & 1);
    out[n++] = value;
  }
  return out;
}

export const NEIGHBOUR_PATTERNS: readonly NeighbourPatternId[] = [
  'solid',
  'ladder',
  'radar',
  'repeater',
  'super-repeater',
  'rotator',
  'binary',
  'trinary',
  'super-radar',
  'true-binary',
];

/** The sorted members of a pattern. Shared and cached: callers must not write to it. */
export function membersOf(pattern: NeighbourPatternId): Uint32Array {
  let list = cache.get(pattern);
  if (!list) {
    list = build(pattern);
    cache.set(pattern, list);
  }
  return list;
}

/** Index of the first member ≥ value (list.length when none). */
export function lowerBound(list: Uint32Array, value: number): number {
  let lo = 0;
  let hi = list.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (list[mid]! < value) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

