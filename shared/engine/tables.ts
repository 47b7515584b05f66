import { digitText } from './_lib/digit-text';
import { nearMissesOfValue } from './near-miss';
import { warmNeighbourTables } from './neighbours';
import { warmOddsTables } from './odds';
import type { OddsOptions } from './odds';
import { featuresOfValue } from './features';

/**
 * Builds every lazy table now rather than on the first reading: the sorted
 * member lists with their bucket indexes and texts, the per-half digit tables
 * and the combination counts for the given low limit (999 by default). Call it
 * while a screen opens so the first keystroke reading is as quick as the rest.
 * Returns rough sizes, for the bench.
 *
 * @example
 * warmTables().combinations // 31: the combinations of patterns that occur with the default low limit
 */
export function warmTables(options: OddsOptions = {}): { neighbourBytes: number; combinations: number } {
  const neighbourBytes = warmNeighbourTables();
  const combinations = warmOddsTables(options);
  nearMissesOfValue(1);
  featuresOfValue(1);
  digitText(1);
  return { neighbourBytes, combinations };
}
