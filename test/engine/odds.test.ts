import { combinations, factorial, stirlingS2 } from 'mathjs';
import { describe, expect, it } from 'vitest';
import {
  PATTERN_IDS,
  oddsOf,
  oddsTable,
  patternCount,
  repeatCount,
  runCount,
  signatureCount,
  signatureTable,
} from '../../shared/engine';
import type { PatternId } from '../../shared/engine';
import { repeatAtLeastStrings, runAtLeastStrings } from '../../shared/engine/_lib/combinatorics';
import { pad8, plainMembers, plainPatterns } from './_oracles';

const DOMAIN = 99_999_999;

describe('patternCount', () => {
  it('when binaries are counted, then they number C(10,2)·2!·S(8,2) = 45·2·127 = 11,430 (S(8,2) = 127: Abramowitz & Stegun, Table 24.4; OEIS A008277)', () => {
    const S82 = 127;
    expect(patternCount('binary')).toBe(45 * 2 * S82);
    expect(patternCount('binary')).toBe(11_430);
  });

  it('when trinaries are counted, then they number C(10,3)·3!·S(8,3) = 120·6·966 = 695,520 (S(8,3) = 966: Abramowitz & Stegun, Table 24.4; OEIS A008277)', () => {
    const S83 = 966;
    expect(patternCount('trinary')).toBe(120 * 6 * S83);
    expect(patternCount('trinary')).toBe(695_520);
  });

  it('when the mathjs library computes C(10,k)·k!·S(8,k), then it agrees for binaries and trinaries', () => {
    const viaMathjs = (k: number) => Number(combinations(10, k)) * Number(factorial(k)) * Number(stirlingS2(8, k));
    expect(Number(stirlingS2(8, 2))).toBe(127);
    expect(Number(stirlingS2(8, 3))).toBe(966);
    expect(patternCount('binary')).toBe(viaMathjs(2));
    expect(patternCount('trinary')).toBe(viaMathjs(3));
  });

  it('when binaries and trinaries are enumerated one by one from the definition, then there are as many as the formula says', () => {
    expect(plainMembers('binary').length).toBe(patternCount('binary'));
    expect(plainMembers('trinary').length).toBe(patternCount('trinary'));
  }, 60_000);

  it('when palindromes and repeaters are counted, then there are 10^4 − 1 = 9,999 of each (TRADE.md: 00000000 excluded)', () => {
    expect(patternCount('radar')).toBe(10 ** 4 - 1);
    expect(patternCount('repeater')).toBe(10 ** 4 - 1);
  });

  it('when rotators are counted, then there are 5^4 − 1 = 624 (TRADE.md: turned-180° numbers over {0,1,6,8,9})', () => {
    expect(patternCount('rotator')).toBe(5 ** 4 - 1);
  });

  it('when the rarest patterns are counted, then there are 9 solids, 6 ladders, 99 super repeaters and 10,000 highs', () => {
    expect(patternCount('solid')).toBe(plainMembers('solid').length);
    expect(patternCount('solid')).toBe(9);
    expect(patternCount('ladder')).toBe(6);
    expect(patternCount('super-repeater')).toBe(10 ** 2 - 1);
    expect(patternCount('high')).toBe(DOMAIN - 99_990_000 + 1);
  });

  it('when low is counted, then it is the low limit chosen (each limit its own count)', () => {
    const counts = ([9, 99, 999, 9999, 99999] as const).map((lowLimit) => patternCount('low', { lowLimit }));
    expect(counts).toEqual([9, 99, 999, 9999, 99999]);
    expect(patternCount('low')).toBe(999);
  });

  it('when the odds domain ends at 96,000,000 (TRADE.md, from memory), then counts cover only that domain', () => {
    const last = 96_000_000;
    expect(patternCount('high', { domainLast: last })).toBe(0);
    expect(patternCount('binary', { domainLast: last })).toBe(plainMembers('binary').filter((v) => v <= last).length);
    expect(patternCount('trinary', { domainLast: last })).toBe(plainMembers('trinary').filter((v) => v <= last).length);
    expect(patternCount('solid', { domainLast: last })).toBe(8);
  });

  it('when an option is out of range, then it refuses with a RangeError', () => {
    expect(() => patternCount('low', { lowLimit: 50 as never })).toThrow(RangeError);
    expect(() => patternCount('solid', { domainLast: 0 })).toThrow(RangeError);
    expect(() => patternCount('sevens' as PatternId)).toThrow(RangeError);
  });
});

