import { act, fireEvent, render, screen, within } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import type { StrapRow, StrapSheet } from '@shared/contracts';
import { StrapSheetEditor } from '../../src/features/hunts/components/strap-sheet-editor';
import { parseStrapDraft, previewBack, readWhole } from '../../src/features/hunts/strap-draft';
import { printedStraps, sheetText } from '../../src/features/hunts/sheet-text';
import { ApiError } from '../../src/lib/api/api-error';

function strap(number: number, searched: number, pulled: number, swappedIn = 0, shortOver = 0, note: string | null = null): StrapRow {
  const received = 100 + shortOver;
  const notesBack = received - pulled + swappedIn;
  return {
    number,
    searched,
    pulled,
    swappedIn,
    shortOver,
    received,
    notesBack,
    complete: notesBack === 100,
    fullySearched: searched >= received,
    note,
    firstScanAt: searched ? '2026-03-02T10:00:00.000Z' : null,
    lastScanAt: searched ? '2026-03-02T10:20:00.000Z' : null,
  };
}

function sheetOf(straps: StrapRow[]): StrapSheet {
  return {
    huntId: '6f1d3c2a-8b7e-4c1a-9d2e-3f4a5b6c7d8e',
    title: 'Saturday straps',
    source: 'Larkspur Valley CU',
    denomination: 1,
    plannedStraps: straps.length,
    straps,
    totals: {
      searched: straps.reduce((sum, s) => sum + s.searched, 0),
      pulled: straps.reduce((sum, s) => sum + s.pulled, 0),
      swappedIn: straps.reduce((sum, s) => sum + s.swappedIn, 0),
      notesBack: straps.reduce((sum, s) => sum + s.notesBack, 0),
      completeStraps: straps.filter((s) => s.complete).length,
      straps: straps.length,
    },
  };
}

const sheet = sheetOf([strap(1, 100, 1, 1), strap(2, 100, 2), strap(3, 37, 0)]);

const typeInto = (testId: string, text: string) => fireEvent.change(screen.getByTestId(testId), { target: { value: text } });

