/** Runs of this many star notes or fewer count as small (TRADE.md: common practice). */
export const SMALL_STAR_RUN = 640_000;

/**
 * True for a run size a hunter recorded that counts as small.
 *
 * @example
 * isSmallStarRun(640_000) // true
 * isSmallStarRun(3_200_000) // false
 */
export function isSmallStarRun(size: number | null | undefined): boolean {
  return typeof size === 'number' && Number.isInteger(size) && size > 0 && size <= SMALL_STAR_RUN;
}
