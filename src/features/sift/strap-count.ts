import { NOTES_PER_STRAP as STRAP_SIZE } from '@shared/trade';

/** One logged note as the trail shows it. */
export interface TrailNote {
  id: string;
  strap: number;
  digits: string;
  prefix: string;
  star: boolean;
  pulled: boolean;
  patterns: string[];
  points: number;
  keep: boolean;
  loggedAt: string;
  /** Set once the pulled note was added to the keeper log from the trail. */
  addedToKeepers?: boolean;
}

/**
 * Where the hunter is in the hunt: which strap, how many notes of it are done, and the last notes.
 * Kept per hunt on the device, so a reload or a dead battery doesn't lose the count.
 */
export interface StrapCount {
  huntId: string;
  strap: number;
  inStrap: number;
  /** Notes logged on this device per strap, so undo can step back across a strap boundary. */
  perStrap: Record<number, number>;
  trail: TrailNote[];
}

export const TRAIL_LENGTH = 10;
export const NOTES_PER_STRAP = STRAP_SIZE;

export function startCount(huntId: string, strap = 1, inStrap = 0): StrapCount {
  return { huntId, strap, inStrap, perStrap: inStrap ? { [strap]: inStrap } : {}, trail: [] };
}

/** Counts one note; at 100 the strap is complete and the next strap starts at 0. */
export function countNote(state: StrapCount, note: TrailNote): { next: StrapCount; completedStrap: number | null } {
  const inStrap = state.inStrap + 1;
  const perStrap = { ...state.perStrap, [state.strap]: (state.perStrap[state.strap] ?? 0) + 1 };
  const trail = [note, ...state.trail].slice(0, TRAIL_LENGTH);
  if (inStrap >= NOTES_PER_STRAP) {
    return { next: { ...state, strap: state.strap + 1, inStrap: 0, perStrap, trail }, completedStrap: state.strap };
  }
  return { next: { ...state, inStrap, perStrap, trail }, completedStrap: null };
}

/** Takes back the last note logged on this device, stepping back into its strap if need be. */
export function uncountLast(state: StrapCount): { next: StrapCount; removed: TrailNote | null } {
  const [last, ...rest] = state.trail;
  if (!last) return { next: state, removed: null };
  const perStrap = { ...state.perStrap, [last.strap]: Math.max(0, (state.perStrap[last.strap] ?? 1) - 1) };
  const inStrap = last.strap === state.strap ? Math.max(0, state.inStrap - 1) : perStrap[last.strap];
  return { next: { ...state, strap: last.strap, inStrap, perStrap, trail: rest }, removed: last };
}

/** The hunter moved to another strap by hand (crew split a bundle, or a strap was skipped). */
export function chooseStrap(state: StrapCount, strap: number, alreadySearched: number): StrapCount {
  return { ...state, strap: Math.max(1, Math.floor(strap)), inStrap: Math.min(NOTES_PER_STRAP - 1, Math.max(0, alreadySearched)) };
}
