import type { SeriesRule } from './types';

/**
 * Series facts a reading mentions when they apply. Data, not branches: a new
 * fact is a new row here.
 */
export const SERIES_RULES: readonly SeriesRule[] = [
  {
    id: 'web-press',
    series: ['1988A', '1993', '1995'],
    denomination: 1,
    severity: 'check',
    text: '$1 notes from the web press exist in series 1988A, 1993 and 1995 only: check the back plate number, whose position and form differ on web notes.',
    source: 'common practice',
  },
  {
    id: 'first-current-design',
    series: ['1963'],
    denomination: 1,
    severity: 'info',
    text: 'Series 1963 was the first series of the current-design $1 Federal Reserve note; notes that old are rare in circulation.',
    source: 'common practice',
  },
  {
    id: 'duplicate-star-serials',
    series: ['2013'],
    denomination: 1,
    districts: ['B'],
    star: true,
    severity: 'warning',
    text: 'Some $1 series 2013 New York (B) star notes were printed at both Washington and Fort Worth over the same serial ranges, so two notes can share this serial: check the facility mark.',
    source: 'common practice',
  },
];
