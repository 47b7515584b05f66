import type { NoteType } from '../trade/types';
import type { ParseErrorCode, ParseResult } from './types';

/** Longest text `parseSerial` looks at; anything longer is refused at once. */
export const MAX_SERIAL_TEXT = 200;

const DISTRICT_LETTERS = 'ABCDEFGHIJKL';

function fail(code: ParseErrorCode, message: string): ParseResult {
  return { ok: false, error: { code, message } };
}

function isSeparator(c: number): boolean {
  return (
    c === 32 || c === 9 || c === 10 || c === 13 || c === 0xa0 || c === 45 ||
    (c >= 0x2000 && c <= 0x200b) || c === 0x202f || c === 0x3000 ||
    (c >= 0x2010 && c <= 0x2015) || c === 0x2212
  );
}

function isStar(c: number): boolean {
  return c === 42 || c === 0x2605 || c === 0x2606;
}

function shown(ch: string): string {
  const code = ch.codePointAt(0) ?? 0;
  return code < 32 || code === 127 ? `U+${code.toString(16).toUpperCase().padStart(4, '0')}` : `"${ch}"`;
}

/**
 * Reads a serial as a hunter types or pastes it: 8 digits alone, or with one
 * (older style) or two (modern style) prefix letters, and a suffix letter or a
 * star (`*` or ★) after the digits; older notes' star before the digits is
 * accepted too. Spaces and dashes are ignored, lower case is read as upper.
 * On a Federal Reserve note (the default) the district is the last prefix
 * letter and must be A–L, and the first of two is the series letter. On the
 * older note types (`{ noteType: 'older' }`) one prefix letter is a block
 * letter, any letter, and there is no district. Whether the parts fit the
 * note's denomination and series is for `formatNotes` (shared/trade) to say.
 * Never throws: any other input gives `{ ok: false, error: { code, message } }`.
 *
 * @example
 * parseSerial('mb 0407 1776 *')
 * // { ok: true, digits: '04071776', value: 4071776, prefix: 'MB', suffix: '',
 * //   star: true, starBefore: false, district: 'B', seriesLetter: 'M', style: 'modern' }
 * parseSerial('1234 567').ok // false (too-few-digits)
 */
export function parseSerial(input: unknown, options: { noteType?: NoteType } = {}): ParseResult {
  const older = options?.noteType === 'older';
  if (typeof input !== 'string') return fail('not-text', 'A serial is text, such as 12345678 or MB 12345678 A.');
  if (input.length > MAX_SERIAL_TEXT) {
    return fail('too-long', `That is ${input.length} characters; a serial with its letters is about a dozen.`);
  }
  if (input.length === 8) {
    // The keypad sends exactly 8 digits; answer that without the general scanner.
    let value = 0;
    let i = 0;
    for (; i < 8; i++) {
      const c = input.charCodeAt(i);
      if (c < 48 || c > 57) break;
      value = value * 10 + (c - 48);
    }
    if (i === 8 && value !== 0) {
      return {
        ok: true,
        digits: input,
        value,
        prefix: '',
        suffix: '',
        star: false,
        starBefore: false,
        district: null,
        seriesLetter: null,
        style: 'bare',
      };
    }
  }
  let prefix = '';
  let suffix = '';
  let digits = '';
  let stars = 0;
  let starBefore = false;
  let starAfter = false;
  // 0 = before the digits, 1 = in the digits, 2 = after them.
  let phase = 0;
  let trailing = 0;
  let splitDigits = false;
  for (let i = 0; i < input.length; i++) {
    const c = input.charCodeAt(i);
    if (isSeparator(c)) continue;
    if (c >= 48 && c <= 57) {
      if (phase === 2) splitDigits = true;
      phase = phase === 0 ? 1 : phase;
      digits += input[i];
      continue;
    }
    const isLetter = (c >= 65 && c <= 90) || (c >= 97 && c <= 122);
    if (!isLetter && !isStar(c)) {
      const ch = String.fromCodePoint(input.codePointAt(i) ?? c);
      return fail('bad-character', `${shown(ch)} (character ${i + 1}) is not a digit, letter, star, space or dash.`);
    }
    if (isStar(c)) {
      stars++;
      if (phase === 0) starBefore = true;
      else starAfter = true;
    }
    if (phase === 0) {
      if (isLetter) prefix += input[i]!.toUpperCase();
    } else {
      phase = 2;
      trailing++;
      if (isLetter) suffix += input[i]!.toUpperCase();
    }
  }
  if (digits.length === 0) {
    if (prefix === '' && stars === 0) return fail('empty', 'Type the 8 digits of the serial.');
    return fail('too-few-digits', 'There are no digits: a serial has 8.');
  }
  if (splitDigits) return fail('digits-split', 'The digits are broken up by a letter or star; the 8 digits run together.');
  if (digits.length < 8) return fail('too-few-digits', `A serial has 8 digits; this has ${digits.length}.`);
  if (digits.length > 8) return fail('too-many-digits', `A serial has 8 digits; this has ${digits.length}.`);
  if (stars > 1) return fail('two-stars', 'There is more than one star; a star note has one.');
  if (prefix.length > 2) {
    return fail('too-many-prefix-letters', `"${prefix}" is ${prefix.length} letters; the prefix has one or two.`);
  }
  if (trailing > 1) return fail('too-many-suffix-letters', 'After the digits comes one letter or a star, not more.');
  const district = prefix === '' || (older && prefix.length === 1) ? null : prefix[prefix.length - 1]!;
  if (district !== null && !DISTRICT_LETTERS.includes(district)) {
    return fail(
      'unknown-district',
      `"${district}" is not a district letter: the prefix ends in the district, A (Boston) to L (San Francisco).`,
    );
  }
  let value = 0;
  for (let i = 0; i < 8; i++) value = value * 10 + (digits.charCodeAt(i) - 48);
  if (value === 0) return fail('zero-serial', '00000000 is not a serial number; serials start at 00000001.');
  return {
    ok: true,
    digits,
    value,
    prefix,
    suffix,
    star: starBefore || starAfter,
    starBefore,
    district,
    seriesLetter: prefix.length === 2 ? prefix[0]! : null,
    style: prefix.length === 2 ? 'modern' : prefix.length === 1 ? 'older' : 'bare',
  };
}
