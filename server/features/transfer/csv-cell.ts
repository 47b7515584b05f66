/**
 * A cell as it is safe to hand to a spreadsheet. A text starting with = + - @, a tab or a carriage return
 * is run as a formula by Excel, LibreOffice Calc and Google Sheets; a leading apostrophe makes it plain
 * text (OWASP, "CSV Injection"). The whole value is checked, line breaks and all: papaparse's own
 * escapeFormulae tests /^[=+\-@\t\r].*$/ without the s flag, so a multi-line value slipped through.
 *
 * csvCell('=HYPERLINK("http://x")') → "'=HYPERLINK(\"http://x\")"
 */
export function csvCell(value: unknown): unknown {
  if (typeof value !== 'string') return value;
  return /^[=+\-@\t\r]/.test(value) ? `'${value}` : value;
}
