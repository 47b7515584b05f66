import { z } from 'zod';

export type PeriodChoice = '4w' | '3m' | '12m' | 'all' | 'custom';

export const PERIOD_CHOICES = [
  { value: '4w', label: '4 weeks' },
  { value: '3m', label: '3 months' },
  { value: '12m', label: '12 months' },
  { value: 'all', label: 'All time' },
  { value: 'custom', label: 'Dates…' },
] as const;

const DAYS: Record<Exclude<PeriodChoice, 'all' | 'custom'>, number> = { '4w': 28, '3m': 91, '12m': 365 };

/** YYYY-MM-DD of a moment, in UTC, the calendar the server buckets by. */
export const isoDay = (date: Date): string => date.toISOString().slice(0, 10);

/** The `from` of a preset period ending today; undefined for all time. */
export function presetFrom(choice: Exclude<PeriodChoice, 'custom'>, now = new Date()): string | undefined {
  if (choice === 'all') return undefined;
  return isoDay(new Date(now.getTime() - (DAYS[choice] - 1) * 24 * 60 * 60 * 1000));
}

const day = z.iso.date({ message: 'must be a date written 2026-03-01' });

/** Checks typed dates: each empty or a real date, and from not after to. */
export function parseCustomPeriod(fromText: string, toText: string):
  | { ok: true; from?: string; to?: string }
  | { ok: false; errors: { from?: string; to?: string } } {
  const errors: { from?: string; to?: string } = {};
  const from = fromText.trim();
  const to = toText.trim();
  if (from && !day.safeParse(from).success) errors.from = 'must be a date written 2026-03-01';
  if (to && !day.safeParse(to).success) errors.to = 'must be a date written 2026-03-01';
  if (!errors.from && !errors.to && from && to && from > to) errors.to = 'must not be before From';
  if (errors.from || errors.to) return { ok: false, errors };
  return { ok: true, from: from || undefined, to: to || undefined };
}

/** A bucket's start as its label: "Mar 2" for a week, "Mar 2026" for a month (UTC, as the server cut it). */
export function bucketLabel(iso: string, bucket: 'week' | 'month', short = false): string {
  const date = new Date(iso);
  if (bucket === 'month') {
    return date.toLocaleDateString('en-US', { month: 'short', year: short ? '2-digit' : 'numeric', timeZone: 'UTC' });
  }
  return date.toLocaleDateString('en-US', { month: 'short', day: 'numeric', timeZone: 'UTC' });
}

/** The start of the bucket after `iso`: a week (7 days) or a calendar month later, in UTC. */
export function nextBucket(iso: string, bucket: 'week' | 'month'): string {
  const date = new Date(iso);
  if (bucket === 'week') return new Date(date.getTime() + 7 * 24 * 60 * 60 * 1000).toISOString();
  return new Date(Date.UTC(date.getUTCFullYear(), date.getUTCMonth() + 1, 1)).toISOString();
}

/**
 * Every bucket from the first to the last one with notes, the empty ones included, so a chart over
 * time keeps its spacing: a month with no hunting shows as a gap, not as the next month moved up.
 * The server sends only buckets with notes. Stops after `max` buckets.
 */
export function fillBuckets<T extends { start: string }>(rows: readonly T[], bucket: 'week' | 'month', max = 520): Array<T | { start: string; empty: true }> {
  if (rows.length === 0) return [];
  const byStart = new Map(rows.map((row) => [new Date(row.start).getTime(), row]));
  const last = new Date(rows[rows.length - 1]!.start).getTime();
  const filled: Array<T | { start: string; empty: true }> = [];
  for (let at = rows[0]!.start; new Date(at).getTime() <= last && filled.length < max; at = nextBucket(at, bucket)) {
    filled.push(byStart.get(new Date(at).getTime()) ?? { start: at, empty: true });
  }
  return filled;
}
