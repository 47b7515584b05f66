import { isAllZero, nearMissBetween } from './near-miss';
import { DOMAIN_LAST, digitsOf, serialValue } from './_lib/serial-value';
import type {
  DateFormat,
  NearMiss,
  SerialInput,
  WatchErrorCode,
  WatchParseResult,
  WatchPattern,
  WatchResult,
} from './types';

/** Date layouts a date watch pattern can match, in the order they are tried. */
export const DATE_FORMATS: readonly DateFormat[] = ['MMDDYYYY', 'DDMMYYYY', 'YYYYMMDD'];

/**
 * The watch-pattern text syntax, for help text in the app.
 */
export const WATCH_SYNTAX = [
  'Digit mask: 8 characters of digits and ? (any digit), e.g. 0704????. Spaces are ignored.',
  'Range: two numbers joined by a dash, e.g. 1000-2000 (both ends included; 0 counts as 1).',
  'Date: date:YYYY-MM-DD matches the date written MMDDYYYY, DDMMYYYY or YYYYMMDD;',
  '  add :FORMATS to choose, e.g. date:1999-12-31:MMDDYYYY,YYYYMMDD. A bare 1999-12-31 works too.',
  'Only real calendar dates are accepted (1999-02-29 is not one).',
].join('\n');

function fail(code: WatchErrorCode, message: string): WatchParseResult {
  return { ok: false, error: { code, message } };
}

function isLeapYear(year: number): boolean {
  return (year % 4 === 0 && year % 100 !== 0) || year % 400 === 0;
}

const MONTH_DAYS = [31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31];

function daysInMonth(year: number, month: number): number {
  return month === 2 && isLeapYear(year) ? 29 : MONTH_DAYS[month - 1]!;
}

function parseMask(mask: string): WatchParseResult {
  if (!/^[0-9?]{8}$/.test(mask)) {
    return fail('bad-mask', `A digit mask has exactly 8 characters, each a digit or ?; "${mask}" has ${mask.length}.`);
  }
  if (mask === '????????') return fail('mask-matches-everything', 'A mask of only ? matches every note; fix at least one digit.');
  if (mask === '00000000') return fail('mask-matches-nothing', '00000000 is not a serial, so this mask matches no note.');
  return { ok: true, pattern: { kind: 'mask', mask } };
}

function parseRange(fromText: string, toText: string): WatchParseResult {
  if (!/^\d{1,8}$/.test(fromText) || !/^\d{1,8}$/.test(toText)) {
    return fail('bad-range', 'A range is two numbers of up to 8 digits joined by a dash, e.g. 1000-2000.');
  }
  const from = Math.max(1, Number(fromText));
  const to = Number(toText);
  if (to < 1) return fail('range-outside-domain', 'This range holds only 00000000, which is not a serial.');
  if (from > to) return fail('range-reversed', `The range starts after it ends: write the smaller number first (${to}-${from}).`);
  return { ok: true, pattern: { kind: 'range', from, to } };
}

function parseDate(body: string): WatchParseResult {
  const match = /^(\d{4})-(\d{2})-(\d{2})(?::([A-Za-z,]+))?$/.exec(body);
  if (!match) return fail('bad-date', 'Write a date as date:YYYY-MM-DD, e.g. date:2024-07-04.');
  const year = Number(match[1]);
  const month = Number(match[2]);
  const day = Number(match[3]);
  if (year < 1 || month < 1 || month > 12 || day < 1 || day > daysInMonth(year, month)) {
    return fail('not-a-calendar-date', `${match[1]}-${match[2]}-${match[3]} is not a date on the calendar.`);
  }
  let formats: DateFormat[] = DATE_FORMATS.slice();
  if (match[4] !== undefined) {
    const asked = match[4].toUpperCase().split(',').filter((f) => f !== '');
    const unknown = asked.filter((f) => !(DATE_FORMATS as readonly string[]).includes(f));
    if (asked.length === 0 || unknown.length > 0) {
      return fail('bad-date-format', `Date formats are ${DATE_FORMATS.join(', ')}${unknown.length ? `; not ${unknown.join(', ')}` : ''}.`);
    }
    formats = DATE_FORMATS.filter((f) => asked.includes(f));
  }
  return { ok: true, pattern: { kind: 'date', date: `${match[1]}-${match[2]}-${match[3]}`, formats } };
}

