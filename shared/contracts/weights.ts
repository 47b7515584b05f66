import { z } from 'zod';
import { DEFAULT_WEIGHTS } from '../engine/score';
import type { PatternId, WeightTable } from '../engine/types';
import { PATTERN_ID_LIST, isoDateTime, uuid } from './common';

const weight = z.number({ message: 'must be a number' }).min(-100, 'must be at least −100').max(100, 'must be at most 100');
const optionalWeight = weight.optional();

export const lowLimit = z.union([z.literal(9), z.literal(99), z.literal(999), z.literal(9999), z.literal(99999)], {
  message: 'must be 9, 99, 999, 9999 or 99999',
});

const patternWeights = z.object(Object.fromEntries(PATTERN_ID_LIST.map((id) => [id, weight])) as Record<PatternId, typeof weight>).strict();

/** Weights added after tables were first saved: a table without them gets the engine's defaults. */
const LATER_PATTERNS: readonly PatternId[] = ['super-radar', 'true-binary'];

function withLaterWeights(value: unknown): unknown {
  if (value === null || typeof value !== 'object' || Array.isArray(value)) return value;
  const table = value as { patterns?: unknown; smallStarRunBonus?: unknown };
  const out: Record<string, unknown> = { ...table };
  if (table.smallStarRunBonus === undefined) out.smallStarRunBonus = DEFAULT_WEIGHTS.smallStarRunBonus;
  if (table.patterns !== null && typeof table.patterns === 'object' && !Array.isArray(table.patterns)) {
    const patterns: Record<string, unknown> = { ...(table.patterns as Record<string, unknown>) };
    for (const id of LATER_PATTERNS) if (patterns[id] === undefined) patterns[id] = DEFAULT_WEIGHTS.patterns[id];
    out.patterns = patterns;
  }
  return out;
}

/**
 * The engine's WeightTable (see `score` in shared/engine): points per pattern, run, count, star and watch.
 * A table from before super radar, true binary and the small-star-run bonus existed gets their defaults.
 */
export const weightTableValues = z.preprocess(
  withLaterWeights,
  z
  .object({
    patterns: patternWeights,
    runs: z.object({ 3: optionalWeight, 4: optionalWeight, 5: optionalWeight, 6: optionalWeight, 7: optionalWeight, 8: optionalWeight }).strict(),
    counts: z.object({ 4: optionalWeight, 5: optionalWeight, 6: optionalWeight, 7: optionalWeight, 8: optionalWeight }).strict(),
    lowLimit,
    starBonus: weight,
    smallStarRunBonus: weight,
    watchBonus: weight,
    keepThreshold: z.number({ message: 'must be a number' }).min(-1000, 'must be at least −1000').max(1000, 'must be at most 1000'),
  })
  .strict(),
);
export type WeightTableValues = z.infer<typeof weightTableValues>;

// Fails to compile if the contract and the engine's table drift apart.
export const weightTableValuesFitEngine: (values: WeightTableValues) => WeightTable = (values) => values;

const name = z.string().trim().min(1, 'is required').max(60, 'must be at most 60 characters');

export const createWeightTableRequest = z
  .object({
    name,
    /** Defaults to the engine's DEFAULT_WEIGHTS. */
    weights: weightTableValues.optional(),
    /** Make it the active table at once. */
    activate: z.boolean().optional(),
  })
  .strict();
export type CreateWeightTableRequest = z.infer<typeof createWeightTableRequest>;

/** PUT replaces the name and every weight. */
export const replaceWeightTableRequest = z.object({ name, weights: weightTableValues }).strict();
export type ReplaceWeightTableRequest = z.infer<typeof replaceWeightTableRequest>;

export const weightTableView = z.object({
  id: uuid,
  name: z.string(),
  active: z.boolean(),
  weights: weightTableValues,
  createdAt: isoDateTime,
  updatedAt: isoDateTime,
});
export type WeightTableView = z.infer<typeof weightTableView>;

/** The caller's tables (exactly one active) and the engine's defaults, for a "reset" button. */
export const weightTableList = z.object({ items: z.array(weightTableView), defaults: weightTableValues });
export type WeightTableList = z.infer<typeof weightTableList>;
