import { formatFrequency, trimmed } from '../units/format-frequency.js';
import type { BandImage } from '../math/band.js';
import type { WindowsReport } from '../report/windows-report.js';
import { plainTable } from './table.js';

/** The windows report as text for people. */
export function windowsTable(report: WindowsReport): string {
  const { band, guard, guardedBand, windows } = report;
  const lines = [
    `Band ${formatFrequency(band.low)} – ${formatFrequency(band.high)}` +
      ` (width ${formatFrequency(band.high - band.low)}), guards ${formatFrequency(guard.low)} below, ${formatFrequency(guard.high)} above:` +
      ` holding ${formatFrequency(guardedBand.low)} – ${formatFrequency(guardedBand.high)}.`,
  ];
  if (windows.length === 0) {
    lines.push(`No legal sampling rate between ${formatFrequency(report.limits.minRate)} and ${formatFrequency(report.limits.maxRate)}.`);
  } else {
    const rows = windows.map((w) => [
      String(w.zone),
      w.inverted ? 'yes' : 'no',
      formatFrequency(w.minRate),
      formatFrequency(w.maxRate),
      formatFrequency(w.width),
      w.tolerancePpm === null ? '–' : `±${trimmed(w.tolerancePpm, 4)}`,
      w.center === null ? '–' : formatFrequency(w.center),
      imageText(w.image),
    ]);
    lines.push(plainTable(['zone', 'inverted', 'min rate', 'max rate', 'width', 'ppm at centre', 'centre rate', 'band lands at (centre)'], rows));
    lines.push(`Lowest legal rate: ${formatFrequency(report.minimumRate ?? Infinity)}.`);
  }
  lines.push(report.caution);
  return lines.join('\n') + '\n';
}

function imageText(image: BandImage | null): string {
  if (image === null) return '–';
  return `${formatFrequency(image.low)} – ${formatFrequency(image.high)}${image.inverted ? ' (mirrored)' : ''}`;
}
