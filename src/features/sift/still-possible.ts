import { PATTERN_IDS, type PatternId } from '@shared/engine';

const TURN: Record<string, string> = { '0': '0', '1': '1', '6': '9', '8': '8', '9': '6' };
const LOW_MAX = 99999;

/**
 * Which patterns the serial can still become, given its first digits: the half-typed
 * reading, so a hunter sees "binary still possible" before the last digits land.
 * The check is exact for each pattern's rule on the digits typed so far.
 */
export function stillPossible(prefix: string, lowLimit = 999): PatternId[] {
  // A complete serial is read in full by the engine; this answers only for partial input.
  if (!/^\d{0,7}$/.test(prefix)) return [];
  const d = prefix.split('');
  const n = d.length;
  const distinct = new Set(d).size;
  const mirrorOk = (fn: (a: string, b: string) => boolean) => {
    for (let i = 0; i < n; i++) {
      const j = 7 - i;
      if (j < n && j !== i && !fn(d[i], d[j])) return false;
    }
    return true;
  };
  const checks: Record<PatternId, () => boolean> = {
    solid: () => distinct <= 1,
    ladder: () => {
      if (n < 2) return true;
      const step = Number(d[1]) - Number(d[0]);
      if (Math.abs(step) !== 1) return false;
      for (let i = 1; i < n; i++) if (Number(d[i]) - Number(d[i - 1]) !== step) return false;
      const last = Number(d[0]) + step * 7;
      return last >= 0 && last <= 9;
    },
    radar: () => mirrorOk((a, b) => a === b),
    repeater: () => d.every((digit, i) => i < 4 || digit === d[i - 4]),
    'super-repeater': () => d.every((digit, i) => i < 2 || digit === d[i - 2]),
    rotator: () => d.every((digit) => digit in TURN) && mirrorOk((a, b) => TURN[a] === b),
    binary: () => distinct <= 2,
    trinary: () => distinct <= 3,
    low: () => {
      const limit = Math.min(lowLimit, LOW_MAX);
      const smallest = Number(prefix.padEnd(8, '0'));
      return smallest <= limit;
    },
    high: () => Number(prefix.padEnd(8, '9')) >= 99_990_000,
    // d1 bbbbbb d1 with d1 ≠ b: the inner digits typed so far agree, and the 8th (if typed) mirrors the 1st.
    'super-radar': () => new Set(d.slice(1, 7)).size <= 1 && (n < 2 || d[1] !== d[0]),
    'true-binary': () => d.every((digit) => digit === '0' || digit === '1'),
  };
  return PATTERN_IDS.filter((id) => checks[id]());
}
