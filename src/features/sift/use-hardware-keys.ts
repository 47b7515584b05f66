export interface HardwareKeyHandlers {
  onDigit(digit: string): void;
  onDelete(): void;
  onLog(): void;
  onToggleStar(): void;
  onTogglePulled(): void;
  onUndo(): void;
}

export const KEY_HINTS = { star: 'S', pull: 'P', undo: 'U', log: 'Enter', delete: 'Backspace' } as const;

/** Phones and tablets type on the on-screen keypad; a hardware keyboard is a web-only extra. */
export function useHardwareKeys(_handlers: HardwareKeyHandlers, _enabled = true): void {}
