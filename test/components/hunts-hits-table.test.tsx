import { render, screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import type { PatternId } from '@shared/engine';
import type { ScanView } from '@shared/contracts';
import { HitsTable, serialText } from '../../src/features/hunts/components/hits-table';

let counter = 0;
function scan(digits: string, patterns: PatternId[], extra: Partial<ScanView> = {}): ScanView {
  counter += 1;
  return {
    id: `0b3a9d1e-4c5f-4a6b-8c7d-${String(counter).padStart(12, '0')}`,
    huntId: '6f1d3c2a-8b7e-4c1a-9d2e-3f4a5b6c7d8e',
    strap: 1,
    serial: digits,
    digits,
    prefix: '',
    suffix: '',
    star: false,
    district: null,
    pulled: false,
    patterns,
    points: 2.5,
    keep: false,
    scannedAt: '2026-03-02T15:04:00.000Z',
    entryMethod: 'keypad',
    cameraConfidence: null,
    starRunSize: null,
    loggedBy: { id: '1c2d3e4f-5a6b-4c7d-8e9f-0a1b2c3d4e5f', displayName: 'Ada Vell' },
    ...extra,
  };
}

const hits = [
  scan('12344321', ['radar'], { prefix: 'MB', suffix: 'A', strap: 3, pulled: true, points: 4.2 }),
  scan('55155155', ['binary', 'radar'], { star: true, prefix: 'ML', strap: 2, keep: true, loggedBy: { id: '2c2d3e4f-5a6b-4c7d-8e9f-0a1b2c3d4e5f', displayName: 'Tomas Reed' } }),
];

describe('the hits table', () => {
  it('when a serial has letters or a star, then it is written as on the note', () => {
    expect(serialText(hits[0]!)).toBe('MB 12344321 A');
    expect(serialText(hits[1]!)).toBe('ML 55155155 ★');
  });

  it('when shown on a wide screen, then each hit is a row with its serial, pattern badges, points, strap and fate', () => {
    render(<HitsTable hits={hits} wide showLoggedBy={false} />);
    const table = screen.getByRole('table', { name: 'Finds, 2 notes' });
    expect(within(table).getAllByRole('columnheader').map((cell) => cell.textContent)).toEqual(['Serial', 'Patterns', 'Points', 'Strap', 'Kept', 'When']);
    const [, first, second] = within(table).getAllByRole('row');
    const firstCells = within(first!).getAllByRole('cell').map((cell) => cell.textContent);
    expect(firstCells.slice(0, 5)).toEqual(['MB 12344321 A', 'radar', '4.2', '3', 'pulled']);
    expect(within(second!).getByLabelText('Pattern: binary')).toBeTruthy();
    expect(within(second!).getByLabelText('Pattern: radar')).toBeTruthy();
    expect(within(second!).getByLabelText('Scored as a keeper but left in the strap')).toBeTruthy();
  });

  it('when the hunt has a crew, then the table says who logged each note', () => {
    render(<HitsTable hits={hits} wide showLoggedBy />);
    const table = screen.getByRole('table');
    expect(within(table).getAllByRole('columnheader').map((cell) => cell.textContent)).toContain('Logged by');
    expect(within(table).getByText('Tomas Reed')).toBeTruthy();
  });

  it('when shown on a phone, then each hit is a card in a list with its badges', () => {
    render(<HitsTable hits={hits} wide={false} showLoggedBy />);
    const list = screen.getByRole('list', { name: 'Finds, 2 notes' });
    const items = within(list).getAllByRole('listitem');
    expect(items).toHaveLength(2);
    expect(items[0]!.textContent).toContain('MB 12344321 A');
    expect(items[0]!.textContent).toContain('strap 3');
    expect(within(items[1]!).getByLabelText('Pattern: binary')).toBeTruthy();
    expect(items[1]!.textContent).toContain('Tomas Reed');
  });
});
