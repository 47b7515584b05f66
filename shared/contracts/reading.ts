import { z } from 'zod';
import { NEAR_MISS_PATTERN_IDS } from '../engine/near-miss';
import { NEIGHBOUR_PATTERN_IDS } from '../engine/neighbours';
import type { Reading } from '../engine/types';
import { patternId, serialDigits } from './common';

const nearMiss = z.object({ distance: z.number(), target: z.string(), positions: z.array(z.number().int()) });
const neighbour = z.object({ serial: serialDigits, notesAway: z.number() });
const neighbours = z.object({ below: neighbour.nullable(), above: neighbour.nullable() });
const odds = z.object({ count: z.number(), oneIn: z.number().nullable(), points: z.number() });

const watchPattern = z.union([
  z.object({ kind: z.literal('mask'), mask: z.string(), label: z.string().optional() }),
  z.object({ kind: z.literal('range'), from: z.number(), to: z.number(), label: z.string().optional() }),
  z.object({
    kind: z.literal('date'),
    date: z.string(),
    formats: z.array(z.enum(['MMDDYYYY', 'DDMMYYYY', 'YYYYMMDD'])),
    label: z.string().optional(),
  }),
]);

/** The engine's watch-pattern object (see `parseWatchPattern`). */
export const watchPatternSchema = watchPattern;

/**
 * The engine's Reading as it crosses the API (JSON-safe; an infinite `oneIn` would arrive as null).
 * The server computes it with the caller's active weight table and watch patterns.
 */
export const readingSchema = z.object({
  ok: z.literal(true),
  input: z.string(),
  digits: serialDigits,
  value: z.number().int(),
  prefix: z.string(),
  seriesLetter: z.string().nullable(),
  suffix: z.string(),
  star: z.boolean(),
  district: z.string().nullable(),
  runEnd: z.number().int(),
  lowLimit: z.number().int(),
  patterns: z.array(patternId),
  distinctDigits: z.number().int(),
  longestRun: z.number().int(),
  maxDigitCount: z.number().int(),
  lowTier: z.number().int().nullable(),
  run: z.object({ digit: z.number().int(), length: z.number().int(), start: z.number().int() }).nullable(),
  count: z.object({ digit: z.number().int(), times: z.number().int() }).nullable(),
  nearMiss: z.record(z.enum(NEAR_MISS_PATTERN_IDS as [(typeof NEAR_MISS_PATTERN_IDS)[number], ...(typeof NEAR_MISS_PATTERN_IDS)[number][]]), nearMiss),
  neighbours: z.record(
    z.enum(NEIGHBOUR_PATTERN_IDS as [(typeof NEIGHBOUR_PATTERN_IDS)[number], ...(typeof NEIGHBOUR_PATTERN_IDS)[number][]]),
    neighbours,
  ),
  odds: z.object({
    domainSize: z.number(),
    patterns: z.array(odds.extend({ id: patternId })),
    combination: odds.extend({ ids: z.array(patternId), exactCount: z.number() }).nullable(),
  }),
  watch: z.array(z.object({ pattern: watchPattern, text: z.string(), matched: z.boolean(), nearMiss })),
  score: z.object({
    points: z.number(),
    lines: z.array(
      z.object({ kind: z.enum(['pattern', 'run', 'count', 'star', 'star-run', 'watch']), label: z.string(), points: z.number(), text: z.string() }),
    ),
    keep: z.boolean(),
    keepThreshold: z.number(),
    suggestion: z.string(),
  }),
  trade: z.array(
    z.object({
      id: z.string(),
      severity: z.enum(['info', 'check', 'warning']),
      text: z.string(),
      source: z.enum(['published', 'common practice', 'from memory']),
      reference: z.string().optional(),
    }),
  ),
});
export type ReadingView = z.infer<typeof readingSchema>;

// Fails to compile when the engine's Reading grows a field this schema does not describe.
type Covers<Schema, Engine> = keyof Engine extends keyof Schema ? true : never;
export const readingSchemaCoversEngine: Covers<ReadingView, Reading> = true;
