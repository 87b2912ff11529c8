import { quantityText } from '../text/quantity-text.js';
import { escapeXml } from '../pictures/escape-xml.js';
import { rateMapSvg } from '../pictures/rate-map.js';
import { spectrumSvg } from '../pictures/spectrum.js';
import { bandPositionSvg } from '../pictures/band-position.js';
import type { PlanReport, ReportedCandidate } from '../plan/plan-report.js';
import type { CompareReport } from '../plan/compare-report.js';
import { candidateTailCells, channelZonesText, feasibleTitle, goalText, windowsTitle, zoneText } from './plan-table.js';
import { orderedChecks, tiedGroups } from './plan-order.js';
import { htmlTable } from './html-table.js';
import { shiftParts } from './shift-table.js';
import { afterRateHtml } from './after-rate-html.js';
import { candidateVerdict, filterOrdersText, maskShortfall } from './after-rate-words.js';
import { filterMaskSvg } from '../pictures/filter-mask.js';
import { glossarySection } from './html-glossary.js';
import { eachChannelView, severalChannels, type ChannelCandidate, type ChannelPlanReport } from '../pictures/channels.js';
import { extentMagnitude } from '../math/fold-extent.js';

const T = quantityText('html');

const JOB =
  'Sample-clock plan for an IF-sampling receiver: the rates at which the wanted channel sits whole in one Nyquist zone with its guard bands and nothing strong enough folds onto it.';

const STYLE = `
body { font-family: sans-serif; font-size: 10.5pt; color: #000; margin: 1.5em; }
h1 { font-size: 16pt; margin-bottom: 0.2em; } h2 { font-size: 13pt; border-bottom: 1px solid #000; margin-top: 2em; } h3 { font-size: 11pt; }
table { border-collapse: collapse; margin: 0.6em 0 1.2em; font-size: 9pt; } caption { text-align: left; font-weight: bold; padding: 0.2em 0; }
th, td { border: 1px solid #888; padding: 2px 6px; text-align: left; vertical-align: top; } th { background: #eee; }
td.num { white-space: nowrap; text-align: right; } figure svg { max-width: 100%; }
td.fail { font-weight: bold; text-decoration: underline; } td.pass { font-style: italic; }
.caution { border: 2px solid #000; padding: 0.6em 1em; margin: 1em 0; }
figure { margin: 1em 0; page-break-inside: avoid; } svg { max-width: 100%; height: auto; }
dl.glossary { display: grid; grid-template-columns: max-content 1fr; gap: 0.15em 1.2em; font-size: 9pt; } dl.glossary dt { font-weight: bold; } dl.glossary dd { margin: 0; }
@media print { body { margin: 0; } h2 { page-break-before: always; } h2:first-of-type { page-break-before: avoid; } }
`;

/** What the review page shows: each variant's plan, and the part comparison when there are several. */
export interface ReviewContents {
  readonly plans: readonly PlanReport[];
  /** The comparison of clock parts across the variants; null for a single scenario. */
  readonly comparison: CompareReport | null;
  /** When the page was made, as text (the shell supplies it). */
  readonly generated: string;
  readonly version: string;
}

/**
 * One self-contained HTML page for a design review: tables and inline SVG, no
 * scripts, no external fonts or links, printable.
 *
 * @param contents the plans, the comparison, and the page's provenance
 */
export function reviewPage(contents: ReviewContents): string {
  const names = contents.plans.map((p) => p.scenario).join(', ');
  const caution = contents.plans[0]?.caution ?? '';
  const sections = [
    `<h1>Frequency plan review: ${escapeXml(names)}</h1>`,
    `<p>${escapeXml(JOB)}</p>`,
    `<p class="caution"><strong>Caution.</strong> ${escapeXml(caution)} Converter spur levels vary with the part, the input level, temperature and the clock.</p>`,
    contents.comparison ? comparisonSection(contents.comparison) : '',
    ...contents.plans.map(planSection),
  ];
  const footer = `<p>Made by ifzone ${escapeXml(contents.version)} on ${escapeXml(contents.generated)}. Every margin names the two extents it was measured between; the JSON output of <code>ifzone solve</code> carries every figure.</p>`;
  // The legend explains what the page shows: its column headers and abbreviations.
  sections.push(glossarySection([...sections, footer].join('\n')), footer);
  return `<!DOCTYPE html>\n<html lang="en"><head><meta charset="utf-8"><title>${escapeXml(`Frequency plan review: ${names}`)}</title><style>${STYLE}</style></head><body>${sections.join('\n')}</body></html>\n`;
}

