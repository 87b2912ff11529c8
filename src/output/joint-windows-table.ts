import { formatFrequency, trimmed } from '../units/format-frequency.js';
import type { JointWindowsReport } from '../report/joint-windows-report.js';
import { plainTable } from './table.js';

/** The report of several bands together as text for people: the bands, then the valid rates with each band's zone. */
export function jointWindowsTable(report: JointWindowsReport): string {
  const { bands, intervals } = report;
  const lines = [
    `${bands.length} bands through one converter, their aliases kept at least ${formatFrequency(report.spacing)} apart:`,
    plainTable(
      ['band', 'edges', 'guard below', 'guard above', 'holding'],
      bands.map((b, i) => [
        String(i + 1),
        `${formatFrequency(b.band.low)} – ${formatFrequency(b.band.high)}`,
        formatFrequency(b.guard.low),
        formatFrequency(b.guard.high),
        `${formatFrequency(b.guardedBand.low)} – ${formatFrequency(b.guardedBand.high)}`,
      ]),
    ),
  ];
  if (intervals.length === 0) {
    lines.push(`No rate between ${formatFrequency(report.limits.minRate)} and ${formatFrequency(report.limits.maxRate)} holds every band whole and apart.`);
  } else {
    const rows = intervals.map((row) => [
      formatFrequency(row.minRate),
      formatFrequency(row.maxRate),
      row.minRate === row.maxRate ? 'single rate' : formatFrequency(row.width, 4),
      row.tolerancePpm === null ? '–' : `±${trimmed(row.tolerancePpm, 4)}`,
      ...row.zones.map((zone, i) => `${zone}${row.inverted[i] ? ' inv.' : ''}`),
    ]);
    lines.push('Rates valid for every band together (zone of each band; inv. = spectrally inverted):');
    lines.push(plainTable(['min rate', 'max rate', 'width', 'ppm at centre', ...bands.map((_, i) => `band ${i + 1}`)], rows));
    const lowest = formatFrequency(report.minimumRate ?? Infinity);
    lines.push(
      report.minimumIsSingleRate
        ? `Lowest valid rate: ${lowest}, a single rate (a hair above or below it fails; no clock tolerance fits).`
        : `Lowest valid rate: ${lowest}.`,
    );
  }
  lines.push(report.caution);
  return lines.join('\n') + '\n';
}
