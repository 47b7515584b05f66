// react-dom ships no types and @types/react-dom is not a dependency; only the portal the print copy uses is declared.
declare module 'react-dom' {
  import type { ReactNode, ReactPortal } from 'react';
  export function createPortal(children: ReactNode, container: Element | DocumentFragment): ReactPortal;
}