function comparisonSection(report: CompareReport): string {
  const rows = report.parts.flatMap((p) =>
    p.perVariant.map((v) => [
      p.label,
      v.variant,
      v.rate === null ? '–' : T.rate(v.rate),
      T.settings(v.settings),
      v.rate === null ? '–' : zoneText(v),
      v.rate === null ? '–' : T.frequency(v.worstMargin),
      v.rate === null ? 'not planned' : v.limitedBy,
      v.headroomPpm === null ? '–' : T.driftRoom(v.headroomPpm.down, v.headroomPpm.up),
      T.tolerance(p.tolerancePpm),
      v.jitterSnrDb === null ? '–' : T.decibels(v.jitterSnrDb),
      v.channelSnrDb === null ? '–' : T.decibels(v.channelSnrDb),
      filterOrdersText(v),
      verdictCell(v.pass),
    ]),
  );
  const family =
    report.family.length > 0 ? `One part for the whole family, best first: ${report.family.join(', ')}.` : 'No part passes every variant.';
  return (
    '<h2>Clock parts across the variants</h2>' +
    htmlTable(
      [
        'part',
        'variant',
        'rate',
        'settings',
        'zone',
        'worst margin',
        'limited by',
        'drift room',
        'tolerance',
        'jitter SNR dB',
        'channel SNR dB',
        'filter orders B/C/E',
        'verdict',
      ],
      rows,
    ) +
    `<p>${escapeXml(family)}</p>`
  );
}

function planSection(report: PlanReport): string {
  const focus = report.candidates.find((c) => c.label === report.best) ?? report.candidates[0];
  const multi = severalChannels(report);
  // With several channels, one band-position chart, filter mask and after-rate section per channel.
  const views = eachChannelView(report);
  const pictures = [
    rateMapSvg(report),
    focus ? spectrumSvg(report, focus.label) : '',
    ...views.map((view) => bandPositionSvg(view, focus?.label)),
    ...(focus ? views.map((view) => filterMaskSvg(view, focus.label)) : []),
  ].filter((svg) => svg !== '');
  const afterRates = focus
    ? multi
      ? (focus as ChannelCandidate).channels.map((ch) =>
          afterRateHtml({ ...focus, label: `${focus.label}, channel ${ch.label}`, afterRate: ch.afterRate ?? null }),
        )
      : [afterRateHtml(focus)]
    : [];
  return [
    `<h2>${escapeXml(report.scenario)}</h2>`,
    inputsTables(report),
    ...(multi ? [channelsTable(multi)] : []),
    windowsTable(report),
    feasibleTable(report),
    candidatesTable(report),
    ...(multi ? [channelResultsTable(multi)] : []),
    multi && focus ? channelChecksTables(focus as ChannelCandidate) : focus ? checksTable(focus) : '',
    report.ifShift ? shiftHtml(report.ifShift) : '',
    ...afterRates,
    `<p><strong>${escapeXml(verdictLine(report, focus))}</strong></p>`,
    ...pictures.map((svg) => `<figure>${svg}</figure>`),
  ].join('\n');
}

