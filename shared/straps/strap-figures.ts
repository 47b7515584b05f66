import { NOTES_PER_STRAP } from '../trade';

/**
 * The one home of strap arithmetic: the server's strap sheet, the sheet editor's preview, the
 * printed sheet and the tests all count with these functions, so "goes back with 98" means the same
 * everywhere. A strap holds 100 notes (common practice for US straps of small notes).
 */

/** What the hunter recorded about a strap, and the notes logged in it. */
export interface StrapCounts {
  /** Notes logged as pulled (kept out of the strap). */
  pulled: number;
  /** Ordinary notes put back in place of pulled ones. */
  swappedIn: number;
  /** How far the bank's strap was from 100 when it arrived: −2 for two short, +1 for one over. */
  shortOver: number;
}

export interface StrapFigures {
  /** Notes the bank's strap actually held. */
  received: number;
  /** Notes the strap goes back with: received − pulled + swapped in. */
  notesBack: number;
  /** Whether it goes back with exactly 100. */
  complete: boolean;
}

/**
 * @example
 * strapFigures({ pulled: 3, swappedIn: 2, shortOver: 1 }) // { received: 101, notesBack: 100, complete: true }
 */
export function strapFigures({ pulled, swappedIn, shortOver }: StrapCounts): StrapFigures {
  const received = NOTES_PER_STRAP + shortOver;
  const notesBack = received - pulled + swappedIn;
  return { received, notesBack, complete: notesBack === NOTES_PER_STRAP };
}

/** A strap the hunter has opened or written anything about: notes logged, counts or a note. */
export function isTouched(row: StrapCounts & { searched: number; note?: string | null }): boolean {
  return row.searched > 0 || row.pulled > 0 || row.swappedIn > 0 || row.shortOver !== 0 || !!row.note;
}

export type StrapBalance = 'not started' | 'complete' | 'short' | 'over';

export interface StrapStatus {
  balance: StrapBalance;
  /** How many notes short or over; 0 otherwise. */
  by: number;
  /** The sheet's words: "not started", "complete", "2 short", "1 over". */
  label: string;
}

/**
 * Where a strap stands against 100, in the words the sheet uses.
 *
 * @example
 * strapStatus({ searched: 100, pulled: 2, swappedIn: 0, shortOver: 0, notesBack: 98 }) // { balance: 'short', by: 2, label: '2 short' }
 */
export function strapStatus(row: StrapCounts & { searched: number; note?: string | null; notesBack: number }): StrapStatus {
  if (!isTouched(row)) return { balance: 'not started', by: 0, label: 'not started' };
  return balanceOf(row.notesBack);
}

/** "complete", "2 short" or "1 over" for a strap going back with this many notes. */
export function balanceOf(notesBack: number): StrapStatus {
  if (notesBack < NOTES_PER_STRAP) return { balance: 'short', by: NOTES_PER_STRAP - notesBack, label: `${NOTES_PER_STRAP - notesBack} short` };
  if (notesBack > NOTES_PER_STRAP) return { balance: 'over', by: notesBack - NOTES_PER_STRAP, label: `${notesBack - NOTES_PER_STRAP} over` };
  return { balance: 'complete', by: 0, label: 'complete' };
}

/**
 * The strap sheet's closing count: how many straps go back with exactly 100, with the straps not yet
 * opened said apart (they go back as they came, so they count, but "9 of 10 complete" after two notes
 * would read as work done).
 *
 * @example
 * strapsBackLine([{ searched: 2, pulled: 1, swappedIn: 0, shortOver: 0, notesBack: 99 }, { searched: 0, pulled: 0, swappedIn: 0, shortOver: 0, notesBack: 100 }])
 * // '1 of 2 straps go back with 100 (1 not started)'
 */
export function strapsBackLine(rows: ReadonlyArray<StrapCounts & { searched: number; note?: string | null; notesBack: number }>): string {
  const withHundred = rows.filter((row) => row.notesBack === NOTES_PER_STRAP).length;
  const notStarted = rows.filter((row) => !isTouched(row)).length;
  const noun = rows.length === 1 ? 'strap goes' : 'straps go';
  return `${withHundred} of ${rows.length} ${noun} back with ${NOTES_PER_STRAP}${notStarted ? ` (${notStarted} not started)` : ''}`;
}
