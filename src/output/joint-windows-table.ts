import { quantityText } from '../text/quantity-text.js';
import type { JointWindowsReport } from '../report/joint-windows-report.js';
import { textTable } from './text-table.js';
import { wrapProse } from './wrap-prose.js';

const T = quantityText('terminal');

/**
 * The report of several bands together as text for people, laid out for a
 * width: the bands, then the valid rates with each band's zone.
 *
 * @param report from jointWindowsReport
 * @param width characters per line (Infinity: no limit)
 * @returns the text, ending in a newline
 * @example jointWindowsTable(jointWindowsReport([{ low: hz(10e3), high: hz(14e3) }, { low: hz(16e3), high: hz(18e3) }].map((band) => ({ band, guard: guardBands(hz(0), hz(0)) })), hz(1e3), { minRate: hz(0), maxRate: hz(Infinity) })) // '2 bands through one converter, their aliases kept at least 1 kHz apart:...'
 */
export function jointWindowsTable(report: JointWindowsReport, width = 100): string {
  const { bands, intervals } = report;
  const prose = (text: string) => wrapProse(text, width);
  const lines = [
    prose(`${bands.length} bands through one converter, their aliases kept at least ${T.frequency(report.spacing)} apart:`),
    textTable(
      [
        { head: 'band', role: 'key', align: 'right' },
        { head: 'edges', align: 'right' },
        { head: 'guard below', align: 'right' },
        { head: 'guard above', align: 'right' },
        { head: 'holding', align: 'right' },
      ],
      bands.map((b, i) => [
        String(i + 1),
        T.extent(b.band.low, b.band.high),
        T.frequency(b.guard.low),
        T.frequency(b.guard.high),
        T.extent(b.guardedBand.low, b.guardedBand.high),
      ]),
      width,
    ),
  ];
  if (intervals.length === 0) {
    lines.push(
      prose(`No rate between ${T.rate(report.limits.minRate)} and ${T.rate(report.limits.maxRate)} holds every band whole and apart.`),
    );
  } else {
    const rows = intervals.map((row) => [
      row.minRate === row.maxRate ? T.rate(row.minRate) : T.rateRange(row.minRate, row.maxRate),
      row.minRate === row.maxRate ? 'single rate' : T.frequency(row.width),
      row.tolerancePpm === null ? '–' : T.tolerance(row.tolerancePpm),
      ...row.zones.map((zone, i) => `${zone}${row.inverted[i] ? ' inv' : ''}`),
    ]);
    lines.push(prose('Rates valid for every band together (rounded inward; zone of each band, "inv": spectrally inverted):'));
    lines.push(
      textTable(
        [
          { head: 'valid rates', role: 'key', align: 'right' },
          { head: 'width', align: 'right' },
          { head: 'drift at centre', align: 'right' },
          ...bands.map((_, i) => ({ head: `band ${i + 1}`, align: 'right' as const })),
        ],
        rows,
        width,
      ),
    );
    const lowest =
      report.minimumRate === null
        ? '∞'
        : report.minimumIsSingleRate
          ? T.rate(report.minimumRate)
          : `${T.leastRate(report.minimumRate)} (rounded up)`;
    lines.push(
      prose(
        report.minimumIsSingleRate
          ? `Lowest valid rate: ${lowest}, a single rate (a hair above or below it fails; no clock tolerance fits).`
          : `Lowest valid rate: ${lowest}.`,
      ),
    );
  }
  lines.push(prose(report.caution));
  return lines.join('\n') + '\n';
}
