import { DEFAULT_LOW_LIMIT, classify, features, isLowLimit, matchWatch, parseSerial, score } from '../../../shared/engine';
import type { PatternId } from '../../../shared/engine';
import type { ReadingContext } from '../weights/weights.service';

/** The part of the engine's reading a scan row keeps. */
export interface StoredReading {
  digits: string;
  value: number;
  prefix: string;
  suffix: string;
  star: boolean;
  district: string | null;
  patterns: PatternId[];
  points: number;
  keep: boolean;
}

export type StoredReadingResult = { ok: true; reading: StoredReading } | { ok: false; message: string };

/**
 * What `read()` would store for a scan, built from the engine's own parts (parse, classify, features,
 * watch, score) the way `read()` combines them, without the near misses, neighbours, odds and trade
 * notes a stored scan never shows. That is most of `read()`'s cost, and a batch reads 1,000 serials.
 * test/server/scan-reading.test.ts holds every field against `read()` over thousands of serials.
 */
export function storedReading(
  serial: string,
  context: ReadingContext,
  facts: { star?: boolean; starRunSize?: number | null },
): StoredReadingResult {
  const parsed = parseSerial(serial);
  if (!parsed.ok) return { ok: false, message: parsed.error.message };
  const lowLimit = isLowLimit(context.weights.lowLimit) ? context.weights.lowLimit : DEFAULT_LOW_LIMIT;
  const patterns = classify(parsed.value, { lowLimit });
  const { longestRun, maxDigitCount } = features(parsed.value);
  const star = parsed.star || facts.star === true;
  const watch = context.watch.map((pattern) => matchWatch(parsed.value, pattern));
  const scored = score(
    { value: parsed.value, patterns, longestRun, maxDigitCount, star, watch, starRunSize: facts.starRunSize },
    { ...context.weights, lowLimit },
  );
  return {
    ok: true,
    reading: {
      digits: parsed.digits,
      value: parsed.value,
      prefix: parsed.prefix,
      suffix: parsed.suffix,
      star,
      district: parsed.district,
      patterns,
      points: scored.points,
      keep: scored.keep,
    },
  };
}
