import Papa from 'papaparse';
import { PATTERN_NAMES, type SweepResult } from '@shared/engine';
import type { ParsedSerial } from '@shared/engine';
import { fullSerial, position } from './sweep-input';

/**
 * The sweep's finds as CSV, one line a find, in serial order. Digits are kept as text with their leading
 * zeros; patterns are joined with "; " so the file opens as one column per field in a spreadsheet.
 */
export function sweepCsv(result: SweepResult, serial: Pick<ParsedSerial, 'prefix' | 'suffix' | 'star'>): string {
  const header = ['serial', 'digits', 'notes_away', 'strap', 'note_in_strap', 'patterns'];
  const data = result.hits.map((hit) => {
    const at = position(hit.value, result.first);
    return [fullSerial(hit.serial, serial), hit.serial, at.away, at.strap, at.inStrap, hit.patterns.map((id) => PATTERN_NAMES[id]).join('; ')];
  });
  // papaparse quotes what needs quoting and, like the server's exports, defuses cells a spreadsheet would run as formulas.
  return `${Papa.unparse({ fields: header, data }, { escapeFormulae: true, newline: '\r\n' })}\r\n`;
}

export function sweepFileName(result: SweepResult): string {
  return `strapsift-sweep-${String(result.first).padStart(8, '0')}-${result.count}.csv`;
}
