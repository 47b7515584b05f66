import {
  describeNearMiss,
  NEAR_MISS_PATTERN_IDS,
  NEIGHBOUR_PATTERN_IDS,
  PATTERN_NAMES,
  type NeighbourPatternId,
  type Reading,
  type WeightTable,
} from '@shared/engine';
import { countOf } from '@/lib/format';

export interface NearMissLine {
  key: string;
  text: string;
  distance: number;
  positions: number[];
}

export interface NeighbourLine {
  key: string;
  text: string;
  notesAway: number;
  serial: string;
}

/** Near misses worth a glance: one or two digits away from a pattern the note doesn't have. */
export function nearMissLines(reading: Reading, maxDistance = 2): NearMissLine[] {
  const lines: NearMissLine[] = [];
  for (const id of NEAR_MISS_PATTERN_IDS) {
    const miss = reading.nearMiss[id];
    if (miss.distance >= 1 && miss.distance <= maxDistance && !reading.patterns.includes(id)) {
      lines.push({ key: id, text: describeNearMiss(id, miss), distance: miss.distance, positions: miss.positions });
    }
  }
  for (const watch of reading.watch) {
    if (!watch.matched && watch.nearMiss.distance >= 1 && watch.nearMiss.distance <= maxDistance) {
      lines.push({ key: `watch:${watch.text}`, text: describeNearMiss(watch.pattern, watch.nearMiss), distance: watch.nearMiss.distance, positions: watch.nearMiss.positions });
    }
  }
  return lines.sort((a, b) => a.distance - b.distance);
}

const plural = (n: number) => countOf(n, 'note');

/**
 * The nearest members of the patterns the hunter gives weight to, closest first:
 * "next radar in 412 notes" in a sequential strap tells whether to keep counting.
 */
export function neighbourLines(reading: Reading, weights: WeightTable, limit = 4): NeighbourLine[] {
  const weighted = NEIGHBOUR_PATTERN_IDS.filter((id: NeighbourPatternId) => (weights.patterns[id] ?? 0) > 0);
  const lines: NeighbourLine[] = [];
  for (const id of weighted) {
    const { above, below } = reading.neighbours[id];
    if (above) lines.push({ key: `${id}-above`, text: `next ${PATTERN_NAMES[id]} in ${plural(above.notesAway)}`, notesAway: above.notesAway, serial: above.serial });
    if (below) lines.push({ key: `${id}-below`, text: `last ${PATTERN_NAMES[id]} ${plural(below.notesAway)} back`, notesAway: below.notesAway, serial: below.serial });
  }
  return lines.sort((a, b) => a.notesAway - b.notesAway).slice(0, limit);
}
