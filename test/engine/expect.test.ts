import { jStat } from 'jstat';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { EXPECTED_CAVEAT, PATTERN_IDS, expectedHits, patternCount, poissonTail } from '../../shared/engine';

describe('poissonTail', () => {
  it('when the mean is 2 and at least 3 are seen, then P = 1 − 0.6767 = 0.3233 (New Cambridge Statistical Tables, Lindley & Scott, Table 2, P(X ≤ 2 | μ = 2) = 0.6767; the table value is quoted from memory)', () => {
    expect(1 - poissonTail(3, 2)).toBeCloseTo(0.6767, 4);
  });

  it('when the mean is 1 and at least 1 is seen, then P = 1 − e^−1 = 0.6321 (same table, μ = 1, r = 0: 0.3679, from memory)', () => {
    expect(poissonTail(1, 1)).toBeCloseTo(1 - 0.3679, 4);
  });

  // jstat sums mean^k / k! term by term, which overflows once mean^k passes ~1e308 (k ≈ 167 at mean 72),
  // so the comparison stays where jstat itself is exact: mean ≤ 50 and k ≤ 120.
  it('when compared with the jstat statistics package over many means and counts, then the tails agree to 1e-9 (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.001, max: 50, noNaN: true }), fc.integer({ min: 1, max: 120 }), (mean, k) => {
        const reference = 1 - jStat.poisson.cdf(k - 1, mean);
        expect(Math.abs(poissonTail(k, mean) - reference)).toBeLessThan(1e-9);
      }),
      { numRuns: 500 },
    );
  });

  it('when nothing is required (k = 0), then the tail is 1; when the mean is 0 and one is required, then it is 0', () => {
    expect(poissonTail(0, 3.5)).toBe(1);
    expect(poissonTail(1, 0)).toBe(0);
  });

  it('when the mean is large, then the tail stays a probability and follows the normal approximation in the middle', () => {
    const mean = 6955.2;
    const p = poissonTail(Math.round(mean), mean);
    expect(p).toBeGreaterThan(0.49);
    expect(p).toBeLessThan(0.51);
    expect(poissonTail(8000, mean)).toBeLessThan(1e-30);
  });

  it('when given a negative mean or a non-number, then it refuses with a RangeError', () => {
    expect(() => poissonTail(1, -1)).toThrow(RangeError);
    expect(() => poissonTail(Number.NaN, 1)).toThrow(RangeError);
  });
});

describe('expectedHits', () => {
  it('when 100,000 notes are searched, then each pattern is expected notes × count ÷ 99,999,999 times', () => {
    const result = expectedHits(100_000);
    for (const row of result.rows) {
      expect(row.expected).toBeCloseTo((100_000 * patternCount(row.id)) / 99_999_999, 12);
      expect(row.actual).toBeNull();
      expect(row.pAtLeast).toBeNull();
    }
    expect(result.rows.map((r) => r.id)).toEqual([...PATTERN_IDS]);
  });

  it('when actual counts are given, then each gets the Poisson probability of at least that many', () => {
    const result = expectedHits(10_000, { binary: 3, trinary: 0 });
    const binary = result.rows.find((r) => r.id === 'binary')!;
    expect(binary.actual).toBe(3);
    expect(binary.pAtLeast).toBeCloseTo(1 - jStat.poisson.cdf(2, binary.expected), 10);
    expect(result.rows.find((r) => r.id === 'trinary')!.pAtLeast).toBe(1);
  });

  it('when the low limit changes, then the expected low count follows it', () => {
    const low = (lowLimit: 9 | 99999) => expectedHits(1_000_000, {}, { lowLimit }).rows.find((r) => r.id === 'low')!.expected;
    expect(low(99999) / low(9)).toBeCloseTo(99999 / 9, 6);
  });

  it('when any expectation is given, then it carries the caveat that sequential straps are not independent draws', () => {
    const result = expectedHits(100);
    expect(result.caveat).toBe(EXPECTED_CAVEAT);
    expect(result.caveat).toMatch(/sequential/);
    expect(result.caveat).toMatch(/not independent/);
  });

  it('when notes is negative or fractional, then it refuses with a RangeError', () => {
    expect(() => expectedHits(-1)).toThrow(RangeError);
    expect(() => expectedHits(2.5)).toThrow(RangeError);
  });
});
