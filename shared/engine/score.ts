import { SMALL_STAR_RUN, isSmallStarRun } from '../trade/star-runs';
import { DEFAULT_LOW_LIMIT, PATTERN_IDS, PATTERN_NAMES, isLowLimit } from './patterns';
import type { Reading, Score, ScoreLine, WeightTable } from './types';

/**
 * Weights a new user starts with: roughly each pattern's rarity points
 * (log10 of 1-in-N), rounded to whole numbers a person can reason about, so
 * that a binary (1 in 8,749) reaches the default keep threshold of 4 and a
 * trinary (1 in 144) does not. Super radar and true binary add to the radar
 * and binary weights their members already earn. High serials lie past every
 * circulating run end (uncut-sheet territory), so `high` alone earns a point,
 * not a keep: a high serial in a strap calls for a look, and its run-end note
 * says why. A recorded small star run earns its own bonus on top of the star's.
 */
export const DEFAULT_WEIGHTS: Readonly<WeightTable> = Object.freeze({
  patterns: Object.freeze({
    solid: 10,
    ladder: 10,
    radar: 5,
    repeater: 5,
    'super-repeater': 8,
    rotator: 6,
    binary: 4,
    trinary: 1,
    low: 5,
    high: 1,
    'super-radar': 3,
    'true-binary': 2,
  }),
  runs: Object.freeze({ 4: 1, 5: 2, 6: 3, 7: 4 }),
  counts: Object.freeze({ 5: 1, 6: 2, 7: 3 }),
  lowLimit: DEFAULT_LOW_LIMIT,
  starBonus: 1,
  smallStarRunBonus: 3,
  watchBonus: 5,
  keepThreshold: 4,
}) as WeightTable;

/** How a score is made, in words the app can show beside the weight table. */
export const SCORE_EXPLANATION = [
  'A note’s score is the sum of:',
  '• the weight of every pattern it has (low is judged against your low limit);',
  '• the weight for its longest run of one digit, when that run is 3 or longer and has a weight;',
  '• the weight for its most frequent digit’s count, when that digit appears 4 or more times and the count has a weight;',
  '• the star bonus once, when it is a star note;',
  `• the small-run bonus once more, when it is a star note whose run you recorded as ${SMALL_STAR_RUN.toLocaleString('en-US')} notes or fewer;`,
  '• the watch bonus for each of your watch patterns it matches.',
  'Patterns add up: a solid is also a radar, a repeater and a super repeater, so it collects all four weights.',
  'When the score reaches your keep threshold, Strapsift suggests keeping the note.',
  'A star note under the threshold whose run size is not recorded is not sent back without a prompt: look up its run first.',
].join('\n');

/** What `score` reads from a reading (a whole Reading works). */
export type ScoreInput = Pick<Reading, 'value' | 'patterns' | 'longestRun' | 'maxDigitCount' | 'star'> & {
  watch?: ReadonlyArray<{ matched: boolean; text: string }>;
  /** The star run's size as looked up; null or missing when not recorded. */
  starRunSize?: number | null;
};

function finite(n: unknown): number {
  return typeof n === 'number' && Number.isFinite(n) ? n : 0;
}

function round(n: number): number {
  return Math.round(n * 1000) / 1000;
}

function signed(n: number): string {
  const text = String(round(Math.abs(n)));
  return n < 0 ? `−${text}` : `+${text}`;
}

// Most notes score the same few totals, so the last sentence is reused rather than rebuilt.
let lastSuggestion = { points: Number.NaN, threshold: Number.NaN, text: '' };

function suggestionFor(points: number, threshold: number, keep: boolean, checkRun: boolean): string {
  if (checkRun && !keep) {
    return `${points} points, under the keep threshold of ${threshold}; it is a star note: look up its run size before it goes back in the strap (runs of ${SMALL_STAR_RUN.toLocaleString('en-US')} or fewer are small).`;
  }
  if (lastSuggestion.points === points && lastSuggestion.threshold === threshold) return lastSuggestion.text;
  const text = keep
    ? `${points} points, at or over the keep threshold of ${threshold}: keep it.`
    : `${points} points, under the keep threshold of ${threshold}: back in the strap.`;
  lastSuggestion = { points, threshold, text };
  return text;
}

function line(kind: ScoreLine['kind'], label: string, points: number): ScoreLine {
  return { kind, label, points: round(points), text: `${label}  ${signed(points)}` };
}

/**
 * Scores a reading with a weight table:
 *
 *   points = Σ weights.patterns[p] for each pattern p of the note
 *          + weights.runs[longestRun]        (longestRun ≥ 3)
 *          + weights.counts[maxDigitCount]   (maxDigitCount ≥ 4)
 *          + weights.starBonus               (star notes)
 *          + weights.smallStarRunBonus       (star notes with a recorded run ≤ 640,000)
 *          + weights.watchBonus × matched watch patterns
 *
 * `low` is re-judged against `weights.lowLimit`, so one reading can be scored
 * under several tables (an unknown low limit counts as 999). Missing or
 * non-finite weights count as 0. The note is
 * suggested as a keeper when points ≥ weights.keepThreshold. Every term that
 * applies gets a line (patterns even at weight 0, so the user sees them).
 * Deterministic: the same reading and table always give the same score.
 *
 * @example
 * const reading = read('12121212');
 * if (reading.ok) score(reading, DEFAULT_WEIGHTS).points // 17 (repeater 5 + super repeater 8 + binary 4)
 */
export function score(reading: ScoreInput, weights: WeightTable): Score {
  return scoreAt(reading, weights, isLowLimit(weights?.lowLimit) ? weights.lowLimit : DEFAULT_LOW_LIMIT);
}

/** `score` with the low limit given separately, so `read` can apply its own without copying the table. */
export function scoreAt(reading: ScoreInput, weights: WeightTable, lowLimit: number): Score {
  const lines: ScoreLine[] = [];
  const patternWeights = weights?.patterns;
  const isLow = reading.value >= 1 && reading.value <= lowLimit;
  for (const id of PATTERN_IDS) {
    const has = id === 'low' ? isLow : reading.patterns.includes(id);
    if (has) lines.push(line('pattern', PATTERN_NAMES[id], finite(patternWeights?.[id])));
  }
  if (reading.longestRun >= 3) {
    const w = finite(weights?.runs?.[reading.longestRun as 3]);
    if (w !== 0) lines.push(line('run', `run of ${reading.longestRun}`, w));
  }
  if (reading.maxDigitCount >= 4) {
    const w = finite(weights?.counts?.[reading.maxDigitCount as 4]);
    if (w !== 0) lines.push(line('count', `one digit ${reading.maxDigitCount} times`, w));
  }
  if (reading.star) {
    lines.push(line('star', 'star note', finite(weights?.starBonus)));
    if (isSmallStarRun(reading.starRunSize)) lines.push(line('star-run', 'small star run', finite(weights?.smallStarRunBonus)));
  }
  const watch = reading.watch;
  if (watch) {
    for (const w of watch) if (w.matched) lines.push(line('watch', `watch ${w.text}`, finite(weights?.watchBonus)));
  }
  let sum = 0;
  for (const l of lines) sum += l.points;
  const points = round(sum);
  const keepThreshold = finite(weights?.keepThreshold);
  const keep = points >= keepThreshold;
  const checkRun = reading.star && typeof reading.starRunSize !== 'number';
  return { points, lines, keep, keepThreshold, suggestion: suggestionFor(points, keepThreshold, keep, checkRun) };
}
