import { exactlyDistinctStrings, repeatAtLeastStrings, runAtLeastStrings } from './_lib/combinatorics';
import { lowerBound, membersOf } from './_lib/members';
import { MASK_COUNT, PATTERN_ORDER, idsToMask, isPatternId, maskToIds } from './_lib/pattern-bits';
import { DOMAIN_LAST } from './_lib/serial-value';
import { DEFAULT_LOW_LIMIT, HIGH_FROM, isLowLimit, patternMask } from './patterns';
import type { LowLimit, NeighbourPatternId, PatternId, PatternOdds, ReadingOdds } from './types';

/** Which serials the odds count over and which low limit applies. */
export interface OddsOptions {
  lowLimit?: LowLimit;
  /** Last serial of the odds domain, 1…99,999,999 (default 99,999,999). */
  domainLast?: number;
}

interface Resolved {
  lowLimit: LowLimit;
  last: number;
}

function resolve(options: OddsOptions, fn: string): Resolved {
  const lowLimit = options.lowLimit ?? DEFAULT_LOW_LIMIT;
  if (!isLowLimit(lowLimit)) throw new RangeError(`${fn}: lowLimit must be 9, 99, 999, 9999 or 99999, got ${String(lowLimit)}`);
  const last = options.domainLast ?? DOMAIN_LAST;
  if (!Number.isInteger(last) || last < 1 || last > DOMAIN_LAST) {
    throw new RangeError(`${fn}: domainLast must be a whole number 1…99999999, got ${String(last)}`);
  }
  return { lowLimit, last };
}

function membersUpTo(pattern: NeighbourPatternId, last: number): number {
  const list = membersOf(pattern);
  return last === DOMAIN_LAST ? list.length : lowerBound(list, last + 1);
}

/**
 * Exact number of serials in the odds domain with a pattern. Binaries and
 * trinaries come from combinatorics, C(10,k)·k!·S(8,k) (00000000 has one
 * distinct digit, so it never needs subtracting); the sparse patterns from
 * their enumerated member lists; `low` is the low limit itself and `high`
 * the 10,000 serials from 99,990,000 up. With a shorter domain every count
 * comes from the member lists.
 *
 * @example
 * patternCount('binary') // 11430
 * patternCount('low', { lowLimit: 9999 }) // 9999
 */
export function patternCount(id: PatternId, options: OddsOptions = {}): number {
  const { lowLimit, last } = resolve(options, 'patternCount');
  switch (id) {
    case 'low':
      return Math.min(lowLimit, last);
    case 'high':
      return Math.max(0, last - HIGH_FROM + 1);
    case 'binary':
      return last === DOMAIN_LAST ? exactlyDistinctStrings(8, 2) : membersUpTo('binary', last);
    case 'trinary':
      return last === DOMAIN_LAST ? exactlyDistinctStrings(8, 3) : membersUpTo('trinary', last);
    default:
      if (!isPatternId(id)) throw new RangeError(`patternCount: unknown pattern ${JSON.stringify(id)}`);
      return membersUpTo(id, last);
  }
}

interface SignatureTable {
  domainSize: number;
  exact: Map<number, number>;
  atLeast: Map<number, number>;
}

const tables = new Map<string, SignatureTable>();

function memberValues(id: PatternId, r: Resolved): ArrayLike<number> & Iterable<number> {
  if (id === 'low') return Array.from({ length: Math.min(r.lowLimit, r.last) }, (_, i) => i + 1);
  if (id === 'high') return Array.from({ length: Math.max(0, r.last - HIGH_FROM + 1) }, (_, i) => HIGH_FROM + i);
  return membersOf(id);
}

/**
 * Every serial with any pattern is a member of some pattern's list, so
 * enumerating the lists and counting each serial only under the first pattern
 * it has (in PATTERN_IDS order) counts each exactly once; the rest of the
 * domain has no pattern at all. The 695,520 trinaries are not walked one by
 * one: those with another pattern turn up in the other lists (the low and high
 * bands come after trinary in the order, so there they are counted under
 * trinary), and the trinaries with no other pattern are the total, known by
 * combinatorics, less those.
 */
