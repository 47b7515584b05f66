import Papa from 'papaparse';
import { fireEvent, render, screen, within } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { PATTERN_IDS, parseSerial, sweep, type ParsedSerial } from '@shared/engine';
import { SweepForm } from '../../src/features/sweep/components/sweep-form';
import { SweepResults, sweepHeadline } from '../../src/features/sweep/components/sweep-results';
import { sweepCsv, sweepFileName } from '../../src/features/sweep/sweep-csv';
import { parseSweepInput, position, readCount } from '../../src/features/sweep/sweep-input';

const typeInto = (testId: string, text: string) => fireEvent.change(screen.getByTestId(testId), { target: { value: text } });
const parsed = (text: string) => parseSerial(text) as ParsedSerial;

describe('the sweep form', () => {
  it('when the serial is not one, then the engine says why under the field and nothing runs', () => {
    const onSweep = vi.fn();
    render(<SweepForm onSweep={onSweep} />);
    typeInto('sweep-serial', '1234 567');
    fireEvent.click(screen.getByTestId('sweep-run'));
    expect(onSweep).not.toHaveBeenCalled();
    expect(screen.getByText('First serial A serial has 8 digits; this has 7.')).toBeTruthy();
    expect((screen.getByTestId('sweep-serial') as HTMLInputElement).value).toBe('1234 567');
  });

  it('when the count is past ten million or not a number, then the count field says so', () => {
    render(<SweepForm onSweep={vi.fn()} initialSerial="12345600" />);
    typeInto('sweep-count', '10,000,001');
    fireEvent.click(screen.getByTestId('sweep-run'));
    expect(screen.getByText('Notes in sequence A sweep covers at most 10,000,000 notes at once.')).toBeTruthy();
    typeInto('sweep-count', 'a brick');
    fireEvent.click(screen.getByTestId('sweep-run'));
    expect(screen.getByText('Notes in sequence The count is a whole number of notes, such as 100 or 4,000.')).toBeTruthy();
  });

  it('when the brick preset is chosen, then the count becomes 4000 and the sweep gets the parsed serial', () => {
    const onSweep = vi.fn();
    render(<SweepForm onSweep={onSweep} />);
    typeInto('sweep-serial', 'mb 1234 5600 a');
    fireEvent.click(screen.getByLabelText('How many: Brick · 4,000'));
    expect((screen.getByTestId('sweep-count') as HTMLInputElement).value).toBe('4000');
    fireEvent.click(screen.getByLabelText('Look for: low serial'));
    fireEvent.click(screen.getByTestId('sweep-run'));
    const request = onSweep.mock.calls[0]![0];
    expect(request.count).toBe(4000);
    expect(request.serial).toMatchObject({ digits: '12345600', prefix: 'MB', suffix: 'A', value: 12345600 });
    expect(request.patterns).not.toContain('low');
    expect(request.patterns).toHaveLength(PATTERN_IDS.length - 1);
  });

  it('when a count is typed by hand, then the matching preset lights up', () => {
    render(<SweepForm onSweep={vi.fn()} />);
    typeInto('sweep-count', '1,000');
    expect(screen.getByLabelText('How many: Bundle · 1,000').getAttribute('aria-checked')).toBe('true');
    typeInto('sweep-count', '250');
    expect(screen.getByLabelText('How many: Other').getAttribute('aria-checked')).toBe('true');
  });

  it('when every pattern is switched off, then it asks for one', () => {
    const onSweep = vi.fn();
    render(<SweepForm onSweep={onSweep} initialSerial="12345600" />);
    for (const box of within(screen.getByTestId('sweep-patterns')).getAllByRole('checkbox')) fireEvent.click(box);
    fireEvent.click(screen.getByTestId('sweep-run'));
    expect(onSweep).not.toHaveBeenCalled();
    expect(screen.getByText('Pick at least one pattern to look for.')).toBeTruthy();
  });
});

