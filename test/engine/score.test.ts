import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { DEFAULT_WEIGHTS, PATTERN_IDS, SCORE_EXPLANATION, read, score } from '../../shared/engine';
import type { Reading, WeightTable } from '../../shared/engine';
import { pad8, plainPatterns } from './_oracles';

function reading(text: string, options: Parameters<typeof read>[1] = {}): Reading {
  const r = read(text, options);
  if (!r.ok) throw new Error(`test serial did not parse: ${text}`);
  return r;
}

const flat: WeightTable = {
  patterns: {
    solid: 1, ladder: 1, radar: 1, repeater: 1, 'super-repeater': 1, rotator: 1, binary: 1, trinary: 1, low: 1, high: 1,
    'super-radar': 1, 'true-binary': 1,
  },
  runs: {},
  counts: {},
  lowLimit: 999,
  starBonus: 0,
  smallStarRunBonus: 0,
  watchBonus: 0,
  keepThreshold: 2,
};

describe('score', () => {
  it('when a serial has several patterns, then each pattern’s weight is added with one readable line each', () => {
    const s = score(reading('27272727'), DEFAULT_WEIGHTS);
    const w = DEFAULT_WEIGHTS.patterns;
    expect(s.points).toBe(w.repeater + w['super-repeater'] + w.binary);
    expect(s.lines.map((l) => l.text)).toEqual([
      `repeater  +${w.repeater}`,
      `super repeater  +${w['super-repeater']}`,
      `binary  +${w.binary}`,
    ]);
  });

  it('when the note is a star, then the star bonus is added once', () => {
    const plain = score(reading('52252922'), DEFAULT_WEIGHTS).points;
    const starred = score(reading('52252922*'), DEFAULT_WEIGHTS);
    expect(starred.points).toBe(plain + DEFAULT_WEIGHTS.starBonus);
    expect(starred.lines.filter((l) => l.kind === 'star')).toHaveLength(1);
  });

  it('when watch patterns match, then the watch bonus is added for each one matched', () => {
    const r = reading('07041776', { watch: ['0704????', 'date:1776-07-04', '1-5'] });
    const s = score(r, { ...flat, watchBonus: 3 });
    expect(s.lines.filter((l) => l.kind === 'watch').map((l) => l.label)).toEqual(['watch 0704????', 'watch date:1776-07-04']);
    expect(s.points).toBe(6);
  });

  it('when the longest run or a digit count has a weight, then it is added', () => {
    const r = reading('12555553');
    const s = score(r, { ...flat, runs: { 5: 2 }, counts: { 5: 3 } });
    expect(s.lines.map((l) => [l.kind, l.points])).toEqual([
      ['run', 2],
      ['count', 3],
    ]);
    expect(s.points).toBe(5);
  });

  it('when the weight table’s low limit differs from the reading’s, then low is judged against the table', () => {
    const r = reading('00005000');
    expect(r.patterns).not.toContain('low');
    const s = score(r, { ...flat, lowLimit: 9999 });
    expect(s.lines.map((l) => l.label)).toContain('low serial');
  });

  it('when the weight table’s low limit is not an allowed one, then low is judged against 999', () => {
    const r = reading('00000500');
    const s = score(r, { ...flat, lowLimit: 100 as never });
    expect(s.lines.map((l) => l.label)).toContain('low serial');
    expect(score(reading('00001000'), { ...flat, lowLimit: 5000 as never }).lines.map((l) => l.label)).not.toContain('low serial');
  });

  it('when points reach the keep threshold exactly, then keep is suggested; one below, then not', () => {
    const r = reading('27272727');
    const at = score(r, { ...flat, keepThreshold: 3 });
    const over = score(r, { ...flat, keepThreshold: 3.5 });
    expect(at.keep).toBe(true);
    expect(at.suggestion).toMatch(/keep it/);
    expect(over.keep).toBe(false);
    expect(over.suggestion).toMatch(/under the keep threshold/);
  });

  it('when a weight is missing or not a number, then it counts as 0 and the score stays a number', () => {
    const broken = { ...flat, patterns: { ...flat.patterns, binary: Number.NaN } } as WeightTable;
    const s = score(reading('27272727'), broken);
    expect(Number.isFinite(s.points)).toBe(true);
    expect(s.points).toBe(2);
  });

  it('when any serial is scored with flat weights, then points = number of patterns (property; deterministic, input untouched)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 99_999_999 }), (n) => {
        const r = reading(pad8(n));
        const before = JSON.stringify(r);
        const first = score(r, flat);
        expect(first.points).toBe(plainPatterns(pad8(n)).length);
        expect(score(r, flat)).toEqual(first);
        expect(JSON.stringify(r)).toBe(before);
      }),
      { numRuns: 300 },
    );
  });

  it('when the default weights are used, then a binary reaches the keep threshold and a trinary alone does not', () => {
    expect(score(reading('30033303'), DEFAULT_WEIGHTS).keep).toBe(true);
    expect(score(reading('52952952'), DEFAULT_WEIGHTS).keep).toBe(false);
    expect(Object.keys(DEFAULT_WEIGHTS.patterns).sort()).toEqual([...PATTERN_IDS].sort());
  });

  it('when the app shows how scores are made, then the explanation names every term of the formula', () => {
    for (const term of ['weight', 'run', 'star bonus', 'watch bonus', 'keep threshold', 'low limit']) {
      expect(SCORE_EXPLANATION).toContain(term);
    }
  });
});
