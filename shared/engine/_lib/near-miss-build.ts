import type { NearMiss } from '../types';

/** The near miss from serial digits to target digits (both leftmost first). */
export function nearMissBetween(serial: readonly number[], target: readonly number[]): NearMiss {
  const positions: number[] = [];
  let text = '';
  for (let i = 0; i < 8; i++) {
    if (serial[i] !== target[i]) positions.push(i + 1);
    text += target[i];
  }
  return { distance: positions.length, target: text, positions };
}

export function isAllZero(digits: readonly number[]): boolean {
  for (let i = 0; i < 8; i++) if (digits[i] !== 0) return false;
  return true;
}
