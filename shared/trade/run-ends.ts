import { USPM_SERIALS } from './references';
import type { Sourced } from './types';

export interface RunEnd extends Sourced {
  denominations: readonly number[];
  /** Notes in one run of the press. */
  runSize: number;
  /** Last serial of a block on circulating notes: 15 runs of 6,400,000 or 31 of 3,200,000. */
  last: number;
  text: string;
}

const SOURCE = { source: 'common practice', reference: `the principle: ${USPM_SERIALS}; the run sizes are what hunters go by` } as const;

/** Where circulating notes stop in each block (TRADE.md: run sizes are common practice). */
export const RUN_ENDS: readonly RunEnd[] = [
  {
    denominations: [1, 2, 5, 10, 20],
    runSize: 6_400_000,
    last: 96_000_000,
    text: '$1–$20 notes are numbered in runs of 6,400,000, so a block stops at 96,000,000',
    ...SOURCE,
  },
  {
    denominations: [50, 100],
    runSize: 3_200_000,
    last: 99_200_000,
    text: '$50 and $100 notes are numbered in runs of 3,200,000, so a block stops at 99,200,000',
    ...SOURCE,
  },
];

/** The lowest run end of all: above it no circulating note of any denomination is certain. */
export const LOWEST_RUN_END = 96_000_000;
/** The highest run end of all: above it no circulating note exists. */
export const HIGHEST_RUN_END = 99_200_000;

/**
 * The run end that applies to a denomination, or null when it is not one we know.
 *
 * @example
 * runEndFor(20)?.last // 96000000
 * runEndFor(100)?.last // 99200000
 */
export function runEndFor(denomination: number | null | undefined): RunEnd | null {
  if (typeof denomination !== 'number') return null;
  return RUN_ENDS.find((r) => r.denominations.includes(denomination)) ?? null;
}
