import { useEffect } from 'react';
import { useTheme } from './theme-provider';

const ID = 'strapsift-focus-ring';

/**
 * A keyboard user must see where focus is. Browsers' default ring is thin and dark, lost on the
 * graphite theme, so one rule for every focusable element draws it in the theme's brand colour,
 * only for keyboard focus (`:focus-visible`), never for a tap.
 */
export function useFocusRing(): void {
  const theme = useTheme();
  useEffect(() => {
    let style = document.getElementById(ID) as HTMLStyleElement | null;
    if (!style) {
      style = document.createElement('style');
      style.id = ID;
      document.head.appendChild(style);
    }
    style.textContent = `:focus-visible { outline: 3px solid ${theme.brand} !important; outline-offset: 2px; }`;
  }, [theme.brand]);
}
