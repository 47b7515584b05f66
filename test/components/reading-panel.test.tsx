import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { DEFAULT_WEIGHTS, read } from '../../shared/engine';
import { ReadingPanel } from '../../src/features/sift/components/reading-panel';

describe('the reading panel', () => {
  it('when a radar is read, then it shows the radar badge, the score and a keep suggestion', () => {
    const reading = read('12344321', { weights: DEFAULT_WEIGHTS });
    render(<ReadingPanel digits="12344321" reading={reading} weights={DEFAULT_WEIGHTS} />);
    expect(screen.getByLabelText('Pattern: radar')).toBeTruthy();
    expect(screen.getByTestId('reading-verdict').textContent).toContain('radar');
    const expectedPoints = reading.ok ? reading.score.points : NaN;
    expect(screen.getByTestId('reading-score').getAttribute('aria-label')).toContain(`${expectedPoints} points, keep it`);
  });

  it('when a serial is one digit from a binary, then the near-miss line names the digit to change', () => {
    // 55155516: changing the 8th digit to 5 (or 1) would make a binary.
    const reading = read('55155516', { weights: DEFAULT_WEIGHTS });
    render(<ReadingPanel digits="55155516" reading={reading} weights={DEFAULT_WEIGHTS} />);
    const misses = screen.getByTestId('reading-near-misses').textContent ?? '';
    expect(misses).toMatch(/one digit from a binary: 8th → [15]/);
  });

  it('when a note has no pattern, then it reads as ordinary and is not suggested as a keeper', () => {
    const reading = read('31740598', { weights: DEFAULT_WEIGHTS });
    render(<ReadingPanel digits="31740598" reading={reading} weights={DEFAULT_WEIGHTS} />);
    expect(screen.getByTestId('reading-verdict').textContent).toBe('An ordinary note');
    expect(screen.getByTestId('reading-score').getAttribute('aria-label')).toContain('back in the strap');
  });

  it('when only some digits are typed, then it lists the patterns still possible', () => {
    render(<ReadingPanel digits="0000" reading={null} weights={DEFAULT_WEIGHTS} />);
    const panel = screen.getByTestId('reading-panel').textContent ?? '';
    expect(panel).toContain('4 MORE DIGITS');
    expect(panel).toContain('solid');
    expect(panel).toContain('low');
    expect(panel).not.toContain('ladder');
  });

  it('when the typed text is not a serial, then it says why in words', () => {
    const reading = read('00000000');
    render(<ReadingPanel digits="00000000" reading={reading} weights={DEFAULT_WEIGHTS} />);
    expect(screen.getByRole('alert').textContent).toContain('NOT A SERIAL');
  });
});
