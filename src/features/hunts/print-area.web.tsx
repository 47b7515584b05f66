import { useEffect, useState, type ReactNode } from 'react';
import { createPortal } from 'react-dom';

const HOST_ID = 'strapsift-print';
const STYLE_ID = 'strapsift-print-style';

// On screen the print copy is hidden; in print only it shows, with the app (tab bar, buttons,
// dialogs, which all live outside it) hidden. One sheet, black on white, whatever the theme.
const PRINT_CSS = `
#${HOST_ID} { display: none; }
@media print {
  @page { margin: 12mm; }
  html, body { height: auto !important; overflow: visible !important; background: #fff !important; }
  body > *:not(#${HOST_ID}) { display: none !important; }
  #${HOST_ID} { display: block !important; -webkit-print-color-adjust: exact; print-color-adjust: exact; }
}
`;

function ensureStyle(): void {
  if (document.getElementById(STYLE_ID)) return;
  const style = document.createElement('style');
  style.id = STYLE_ID;
  style.textContent = PRINT_CSS;
  document.head.appendChild(style);
}

/**
 * Renders its children into a node beside the app root, which the print stylesheet alone shows.
 * react-native-web draws the children as ordinary DOM, so they can be laid out with the same views.
 */
export function PrintArea({ children }: { children: ReactNode }) {
  const [host, setHost] = useState<HTMLElement | null>(null);
  useEffect(() => {
    ensureStyle();
    const node = document.createElement('div');
    node.id = HOST_ID;
    node.setAttribute('data-testid', 'print-area');
    document.body.appendChild(node);
    setHost(node);
    return () => {
      node.remove();
    };
  }, []);
  return host ? createPortal(children, host) : null;
}

/** Opens the browser's print dialog; the page's print stylesheet decides what lands on paper. */
export function printSheet(_plainText: string): void {
  window.print();
}
