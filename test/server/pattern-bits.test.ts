import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { PATTERN_IDS, classify, patternMask } from '../../shared/engine';
import { PATTERN_ID_LIST, patternId } from '../../shared/contracts/common';
import { weightTableValues } from '../../shared/contracts/weights';
import { NON_LOW_MASK, PATTERN_BIT, idsOf, maskOf } from '../../server/lib/patterns';

/**
 * The order pattern_mask columns were first written in (migration 1796164796469): bit i is this list's i-th
 * id. Rows stored then must read the same now, so these ten keep their places and new patterns only append.
 */
const STORED_ORDER = ['solid', 'ladder', 'radar', 'repeater', 'super-repeater', 'rotator', 'binary', 'trinary', 'low', 'high'];

describe('one pattern-id list, from the engine', () => {
  it('when the engine’s order is read, then the ten stored bits keep their places and new patterns are appended', () => {
    expect(PATTERN_IDS.slice(0, STORED_ORDER.length)).toEqual(STORED_ORDER);
    expect(PATTERN_IDS.slice(STORED_ORDER.length)).toEqual(['super-radar', 'true-binary']);
  });

  it('when the server builds its bit masks, then bit i is the engine’s PATTERN_IDS[i]', () => {
    PATTERN_IDS.forEach((id, i) => expect(PATTERN_BIT[id], id).toBe(1 << i));
    expect(NON_LOW_MASK).toBe(((1 << PATTERN_IDS.length) - 1) & ~PATTERN_BIT.low);
  });

  it('when the contracts list pattern ids, then they are the engine’s list itself, in its order', () => {
    expect(PATTERN_ID_LIST).toBe(PATTERN_IDS);
    expect(patternId.options).toEqual([...PATTERN_IDS]);
    const weights = weightTableValues.parse({
      patterns: Object.fromEntries(PATTERN_IDS.map((id) => [id, 1])),
      runs: {},
      counts: {},
      lowLimit: 999,
      starBonus: 1,
      smallStarRunBonus: 1,
      watchBonus: 1,
      keepThreshold: 4,
    });
    expect(Object.keys(weights.patterns)).toEqual([...PATTERN_IDS]);
  });

  it('when any serial’s engine mask is stored and read back by the server, then it names the engine’s patterns (property)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 99_999_999 }), (value) => {
        const ids = classify(value);
        expect(maskOf(ids)).toBe(patternMask(value));
        expect(idsOf(patternMask(value))).toEqual(ids);
      }),
      { numRuns: 2000 },
    );
    for (const fancy of ['38888883', '10011001', '12121212', '99995555']) expect(idsOf(patternMask(Number(fancy)))).toEqual(classify(fancy));
  });
});
