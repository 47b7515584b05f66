import { useEffect, useState } from 'react';

/** The value as it was once it stopped changing for `ms`: a search box asks once per pause, not per key. */
export function useDebounced<T>(value: T, ms: number): T {
  const [debounced, setDebounced] = useState(value);
  useEffect(() => {
    const timer = setTimeout(() => setDebounced(value), ms);
    return () => clearTimeout(timer);
  }, [value, ms]);
  return debounced;
}
