import { parseSerial } from '../engine';

/** One character the recogniser saw, with its confidence from 0 to 1. */
export interface OcrSymbol {
  text: string;
  confidence: number;
}

/** A serial read from a line of recognised text, with how sure the recogniser was of each part. */
export interface SerialRead {
  /** As the engine writes it: prefix, digits, then the suffix letter or `*`. */
  serial: string;
  prefix: string;
  digits: string;
  suffix: string;
  star: boolean;
  /** One confidence (0–1) per digit, in order. */
  digitConfidence: number[];
  /** The weakest character of the serial (0–1): one doubtful digit makes the whole serial doubtful. */
  confidence: number;
  /** True when characters around the serial had to be dropped (card edge, a stray mark). */
  trimmed: boolean;
}

export type SerialReadResult = { ok: true; read: SerialRead } | { ok: false; reason: string };

/**
 * Letters a serial's prefix or suffix can hold: A–Y without O. O is never printed (it looks like 0) and Z is
 * for test printings (BEP, serial numbers; see TRADE.md). The recogniser is limited to these, the digits and
 * the star, so it cannot answer with anything a serial cannot contain.
 */
export const SERIAL_LETTERS = 'ABCDEFGHIJKLMNPQRSTUVWXY';
/** The space lets the recogniser keep `MB 12345678 C` as three words; without it the words run together and lose confidence. */
export const OCR_WHITELIST = `0123456789${SERIAL_LETTERS}* `;

const isDigit = (ch: string) => ch >= '0' && ch <= '9';
const isLetter = (ch: string) => SERIAL_LETTERS.includes(ch);
/**
 * The English model has no ★: unrestricted, it draws one as `*`, `x`, `%` or `+` (measured on the generated
 * cards). Lower-case x is never a serial letter, so it is safe to read as the star.
 */
const STAR_LIKE = new Set(['*', '★', '☆', 'x', '%', '+']);
const isStar = (ch: string) => ch === '*';

function normalise(text: string): string {
  const trimmed = text.trim();
  return STAR_LIKE.has(trimmed) ? '*' : trimmed.toUpperCase();
}

/**
 * Finds the one serial in a line of recognised text: one or two prefix letters, eight digits, and a suffix
 * letter or a star, nothing else (TRADE.md). A shape that is not a serial is rejected, never repaired by
 * guessing a digit. The engine's `parseSerial` has the last word (district letters, 00000000).
 *
 * @example
 * serialFromSymbols([...'MB12345678C'].map((text) => ({ text, confidence: 0.97 })))
 * // { ok: true, read: { serial: 'MB12345678C', prefix: 'MB', digits: '12345678', suffix: 'C', star: false, confidence: 0.97, … } }
 */
export function serialFromSymbols(symbols: readonly OcrSymbol[]): SerialReadResult {
  const chars = symbols
    .map((symbol) => ({ text: normalise(symbol.text), confidence: clamp01(symbol.confidence) }))
    .filter((symbol) => symbol.text.length === 1);
  if (chars.length === 0) return { ok: false, reason: 'nothing read' };
  for (let k = 0; k + 1 < chars.length; k++) {
    // A bold J's descender reads as a bracket without the whitelist, and with it the J is dropped (on 1,400
    // generated cards, both ")" read just before the digits were a one-letter prefix J; nothing else was).
    if (J_LIKE.has(chars[k]!.text) && isDigit(chars[k + 1]!.text) && (k === 0 || !isLetter(chars[k - 1]!.text))) {
      chars[k] = { text: 'J', confidence: chars[k]!.confidence * GUESSED_LETTER_FACTOR };
    }
  }

  // Every run of exactly eight digits is a candidate; a longer run is not a serial.
  const candidates: SerialRead[] = [];
  let i = 0;
  while (i < chars.length) {
    if (!isDigit(chars[i]!.text)) {
      i++;
      continue;
    }
    let end = i;
    while (end < chars.length && isDigit(chars[end]!.text)) end++;
    // Letters that share a shape with a digit (I and 1, G and 6, B and 8…) come back as digits. A serial has
    // exactly eight digits, so a ninth or tenth at the end of the run sits where a letter must be.
    const extra = end - i - 8;
    const followed = end < chars.length && (isLetter(chars[end]!.text) || isStar(chars[end]!.text));
    if (extra === 2 || (extra === 1 && followed)) i = asLetter(chars, i) ? i + 1 : i;
    if (extra === 2 || (extra === 1 && !followed)) end = asLetter(chars, end - 1) ? end - 1 : end;
    if (end - i === 8) {
      const candidate = around(chars, i, end);
      if (candidate) candidates.push(candidate);
    }
    i = end;
  }
  if (candidates.length === 0) {
    const digits = chars.filter((c) => isDigit(c.text)).length;
    return { ok: false, reason: digits === 0 ? 'no digits read' : `no serial shape in "${chars.map((c) => c.text).join('')}"` };
  }
  if (candidates.length > 1) return { ok: false, reason: 'more than one serial in view' };
  return { ok: true, read: candidates[0]! };
}

/** Digits read where a letter must be, and the letter each most often is (O is never printed, so 0 is D). */
const DIGIT_AS_LETTER: Record<string, string> = { '0': 'D', '1': 'I', '3': 'J', '4': 'A', '5': 'S', '6': 'G', '7': 'T', '8': 'B' };
const J_LIKE = new Set([')']);
/** A letter recovered from a digit's or a bracket's shape is a guess: never sure enough to accept on one frame alone. */
const GUESSED_LETTER_FACTOR = 0.7;

function asLetter(chars: OcrSymbol[], index: number): boolean {
  const letter = DIGIT_AS_LETTER[chars[index]!.text];
  if (!letter) return false;
  chars[index] = { text: letter, confidence: chars[index]!.confidence * GUESSED_LETTER_FACTOR };
  return true;
}

function around(chars: readonly OcrSymbol[], start: number, end: number): SerialRead | null {
  let p = start;
  while (p > 0 && start - p < 2 && isLetter(chars[p - 1]!.text)) p--;
  if (p === start) return null;
  const after = chars[end];
  if (!after || !(isLetter(after.text) || isStar(after.text))) return null;
  const prefixChars = chars.slice(p, start);
  const digitChars = chars.slice(start, end);
  const prefix = prefixChars.map((c) => c.text).join('');
  const digits = digitChars.map((c) => c.text).join('');
  const star = isStar(after.text);
  const suffix = star ? '' : after.text;
  const parsed = parseSerial(`${prefix}${digits}${star ? '*' : suffix}`);
  if (!parsed.ok) return null;
  const used = [...prefixChars, ...digitChars, after];
  return {
    serial: `${prefix}${digits}${star ? '*' : suffix}`,
    prefix,
    digits,
    suffix,
    star,
    digitConfidence: digitChars.map((c) => c.confidence),
    confidence: Math.min(...used.map((c) => c.confidence)),
    trimmed: p > 0 || end + 1 < chars.length,
  };
}

function clamp01(value: number): number {
  if (!Number.isFinite(value)) return 0;
  return value < 0 ? 0 : value > 1 ? 1 : value;
}
