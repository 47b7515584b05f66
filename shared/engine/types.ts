/**
 * Shared shapes of the serial-reading engine. Everything here is plain data
 * (JSON-safe) so a reading can cross the API boundary unchanged.
 */

import type { NoteType, TradeNote } from '../trade/types';

/**
 * The pattern ids, kebab-case, as used in code, the API and the CLI. Their
 * order (and so the bit of each in a stored mask) is PATTERN_IDS.
 */
export type PatternId =
  | 'solid'
  | 'ladder'
  | 'radar'
  | 'repeater'
  | 'super-repeater'
  | 'rotator'
  | 'binary'
  | 'trinary'
  | 'low'
  | 'high'
  | 'super-radar'
  | 'true-binary';

/** Patterns that have near misses (the dense ones and the low/high bands have none). */
export type NearMissPatternId = 'binary' | 'trinary' | 'solid' | 'radar' | 'repeater' | 'ladder' | 'super-radar' | 'true-binary';

/** Patterns that have neighbours: every pattern but `low` and `high`, which are plain intervals. */
export type NeighbourPatternId = Exclude<PatternId, 'low' | 'high'>;

/** The low limits a weight table may choose. */
export type LowLimit = 9 | 99 | 999 | 9999 | 99999;

/** What a serial may be given as: its 8 digits, or its value 1…99,999,999. */
export type SerialInput = string | number;

export type ParseErrorCode =
  | 'not-text'
  | 'empty'
  | 'too-long'
  | 'bad-character'
  | 'too-few-digits'
  | 'too-many-digits'
  | 'digits-split'
  | 'too-many-prefix-letters'
  | 'too-many-suffix-letters'
  | 'two-stars'
  | 'unknown-district'
  | 'zero-serial';

/** A reason the text is not a serial, with a sentence a person understands. */
export interface ParseError {
  code: ParseErrorCode;
  message: string;
}

/** The parts of a typed or pasted serial. */
export interface ParsedSerial {
  ok: true;
  /** The 8 digits, leading zeros kept. */
  digits: string;
  /** The serial as a number, 1…99,999,999. */
  value: number;
  /** Prefix letters, upper case ('' when none). */
  prefix: string;
  /** Suffix letter, upper case ('' when none or when a star stands in its place). */
  suffix: string;
  /** True when a star (`*` or ★) was given before the digits or in place of the suffix. */
  star: boolean;
  /** True when the star came before the digits (the older note types' place for it). */
  starBefore: boolean;
  /** The district letter A–L read from the prefix, or null when there is no prefix (or it is an older note's block letter). */
  district: string | null;
  /** The first of two prefix letters (the series letter of a redesigned note), else null. */
  seriesLetter: string | null;
  /** `modern` = two prefix letters, `older` = one, `bare` = digits only. */
  style: 'modern' | 'older' | 'bare';
}

export interface ParseFailure {
  ok: false;
  error: ParseError;
}

export type ParseResult = ParsedSerial | ParseFailure;

/** The closest a serial comes to a pattern. `distance` is 0 when the serial already is a member. */
export interface NearMiss {
  /** Fewest single-digit changes that reach a member (0 = already a member). */
  distance: number;
  /** One member at that distance (the serial itself when distance is 0); never 00000000. */
  target: string;
  /** 1-based positions where target and serial differ, ascending. */
  positions: number[];
}

export interface Neighbour {
  /** The member's 8 digits. */
  serial: string;
  /** How many notes separate it from the serial read (always ≥ 1). */
  notesAway: number;
}

export interface Neighbours {
  below: Neighbour | null;
  above: Neighbour | null;
}

/** A run of one digit, 1-based start position. */
export interface RunFeature {
  digit: number;
  length: number;
  start: number;
}

/** The most frequent digit and how often it appears. */
export interface CountFeature {
  digit: number;
  times: number;
}

/** Digit statistics that are not pattern ids but feed odds, badges and scoring. */
export interface Features {
  distinctDigits: number;
  longestRun: number;
  maxDigitCount: number;
  /** The smallest of 9, 99, 999, 9999, 99999 that the value is ≤, else null. */
  lowTier: LowLimit | null;
  /** The longest run when it is 3 or longer ("runs" in the product brief), else null. */
  run: RunFeature | null;
  /** The most frequent digit when it appears 4 or more times ("count"), else null. */
  count: CountFeature | null;
}

