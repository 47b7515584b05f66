/** Trade facts as data, each with its source label (see docs TRADE.md). */
export type { SourceLabel, Sourced, District, Facility, SeriesRule, TradeNote, NoteFacts } from './types';
export { DISTRICTS, districtByLetter } from './districts';
export { FACILITIES, facilityByCode } from './facilities';
export { PACKAGING, NOTES_PER_STRAP, NOTES_PER_BUNDLE, NOTES_PER_BRICK } from './packaging';
export type { PackagingUnit } from './packaging';
export { SERIES_RULES } from './series';
export { SERIAL_FACTS, DEFAULT_DOMAIN_LAST, SHEET_RUN_END } from './serials';
export type { SerialFact } from './serials';
export { GRADES, isValidGrade } from './grading';
export type { Grade } from './grading';
export { tradeNotes } from './notes';
