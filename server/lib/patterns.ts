import { PATTERN_IDS, PATTERN_NAMES } from '../../shared/engine';
import type { PatternId } from '../../shared/engine';

// The engine documents that bit i of patternMask is PATTERN_IDS[i]; the server stores masks in that order.
export const PATTERN_BIT: Readonly<Record<PatternId, number>> = Object.fromEntries(PATTERN_IDS.map((id, index) => [id, 1 << index])) as Record<
  PatternId,
  number
>;

export function maskOf(ids: readonly PatternId[]): number {
  let mask = 0;
  for (const id of ids) mask |= PATTERN_BIT[id];
  return mask;
}

export function idsOf(mask: number): PatternId[] {
  return PATTERN_IDS.filter((id) => (mask & PATTERN_BIT[id]) !== 0);
}

/** Every pattern bit but `low`, which tallies judge again against the caller's low limit. */
export const NON_LOW_MASK = PATTERN_IDS.reduce((mask, id) => (id === 'low' ? mask : mask | PATTERN_BIT[id]), 0);

export { PATTERN_IDS, PATTERN_NAMES };

/** Counts from PostgreSQL arrive as strings when they are bigint; every count here fits a JS number. */
export const int = (value: unknown): number => (value === null || value === undefined ? 0 : Number(value));

export const iso = (value: Date | string | null | undefined): string | null =>
  value === null || value === undefined ? null : (value instanceof Date ? value : new Date(value)).toISOString();
