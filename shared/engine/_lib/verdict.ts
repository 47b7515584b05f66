import type { ChanceVerdict } from '../types';

/** Two-sided screen at the 95% level: each tail is judged against 5%. */
export const VERDICT_LEVEL = 0.05;

/**
 * The verdict for one count, from its two tails and the chance of the most
 * extreme outcome on the side the count lies: when even that outcome is more
 * likely than the level, no count on that side could be called unusual, so
 * the honest answer is "no comparison", not "fewer" (or "more").
 */
export function verdictOf(pAtLeast: number, pAtMost: number, pLowest: number, pHighest: number, belowMean: boolean): ChanceVerdict {
  if (pAtLeast <= VERDICT_LEVEL) return 'more';
  if (pAtMost <= VERDICT_LEVEL) return 'fewer';
  if (belowMean ? pLowest > VERDICT_LEVEL : pHighest > VERDICT_LEVEL) return 'no-comparison';
  return 'as-chance';
}
