import type { StrapRow, StrapSheet } from '@shared/contracts';
import { isTouched } from './strap-draft';
import { caption, formatDate } from '@/lib/format';

/**
 * The straps a teller gets back: those the hunter opened or recorded. A sheet printed before any
 * strap was opened lists every planned strap, so it can be filled in by hand.
 */
export function printedStraps(sheet: StrapSheet): StrapRow[] {
  const touched = sheet.straps.filter(isTouched);
  return touched.length ? touched : sheet.straps;
}

/**
 * The strap sheet as plain text, for sharing where there is no printer stylesheet. Counts of notes
 * only: no dollar totals and no serials, because the teller needs the counts and nothing about the cash.
 */
export function sheetText(sheet: StrapSheet, startedAt: string): string {
  const straps = printedStraps(sheet);
  const lines = [
    `Strap sheet · ${sheet.title}`,
    caption(sheet.source, `$${sheet.denomination} notes`, formatDate(startedAt, 'medium')),
    '',
    'Strap  Received  Pulled  Swapped in  Goes back',
    ...straps.map((row) =>
      [
        String(row.number).padStart(5),
        String(row.received).padStart(9),
        String(row.pulled).padStart(7),
        String(row.swappedIn).padStart(11),
        `${String(row.notesBack).padStart(10)}${row.complete ? '  complete' : ''}`,
      ].join(' '),
    ),
    '',
    `${straps.length} straps · ${straps.reduce((sum, row) => sum + row.notesBack, 0)} notes back · ${straps.filter((row) => row.complete).length} complete`,
    '',
    "Teller's initials: ________",
  ];
  return lines.join('\n');
}
