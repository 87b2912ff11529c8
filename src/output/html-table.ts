import { escapeXml } from '../pictures/escape-xml.js';

/**
 * An HTML table with escaped cells; a cell may carry a class (e.g. "fail")
 * as a [text, class] pair so that print styles can mark it without colour.
 */
export function htmlTable(head: readonly string[], rows: ReadonlyArray<ReadonlyArray<string | readonly [string, string]>>, caption?: string): string {
  const cell = (tag: string, value: string | readonly [string, string]) =>
    typeof value === 'string' ? `<${tag}>${escapeXml(value)}</${tag}>` : `<${tag} class="${value[1]}">${escapeXml(value[0])}</${tag}>`;
  return (
    '<table>' +
    (caption ? `<caption>${escapeXml(caption)}</caption>` : '') +
    `<thead><tr>${head.map((h) => cell('th', h)).join('')}</tr></thead>` +
    `<tbody>${rows.map((r) => `<tr>${r.map((c) => cell('td', c)).join('')}</tr>`).join('')}</tbody>` +
    '</table>'
  );
}
