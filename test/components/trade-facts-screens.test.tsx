import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { DEFAULT_WEIGHTS, read } from '@shared/engine';
import { GradePicker } from '../../src/features/keepers/components/grade-picker';
import { PHOTO_CAUTION } from '../../src/features/keepers/photo-caution';
import { RarityTable } from '../../src/features/odds/components/rarity-table';
import { ReadingPanel } from '../../src/features/sift/components/reading-panel';
import { parseStarRun } from '../../src/features/sift/components/star-run-field';

const noWeight = () => undefined;

describe('trade facts on screen', () => {
  it('when a grade of 65 is chosen, then the picker names its band: Gem Uncirculated, not just "Unc" (TRADE.md grading)', () => {
    render(<GradePicker value="65" onChange={() => undefined} />);
    expect(screen.getByTestId('grade-band').textContent).toBe('Gem Uncirculated (65–66)');
  });

  it('when the rarity table counts to the $1–$20 run end, then it says which serials it counts and that many sellers call only true binaries "binary"', () => {
    const { container } = render(<RarityTable lowLimit={999} weightOf={noWeight} domainLast={96_000_000} />);
    // The note under the table sits outside the table's role (a table holds only rows), so read the whole card.
    const table = container.textContent ?? '';
    expect(table).toContain('exact over the 96,000,000 serials 00000001–96000000');
    expect(table).toContain('Many sellers call only true binaries');
    expect(table).toContain('true binary');
    expect(table).toContain('super radar');
  });

  it('when a phone shows the reading of a $1 note above its run end, then the warning shows even in the short reading', () => {
    const reading = read('97000001', { denomination: 1 });
    render(<ReadingPanel digits="97000001" reading={reading} weights={DEFAULT_WEIGHTS} compact />);
    expect(screen.getByTestId('reading-trade').textContent).toContain('Above 96,000,000');
  });

  it('when a star note has no run size recorded, then the score does not just say "back in the strap"', () => {
    const reading = read('B 1234 5679 *');
    render(<ReadingPanel digits="12345679" reading={reading} weights={DEFAULT_WEIGHTS} compact />);
    expect(screen.getByTestId('reading-score').getAttribute('aria-label')).toContain('look up its star run');
  });

  it('when a run size is typed, then separators are allowed and anything else is refused', () => {
    expect(parseStarRun('640,000')).toBe(640_000);
    expect(parseStarRun(' 3 200 000 ')).toBe(3_200_000);
    expect(parseStarRun('')).toBeNull();
    expect(parseStarRun('lots')).toBeNull();
    expect(parseStarRun('0')).toBeNull();
  });

  it('when the photo caution is read, then it names 31 CFR Part 411 and 18 U.S.C. § 504 with their conditions (TRADE.md cautions)', () => {
    for (const part of ['31 CFR Part 411', '18 U.S.C. § 504', 'one-sided', 'under 75% or over 150%', 'Follow local law']) {
      expect(PHOTO_CAUTION).toContain(part);
    }
  });
});
