import { fireEvent, render, screen } from '@testing-library/react';
import { useReducer } from 'react';
import { describe, expect, it, vi } from 'vitest';
import { Keypad } from '../../src/features/sift/components/keypad';
import { emptyEntry, entryReducer } from '../../src/features/sift/serial-entry';

function Harness({ onLog }: { onLog: (digits: string) => void }) {
  const [entry, dispatch] = useReducer(entryReducer, emptyEntry);
  return (
    <>
      <output data-testid="typed">{`${entry.digits}|${entry.star ? 'star' : ''}|${entry.pulled ? 'pulled' : ''}`}</output>
      <Keypad
        onDigit={(digit) => dispatch({ type: 'digit', digit })}
        onDelete={() => dispatch({ type: 'delete' })}
        onLog={() => onLog(entry.digits)}
        onToggleStar={() => dispatch({ type: 'toggle-star' })}
        onTogglePulled={() => dispatch({ type: 'toggle-pulled' })}
        star={entry.star}
        pulled={entry.pulled}
        canLog={entry.digits.length === 8}
        canDelete={entry.digits.length > 0}
        showShortcuts
      />
    </>
  );
}

const press = (label: string) => fireEvent.click(screen.getByLabelText(label));

describe('the Sift keypad', () => {
  it('when eight digit keys are pressed, then the serial is typed and Log becomes available', () => {
    const onLog = vi.fn();
    render(<Harness onLog={onLog} />);
    expect(screen.getByLabelText('Log note and start the next').getAttribute('aria-disabled')).toBe('true');
    for (const digit of '12344321') press(`Digit ${digit}`);
    expect(screen.getByTestId('typed').textContent).toBe('12344321||');
    press('Log note and start the next');
    expect(onLog).toHaveBeenCalledWith('12344321');
  });

  it('when a ninth digit is pressed, then it is ignored', () => {
    render(<Harness onLog={() => undefined} />);
    for (const digit of '123456789') press(`Digit ${digit}`);
    expect(screen.getByTestId('typed').textContent).toBe('12345678||');
  });

  it('when delete is pressed, then the last digit goes; with nothing typed, delete is disabled', () => {
    render(<Harness onLog={() => undefined} />);
    expect(screen.getByLabelText('Delete last digit').getAttribute('aria-disabled')).toBe('true');
    press('Digit 4');
    press('Digit 2');
    press('Delete last digit');
    expect(screen.getByTestId('typed').textContent).toBe('4||');
  });

  it('when star and pull are toggled, then their labels say their state for screen readers', () => {
    render(<Harness onLog={() => undefined} />);
    press('Star note: off');
    press('Pull this note: off');
    expect(screen.getByLabelText('Star note: on')).toBeTruthy();
    expect(screen.getByLabelText('Pull this note: on')).toBeTruthy();
    expect(screen.getByTestId('typed').textContent).toBe('|star|pulled');
  });

  it('when the keys are measured, then every key is at least 56 px tall (product brief: thumb-sized keys)', () => {
    render(<Harness onLog={() => undefined} />);
    for (const key of screen.getAllByRole('button')) {
      const minHeight = Number.parseFloat(getComputedStyle(key).minHeight);
      expect(minHeight).toBeGreaterThanOrEqual(56);
    }
  });
});
