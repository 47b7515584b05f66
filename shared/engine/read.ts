import { maskToIds } from './_lib/pattern-bits';
import { DOMAIN_LAST } from './_lib/serial-value';
import { tradeNotes } from '../trade/notes';
import { runEndFor } from '../trade/run-ends';
import { featuresOfValue } from './features';
import { nearMissesOfValue } from './near-miss';
import { allNeighboursOfValue } from './neighbours';
import { readingOddsOfMask } from './odds';
import { parseSerial } from './parse';
import { DEFAULT_LOW_LIMIT, isLowLimit, patternMask } from './patterns';
import { DEFAULT_WEIGHTS, scoreAt } from './score';
import type { LowLimit, ReadOptions, ReadResult, WatchPattern, WatchResult } from './types';
import { parseWatchPattern, validWatchPattern, watchResultOfValue } from './watch';

// A hunter's watch list is the same for every note of a session, so each entry
// is checked once: texts in a small map, pattern objects by identity.
const checkedTexts = new Map<string, WatchPattern | null>();
const checkedObjects = new WeakMap<object, WatchPattern | null>();

/** Cached patterns are shared by every reading that lists them, so they are frozen. */
function frozen(pattern: WatchPattern | null): WatchPattern | null {
  if (pattern && pattern.kind === 'date') Object.freeze(pattern.formats);
  return pattern && Object.freeze(pattern);
}

function checkedWatch(item: unknown): WatchPattern | null {
  if (typeof item === 'string') {
    let known = checkedTexts.get(item);
    if (known === undefined) {
      const parsed = parseWatchPattern(item);
      known = frozen(parsed.ok ? parsed.pattern : null);
      if (checkedTexts.size >= 1000) checkedTexts.clear();
      checkedTexts.set(item, known);
    }
    return known;
  }
  if (typeof item !== 'object' || item === null) return null;
  let known = checkedObjects.get(item);
  if (known === undefined) {
    known = frozen(validWatchPattern(item));
    checkedObjects.set(item, known);
  }
  return known;
}

function watchList(items: ReadOptions['watch']): WatchPattern[] {
  if (!Array.isArray(items)) return [];
  const list: WatchPattern[] = [];
  for (const item of items) {
    const pattern = checkedWatch(item);
    if (pattern) list.push(pattern);
  }
  return list;
}

/**
 * The full reading of one serial as a hunter types it: parts, patterns,
 * features, near misses, neighbours, exact odds, watch-pattern results, score
 * and the trade notes that apply. Never throws: text that is not a serial
 * gives `{ ok: false, input, error }`, and options that make no sense are
 * ignored (an unknown low limit or domain falls back to the default, a bad
 * watch pattern is skipped: validate them with `parseWatchPattern` when saved).
 * The low limit is `options.lowLimit`, else the weight table's, else 999.
 * With a denomination, neighbours stop at its run end and `domainLast:
 * 'run-end'` counts the odds over serials up to it; the trade notes then
 * include what does not fit the denomination's serial format.
 *
 * @example
 * const r = read('LB 1212 1212 A');
 * r.ok && r.patterns // ['repeater', 'super-repeater', 'binary']
 * r.ok && r.district // 'B'
 * read('1234').ok // false
 */
export function read(input: string, options: ReadOptions = {}): ReadResult {
  const opts: ReadOptions = options !== null && typeof options === 'object' ? options : {};
  const noteType = opts.noteType === 'older' ? 'older' : 'federal-reserve';
  const parsed = parseSerial(input, { noteType });
  const text = typeof input === 'string' ? input : String(input);
  if (!parsed.ok) return { ok: false, input: text, error: parsed.error };
  const weights = opts.weights !== null && typeof opts.weights === 'object' ? opts.weights : DEFAULT_WEIGHTS;
  const lowLimit: LowLimit = isLowLimit(opts.lowLimit)
    ? opts.lowLimit
    : isLowLimit(weights.lowLimit)
      ? weights.lowLimit
      : DEFAULT_LOW_LIMIT;
  const denomination = typeof opts.denomination === 'number' ? opts.denomination : undefined;
  const runEnd = noteType === 'older' ? DOMAIN_LAST : (runEndFor(denomination)?.last ?? DOMAIN_LAST);
  const domainLast =
    opts.domainLast === 'run-end'
      ? runEnd
      : Number.isInteger(opts.domainLast) && (opts.domainLast as number) >= 1 && (opts.domainLast as number) <= DOMAIN_LAST
        ? (opts.domainLast as number)
        : DOMAIN_LAST;
  const starRunSize = typeof opts.starRunSize === 'number' && Number.isInteger(opts.starRunSize) && opts.starRunSize > 0 ? opts.starRunSize : null;
  const value = parsed.value;
  const mask = patternMask(value, lowLimit);
  const patterns = maskToIds(mask);
  const feats = featuresOfValue(value);
  const star = parsed.star || opts.star === true;
  const watch: WatchResult[] = opts.watch === undefined ? [] : watchList(opts.watch).map((p) => watchResultOfValue(value, p));
  // Only a real district letter overrides the one read from the prefix.
  const district =
    noteType === 'older' ? null : typeof opts.district === 'string' && /^[A-L]$/i.test(opts.district) ? opts.district.toUpperCase() : parsed.district;
  const facility = typeof opts.facility === 'string' ? opts.facility.toUpperCase() : undefined;
  return {
    ok: true,
    input: text,
    digits: parsed.digits,
    value,
    prefix: parsed.prefix,
    seriesLetter: parsed.seriesLetter,
    suffix: parsed.suffix,
    star,
    district,
    runEnd,
    lowLimit,
    patterns,
    distinctDigits: feats.distinctDigits,
    longestRun: feats.longestRun,
    maxDigitCount: feats.maxDigitCount,
    lowTier: feats.lowTier,
    run: feats.run,
    count: feats.count,
    nearMiss: nearMissesOfValue(value),
    neighbours: allNeighboursOfValue(value, runEnd),
    odds: readingOddsOfMask(mask, lowLimit, domainLast),
    watch,
    // Score against the same low limit the reading used, so its lines match the badges.
    score: scoreAt(
      { value, patterns, longestRun: feats.longestRun, maxDigitCount: feats.maxDigitCount, star, watch, starRunSize },
      weights,
      lowLimit,
    ),
    trade: tradeNotes({
      series: typeof opts.series === 'string' && opts.series.trim() !== '' ? opts.series : undefined,
      district,
      facility: facility === 'DC' || facility === 'FW' ? facility : undefined,
      star,
      denomination,
      value,
      prefix: parsed.prefix,
      suffix: parsed.suffix,
      starBefore: parsed.starBefore,
      noteType,
      starRunSize,
    }),
  };
}