function buildTable(r: Resolved): SignatureTable {
  const tally = new Float64Array(MASK_COUNT);
  const trinaryBit = 1 << PATTERN_ORDER.indexOf('trinary');
  const beforeTrinary = trinaryBit - 1;
  for (let i = 0; i < PATTERN_ORDER.length; i++) {
    const id = PATTERN_ORDER[i]!;
    if (id === 'trinary') continue;
    const earlier = (1 << i) - 1;
    const values = memberValues(id, r);
    for (let j = 0; j < values.length; j++) {
      const v = values[j]!;
      if (v > r.last) break;
      const mask = patternMask(v, r.lowLimit);
      if ((mask & earlier) === 0) tally[mask]++;
      else if (i > PATTERN_ORDER.indexOf('trinary') && (mask & trinaryBit) !== 0 && (mask & beforeTrinary) === 0) {
        // A trinary in the low or high band whose first pattern is trinary: counted here, not in a trinary walk.
        tally[mask]++;
      }
    }
  }
  let trinariesElsewhere = 0;
  for (let mask = 0; mask < MASK_COUNT; mask++) if (mask !== trinaryBit && (mask & trinaryBit) !== 0) trinariesElsewhere += tally[mask]!;
  tally[trinaryBit] = patternCount('trinary', { lowLimit: r.lowLimit, domainLast: r.last }) - trinariesElsewhere;
  let withPatterns = 0;
  for (let mask = 1; mask < MASK_COUNT; mask++) withPatterns += tally[mask]!;
  tally[0] = r.last - withPatterns;
  const exact = new Map<number, number>();
  for (let mask = 0; mask < MASK_COUNT; mask++) if (tally[mask]! > 0) exact.set(mask, tally[mask]!);
  return { domainSize: r.last, exact, atLeast: new Map() };
}

function tableFor(r: Resolved): SignatureTable {
  const key = `${r.lowLimit}:${r.last}`;
  let table = tables.get(key);
  if (!table) {
    table = buildTable(r);
    tables.set(key, table);
  }
  return table;
}

function atLeast(table: SignatureTable, query: number): number {
  let count = table.atLeast.get(query);
  if (count === undefined) {
    count = 0;
    for (const [mask, n] of table.exact) if ((mask & query) === query) count += n;
    table.atLeast.set(query, count);
  }
  return count;
}

function checkIds(ids: readonly PatternId[], fn: string): number {
  if (!Array.isArray(ids)) throw new RangeError(`${fn}: expected a list of pattern ids`);
  for (const id of ids) if (!isPatternId(id)) throw new RangeError(`${fn}: unknown pattern ${JSON.stringify(id)}`);
  return idsToMask(ids);
}

/**
 * Exact number of serials whose combination of patterns ("signature") is
 * `ids`. With `match: 'exact'` (the default) a serial counts when its pattern
 * set is exactly `ids` (an empty list counts serials with no pattern); with
 * `match: 'all'` it counts when it has every one of `ids`, and maybe more.
 * Derived by enumerating every pattern's members once per low limit and
 * domain (cached), never by sampling.
 *
 * @example
 * signatureCount(['repeater', 'super-repeater', 'binary']) // 86 (12121212 and kin, less the rotators 69696969 and 96969696 and the true binaries 01010101 and 10101010)
 * signatureCount(['solid'], { match: 'all' }) // 9
 */
export function signatureCount(
  ids: readonly PatternId[],
  options: OddsOptions & { match?: 'exact' | 'all' } = {},
): number {
  const mask = checkIds(ids, 'signatureCount');
  const table = tableFor(resolve(options, 'signatureCount'));
  return options.match === 'all' ? atLeast(table, mask) : (table.exact.get(mask) ?? 0);
}

/**
 * Every combination of patterns that occurs in the domain with its exact
 * count, rarest first (ties in PATTERN_IDS order). The counts add up to the
 * domain size.
 *
 * @example
 * signatureTable().find((row) => row.ids.length === 0)?.count // serials with no pattern
 */
export function signatureTable(options: OddsOptions = {}): Array<{ ids: PatternId[]; count: number }> {
  const table = tableFor(resolve(options, 'signatureTable'));
  return [...table.exact.entries()]
    .sort((a, b) => a[1] - b[1] || a[0] - b[0])
    .map(([mask, count]) => ({ ids: maskToIds(mask), count }));
}

