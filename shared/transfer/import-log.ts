import Papa from 'papaparse';
import { IMPORT_FIELDS, MAX_IMPORT_ROWS, importRow, type ImportField, type ImportRow } from '../contracts/transfer';
import { parseSerial } from '../engine';

/** Which column of the file feeds each field; null leaves the field empty. */
export type ColumnMapping = Record<ImportField, number | null>;

export interface LogFile {
  headers: string[];
  /** Data rows as text cells, the header row excluded. */
  rows: string[][];
  /** Problems with the file as a whole (the rows past the limit, a broken quote). */
  problems: string[];
}

/** One row's verdict for the preview: what will be stored, or why it cannot be. */
export interface CheckedRow {
  /** Line in the file, the header being line 1. */
  line: number;
  ok: boolean;
  /** Why the row cannot be imported; empty when ok. */
  problems: string[];
  /** Worth knowing but not blocking (a series on a note that was not pulled). */
  warnings: string[];
  /** What goes to the server when ok. */
  row: ImportRow | null;
  serial: string;
}

/**
 * Reads a CSV log with papaparse: the first row is the header, blank lines are skipped, a byte-order
 * mark is dropped, and delimiters (comma, semicolon, tab) are detected.
 *
 * @example
 * readLogCsv('serial,date\n12345678,2026-11-02\n').rows // [['12345678', '2026-11-02']]
 */
export function readLogCsv(text: string): LogFile {
  const parsed = Papa.parse<string[]>(text.replace(/^\uFEFF/, ''), { skipEmptyLines: 'greedy', delimitersToGuess: [',', ';', '\t'] });
  const [headerRow = [], ...data] = parsed.data;
  const problems = parsed.errors
    .filter((error) => error.code !== 'UndetectableDelimiter')
    .slice(0, 5)
    .map((error) => `${error.row !== undefined ? `Row ${error.row + 1}: ` : ''}${error.message}`);
  if (data.length > MAX_IMPORT_ROWS) problems.push(`Only the first ${MAX_IMPORT_ROWS.toLocaleString('en-US')} rows are read; split the file for the rest.`);
  return { headers: headerRow.map((cell) => cell.trim()), rows: data.slice(0, MAX_IMPORT_ROWS), problems };
}

const SYNONYMS: Record<ImportField, string[]> = {
  serial: ['serial', 'serial number', 'serialnumber', 'serial no', 'number', 'sn'],
  date: ['date', 'when', 'found', 'found at', 'found_at', 'scanned', 'scanned_at', 'scanned at', 'logged', 'time', 'datetime'],
  strap: ['strap', 'strap number', 'strap no', 'strap_no'],
  series: ['series', 'series year', 'year'],
  district: ['district', 'district letter', 'bank', 'frb'],
  star: ['star', 'star note', 'replacement', 'is star'],
  pulled: ['pulled', 'kept', 'keep', 'keeper', 'pull'],
  note: ['note', 'notes', 'comment', 'comments', 'remark', 'remarks', 'memo'],
  entryMethod: ['entry method', 'entry_method', 'entered', 'entered by', 'input'],
  cameraConfidence: ['camera confidence', 'camera_confidence', 'confidence'],
};

/**
 * Guesses which column is which from the header names; every field maps to at most one column.
 *
 * @example
 * guessMapping(['Serial Number', 'Date', 'Notes']) // { serial: 0, date: 1, note: 2, strap: null, … }
 */
export function guessMapping(headers: readonly string[]): ColumnMapping {
  const mapping = Object.fromEntries(IMPORT_FIELDS.map((field) => [field, null])) as ColumnMapping;
  const taken = new Set<number>();
  const normal = headers.map((header) => header.trim().toLowerCase().replace(/[\s_-]+/g, ' '));
  for (const field of IMPORT_FIELDS) {
    const names = SYNONYMS[field].map((name) => name.replace(/[\s_-]+/g, ' '));
    const index = normal.findIndex((header, i) => !taken.has(i) && names.includes(header));
    if (index >= 0) {
      mapping[field] = index;
      taken.add(index);
    }
  }
  return mapping;
}

const YES = new Set(['y', 'yes', 'true', '1', 'x', '★', '*', 'star', 'pulled', 'kept', 'keep']);
const NO = new Set(['n', 'no', 'false', '0', '-']);

/** yes/no, true/false, 1/0, x or a star; blank means "not said". */
export function parseFlag(text: string): { ok: true; value: boolean | null } | { ok: false } {
  const value = text.trim().toLowerCase();
  if (value === '') return { ok: true, value: null };
  if (YES.has(value)) return { ok: true, value: true };
  if (NO.has(value)) return { ok: true, value: false };
  return { ok: false };
}

function validDate(year: number, month: number, day: number): boolean {
  const date = new Date(Date.UTC(year, month - 1, day));
  return date.getUTCFullYear() === year && date.getUTCMonth() === month - 1 && date.getUTCDate() === day && year >= 1900 && year <= 2100;
}

/**
 * A date as logs write it: ISO (2026-11-02, or with a time and zone), or US month/day/year (11/02/2026).
 * A bare date becomes noon UTC, so it stays on its day in every time zone. Blank means "no date".
 */
