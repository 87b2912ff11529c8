import { escapeXml } from '../pictures/escape-xml.js';

/** Words a quantity may carry: units, "inv" after a zone, r for the rate in an extent tied to it. */
const QUANTITY_WORDS = /\b(?:[kMG]?Hz|ppm|dBFS|dBc|dB|inv|r)\b/g;

/** Whether a cell reads as a quantity (digits, signs, units, a zone "2 inv", settings "×93 ÷5"): such cells never break across lines. */
function isQuantity(text: string): boolean {
  const rest = text.replace(QUANTITY_WORDS, '');
  return /\d/.test(text) && !/\p{L}/u.test(rest);
}

/**
 * An HTML table with escaped cells; a cell may carry a class (e.g. "fail")
 * as a [text, class] pair so that print styles can mark it without colour.
 * A cell that reads as a quantity gets the class "num" (kept on one line,
 * right-aligned).
 *
 * @param head the column titles
 * @param rows cells as text, or [text, class] pairs
 * @param caption the table's caption
 * @returns the table as HTML
 * @example htmlTable(['rate'], [['184.32 MHz']]) // '<table><thead><tr><th>rate</th></tr></thead><tbody><tr><td class="num">184.32 MHz</td></tr></tbody></table>'
 */
export function htmlTable(
  head: readonly string[],
  rows: ReadonlyArray<ReadonlyArray<string | readonly [string, string]>>,
  caption?: string,
): string {
  const cell = (tag: string, value: string | readonly [string, string]) =>
    typeof value !== 'string'
      ? `<${tag} class="${value[1]}">${escapeXml(value[0])}</${tag}>`
      : tag === 'td' && isQuantity(value)
        ? `<td class="num">${escapeXml(value)}</td>`
        : `<${tag}>${escapeXml(value)}</${tag}>`;
  return (
    '<table>' +
    (caption ? `<caption>${escapeXml(caption)}</caption>` : '') +
    `<thead><tr>${head.map((h) => cell('th', h)).join('')}</tr></thead>` +
    `<tbody>${rows.map((r) => `<tr>${r.map((c) => cell('td', c)).join('')}</tr>`).join('')}</tbody>` +
    '</table>'
  );
}
