const MEASURE = 'sift:reading-painted';

// The start is held as a time, not a named mark: at typing speed a newer eighth key (or the next note's)
// would clear a named mark before the frame that measures from it, and `measure` would throw in the page.
let pendingStart: number | null = null;

/** Marks the moment the eighth digit is pressed. */
export function markEighthKey(): void {
  pendingStart = performance.now();
}

/** Measures from the eighth key to the next frame after the reading rendered (what the eye sees). */
export function measureReadingPainted(): void {
  const start = pendingStart;
  if (start === null) return;
  pendingStart = null;
  requestAnimationFrame(() => {
    // Instrumentation must never break the page it watches.
    try {
      performance.measure(MEASURE, { start, end: performance.now() });
    } catch {
      /* a browser without User Timing Level 3 simply goes unmeasured */
    }
  });
}
