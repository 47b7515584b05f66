import { render, screen, within } from '@testing-library/react';
import { createElement, type ReactNode } from 'react';
import { describe, expect, it, vi } from 'vitest';
import { expectedHits, PATTERN_IDS, PATTERN_NAMES, EXPECTED_CAVEAT, type PatternId } from '@shared/engine';
import type { TallyPatternRow } from '@shared/contracts';
import { ChanceSection, chanceSummary } from '../../src/features/tally/components/chance-section';
import { RateSection, rateSummary, type RateRow } from '../../src/features/tally/components/rate-section';
import { formatChance, formatExpected, formatRate, luck, verdict } from '../../src/features/tally/format';
import { bucketLabel, fillBuckets, parseCustomPeriod, presetFrom } from '../../src/features/tally/period';

// react-native-svg's CommonJS build requires react-native itself, which Node cannot load outside
// Metro, and the components project does not inline it. The charts' own geometry is what these tests
// check, so the library's elements are stood in for by the plain SVG elements they render on the web.
vi.mock('react-native-svg', () => {
  const element =
    (tag: string) =>
    ({ children, accessibilityElementsHidden: _hidden, importantForAccessibility: _important, ...props }: Record<string, unknown> & { children?: ReactNode }) =>
      createElement(tag, props, children);
  return { default: element('svg'), Svg: element('svg'), Rect: element('rect'), Line: element('line'), Text: element('text') };
});

/** Figures as the server builds them: the engine's expected hits for the actual counts given. */
function figures(notes: number, found: Partial<Record<PatternId, number>>) {
  // The server counts every pattern, so a pattern not named was found 0 times.
  const actual = Object.fromEntries(PATTERN_IDS.map((id) => [id, found[id] ?? 0])) as Record<PatternId, number>;
  const expected = expectedHits(notes, actual);
  const patterns: TallyPatternRow[] = expected.rows.map((row) => ({
    id: row.id,
    name: PATTERN_NAMES[row.id],
    hits: actual[row.id] ?? 0,
    perThousand: ((actual[row.id] ?? 0) * 1000) / notes,
    probability: row.probability,
    expected: row.expected,
    pAtLeast: row.pAtLeast ?? 1,
    pAtMost: row.pAtMost ?? 1,
    verdict: row.verdict ?? 'no-comparison',
  }));
  return { notes, patterns, basis: 'poisson' as const, caveat: expected.caveat };
}

describe('the per-pattern chart against chance', () => {
  // 4,000 notes expect 4000 × 695,520 / 99,999,999 ≈ 27.8 trinaries (TRADE.md count) and 0.46 binaries.
  const data = figures(4000, { trinary: 30, binary: 4, radar: 0 });

  it('when shown, then the table beside it gives found, per 1,000, expected and the chance of that many', () => {
    render(<ChanceSection figures={data} wide testID="chance" />);
    const table = screen.getByTestId('chance-table');
    const rows = within(table).getAllByRole('row');
    expect(rows).toHaveLength(1 + PATTERN_IDS.length);
    const trinary = rows.find((row) => row.textContent?.startsWith('trinary'))!;
    const cells = within(trinary).getAllByRole('cell').map((cell) => cell.textContent);
    expect(cells[0]).toBe('trinary');
    expect(cells[1]).toBe('30');
    expect(cells[2]).toBe('7.5');
    expect(cells[3]).toBe('27.8');
    // P(X ≥ 30) for a Poisson mean of 27.82 is 0.3644 (Python's math module): about chance.
    expect(cells[4]).toBe('36%at least 30: about chance');
    const binary = rows.find((row) => row.textContent?.startsWith('binary'))!;
    // Radar: none found where 0.4 are expected: P(0) = e^−0.4 = 0.67, so no count this low could stand out.
    const radar = rows.find((row) => row.textContent?.startsWith('radar'))!;
    expect(within(radar).getAllByRole('cell').map((cell) => cell.textContent).slice(3)).toEqual([
      '0.4',
      '—no comparison: chance alone often gives this',
    ]);
    // Four binaries where 4000 × 11,430 / 99,999,999 = 0.4572 are expected: P(X ≥ 4) = 1 − Σ₀³ e^−λ λ^k / k!
    // = 0.0012665 (worked in Python's math module), 1 in 790.
    expect(within(binary).getAllByRole('cell').map((cell) => cell.textContent)).toEqual(['binary', '4', '1', '0.46', '1 in 790at least 4: more than chance']);
  });

  it('when shown, then the drawing is summed up in words and the caveat about sequential straps is there', () => {
    render(<ChanceSection figures={data} wide={false} testID="chance" />);
    const chart = screen.getByRole('img');
    expect(chart.getAttribute('aria-label')).toBe(
      'Finds against the finds expected by chance in 4,000 notes. More than chance: binary.',
    );
    // 100 notes with no finds: the likeliest pattern, trinary, expects 0.7, and P(X = 0) ≈ 0.5: no comparison.
    expect(chanceSummary(figures(100, {}))).toBe('Finds against the finds expected by chance in 100 notes. Every pattern is about what chance predicts.');
    // 1,000 notes with no trinary where 6.96 are expected: P(X = 0) = e^−6.96 ≈ 0.00095, a picked-over bank.
    expect(chanceSummary(figures(1000, {}))).toBe('Finds against the finds expected by chance in 1,000 notes. Fewer than chance: trinary.');
    expect(screen.getByText(EXPECTED_CAVEAT)).toBeTruthy();
    // One row per pattern, each with its found and expected figures printed beside the bars.
    expect(screen.getByText('30 / 27.8')).toBeTruthy();
  });

  it('when no notes were logged, then it says so instead of drawing zeros', () => {
    render(<ChanceSection figures={{ notes: 0, patterns: [], caveat: EXPECTED_CAVEAT }} wide />);
    expect(screen.getByText('No notes logged yet, so there is nothing to set against chance.')).toBeTruthy();
  });
});

