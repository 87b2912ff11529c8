import type { ReportedCheck } from '../plan/plan-report.js';
import { quantityText } from '../text/quantity-text.js';

const T = quantityText('svg');
import { element, textElement } from './svg-element.js';
import { clipped } from './typography.js';

const FONT = 10;
const ROW = 14;

interface Column {
  readonly title: string;
  /** Left edge, or right edge for numbers, px from the table's left. */
  readonly at: number;
  readonly align: 'start' | 'end';
  readonly cell: (check: ReportedCheck, key: number) => string;
}

const COLUMNS: readonly Column[] = [
  { title: 'key', at: 22, align: 'end', cell: (_c, key) => String(key) },
  { title: 'check', at: 32, align: 'start', cell: (c) => c.label },
  { title: 'aliased to', at: 262, align: 'start', cell: (c) => c.alias.map(([a, b]) => T.extent(a, b)).join(', ') },
  { title: 'level dBFS', at: 612, align: 'end', cell: (c) => T.level(c.level) },
  { title: 'margin', at: 692, align: 'end', cell: (c) => T.frequency(c.margin) },
  { title: 'required', at: 772, align: 'end', cell: (c) => T.frequency(c.requiredMargin) },
  { title: 'blocks', at: 822, align: 'end', cell: (c) => (c.blocking ? 'yes' : 'no') },
  { title: 'verdict', at: 872, align: 'end', cell: (c) => (c.pass ? 'pass' : 'FAIL') },
];

/** Widest cell text kept in the 'check' and 'aliased to' columns, px: to the next column, less room for its widest figures (the JSON has the rest). */
const CLIP = { check: 262 - 32 - 8, alias: 612 - 262 - 62 } as const;

/**
 * The checks of one candidate as a table drawn in SVG text: key number,
 * label, aliased segments, level, margin, required margin, whether it
 * blocks, verdict. Failing rows are bold.
 *
 * @param checks in key order (key = index + 1)
 * @param left, top the table's top-left corner, px
 * @returns markup and height, px
 */
export function checkTable(checks: readonly ReportedCheck[], left: number, top: number): { markup: string; height: number } {
  const parts: string[] = [];
  const line = (y: number) => element('line', { x1: left, y1: y, x2: left + 880, y2: y, stroke: '#000', 'stroke-width': 0.6 });
  const row = (y: number, cells: readonly string[], bold: boolean) =>
    COLUMNS.forEach((col, i) =>
      parts.push(
        textElement(left + col.at, y, cells[i]!, { 'text-anchor': col.align, 'font-size': FONT, 'font-weight': bold ? 'bold' : undefined }),
      ),
    );
  row(
    top + FONT,
    COLUMNS.map((c) => c.title),
    true,
  );
  parts.push(line(top + ROW - 1));
  checks.forEach((check, index) => {
    const cells = COLUMNS.map((col) => col.cell(check, index + 1));
    cells[1] = clipped(cells[1]!, CLIP.check, FONT, { bold: !check.pass });
    cells[2] = clipped(cells[2]!, CLIP.alias, FONT, { bold: !check.pass });
    row(top + (index + 2) * ROW - 3, cells, !check.pass);
  });
  const height = (checks.length + 1) * ROW + 4;
  parts.push(line(top + height - 2));
  return { markup: element('g', { class: 'checks' }, parts.join('')), height };
}
