/**
 * Strapsift's serial-reading engine: pure TypeScript, no I/O, the same in the
 * app (React Native, web) and on the server.
 *
 * Functions that take user text never throw (`parseSerial`, `parseWatchPattern`,
 * `read`). The calculators (`classify`, `nearMiss`, `neighbours`, `sweep`, the
 * counts) take serials as 8 digits or a number 1…99,999,999 and throw a
 * RangeError with a clear message for anything else: that is a programming
 * error, not a user's typo. The domain is 00000001–99999999; 00000000 is never
 * a member, target or neighbour. Nothing here mutates its input.
 */
export type {
  ChanceVerdict,
  CountFeature,
  DateFormat,
  ExpectedHits,
  ExpectedRow,
  Features,
  LowLimit,
  NearMiss,
  NearMissPatternId,
  Neighbour,
  NeighbourPatternId,
  Neighbours,
  ParsedSerial,
  ParseError,
  ParseErrorCode,
  ParseFailure,
  ParseResult,
  PatternId,
  PatternOdds,
  Reading,
  ReadingFailure,
  ReadingOdds,
  ReadOptions,
  ReadResult,
  RunDistribution,
  RunFeature,
  Score,
  ScoreLine,
  SerialInput,
  SweepHit,
  SweepResult,
  WatchErrorCode,
  WatchParseResult,
  WatchPattern,
  WatchResult,
  WeightTable,
} from './types';
export type { NoteType, TradeNote } from '../trade/types';

export { parseSerial, MAX_SERIAL_TEXT } from './parse';
export {
  classify,
  hasPattern,
  patternMask,
  isLowLimit,
  PATTERN_IDS,
  PATTERN_NAMES,
  PATTERN_DEFINITIONS,
  LOW_LIMITS,
  DEFAULT_LOW_LIMIT,
  HIGH_FROM,
  LADDERS,
} from './patterns';
export { features, lowTier, RUN_MIN, COUNT_MIN } from './features';
export { nearMiss, NEAR_MISS_PATTERN_IDS } from './near-miss';
export { neighbours, NEIGHBOUR_PATTERN_IDS } from './neighbours';
export {
  patternCount,
  signatureCount,
  signatureTable,
  oddsOf,
  oddsTable,
  runCount,
  repeatCount,
} from './odds';
export { warmTables } from './tables';
export type { OddsOptions } from './odds';
export { score, DEFAULT_WEIGHTS, SCORE_EXPLANATION } from './score';
export type { ScoreInput } from './score';
export { expectedHits, poissonTail, EXPECTED_CAVEAT } from './expect';
export { sequentialHits, runDistribution, SEQUENTIAL_CAVEAT } from './sequential';
export { combinedHits, MIXED_CAVEAT } from './combined';
export type { TallyPart } from './combined';
export { VERDICT_LEVEL } from './_lib/verdict';
export { completeWeights } from './weights';
export { sweep, MAX_SWEEP } from './sweep';
export { parseWatchPattern, validWatchPattern, watchText, matchWatch, DATE_FORMATS, WATCH_SYNTAX } from './watch';
export { describeNearMiss, describeNeighbour, ordinal } from './describe';
export { read } from './read';
export { DOMAIN_FIRST, DOMAIN_LAST, DOMAIN_SIZE } from './_lib/serial-value';