function inputsTables(report: PlanReport): string {
  const { band, guard, search } = report;
  const inputs = htmlTable(
    ['wanted band', 'guards', 'rates searched', 'goal'],
    [
      [
        T.extent(band.low, band.high),
        `${T.frequency(guard.low)} below, ${T.frequency(guard.high)} above`,
        T.extent(search.minRate, search.maxRate),
        goalText(report),
      ],
    ],
    'Inputs',
  );
  const interferers = htmlTable(
    ['interferer', 'kind', 'source', 'input frequencies', 'level dBFS', 'required margin', 'blocks'],
    report.interferers.map((i) => [
      i.label,
      i.kind,
      i.source,
      inputFrequencies(i),
      T.level(i.level),
      T.frequency(i.requiredMargin),
      i.blocking ? 'yes' : 'no',
    ]),
    'Interferers (input frequencies; r is the sampling rate; levels at the converter)',
  );
  return inputs + interferers;
}

function windowsTable(report: PlanReport): string {
  if (report.windows.length === 0) return '<p>No legal window inside the rate range.</p>';
  const several = report.channels.length > 1;
  const rows = report.windows.map((w) => [...zoneCells(report, w), T.rateRange(w.minRate, w.maxRate), T.frequency(w.maxRate - w.minRate)]);
  return htmlTable([...zoneHeads(several), 'legal rates', 'width'], rows, windowsTitle(several));
}

function feasibleTable(report: PlanReport): string {
  if (report.feasible.length === 0) return '<p>No feasible interval: every legal rate is blocked.</p>';
  const several = report.channels.length > 1;
  const rows = report.feasible.map((f) => [
    ...zoneCells(report, f),
    T.rateRange(f.minRate, f.maxRate),
    T.frequency(f.width),
    T.tolerance(f.widthPpm),
  ]);
  return htmlTable([...zoneHeads(several), 'feasible rates', 'width', 'drift at centre'], rows, feasibleTitle(several));
}

/** A window's or interval's zone: zone and inversion for one band, every channel's zone for several (as the terminal writes them). */
function zoneCells(report: PlanReport, w: { zone: number; inverted: boolean; channelZones?: readonly number[] }): string[] {
  return report.channels.length > 1 ? [channelZonesText(report, w.channelZones)] : [String(w.zone), w.inverted ? 'yes' : 'no'];
}

function zoneHeads(several: boolean): string[] {
  return several ? ['channel zones'] : ['zone', 'inverted'];
}

function candidatesTable(report: PlanReport): string {
  const goal = report.goal.kind;
  const rows = report.candidates.map((c, i) => [
    String(i + 1),
    c.label,
    T.rate(c.rate),
    zoneText(c),
    T.frequency(c.worstMargin),
    c.limitedBy,
    c.pass ? verdictCell(true) : ([candidateVerdict(c), 'fail'] as const),
    ...candidateTailCells(c, goal, T),
  ]);
  const head = [
    '#',
    'candidate',
    'rate',
    'zone',
    'worst margin',
    'limited by',
    'verdict',
    ...(goal === 'decimation' ? ['decimation factor'] : []),
    ...(goal === 'quarter-rate' ? ['centre from odd·rate/4'] : []),
    'tolerance',
    'NCO',
    'settings',
    'drift room',
    'jitter SNR dB',
    'channel SNR dB',
  ];
  const ties = tiedGroups(report.candidates, 'html')
    .map((t) => `<p>${escapeXml(t)}</p>`)
    .join('');
  return htmlTable(head, rows, "Candidates, best first (over each rate's whole tolerance)") + ties;
}

/** The channels of a multi-channel plan: band, guards and levels of each. */
function channelsTable(report: ChannelPlanReport): string {
  return htmlTable(
    ['channel', 'edges', 'guards', 'weakest level dBFS', 'strongest level dBFS'],
    report.channels.map((c) => [
      c.label,
      T.extent(c.low, c.high),
      `${T.frequency(c.guard.below)} below, ${T.frequency(c.guard.above)} above`,
      c.weakestLevel === null ? '–' : T.level(c.weakestLevel),
      c.strongestLevel === null ? '–' : T.level(c.strongestLevel),
    ]),
    `Channels (${report.channels.length}, digitised together by one converter)`,
  );
}