describe('signatureCount and signatureTable', () => {
  /** Every serial with any pattern is in some member list; tally their plain signatures. */
  function plainSignatures(lowLimit: number, last = DOMAIN): Map<string, number> {
    const union = new Set<number>();
    for (const p of ['solid', 'ladder', 'radar', 'repeater', 'super-repeater', 'rotator', 'binary', 'trinary']) {
      for (const v of plainMembers(p)) if (v <= last) union.add(v);
    }
    for (let v = 1; v <= Math.min(lowLimit, last); v++) union.add(v);
    for (let v = 99_990_000; v <= last; v++) union.add(v);
    const tally = new Map<string, number>();
    for (const v of union) {
      const key = plainPatterns(pad8(v), lowLimit).join('+');
      tally.set(key, (tally.get(key) ?? 0) + 1);
    }
    tally.set('', last - union.size);
    return tally;
  }

  it('when every combination is tallied by brute force over the member lists, then the engine’s exact table agrees', () => {
    const expected = plainSignatures(999);
    const actual = new Map(signatureTable().map((row) => [row.ids.join('+'), row.count]));
    expect(actual).toEqual(expected);
  }, 60_000);

  it('when the low limit is 99,999 or the domain ends at 96,000,000, then the exact table still agrees with brute force', () => {
    const wide = new Map(signatureTable({ lowLimit: 99999 }).map((row) => [row.ids.join('+'), row.count]));
    expect(wide).toEqual(plainSignatures(99999));
    const short = new Map(signatureTable({ domainLast: 96_000_000 }).map((row) => [row.ids.join('+'), row.count]));
    expect(short).toEqual(plainSignatures(999, 96_000_000));
  }, 60_000);

  it('when the table is summed, then it covers the whole domain once', () => {
    for (const lowLimit of [9, 9999] as const) {
      const total = signatureTable({ lowLimit }).reduce((sum, row) => sum + row.count, 0);
      expect(total).toBe(DOMAIN);
    }
  });

  it('when a combination is asked with match "all", then it counts serials having at least those patterns', () => {
    const table = signatureTable();
    const wanted: PatternId[] = ['repeater', 'binary'];
    const expected = table.filter((row) => wanted.every((id) => row.ids.includes(id))).reduce((s, r) => s + r.count, 0);
    expect(signatureCount(wanted, { match: 'all' })).toBe(expected);
    expect(signatureCount([], { match: 'all' })).toBe(DOMAIN);
    for (const id of PATTERN_IDS) expect(signatureCount([id], { match: 'all' })).toBe(patternCount(id));
  });

  it('when 12121212’s combination is counted exactly, then it is the 90 two-digit super repeaters less the two rotators 69696969 and 96969696 and the two true binaries 01010101 and 10101010', () => {
    expect(signatureCount(['repeater', 'super-repeater', 'binary'])).toBe(90 - 2 - 2);
  });

  it('when a combination never occurs, then its count is 0', () => {
    expect(signatureCount(['solid', 'binary'])).toBe(0);
    expect(signatureCount(['ladder', 'radar'], { match: 'all' })).toBe(0);
  });
});

describe('odds, runs and counts', () => {
  it('when odds are taken of a count, then 1 in N is domain ÷ count and points are log10(1/p)', () => {
    const o = oddsOf(11_430, DOMAIN);
    expect(o.oneIn).toBeCloseTo(DOMAIN / 11_430, 9);
    expect(o.points).toBeCloseTo(-Math.log10(11_430 / DOMAIN), 12);
    expect(oddsOf(0, DOMAIN).oneIn).toBe(Infinity);
  });

  it('when the odds table is built, then it lists every pattern with its exact count', () => {
    const table = oddsTable();
    expect(table.map((r) => r.id)).toEqual([...PATTERN_IDS]);
    for (const row of table) expect(row.count).toBe(patternCount(row.id));
  });

  it('when run and repeat counts are made by the recurrences for 5-digit strings, then they equal brute force over all 100,000', () => {
    for (let k = 1; k <= 5; k++) {
      let runs = 0;
      let repeats = 0;
      for (let v = 0; v < 100_000; v++) {
        const s = String(v).padStart(5, '0');
        let best = 1;
        let cur = 1;
        for (let i = 1; i < 5; i++) {
          cur = s[i] === s[i - 1] ? cur + 1 : 1;
          best = Math.max(best, cur);
        }
        const counts = new Map<string, number>();
        for (const c of s) counts.set(c, (counts.get(c) ?? 0) + 1);
        if (best >= k) runs++;
        if (Math.max(...counts.values()) >= k) repeats++;
      }
      expect(runAtLeastStrings(5, k)).toBe(runs);
      expect(repeatAtLeastStrings(5, k)).toBe(repeats);
    }
  }, 60_000);

  it('when runs and repeats of all eight are counted over serials, then they are the 9 solids, and length 1 covers the domain', () => {
    expect(runCount(8)).toBe(patternCount('solid'));
    expect(repeatCount(8)).toBe(patternCount('solid'));
    expect(runCount(1)).toBe(DOMAIN);
    expect(repeatCount(1)).toBe(DOMAIN);
  });
});
