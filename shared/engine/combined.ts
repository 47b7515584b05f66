import { lnGamma } from './_lib/poisson';
import { DOMAIN_LAST } from './_lib/serial-value';
import { verdictOf } from './_lib/verdict';
import { expectedHits } from './expect';
import { patternCount } from './odds';
import { DEFAULT_LOW_LIMIT, PATTERN_IDS } from './patterns';
import { SEQUENTIAL_CAVEAT, runDistribution } from './sequential';
import type { ExpectedHits, ExpectedRow, LowLimit, PatternId } from './types';

/** One hunt's share of a tally: its notes, whether they were new and in sequence, and its domain (run end). */
export interface TallyPart {
  notes: number;
  inSequence: boolean;
  /** Last serial the run can reach: the denomination's run end (default 99,999,999). */
  domainLast?: number;
}

export const MIXED_CAVEAT =
  'These notes mix hunts of new notes in sequence with circulated ones. Each hunt in sequence counts as one run ' +
  'compared with every run of its length from every starting serial; circulated notes count as independent draws ' +
  '(Poisson); the figures combine the two exactly.';

/** Masses this small are dropped from the ends: they cannot move a 5% verdict. */
const NEGLIGIBLE = 1e-16;
/** The longest run a distribution is built for (as the sweep). */
const MAX_RUN = 10_000_000;

interface Pmf {
  /** Count of the first entry. */
  offset: number;
  p: Float64Array;
}

function trimmed(offset: number, p: ArrayLike<number>): Pmf {
  let lo = 0;
  let hi = p.length - 1;
  while (lo < hi && p[lo]! < NEGLIGIBLE) lo++;
  while (hi > lo && p[hi]! < NEGLIGIBLE) hi--;
  return { offset: offset + lo, p: Float64Array.from({ length: hi - lo + 1 }, (_, i) => p[lo + i]!) };
}

function convolve(a: Pmf, b: Pmf): Pmf {
  const out = new Float64Array(a.p.length + b.p.length - 1);
  for (let i = 0; i < a.p.length; i++) {
    const x = a.p[i]!;
    if (x === 0) continue;
    for (let j = 0; j < b.p.length; j++) out[i + j]! += x * b.p[j]!;
  }
  return trimmed(a.offset + b.offset, out);
}

/** Poisson probabilities over mean ± 12 standard deviations, from logs so large means do not underflow. */
function poissonPmf(mean: number): Pmf {
  if (mean <= 0) return { offset: 0, p: Float64Array.of(1) };
  const spread = 12 * Math.sqrt(mean) + 12;
  const from = Math.max(0, Math.floor(mean - spread));
  const to = Math.ceil(mean + spread);
  const p = new Float64Array(to - from + 1);
  for (let k = from; k <= to; k++) p[k - from] = Math.exp(k * Math.log(mean) - mean - lnGamma(k + 1));
  return trimmed(from, p);
}

function rowFrom(id: PatternId, pmf: Pmf, expected: number, notes: number, actual: number | null, openTop: boolean): ExpectedRow {
  const row: ExpectedRow = { id, probability: notes > 0 ? expected / notes : 0, expected, actual, pAtLeast: null, pAtMost: null, verdict: null };
  if (actual === null) return row;
  let atMost = 0;
  let atLeast = 0;
  for (let i = 0; i < pmf.p.length; i++) {
    const k = pmf.offset + i;
    if (k <= actual) atMost += pmf.p[i]!;
    if (k >= actual) atLeast += pmf.p[i]!;
  }
  row.pAtLeast = Math.min(1, atLeast);
  row.pAtMost = Math.min(1, atMost);
  const lowest = pmf.p[0]!;
  const highest = openTop ? 0 : pmf.p[pmf.p.length - 1]!;
  row.verdict = verdictOf(row.pAtLeast, row.pAtMost, lowest, highest, actual < expected);
  return row;
}

/**
 * Finds over several hunts set against chance, each hunt compared the way its
 * notes came: a hunt of new notes in sequence as one run (`runDistribution`
 * for its length and run end), circulated notes as independent draws
 * (Poisson). The count's distribution is the exact sum of the parts
 * (convolution), so a verdict at the 95% level means the same thing however
 * the hunts were mixed. With no part in sequence it is `expectedHits`.
 *
 * @example
 * combinedHits([{ notes: 4000, inSequence: true }, { notes: 1000, inSequence: false }], { trinary: 40 })
 *   .rows.find((r) => r.id === 'trinary')?.verdict // 'as-chance'
 */
export function combinedHits(
  parts: readonly TallyPart[],
  actualCounts: Partial<Record<PatternId, number>> = {},
  options: { lowLimit?: LowLimit } = {},
): ExpectedHits {
  const lowLimit = options.lowLimit ?? DEFAULT_LOW_LIMIT;
  const notes = parts.reduce((sum, part) => sum + part.notes, 0);
  const circulated = parts.filter((part) => !part.inSequence).reduce((sum, part) => sum + part.notes, 0);
  const runs = parts.filter((part) => part.inSequence && part.notes > 0);
  if (runs.length === 0) return expectedHits(notes, actualCounts, { lowLimit });
  const rows = PATTERN_IDS.map((id) => {
    const given = actualCounts[id];
    const actual = typeof given === 'number' && Number.isInteger(given) && given >= 0 ? given : null;
    let pmf: Pmf = { offset: 0, p: Float64Array.of(1) };
    let expected = 0;
    for (const part of runs) {
      const last = part.domainLast ?? DOMAIN_LAST;
      const dist = runDistribution(id, Math.min(part.notes, last, MAX_RUN), { lowLimit, domainLast: last });
      pmf = convolve(pmf, trimmed(0, dist.probabilities));
      expected += dist.mean;
    }
    if (circulated > 0) {
      const mean = (circulated * patternCount(id, { lowLimit })) / DOMAIN_LAST;
      pmf = convolve(pmf, poissonPmf(mean));
      expected += mean;
    }
    return rowFrom(id, pmf, expected, notes, actual, circulated > 0);
  });
  return { notes, lowLimit, inSequence: true, rows, caveat: circulated > 0 ? MIXED_CAVEAT : SEQUENTIAL_CAVEAT };
}

