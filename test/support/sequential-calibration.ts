import { PATTERN_IDS, expectedHits, sequentialHits, sweep } from '../../shared/engine';
import type { PatternId } from '../../shared/engine';

type Tally = Record<PatternId, number>;

/**
 * The calibration TRADE.md asks for: random bricks of 4,000 new notes in sequence, each pattern's real count
 * judged at the 95% level. A sound test flags "more" (and "fewer") in at most 5% of bricks, plus sampling noise:
 * three standard errors of a 5% rate. The full 2,000 bricks run in `npm run bench`.
 */
export function calibrate(bricks: number, seed: number): { more: Tally; fewer: Tally; poissonMore: Tally; poissonFewer: Tally } {
  let state = seed >>> 0;
  const random = () => {
    state = (Math.imul(state, 1664525) + 1013904223) >>> 0;
    return state / 2 ** 32;
  };
  const runLength = 4000;
  const more = {} as Tally;
  const fewer = {} as Tally;
  const poissonMore = {} as Tally;
  const poissonFewer = {} as Tally;
  for (const id of PATTERN_IDS) more[id] = fewer[id] = poissonMore[id] = poissonFewer[id] = 0;
  const starts = 99_999_999 - runLength + 1;
  for (let b = 0; b < bricks; b++) {
    const first = 1 + Math.floor(random() * starts);
    const hits = sweep(first, runLength).hits;
    const actual: Partial<Record<PatternId, number>> = {};
    for (const id of PATTERN_IDS) actual[id] = 0;
    for (const h of hits) for (const id of h.patterns) actual[id]!++;
    for (const row of sequentialHits(runLength, actual).rows) {
      if (row.verdict === 'more') more[row.id]!++;
      if (row.verdict === 'fewer') fewer[row.id]!++;
    }
    for (const row of expectedHits(runLength, actual).rows) {
      if (row.verdict === 'more') poissonMore[row.id]!++;
      if (row.verdict === 'fewer') poissonFewer[row.id]!++;
    }
  }
  return { more, fewer, poissonMore, poissonFewer };
}

