import { formatFrequency } from '../units/format-frequency.js';
import type { AliasReport } from '../report/alias-report.js';
import { plainTable } from './table.js';

/** The alias report as text for people. */
export function aliasTable(report: AliasReport): string {
  const rows = report.tones.map((t) => [
    formatFrequency(t.frequency),
    formatFrequency(t.alias),
    String(t.zone),
    t.inverted ? 'yes' : 'no',
    t.lookalikes.map((f) => formatFrequency(f)).join(', '),
  ]);
  return [
    `Sampled at ${formatFrequency(report.rate)} (first Nyquist zone 0 – ${formatFrequency(report.rate / 2)}):`,
    plainTable(['frequency', 'shows at', 'zone', 'inverted', 'cannot be told from'], rows),
    report.caution,
  ].join('\n') + '\n';
}
