import { quantityText } from '../text/quantity-text.js';
import { wrapProse } from './wrap-prose.js';
import { NOT_PLANNED, type ComparedPart, type CompareReport } from '../plan/compare-report.js';
import { textTable, type TextColumn } from './text-table.js';
import { toCsv } from './csv.js';
import { filterOrdersText } from './after-rate-words.js';
import { channelResultCells, zoneText } from './plan-table.js';

const T = quantityText('terminal');

/**
 * The comparison as text for people, laid out for a width: one row per part
 * and variant (deciding columns first; settings, drift room and SNR in a
 * second block when the width is short), then the family answer.
 *
 * @param report from compareReport
 * @param width characters per line (Infinity: one block; default 100)
 * @returns the text, ending in a newline
 * @example compareTable(planFamily([{ scenario: heronBase, source: 'heron-base.json' }]).comparison) // 'Clock parts compared on Heron-4 base...'
 */
export function compareTable(report: CompareReport, width = 100): string {
  const several = report.variants.length > 1;
  const rows = report.parts.flatMap((part, rank) =>
    part.perVariant.map((v, i) => [
      i === 0 ? String(rank + 1) : '',
      i === 0 ? part.label : '',
      ...(several ? [v.variant] : []),
      v.rate === null ? '–' : T.rate(v.rate),
      v.rate === null ? '–' : zoneText(v),
      v.rate === null ? '–' : T.frequency(v.worstMargin),
      v.rate === null ? 'not planned' : v.limitedBy,
      v.pass ? 'pass' : 'FAIL',
      T.settings(v.settings),
      headroomText(v.headroomPpm),
      T.tolerance(part.tolerancePpm),
      v.jitterSnrDb === null ? '–' : T.decibels(v.jitterSnrDb),
      v.channelSnrDb === null ? '–' : T.decibels(v.channelSnrDb),
      filterOrdersText(v),
    ]),
  );
  const columns: TextColumn[] = [
    { head: '#', role: 'key', align: 'right' },
    { head: 'part', role: 'key', wrap: true },
    ...(several ? [{ head: 'variant', role: 'key', wrap: true } as const] : []),
    { head: 'rate', align: 'right' },
    { head: 'zone', align: 'right' },
    { head: 'worst margin', align: 'right' },
    { head: 'limited by', wrap: true },
    { head: 'verdict' },
    { head: 'settings', role: 'detail' },
    { head: 'drift room', align: 'right', role: 'detail' },
    { head: 'tolerance', align: 'right', role: 'detail' },
    { head: 'jitter SNR dB', align: 'right', role: 'detail' },
    { head: 'channel SNR dB', align: 'right', role: 'detail' },
    { head: 'filter orders B/C/E', align: 'right', role: 'detail' },
  ];
  const lines = [
    wrapProse(`Clock parts compared on ${report.variants.join(', ')} (margins and verdicts hold over each part's whole tolerance):`, width),
    textTable(columns, rows, width),
  ];
  if (hasChannels(report)) lines.push(channelsBlock(report, several, width));
  if (report.parts.some((p) => p.perVariant.some((v) => v.rate === null))) lines.push(wrapProse(`Not planned: ${NOT_PLANNED}.`, width));
  if (several) lines.push(wrapProse(familyText(report), width));
  if (report.parts.some((p) => p.perVariant.some((v) => v.filterOrders !== null))) lines.push(wrapProse(FILTER_ORDERS_NOTE, width));
  lines.push(wrapProse(report.caution, width));
  return lines.join('\n\n') + '\n';
}

/** Whether a compared variant has several channels. */
function hasChannels(report: CompareReport): boolean {
  return report.parts.some((p) => p.perVariant.some((v) => v.channels !== undefined));
}

