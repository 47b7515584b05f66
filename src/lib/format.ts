/**
 * Every number, date and sum of money the client shows goes through here, so one idea has one
 * wording. English (US) throughout, through `Intl`, as the rest of the app's text is.
 */
const LOCALE = 'en-US';

const wholeCount = new Intl.NumberFormat(LOCALE, { maximumFractionDigits: 0 });
const twoPlaces = new Intl.NumberFormat(LOCALE, { maximumFractionDigits: 2 });
const onePlace = new Intl.NumberFormat(LOCALE, { maximumFractionDigits: 1 });
const fixedOnePlace = new Intl.NumberFormat(LOCALE, { minimumFractionDigits: 1, maximumFractionDigits: 1 });
const dollars = new Intl.NumberFormat(LOCALE, { style: 'currency', currency: 'USD' });

/** Whole counts with thousands separators: 4,000. */
export const formatCount = (value: number): string => wholeCount.format(Math.round(value));

/** "1 find", "3 finds", "1,200 notes": a count with its noun, plural by the count. */
export function countOf(n: number, noun: string, plural = `${noun}s`): string {
  return `${formatCount(n)} ${n === 1 ? noun : plural}`;
}

/** Finds per 1,000 notes, to two places at most: 7.25, 12, 0.5. */
export const formatRate = (perThousand: number): string => twoPlaces.format(perThousand);

/**
 * "1 in 1,000" from a 1-in-N figure; under 10 keeps a decimal ("1 in 2.5") since rounding there
 * changes the meaning; "never" for a pattern that cannot occur.
 *
 * @example
 * formatOneIn(1234.4) // '1 in 1,234'
 */
export function formatOneIn(oneIn: number): string {
  if (!Number.isFinite(oneIn)) return 'never';
  if (oneIn < 10) return `1 in ${fixedOnePlace.format(oneIn)}`;
  return `1 in ${formatCount(oneIn)}`;
}

/**
 * An expected count. Rare patterns expect millionths of a note in a hunt, so small figures keep two
 * significant digits instead of rounding to a misleading 0, down to a floor below which only "< 0.0001" is honest.
 */
export function formatExpected(value: number): string {
  if (value === 0) return '0';
  // A no-break space keeps the sign and the figure on one line in a narrow cell.
  if (value < 0.0001) return '<\u00a00.0001';
  if (value >= 100) return formatCount(value);
  if (value >= 1) return onePlace.format(value);
  return value.toLocaleString(LOCALE, { maximumSignificantDigits: 2 });
}

/** A probability as a person reads it: "32%", "4.1%", then "1 in 250" once it is under 1%. */
export function formatChance(p: number): string {
  if (!Number.isFinite(p)) return '—';
  if (p >= 0.995) return '100%';
  if (p >= 0.1) return `${Math.round(p * 100)}%`;
  if (p >= 0.01) return `${onePlace.format(p * 100)}%`;
  if (p <= 0) return '0';
  const oneIn = 1 / p;
  if (oneIn >= 1e9) return 'under 1 in a billion';
  // Past a million the exact figure is noise; millions read at a glance and fit a table cell.
  if (oneIn >= 1e6) return `1 in ${formatCount(oneIn / 1e6)} million`;
  return `1 in ${formatCount(oneIn)}`;
}

/** "$12.50" for 1250 cents; money is integer cents everywhere and dollars only on screen. */
export function formatCents(cents: number | null | undefined): string {
  if (cents == null) return '—';
  return dollars.format(cents / 100);
}

const dateStyles = {
  /** Mon, Mar 2, 2026 */
  long: { weekday: 'short', month: 'short', day: 'numeric', year: 'numeric' },
  /** Mar 2, 2026 */
  medium: { month: 'short', day: 'numeric', year: 'numeric' },
  /** Mar 2 */
  short: { month: 'short', day: 'numeric' },
  /** Mar 2, 3:05 PM */
  moment: { month: 'short', day: 'numeric', hour: 'numeric', minute: '2-digit' },
} as const satisfies Record<string, Intl.DateTimeFormatOptions>;

export type DateStyle = keyof typeof dateStyles;

/** A date in the device's time zone, in one of the app's few styles. */
export function formatDate(when: string | Date, style: DateStyle = 'long'): string {
  return new Date(when).toLocaleString(LOCALE, dateStyles[style]);
}

/** "Mar 2" */
export const formatShortDate = (when: string | Date): string => formatDate(when, 'short');

/** Joins the parts of a caption that are present: ["Mill St", "", "$1"] → "Mill St · $1". */
export function caption(...parts: (string | null | undefined | false)[]): string {
  return parts.filter(Boolean).join(' · ');
}
