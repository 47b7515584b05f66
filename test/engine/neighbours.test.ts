import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { NEIGHBOUR_PATTERN_IDS, neighbours } from '../../shared/engine';
import { pad8, plainMembers, plainNeighbours } from './_oracles';

describe('neighbours', () => {
  it('when a serial sits just above a solid, then the solid is 1 note below and the next solid far above', () => {
    const n = neighbours('11111112', 'solid');
    expect(n).toEqual({
      below: { serial: '11111111', notesAway: 1 },
      above: { serial: '22222222', notesAway: 11_111_110 },
    });
  });

  it('when the serial is itself a member, then both neighbours are other members (strictly below and above)', () => {
    const n = neighbours('22222222', 'solid');
    expect(n.below?.serial).toBe('11111111');
    expect(n.above?.serial).toBe('33333333');
  });

  it('when no member lies below, then below is null, and 00000000 is never offered', () => {
    expect(neighbours('00000001', 'radar').below).toBeNull();
    expect(neighbours('00000001', 'repeater').below).toBeNull();
    expect(neighbours('00000005', 'solid').below).toBeNull();
  });

  it('when no member lies above, then above is null', () => {
    expect(neighbours('99999999', 'solid').above).toBeNull();
    expect(neighbours('98765432', 'ladder').above).toBeNull();
  });

  it('when asked for low or high, or an unknown pattern, then it refuses with a RangeError', () => {
    expect(() => neighbours('12345678', 'low' as never)).toThrow(RangeError);
    expect(() => neighbours('12345678', 'high' as never)).toThrow(RangeError);
    expect(() => neighbours('12345678', 'sevens' as never)).toThrow(RangeError);
  });

  for (const pattern of NEIGHBOUR_PATTERN_IDS) {
    it(`when any serial is looked up for ${pattern}, then the neighbours equal a linear scan of the members (property)`, () => {
      const members = plainMembers(pattern);
      const nearMembers = fc
        .tuple(fc.integer({ min: 0, max: members.length - 1 }), fc.integer({ min: -3, max: 3 }))
        .map(([i, offset]) => members[i]! + offset)
        .filter((v) => v >= 1 && v <= 99_999_999);
      const runs = pattern === 'trinary' ? 60 : 200;
      fc.assert(
        fc.property(fc.oneof(fc.integer({ min: 1, max: 99_999_999 }), nearMembers), (value) => {
          const expected = plainNeighbours(pattern, value);
          const actual = neighbours(pad8(value), pattern);
          expect(actual.below).toEqual(expected.below === null ? null : { serial: pad8(expected.below), notesAway: value - expected.below });
          expect(actual.above).toEqual(expected.above === null ? null : { serial: pad8(expected.above), notesAway: expected.above - value });
        }),
        { numRuns: runs },
      );
    }, 60_000);
  }
});
