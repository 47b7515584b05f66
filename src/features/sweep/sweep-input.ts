import { MAX_SWEEP, PATTERN_IDS, parseSerial, type ParsedSerial, type PatternId } from '@shared/engine';
import { NOTES_PER_BRICK, NOTES_PER_BUNDLE, NOTES_PER_STRAP } from '@shared/trade';

export const COUNT_PRESETS = [
  { value: 'strap', label: `Strap · ${NOTES_PER_STRAP}`, notes: NOTES_PER_STRAP },
  { value: 'bundle', label: `Bundle · ${NOTES_PER_BUNDLE.toLocaleString('en-US')}`, notes: NOTES_PER_BUNDLE },
  { value: 'brick', label: `Brick · ${NOTES_PER_BRICK.toLocaleString('en-US')}`, notes: NOTES_PER_BRICK },
  { value: 'other', label: 'Other', notes: null },
] as const;
export type CountPreset = (typeof COUNT_PRESETS)[number]['value'];

/** Which preset a typed count matches, so the pills follow the field and the field follows the pills. */
export function presetOf(countText: string): CountPreset {
  const count = readCount(countText);
  return COUNT_PRESETS.find((preset) => preset.notes === count)?.value ?? 'other';
}

/** A count as people write it: 4000, 4,000 or 4 000. NaN for anything else. */
export function readCount(text: string): number {
  const compact = text.trim().replace(/[\s,_\u00a0\u202f]/g, '');
  return /^\d{1,9}$/.test(compact) ? Number.parseInt(compact, 10) : Number.NaN;
}

export interface SweepRequest {
  serial: ParsedSerial;
  count: number;
  patterns: PatternId[];
}

export type SweepInputResult =
  | { ok: true; request: SweepRequest }
  | { ok: false; errors: { serial?: string; count?: string; patterns?: string } };

/**
 * Checks the sweep form: the first serial through the engine's parser (its own words when it is not
 * one), a whole count from 1 to 10,000,000, and at least one pattern.
 */
export function parseSweepInput(serialText: string, countText: string, patterns: readonly PatternId[]): SweepInputResult {
  const errors: { serial?: string; count?: string; patterns?: string } = {};
  const serial = parseSerial(serialText);
  if (!serial.ok) errors.serial = serial.error.message;
  const count = readCount(countText);
  if (countText.trim() === '') errors.count = 'Type how many notes follow in sequence, e.g. 100 for a strap.';
  else if (Number.isNaN(count)) errors.count = 'The count is a whole number of notes, such as 100 or 4,000.';
  else if (count < 1) errors.count = 'The count is at least 1 note.';
  else if (count > MAX_SWEEP) errors.count = `A sweep covers at most ${MAX_SWEEP.toLocaleString('en-US')} notes at once.`;
  const chosen = PATTERN_IDS.filter((id) => patterns.includes(id));
  if (chosen.length === 0) errors.patterns = 'Pick at least one pattern to look for.';
  if (!serial.ok || errors.count || errors.patterns) return { ok: false, errors };
  return { ok: true, request: { serial, count, patterns: chosen } };
}

/** Where a hit sits in the run: how many notes after the first, and its strap and place in that strap. */
export function position(value: number, first: number): { away: number; strap: number; inStrap: number } {
  const away = value - first;
  return { away, strap: Math.floor(away / NOTES_PER_STRAP) + 1, inStrap: (away % NOTES_PER_STRAP) + 1 };
}

/** The serial as the note shows it, with the letters of the first serial typed. */
export function fullSerial(digits: string, serial: Pick<ParsedSerial, 'prefix' | 'suffix' | 'star'>): string {
  return [serial.prefix, digits, serial.star ? '★' : serial.suffix].filter(Boolean).join(' ');
}
