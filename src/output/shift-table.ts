import { formatFrequency, trimmed } from '../units/format-frequency.js';
import type { ReportedShift, ShiftReport } from '../plan/shift-report.js';
import { plainTable } from './table.js';

/**
 * The "Best IF shift and rate" section of the solve table: the best pair and,
 * for comparison, the best at the nominal IF, with the check that limits
 * each and the next one (which decides between pairs that tie on the worst).
 *
 * @param shift the report's ifShift section
 * @returns text, no trailing newline
 * @example shiftSection(narrowReport.ifShift) // 'Best IF shift and rate (the IF may move ...'
 */
export function shiftSection(shift: ShiftReport): string {
  const { title, head, rows, searched } = shiftParts(shift);
  if (rows.length === 0) return `${title}\nNo rate is feasible at any seed shift (${searched})`;
  return `${title}\n${plainTable(head, rows)}\n(${searched})`;
}

/** The IF-shift section's pieces, shared by the table and the HTML page: title, column heads, rows (best pair, nominal IF), what was searched. */
export interface ShiftParts {
  readonly title: string;
  readonly head: readonly string[];
  readonly rows: readonly string[][];
  readonly searched: string;
}

/**
 * The pieces of the "Best IF shift and rate" section, for any writer.
 *
 * @param shift the report's ifShift section
 * @returns title, heads, rows and the search summary, as text
 * @example shiftParts(narrowReport.ifShift).head[1] // 'IF shift'
 */
export function shiftParts(shift: ShiftReport): ShiftParts {
  const title =
    `Best IF shift and rate (the IF may move ${signed(shift.low)} to ${signed(shift.high)} with the first LO; ` +
    'the wanted band, its harmonics, the neighbours and their products move with it; board spurs, LO leakage among them, stay put):';
  const rows: string[][] = [];
  if (shift.best) rows.push(row('best pair', shift.best));
  if (shift.atNoShift) rows.push(row('nominal IF', shift.atNoShift));
  const searched = `${shift.seedShifts.length} seed shifts, ${shift.piecesSolved} pieces solved; widest worst margin over each rate's ±ppm, ties broken by the next-tightest check's margin beyond its requirement.`;
  const head = ['pair', 'IF shift', 'IF centre', 'rate', 'ppm', 'zone', 'inverted', 'centre / NCO', 'worst margin', 'limited by', 'next margin', 'verdict'];
  return { title, head, rows, searched };
}

function row(name: string, pair: ReportedShift): string[] {
  return [
    name,
    signed(pair.shift),
    formatFrequency(pair.center),
    formatFrequency(pair.rate),
    `±${trimmed(pair.tolerancePpm, 4)}`,
    pair.zone === null ? 'straddles' : String(pair.zone),
    pair.inverted === null ? '–' : pair.inverted ? 'yes' : 'no',
    pair.nco === null ? '–' : formatFrequency(pair.nco),
    formatFrequency(pair.worstMargin, 7),
    pair.limitedBy,
    pair.next ? `${formatFrequency(pair.next.margin, 7)} (${pair.next.limitedBy})` : '–',
    pair.pass ? 'pass' : 'FAIL',
  ];
}

/** A shift with its sign: +2 MHz, −2 MHz, 0 Hz. */
function signed(value: number): string {
  if (value === 0) return formatFrequency(0);
  return (value > 0 ? '+' : '−') + formatFrequency(Math.abs(value));
}