/**
 * Reads a watch pattern from text; never throws. Syntax (also in WATCH_SYNTAX):
 * a digit mask of 8 characters of digits and `?` (`0704????`); a range `a-b`
 * (both ends included); or a date `date:YYYY-MM-DD`, optionally followed by
 * `:MMDDYYYY,DDMMYYYY,YYYYMMDD` to choose layouts (all three by default), or a
 * bare `YYYY-MM-DD`. Dates must exist on the calendar.
 *
 * @example
 * parseWatchPattern('date:1999-12-31:MMDDYYYY')
 * // { ok: true, pattern: { kind: 'date', date: '1999-12-31', formats: ['MMDDYYYY'] } }
 * parseWatchPattern('1999-02-29').ok // false: not a calendar date
 */
export function parseWatchPattern(text: unknown): WatchParseResult {
  if (typeof text !== 'string') return fail('not-text', 'A watch pattern is text, e.g. 0704???? or 1000-2000.');
  const trimmed = text.trim();
  if (trimmed === '') return fail('empty', 'Type a watch pattern, e.g. 0704????, 1000-2000 or date:2024-07-04.');
  if (trimmed.length > 64) return fail('unrecognised', 'That is too long for a watch pattern.');
  const lower = trimmed.toLowerCase();
  if (lower.startsWith('date:')) return parseDate(trimmed.slice(5).trim());
  if (/^\d{4}-\d{2}-\d{2}(:.*)?$/.test(trimmed)) return parseDate(trimmed);
  const compact = trimmed.replace(/\s+/g, '');
  const range = /^(\d+)[-–](\d+)$/.exec(compact);
  if (range) return parseRange(range[1]!, range[2]!);
  if (/^[0-9?]+$/.test(compact)) return parseMask(compact);
  return fail(
    'unrecognised',
    'Not a watch pattern: use a digit mask (0704????), a range (1000-2000) or a date (date:2024-07-04).',
  );
}

/**
 * The canonical text of a watch pattern, which `parseWatchPattern` reads back.
 *
 * @example
 * watchText({ kind: 'range', from: 1000, to: 2000 }) // '1000-2000'
 */
export function watchText(pattern: WatchPattern): string {
  switch (pattern.kind) {
    case 'mask':
      return pattern.mask;
    case 'range':
      return `${pattern.from}-${pattern.to}`;
    case 'date': {
      const all = pattern.formats.length === DATE_FORMATS.length && DATE_FORMATS.every((f) => pattern.formats.includes(f));
      return all ? `date:${pattern.date}` : `date:${pattern.date}:${pattern.formats.join(',')}`;
    }
  }
}

/**
 * A watch pattern object checked the same way as its text, or null when it is
 * not valid (e.g. a hand-built `{ kind: 'range', from: 5, to: 1 }`).
 *
 * @example
 * validWatchPattern({ kind: 'mask', mask: '12??' }) // null
 */
export function validWatchPattern(pattern: unknown): WatchPattern | null {
  if (typeof pattern !== 'object' || pattern === null) return null;
  const p = pattern as Partial<WatchPattern> & { kind?: unknown };
  let text: string;
  if (p.kind === 'mask' && typeof (p as { mask?: unknown }).mask === 'string') text = (p as { mask: string }).mask;
  else if (p.kind === 'range' && Number.isInteger((p as { from?: unknown }).from) && Number.isInteger((p as { to?: unknown }).to)) {
    const r = p as { from: number; to: number };
    if (r.from < 1 || r.to > DOMAIN_LAST) return null;
    text = `${r.from}-${r.to}`;
  } else if (p.kind === 'date' && typeof (p as { date?: unknown }).date === 'string' && Array.isArray((p as { formats?: unknown }).formats)) {
    const d = p as { date: string; formats: unknown[] };
    if (d.formats.length === 0 || !d.formats.every((f) => typeof f === 'string')) return null;
    text = `date:${d.date}:${d.formats.join(',')}`;
  } else return null;
  const parsed = parseWatchPattern(text);
  if (!parsed.ok) return null;
  const label = typeof (p as { label?: unknown }).label === 'string' ? (p as { label: string }).label : undefined;
  return label === undefined ? parsed.pattern : { ...parsed.pattern, label };
}

function dateTargets(pattern: Extract<WatchPattern, { kind: 'date' }>): string[] {
  const [yyyy, mm, dd] = pattern.date.split('-') as [string, string, string];
  const targets: string[] = [];
  for (const format of DATE_FORMATS) {
    if (!pattern.formats.includes(format)) continue;
    const text = format === 'MMDDYYYY' ? mm + dd + yyyy : format === 'DDMMYYYY' ? dd + mm + yyyy : yyyy + mm + dd;
    if (!targets.includes(text)) targets.push(text);
  }
  return targets;
}

