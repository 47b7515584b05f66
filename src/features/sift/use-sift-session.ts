import { startTransition, useCallback, useEffect, useRef, useState } from 'react';
import type { StrapSheet } from '@shared/contracts';
import { kv } from '@/lib/storage/kv';
import { chooseStrap, countNote, startCount, uncountLast, type StrapCount, type TrailNote } from './strap-count';

const CURRENT_KEY = 'strapsift.sift.hunt';
/** What the count needs from a strap sheet; an empty one stands in when the sheet can't be fetched. */
export type SheetStart = Pick<StrapSheet, 'huntId' | 'straps'>;

const countKey = (huntId: string) => `strapsift.sift.count.${huntId}`;

/** Where a strap sheet says to pick up: the last strap with notes, or the next one if it is done. */
export function resumePoint(sheet: SheetStart | undefined): { strap: number; inStrap: number } {
  const started = (sheet?.straps ?? []).filter((row) => row.searched > 0);
  const last = started[started.length - 1];
  if (!last) return { strap: 1, inStrap: 0 };
  return last.searched >= last.received ? { strap: last.number + 1, inStrap: 0 } : { strap: last.number, inStrap: last.searched };
}

/**
 * The hunt being sifted and the strap count, both kept on the device so a reload,
 * a closed tab or a lost network never loses the place.
 */
/** Enough of the hunt to sift it with no network: the id, and what the header shows. */
export interface CurrentHunt {
  id: string;
  title: string;
  denomination: number;
  /** The series printed on the notes, when the hunt names one: readings check serial formats against it. */
  series?: string | null;
}

export function useSiftSession(sheet: SheetStart | undefined) {
  const [hunt, setHunt] = useState<CurrentHunt | null>(null);
  const huntId = hunt?.id ?? null;
  const [loaded, setLoaded] = useState(false);
  const [count, setCount] = useState<StrapCount | null>(null);
  const countRef = useRef<StrapCount | null>(null);

  // Other screens (Sweep, a hunt page) may choose the hunt to sift; Sift re-reads it whenever it is shown.
  const reload = useCallback(async () => {
    const saved = await kv.get<CurrentHunt>(CURRENT_KEY);
    const next = saved && typeof saved === 'object' && typeof saved.id === 'string' ? saved : null;
    setHunt((current) => (current?.id === next?.id && current?.title === next?.title ? current : next));
    setLoaded(true);
  }, []);

  useEffect(() => {
    void reload();
  }, [reload]);

  useEffect(() => {
    countRef.current = null;
    setCount(null);
    if (!huntId) return;
    let cancelled = false;
    void kv.get<StrapCount>(countKey(huntId)).then((saved) => {
      if (cancelled) return;
      if (saved) {
        countRef.current = saved;
        setCount(saved);
      }
    });
    return () => {
      cancelled = true;
    };
  }, [huntId]);

  // A hunt opened for the first time on this device continues where its strap sheet ends.
  useEffect(() => {
    if (!huntId || countRef.current || !sheet || sheet.huntId !== huntId) return;
    const { strap, inStrap } = resumePoint(sheet);
    const fresh = startCount(huntId, strap, inStrap);
    countRef.current = fresh;
    setCount(fresh);
  }, [huntId, sheet]);

  const save = useCallback((next: StrapCount) => {
    countRef.current = next;
    // The count's own ref is current at once; the strap bar and trail may paint a frame later, in slices,
    // so a note stored while the camera runs never holds the page.
    startTransition(() => setCount(next));
    return kv.set(countKey(next.huntId), next);
  }, []);

  const selectHunt = useCallback(async (next: CurrentHunt | null) => {
    setHunt(next);
    if (next) await kv.set(CURRENT_KEY, { id: next.id, title: next.title, denomination: next.denomination, series: next.series ?? null });
    else await kv.remove(CURRENT_KEY);
  }, []);

  const log = useCallback(
    async (note: TrailNote) => {
      const current = countRef.current;
      if (!current) return null;
      const { next, completedStrap } = countNote(current, note);
      await save(next);
      return completedStrap;
    },
    [save],
  );

  const undo = useCallback(async () => {
    const current = countRef.current;
    if (!current) return null;
    const { next, removed } = uncountLast(current);
    if (removed) await save(next);
    return removed;
  }, [save]);

  const moveToStrap = useCallback(
    async (strap: number) => {
      const current = countRef.current;
      if (!current) return;
      const searched = sheet?.straps.find((row) => row.number === strap)?.searched ?? current.perStrap[strap] ?? 0;
      await save(chooseStrap(current, strap, searched));
    },
    [save, sheet],
  );

  const markPulledHandled = useCallback(
    async (noteId: string) => {
      const current = countRef.current;
      if (!current) return;
      await save({ ...current, trail: current.trail.map((note) => (note.id === noteId ? { ...note, addedToKeepers: true } : note)) });
    },
    [save],
  );

  /** The count as of the last change, not the last render: keys can outrun the paint. */
  const peek = useCallback(() => countRef.current, []);

  return { loaded, reload, hunt, huntId, count, peek, selectHunt, log, undo, moveToStrap, markPulledHandled };
}
