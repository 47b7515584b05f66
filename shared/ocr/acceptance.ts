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
  /** The reads of the frames before this one that read a serial, oldest first, at most `WINDOW - 1`. */
  recent: SerialRead[];
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

export const initialAcceptance: AcceptanceState = { previous: null, lastAccepted: null, streak: 0, recent: [] };

/** Frames that read a serial looked at together: this one and the two before it. */
const WINDOW = 3;

/**
 * The camera's rule for one frame: a serial is accepted when two of the last three frames agree on it
 * (each at least `agree` sure, this frame one of them) or when one frame is `single` sure. Some serials
 * need all three frames to agree instead: one within two digits of the serial accepted last, and one with
 * a one-letter prefix. The same serial is accepted once while it stays.
 * Pure, so the browser, the CLI (`accepted` for one still) and the tests share it.
 *
 * @example
 * const first = acceptFrame(initialAcceptance, read);      // { verdict: { kind: 'tentative' } } at 0.7
 * const second = acceptFrame(first.state, read);           // { verdict: { kind: 'accept', unsure: [] } }
 */
export function acceptFrame(state: AcceptanceState, read: SerialRead | null): { state: AcceptanceState; verdict: FrameVerdict } {
  // A frame that read nothing (motion, blur, a variant that missed) is no evidence either way: it neither
  // counts nor breaks a run of agreeing frames (the fake-camera strap read J42861470W in every other frame).
  if (!read) return { state: { ...state, previous: null, streak: 0 }, verdict: { kind: 'nothing' } };
  const recent = [...state.recent, read].slice(-(WINDOW - 1));
  const same = state.previous?.serial === read.serial;
  const streak = same ? state.streak + 1 : 0;
  if (read.serial === state.lastAccepted) return { state: { ...state, previous: read, streak, recent }, verdict: { kind: 'held', read } };
  // A hand, a blur or a glint can spoil one frame in the middle of a note: two agreeing frames out of three
  // still count (the fake-camera strap lost a note whose frames agreed eight times but never two in a row
  // above `agree`, the letter I being read at 0.5 to 0.8).
  const agreeing = read.confidence >= ACCEPTANCE.agree ? state.recent.filter((seen) => seen.serial === read.serial && seen.confidence >= ACCEPTANCE.agree) : [];
  // A serial within two digits (an edit or two) of the one just accepted is more often that same note
  // misread than a new one (measured on the fake-camera strap): it never counts alone and needs three
  // agreeing frames. A sequential strap's next note still comes in, a frame later. A one-letter prefix is
  // as often a two-letter one with its thin first letter (I, J) lost by some preparations (fake-camera
  // strap: IC38838838K was read C38838838K in two frames out of three): three frames must agree.
  const near = nearlySame(read, state.lastAccepted);
  const needed = near || read.prefix.length === 1 ? WINDOW - 1 : 1;
  const agreed = agreeing.length >= needed;
  const alone = read.confidence >= ACCEPTANCE.single && !near;
  if (!agreed && !alone) return { state: { ...state, previous: read, streak, recent }, verdict: { kind: 'tentative', read } };
  const merged = agreeing.reduce(mergeReads, read);
  return {
    state: { previous: merged, lastAccepted: merged.serial, streak, recent },
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

/** Frames that read the same serial: each digit is as sure as the surest frame; `latest` is kept as read. */
function mergeReads(latest: SerialRead, other: SerialRead): SerialRead {
  const digitConfidence = latest.digitConfidence.map((value, index) => Math.max(value, other.digitConfidence[index] ?? 0));
  return { ...latest, digitConfidence, confidence: Math.max(latest.confidence, other.confidence) };
}
