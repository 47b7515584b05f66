import type { PatternId } from '../types';

/**
 * Canonical order of pattern ids; bit i of a pattern mask is PATTERN_ORDER[i].
 * This is the one list the contracts and the server's stored `pattern_mask`
 * columns derive from. Stored masks keep their meaning only while existing ids
 * keep their places: new patterns go at the end, never in between.
 */
export const PATTERN_ORDER = [
  'solid',
  'ladder',
  'radar',
  'repeater',
  'super-repeater',
  'rotator',
  'binary',
  'trinary',
  'low',
  'high',
  'super-radar',
  'true-binary',
] as const satisfies readonly PatternId[];

export const BIT = {
  solid: 1 << 0,
  ladder: 1 << 1,
  radar: 1 << 2,
  repeater: 1 << 3,
  'super-repeater': 1 << 4,
  rotator: 1 << 5,
  binary: 1 << 6,
  trinary: 1 << 7,
  low: 1 << 8,
  high: 1 << 9,
  'super-radar': 1 << 10,
  'true-binary': 1 << 11,
} as const satisfies Record<PatternId, number>;

export const ALL_BITS = (1 << PATTERN_ORDER.length) - 1;

/** Number of distinct masks: tables indexed by mask have this many entries. */
export const MASK_COUNT = ALL_BITS + 1;

const ID_SET: ReadonlySet<string> = new Set(PATTERN_ORDER);

export function isPatternId(value: unknown): value is PatternId {
  return typeof value === 'string' && ID_SET.has(value);
}

// Masks are small (12 bits), so every possible id list is precomputed once and shared;
// callers get a fresh copy so no one can mutate the cache.
let idLists: PatternId[][] | null = null;

function buildIdLists(): PatternId[][] {
  const lists: PatternId[][] = [];
  for (let mask = 0; mask <= ALL_BITS; mask++) {
    const ids: PatternId[] = [];
    for (let i = 0; i < PATTERN_ORDER.length; i++) if (mask & (1 << i)) ids.push(PATTERN_ORDER[i]!);
    lists.push(ids);
  }
  return lists;
}

export function maskToIds(mask: number): PatternId[] {
  idLists ??= buildIdLists();
  return idLists[mask & ALL_BITS]!.slice();
}

export function idsToMask(ids: readonly PatternId[]): number {
  let mask = 0;
  for (const id of ids) mask |= BIT[id];
  return mask;
}