describe('the hits-per-1,000 bar chart', () => {
  const rows: RateRow[] = [
    { key: 'a', label: 'Mar 2', name: 'Week of Mar 2', notes: 2000, hits: 18, perThousand: 9 },
    { key: 'b', label: 'Mar 9', name: 'Week of Mar 9', notes: 1000, hits: 4, perThousand: 4 },
    { key: 'c', label: 'Mar 16', name: 'Week of Mar 16', notes: 4000, hits: 26, perThousand: 6.5 },
  ];

  it('when drawn, then it has one bar per row, the average line, and the same numbers in a table', () => {
    const { container } = render(<RateSection what="weeks" firstHeader="Week" rows={rows} average={48 / 7} wide testID="rate" />);
    const chart = screen.getByTestId('rate-chart');
    // Three bars: the only rects the chart draws.
    expect(chart.querySelectorAll('rect')).toHaveLength(3);
    expect(chart.textContent).toContain('average 6.86');
    const table = within(container).getByRole('table');
    expect(within(table).getAllByRole('row').map((row) => Array.from(row.children).map((cell) => cell.textContent))).toEqual([
      ['Week', 'Notes', 'Finds', 'Per 1,000'],
      ['Week of Mar 2', '2,000', '18', '9'],
      ['Week of Mar 9', '1,000', '4', '4'],
      ['Week of Mar 16', '4,000', '26', '6.5'],
    ]);
  });

  it('when read by a screen reader, then the chart names its highest and lowest rows', () => {
    expect(rateSummary('weeks', rows, 48 / 7)).toBe(
      'Finds per 1,000 notes for 3 weeks. Highest: Week of Mar 2, 9. Lowest: Week of Mar 9, 4. Average over the period: 6.86.',
    );
    render(<RateSection what="weeks" firstHeader="Week" rows={rows} average={48 / 7} wide={false} testID="rate" />);
    expect(screen.getByTestId('rate-chart').getAttribute('aria-label')).toBe(rateSummary('weeks', rows, 48 / 7));
  });

  it('when the bars are drawn, then their heights follow the values', () => {
    render(<RateSection what="weeks" firstHeader="Week" rows={rows} average={0} wide testID="rate" />);
    const heights = Array.from(screen.getByTestId('rate-chart').querySelectorAll('rect')).map((rect) => Number(rect.getAttribute('height')));
    expect(heights[0]! / heights[1]!).toBeCloseTo(9 / 4, 5);
    expect(heights[2]! / heights[1]!).toBeCloseTo(6.5 / 4, 5);
  });
});

