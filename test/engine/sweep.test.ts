import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { PATTERN_IDS, sweep } from '../../shared/engine';
import type { PatternId } from '../../shared/engine';
import { pad8, plainMembers, plainPatterns } from './_oracles';

/** The per-serial loop the sweep must agree with. */
function plainSweep(first: number, count: number, patterns: readonly string[], lowLimit = 999) {
  const hits: Array<{ serial: string; value: number; patterns: string[] }> = [];
  const last = Math.min(99_999_999, first + count - 1);
  for (let v = first; v <= last; v++) {
    const ids = plainPatterns(pad8(v), lowLimit).filter((id) => patterns.includes(id));
    if (ids.length > 0) hits.push({ serial: pad8(v), value: v, patterns: ids });
  }
  return hits;
}

const patternSubset = fc.subarray([...PATTERN_IDS], { minLength: 1 });

describe('sweep', () => {
  it('when a strap around a solid is swept for solids and binaries, then every hit is listed in order with its patterns', () => {
    const result = sweep('11111100', 100, ['solid', 'binary']);
    expect(result.hits.slice(0, 5)).toEqual([
      { serial: '11111100', value: 11111100, patterns: ['binary'] },
      { serial: '11111101', value: 11111101, patterns: ['binary'] },
      { serial: '11111110', value: 11111110, patterns: ['binary'] },
      { serial: '11111111', value: 11111111, patterns: ['solid'] },
      { serial: '11111112', value: 11111112, patterns: ['binary'] },
    ]);
    expect(result.hits).toEqual(plainSweep(11111100, 100, ['solid', 'binary']));
  });

  it('when the range would pass 99999999, then it stops there and says it was cut', () => {
    const result = sweep('99999990', 100, ['solid', 'high']);
    expect(result.last).toBe(99_999_999);
    expect(result.count).toBe(10);
    expect(result.truncated).toBe(true);
    expect(result.hits.at(-1)).toEqual({ serial: '99999999', value: 99_999_999, patterns: ['solid', 'high'] });
  });

  it('when the range starts at 00000001, then the low band follows the chosen limit and 00000000 never appears', () => {
    const result = sweep(1, 200, ['low'], { lowLimit: 99 });
    expect(result.hits.length).toBe(99);
    expect(result.hits[0]!.serial).toBe('00000001');
  });

  it('when ten million serials are swept over every pattern, then each pattern’s hits match its member count in that range', () => {
    const result = sweep('10000000', 10_000_000);
    for (const id of ['solid', 'radar', 'repeater', 'binary', 'trinary'] as const) {
      const expected = plainMembers(id).filter((v) => v >= 10_000_000 && v <= 19_999_999).length;
      expect(result.hits.filter((h) => h.patterns.includes(id)).length).toBe(expected);
    }
  }, 60_000);

  it('when the count or first serial or a pattern is wrong, then it refuses with a RangeError', () => {
    expect(() => sweep('00000000', 10)).toThrow(RangeError);
    expect(() => sweep('12345678', 0)).toThrow(RangeError);
    expect(() => sweep('12345678', 10_000_001)).toThrow(RangeError);
    expect(() => sweep('12345678', 10, ['sevens' as PatternId])).toThrow(RangeError);
  });

  it('when any range up to 20,000 serials is swept, then the hits equal a per-serial loop (property)', () => {
    const anywhere = fc.integer({ min: 1, max: 99_999_999 });
    const nearDense = fc
      .tuple(fc.constantFrom('binary', 'radar', 'repeater', 'rotator', 'solid'), fc.nat(), fc.integer({ min: -5000, max: 0 }))
      .map(([pattern, i, offset]) => {
        const members = plainMembers(pattern);
        return Math.max(1, members[i % members.length]! + offset);
      });
    fc.assert(
      fc.property(
        fc.oneof(anywhere, nearDense, fc.constant(1), fc.integer({ min: 99_980_000, max: 99_999_999 })),
        fc.integer({ min: 1, max: 20_000 }),
        patternSubset,
        (first, count, patterns) => {
          const result = sweep(pad8(first), count, patterns);
          expect(result.hits).toEqual(plainSweep(first, count, patterns));
        },
      ),
      { numRuns: 40 },
    );
  }, 60_000);
});