/**
 * 1-in-N and rarity points for a count: oneIn = domain ÷ count, points = log10(1/p)
 * with p = count ÷ domain.
 *
 * @example
 * oddsOf(9, 99_999_999) // { count: 9, oneIn: 11111111, points: 7.045… }
 */
export function oddsOf(count: number, domainSize: number = DOMAIN_LAST): PatternOdds {
  if (count <= 0) return { count: 0, oneIn: Infinity, points: Infinity };
  return { count, oneIn: domainSize / count, points: Math.log10(domainSize / count) };
}

/**
 * The odds table the app shows: every pattern with its exact count, 1 in N and points.
 *
 * @example
 * oddsTable()[0] // { id: 'solid', count: 9, oneIn: 11111111, points: 7.045… }
 */
export function oddsTable(options: OddsOptions = {}): Array<PatternOdds & { id: PatternId }> {
  const r = resolve(options, 'oddsTable');
  return PATTERN_ORDER.map((id) => ({ id, ...oddsOf(patternCount(id, { lowLimit: r.lowLimit, domainLast: r.last }), r.last) }));
}

/** Per-domain figures a reading needs, looked up once per (low limit, domain) and reused. */
interface ReadingContext {
  lowLimit: number;
  last: number;
  table: SignatureTable;
  odds: Array<PatternOdds & { id: PatternId }>;
}

let lastContext: ReadingContext | null = null;
const contexts = new Map<string, ReadingContext>();

function contextFor(lowLimit: LowLimit, last: number): ReadingContext {
  if (lastContext !== null && lastContext.lowLimit === lowLimit && lastContext.last === last) return lastContext;
  const key = `${lowLimit}:${last}`;
  let context = contexts.get(key);
  if (!context) {
    const r = resolve({ lowLimit, domainLast: last }, 'readingOdds');
    context = {
      lowLimit,
      last,
      table: tableFor(r),
      odds: PATTERN_ORDER.map((id) => ({ id, ...oddsOf(patternCount(id, { lowLimit, domainLast: last }), last) })),
    };
    contexts.set(key, context);
  }
  lastContext = context;
  return context;
}

/** Odds of a serial's pattern mask, as a reading carries them (options already validated). */
export function readingOddsOfMask(mask: number, lowLimit: LowLimit = DEFAULT_LOW_LIMIT, domainLast: number = DOMAIN_LAST): ReadingOdds {
  const context = contextFor(lowLimit, domainLast);
  const patterns: ReadingOdds['patterns'] = [];
  if (mask === 0) return { domainSize: domainLast, patterns, combination: null };
  for (let i = 0; i < PATTERN_ORDER.length; i++) {
    if (mask & (1 << i)) {
      const o = context.odds[i]!;
      patterns.push({ id: o.id, count: o.count, oneIn: o.oneIn, points: o.points });
    }
  }
  const combined = oddsOf(atLeast(context.table, mask), domainLast);
  return {
    domainSize: domainLast,
    patterns,
    combination: {
      ids: maskToIds(mask),
      exactCount: context.table.exact.get(mask) ?? 0,
      count: combined.count,
      oneIn: combined.oneIn,
      points: combined.points,
    },
  };
}

/**
 * Serials (full domain) whose longest run of one digit is at least `length`
 * (3…8), by a run-length recurrence over all 10^8 strings less 00000000.
 *
 * @example
 * runCount(8) // 9: the solids
 */
export function runCount(length: number): number {
  if (!Number.isInteger(length) || length < 1 || length > 8) throw new RangeError(`runCount: length must be 1…8, got ${String(length)}`);
  return runAtLeastStrings(8, length) - 1;
}

/**
 * Serials (full domain) in which some digit appears at least `times` times
 * (1…8), by counting arrangements digit by digit, less 00000000.
 *
 * @example
 * repeatCount(8) // 9: the solids
 */
export function repeatCount(times: number): number {
  if (!Number.isInteger(times) || times < 1 || times > 8) throw new RangeError(`repeatCount: times must be 1…8, got ${String(times)}`);
  return repeatAtLeastStrings(8, times) - 1;
}

/** Builds the default combination table now (see `warmTables`). */
export function warmOddsTables(options: OddsOptions = {}): number {
  const r = resolve(options, 'warmTables');
  contextFor(r.lowLimit, r.last);
  return tableFor(r).exact.size;
}
