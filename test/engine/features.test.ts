import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { features, lowTier } from '../../shared/engine';
import { pad8 } from './_oracles';

function plainLongestRun(s: string): number {
  let best = 1;
  let current = 1;
  for (let i = 1; i < s.length; i++) {
    current = s[i] === s[i - 1] ? current + 1 : 1;
    best = Math.max(best, current);
  }
  return best;
}

function plainMaxCount(s: string): number {
  const counts = new Map<string, number>();
  for (const c of s) counts.set(c, (counts.get(c) ?? 0) + 1);
  return Math.max(...counts.values());
}

describe('features', () => {
  it('when a serial has a run of three or more of one digit, then the run feature names the digit, length and 1-based start', () => {
    const f = features('00777012');
    expect(f.longestRun).toBe(3);
    expect(f.run).toEqual({ digit: 7, length: 3, start: 3 });
  });

  it('when the longest run is two, then there is no run feature', () => {
    expect(features('11223344').run).toBeNull();
    expect(features('11223344').longestRun).toBe(2);
  });

  it('when two runs tie for longest, then the leftmost is reported', () => {
    expect(features('11123332').run).toEqual({ digit: 1, length: 3, start: 1 });
  });

  it('when one digit appears four or more times anywhere, then the count feature names it', () => {
    const f = features('50515253');
    expect(f.maxDigitCount).toBe(4);
    expect(f.count).toEqual({ digit: 5, times: 4 });
    expect(features('12312312').count).toBeNull();
  });

  it('when two digits tie for most frequent, then the smaller digit is named', () => {
    expect(features('91919191').count).toEqual({ digit: 1, times: 4 });
  });

  it('when the value is small, then lowTier is the smallest of 9, 99, 999, 9,999, 99,999 it fits under', () => {
    const tiers = [1, 9, 10, 99, 100, 999, 1000, 9999, 10000, 99999, 100000].map(lowTier);
    expect(tiers).toEqual([9, 9, 99, 99, 999, 999, 9999, 9999, 99999, 99999, null]);
    expect(features('00000042').lowTier).toBe(99);
  });

  it('when any serial is read, then distinct digits, longest run and max count match plain counting (property)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 99_999_999 }), (n) => {
        const s = pad8(n);
        const f = features(s);
        expect(f.distinctDigits).toBe(new Set(s).size);
        expect(f.longestRun).toBe(plainLongestRun(s));
        expect(f.maxDigitCount).toBe(plainMaxCount(s));
        expect(f.run !== null).toBe(f.longestRun >= 3);
        expect(f.count !== null).toBe(f.maxDigitCount >= 4);
      }),
      { numRuns: 2000 },
    );
  });
});
