import { useCallback, useEffect, useRef } from 'react';
import { kv } from '@/lib/storage/kv';

const key = (huntId: string) => `strapsift.sift.logged.${huntId}`;

/** The same note however it was entered: prefix, digits and the star (the suffix is not typed on the keypad). */
export const loggedKey = (note: { prefix: string; digits: string; star: boolean }) => `${note.prefix}${note.digits}${note.star ? '*' : ''}`;

/**
 * Serials already logged in this hunt on this device, so the camera can say "already logged" instead of
 * silently storing a second copy. Kept per hunt next to the strap count.
 */
export function useLoggedSerials(huntId: string | null) {
  const seen = useRef<Set<string>>(new Set());
  useEffect(() => {
    seen.current = new Set();
    if (!huntId) return;
    let cancelled = false;
    void kv.get<string[]>(key(huntId)).then((saved) => {
      if (!cancelled && Array.isArray(saved)) seen.current = new Set([...saved, ...seen.current]);
    });
    return () => {
      cancelled = true;
    };
  }, [huntId]);
  const save = useCallback(() => (huntId ? kv.set(key(huntId), [...seen.current]) : Promise.resolve()), [huntId]);
  const has = useCallback((serial: string) => seen.current.has(serial), []);
  const add = useCallback(
    (serial: string) => {
      seen.current.add(serial);
      return save();
    },
    [save],
  );
  const remove = useCallback(
    (serial: string) => {
      seen.current.delete(serial);
      return save();
    },
    [save],
  );
  return { has, add, remove };
}