export function parseLogDate(text: string): { ok: true; value: string | null } | { ok: false } {
  const value = text.trim();
  if (value === '') return { ok: true, value: null };
  let match = /^(\d{4})-(\d{2})-(\d{2})$/.exec(value);
  if (match) {
    const [, y, m, d] = match.map(Number) as [number, number, number, number];
    return validDate(y, m, d) ? { ok: true, value: `${match[1]}-${match[2]}-${match[3]}T12:00:00.000Z` } : { ok: false };
  }
  match = /^(\d{1,2})\/(\d{1,2})\/(\d{4})$/.exec(value);
  if (match) {
    const [, m, d, y] = match.map(Number) as [number, number, number, number];
    if (!validDate(y, m, d)) return { ok: false };
    return { ok: true, value: `${y}-${String(m).padStart(2, '0')}-${String(d).padStart(2, '0')}T12:00:00.000Z` };
  }
  if (/^\d{4}-\d{2}-\d{2}[T ]\d{2}:\d{2}(:\d{2}(\.\d{1,6})?)?(Z|[+-]\d{2}:?\d{2})$/.test(value)) {
    const time = new Date(value.replace(' ', 'T'));
    if (!Number.isNaN(time.getTime()) && time.getUTCFullYear() >= 1900 && time.getUTCFullYear() <= 2100) return { ok: true, value: time.toISOString() };
  }
  return { ok: false };
}

/**
 * Checks every row against the mapping: the serial with the engine's parseSerial, and each optional
 * column with its own rule. Each bad row says why. Rows with the same serial and date are numbered
 * (`occurrence`), so a note logged twice stays two notes and re-importing the file adds none.
 *
 * @example
 * checkLog([['12345678', 'yes']], { ...noColumns, serial: 0, pulled: 1 })[0].row?.pulled // true
 */
export function checkLog(rows: readonly string[][], mapping: ColumnMapping): CheckedRow[] {
  const seen = new Map<string, number>();
  return rows.map((cells, index) => {
    const line = index + 2;
    const cell = (field: ImportField) => (mapping[field] === null ? '' : (cells[mapping[field]!] ?? '').trim());
    const problems: string[] = [];
    const warnings: string[] = [];
    const serialText = cell('serial');
    const parsed = parseSerial(serialText);
    if (mapping.serial === null) problems.push('no column is mapped to serial');
    else if (serialText === '') problems.push('serial: the cell is empty');
    else if (!parsed.ok) problems.push(`serial: ${parsed.error.message}`);

    const date = parseLogDate(cell('date'));
    if (!date.ok) problems.push(`date: “${cell('date')}” is not a date (write 2026-11-02 or 11/02/2026)`);
    const strapText = cell('strap');
    const strap = strapText === '' ? null : Number(strapText);
    if (strap !== null && !(Number.isInteger(strap) && strap >= 1 && strap <= 1000)) problems.push(`strap: “${strapText}” is not a strap number 1–1000`);
    const star = parseFlag(cell('star'));
    if (!star.ok) problems.push(`star: “${cell('star')}” is not yes or no`);
    const pulled = parseFlag(cell('pulled'));
    if (!pulled.ok) problems.push(`pulled: “${cell('pulled')}” is not yes or no`);
    const series = cell('series').toUpperCase();
    if (series && !/^\d{4}[A-Z]?$/.test(series)) problems.push(`series: “${cell('series')}” is not a series like 2013 or 1988A`);
    const district = cell('district').toUpperCase();
    if (district && !/^[A-L]$/.test(district)) problems.push(`district: “${cell('district')}” is not a district letter A–L`);
    const note = cell('note');
    if (note.length > 2000) problems.push('note: longer than 2,000 characters');
    if (parsed.ok && district && parsed.district && parsed.district !== district) {
      warnings.push(`the serial's prefix says district ${parsed.district}, the district column ${district}; the column is kept`);
    }
    const method = cell('entryMethod').toLowerCase();
    if (method && method !== 'keypad' && method !== 'camera') problems.push(`entry method: “${cell('entryMethod')}” is not keypad or camera`);
    const confidenceText = cell('cameraConfidence');
    const confidence = confidenceText === '' ? null : Number(confidenceText);
    if (confidence !== null && !(Number.isFinite(confidence) && confidence >= 0 && confidence <= 1)) {
      problems.push(`camera confidence: “${confidenceText}” is not a number from 0 to 1`);
    }
    if (confidence !== null && method !== 'camera') warnings.push('a camera confidence is kept only for notes the camera read');
    const isPulled = pulled.ok && pulled.value === true;
    if (!isPulled && (series || note)) warnings.push('series and note are kept only for pulled notes (they become keepers)');

    if (problems.length || !parsed.ok || !date.ok || !star.ok || !pulled.ok) {
      return { line, ok: false, problems, warnings, row: null, serial: serialText };
    }
    const isStar = star.value ?? parsed.star;
    const key = `${parsed.digits}|${parsed.prefix}|${parsed.suffix}|${isStar}|${date.value ?? ''}`;
    const occurrence = seen.get(key) ?? 0;
    seen.set(key, occurrence + 1);
    const candidate = importRow.safeParse({
      line,
      occurrence,
      serial: serialText,
      date: date.value,
      strap,
      series: series || null,
      district: district || null,
      star: star.value,
      pulled: pulled.value,
      note: note || null,
      entryMethod: method === 'keypad' || method === 'camera' ? method : null,
      cameraConfidence: method === 'camera' ? confidence : null,
    });
    if (!candidate.success) {
      const issue = candidate.error.issues[0];
      return { line, ok: false, problems: [`${issue?.path.join('.') ?? 'row'}: ${issue?.message ?? 'is not valid'}`], warnings, row: null, serial: serialText };
    }
    return { line, ok: true, problems, warnings, row: candidate.data, serial: serialText };
  });
}

/** A mapping with every field unmapped, to build on. */
export const noColumns: ColumnMapping = Object.fromEntries(IMPORT_FIELDS.map((field) => [field, null])) as ColumnMapping;
