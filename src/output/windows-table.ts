import { quantityText } from '../text/quantity-text.js';
import { wrapProse } from './wrap-prose.js';
import type { BandImage } from '../math/band.js';
import type { WindowsReport } from '../report/windows-report.js';
import { textTable } from './text-table.js';

const T = quantityText('terminal');

/**
 * The windows report as text for people, laid out for a width.
 *
 * @param report from windowsReport
 * @param width characters per line (Infinity: no limit)
 * @returns the text, ending in a newline
 * @example windowsTable(windowsReport({ low: hz(130e6), high: hz(150e6) }, guardBands(hz(2e6), hz(2e6)), { minRate: hz(40e6), maxRate: hz(250e6) })) // 'Band 130–150 MHz (width 20 MHz), guards 2 MHz below, 2 MHz above: holding 128–152 MHz...'
 */
export function windowsTable(report: WindowsReport, width = 100): string {
  const { band, guard, guardedBand, windows } = report;
  const lines = [
    `Band ${T.extent(band.low, band.high)} (width ${T.frequency(band.high - band.low)}), guards ${T.frequency(guard.low)} below, ` +
      `${T.frequency(guard.high)} above: holding ${T.extent(guardedBand.low, guardedBand.high)}.`,
  ];
  if (windows.length === 0) {
    lines.push(`No legal sampling rate between ${T.rate(report.limits.minRate)} and ${T.rate(report.limits.maxRate)}.`);
  } else {
    const rows = windows.map((w) => [
      String(w.zone),
      w.inverted ? 'yes' : 'no',
      T.rateRange(w.minRate, w.maxRate),
      T.frequency(w.width),
      w.tolerancePpm === null ? '–' : T.tolerance(w.tolerancePpm),
      w.center === null ? '–' : T.rate(w.center),
      imageText(w.image),
    ]);
    lines.push('Legal windows (rates rounded inward: every rate written lies inside):');
    lines.push(
      textTable(
        [
          { head: 'zone', role: 'key', align: 'right' },
          { head: 'inverted' },
          { head: 'legal rates', align: 'right' },
          { head: 'width', align: 'right' },
          { head: 'drift at centre', align: 'right' },
          { head: 'centre rate', align: 'right', role: 'detail' },
          { head: 'band lands at (centre)', role: 'detail' },
        ],
        rows,
        width,
      ),
    );
    lines.push(`Lowest legal rate: ${report.minimumRate === null ? '∞' : T.leastRate(report.minimumRate)} (rounded up).`);
  }
  lines.push(report.caution);
  // Tables are laid out already; prose is wrapped (a table line that cannot shrink is left whole).
  return lines.map((line) => (line.includes('\n') ? line : wrapProse(line, width))).join('\n') + '\n';
}

function imageText(image: BandImage | null): string {
  if (image === null) return '–';
  return `${T.extent(image.low, image.high)}${image.inverted ? ' (mirrored)' : ''}`;
}