/** A user's watch pattern (see `parseWatchPattern` for the text syntax). */
export type WatchPattern =
  | { kind: 'mask'; mask: string; label?: string }
  | { kind: 'range'; from: number; to: number; label?: string }
  | { kind: 'date'; date: string; formats: DateFormat[]; label?: string };

export type DateFormat = 'MMDDYYYY' | 'DDMMYYYY' | 'YYYYMMDD';

export interface WatchParseSuccess {
  ok: true;
  pattern: WatchPattern;
}

export interface WatchParseFailure {
  ok: false;
  error: { code: WatchErrorCode; message: string };
}

export type WatchErrorCode =
  | 'not-text'
  | 'empty'
  | 'bad-mask'
  | 'mask-matches-everything'
  | 'mask-matches-nothing'
  | 'bad-range'
  | 'range-reversed'
  | 'range-outside-domain'
  | 'bad-date'
  | 'not-a-calendar-date'
  | 'bad-date-format'
  | 'unrecognised';

export type WatchParseResult = WatchParseSuccess | WatchParseFailure;

/** How a serial fares against one watch pattern. */
export interface WatchResult {
  pattern: WatchPattern;
  /** The pattern in its canonical text form (what `parseWatchPattern` accepts). */
  text: string;
  matched: boolean;
  nearMiss: NearMiss;
}

/** Exact rarity of one pattern (or a combination) over the odds domain. */
export interface PatternOdds {
  count: number;
  /** Domain size ÷ count: "1 in N". Infinity when count is 0. */
  oneIn: number;
  /** log10(1/p) with p = count ÷ domain size. */
  points: number;
}

export interface ReadingOdds {
  /** Serials in the odds domain (99,999,999 by default). */
  domainSize: number;
  /** One entry per pattern of the serial, in PATTERN_IDS order. */
  patterns: Array<PatternOdds & { id: PatternId }>;
  /**
   * The serial's whole combination of patterns, or null when it has none.
   * `count` = serials having at least all of these patterns (so more patterns is
   * never more common); `exactCount` = serials with exactly this combination.
   */
  combination: (PatternOdds & { ids: PatternId[]; exactCount: number }) | null;
}

/** A user's weight table (see `score` for how each field is used). */
export interface WeightTable {
  /** Points for each pattern the serial has. */
  patterns: Record<PatternId, number>;
  /** Points for the longest run, keyed by its length (3…8); missing lengths give 0. */
  runs: Partial<Record<3 | 4 | 5 | 6 | 7 | 8, number>>;
  /** Points for the most frequent digit's count, keyed by count (4…8); missing give 0. */
  counts: Partial<Record<4 | 5 | 6 | 7 | 8, number>>;
  /** Which values count as `low`. */
  lowLimit: LowLimit;
  /** Added once when the note is a star note. */
  starBonus: number;
  /** Added once more when a star note's recorded run is small (640,000 notes or fewer). */
  smallStarRunBonus: number;
  /** Added for each watch pattern the serial matches. */
  watchBonus: number;
  /** A note whose points reach this is suggested as a keeper. */
  keepThreshold: number;
}

export interface ScoreLine {
  kind: 'pattern' | 'run' | 'count' | 'star' | 'star-run' | 'watch';
  /** What earned the points, e.g. "super repeater" or "watch 12??1990". */
  label: string;
  points: number;
  /** The line as a person reads it, e.g. "super repeater  +8". */
  text: string;
}

export interface Score {
  points: number;
  lines: ScoreLine[];
  keep: boolean;
  keepThreshold: number;
  /** One sentence, e.g. "9 points, at or over the keep threshold of 4: keep it." */
  suggestion: string;
}

