import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseSerial } from '../../shared/engine';
import { pad8 } from './_oracles';

describe('parseSerial', () => {
  it('when 8 digits alone are typed, then they are the serial with no letters', () => {
    expect(parseSerial('04071776')).toEqual({
      ok: true,
      digits: '04071776',
      value: 4_071_776,
      prefix: '',
      suffix: '',
      star: false,
      starBefore: false,
      district: null,
      seriesLetter: null,
      style: 'bare',
    });
  });

  it('when a modern serial with two prefix letters and a suffix is pasted, then the second prefix letter is the district', () => {
    const result = parseSerial('MB 04071776 C');
    expect(result).toMatchObject({ ok: true, prefix: 'MB', suffix: 'C', district: 'B', seriesLetter: 'M', style: 'modern', star: false });
  });

  it('when an older serial with one prefix letter is typed, then that letter is the district', () => {
    expect(parseSerial('L04071776A')).toMatchObject({ ok: true, prefix: 'L', district: 'L', style: 'older' });
  });

  it('when a star stands in place of the suffix (* or ★), or before the digits on older notes, then it is a star note', () => {
    expect(parseSerial('MB04071776*')).toMatchObject({ ok: true, star: true, suffix: '' });
    expect(parseSerial('mb 0407 1776 ★')).toMatchObject({ ok: true, star: true, prefix: 'MB' });
    expect(parseSerial('*04071776A')).toMatchObject({ ok: true, star: true, suffix: 'A' });
  });

  it('when spaces, dashes and lower case are used, then they are ignored or read as upper case', () => {
    const a = parseSerial('mb-0407-1776-c');
    const b = parseSerial('MB 0407\u00a01776 C');
    expect(a).toEqual(parseSerial('MB04071776C'));
    expect(b).toEqual(parseSerial('MB04071776C'));
  });

  it('when the text is not a serial, then each problem gets its own code and a sentence', () => {
    const code = (t: unknown) => {
      const r = parseSerial(t);
      return r.ok ? 'ok' : r.error.code;
    };
    expect(code('')).toBe('empty');
    expect(code('   ')).toBe('empty');
    expect(code(42)).toBe('not-text');
    expect(code('1234567')).toBe('too-few-digits');
    expect(code('MB')).toBe('too-few-digits');
    expect(code('123456789')).toBe('too-many-digits');
    expect(code('1234A5678')).toBe('digits-split');
    expect(code('ABC12345678')).toBe('too-many-prefix-letters');
    expect(code('12345678AB')).toBe('too-many-suffix-letters');
    expect(code('*12345678*')).toBe('two-stars');
    expect(code('MZ12345678A')).toBe('unknown-district');
    expect(code('00000000')).toBe('zero-serial');
    expect(code('1234#5678')).toBe('bad-character');
    expect(code('1'.repeat(500))).toBe('too-long');
  });

  it('when a character is wrong, then the message shows it and its place', () => {
    const r = parseSerial('1234#5678');
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.message).toContain('"#" (character 5)');
  });

  it('when any serial is written with any spacing, then it reads back the same digits (property)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 99_999_999 }), fc.array(fc.constantFrom(' ', '-', ''), { minLength: 9, maxLength: 9 }), (n, gaps) => {
        const digits = pad8(n);
        const text = [...digits].map((c, i) => gaps[i] + c).join('') + gaps[8];
        const r = parseSerial(text);
        expect(r.ok && r.digits).toBe(digits);
        expect(r.ok && r.value).toBe(n);
      }),
      { numRuns: 1000 },
    );
  });

  it('when given any string at all, then it never throws and always answers ok or a coded error (property)', () => {
    const serialish = fc.stringMatching(/^[A-Za-z]{0,3}[ *-]?\d{6,9}[ *★A-Za-z-]{0,2}$/);
    fc.assert(
      fc.property(fc.oneof(fc.string(), fc.string({ unit: 'binary' }), fc.string({ unit: 'grapheme' }), serialish), (text) => {
        const r = parseSerial(text);
        if (r.ok) expect(r.digits).toMatch(/^\d{8}$/);
        else expect(r.error.message.length).toBeGreaterThan(0);
      }),
      { numRuns: 5000 },
    );
  });

  it('when given a value that is not text at all, then it still answers with an error instead of throwing', () => {
    for (const value of [null, undefined, 12345678, {}, [], Symbol('x'), () => 1]) {
      expect(parseSerial(value).ok).toBe(false);
    }
  });
});
