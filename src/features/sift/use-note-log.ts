import { useCallback, useEffect, useRef } from 'react';
import { read } from '@shared/engine';
import { uuid } from '@/lib/uuid';
import type { ScanQueue } from '@/lib/storage/scan-queue';
import { loggedKey, type useLoggedSerials } from '../camera/use-logged-serials';
import type { SerialEntry } from './serial-entry';
import type { useSiftSession } from './use-sift-session';

/** How a note came in: typed, or read by the camera (with its confidence and suffix). */
export type EntrySource =
  | { method: 'keypad' }
  | { method: 'camera'; confidence: number; suffix: string; unsure: number[]; logged: boolean };
export const TYPED: EntrySource = { method: 'keypad' };

type Reading = ReturnType<typeof read>;
type ReadOptions = NonNullable<Parameters<typeof read>[1]>;

export interface NoteLogged {
  reading: Extract<Reading, { ok: true }>;
  /** The strap this note completed, if it was the hundredth. */
  completedStrap: number | null;
}

export interface NoteLogDeps {
  queue: ScanQueue | null;
  session: ReturnType<typeof useSiftSession>;
  logged: ReturnType<typeof useLoggedSerials>;
  weights: ReadOptions['weights'];
  watch: ReadOptions['watch'];
}

interface PendingNote {
  note: SerialEntry;
  from: EntrySource;
  runSize: number | null;
  huntId: string;
  settle(outcome: { ok: true; value: NoteLogged | null } | { ok: false; error: unknown }): void;
}

/**
 * The one line every note joins, typed or read: notes are stored strictly in the order they were
 * logged, one at a time, each on the strap the count says at that moment.
 *
 * A hunter's keyboard outruns both the paint and the device store (13 notes a second is 9 keys every
 * 8.5 ms), and a new hunt's strap count only exists once its strap sheet has answered. So the cells
 * are cleared the instant a note is logged and the note waits here, never in a render's closure,
 * until the queue and the count are ready for it. Nothing typed is dropped while a save is in flight.
 */
export function useNoteLog(deps: NoteLogDeps) {
  const live = useRef(deps);
  live.current = deps;
  const waiting = useRef<PendingNote[]>([]);
  const draining = useRef(false);

  const drain = useCallback(async () => {
    if (draining.current) return;
    draining.current = true;
    try {
      for (let next = waiting.current[0]; next; next = waiting.current[0]) {
        const { queue, session } = live.current;
        const count = session.peek();
        // Not ready yet (the count is still being found): the effect below drains again when it is.
        if (!queue || !count || count.huntId !== next.huntId) break;
        waiting.current.shift();
        try {
          next.settle({ ok: true, value: await store(next, live.current, count.strap) });
        } catch (error) {
          live.current.logged.remove(loggedKey(next.note)).catch(() => undefined);
          next.settle({ ok: false, error });
        }
      }
    } finally {
      draining.current = false;
    }
  }, []);

  useEffect(() => {
    void drain();
  }, [deps.queue, deps.session.count, drain]);

  /** Joins the line; resolves with the reading once stored, or null when the engine refuses the serial. */
  const enqueue = useCallback(
    (note: SerialEntry, from: EntrySource, runSize: number | null = null): Promise<NoteLogged | null> => {
      const huntId = live.current.session.hunt?.id;
      if (!huntId) return Promise.resolve(null);
      // Known as logged at once, so a camera frame of the same note a moment later says "already logged".
      live.current.logged.add(loggedKey(note)).catch(() => undefined);
      return new Promise((resolve, reject) => {
        waiting.current.push({
          note,
          from,
          runSize,
          huntId,
          settle: (outcome) => (outcome.ok ? resolve(outcome.value) : reject(outcome.error)),
        });
        void drain();
      });
    },
    [drain],
  );

  return { enqueue };
}

async function store(item: PendingNote, deps: NoteLogDeps, strap: number): Promise<NoteLogged | null> {
  const { note, from, runSize, huntId } = item;
  const { queue, session, weights, watch } = deps;
  const hunt = session.hunt;
  const reading = read(`${note.prefix}${note.digits}`, {
    weights,
    watch,
    star: note.star,
    denomination: hunt?.denomination,
    series: hunt?.series ?? undefined,
    starRunSize: runSize,
  });
  if (!reading.ok || !queue) return null;
  const id = uuid();
  const now = new Date().toISOString();
  const suffix = from.method === 'camera' && !note.star ? from.suffix : '';
  await queue.add({
    id,
    huntId,
    strap,
    serial: `${note.prefix}${note.digits}${suffix}`,
    star: reading.star,
    pulled: note.pulled,
    scannedAt: now,
    entryMethod: from.method,
    ...(from.method === 'camera' ? { cameraConfidence: Math.round(from.confidence * 1000) / 1000 } : {}),
    ...(reading.star && runSize !== null ? { starRunSize: runSize } : {}),
  });
  const completedStrap = await session.log({
    id,
    strap,
    digits: note.digits,
    prefix: note.prefix,
    star: reading.star,
    pulled: note.pulled,
    patterns: reading.patterns,
    points: reading.score.points,
    keep: reading.score.keep,
    loggedAt: now,
  });
  return { reading, completedStrap };
}