export interface ReadOptions {
  /** Low limit for the `low` pattern; defaults to the weight table's, else 999. */
  lowLimit?: LowLimit;
  /** Weight table for the score; defaults to DEFAULT_WEIGHTS. */
  weights?: WeightTable;
  /**
   * Watch patterns (parsed objects, or text in `parseWatchPattern` syntax; bad ones are skipped).
   * Each is checked once and remembered (objects by identity), so replace an object rather than
   * changing it; the patterns a reading returns are frozen.
   */
  watch?: ReadonlyArray<WatchPattern | string>;
  /** True marks a star note even when the text had no star. */
  star?: boolean;
  /** Series as printed, e.g. "2013" or "1988A"; enables trade notes. */
  series?: string;
  /** District letter A–L; overrides the one read from the prefix. */
  district?: string;
  /** Printing facility: 'DC' (Washington) or 'FW' (Fort Worth). */
  facility?: 'DC' | 'FW';
  /**
   * Face value in dollars: trade notes about other values are skipped, the
   * serial format is checked against it, and neighbours stop at its run end
   * (96,000,000 for $1–$20, 99,200,000 for $50 and $100).
   */
  denomination?: number;
  /**
   * Last serial of the odds domain (default 99,999,999), or `'run-end'` for the
   * denomination's run end (the full domain when no denomination is given).
   */
  domainLast?: number | 'run-end';
  /** Federal Reserve note (default) or an older note type with a block letter. */
  noteType?: NoteType;
  /** The star run's size as the hunter looked it up (scores the small-run bonus). */
  starRunSize?: number | null;
}

/** The engine's verdict for one serial. */
export interface Reading extends Features {
  ok: true;
  input: string;
  digits: string;
  value: number;
  prefix: string;
  /** The series letter of a two-letter prefix, else null. */
  seriesLetter: string | null;
  suffix: string;
  star: boolean;
  district: string | null;
  /** The last serial neighbours may point to: the denomination's run end, else 99,999,999. */
  runEnd: number;
  lowLimit: LowLimit;
  patterns: PatternId[];
  nearMiss: Record<NearMissPatternId, NearMiss>;
  neighbours: Record<NeighbourPatternId, Neighbours>;
  odds: ReadingOdds;
  watch: WatchResult[];
  score: Score;
  trade: TradeNote[];
}

export interface ReadingFailure {
  ok: false;
  input: string;
  error: ParseError;
}

export type ReadResult = Reading | ReadingFailure;

export interface SweepHit {
  serial: string;
  value: number;
  /** The requested patterns this serial has, in PATTERN_IDS order (frozen, shared between hits). */
  patterns: readonly PatternId[];
}

export interface SweepResult {
  first: number;
  /** Last serial looked at (stops at 99,999,999, or at the run end given). */
  last: number;
  /** Serials looked at: last − first + 1. */
  count: number;
  /** True when the requested count ran past 99,999,999 (or the run end given) and was cut there. */
  truncated: boolean;
  patterns: PatternId[];
  hits: SweepHit[];
}

/**
 * How a count compares with chance at the 95% level: `more` or `fewer` when
 * its tail is 5% or less, `as-chance` otherwise, and `no-comparison` when no
 * count on its side could be unusual (e.g. most straps hold no radar at all).
 */
export type ChanceVerdict = 'more' | 'fewer' | 'as-chance' | 'no-comparison';

export interface ExpectedRow {
  id: PatternId;
  /** Chance that one note has the pattern (for a run in sequence: expected ÷ notes). */
  probability: number;
  /** The mean count: notes × probability. */
  expected: number;
  /** The count given by the caller, or null. */
  actual: number | null;
  /** P(X ≥ actual): Poisson for circulated notes, the exact run distribution for notes in sequence; null without an actual. */
  pAtLeast: number | null;
  /** P(X ≤ actual), the same way; null without an actual. */
  pAtMost: number | null;
  /** The verdict at the 95% level; null without an actual. */
  verdict: ChanceVerdict | null;
}

export interface ExpectedHits {
  notes: number;
  lowLimit: LowLimit;
  /** True when the figures are for one run of new notes in sequence, false for circulated notes (Poisson). */
  inSequence: boolean;
  rows: ExpectedRow[];
  /** What the figures compare against and why. */
  caveat: string;
}

/** A pattern's count in a run of consecutive serials, over every possible starting serial. */
export interface RunDistribution {
  id: PatternId;
  runLength: number;
  /** How many starting serials there are: domain last − run length + 1. */
  starts: number;
  /** probabilities[k]: the share of starts whose run holds exactly k members. */
  probabilities: number[];
  mean: number;
}
