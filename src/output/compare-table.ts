import { formatFrequency, trimmed } from '../units/format-frequency.js';
import type { ComparedPart, CompareReport, VariantVerdict } from '../plan/compare-report.js';
import { plainTable } from './table.js';
import { toCsv } from './csv.js';
import { filterOrdersText } from './after-rate-words.js';

/** The comparison as text for people: one row per part and variant, then the family answer. */
export function compareTable(report: CompareReport): string {
  const several = report.variants.length > 1;
  const rows = report.parts.flatMap((part, rank) =>
    part.perVariant.map((v, i) => [
      i === 0 ? String(rank + 1) : '',
      i === 0 ? part.label : '',
      ...(several ? [v.variant] : []),
      v.rate === null ? '–' : formatFrequency(v.rate),
      settingsText(v),
      v.rate === null ? '–' : v.zone === null ? 'straddles' : String(v.zone),
      v.inverted === null ? '–' : v.inverted ? 'yes' : 'no',
      v.rate === null ? '–' : formatFrequency(v.worstMargin, 7),
      v.limitedBy,
      headroomText(v, part),
      v.jitterSnrDb === null ? '–' : trimmed(v.jitterSnrDb, 4),
      v.channelSnrDb === null ? '–' : trimmed(v.channelSnrDb, 4),
      filterOrdersText(v),
      v.pass ? 'pass' : 'FAIL',
    ]),
  );
  const head = ['#', 'part', ...(several ? ['variant'] : []), 'rate', 'N·M·D', 'zone', 'inverted', 'worst margin', 'limited by', 'drift room −/+ ppm (tol.)', 'jitter SNR dB', 'channel SNR dB', 'filter B/C/E', 'verdict'];
  const lines = [`Clock parts compared on ${report.variants.join(', ')} (margins and verdicts hold over each part's whole ±ppm):`, plainTable(head, rows)];
  if (several) lines.push(familyText(report));
  if (report.parts.some((p) => p.perVariant.some((v) => v.filterOrders !== null))) lines.push(FILTER_ORDERS_NOTE);
  lines.push(report.caution);
  return lines.join('\n\n') + '\n';
}

const FILTER_ORDERS_NOTE =
  'filter B/C/E: the least Butterworth / Chebyshev I / elliptic order (low-pass prototype) of an anti-alias filter\n' +
  "that meets the mask at the part's rate; a shortfall of the scenario's filter fails the part only where an\n" +
  'out-of-band level is stated.';


function settingsText(v: VariantVerdict): string {
  if (v.settings === null) return '–';
  const { N, M, D } = v.settings;
  return N === 1 && M === 1 && D === 1 ? 'direct' : `${N}·${M}·${D}`;
}

function headroomText(v: VariantVerdict, part: ComparedPart): string {
  if (v.headroomPpm === null) return `– (±${trimmed(part.tolerancePpm, 4)})`;
  return `${trimmed(v.headroomPpm.down, 4)} / ${trimmed(v.headroomPpm.up, 4)} (±${trimmed(part.tolerancePpm, 4)})`;
}

function familyText(report: CompareReport): string {
  if (report.family.length === 0) return 'One part for the whole family: none passes every variant.';
  const best = report.parts.filter((p) => report.family.includes(p.label));
  const list = best.map((p) => `${p.label} (worst margin ${formatFrequency(p.familyWorstMargin, 7)}, ${p.familyLimitedBy})`).join('; ');
  return `One part for the whole family, best first: ${list}.`;
}

/** The comparison as CSV, one row per part and variant. */
export function compareCsv(report: CompareReport): string {
  const head = ['part', 'frequency_hz', 'tolerance_ppm', 'jitter_s', 'variant', 'rate_hz', 'N', 'M', 'D', 'zone', 'inverted', 'worst_margin_hz', 'limited_by', 'headroom_down_ppm', 'headroom_up_ppm', 'jitter_snr_db', 'channel_snr_db', 'pass', 'passes_all', 'butterworth_order', 'chebyshev_order', 'elliptic_order', 'mask_margin_db'];
  const rows = report.parts.flatMap((p) =>
    p.perVariant.map((v) => [
      p.label,
      p.frequency,
      p.tolerancePpm,
      p.jitter,
      v.variant,
      v.rate,
      v.settings?.N ?? null,
      v.settings?.M ?? null,
      v.settings?.D ?? null,
      v.zone,
      v.inverted,
      v.rate === null ? null : v.worstMargin,
      v.limitedBy,
      v.headroomPpm?.down ?? null,
      v.headroomPpm?.up ?? null,
      v.jitterSnrDb,
      v.channelSnrDb,
      v.pass,
      p.passesAll,
      v.filterOrders?.butterworth ?? null,
      v.filterOrders?.chebyshev ?? null,
      v.filterOrders?.elliptic ?? null,
      v.maskMarginDb,
    ]),
  );
  return toCsv(head, rows);
}
