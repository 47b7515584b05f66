import type { SerialRead } from './serial-from-text';

/**
 * How sure the camera must be. Chosen from generated cards that are neither the bench's nor the tests'
 * (1,200 degraded and 200 clean, seeds 77001–77003; docs/PERFORMANCE.md, "Camera"): the recogniser's
 * wrong reads sit between 0.90 and 0.95 (a suffix U read as V, a prefix letter gained or lost), and at
 * `single` 0.95, with agreement counted only between differently prepared pictures (recognise.ts), none
 * of the 1,400 was accepted wrong (at 0.90, 5 were). Pairs of agreeing frames above `agree` were never
 * wrong. A digit under `unsureDigit` is highlighted for the hunter to check.
 */
export const ACCEPTANCE = { single: 0.95, agree: 0.6, unsureDigit: 0.75 } as const;

export interface AcceptanceState {
  /** What the last frame read (null when it read no serial). */
  previous: SerialRead | null;
  /** The serial accepted last: holding the same note under the camera never accepts it again. */
  lastAccepted: string | null;
  /** How many frames in a row before this one read `previous` (0 when it was the first). */
  streak: number;
}

export type FrameVerdict =
  /** Nothing usable in this frame. */
  | { kind: 'nothing' }
  /** A serial, not yet trusted: wait for the next frame. */
  | { kind: 'tentative'; read: SerialRead }
  /** The note still under the camera, already accepted. */
  | { kind: 'held'; read: SerialRead }
  /** A new serial to log; `unsure` lists 1-based digit positions to check before logging. */
  | { kind: 'accept'; read: SerialRead; unsure: number[] };

export const initialAcceptance: AcceptanceState = { previous: null, lastAccepted: null, streak: 0 };

/**
 * The camera's rule for one frame: a serial is accepted when two frames in a row agree (each at least
 * `agree` sure) or when one frame is `single` sure; a serial within two digits of the one accepted last
 * needs three agreeing frames instead. The same serial is accepted once while it stays.
 * Pure, so the browser, the CLI (`accepted` for one still) and the tests share it.
 *
 * @example
 * const first = acceptFrame(initialAcceptance, read);      // { verdict: { kind: 'tentative' } } at 0.7
 * const second = acceptFrame(first.state, read);           // { verdict: { kind: 'accept', unsure: [] } }
 */
export function acceptFrame(state: AcceptanceState, read: SerialRead | null): { state: AcceptanceState; verdict: FrameVerdict } {
  if (!read) return { state: { ...state, previous: null, streak: 0 }, verdict: { kind: 'nothing' } };
  const same = state.previous?.serial === read.serial;
  const streak = same ? state.streak + 1 : 0;
  if (read.serial === state.lastAccepted) return { state: { ...state, previous: read, streak }, verdict: { kind: 'held', read } };
  const agreed = same && state.previous!.confidence >= ACCEPTANCE.agree && read.confidence >= ACCEPTANCE.agree;
  // A serial within two digits (an edit or two) of the one just accepted is more often that same note
  // misread than a new one (measured on the fake-camera strap): it never counts alone and needs three
  // agreeing frames. A sequential strap's next note still comes in, a frame later.
  const near = nearlySame(read, state.lastAccepted);
  const alone = read.confidence >= ACCEPTANCE.single && !near;
  if (!(agreed && (!near || streak >= 2)) && !alone) return { state: { ...state, previous: read, streak }, verdict: { kind: 'tentative', read } };
  const merged = agreed && state.previous ? mergeReads(state.previous, read) : read;
  return {
    state: { previous: merged, lastAccepted: merged.serial, streak },
    verdict: { kind: 'accept', read: merged, unsure: unsureDigits(merged) },
  };
}

/** Levenshtein distance of the 8 digits at most 2: a changed, dropped or doubled digit or two. */
function nearlySame(read: SerialRead, last: string | null): boolean {
  if (!last) return false;
  const a = read.digits;
  const b = last.replace(/\D/g, '');
  let row = Array.from({ length: b.length + 1 }, (_, j) => j);
  for (let i = 1; i <= a.length; i++) {
    const next = [i];
    for (let j = 1; j <= b.length; j++) next.push(Math.min(row[j]! + 1, next[j - 1]! + 1, row[j - 1]! + (a[i - 1] === b[j - 1] ? 0 : 1)));
    row = next;
  }
  return row[b.length]! <= 2;
}

/** What one still picture would do on its own: only a `single`-sure read is accepted. */
export const acceptedAlone = (read: SerialRead | null) => !!read && read.confidence >= ACCEPTANCE.single;

/** 1-based positions of the digits the camera is unsure of. */
export function unsureDigits(read: SerialRead): number[] {
  return read.digitConfidence.flatMap((confidence, index) => (confidence < ACCEPTANCE.unsureDigit ? [index + 1] : []));
}

/** Two frames that read the same serial: each digit is as sure as the surer frame. */
function mergeReads(a: SerialRead, b: SerialRead): SerialRead {
  const digitConfidence = a.digitConfidence.map((value, index) => Math.max(value, b.digitConfidence[index] ?? 0));
  return { ...b, digitConfidence, confidence: Math.max(a.confidence, b.confidence) };
}
