import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  DEFAULT_WEIGHTS,
  NEAR_MISS_PATTERN_IDS,
  NEIGHBOUR_PATTERN_IDS,
  classify,
  features,
  nearMiss,
  neighbours,
  patternCount,
  read,
  score,
  signatureCount,
} from '../../shared/engine';
import type { WatchPattern } from '../../shared/engine';
import { pad8 } from './_oracles';

describe('read', () => {
  it('when a modern star serial is read, then the reading carries its parts, patterns and features', () => {
    const r = read('MB 2727 2727 *');
    expect(r).toMatchObject({
      ok: true,
      input: 'MB 2727 2727 *',
      digits: '27272727',
      value: 27_272_727,
      prefix: 'MB',
      suffix: '',
      star: true,
      district: 'B',
      lowLimit: 999,
      patterns: ['repeater', 'super-repeater', 'binary'],
      distinctDigits: 2,
      longestRun: 1,
      maxDigitCount: 4,
      lowTier: null,
    });
  });

  it('when any serial is read, then every part equals the function that computes it alone (property)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 99_999_999 }), (n) => {
        const s = pad8(n);
        const r = read(s);
        if (!r.ok) throw new Error('a serial must read');
        expect(r.patterns).toEqual(classify(s));
        const { distinctDigits, longestRun, maxDigitCount, lowTier, run, count } = r;
        expect({ distinctDigits, longestRun, maxDigitCount, lowTier, run, count }).toEqual(features(s));
        expect(r.nearMiss).toEqual(nearMiss(s));
        for (const p of NEIGHBOUR_PATTERN_IDS) expect(r.neighbours[p]).toEqual(neighbours(s, p));
        expect(Object.keys(r.nearMiss)).toEqual([...NEAR_MISS_PATTERN_IDS]);
        expect(r.score).toEqual(score(r, DEFAULT_WEIGHTS));
      }),
      { numRuns: 300 },
    );
  });

  it('when a serial has patterns, then the odds give each pattern’s exact count and the combination’s', () => {
    const r = read('27272727');
    if (!r.ok) throw new Error('must read');
    expect(r.odds.patterns.map((p) => [p.id, p.count])).toEqual([
      ['repeater', patternCount('repeater')],
      ['super-repeater', patternCount('super-repeater')],
      ['binary', patternCount('binary')],
    ]);
    expect(r.odds.combination).toMatchObject({
      ids: ['repeater', 'super-repeater', 'binary'],
      count: signatureCount(['repeater', 'super-repeater', 'binary'], { match: 'all' }),
      exactCount: signatureCount(['repeater', 'super-repeater', 'binary']),
    });
    expect(r.odds.combination!.points).toBeCloseTo(Math.log10(99_999_999 / r.odds.combination!.count), 12);
  });

  it('when a serial has no pattern, then there is no combination to rate', () => {
    const r = read('12345679');
    expect(r.ok && r.odds.combination).toBeNull();
  });

  it('when the low limit comes from the weight table, then low follows it unless the options say otherwise', () => {
    const weights = { ...DEFAULT_WEIGHTS, lowLimit: 9999 as const };
    expect(read('00005000', { weights })).toMatchObject({ ok: true, lowLimit: 9999, patterns: expect.arrayContaining(['low']) });
    expect(read('00005000', { weights, lowLimit: 99 })).toMatchObject({ ok: true, lowLimit: 99 });
  });

  it('when watch patterns are given as text or objects, then each gets a match or near miss, and bad ones are skipped', () => {
    const r = read('07041776', { watch: ['0704????', { kind: 'range', from: 7_041_770, to: 7_041_775 }, 'nonsense'] });
    if (!r.ok) throw new Error('must read');
    expect(r.watch.map((w) => [w.text, w.matched, w.nearMiss.distance])).toEqual([
      ['0704????', true, 0],
      ['7041770-7041775', false, 1],
    ]);
  });

  it('when a series 2013 $1 New York star in a duplicated range is read, then the warning explains the facility mark and the matched pair (hobby press, checked from memory)', () => {
    const r = read('B 0500 0000 *', { series: '2013', denomination: 1 });
    if (!r.ok) throw new Error('must read');
    const warning = r.trade.find((n) => n.id === 'duplicate-star-serials');
    expect(warning?.text).toContain('facility mark tells them apart');
    expect(warning?.text).toContain('matched pair carries the premium');
    expect(warning?.source).toBe('published');
    const regular = read('B 0500 0000 A', { series: '2013', denomination: 1 });
    if (!regular.ok) throw new Error('must read');
    expect(regular.trade.map((n) => n.id)).not.toContain('duplicate-star-serials');
  });

  it('when nothing but the serial is known, then there are no trade notes', () => {
    const r = read('12345678');
    expect(r.ok && r.trade).toEqual([]);
  });

  it('when the text is not a serial, then the reading is a typed error and nothing throws', () => {
    expect(read('12 34')).toEqual({
      ok: false,
      input: '12 34',
      error: { code: 'too-few-digits', message: 'A serial has 8 digits; this has 4.' },
    });
    fc.assert(
      fc.property(fc.string(), fc.anything(), (text, options) => {
        const r = read(text, options as never);
        expect(typeof r.ok).toBe('boolean');
      }),
      { numRuns: 500 },
    );
  });

  it('when a reading is made, then it is plain JSON (round-trips unchanged)', () => {
    const r = read('LB 0000 0001 *', { series: '1963', watch: ['date:2000-01-01'] });
    expect(JSON.parse(JSON.stringify(r))).toEqual(r);
  });
});

describe('read options', () => {
  it('when the district option is not a district letter, then the prefix’s district stands; a real letter overrides it', () => {
    const kept = read('MB 1234 5678 A', { district: 'Z' });
    const replaced = read('MB 1234 5678 A', { district: 'k' });
    expect(kept.ok && kept.district).toBe('B');
    expect(replaced.ok && replaced.district).toBe('K');
  });

  it('when the facility is given in lower case, then its trade note still applies', () => {
    const r = read('12345678', { facility: 'fw' as 'FW' });
    expect(r.ok && r.trade.map((n) => n.id)).toEqual(['facility']);
  });
});

describe('read watch list', () => {
  it('when the same watch list is read twice, then the results agree and the shared patterns cannot be changed', () => {
    const date: WatchPattern = { kind: 'date', date: '1776-07-04', formats: ['MMDDYYYY'] };
    const watch = ['0704????', date];
    const first = read('07041776', { watch: [...watch] });
    const second = read('07041776', { watch: [...watch] });
    if (!first.ok || !second.ok) throw new Error('must read');
    expect(second.watch).toEqual(first.watch);
    expect(first.watch.map((w) => w.matched)).toEqual([true, true]);
    expect(Object.isFrozen(first.watch[1]!.pattern)).toBe(true);
  });
});
