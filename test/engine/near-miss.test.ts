import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { NEAR_MISS_PATTERN_IDS, describeNearMiss, nearMiss } from '../../shared/engine';
import { changedPositions, hamming, pad8, plainDistance, plainMemberStrings, plainPatterns } from './_oracles';

const serial = fc.integer({ min: 1, max: 99_999_999 }).map(pad8);

/** Serials a few digits from a member of a pattern, where near misses are interesting. */
function nearMember(pattern: string): fc.Arbitrary<string> {
  const members = plainMemberStrings(pattern);
  return fc
    .tuple(fc.integer({ min: 0, max: members.length - 1 }), fc.array(fc.tuple(fc.integer({ min: 0, max: 7 }), fc.integer({ min: 0, max: 9 })), { maxLength: 3 }))
    .map(([i, edits]) => {
      const d = [...members[i]!];
      for (const [pos, digit] of edits) d[pos] = String(digit);
      return d.join('');
    })
    .filter((s) => s !== '00000000');
}

describe('nearMiss', () => {
  it('when a serial is a solid, then it is 1 change from a binary and 2 from a trinary', () => {
    const miss = nearMiss('44444444');
    expect(miss.binary.distance).toBe(1);
    expect(miss.trinary.distance).toBe(2);
    expect(plainPatterns(miss.binary.target)).toContain('binary');
    expect(plainPatterns(miss.trinary.target)).toContain('trinary');
  });

  it('when the serial is 00000001, then the nearest solid is 7 changes away, because 00000000 does not count', () => {
    const miss = nearMiss('00000001');
    expect(miss.solid).toEqual({ distance: 7, target: '11111111', positions: [1, 2, 3, 4, 5, 6, 7] });
  });

  it('when fixing a radar or repeater the obvious way would give 00000000, then another target at the same distance is chosen', () => {
    const radar = nearMiss('00000001').radar;
    const repeater = nearMiss('00000001').repeater;
    expect(radar.distance).toBe(1);
    expect(radar.target).not.toBe('00000000');
    expect(plainPatterns(radar.target)).toContain('radar');
    expect(repeater.distance).toBe(1);
    expect(repeater.target).not.toBe('00000000');
    expect(plainPatterns(repeater.target)).toContain('repeater');
  });

  it('when the serial already is a member, then the distance is 0, the target is the serial and nothing changes', () => {
    expect(nearMiss('12344321').radar).toEqual({ distance: 0, target: '12344321', positions: [] });
    expect(nearMiss('12345678').ladder).toEqual({ distance: 0, target: '12345678', positions: [] });
  });

  it('when one digit spoils a solid, then the miss names that position and the digit it needs', () => {
    expect(nearMiss('33333533').solid).toEqual({ distance: 1, target: '33333333', positions: [6] });
  });

  it('when a miss is put in words, then it reads as a sentence with ordinal positions', () => {
    const text = describeNearMiss('binary', nearMiss('55155565').binary);
    expect(text).toBe('one digit from a binary: 7th → 5');
    expect(describeNearMiss('radar', nearMiss('12344321').radar)).toBe('already a radar');
    expect(describeNearMiss('repeater', { distance: 2, target: '12341234', positions: [7, 8] })).toBe(
      'two digits from a repeater: 7th → 3, 8th → 4',
    );
  });

  it('when a miss is computed, then the input is not changed and the result is fresh each time', () => {
    const first = nearMiss('12345677');
    first.ladder.positions.push(99);
    expect(nearMiss('12345677').ladder.positions).toEqual([8]);
  });

  for (const pattern of NEAR_MISS_PATTERN_IDS) {
    it(`when any serial is near a ${pattern}, then the distance is the minimum over all members, and target and positions agree (property)`, () => {
      const members = plainMemberStrings(pattern);
      const runs = pattern === 'trinary' ? 40 : 300;
      fc.assert(
        fc.property(fc.oneof(serial, nearMember(pattern)), (s) => {
          const miss = nearMiss(s)[pattern];
          expect(miss.distance).toBe(plainDistance(s, members));
          expect(miss.target).not.toBe('00000000');
          expect(plainPatterns(miss.target)).toContain(pattern);
          expect(hamming(s, miss.target)).toBe(miss.distance);
          expect(miss.positions).toEqual(changedPositions(s, miss.target));
        }),
        { numRuns: runs },
      );
    }, 60_000);
  }
});
