import { describe, expect, it } from 'vitest';
import { ACCEPTANCE } from '../../shared/ocr/acceptance';
import { serialFromSymbols } from '../../shared/ocr/serial-from-text';

const symbols = (text: string, confidence = 0.95) => [...text].map((ch) => ({ text: ch, confidence }));

describe('serialFromSymbols', () => {
  it('when the line holds the modern shape (two prefix letters, 8 digits, a suffix), then every part comes back', () => {
    const result = serialFromSymbols(symbols('MB 12345678 C'));
    expect(result).toMatchObject({ ok: true, read: { serial: 'MB12345678C', prefix: 'MB', digits: '12345678', suffix: 'C', star: false, trimmed: false } });
  });

  it('when the older shape carries a star, then it reads as a star note with no suffix (TRADE.md: a star replaces the suffix)', () => {
    expect(serialFromSymbols(symbols('B12345678*'))).toMatchObject({ ok: true, read: { serial: 'B12345678*', prefix: 'B', suffix: '', star: true } });
    // The English model has no ★ and draws it as x or % without the whitelist (measured on the cards).
    expect(serialFromSymbols(symbols('B12345678x'))).toMatchObject({ ok: true, read: { star: true } });
  });

  it('when a letter came back as its look-alike digit at either end, then the letter is restored with lower confidence', () => {
    const result = serialFromSymbols(symbols('G893520711'));
    expect(result).toMatchObject({ ok: true, read: { serial: 'G89352071I', suffix: 'I' } });
    if (result.ok) expect(result.read.confidence).toBeLessThan(0.9);
    expect(serialFromSymbols(symbols('1 86759264 B'))).toMatchObject({ ok: true, read: { serial: 'I86759264B' } });
  });

  it('when the shape is not a serial, then it is refused rather than repaired', () => {
    expect(serialFromSymbols(symbols('12345678')).ok).toBe(false); // no prefix, no suffix
    expect(serialFromSymbols(symbols('MB 1234567 C')).ok).toBe(false); // seven digits
    expect(serialFromSymbols(symbols('MBC12345678C')).ok).toBe(true); // a stray letter before: trimmed
    expect(serialFromSymbols(symbols('MN12345678C')).ok).toBe(false); // N is not a district (A–L)
    expect(serialFromSymbols(symbols('MB00000000C')).ok).toBe(false); // 00000000 is never printed (BEP)
    expect(serialFromSymbols([]).ok).toBe(false);
  });

  it('when one digit is doubtful, then the whole serial is as doubtful as that digit', () => {
    const read = symbols('MB12345678C');
    read[5] = { text: '4', confidence: 0.41 };
    const result = serialFromSymbols(read);
    expect(result.ok && result.read.confidence).toBe(0.41);
    expect(result.ok && result.read.digitConfidence[3]).toBe(0.41);
  });

  it('when two serials are in view, then neither is taken', () => {
    expect(serialFromSymbols(symbols('MB12345678C MB87654321D'))).toEqual({ ok: false, reason: 'more than one serial in view' });
  });

  it('when a bold J before the digits comes back as a bracket, then it is read as the prefix J, as a guess that cannot be accepted alone', () => {
    const result = serialFromSymbols(symbols(')42861470W'));
    expect(result.ok && result.read.serial).toBe('J42861470W');
    expect(result.ok && result.read.confidence).toBeLessThan(ACCEPTANCE.single);
    // After a letter it is no J (a two-letter prefix never ends in a bracket): no serial shape there.
    expect(serialFromSymbols(symbols('A)42861470W')).ok).toBe(false);
  });
});
