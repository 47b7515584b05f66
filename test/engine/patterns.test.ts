import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { PATTERN_IDS, classify, hasPattern, patternMask } from '../../shared/engine';
import { pad8, plainMembers, plainPatterns } from './_oracles';

const serial = fc.integer({ min: 1, max: 99_999_999 }).map(pad8);

describe('classify', () => {
  it('when a serial is all one digit, then it is a solid, radar, repeater and super repeater', () => {
    const ids = classify('77777777');
    expect(ids).toEqual(['solid', 'radar', 'repeater', 'super-repeater']);
  });

  it('when the digits step by +1 or −1 through all eight, then it is a ladder, and only those six are', () => {
    const ladders = ['01234567', '12345678', '23456789', '98765432', '87654321', '76543210'];
    const results = ladders.map((s) => classify(s).includes('ladder'));
    expect(results).toEqual([true, true, true, true, true, true]);
    expect(classify('34567890')).not.toContain('ladder');
    expect(classify('12345679')).not.toContain('ladder');
  });

  it('when a serial reads the same backwards, then it is a radar', () => {
    expect(classify('38055083')).toContain('radar');
    expect(classify('38055084')).not.toContain('radar');
  });

  it('when the first four digits repeat, then it is a repeater; when one two-digit block repeats four times, a super repeater too', () => {
    expect(classify('47104710')).toEqual(expect.arrayContaining(['repeater']));
    expect(classify('47104710')).not.toContain('super-repeater');
    expect(classify('27272727')).toEqual(['repeater', 'super-repeater', 'binary']);
  });

  it('when a serial uses only 0 1 6 8 9 and reads the same turned 180° (6 ↔ 9), then it is a rotator', () => {
    expect(classify('10688901')).toContain('rotator');
    expect(classify('69696969')).toContain('rotator');
    expect(classify('66666666')).not.toContain('rotator');
    expect(classify('12344321')).not.toContain('rotator');
  });

  it('when a serial has exactly two or exactly three different digits, then it is binary or trinary, and a solid is neither', () => {
    expect(classify('30033303')).toContain('binary');
    expect(classify('52252922')).toContain('trinary');
    expect(classify('55555555')).not.toContain('binary');
    expect(classify('55555555')).not.toContain('trinary');
  });

  it('when the value is at or under the low limit, then it is low; the limit is selectable', () => {
    expect(classify('00000999')).toContain('low');
    expect(classify('00001000')).not.toContain('low');
    expect(classify('00001000', { lowLimit: 9999 })).toContain('low');
    expect(classify('00000010', { lowLimit: 9 })).not.toContain('low');
  });

  it('when the value is 99,990,000 or more, then it is high', () => {
    expect(classify('99990000')).toContain('high');
    expect(classify('99989999')).not.toContain('high');
  });

  it('when given 00000000 or anything that is not 8 digits, then it refuses with a RangeError (00000000 is not a serial)', () => {
    expect(() => classify('00000000')).toThrow(RangeError);
    expect(() => classify('1234567')).toThrow(RangeError);
    expect(() => classify(0)).toThrow(RangeError);
    expect(() => classify(100_000_000)).toThrow(RangeError);
  });

  it('when given a number instead of digits, then it reads the same serial', () => {
    expect(classify(12121212)).toEqual(classify('12121212'));
  });

  it('when ids are returned, then they are in PATTERN_IDS order and the caller may change them freely', () => {
    const first = classify('27272727');
    first.push('high');
    const again = classify('27272727');
    expect(again).toEqual(['repeater', 'super-repeater', 'binary']);
    expect([...again].sort((a, b) => PATTERN_IDS.indexOf(a) - PATTERN_IDS.indexOf(b))).toEqual(again);
  });

  it('when any serial is classified, then the result equals the plain definitions (property)', () => {
    fc.assert(
      fc.property(serial, fc.constantFrom(9, 99, 999, 9999, 99999 as const), (s, lowLimit) => {
        expect(classify(s, { lowLimit })).toEqual(plainPatterns(s, lowLimit));
      }),
      { numRuns: 3000 },
    );
  });

  it('when every member of every sparse pattern is classified, then each has its pattern and matches the plain definitions', () => {
    const patterns = ['solid', 'ladder', 'radar', 'repeater', 'super-repeater', 'rotator', 'binary'] as const;
    for (const pattern of patterns) {
      for (const value of plainMembers(pattern)) {
        const s = pad8(value);
        const ids = classify(s);
        expect(ids).toContain(pattern);
        expect(ids).toEqual(plainPatterns(s));
      }
    }
  }, 60_000);

  it('when hasPattern is asked, then it agrees with classify', () => {
    fc.assert(
      fc.property(serial, fc.constantFrom(...PATTERN_IDS), (s, id) => {
        expect(hasPattern(s, id)).toBe(classify(s).includes(id));
      }),
      { numRuns: 500 },
    );
  });

  it('when the mask of a serial is read, then its bits follow PATTERN_IDS order', () => {
    const mask = patternMask(27272727);
    const ids = PATTERN_IDS.filter((_, i) => (mask & (1 << i)) !== 0);
    expect(ids).toEqual(classify('27272727'));
  });
});

describe('classify options', () => {
  it('when the low limit is not one of 9, 99, 999, 9999, 99999, then it refuses with a RangeError', () => {
    expect(() => classify('00000500', { lowLimit: 500 as never })).toThrow(RangeError);
    expect(() => hasPattern('00000500', 'low', { lowLimit: 0 as never })).toThrow(RangeError);
  });
});
