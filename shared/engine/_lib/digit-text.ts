/**
 * 8-digit text of a value by joining two cached 4-digit strings: one
 * allocation instead of a number-to-string conversion plus padding, which
 * matters when a reading formats some thirty serials.
 */
let quads: string[] | null = null;

function buildQuads(): string[] {
  const out = new Array<string>(10000);
  for (let i = 0; i < 10000; i++) out[i] = String(i).padStart(4, '0');
  return out;
}

/** 8-digit text of a value 0…99,999,999. */
export function digitText(value: number): string {
  const q = quads ?? (quads = buildQuads());
  const hi = (value / 10000) | 0;
  return q[hi]! + q[value - hi * 10000]!;
}
