import type { Sourced } from './types';

export interface SerialFact extends Sourced {
  id: string;
  text: string;
}

/** What the engine assumes about Federal Reserve note serials. */
export const SERIAL_FACTS: readonly SerialFact[] = [
  {
    id: 'serial-format',
    text: 'The serial has 8 digits between a prefix and a suffix letter; newer series carry two prefix letters (series, then district), older series one (the district).',
    source: 'from memory',
  },
  {
    id: 'star-replacement',
    text: 'A replacement (star) note carries a star in place of the suffix letter; some older note types carried the star before the digits.',
    source: 'common practice',
  },
  {
    id: 'sheet-run-end',
    text: 'Serial runs on 32-note sheets are said to end at 96,000,000 rather than 99,999,999 for regular notes; the default odds domain stays 00000001–99999999 and can be changed.',
    source: 'from memory',
  },
  {
    id: 'star-runs',
    text: 'Star notes are printed in runs; notes from small runs are scarcer. No run data ships with the app: record your own.',
    source: 'common practice',
  },
];

/** The odds domain's default last serial, and the sheet-run end said to apply to regular notes. */
export const DEFAULT_DOMAIN_LAST = 99_999_999;
export const SHEET_RUN_END = 96_000_000;
