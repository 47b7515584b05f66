import { updateStrapRequest, type StrapRow, type UpdateStrapRequest } from '@shared/contracts';
import { flatFieldErrors } from '@shared/contracts/field-errors';
import { balanceOf, isTouched, strapFigures, type StrapBalance, type StrapFigures } from '@shared/straps';

/** What the strap editor holds while the hunter types: text, so a half-typed "−" is never lost. */
export interface StrapDraft {
  swappedIn: string;
  shortOver: string;
  note: string;
}

export type StrapDraftField = keyof StrapDraft;

export function draftFrom(row: StrapRow): StrapDraft {
  return { swappedIn: String(row.swappedIn), shortOver: signed(row.shortOver), note: row.note ?? '' };
}

/** +2, 0, −1: the sign is what the teller cares about. */
export function signed(value: number): string {
  return value > 0 ? `+${value}` : value < 0 ? `−${-value}` : '0';
}

/**
 * Reads a whole number as people type it: spaces around it, a leading + or a minus (hyphen or the
 * typographic −). Anything else is NaN, which the contract reports as "must be a whole number".
 */
export function readWhole(text: string): number {
  const trimmed = text.trim().replace(/^−/, '-');
  if (!/^[+-]?\d{1,6}$/.test(trimmed)) return Number.NaN;
  return Number.parseInt(trimmed, 10);
}

export type DraftResult = { ok: true; body: UpdateStrapRequest } | { ok: false; errors: Partial<Record<StrapDraftField, string>> };

/** Checks a draft against the shared contract, field by field, so each field shows its own message. */
export function parseStrapDraft(draft: StrapDraft): DraftResult {
  const body = {
    swappedIn: readWhole(draft.swappedIn),
    shortOver: readWhole(draft.shortOver),
    note: draft.note.trim() === '' ? null : draft.note.trim(),
  };
  const parsed = updateStrapRequest.safeParse(body);
  if (parsed.success) return { ok: true, body: parsed.data };
  const { swappedIn, shortOver, note } = flatFieldErrors(parsed.error);
  const errors: Partial<Record<StrapDraftField, string>> = {};
  if (swappedIn) errors.swappedIn = swappedIn;
  if (shortOver) errors.shortOver = shortOver;
  if (note) errors.note = note;
  return { ok: false, errors };
}

/** What the strap would go back with if the draft were saved; null while a number is unreadable. */
export function previewBack(row: Pick<StrapRow, 'pulled'>, draft: StrapDraft): StrapFigures | null {
  const swappedIn = readWhole(draft.swappedIn);
  const shortOver = readWhole(draft.shortOver);
  if (Number.isNaN(swappedIn) || Number.isNaN(shortOver)) return null;
  return strapFigures({ pulled: row.pulled, swappedIn, shortOver });
}

export type StrapTone = 'ok' | 'warn' | 'danger' | 'neutral';

/**
 * The colour of a strap's balance: short is danger (notes missing from the bank's cash), over is a
 * warning; never the find accent, which marks patterns.
 */
export const BALANCE_TONE: Record<StrapBalance, StrapTone> = { 'not started': 'neutral', complete: 'ok', short: 'danger', over: 'warn' };

/** The preview line's colour: a strap being squared is never "not started". */
export function previewTone(notesBack: number): Exclude<StrapTone, 'neutral'> {
  const balance = balanceOf(notesBack).balance;
  return balance === 'short' ? 'danger' : balance === 'over' ? 'warn' : 'ok';
}

export { isTouched };
