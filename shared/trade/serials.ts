import { BEP_SERIALS, USPM_SERIALS } from './references';
import type { Sourced } from './types';

export interface SerialFact extends Sourced {
  id: string;
  text: string;
}

/** What the engine assumes about Federal Reserve note serials (TRADE.md, "Serial numbers"). */
export const SERIAL_FACTS: readonly SerialFact[] = [
  {
    id: 'serial-digits',
    text: 'Every serial has 8 digits, 00000001 to 99999999; 00000000 is never printed.',
    source: 'published',
    reference: BEP_SERIALS,
  },
  {
    id: 'serial-format',
    text: '$1 and $2 notes, and every note up through Series 1995, carry one prefix letter, the district; redesigned notes ($20, $50, $100 from Series 1996; $5 and $10 from Series 1999) carry two: the series letter, then the district.',
    source: 'published',
    reference: `${BEP_SERIALS}; ${USPM_SERIALS} for which denominations and when`,
  },
  {
    id: 'suffix-letters',
    text: 'The suffix letter advances through the alphabet as blocks fill; O is never used (it looks like 0) and Z is kept for test printings.',
    source: 'published',
    reference: BEP_SERIALS,
  },
  {
    id: 'star-replacement',
    text: 'A replacement (star) note carries a star in place of the suffix letter.',
    source: 'published',
    reference: BEP_SERIALS,
  },
  {
    id: 'older-note-types',
    text: 'Older note types (silver certificates, United States notes) used the prefix letter as a block letter, not a district, and put the star before the digits.',
    source: 'published',
    reference: USPM_SERIALS,
  },
  {
    id: 'run-ends',
    text: '$1–$20 notes are numbered in runs of 6,400,000, so a block stops at 96,000,000; $50 and $100 in runs of 3,200,000, stopping at 99,200,000. Higher serials appear only on uncut sheets sold to collectors.',
    source: 'common practice',
    reference: `the principle: ${USPM_SERIALS}; the run sizes are what hunters go by`,
  },
  {
    id: 'quality-control-gaps',
    text: 'For decades serials ending in 0000 or 9999 (and many ending 00002) were pulled for quality control and replaced by star notes, so such notes are scarcer in older series than the raw count says.',
    source: 'common practice',
  },
  {
    id: 'star-runs',
    text: 'Star notes are printed in runs; notes from small runs (commonly 640,000 notes or fewer) are scarcer. No run data ships with the app: record the run size you looked up.',
    source: 'common practice',
  },
];

/** The odds domain's default last serial. */
export const DEFAULT_DOMAIN_LAST = 99_999_999;
/** Where circulating $1–$20 notes stop in a block (common practice; see RUN_ENDS). */
export const SHEET_RUN_END = 96_000_000;