describe('tally numbers', () => {
  it('formats chances, expected counts and rates for reading', () => {
    expect([formatChance(0.9999), formatChance(0.3234), formatChance(0.041), formatChance(0.0008), formatChance(1 / 517_909_616), formatChance(1e-12)]).toEqual([
      '100%',
      '32%',
      '4.1%',
      '1 in 1,250',
      '1 in 518 million',
      'under 1 in a billion',
    ]);
    expect([formatExpected(0), formatExpected(0.00000036), formatExpected(0.000361), formatExpected(0.4572), formatExpected(27.82), formatExpected(1234.5)]).toEqual([
      '0',
      '<\u00a00.0001',
      '0.00036',
      '0.46',
      '27.8',
      '1,235',
    ]);
    expect(formatRate(7.254)).toBe('7.25');
  });

  /**
   * A row as the server builds it for circulated notes: the engine's Poisson tails and verdict. The mean is
   * reached through solids (9 in 99,999,999), whose expected count is notes × 9 ÷ 99,999,999.
   */
  function poissonRow(hits: number, expected: number) {
    const notes = Math.round((expected * 99_999_999) / 9);
    const r = expectedHits(notes, { solid: hits }).rows[0]!;
    return { hits, expected: r.expected, pAtLeast: r.pAtLeast!, pAtMost: r.pAtMost!, verdict: r.verdict! };
  }

  it('gives the chance by luck in the direction of the miss', () => {
    expect(luck({ hits: 4, expected: 0.4572, pAtLeast: 0.0012665, pAtMost: 0.9999, verdict: 'more' })).toEqual({ p: 0.0012665, direction: 'at least' });
    // One trinary where 9.7 are expected: P(X ≤ 1) = e^−9.7 (1 + 9.7) = 0.000656 (Python's math module).
    const low = luck(poissonRow(1, 9.7))!;
    expect(low.direction).toBe('at most');
    expect(low.p).toBeCloseTo(0.0006557, 6);
    expect(luck(poissonRow(0, 0.00013))).toBeNull();
  });

  it('takes the server’s verdict: more or fewer only when chance makes the count unlikely, and no comparison where none can be made', () => {
    expect(verdict(poissonRow(4, 0.457))).toBe('more');
    expect(verdict(poissonRow(30, 27.8))).toBe('as-chance');
    // 10 where 27.8 are expected: P(X ≤ 10) = 0.0000976 (Python's math module).
    expect(verdict(poissonRow(10, 27.8))).toBe('fewer');
    // None where 0.46 are expected: P(0) = e^−0.46 = 0.63, so "fewer" could never be said.
    expect(verdict(poissonRow(0, 0.46))).toBe('no-comparison');
  });

  it('checks typed dates and names the buckets in UTC', () => {
    expect(parseCustomPeriod('2026-03-01', '2026-02-01')).toEqual({ ok: false, errors: { to: 'must not be before From' } });
    expect(parseCustomPeriod('2026-02-30', '')).toEqual({ ok: false, errors: { from: 'must be a date written 2026-03-01' } });
    expect(parseCustomPeriod(' 2026-01-01 ', '')).toEqual({ ok: true, from: '2026-01-01', to: undefined });
    expect(presetFrom('4w', new Date('2026-03-28T12:00:00Z'))).toBe('2026-03-01');
    expect(presetFrom('all')).toBeUndefined();
    expect(bucketLabel('2026-03-02T00:00:00.000Z', 'week')).toBe('Mar 2');
    expect(bucketLabel('2026-03-01T00:00:00.000Z', 'month')).toBe('Mar 2026');
    expect(bucketLabel('2026-03-01T00:00:00.000Z', 'month', true)).toBe('Mar 26');
  });

  it('keeps empty weeks and months as gaps between buckets with notes', () => {
    const weeks = fillBuckets([{ start: '2026-09-28T00:00:00.000Z' }, { start: '2026-10-12T00:00:00.000Z' }], 'week');
    expect(weeks).toEqual([
      { start: '2026-09-28T00:00:00.000Z' },
      { start: '2026-10-05T00:00:00.000Z', empty: true },
      { start: '2026-10-12T00:00:00.000Z' },
    ]);
    const months = fillBuckets([{ start: '2026-11-01T00:00:00.000Z' }, { start: '2027-02-01T00:00:00.000Z' }], 'month');
    expect(months.map((row) => row.start.slice(0, 7))).toEqual(['2026-11', '2026-12', '2027-01', '2027-02']);
    expect(fillBuckets([], 'week')).toEqual([]);
  });
});
