import { quantityText } from '../text/quantity-text.js';
import { wrapProse } from './wrap-prose.js';
import type { AliasReport } from '../report/alias-report.js';
import { textTable } from './text-table.js';

const T = quantityText('terminal');

/**
 * The alias report as text for people, laid out for a width.
 *
 * @param report from aliasReport
 * @param width characters per line (Infinity: no limit)
 * @returns the text, ending in a newline
 * @example aliasTable(aliasReport(hz(100e6), [hz(70e6)], 2), 100).startsWith('Sampled at 100 MHz') // true
 */
export function aliasTable(report: AliasReport, width = 100): string {
  const rows = report.tones.map((t) => [
    T.rate(t.frequency),
    T.rate(t.alias),
    String(t.zone),
    t.inverted ? 'yes' : 'no',
    t.lookalikes.map((f) => T.rate(f)).join(', '),
  ]);
  const table = textTable(
    [
      { head: 'frequency', role: 'key', align: 'right' },
      { head: 'shows at', align: 'right' },
      { head: 'zone', align: 'right' },
      { head: 'inverted' },
      { head: 'cannot be told from', wrap: true },
    ],
    rows,
    width,
  );
  return (
    [
      wrapProse(`Sampled at ${T.rate(report.rate)} (first Nyquist zone 0–${T.rate(report.rate / 2)}):`, width),
      table,
      wrapProse(report.caution, width),
    ].join('\n') + '\n'
  );
}
