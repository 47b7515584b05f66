/** Trade facts as data, each with its source label (see docs TRADE.md). */
export type { SourceLabel, Sourced, District, Facility, SeriesRule, TradeNote, NoteFacts, NoteType } from './types';
export { DISTRICTS, districtByLetter } from './districts';
export { FACILITIES, facilityByCode } from './facilities';
export { PACKAGING, NOTES_PER_STRAP, NOTES_PER_BUNDLE, NOTES_PER_BRICK } from './packaging';
export type { PackagingUnit } from './packaging';
export { SERIES_RULES } from './series';
export { SERIAL_FACTS, DEFAULT_DOMAIN_LAST, SHEET_RUN_END } from './serials';
export type { SerialFact } from './serials';
export { RUN_ENDS, LOWEST_RUN_END, HIGHEST_RUN_END, runEndFor } from './run-ends';
export type { RunEnd } from './run-ends';
export {
  SERIES_LETTERS,
  TWO_LETTER_FROM,
  SECOND_REDESIGN_FROM,
  compareSeries,
  normaliseSeries,
  prefixLettersFor,
  seriesLettersFor,
} from './series-letters';
export type { SeriesLetter } from './series-letters';
export { DUPLICATE_STAR_RANGES, duplicateStarRange } from './duplicate-stars';
export type { DuplicateStarRange } from './duplicate-stars';
export { SMALL_STAR_RUN, isSmallStarRun } from './star-runs';
export { formatNotes } from './format-notes';
export { GRADES, GRADE_BANDS, gradeBand, gradeLabel, isValidGrade } from './grading';
export type { Grade, GradeBand } from './grading';
export { tradeNotes } from './notes';
