import { describe, expect, it } from 'vitest';
import {
  DEFAULT_WEIGHTS,
  PATTERN_DEFINITIONS,
  PATTERN_IDS,
  PATTERN_NAMES,
  classify,
  describeNearMiss,
  nearMiss,
  neighbours,
  patternCount,
  patternMask,
  read,
  signatureCount,
  sweep,
} from '../../shared/engine';
import { pad8, plainMembers, plainPatterns } from './_oracles';

// TRADE.md "Pattern counts": super radar (a radar whose six inner digits are one digit: 90 serials) and
// true binary (a binary whose two digits are 0 and 1: 254 serials); common practice, counts by enumeration.
describe('super radar and true binary', () => {
  it('when super radars are counted, then there are 10 outer × 9 other inner digits = 90 (TRADE.md, by enumeration)', () => {
    expect(patternCount('super-radar')).toBe(10 * 9);
    expect(patternCount('super-radar')).toBe(90);
  });

  it('when true binaries are counted, then there are 2^8 − 2 = 254: every 0/1 string but 00000000 and 11111111 (TRADE.md, by enumeration)', () => {
    expect(patternCount('true-binary')).toBe(2 ** 8 - 2);
    expect(patternCount('true-binary')).toBe(254);
  });

  it('when every radar (all 9,999) is tested against the plain definition, then exactly the engine’s 90 are super radars', () => {
    let census = 0;
    for (let h = 0; h < 10000; h++) {
      const left = String(h).padStart(4, '0');
      const s = left + [...left].reverse().join('');
      if (s === '00000000') continue;
      const plain = plainPatterns(s).includes('super-radar');
      expect(classify(s).includes('super-radar')).toBe(plain);
      if (plain) census++;
    }
    expect(census).toBe(90);
  });

  it('when every serial up to 11,111,111 (the largest 0/1 string) is brute-forced through patternMask, then exactly 254 are true binaries, as the plain definition says', () => {
    const bit = 1 << PATTERN_IDS.indexOf('true-binary');
    let census = 0;
    for (let v = 1; v <= 11_111_111; v++) if (patternMask(v) & bit) census++;
    expect(census).toBe(254);
    const plain = plainMembers('true-binary');
    expect(plain).toHaveLength(254);
    for (const v of plain) expect(classify(v)).toContain('true-binary');
  }, 60_000);

  it('when examples from TRADE.md are read, then 38888883 is a super radar and 10011001 a true binary, each still a radar / binary too', () => {
    expect(classify('38888883')).toEqual(['radar', 'binary', 'super-radar']);
    expect(classify('10011001')).toEqual(['radar', 'repeater', 'rotator', 'binary', 'true-binary']);
    expect(classify('10100110')).toEqual(['binary', 'true-binary']);
    expect(classify('10011002')).toEqual(['trinary']);
    expect(classify('01111110')).toContain('super-radar');
    expect(classify('11111111')).not.toContain('super-radar');
    expect(classify('11111111')).not.toContain('true-binary');
  });

  it('when the pattern ids are listed, then the new patterns come last so stored masks keep their bits', () => {
    expect(PATTERN_IDS.slice(-2)).toEqual(['super-radar', 'true-binary']);
  });

  it('when the rarity table explains the names, then true binary says many sellers call only these "binary"', () => {
    expect(PATTERN_NAMES['true-binary']).toBe('true binary');
    expect(PATTERN_DEFINITIONS['true-binary']).toContain('many sellers call only these "binary"');
    expect(PATTERN_DEFINITIONS['super-radar']).toContain('38888883');
  });

  it('when near misses are read, then one digit from a super radar and a true binary is described plainly', () => {
    const miss = nearMiss('38888893');
    expect(miss['super-radar']).toEqual({ distance: 1, target: '38888883', positions: [7] });
    expect(describeNearMiss('super-radar', miss['super-radar'])).toBe('one digit from a super radar: 7th → 8');
    // Zeros 3, ones 4: the 2 becomes the more frequent 1.
    expect(nearMiss('10011021')['true-binary']).toEqual({ distance: 1, target: '10011011', positions: [7] });
    expect(nearMiss('11111111')['true-binary']).toEqual({ distance: 1, target: '11111110', positions: [8] });
    expect(nearMiss('22222222')['true-binary'].distance).toBe(8);
  });

  it('when neighbours are asked, then they are the nearest members either side', () => {
    expect(neighbours('38888884', 'super-radar')).toEqual({
      below: { serial: '38888883', notesAway: 1 },
      above: { serial: '39999993', notesAway: 1_111_109 },
    });
    expect(neighbours('10011002', 'true-binary').below).toEqual({ serial: '10011001', notesAway: 1 });
  });

  it('when a sweep asks for them, then it finds every member in range', () => {
    const hits = sweep('10000000', 1_111_112, ['true-binary']).hits;
    expect(hits.map((h) => h.value)).toEqual(plainMembers('true-binary').filter((v) => v >= 10_000_000));
    expect(sweep('38888880', 10, ['super-radar']).hits.map((h) => h.serial)).toEqual(['38888883']);
  });

  it('when scored with the default weights, then they add to the radar and binary weights their members already earn', () => {
    expect(DEFAULT_WEIGHTS.patterns['super-radar']).toBeGreaterThan(0);
    expect(DEFAULT_WEIGHTS.patterns['true-binary']).toBeGreaterThan(0);
    const r = read('10100110');
    if (!r.ok) throw new Error('must read');
    expect(r.score.lines.map((l) => l.label)).toEqual(['binary', 'true binary']);
    expect(r.score.points).toBe(DEFAULT_WEIGHTS.patterns.binary + DEFAULT_WEIGHTS.patterns['true-binary']);
  });

  it('when combinations are counted, then every super radar is a radar and a binary and every true binary a binary', () => {
    expect(signatureCount(['radar', 'binary', 'super-radar'], { match: 'all' })).toBe(90);
    expect(signatureCount(['binary', 'true-binary'], { match: 'all' })).toBe(254);
    expect(plainMembers('super-radar').map(pad8).every((s) => plainPatterns(s).includes('radar'))).toBe(true);
  });
});

describe('high serials are uncut-sheet territory (TRADE.md run ends)', () => {
  it('when high is defined, then it says so and its default weight alone does not reach the keep threshold', () => {
    expect(PATTERN_DEFINITIONS.high).toContain('uncut-sheet territory');
    expect(DEFAULT_WEIGHTS.patterns.high).toBeLessThan(DEFAULT_WEIGHTS.keepThreshold);
  });
});
