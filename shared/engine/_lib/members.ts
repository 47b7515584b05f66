import { LADDERS } from '../patterns';
import type { NeighbourPatternId } from '../types';
import { digitTables } from './digit-tables';

/**
 * Sorted member lists of every pattern that has neighbours, built on first use
 * and cached. Typed arrays keep the 695,520 trinaries in 2.8 MB and make
 * binary search cheap.
 */
const cache = new Map<NeighbourPatternId, Uint32Array>();

/** Members with exactly `k` distinct digits, ascending, by depth-first generation in digit order. */
function exactlyDistinct(k: number): Uint32Array {
  let out = new Uint32Array(1024);
  let size = 0;
  const push = (value: number): void => {
    if (size === out.length) {
      const grown = new Uint32Array(out.length * 2);
      grown.set(out);
      out = grown;
    }
    out[size++] = value;
  };
  const visit = (pos: number, value: number, mask: number, distinct: number): void => {
    if (pos === 8) {
      if (distinct === k && value !== 0) push(value);
      return;
    }
    const remainingAfter = 7 - pos;
    for (let d = 0; d < 10; d++) {
      const isNew = (mask & (1 << d)) === 0;
      const next = isNew ? distinct + 1 : distinct;
      // Prune prefixes that already use too many digits or can no longer reach k.
      if (next > k || next + remainingAfter < k) continue;
      visit(pos + 1, value * 10 + d, mask | (1 << d), next);
    }
  };
  visit(0, 0, 0, 0);
  return out.slice(0, size);
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
  }
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

/** Bytes held by the member lists built so far. */
export function memberBytes(): number {
  let bytes = 0;
  for (const list of cache.values()) bytes += list.byteLength;
  return bytes;
}