function maskMiss(d: readonly number[], mask: string): NearMiss {
  const target = d.slice();
  let lastWildcard = -1;
  for (let i = 0; i < 8; i++) {
    const c = mask[i]!;
    if (c === '?') lastWildcard = i;
    else target[i] = c.charCodeAt(0) - 48;
  }
  // Fixed zeros plus zero wildcards would give 00000000; one wildcard must be non-zero.
  if (isAllZero(target) && lastWildcard >= 0) target[lastWildcard] = 1;
  return nearMissBetween(d, target);
}

/** Fewest changes into [from, to]: a digit DP over (matches from's prefix, matches to's prefix). */
function rangeMiss(d: readonly number[], from: number, to: number): NearMiss {
  const lo = digitsOf(from);
  const hi = digitsOf(to);
  // 8 positions × 4 tightness states; -1 = not yet known.
  const memo = new Int8Array(32).fill(-1);
  const best = (pos: number, tightLo: boolean, tightHi: boolean): number => {
    if (pos === 8) return 0;
    const key = pos * 4 + (tightLo ? 2 : 0) + (tightHi ? 1 : 0);
    const known = memo[key]!;
    if (known >= 0) return known;
    let result = Infinity;
    const first = tightLo ? lo[pos]! : 0;
    const last = tightHi ? hi[pos]! : 9;
    for (let x = first; x <= last; x++) {
      const cost = (x === d[pos] ? 0 : 1) + best(pos + 1, tightLo && x === first, tightHi && x === last);
      if (cost < result) result = cost;
    }
    memo[key] = result;
    return result;
  };
  const target: number[] = [];
  let tightLo = true;
  let tightHi = true;
  for (let pos = 0; pos < 8; pos++) {
    const first: number = tightLo ? lo[pos]! : 0;
    const last: number = tightHi ? hi[pos]! : 9;
    const goal = best(pos, tightLo, tightHi);
    const cost = (x: number): number => (x === d[pos] ? 0 : 1) + best(pos + 1, tightLo && x === first, tightHi && x === last);
    // Keep the serial's own digit when that stays optimal, else the smallest digit that does.
    let chosen: number = d[pos]! >= first && d[pos]! <= last && cost(d[pos]!) === goal ? d[pos]! : -1;
    for (let x = first; chosen < 0 && x <= last; x++) if (cost(x) === goal) chosen = x;
    target.push(chosen);
    tightLo = tightLo && chosen === first;
    tightHi = tightHi && chosen === last;
  }
  return nearMissBetween(d, target);
}

/** Match and near miss of a valid watch pattern for a value already known to be a serial. */
export function watchResultOfValue(value: number, pattern: WatchPattern): WatchResult {
  const d = digitsOf(value);
  let miss: NearMiss;
  if (pattern.kind === 'mask') miss = maskMiss(d, pattern.mask);
  else if (pattern.kind === 'range') miss = rangeMiss(d, pattern.from, pattern.to);
  else {
    miss = { distance: Infinity, target: '', positions: [] };
    for (const target of dateTargets(pattern)) {
      const candidate = nearMissBetween(d, digitsOf(Number(target)));
      if (candidate.distance < miss.distance) miss = candidate;
    }
  }
  return { pattern, text: watchText(pattern), matched: miss.distance === 0, nearMiss: miss };
}

/**
 * Whether a serial matches a watch pattern, and if not, its near miss: the
 * fewest digit changes to a serial the pattern matches, one such serial and
 * the positions that change (never 00000000). Throws RangeError for a
 * non-serial or an invalid pattern object.
 *
 * @example
 * matchWatch('07041775', { kind: 'mask', mask: '0704????' }).matched // true
 * matchWatch('07051776', { kind: 'date', date: '1776-07-04', formats: ['MMDDYYYY'] }).nearMiss
 * // { distance: 1, target: '07041776', positions: [4] }
 */
export function matchWatch(digits: SerialInput, pattern: WatchPattern): WatchResult {
  const value = serialValue(digits, 'matchWatch');
  const valid = validWatchPattern(pattern);
  if (!valid) throw new RangeError(`matchWatch: not a valid watch pattern: ${JSON.stringify(pattern)}`);
  return watchResultOfValue(value, valid);
}
