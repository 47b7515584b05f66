import { updateStrapRequest, type StrapRow, type UpdateStrapRequest } from '@shared/contracts';
import { NOTES_PER_STRAP } from '@shared/trade';

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
  const errors: Partial<Record<StrapDraftField, string>> = {};
  for (const issue of parsed.error.issues) {
    const field = issue.path[0];
    if ((field === 'swappedIn' || field === 'shortOver' || field === 'note') && !errors[field]) errors[field] = issue.message;
  }
  return { ok: false, errors };
}

/** What the strap would go back with if the draft were saved; null while a number is unreadable. */
export function previewBack(row: Pick<StrapRow, 'pulled'>, draft: StrapDraft): { received: number; notesBack: number; complete: boolean } | null {
  const swappedIn = readWhole(draft.swappedIn);
  const shortOver = readWhole(draft.shortOver);
  if (Number.isNaN(swappedIn) || Number.isNaN(shortOver)) return null;
  const received = NOTES_PER_STRAP + shortOver;
  const notesBack = received - row.pulled + swappedIn;
  return { received, notesBack, complete: notesBack === NOTES_PER_STRAP };
}

export type StrapState = { tone: 'ok' | 'hit' | 'near' | 'neutral'; label: string };

/** One word for the strap's state, as the sheet shows it: complete, 2 short, 1 over, not started. */
export function strapState(row: StrapRow): StrapState {
  const touched = row.searched > 0 || row.swappedIn > 0 || row.shortOver !== 0 || row.pulled > 0;
  if (!touched) return { tone: 'neutral', label: 'not started' };
  if (row.notesBack < NOTES_PER_STRAP) return { tone: 'hit', label: `${NOTES_PER_STRAP - row.notesBack} short` };
  if (row.notesBack > NOTES_PER_STRAP) return { tone: 'near', label: `${row.notesBack - NOTES_PER_STRAP} over` };
  return { tone: 'ok', label: 'complete' };
}

export function isTouched(row: StrapRow): boolean {
  return row.searched > 0 || row.swappedIn > 0 || row.shortOver !== 0 || row.pulled > 0 || !!row.note;
}
