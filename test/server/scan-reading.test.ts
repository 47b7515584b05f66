import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { DEFAULT_WEIGHTS, parseWatchPattern, read } from '../../shared/engine';
import type { LowLimit, WatchPattern, WeightTable } from '../../shared/engine';
import { storedReading } from '../../server/features/scans/scan-reading';

const watch = ['0704????', '1000-2000', 'date:1999-12-31', '12??1990', '99990000-99999999'].map((text) => {
  const parsed = parseWatchPattern(text);
  if (!parsed.ok) throw new Error(`fixture ${text}: ${parsed.error.message}`);
  return parsed.pattern;
});

const tables: WeightTable[] = [
  DEFAULT_WEIGHTS,
  ...([9, 99, 9999, 99999] as LowLimit[]).map((lowLimit) => ({ ...DEFAULT_WEIGHTS, lowLimit })),
  {
    patterns: {
      solid: 3, ladder: -2, radar: 7.5, repeater: 0, 'super-repeater': 1, rotator: 2, binary: 6, trinary: 0.5, low: 9, high: -1,
      'super-radar': 2, 'true-binary': 1.5,
    },
    runs: { 3: 1, 5: 4, 8: 10 },
    counts: { 4: 0.25, 6: 3 },
    lowLimit: 9999,
    starBonus: 2.5,
    smallStarRunBonus: 1,
    watchBonus: 4,
    keepThreshold: 3,
  },
];

// Serials a hunter types: bare digits, prefixes, suffixes, stars, spaces and dashes; plus the fancy ones.
const digitRun = fc.oneof(
  fc.integer({ min: 1, max: 99_999_999 }).map((v) => String(v).padStart(8, '0')),
  fc.constantFrom('12121212', '38055083', '00000417', '99995555', '10688901', '77777777', '12345678', '07041776', '12311990', '99999999', '00000009', '19991231'),
  fc.tuple(fc.integer({ min: 0, max: 9 }), fc.integer({ min: 0, max: 9 }), fc.array(fc.boolean(), { minLength: 8, maxLength: 8 })).map(([a, b, picks]) => {
    const text = picks.map((p) => (p ? a : b)).join('');
    return text === '00000000' ? '00000001' : text;
  }),
);
const serialText = fc
  .tuple(digitRun, fc.constantFrom('', 'B', 'MB', 'LG ', 'Z'), fc.constantFrom('', 'A', '*', '★', ' C'), fc.constantFrom('', ' ', '-'))
  .map(([digits, prefix, suffix, sep]) => `${prefix}${digits.slice(0, 4)}${sep}${digits.slice(4)}${suffix}`);
const anyText = fc.oneof(serialText, fc.string({ maxLength: 20 }));

describe('the stored reading of a scan', () => {
  it('when any serial is read for storage, then every stored field equals the engine’s read() with the same table, watch patterns, star and star run', () => {
    const runSizes = fc.constantFrom(null, 320_000, 640_000, 3_200_000);
    fc.assert(
      fc.property(anyText, fc.integer({ min: 0, max: tables.length - 1 }), fc.boolean(), fc.boolean(), runSizes, (text, tableIndex, star, withWatch, starRunSize) => {
        const weights = tables[tableIndex]!;
        const patterns: WatchPattern[] = withWatch ? watch : [];
        const engine = read(text, { weights, watch: patterns, star, starRunSize });
        const stored = storedReading(text, { weights, watch: patterns }, { star, starRunSize });
        if (!engine.ok) {
          expect(stored).toEqual({ ok: false, message: engine.error.message });
          return;
        }
        expect(stored).toEqual({
          ok: true,
          reading: {
            digits: engine.digits,
            value: engine.value,
            prefix: engine.prefix,
            suffix: engine.suffix,
            star: engine.star,
            district: engine.district,
            patterns: engine.patterns,
            points: engine.score.points,
            keep: engine.score.keep,
          },
        });
      }),
      { numRuns: 5000, seed: 20261201 },
    );
  });
});