/** Each channel of the variants with several, at each part's rate: zone, NCO, worst margin, limiting check, verdict. */
function channelsBlock(report: CompareReport, several: boolean, width: number): string {
  const rows = report.parts.flatMap((part, rank) => {
    let first = true;
    return part.perVariant.flatMap((v) =>
      (v.channels ?? []).map((c, k) => {
        const cells = [
          first ? String(rank + 1) : '',
          first ? part.label : '',
          ...(several ? [k === 0 ? v.variant : ''] : []),
          ...channelResultCells(c),
        ];
        first = false;
        return cells;
      }),
    );
  });
  const columns: TextColumn[] = [
    { head: '#', role: 'key', align: 'right' },
    { head: 'part', role: 'key', wrap: true },
    ...(several ? [{ head: 'variant', role: 'key', wrap: true } as const] : []),
    { head: 'channel', role: 'key' },
    { head: 'zone', align: 'right' },
    { head: 'NCO', align: 'right' },
    { head: 'worst margin', align: 'right' },
    { head: 'limited by', wrap: true },
    { head: 'verdict' },
  ];
  const title = 'Each channel at each part\'s rate (# as above; NCO: the channel\'s centre after sampling, "inv": conjugate its output):';
  return wrapProse(title, width) + '\n' + textTable(columns, rows, width);
}

const FILTER_ORDERS_NOTE =
  'filter orders B/C/E: the least Butterworth / Chebyshev I / elliptic order (low-pass prototype) of an anti-alias filter ' +
  "that meets the mask at the part's rate; a shortfall of the scenario's filter fails the part only where an " +
  'out-of-band level is stated.';

function headroomText(headroom: ComparedPart['perVariant'][number]['headroomPpm']): string {
  return headroom === null ? '–' : T.driftRoom(headroom.down, headroom.up);
}

function familyText(report: CompareReport): string {
  if (report.family.length === 0) return 'One part for the whole family: none passes every variant.';
  const best = report.parts.filter((p) => report.family.includes(p.label));
  const list = best.map((p) => `${p.label} (worst margin ${T.frequency(p.familyWorstMargin)}, ${p.familyLimitedBy})`).join('; ');
  return `One part for the whole family, best first: ${list}.`;
}

/**
 * The comparison as CSV, one row per part and variant, every number in full
 * precision with its unit in the column name.
 *
 * @param report from compareReport
 * @returns CSV text, CRLF line ends
 * @example compareCsv(planFamily([{ scenario: heronBase, source: 'heron-base.json' }]).comparison) // 'part,frequency_hz,tolerance_ppm,...'
 */
export function compareCsv(report: CompareReport): string {
  const head = [
    'part',
    'frequency_hz',
    'tolerance_ppm',
    'jitter_s',
    'variant',
    'rate_hz',
    'N',
    'M',
    'D',
    'zone',
    'inverted',
    'worst_margin_hz',
    'limited_by',
    'headroom_down_ppm',
    'headroom_up_ppm',
    'jitter_snr_db',
    'channel_snr_db',
    'pass',
    'passes_all',
    'butterworth_order',
    'chebyshev_order',
    'elliptic_order',
    'mask_margin_db',
    ...(hasChannels(report) ? CHANNEL_CSV : []),
  ];
  const channelCells = hasChannels(report);
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
      ...(channelCells ? channelCsvCells(v.channels) : []),
    ]),
  );
  return toCsv(head, rows);
}

/** With several channels, one column per figure, each channel's value in order, separated by ";" (full precision). */
const CHANNEL_CSV = [
  'channels',
  'channel_zones',
  'channel_inverted',
  'channel_nco_hz',
  'channel_worst_margin_hz',
  'channel_limited_by',
  'channel_pass',
];

function channelCsvCells(channels: ComparedPart['perVariant'][number]['channels']): (string | null)[] {
  if (!channels) return CHANNEL_CSV.map(() => null);
  const list = (values: readonly unknown[]) => values.map((x) => (x === null ? '' : String(x))).join(';');
  return [
    list(channels.map((c) => c.label)),
    list(channels.map((c) => c.zone)),
    list(channels.map((c) => c.inverted)),
    list(channels.map((c) => c.nco)),
    list(channels.map((c) => c.worstMargin)),
    list(channels.map((c) => c.limitedBy)),
    list(channels.map((c) => c.pass)),
  ];
}
