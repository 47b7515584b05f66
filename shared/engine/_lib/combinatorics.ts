/** Exact small-integer combinatorics (results stay far below 2^53). */

export function factorial(n: number): number {
  let f = 1;
  for (let i = 2; i <= n; i++) f *= i;
  return f;
}

export function binomial(n: number, k: number): number {
  if (k < 0 || k > n) return 0;
  let c = 1;
  for (let i = 1; i <= k; i++) c = (c * (n - k + i)) / i;
  return Math.round(c);
}

const stirlingCache = new Map<string, number>();

/** Stirling number of the second kind S(n, k), by the recurrence S(n,k) = k·S(n−1,k) + S(n−1,k−1). */
export function stirling2(n: number, k: number): number {
  if (n === 0 && k === 0) return 1;
  if (n === 0 || k === 0 || k > n) return 0;
  const key = `${n},${k}`;
  const known = stirlingCache.get(key);
  if (known !== undefined) return known;
  const value = k * stirling2(n - 1, k) + stirling2(n - 1, k - 1);
  stirlingCache.set(key, value);
  return value;
}

/** Strings of `length` digits (0–9) using exactly k distinct digits: C(10,k) · k! · S(length,k). */
export function exactlyDistinctStrings(length: number, k: number): number {
  return binomial(10, k) * factorial(k) * stirling2(length, k);
}

/** Strings of `length` digits whose longest run of one digit is at least k (the all-zero string included). */
export function runAtLeastStrings(length: number, k: number): number {
  if (k <= 1) return 10 ** length;
  if (k > length) return 0;
  // endingRun[r] = strings so far whose final run has length r (< k).
  let endingRun = new Array<number>(k).fill(0);
  endingRun[1] = 10;
  for (let n = 2; n <= length; n++) {
    const next = new Array<number>(k).fill(0);
    let total = 0;
    for (let r = 1; r < k; r++) total += endingRun[r]!;
    next[1] = total * 9;
    for (let r = 2; r < k; r++) next[r] = endingRun[r - 1]!;
    endingRun = next;
  }
  let shorter = 0;
  for (let r = 1; r < k; r++) shorter += endingRun[r]!;
  return 10 ** length - shorter;
}

/** Strings of `length` digits in which some digit appears at least k times (all-zero included). */
export function repeatAtLeastStrings(length: number, k: number): number {
  if (k <= 0) return 10 ** length;
  if (k > length) return 0;
  // ways[m] = arrangements of m positions using the digits seen so far, each fewer than k times.
  let ways = new Array<number>(length + 1).fill(0);
  ways[0] = 1;
  for (let digit = 0; digit < 10; digit++) {
    const next = new Array<number>(length + 1).fill(0);
    for (let m = 0; m <= length; m++) {
      if (ways[m] === 0) continue;
      for (let j = 0; j < k && m + j <= length; j++) next[m + j] += ways[m]! * binomial(m + j, j);
    }
    ways = next;
  }
  return 10 ** length - ways[length]!;
}
