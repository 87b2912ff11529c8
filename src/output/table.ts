import { displayWidth } from './display-width.js';

/**
 * A plain, colour-free table with box-drawing borders: it reads the same in a
 * terminal, a log file and a pasted design note. Each column is as wide as
 * its widest cell plus one space each side; a cell with line breaks takes as
 * many lines as it has; no rule between body rows. A row with fewer cells
 * than the head is padded with empty ones.
 *
 * @param head the column titles (none: no head and no rule under it)
 * @param rows the body, one array of cell texts per row
 * @returns the table, lines joined by '\n', with no final line break
 * @example plainTable(['a', 'bb'], [['1', '22']]).split('\n')[1] // '│ a │ bb │'
 */
export function plainTable(head: readonly string[], rows: ReadonlyArray<readonly string[]>): string {
  const body = head.length > 0 ? [head, ...rows] : [...rows];
  const columns = Math.max(head.length, ...rows.map((row) => row.length));
  const cells = body.map((row) => Array.from({ length: columns }, (_, c) => (row[c] ?? '').split('\n')));
  const widths = Array.from({ length: columns }, (_, c) => Math.max(0, ...cells.flatMap((row) => row[c]!.map(displayWidth))));
  const rule = (left: string, middle: string, right: string) => left + widths.map((w) => '─'.repeat(w + 2)).join(middle) + right;
  const lines = [rule('┌', '┬', '┐')];
  cells.forEach((row, r) => {
    const height = Math.max(...row.map((cell) => cell.length));
    for (let line = 0; line < height; line++) {
      lines.push('│' + row.map((cell, c) => ` ${padEnd(cell[line] ?? '', widths[c]!)} `).join('│') + '│');
    }
    if (r === 0 && head.length > 0 && rows.length > 0) lines.push(rule('├', '┼', '┤'));
  });
  lines.push(rule('└', '┴', '┘'));
  return lines.join('\n');
}

function padEnd(text: string, width: number): string {
  return text + ' '.repeat(width - displayWidth(text));
}
