import { WEB_PRESS_REFERENCE } from './references';
import type { SeriesRule } from './types';

/**
 * Series facts a reading mentions when they apply. Data, not branches: a new
 * fact is a new row here. (The duplicate star serials depend on the serial as
 * well as the series, so they live in duplicate-stars.ts.)
 */
export const SERIES_RULES: readonly SeriesRule[] = [
  {
    id: 'web-press',
    series: ['1988A', '1993', '1995'],
    denomination: 1,
    severity: 'check',
    text: '$1 notes from the web press exist in series 1988A, 1993 and 1995 only. They were printed in Washington, carry a face plate number without a position letter, and have the back plate number to the right of "IN GOD WE TRUST": check the plates.',
    source: 'published',
    reference: WEB_PRESS_REFERENCE,
  },
  {
    id: 'first-current-design',
    series: ['1963'],
    denomination: 1,
    severity: 'info',
    text: 'Series 1963 was the first series of the current-design $1 Federal Reserve note (1963A and 1963B follow it); notes that old are rare in circulation.',
    source: 'common practice',
  },
];
