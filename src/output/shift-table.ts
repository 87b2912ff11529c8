import { quantityText, type Medium, type QuantityText } from '../text/quantity-text.js';
import { wrapProse } from './wrap-prose.js';
import type { ReportedShift, ShiftReport } from '../plan/shift-report.js';
import { textTable, type TextColumn } from './text-table.js';

/**
 * The "Best IF shift and rate" section of the solve table: the best pair and,
 * for comparison, the best at the nominal IF, with the check that limits
 * each and the next one (which decides between pairs that tie on the worst).
 *
 * @param shift the report's ifShift section
 * @param width characters per line
 * @returns text, no trailing newline
 * @example shiftSection(narrowReport.ifShift, 100) // 'Best IF shift and rate (the IF may move ...'
 */
export function shiftSection(shift: ShiftReport, width = 100): string {
  const { title, columns, rows, searched } = shiftParts(shift, 'terminal');
  if (rows.length === 0) return wrapProse(`${title}\nNo rate is feasible at any seed shift (${searched})`, width);
  return `${wrapProse(title, width)}\n${textTable(columns, rows, width)}\n${wrapProse(`(${searched})`, width)}`;
}

/** The IF-shift section's pieces, shared by the table and the HTML page: title, columns, rows (best pair, nominal IF), what was searched. */
export interface ShiftParts {
  readonly title: string;
  readonly columns: readonly TextColumn[];
  readonly rows: readonly string[][];
  readonly searched: string;
}

/**
 * The pieces of the "Best IF shift and rate" section, for any writer.
 *
 * @param shift the report's ifShift section
 * @param medium the medium the numbers are written for
 * @returns title, columns, rows and the search summary, as text
 * @example shiftParts(narrowReport.ifShift, 'html').columns[1].head // 'IF shift'
 */
export function shiftParts(shift: ShiftReport, medium: Medium): ShiftParts {
  const t = quantityText(medium);
  const title =
    `Best IF shift and rate (the IF may move ${t.signedFrequency(shift.low)} to ${t.signedFrequency(shift.high)} with the first LO; ` +
    'the wanted band, its harmonics, the neighbours and their products move with it; board spurs, LO leakage among them, stay put):';
  const rows: string[][] = [];
  if (shift.best) rows.push(row('best pair', shift.best, t));
  if (shift.atNoShift) rows.push(row('nominal IF', shift.atNoShift, t));
  const searched = `${shift.seedShifts.length} seed shifts, ${shift.piecesSolved} pieces solved; widest worst margin over each rate's tolerance, ties broken by the next-tightest check's margin beyond its requirement.`;
  const columns: TextColumn[] = [
    { head: 'pair', role: 'key' },
    { head: 'IF shift', align: 'right' },
    { head: 'rate', align: 'right' },
    { head: 'zone', align: 'right' },
    { head: 'worst margin', align: 'right' },
    { head: 'limited by', wrap: true },
    { head: 'verdict' },
    { head: 'IF centre', align: 'right', role: 'detail' },
    { head: 'tolerance', align: 'right', role: 'detail' },
    { head: 'NCO', align: 'right', role: 'detail' },
    { head: 'next margin', wrap: true, role: 'detail' },
  ];
  return { title, columns, rows, searched };
}

function row(name: string, pair: ReportedShift, t: QuantityText): string[] {
  return [
    name,
    t.signedFrequency(pair.shift),
    t.rate(pair.rate),
    pair.zone === null ? 'straddles' : `${pair.zone}${pair.inverted ? ' inv' : ''}`,
    t.frequency(pair.worstMargin),
    pair.limitedBy,
    pair.pass ? 'pass' : 'FAIL',
    t.rate(pair.center),
    t.tolerance(pair.tolerancePpm),
    pair.nco === null ? '–' : t.rate(pair.nco),
    pair.next ? `${t.frequency(pair.next.margin)} (${pair.next.limitedBy})` : '–',
  ];
}