/** Every candidate's result per channel: one row per candidate and channel, the candidate's rank and rate on its first row. */
function channelResultsTable(report: ChannelPlanReport): string {
  const rows = report.candidates.flatMap((c, i) =>
    c.channels.map((ch, k) => [
      k === 0 ? String(i + 1) : '',
      k === 0 ? c.label : '',
      k === 0 ? T.rate(c.rate) : '',
      ch.label,
      zoneText(ch),
      ch.center === null ? '–' : T.rate(ch.center),
      ch.nco === null ? '–' : `${T.rate(ch.nco)}${ch.conjugate ? ', conjugate' : ''}`,
      T.frequency(ch.worstMargin),
      ch.limitedBy,
      verdictCell(ch.pass),
    ]),
  );
  return htmlTable(
    ['#', 'candidate', 'rate', 'channel', 'zone', 'centre after sampling', 'NCO', 'worst margin', 'limited by', 'verdict'],
    rows,
    'Each channel at each candidate (a candidate passes when every channel does)',
  );
}

/** The checks of the candidate in focus, one table per channel (the checks against that channel). */
function channelChecksTables(candidate: ChannelCandidate): string {
  return candidate.channels.map((ch) => checksTable({ ...candidate, checks: ch.checks ?? [] }, ` against channel ${ch.label}`)).join('\n');
}

function checksTable(candidate: ReportedCandidate, against = ''): string {
  const rows = orderedChecks(candidate.checks).map((c) => [
    c.label,
    c.kind,
    T.extent(c.input[0], c.input[1]),
    c.alias.map(([a, b]) => T.extent(a, b)).join(', '),
    T.frequency(c.margin),
    T.level(c.level),
    T.decibels(c.levelMargin),
    c.blocking ? 'yes' : 'no',
    verdictCell(c.pass),
  ]);
  return htmlTable(
    ['check', 'kind', 'input at this rate', 'aliased to', 'margin', 'level dBFS', 'level margin dB', 'blocks', 'verdict'],
    rows,
    `Checks at ${T.candidate(candidate.label, candidate.rate)}${against}, blocking checks first, tightest first`,
  );
}

/**
 * An interferer's input frequencies, r the rate: a fixed extent reaching below 0 Hz (a difference product, −B…B) at the
 * frequencies |f| where a real signal is, as the checks' "input at this rate" writes it.
 */
function inputFrequencies(i: PlanReport['interferers'][number]): string {
  if (i.rateMultiple !== 0) return T.tiedExtent(i.rateMultiple, i.low, i.high);
  const magnitude = extentMagnitude(i.low, i.high);
  return T.extent(magnitude.low, magnitude.high);
}

function shiftHtml(shift: NonNullable<PlanReport['ifShift']>): string {
  const { title, columns, rows, searched } = shiftParts(shift, 'html');
  const heading = '<h3>Best IF shift and rate</h3>';
  if (rows.length === 0) return `${heading}<p>${escapeXml(title)} No rate is feasible at any seed shift (${escapeXml(searched)})</p>`;
  return `${heading}${htmlTable(
    columns.map((c) => c.head),
    rows,
    title,
  )}<p>${escapeXml(searched)}</p>`;
}

function verdictLine(report: PlanReport, focus: ReportedCandidate | undefined): string {
  if (!focus) return 'No candidate: no legal window inside the rate range.';
  if (report.best === null) {
    const mask = candidateVerdict(focus) === 'FAIL: mask' ? maskShortfall(focus, T) : null;
    return `No candidate passes; the nearest is ${focus.label} at ${T.rate(focus.rate)}, ${mask ?? `limited by ${focus.limitedBy}`}.`;
  }
  return `Best: ${focus.label} at ${T.rate(focus.rate)}, zone ${zoneText(focus)}, worst margin ${T.frequency(focus.worstMargin)} (${focus.limitedBy}).`;
}

function verdictCell(pass: boolean): readonly [string, string] {
  return pass ? ['pass', 'pass'] : ['FAIL', 'fail'];
}
