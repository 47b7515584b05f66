import { DEFAULT_WEIGHTS } from './score';
import type { WeightTable } from './types';

/**
 * A weight table with every field the engine knows: a table saved before a
 * pattern or bonus existed gets the default for it, so new patterns score for
 * everyone while every weight the user set stays as they set it. Never
 * mutates its input.
 *
 * @example
 * completeWeights({ ...oldTable }).patterns['super-radar'] // 3 when the old table had none
 */
export function completeWeights(table: Partial<WeightTable> | null | undefined): WeightTable {
  const given = table !== null && typeof table === 'object' ? table : {};
  return {
    ...DEFAULT_WEIGHTS,
    ...given,
    patterns: { ...DEFAULT_WEIGHTS.patterns, ...(given.patterns ?? {}) },
    runs: { ...(given.runs ?? DEFAULT_WEIGHTS.runs) },
    counts: { ...(given.counts ?? DEFAULT_WEIGHTS.counts) },
  };
}