describe('the strap sheet editor', () => {
  it('when a sheet is shown on a phone, then each strap says what goes back and whether it is complete', () => {
    render(<StrapSheetEditor sheet={sheet} onSave={vi.fn()} canEdit wide={false} />);
    expect(screen.getByTestId('strap-back-1').textContent).toBe('100');
    expect(screen.getByTestId('strap-back-2').textContent).toBe('98');
    expect(screen.getByLabelText('Strap 1: complete')).toBeTruthy();
    expect(screen.getByLabelText('Strap 2: 2 short')).toBeTruthy();
    expect(screen.getByTestId('strap-totals').textContent).toBe(
      '237 searched · 3 pulled · 1 swapped in · 298 notes back · 2 of 3 straps go back with 100',
    );
  });

  it('when most straps of a hunt are not opened yet, then the closing count says so instead of calling them complete', () => {
    render(<StrapSheetEditor sheet={sheetOf([strap(1, 2, 1), strap(2, 0, 0), strap(3, 0, 0)])} onSave={vi.fn()} canEdit wide={false} />);
    // Strap 1: 100 received, 1 pulled, none swapped in: 99 go back (100-note straps, common practice).
    expect(screen.getByTestId('strap-totals').textContent).toBe(
      '2 searched · 1 pulled · 0 swapped in · 299 notes back · 2 of 3 straps go back with 100 (2 not started)',
    );
  });

  it('when swapped in is typed, then the preview counts the strap before saving, and Save sends the checked numbers', async () => {
    const onSave = vi.fn().mockResolvedValue(undefined);
    render(<StrapSheetEditor sheet={sheet} onSave={onSave} canEdit wide={false} />);
    fireEvent.click(screen.getByLabelText('Edit strap 2'));
    expect(screen.getByTestId('strap-preview-2').textContent).toBe('Goes back with 98 notes: 2 short');
    typeInto('strap-swapped-2', '2');
    expect(screen.getByTestId('strap-preview-2').textContent).toBe('Goes back with 100 notes: complete');
    typeInto('strap-note-2', '  teller recounted ');
    await act(async () => {
      fireEvent.click(screen.getByTestId('strap-save-2'));
    });
    expect(onSave).toHaveBeenCalledWith(2, { swappedIn: 2, shortOver: 0, note: 'teller recounted' });
    expect(screen.queryByTestId('strap-form-2')).toBeNull();
  });

  it('when a count is not a whole number, then the field says so, nothing is sent and the typing stays', () => {
    const onSave = vi.fn();
    render(<StrapSheetEditor sheet={sheet} onSave={onSave} canEdit wide={false} />);
    fireEvent.click(screen.getByLabelText('Edit strap 2'));
    typeInto('strap-swapped-2', '2.5');
    typeInto('strap-short-over-2', '-101');
    fireEvent.click(screen.getByTestId('strap-save-2'));
    expect(onSave).not.toHaveBeenCalled();
    expect(screen.getByText('Swapped in must be a whole number')).toBeTruthy();
    expect(screen.getByText('Short or over must be at least −100')).toBeTruthy();
    expect((screen.getByTestId('strap-swapped-2') as HTMLInputElement).value).toBe('2.5');
  });

  it('when the server refuses the change, then its message shows and the form keeps what was typed', async () => {
    const onSave = vi.fn().mockRejectedValue(new ApiError(400, 'invalid', 'Some fields need attention', { swappedIn: 'must be at most 100' }));
    render(<StrapSheetEditor sheet={sheet} onSave={onSave} canEdit wide={false} />);
    fireEvent.click(screen.getByLabelText('Edit strap 1'));
    typeInto('strap-swapped-1', '7');
    await act(async () => {
      fireEvent.click(screen.getByTestId('strap-save-1'));
    });
    expect(screen.getByText('Some fields need attention')).toBeTruthy();
    expect(screen.getByText('Swapped in must be at most 100')).toBeTruthy();
    expect((screen.getByTestId('strap-swapped-1') as HTMLInputElement).value).toBe('7');
  });

  it('when the steppers are pressed, then short/over keeps its sign and swapped in never goes below zero', () => {
    render(<StrapSheetEditor sheet={sheet} onSave={vi.fn()} canEdit wide={false} />);
    fireEvent.click(screen.getByLabelText('Edit strap 3'));
    fireEvent.click(screen.getByLabelText('Short or over: one less'));
    fireEvent.click(screen.getByLabelText('Short or over: one less'));
    expect((screen.getByTestId('strap-short-over-3') as HTMLInputElement).value).toBe('−2');
    fireEvent.click(screen.getByLabelText('Swapped in: one less'));
    expect((screen.getByTestId('strap-swapped-3') as HTMLInputElement).value).toBe('0');
    expect(screen.getByTestId('strap-preview-3').textContent).toBe('Goes back with 98 notes: 2 short');
  });

  it('when shown on a wide screen, then it is a table a screen reader can walk by column', () => {
    render(<StrapSheetEditor sheet={sheet} onSave={vi.fn()} canEdit wide />);
    const table = screen.getByRole('table', { name: 'Strap sheet, 3 straps' });
    const headers = within(table).getAllByRole('columnheader').map((cell) => cell.textContent);
    expect(headers).toEqual(['Strap', 'Searched', 'Pulled', 'Swapped in', 'Short/over', 'Goes back', 'State', 'Note']);
    const rows = within(table).getAllByRole('row');
    expect(rows).toHaveLength(4);
    expect(within(rows[2]!).getAllByRole('cell').map((cell) => cell.textContent).slice(0, 6)).toEqual(['2', '100 / 100', '2', '0', '0', '98']);
  });

  it('when the reader may not edit, then no strap has an Edit button', () => {
    render(<StrapSheetEditor sheet={sheet} onSave={vi.fn()} canEdit={false} wide />);
    expect(screen.queryByText('Edit')).toBeNull();
  });

  it('when most straps are not started, then they fold away until asked for', () => {
    const long = sheetOf([strap(1, 100, 0), ...Array.from({ length: 9 }, (_, i) => strap(i + 2, 0, 0))]);
    render(<StrapSheetEditor sheet={long} onSave={vi.fn()} canEdit wide={false} />);
    expect(screen.queryByTestId('strap-row-2')).toBeNull();
    fireEvent.click(screen.getByTestId('strap-show-all'));
    expect(screen.getByTestId('strap-row-10')).toBeTruthy();
  });
});

describe('strap drafts', () => {
  it('reads whole numbers as people type them, with either minus sign', () => {
    expect([readWhole(' 4 '), readWhole('+2'), readWhole('−3'), readWhole('-3'), readWhole('')]).toEqual([4, 2, -3, -3, Number.NaN]);
    expect(readWhole('1e2')).toBeNaN();
  });

  it('checks against the shared contract, field by field', () => {
    expect(parseStrapDraft({ swappedIn: '101', shortOver: '0', note: '' })).toEqual({ ok: false, errors: { swappedIn: 'must be at most 100' } });
    expect(parseStrapDraft({ swappedIn: '3', shortOver: '+1', note: '' })).toEqual({ ok: true, body: { swappedIn: 3, shortOver: 1, note: null } });
  });

  it('previews 100 + short/over − pulled + swapped in', () => {
    expect(previewBack({ pulled: 3 }, { swappedIn: '2', shortOver: '+1', note: '' })).toEqual({ received: 101, notesBack: 100, complete: true });
    expect(previewBack({ pulled: 3 }, { swappedIn: 'x', shortOver: '0', note: '' })).toBeNull();
  });
});

describe('the printed strap sheet', () => {
  it('lists the straps going back with their counts and no dollar amounts or serials', () => {
    const text = sheetText(sheetOf([strap(1, 100, 1, 1), strap(2, 100, 2), strap(3, 0, 0)]), '2026-03-02T15:00:00.000Z');
    expect(printedStraps(sheetOf([strap(1, 100, 1, 1), strap(2, 0, 0)])).map((row) => row.number)).toEqual([1]);
    expect(text).toContain('    1       100       1           1        100  complete');
    expect(text).toContain('    2       100       2           0         98');
    expect(text).not.toContain('    3 ');
    expect(text).toContain('2 straps · 198 notes back · 1 complete');
    expect(text).toContain("Teller's initials: ________");
    // Only the face value is named; no sum of money appears.
    expect(text.match(/\$\d+/g)).toEqual(['$1']);
  });
});