describe('sweep input', () => {
  it('reads counts written with separators', () => {
    expect([readCount('4,000'), readCount('10 000 000'), readCount('4000'), readCount('4.5'), readCount('-3')]).toEqual([4000, 10_000_000, 4000, NaN, NaN]);
  });

  it('places a hit by notes away, strap and note in strap', () => {
    expect(position(12345742, 12345600)).toEqual({ away: 142, strap: 2, inStrap: 43 });
    expect(position(12345600, 12345600)).toEqual({ away: 0, strap: 1, inStrap: 1 });
  });

  it('refuses a zero count', () => {
    expect(parseSweepInput('12345600', '0', ['radar'])).toEqual({ ok: false, errors: { count: 'The count is at least 1 note.' } });
  });
});

describe('the sweep results', () => {
  // Worked out by hand from the definitions: in 11111100…11111199, 111111dd is binary (exactly two
  // distinct digits) when dd is 1x or x1 with x ≠ 1, or xx with x ≠ 1; 11111111 is solid, not binary.
  const result = sweep('11111100', 100, ['solid', 'binary']);

  it('when a strap is swept, then each hit shows how many notes from the first it sits', () => {
    render(<SweepResults result={result} serial={parsed('11111100')} wide={false} />);
    expect(screen.getByTestId('sweep-headline').textContent).toBe(sweepHeadline(result));
    // 10…19 minus 11 (9), x1 for x ≠ 1 (9), xx for x ≠ 1 (9), and the solid: 28.
    expect(sweepHeadline(result)).toBe('28 finds in 100 notes, 11111100 to 11111199');
    const table = screen.getByRole('table');
    const solid = within(table).getAllByRole('row').find((row) => row.textContent?.startsWith('11111111'));
    expect(within(solid!).getAllByRole('cell').map((cell) => cell.textContent)).toEqual(['11111111', '11', 'solid']);
  });

  it('when the hits are exported, then the CSV has one line a hit with notes away, strap and patterns', () => {
    const csv = sweepCsv(sweep('12344300', 100, ['radar']), parsed('MB 12344300 A'));
    expect(csv).toBe('serial,digits,notes_away,strap,note_in_strap,patterns\r\nMB 12344321 A,12344321,21,1,22,radar\r\n');
    expect(sweepFileName(sweep('00000777', 4000, ['low']))).toBe('strapsift-sweep-00000777-4000.csv');
  });

  it('when the CSV is read back by papaparse, then every find comes back cell for cell, leading zeros kept', () => {
    const result = sweep('00000001', 1000, ['low', 'solid'], { lowLimit: 99 });
    const rows = Papa.parse<string[]>(sweepCsv(result, parsed('00000001')), { skipEmptyLines: true }).data;
    expect(rows).toHaveLength(result.hits.length + 1);
    expect(rows[1]).toEqual(['00000001', '00000001', '0', '1', '1', 'low serial']);
    expect(rows.slice(1).map((row) => row[1])).toEqual(result.hits.map((hit) => hit.serial));
  });

  it('when there are more hits than a page, then it pages through them', () => {
    const many = sweep('00000001', 1000, ['low'], { lowLimit: 999 });
    render(<SweepResults result={many} serial={parsed('00000001')} wide />);
    expect(screen.getByTestId('sweep-page').textContent).toBe('Finds 1–100 of 999');
    const firstRows = within(screen.getByRole('table')).getAllByRole('row');
    expect(firstRows).toHaveLength(101);
    fireEvent.click(screen.getByTestId('sweep-next'));
    expect(screen.getByTestId('sweep-page').textContent).toBe('Finds 101–200 of 999');
    const row = within(screen.getByRole('table')).getAllByRole('row')[1]!;
    expect(within(row).getAllByRole('cell').map((cell) => cell.textContent)).toEqual(['00000101', '100', '2 · 1', 'low serial']);
  });
});
