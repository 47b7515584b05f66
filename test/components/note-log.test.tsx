import { act, renderHook, waitFor } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import type { QueuedScan } from '../../src/lib/storage/scan-queue';
import { countNote, startCount, type StrapCount, type TrailNote } from '../../src/features/sift/strap-count';
import { TYPED, useNoteLog, type NoteLogDeps } from '../../src/features/sift/use-note-log';

const HUNT = { id: 'hunt-1', title: 'Evening strap', denomination: 1 };
const note = (digits: string) => ({ digits, prefix: '', star: false, pulled: false });

/** A device queue whose saves take a while, and that records whether two ever overlapped. */
function slowQueue(delayMs: number) {
  const added: QueuedScan[] = [];
  let inFlight = 0;
  let overlapped = false;
  return {
    added,
    overlapped: () => overlapped,
    queue: {
      async add(scan: QueuedScan) {
        inFlight += 1;
        if (inFlight > 1) overlapped = true;
        await new Promise((resolve) => setTimeout(resolve, delayMs));
        added.push(scan);
        inFlight -= 1;
      },
    },
  };
}

/** The session's count as useSiftSession keeps it: the real strap arithmetic, behind peek(). */
function countedSession(start: StrapCount | null) {
  let count = start;
  return {
    setCount: (next: StrapCount) => (count = next),
    session: {
      hunt: HUNT,
      get count() {
        return count;
      },
      peek: () => count,
      async log(trailNote: TrailNote) {
        const { next, completedStrap } = countNote(count!, trailNote);
        count = next;
        return completedStrap;
      },
    },
  };
}

const loggedSet = () => {
  const seen = new Set<string>();
  return { seen, logged: { has: (k: string) => seen.has(k), add: async (k: string) => void seen.add(k), remove: async (k: string) => void seen.delete(k) } };
};

function deps(queue: unknown, session: unknown, logged: unknown): NoteLogDeps {
  return { queue, session, logged, weights: undefined, watch: undefined } as unknown as NoteLogDeps;
}

describe('the note line behind Enter and the camera', () => {
  it('when notes are logged before the new hunt has a strap count, then they wait and are stored in order once it exists', async () => {
    const store = slowQueue(1);
    const counted = countedSession(null);
    const { seen, logged } = loggedSet();
    const hook = renderHook((props: NoteLogDeps) => useNoteLog(props), { initialProps: deps(store.queue, counted.session, logged) });

    const serials = ['31740598', '31748517', '31756436'];
    let done: Promise<unknown>[] = [];
    act(() => {
      done = serials.map((digits) => hook.result.current.enqueue(note(digits), TYPED));
    });
    // Known as logged at once, so the camera would say "already logged" for a frame of the same note.
    expect([...seen]).toEqual(serials);
    await new Promise((resolve) => setTimeout(resolve, 20));
    expect(store.added).toHaveLength(0);

    // The strap sheet answers: the count starts at strap 4, note 99, and the session re-renders.
    counted.setCount(startCount(HUNT.id, 4, 98));
    hook.rerender(deps(store.queue, { ...counted.session, count: counted.session.peek(), peek: counted.session.peek, log: counted.session.log, hunt: HUNT }, logged));
    await act(async () => {
      await Promise.all(done);
    });
    expect(store.added.map((scan) => scan.serial)).toEqual(serials);
    // Notes 99 and 100 finish strap 4; the third note is the first of strap 5 (100 notes a strap, common practice).
    expect(store.added.map((scan) => scan.strap)).toEqual([4, 4, 5]);
    expect(store.added.every((scan) => scan.huntId === HUNT.id && scan.entryMethod === 'keypad')).toBe(true);
  });

  it('when 30 notes are logged faster than the device can save them, then each is saved once, one at a time, in the order typed', async () => {
    const store = slowQueue(3);
    const counted = countedSession(startCount(HUNT.id));
    const { logged } = loggedSet();
    const { result } = renderHook(() => useNoteLog(deps(store.queue, counted.session, logged)));
    const serials = Array.from({ length: 30 }, (_, i) => String(40_000_001 + i * 7_919).padStart(8, '0'));
    const outcomes = await act(() => Promise.all(serials.map((digits) => result.current.enqueue(note(digits), TYPED))));
    expect(store.added.map((scan) => scan.serial)).toEqual(serials);
    expect(new Set(store.added.map((scan) => scan.id)).size).toBe(30);
    expect(store.overlapped()).toBe(false);
    expect(outcomes.every((outcome) => outcome && outcome.reading.ok)).toBe(true);
    expect(counted.session.peek()?.inStrap).toBe(30);
  });

  it('when the device store fails, then the caller hears of it and the note is no longer marked as logged', async () => {
    const counted = countedSession(startCount(HUNT.id));
    const { seen, logged } = loggedSet();
    const failing = { add: () => Promise.reject(new Error('quota exceeded')) };
    const { result } = renderHook(() => useNoteLog(deps(failing, counted.session, logged)));
    await act(async () => {
      await expect(result.current.enqueue(note('12345678'), TYPED)).rejects.toThrow('quota exceeded');
    });
    await waitFor(() => expect(seen.has('12345678')).toBe(false));
    expect(counted.session.peek()?.inStrap).toBe(0);
  });
});
