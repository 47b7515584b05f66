const START = 'sift:eighth-key';
const MEASURE = 'sift:reading-painted';

/** Marks the moment the eighth digit is pressed. */
export function markEighthKey(): void {
  performance.clearMarks(START);
  performance.mark(START);
}

/** Measures from the eighth key to the next frame after the reading rendered (what the eye sees). */
export function measureReadingPainted(): void {
  if (performance.getEntriesByName(START, 'mark').length === 0) return;
  requestAnimationFrame(() => {
    performance.measure(MEASURE, START);
    performance.clearMarks(START);
  });
}
