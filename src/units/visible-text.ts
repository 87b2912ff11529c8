/** C0 controls, DEL and C1 controls: characters a terminal or a spreadsheet may act on rather than show. */
// eslint-disable-next-line no-control-regex -- finding control characters is the point
const CONTROL = /[\u0000-\u001f\u007f-\u009f]/g;
// eslint-disable-next-line no-control-regex -- as above, with line feeds, tabs and CR LF pairs left alone
const CONTROL_BUT_LINES = /\r(?!\n)|[\u0000-\u0008\u000b-\u000c\u000e-\u001f\u007f-\u009f]/g;

const NAMED: Readonly<Record<string, string>> = { '\n': '\\n', '\r': '\\r', '\t': '\\t' };

/**
 * Writes control characters as visible escapes (`\u001b`, `\n`), so that
 * text from a scenario file (a label, a name) cannot move a terminal's
 * cursor, change its colours or title, or split a line.
 *
 * @param text any string
 * @param keepLines leave line feeds, tabs and CR LF pairs as they are (for whole outputs that are made of lines)
 * @returns the text with every other control character escaped
 * @example visibleText('Heron\u001b[2J') // 'Heron\\u001b[2J'
 */
export function visibleText(text: string, keepLines = false): string {
  return text.replace(
    keepLines ? CONTROL_BUT_LINES : CONTROL,
    (char) => NAMED[char] ?? `\\u${char.charCodeAt(0).toString(16).padStart(4, '0')}`,
  );
}
