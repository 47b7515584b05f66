export { formatCents } from './format';

/** "12.5", "$1,200", "7" → cents; null for empty; an error message for anything else. */
export function parseDollars(text: string): { ok: true; cents: number | null } | { ok: false; error: string } {
  const cleaned = text.trim().replace(/^\$/, '').replace(/,/g, '');
  if (cleaned === '') return { ok: true, cents: null };
  if (!/^\d{1,8}(\.\d{0,2})?$/.test(cleaned)) return { ok: false, error: 'must be dollars and cents, e.g. 12.50' };
  const [whole, fraction = ''] = cleaned.split('.');
  return { ok: true, cents: Number(whole) * 100 + Number(fraction.padEnd(2, '0')) };
}

export function centsToInput(cents: number | null | undefined): string {
  return cents == null ? '' : (cents / 100).toFixed(2);
}
