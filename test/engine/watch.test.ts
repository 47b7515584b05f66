import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { describeNearMiss, matchWatch, parseWatchPattern, validWatchPattern, watchText } from '../../shared/engine';
import type { WatchPattern } from '../../shared/engine';
import { changedPositions, hamming, pad8 } from './_oracles';

/** Every serial a pattern matches, listed plainly (small patterns only). */
function plainMatches(pattern: WatchPattern): string[] {
  if (pattern.kind === 'range') {
    const out: string[] = [];
    for (let v = pattern.from; v <= pattern.to; v++) out.push(pad8(v));
    return out;
  }
  if (pattern.kind === 'mask') {
    let partial = [''];
    for (const c of pattern.mask) {
      const options = c === '?' ? '0123456789'.split('') : [c];
      partial = partial.flatMap((p) => options.map((o) => p + o));
    }
    return partial.filter((s) => s !== '00000000');
  }
  const [y, m, d] = pattern.date.split('-');
  const forms: Record<string, string> = { MMDDYYYY: m! + d! + y!, DDMMYYYY: d! + m! + y!, YYYYMMDD: y! + m! + d! };
  return pattern.formats.map((f) => forms[f]!);
}

function parsed(text: string): WatchPattern {
  const result = parseWatchPattern(text);
  if (!result.ok) throw new Error(`test pattern did not parse: ${text}`);
  return result.pattern;
}

describe('parseWatchPattern', () => {
  it('when given 8 characters of digits and ?, then it is a digit mask', () => {
    expect(parseWatchPattern('0704????')).toEqual({ ok: true, pattern: { kind: 'mask', mask: '0704????' } });
    expect(parseWatchPattern(' 0704 ???? ')).toEqual({ ok: true, pattern: { kind: 'mask', mask: '0704????' } });
  });

  it('when a mask is the wrong length, all ?, or only 00000000, then it says why', () => {
    expect(parseWatchPattern('0704???')).toMatchObject({ ok: false, error: { code: 'bad-mask' } });
    expect(parseWatchPattern('????????')).toMatchObject({ ok: false, error: { code: 'mask-matches-everything' } });
    expect(parseWatchPattern('00000000')).toMatchObject({ ok: false, error: { code: 'mask-matches-nothing' } });
  });

  it('when given a-b, then it is an inclusive range; 0 reads as 1 and a reversed range is refused', () => {
    expect(parseWatchPattern('1000-2000')).toEqual({ ok: true, pattern: { kind: 'range', from: 1000, to: 2000 } });
    expect(parseWatchPattern('0 - 999')).toEqual({ ok: true, pattern: { kind: 'range', from: 1, to: 999 } });
    expect(parseWatchPattern('2000-1000')).toMatchObject({ ok: false, error: { code: 'range-reversed' } });
    expect(parseWatchPattern('0-0')).toMatchObject({ ok: false, error: { code: 'range-outside-domain' } });
    expect(parseWatchPattern('1-123456789')).toMatchObject({ ok: false, error: { code: 'bad-range' } });
  });

  it('when given date:YYYY-MM-DD, then it watches all three layouts unless formats are named', () => {
    expect(parseWatchPattern('date:2024-07-04')).toEqual({
      ok: true,
      pattern: { kind: 'date', date: '2024-07-04', formats: ['MMDDYYYY', 'DDMMYYYY', 'YYYYMMDD'] },
    });
    expect(parseWatchPattern('DATE:2024-07-04:yyyymmdd,mmddyyyy')).toEqual({
      ok: true,
      pattern: { kind: 'date', date: '2024-07-04', formats: ['MMDDYYYY', 'YYYYMMDD'] },
    });
    expect(parseWatchPattern('2024-07-04')).toMatchObject({ ok: true, pattern: { kind: 'date' } });
    expect(parseWatchPattern('date:2024-07-04:MMYYYY')).toMatchObject({ ok: false, error: { code: 'bad-date-format' } });
  });

  it('when the date is not on the calendar, then it is refused (leap years by the Gregorian rule)', () => {
    const ok = (t: string) => parseWatchPattern(t).ok;
    expect([ok('date:2000-02-29'), ok('date:2024-02-29'), ok('date:1900-02-29'), ok('date:2023-02-29')]).toEqual([true, true, false, false]);
    expect(ok('date:2024-04-31')).toBe(false);
    expect(ok('date:2024-13-01')).toBe(false);
    expect(ok('date:0000-01-01')).toBe(false);
  });

  it('when given any text at all, then it never throws and canonical text reads back the same pattern (property)', () => {
    fc.assert(
      fc.property(fc.oneof(fc.string(), fc.string({ unit: 'binary' }), fc.stringMatching(/^[0-9?]{8}$|^\d{1,8}-\d{1,8}$|^date:\d{4}-\d{2}-\d{2}$/)), (text) => {
        const result = parseWatchPattern(text);
        if (result.ok) expect(parseWatchPattern(watchText(result.pattern))).toEqual(result);
        else expect(result.error.message.length).toBeGreaterThan(0);
      }),
      { numRuns: 2000 },
    );
    expect(parseWatchPattern(undefined)).toMatchObject({ ok: false, error: { code: 'not-text' } });
  });

  it('when a hand-built pattern object is invalid, then validWatchPattern says null', () => {
    expect(validWatchPattern({ kind: 'range', from: 5, to: 1 })).toBeNull();
    expect(validWatchPattern({ kind: 'date', date: '2023-02-29', formats: ['MMDDYYYY'] })).toBeNull();
    expect(validWatchPattern({ kind: 'mask', mask: '1234567?', label: 'mine' })).toEqual({ kind: 'mask', mask: '1234567?', label: 'mine' });
  });
});

