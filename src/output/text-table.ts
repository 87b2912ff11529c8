import Table from 'cli-table3';
import { displayWidth as length } from './display-width.js';
import { proseWords, wrapProse } from './wrap-prose.js';

/** A column of a terminal table. */
export interface TextColumn {
  readonly head: string;
  /** Numbers align right. */
  readonly align?: 'left' | 'right';
  /**
   * key: repeated in every block (the row's number or name); main: in the
   * first block while it fits; detail: in the first block only when the whole
   * table fits, else in a second block.
   */
  readonly role?: 'key' | 'main' | 'detail';
  /** Cells may wrap at spaces onto more lines (names, lists). */
  readonly wrap?: boolean;
}

const GAP = '  ';

/**
 * A plain table laid out for a width: headers over a rule, columns two spaces
 * apart, numbers right-aligned. When it is too wide, headers break at spaces,
 * wrapping cells break at spaces (down to their longest word), and what still
 * does not fit moves to further blocks that repeat the key columns: first the
 * detail columns, then main columns from the right. A detail column that
 * reads "–" in every row is left out.
 *
 * @param columns the columns, deciding ones first
 * @param rows cells as text, one array per row
 * @param width characters available (Infinity: one block, nothing wrapped)
 * @returns the table, lines joined by newlines, no trailing newline
 * @example textTable([{ head: 'zone' }, { head: 'rate', align: 'right' }], [['2', '184.32 MHz']], 100)
 * // 'zone        rate\n────  ──────────\n2     184.32 MHz'
 */
export function textTable(columns: readonly TextColumn[], rows: ReadonlyArray<readonly string[]>, width: number): string {
  // A detail column with nothing to say in any row ("–" throughout) is left out.
  const all = columns.map((_, i) => i).filter((i) => columns[i]!.role !== 'detail' || rows.some((r) => (r[i] ?? '–') !== '–'));
  const measure = columnMeasures(columns, rows);
  if (fits(measure.natural(all), width)) return block(columns, rows, all, width, measure);
  const keys = all.filter((i) => columns[i]!.role === 'key');
  const main = all.filter((i) => (columns[i]!.role ?? 'main') === 'main');
  const detail = all.filter((i) => columns[i]!.role === 'detail');
  // Deciding columns may wrap to stay in the first block; detail columns move to later blocks, at their natural width where they can.
  const blocks: number[][] = [];
  for (const [pending, wrapOk] of [
    [main, true],
    [detail, false],
  ] as const) {
    let left = [...pending];
    while (left.length > 0) {
      const chosen: number[] = [];
      for (const i of left) {
        const trial = [...keys, ...chosen, i];
        const widths = wrapOk ? measure.narrowest(trial) : measure.natural(trial);
        if (chosen.length === 0 || fits(widths, width)) chosen.push(i);
      }
      blocks.push([...keys, ...chosen].sort((a, b) => a - b));
      left = left.filter((i) => !chosen.includes(i));
    }
  }
  return blocks.map((b) => block(columns, rows, b, width, measure)).join('\n\n');
}

function fits(widths: readonly number[], width: number): boolean {
  return widths.reduce((sum, w) => sum + w, 0) + GAP.length * (widths.length - 1) <= width;
}

/** The widths of the picked columns, as textTable weighs where each goes. */
interface ColumnMeasures {
  /** The least width of each picked column: its longest unbreakable cell, and its header's longest word. */
  readonly narrowest: (picked: readonly number[]) => number[];
  /** The width of each picked column with nothing wrapped. */
  readonly natural: (picked: readonly number[]) => number[];
}

/** Both widths of every column, measured once (the layout tries many column sets; measuring a cell is not cheap). */
function columnMeasures(columns: readonly TextColumn[], rows: ReadonlyArray<readonly string[]>): ColumnMeasures {
  const least = columns.map((column, i) => {
    const cells = rows.map((r) => r[i] ?? '');
    const cellWidth = Math.max(0, ...cells.map((c) => (column.wrap ? longestWord(c) : length(c))));
    return Math.max(cellWidth, longestWord(column.head));
  });
  const whole = columns.map((column, i) => Math.max(length(column.head), ...rows.map((r) => length(r[i] ?? ''))));
  return { narrowest: (picked) => picked.map((i) => least[i]!), natural: (picked) => picked.map((i) => whole[i]!) };
}

/** One block: widths from natural down towards the narrowest, widest columns shrunk first. */
function block(
  columns: readonly TextColumn[],
  rows: ReadonlyArray<readonly string[]>,
  picked: readonly number[],
  width: number,
  measure: ColumnMeasures,
): string {
  const least = measure.narrowest(picked);
  const widths = measure.natural(picked);
  const total = () => widths.reduce((sum, w) => sum + w, 0) + GAP.length * (picked.length - 1);
  while (total() > width) {
    let widest = -1;
    for (let k = 0; k < widths.length; k++) if (widths[k]! > least[k]! && (widest < 0 || widths[k]! > widths[widest]!)) widest = k;
    if (widest < 0) break;
    widths[widest]! -= 1;
  }
  const heads = picked.map((i, k) => wrapProse(columns[i]!.head, widths[k]!).split('\n'));
  const headLines = Math.max(...heads.map((h) => h.length));
  // Headers sit on their last line, so a one-line header lines up with the last line of a two-line one.
  const headRow = heads.map((h) => [...Array<string>(headLines - h.length).fill(''), ...h].join('\n'));
  const rule = widths.map((w) => '─'.repeat(w));
  const body = rows.map((row) => picked.map((i, k) => (columns[i]!.wrap ? wrapProse(row[i] ?? '', widths[k]!) : (row[i] ?? ''))));
  // cli-table3 lays the block out: no borders, columns two spaces apart, the rule under the headers drawn as a row.
  const table = new Table({ chars: BORDERLESS, colWidths: widths, style: { head: [], border: [], 'padding-left': 0, 'padding-right': 0 } });
  const aligned = (cells: readonly string[]) => cells.map((content, k) => ({ content, hAlign: columns[picked[k]!]!.align ?? 'left' }));
  table.push(aligned(headRow), aligned(rule), ...body.map(aligned));
  return table
    .toString()
    .split('\n')
    .map((line) => line.trimEnd())
    .join('\n');
}

/** No border or rule characters, and the gap between columns. */
const BORDERLESS = {
  top: '',
  'top-mid': '',
  'top-left': '',
  'top-right': '',
  bottom: '',
  'bottom-mid': '',
  'bottom-left': '',
  'bottom-right': '',
  left: '',
  'left-mid': '',
  mid: '',
  'mid-mid': '',
  right: '',
  'right-mid': '',
  middle: GAP,
};

function longestWord(text: string): number {
  return Math.max(0, ...proseWords(text).map(length));
}
