// Timing marks are a web measurement (docs/PERFORMANCE.md); native builds skip them.
export function markEighthKey(): void {}
export function measureReadingPainted(): void {}
