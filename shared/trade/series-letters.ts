import { USPM_SERIALS } from './references';
import type { Sourced } from './types';

export interface SeriesLetter extends Sourced {
  letter: string;
  series: string;
  design: 'first redesign' | 'second redesign';
}

const SOURCE = { source: 'published', reference: USPM_SERIALS } as const;

/** The series letter that opens a two-letter prefix (TRADE.md; later series per USPM are not listed yet). */
export const SERIES_LETTERS: readonly SeriesLetter[] = [
  { letter: 'A', series: '1996', design: 'first redesign', ...SOURCE },
  { letter: 'B', series: '1999', design: 'first redesign', ...SOURCE },
  { letter: 'C', series: '2001', design: 'first redesign', ...SOURCE },
  { letter: 'D', series: '2003', design: 'first redesign', ...SOURCE },
  { letter: 'F', series: '2003A', design: 'first redesign', ...SOURCE },
  { letter: 'H', series: '2006', design: 'first redesign', ...SOURCE },
  { letter: 'K', series: '2006A', design: 'first redesign', ...SOURCE },
  { letter: 'E', series: '2004', design: 'second redesign', ...SOURCE },
  { letter: 'G', series: '2004A', design: 'second redesign', ...SOURCE },
  { letter: 'I', series: '2006', design: 'second redesign', ...SOURCE },
  { letter: 'J', series: '2009', design: 'second redesign', ...SOURCE },
  { letter: 'L', series: '2009A', design: 'second redesign', ...SOURCE },
  { letter: 'M', series: '2013', design: 'second redesign', ...SOURCE },
  { letter: 'N', series: '2017', design: 'second redesign', ...SOURCE },
  { letter: 'P', series: '2017A', design: 'second redesign', ...SOURCE },
];

/**
 * First series with two prefix letters, per denomination: $20, $50, $100 from
 * Series 1996, $5 and $10 from Series 1999 (USPM). $1 and $2 never.
 */
export const TWO_LETTER_FROM: Readonly<Record<number, string>> = { 5: '1999', 10: '1999', 20: '1996', 50: '1996', 100: '1996' };

/**
 * First series of the second redesign per denomination, which tells Series
 * 2006's two letters apart ($100 2006 is H, the others I). From memory: worth
 * a second look against USPM.
 */
export const SECOND_REDESIGN_FROM: Readonly<Record<number, string>> = { 5: '2006', 10: '2004A', 20: '2004', 50: '2004', 100: '2009' };

/**
 * Series as printed, normalised: spaces dropped, letters upper case.
 *
 * @example
 * normaliseSeries('2013 a') // '2013A'
 */
export function normaliseSeries(series: string): string {
  return series.replace(/\s+/g, '').toUpperCase();
}

/**
 * Orders series as printed: by year, then the letter after it ("2003" < "2003A" < "2004").
 *
 * @example
 * compareSeries('2004A', '2006') // < 0
 */
export function compareSeries(a: string, b: string): number {
  const x = normaliseSeries(a);
  const y = normaliseSeries(b);
  const year = Number(x.slice(0, 4)) - Number(y.slice(0, 4));
  if (year !== 0) return year;
  return x.slice(4) < y.slice(4) ? -1 : x.slice(4) > y.slice(4) ? 1 : 0;
}

/**
 * The series letters a two-letter note of this series may carry: one, or two
 * for Series 2006 when the denomination is unknown. Empty when the series is
 * not in the table.
 *
 * @example
 * seriesLettersFor('2013') // ['M']
 * seriesLettersFor('2006', 100) // ['H']
 */
export function seriesLettersFor(series: string, denomination?: number): string[] {
  const s = normaliseSeries(series);
  let rows = SERIES_LETTERS.filter((r) => r.series === s);
  const secondFrom = denomination === undefined ? undefined : SECOND_REDESIGN_FROM[denomination];
  if (rows.length > 1 && secondFrom !== undefined) {
    const design = compareSeries(s, secondFrom) >= 0 ? 'second redesign' : 'first redesign';
    rows = rows.filter((r) => r.design === design);
  }
  return rows.map((r) => r.letter);
}

/**
 * How many prefix letters a Federal Reserve note of this denomination and
 * series carries, or null when what is known does not settle it.
 *
 * @example
 * prefixLettersFor(1, '2017') // 1
 * prefixLettersFor(20, '2017') // 2
 * prefixLettersFor(undefined, '1995') // 1
 */
export function prefixLettersFor(denomination?: number, series?: string): 1 | 2 | null {
  if (denomination === 1 || denomination === 2) return 1;
  const from = denomination === undefined ? undefined : TWO_LETTER_FROM[denomination];
  if (series !== undefined && /^\d{4}[A-Z]?$/.test(normaliseSeries(series))) {
    if (compareSeries(series, '1996') < 0) return 1;
    if (from !== undefined) return compareSeries(series, from) >= 0 ? 2 : 1;
  }
  return null;
}
