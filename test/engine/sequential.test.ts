import { describe, expect, it } from 'vitest';
import { PATTERN_IDS, VERDICT_LEVEL, expectedHits, runDistribution, sequentialHits } from '../../shared/engine';
import { calibrate } from '../support/sequential-calibration';
import type { PatternId } from '../../shared/engine';
import { pad8, plainPatterns } from './_oracles';

/** Brute force: every start of a small domain, each run counted by the plain definitions. */
function plainDistribution(id: PatternId, runLength: number, last: number): number[] {
  const member = new Uint8Array(last + 1);
  for (let v = 1; v <= last; v++) member[v] = plainPatterns(pad8(v)).includes(id) ? 1 : 0;
  let inWindow = 0;
  for (let v = 1; v <= runLength; v++) inWindow += member[v]!;
  const counts: number[] = [];
  for (let s = 1; s + runLength - 1 <= last; s++) {
    if (s > 1) inWindow += member[s + runLength - 1]! - member[s - 1]!;
    counts[inWindow] = (counts[inWindow] ?? 0) + 1;
  }
  const starts = last - runLength + 1;
  return Array.from(counts, (n) => (n ?? 0) / starts);
}

describe('runDistribution', () => {
  it('when every start of a small domain is brute-forced, then the exact distribution agrees for each pattern', () => {
    const last = 120_000;
    for (const id of ['binary', 'trinary', 'radar', 'repeater', 'low', 'true-binary'] as const) {
      for (const runLength of [1, 100, 1000]) {
        const exact = runDistribution(id, runLength, { domainLast: last });
        const plain = plainDistribution(id, runLength, last);
        expect(exact.probabilities.length).toBe(plain.length);
        exact.probabilities.forEach((p, k) => expect(p).toBeCloseTo(plain[k]!, 12));
      }
    }
  }, 120_000);

  it('when a run of 100 is taken over the whole domain, then P(1 solid) = (8 × 100 + 1) ÷ 99,999,900 exactly: 99999999 is in the last run only', () => {
    const d = runDistribution('solid', 100);
    expect(d.starts).toBe(99_999_900);
    expect(d.probabilities[1]).toBeCloseTo((8 * 100 + 1) / 99_999_900, 15);
    expect(d.probabilities.length).toBe(2);
  });

  it('when the mean is taken, then it is close to notes × p (linearity of expectation, less the domain edges; TRADE.md)', () => {
    const d = runDistribution('trinary', 4000);
    expect(d.mean).toBeCloseTo((4000 * 695_520) / 99_999_999, 1);
    const total = d.probabilities.reduce((a, b) => a + b, 0);
    expect(total).toBeCloseTo(1, 12);
  });

  it('when a brick’s first four digits all differ, then it holds no trinary, so P(0 trinaries in 4,000) is large (TRADE.md)', () => {
    expect(runDistribution('trinary', 4000).probabilities[0]).toBeGreaterThan(0.3);
  });
});

describe('sequentialHits', () => {
  it('when a strap of 100 in sequence holds no radar, then it says no comparison, not "fewer than chance"', () => {
    const row = sequentialHits(100, { radar: 0 }).rows.find((r) => r.id === 'radar')!;
    expect(row.verdict).toBe('no-comparison');
    expect(row.pAtMost).toBe(runDistribution('radar', 100).probabilities[0]);
    expect(row.pAtMost).toBeGreaterThan(0.95);
  });

  it('when a strap holds a radar, then that is more than chance (about 1 strap in 100 does)', () => {
    const row = sequentialHits(100, { radar: 1 }).rows.find((r) => r.id === 'radar')!;
    expect(row.pAtLeast).toBeLessThan(VERDICT_LEVEL);
    expect(row.verdict).toBe('more');
  });

  it('when circulated notes are tallied, then Poisson still applies and says so', () => {
    const result = expectedHits(4000, { trinary: 10 });
    expect(result.inSequence).toBe(false);
    expect(result.rows.find((r) => r.id === 'trinary')!.verdict).toBe('fewer');
    const seq = sequentialHits(4000, { trinary: 10 });
    expect(seq.inSequence).toBe(true);
    expect(seq.rows.find((r) => r.id === 'trinary')!.verdict).not.toBe('fewer');
  });
});

describe('sequential calibration (smaller sample; the full 2,000 bricks are in the bench)', () => {
  it('when 300 random bricks of 4,000 are judged, then "more" and "fewer" each come up for at most 5% + 3 standard errors of bricks', () => {
    const bricks = 300;
    const { more, fewer } = calibrate(bricks, 12);
    const limit = bricks * (VERDICT_LEVEL + 3 * Math.sqrt((VERDICT_LEVEL * (1 - VERDICT_LEVEL)) / bricks));
    for (const id of PATTERN_IDS) {
      expect(more[id], `more for ${id}`).toBeLessThanOrEqual(limit);
      expect(fewer[id], `fewer for ${id}`).toBeLessThanOrEqual(limit);
    }
  }, 120_000);
});
