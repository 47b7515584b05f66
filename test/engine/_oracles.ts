/**
 * Plain, slow restatements of the definitions in issue 3, written without the
 * engine's tables or tricks, for property tests to check the engine against.
 */

export const DOMAIN_LAST = 99_999_999;

export function pad8(n: number): string {
  return String(n).padStart(8, '0');
}

const TURNED: Record<string, string> = { '0': '0', '1': '1', '6': '9', '8': '8', '9': '6' };

/** The pattern ids of an 8-digit string, straight from the definitions. */
export function plainPatterns(s: string, lowLimit = 999): string[] {
  const d = [...s].map(Number);
  const n = Number(s);
  const distinct = new Set(d).size;
  const ids: string[] = [];
  if (distinct === 1) ids.push('solid');
  const up = d.every((x, i) => i === 0 || x === d[i - 1]! + 1);
  const down = d.every((x, i) => i === 0 || x === d[i - 1]! - 1);
  if (up || down) ids.push('ladder');
  if (s === [...s].reverse().join('')) ids.push('radar');
  if (s.slice(0, 4) === s.slice(4)) ids.push('repeater');
  const block = s.slice(0, 2);
  if (s === block + block + block + block) ids.push('super-repeater');
  if ([...s].every((c) => c in TURNED) && [...s].reverse().map((c) => TURNED[c]).join('') === s) ids.push('rotator');
  if (distinct === 2) ids.push('binary');
  if (distinct === 3) ids.push('trinary');
  if (n >= 1 && n <= lowLimit) ids.push('low');
  if (n >= 99_990_000) ids.push('high');
  // TRADE.md: a radar whose six inner digits are one digit; a binary of the digits 0 and 1.
  if (ids.includes('radar') && distinct === 2 && new Set(d.slice(1, 7)).size === 1) ids.push('super-radar');
  if (distinct === 2 && d.every((x) => x === 0 || x === 1)) ids.push('true-binary');
  return ids;
}

export function hamming(a: string, b: string): number {
  let d = 0;
  for (let i = 0; i < 8; i++) if (a[i] !== b[i]) d++;
  return d;
}

export function changedPositions(a: string, b: string): number[] {
  const out: number[] = [];
  for (let i = 0; i < 8; i++) if (a[i] !== b[i]) out.push(i + 1);
  return out;
}

function pad4(n: number): string {
  return String(n).padStart(4, '0');
}

/** All strings of length 8 over the given digit set that use every one of them. */
function usingExactly(digits: string[]): string[] {
  const out: string[] = [];
  const k = digits.length;
  const total = k ** 8;
  for (let code = 0; code < total; code++) {
    let s = '';
    let c = code;
    for (let i = 0; i < 8; i++) {
      s += digits[c % k];
      c = Math.floor(c / k);
    }
    if (digits.every((x) => s.includes(x))) out.push(s);
  }
  return out;
}

function digitSets(size: number): string[][] {
  const sets: string[][] = [];
  const walk = (start: number, chosen: string[]): void => {
    if (chosen.length === size) {
      sets.push(chosen);
      return;
    }
    for (let x = start; x <= 9; x++) walk(x + 1, [...chosen, String(x)]);
  };
  walk(0, []);
  return sets;
}

const memberCache = new Map<string, number[]>();

/** Members of a pattern as sorted numbers, generated from the definition, 00000000 left out. */
export function plainMembers(pattern: string): number[] {
  const known = memberCache.get(pattern);
  if (known) return known;
  let strings: string[] = [];
  switch (pattern) {
    case 'solid':
      strings = '0123456789'.split('').map((c) => c.repeat(8));
      break;
    case 'ladder':
      strings = ['01234567', '12345678', '23456789', '76543210', '87654321', '98765432'];
      break;
    case 'radar':
      for (let h = 0; h < 10000; h++) strings.push(pad4(h) + [...pad4(h)].reverse().join(''));
      break;
    case 'repeater':
      for (let h = 0; h < 10000; h++) strings.push(pad4(h) + pad4(h));
      break;
    case 'super-repeater':
      for (let b = 0; b < 100; b++) strings.push(String(b).padStart(2, '0').repeat(4));
      break;
    case 'rotator':
      for (let h = 0; h < 10000; h++) {
        const left = pad4(h);
        if ([...left].every((c) => c in TURNED)) strings.push(left + [...left].reverse().map((c) => TURNED[c]).join(''));
      }
      break;
    case 'binary':
      for (const set of digitSets(2)) strings.push(...usingExactly(set));
      break;
    case 'trinary':
      for (const set of digitSets(3)) strings.push(...usingExactly(set));
      break;
    case 'super-radar':
      for (let a = 0; a <= 9; a++) for (let b = 0; b <= 9; b++) if (a !== b) strings.push(`${a}${String(b).repeat(6)}${a}`);
      break;
    case 'true-binary':
      strings = usingExactly(['0', '1']);
      break;
    default:
      throw new Error(`no plain member list for ${pattern}`);
  }
  const values = strings.map(Number).filter((v) => v !== 0);
  values.sort((a, b) => a - b);
  memberCache.set(pattern, values);
  return values;
}

/** Nearest members strictly below and above by scanning the whole list. */
export function plainNeighbours(pattern: string, n: number): { below: number | null; above: number | null } {
  let below: number | null = null;
  let above: number | null = null;
  for (const m of plainMembers(pattern)) {
    if (m < n && (below === null || m > below)) below = m;
    if (m > n && (above === null || m < above)) above = m;
  }
  return { below, above };
}

const stringCache = new Map<string, string[]>();

/** Members of a pattern as 8-digit strings (cached). */
export function plainMemberStrings(pattern: string): string[] {
  let list = stringCache.get(pattern);
  if (!list) {
    list = plainMembers(pattern).map(pad8);
    stringCache.set(pattern, list);
  }
  return list;
}

/** Fewest digit changes from s to any of the members (8-digit strings). */
export function plainDistance(s: string, members: readonly string[]): number {
  let best = 9;
  for (const m of members) {
    const d = hamming(s, m);
    if (d < best) best = d;
    if (best === 0) break;
  }
  return best;
}