describe('matchWatch', () => {
  it('when the serial fits the mask, then it matches with distance 0', () => {
    const result = matchWatch('07041776', parsed('0704????'));
    expect(result.matched).toBe(true);
    expect(result.nearMiss).toEqual({ distance: 0, target: '07041776', positions: [] });
  });

  it('when a date is one digit off, then the near miss names the digit and reads as a sentence', () => {
    const pattern = parsed('date:1776-07-04:MMDDYYYY');
    const result = matchWatch('07051776', pattern);
    expect(result.nearMiss).toEqual({ distance: 1, target: '07041776', positions: [4] });
    expect(describeNearMiss(pattern, result.nearMiss)).toBe('one digit from your watch pattern date:1776-07-04:MMDDYYYY: 4th → 4');
  });

  it('when the only fix of a zero mask would be 00000000, then a wildcard is made non-zero instead', () => {
    const result = matchWatch('10000000', parsed('0000000?'));
    expect(result.nearMiss.target).toBe('00000001');
    expect(result.nearMiss.distance).toBe(2);
  });

  const maskArb = fc
    .array(fc.constantFrom('0', '1', '5', '9', '?'), { minLength: 8, maxLength: 8 })
    .map((cs) => cs.join(''))
    .filter((m) => (m.match(/\?/g) ?? []).length <= 4 && m !== '00000000' && m !== '????????');
  const rangeArb = fc
    .tuple(fc.integer({ min: 0, max: 99_999_999 }), fc.integer({ min: 0, max: 20_000 }))
    .map(([from, width]) => `${Math.max(1, from)}-${Math.min(99_999_999, Math.max(1, from) + width)}`);
  const dateArb = fc
    .date({ min: new Date('1700-01-01T00:00:00Z'), max: new Date('2099-12-31T00:00:00Z'), noInvalidDate: true })
    .map((d) => `date:${d.toISOString().slice(0, 10)}`);

  it('when any serial meets any mask, range or date, then the distance is the minimum over every serial the pattern matches (property)', () => {
    const serialArb = fc.integer({ min: 1, max: 99_999_999 }).map(pad8);
    fc.assert(
      fc.property(fc.oneof(maskArb, rangeArb, dateArb), serialArb, (text, s) => {
        const pattern = parsed(text);
        const members = plainMatches(pattern);
        const result = matchWatch(s, pattern);
        const best = Math.min(...members.map((m) => hamming(s, m)));
        expect(result.nearMiss.distance).toBe(best);
        expect(result.matched).toBe(best === 0);
        expect(members).toContain(result.nearMiss.target);
        expect(result.nearMiss.positions).toEqual(changedPositions(s, result.nearMiss.target));
      }),
      { numRuns: 300 },
    );
  }, 60_000);

  it('when given a non-serial or an invalid pattern, then it refuses with a RangeError', () => {
    expect(() => matchWatch('00000000', parsed('1234????'))).toThrow(RangeError);
    expect(() => matchWatch('12345678', { kind: 'range', from: 9, to: 1 })).toThrow(RangeError);
  });
});
