import type { ReactNode } from 'react';
import { Share } from 'react-native';

/** A phone has no print stylesheet: the printable copy is not drawn, and "print" shares the text. */
export function PrintArea(_props: { children: ReactNode }) {
  return null;
}

/** Hands the sheet as plain text to the system share sheet (print, mail, a note) on a phone or tablet. */
export function printSheet(plainText: string): void {
  void Share.share({ message: plainText });
}
