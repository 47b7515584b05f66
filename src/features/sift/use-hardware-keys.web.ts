import { useEffect, useRef } from 'react';

export interface HardwareKeyHandlers {
  onDigit(digit: string): void;
  onDelete(): void;
  onLog(): void;
  onToggleStar(): void;
  onTogglePulled(): void;
  onUndo(): void;
}

/** Keys of a desk keyboard, shown on the keypad: digits, Backspace, Enter, S for star, P for pull, U to undo. */
export const KEY_HINTS = { star: 'S', pull: 'P', undo: 'U', log: 'Enter', delete: 'Backspace' } as const;

function typingInAField(target: EventTarget | null): boolean {
  const element = target as HTMLElement | null;
  if (!element) return false;
  const tag = element.tagName;
  return tag === 'INPUT' || tag === 'TEXTAREA' || tag === 'SELECT' || element.isContentEditable;
}

/** Listens on the whole page while Sift is open; fields (prefix, hunt title) keep their own typing. */
export function useHardwareKeys(handlers: HardwareKeyHandlers, enabled = true): void {
  const latest = useRef(handlers);
  latest.current = handlers;
  useEffect(() => {
    if (!enabled || typeof window === 'undefined') return undefined;
    const onKeyDown = (event: KeyboardEvent) => {
      if (event.ctrlKey || event.metaKey || event.altKey || typingInAField(event.target)) return;
      const key = event.key;
      const h = latest.current;
      if (/^[0-9]$/.test(key)) h.onDigit(key);
      else if (key === 'Backspace') h.onDelete();
      else if (key === 'Enter') h.onLog();
      else if (key === 's' || key === 'S' || key === '*') h.onToggleStar();
      else if (key === 'p' || key === 'P') h.onTogglePulled();
      else if (key === 'u' || key === 'U') h.onUndo();
      else return;
      event.preventDefault();
    };
    window.addEventListener('keydown', onKeyDown);
    return () => window.removeEventListener('keydown', onKeyDown);
  }, [enabled]);
}
