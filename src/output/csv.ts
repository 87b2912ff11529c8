/**
 * Comma-separated values for spreadsheets (RFC 4180): a field holding a comma,
 * a quote or a line break is quoted, quotes doubled; lines end CRLF.
 */
export function toCsv(head: readonly string[], rows: ReadonlyArray<ReadonlyArray<string | number | boolean | null>>): string {
  const field = (value: string | number | boolean | null) => {
    const text = value === null ? '' : String(value);
    return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
  };
  return [head, ...rows].map((row) => row.map(field).join(',')).join('\r\n') + '\r\n';
}
