import { visibleText } from '../units/visible-text.js';

/**
 * Comma-separated values for spreadsheets (RFC 4180): a field holding a comma,
 * a quote or a line break is quoted, quotes doubled; lines end CRLF. Text
 * from a scenario is made harmless first (csvCell).
 */
export function toCsv(head: readonly string[], rows: ReadonlyArray<ReadonlyArray<string | number | boolean | null>>): string {
  const field = (value: string | number | boolean | null) => {
    const text = csvCell(value);
    return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
  };
  return [head, ...rows].map((row) => row.map(field).join(',')).join('\r\n') + '\r\n';
}

/** A cell a spreadsheet may read as a formula: one that begins with =, +, -, @ (or a tab or CR, which some strip first). */
const FORMULA_START = /^[=+\-@\t\r]/;

/**
 * One cell's text, safe to open in a spreadsheet: control characters
 * escaped (visibleText), and a text that a spreadsheet would take as a
 * formula (`=HYPERLINK(…)`, `+cmd`, `@SUM(…)`) given a leading apostrophe, as
 * the OWASP guidance on CSV injection recommends. A number (`-3.5`, `+20`) is
 * left as it is: it cannot run.
 *
 * @param value the cell's value
 * @returns its text
 * @example csvCell('=HYPERLINK("http://x")') // "'=HYPERLINK(\"http://x\")"
 */
export function csvCell(value: string | number | boolean | null): string {
  if (value === null) return '';
  if (typeof value !== 'string') return String(value);
  const text = visibleText(value);
  const isNumber = text.trim() !== '' && Number.isFinite(Number(text));
  return FORMULA_START.test(value) && !isNumber ? `'${text}` : text;
}
