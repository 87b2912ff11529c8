import { quantityText, type QuantityText } from '../text/quantity-text.js';
import { wrapProse } from './wrap-prose.js';
import type { PlanReport, ReportedCandidate, ReportedChannelResult, ReportedCheck } from '../plan/plan-report.js';
import { textTable, type TextColumn } from './text-table.js';
import { shiftSection } from './shift-table.js';
import { afterRateSection } from './after-rate-table.js';
import { candidateVerdict, maskShortfall } from './after-rate-words.js';
import { orderedChecks, tiedGroups } from './plan-order.js';

const MOST_CANDIDATES_SHOWN = 12;
const MOST_CHECKS_SHOWN = 30;
const T = quantityText('terminal');

/**
 * The solved plan as text for people, laid out for a width: windows, feasible
 * set, candidates (deciding columns first; drift, settings and SNR in a
 * second block when the width is short), the first candidate's checks and,
 * with ifShift, the best (IF shift, rate) pair.
 *
 * @param report the solved plan
 * @param width characters per line (Infinity: every table in one block)
 * @returns the text, ending in a newline
 * @example planTable(report, 100).startsWith('Scenario: Heron-4 base') // true
 */
export function planTable(report: PlanReport, width = 100): string {
  const prose = (text: string) => wrapProse(text, width);
  if (report.conflicts.length > 0)
    return [heading(report, prose), conflictsSection(report, width), prose(report.caution)].join('\n\n') + '\n';
  const sections = [
    heading(report, prose),
    windowsSection(report, width),
    feasibleSection(report, width),
    candidatesSection(report, width),
    ...(report.channels.length > 1 ? [channelsSection(report, width)] : []),
  ];
  // Rates given with --rate each get their checks; a search shows the first candidate's.
  const typed = report.candidates.length > 0 && report.candidates.every((c) => c.origin === 'typed');
  for (const focus of typed ? report.candidates : report.candidates.slice(0, 1)) {
    sections.push(checksSection(focus, width));
    if (focus.afterRate) {
      // Several channels: what the rate asks for each channel (its mask, filter, noise and NCO word).
      if (report.channels.length > 1)
        for (const channel of focus.channels)
          sections.push(
            afterRateSection(
              { ...focus, label: `${focus.label}, channel ${channel.label}`, afterRate: channel.afterRate ?? null },
              false,
              width,
            ),
          );
      else sections.push(afterRateSection(focus, false, width));
    }
  }
  if (report.ifShift) sections.push(shiftSection(report.ifShift, width));
  sections.push(prose(verdict(report)), prose(report.caution));
  return sections.join('\n\n') + '\n';
}

function heading(report: PlanReport, prose: (text: string) => string): string {
  const { band, guard, search } = report;
  const blocking = report.interferers.filter((i) => i.blocking).length;
  const channels = report.channels.map(
    (c) =>
      `${c.label} ${T.extent(c.low, c.high)} (width ${T.frequency(c.high - c.low)}, guards ${T.frequency(c.guard.below)} below and ${T.frequency(c.guard.above)} above)`,
  );
  return [
    `Scenario: ${report.scenario}`,
    report.channels.length > 1
      ? `${report.channels.length} channels: ${channels.join('; ')}.`
      : `Wanted band ${T.extent(band.low, band.high)} (width ${T.frequency(band.high - band.low)}), guards ${T.frequency(guard.low)} below and ${T.frequency(guard.high)} above.`,
    `Rates searched ${T.extent(search.minRate, search.maxRate)}; goal: ${goalText(report)}.`,
    `${report.interferers.length} interferers derived, ${blocking} strong enough to block.`,
    ...derivationLines(report),
  ]
    .map(prose)
    .join('\n');
}

/** How the interferers were derived: one sentence, or with several channels one clause per channel (each has its own threshold). */
function derivationLines(report: PlanReport): string[] {
  const d = report.derivation;
  if (!d) return [];
  const orders = `Mixing products to order ${d.maxOrder} (harmonics to ${Math.max(d.maxOrder, d.harmonicOrder)})`;
  const perChannel = report.channels.filter((c) => c.derivation !== null);
  if (report.channels.length < 2 || perChannel.length < report.channels.length) return [`${orders}: ${derivationText(d, '; ')}.`];
  return [`${orders}, against each channel: ${perChannel.map((c) => `${c.label}: ${derivationText(c.derivation!, ', ')}`).join('; ')}.`];
}

/** The counts and threshold of one derivation; `join` goes before the images clause. */
function derivationText(d: NonNullable<PlanReport['derivation']>, join: string): string {
  const strongest = d.strongestPruned === null ? '' : ` (the strongest at ${T.level(d.strongestPruned)} dBFS)`;
  const images = d.prunedImages > 0 ? `${join}${d.prunedImages} interleaving images under it left out` : '';
  return `${d.products} listed, ${d.pruned} at or under the threshold ${T.level(d.threshold)} dBFS left out${strongest}${images}`;
}

function conflictsSection(report: PlanReport, width: number): string {
  return 'No sampling rate can work:\n' + report.conflicts.map((c) => wrapProse(`- ${c.sentence}`, width)).join('\n');
}

/**
 * The goal in words.
 *
 * @param report the solved plan
 * @returns e.g. "decimation to 30.72 MHz (rates a whole multiple of it)"
 * @example goalText(report) // 'widest-margin'
 */
export function goalText(report: PlanReport): string {
  const goal = report.goal;
  return goal.kind === 'decimation' ? `decimation to ${T.rate(goal.outputRate)} (rates a whole multiple of it)` : goal.kind;
}

function windowsSection(report: PlanReport, width: number): string {
  if (report.windows.length === 0) return 'Legal windows: none inside the rate range.';
  const several = report.channels.length > 1;
  const rows = report.windows.map((w) => [
    ...(several ? [channelZonesText(report, w.channelZones)] : [String(w.zone), yesNo(w.inverted)]),
    T.rateRange(w.minRate, w.maxRate),
    T.frequency(w.maxRate - w.minRate),
  ]);
  const columns: TextColumn[] = [
    ...(several ? [CHANNEL_ZONES] : ([{ head: 'zone', role: 'key', align: 'right' }, { head: 'inverted' }] as const)),
    { head: 'legal rates', align: 'right' },
    { head: 'width', align: 'right' },
  ];
  return wrapProse(`${windowsTitle(several)}:`, width) + '\n' + textTable(columns, rows, width);
}

function feasibleSection(report: PlanReport, width: number): string {
  if (report.feasible.length === 0) return 'Feasible intervals: none; every legal rate is blocked.';
  const several = report.channels.length > 1;
  const rows = report.feasible.map((f) => [
    ...(several ? [channelZonesText(report, f.channelZones)] : [String(f.zone), yesNo(f.inverted)]),
    T.rateRange(f.minRate, f.maxRate),
    T.frequency(f.width),
    T.tolerance(f.widthPpm),
  ]);
  const columns: TextColumn[] = [
    ...(several ? [CHANNEL_ZONES] : ([{ head: 'zone', role: 'key', align: 'right' }, { head: 'inverted' }] as const)),
    { head: 'feasible rates', align: 'right' },
    { head: 'width', align: 'right' },
    { head: 'drift at centre', align: 'right' },
  ];
  const title = `${feasibleTitle(several)}:`;
  return wrapProse(title, width) + '\n' + textTable(columns, rows, width);
}

const CHANNEL_ZONES: TextColumn = { head: 'channel zones', role: 'key', wrap: true };

/** The legal windows' heading, the same in the terminal and on the page. */
export function windowsTitle(severalChannels: boolean): string {
  return severalChannels
    ? 'Legal windows (every channel with its guards whole in a zone; rates rounded inward)'
    : 'Legal windows (band with guards whole in one zone; rates rounded inward)';
}

/** The feasible intervals' heading, the same in the terminal and on the page. */
export function feasibleTitle(severalChannels: boolean): string {
  return severalChannels
    ? 'Feasible intervals (nothing blocking lands near any channel, no channel near another)'
    : 'Feasible intervals (nothing blocking lands near the band)';
}

/**
 * Each channel's zone at a window or interval, by label.
 *
 * @param report the plan (its channels name the zones)
 * @param zones each channel's zone, in the channels' order
 * @returns e.g. "IF-A 2 inv, IF-B 3"
 * @example channelZonesText(report, [2]) // 'wanted 2 inv'
 */
export function channelZonesText(report: PlanReport, zones: readonly number[] | undefined): string {
  return report.channels
    .map((c, i) => `${c.label} ${zoneText({ zone: zones?.[i] ?? null, inverted: (zones?.[i] ?? 1) % 2 === 0 })}`)
    .join(', ');
}

/** With several channels: each channel at each candidate shown, its zone, NCO, worst margin, limiting check and verdict. */
function channelsSection(report: PlanReport, width: number): string {
  const shown = report.candidates.slice(0, MOST_CANDIDATES_SHOWN);
  const columns: TextColumn[] = [
    { head: '#', role: 'key', align: 'right' },
    { head: 'channel', role: 'key' },
    { head: 'zone', align: 'right' },
    { head: 'NCO', align: 'right' },
    { head: 'worst margin', align: 'right' },
    { head: 'limited by', wrap: true },
    { head: 'verdict' },
  ];
  const rows = shown.flatMap((c, i) => c.channels.map((ch, k) => [k === 0 ? String(i + 1) : '', ...channelResultCells(ch)]));
  const title =
    'Each channel at each candidate (# as above; NCO: the channel\'s centre after sampling, "inv": conjugate its output; the channel\'s own worst check):';
  return wrapProse(title, width) + '\n' + textTable(columns, rows, width);
}

function candidatesSection(report: PlanReport, width: number): string {
  const shown = report.candidates.slice(0, MOST_CANDIDATES_SHOWN);
  const goal = report.goal.kind;
  const columns: TextColumn[] = [
    { head: '#', role: 'key', align: 'right' },
    { head: 'candidate', role: 'key', wrap: true },
    { head: 'rate', align: 'right' },
    { head: 'zone', align: 'right' },
    { head: 'worst margin', align: 'right' },
    { head: 'limited by', wrap: true },
    { head: 'verdict' },
    ...(goal === 'decimation' ? [{ head: 'decimation factor', align: 'right' } as const] : []),
    ...(goal === 'quarter-rate' ? [{ head: 'centre from odd·rate/4', align: 'right' } as const] : []),
    { head: 'tolerance', align: 'right', role: 'detail' },
    { head: 'NCO', align: 'right', role: 'detail' },
    { head: 'settings', role: 'detail' },
    { head: 'drift room', align: 'right', role: 'detail' },
    { head: 'jitter SNR dB', align: 'right', role: 'detail' },
    { head: 'channel SNR dB', align: 'right', role: 'detail' },
  ];
  const rows = shown.map((c, i) => [
    String(i + 1),
    c.label,
    T.rate(c.rate),
    zoneText(c),
    T.frequency(c.worstMargin),
    c.limitedBy,
    candidateVerdict(c),
    ...candidateTailCells(c, goal, T),
  ]);
  const more = report.candidates.length - shown.length;
  const lines = [
    wrapProse('Candidates, best first (margins hold over each rate\'s whole tolerance; zone "2 inv": inverted):', width),
    textTable(columns, rows, width),
  ];
  if (more > 0) lines.push(`(+${more} more in --json)`);
  for (const tie of tiedGroups(shown)) lines.push(wrapProse(tie, width));
  if (report.unplannedParts.length > 0)
    lines.push(wrapProse(`Not planned (no rate inside the converter's range): ${report.unplannedParts.join(', ')}.`, width));
  return lines.join('\n');
}

/**
 * The cells after a candidate's verdict, the same in the terminal and on the
 * page: the goal's own column (decimation factor, or the centre's distance
 * from an odd multiple of rate/4), then tolerance, NCO, settings, drift room,
 * jitter SNR and channel SNR.
 *
 * @param c a candidate
 * @param goal the plan's goal
 * @param text the quantity writer of the medium
 * @returns the cell texts, '–' where a figure does not apply
 * @example candidateTailCells(candidate, 'widest-margin', quantityText('terminal'))[0] // '±50 ppm' (the demo's best: the widest-margin rate of an interval, at the scenario's tolerance)
 */
export function candidateTailCells(c: ReportedCandidate, goal: string, text: QuantityText): string[] {
  return [
    ...(goal === 'decimation' ? [factorText(c.decimationFactor)] : []),
    ...(goal === 'quarter-rate' ? [c.quarterRateOffset === null ? '–' : text.signedFrequency(c.quarterRateOffset)] : []),
    text.tolerance(c.tolerancePpm),
    c.nco === null ? '–' : text.rate(c.nco),
    text.settings(c.settings),
    c.headroomPpm === null ? '–' : text.driftRoom(c.headroomPpm.down, c.headroomPpm.up),
    c.jitterSnrDb === null ? '–' : text.decibels(c.jitterSnrDb),
    c.channelSnrDb === null ? '–' : text.decibels(c.channelSnrDb),
  ];
}

/**
 * One channel at one rate as the terminal tables write it (solve's and compare's channel tables).
 *
 * @param ch a channel's result at a candidate's rate
 * @returns channel, zone, NCO, worst margin, limited by, verdict
 * @example channelResultCells(candidate.channels[0]) // ['wanted', '2 inv', '46.663556 MHz', '5 MHz', 'Lower adjacent channel', 'pass'] (NCO: 186.663556 − 140 MHz)
 */
export function channelResultCells(
  ch: Pick<ReportedChannelResult, 'label' | 'zone' | 'inverted' | 'nco' | 'worstMargin' | 'limitedBy' | 'pass'>,
): string[] {
  return [
    ch.label,
    zoneText(ch),
    ch.nco === null ? '–' : T.rate(ch.nco),
    T.frequency(ch.worstMargin),
    ch.limitedBy,
    ch.pass ? 'pass' : 'FAIL',
  ];
}

/**
 * A zone for people: "2", "2 inv" when the band arrives inverted, "straddles" when it crosses a zone edge.
 *
 * @param c a candidate
 * @example zoneText(candidate) // '2 inv'
 */
export function zoneText(c: { readonly zone: number | null; readonly inverted: boolean | null }): string {
  if (c.zone === null) return 'straddles';
  return c.inverted ? `${c.zone} inv` : String(c.zone);
}

/**
 * A decimation factor: the whole number, or the ratio to 4 digits marked "not whole".
 *
 * @param factor rate ÷ output rate, or null
 * @example factorText(6) // '6'
 */
export function factorText(factor: number | null): string {
  if (factor === null) return '–';
  const whole = Math.round(factor);
  return Math.abs(factor - whole) <= 1e-9 * factor ? String(whole) : `${T.number(factor, 4)} (not whole)`;
}

function checksSection(candidate: ReportedCandidate, width: number): string {
  const ordered = orderedChecks(candidate.checks);
  const shown = ordered.slice(0, MOST_CHECKS_SHOWN);
  const more = ordered.length - shown.length;
  const inversion = candidate.conjugate
    ? '; the band arrives inverted: conjugate the complex output (or tune the NCO to the negative frequency)'
    : '';
  const at = T.candidate(candidate.label, candidate.rate);
  const title =
    candidate.channels.length > 1
      ? `Checks at ${at}, named channel: check; zone edge margin ${candidate.channels
          .map((c) => `${c.label} ${T.frequency(c.zoneEdgeMargin)}`)
          .join(', ')}. Blocking checks first, tightest first:`
      : `Checks at ${at}: zone edge margin ${T.frequency(candidate.zoneEdgeMargin)}` +
        (candidate.nco === null ? '' : `; NCO ${T.rate(candidate.nco)}${inversion}`) +
        '. Blocking checks first, tightest first:';
  const columns: TextColumn[] = [
    { head: 'check', role: 'key', wrap: true },
    { head: 'aliased to', wrap: true },
    { head: 'margin', align: 'right' },
    { head: 'level dBFS', align: 'right' },
    { head: 'blocks' },
    { head: 'verdict' },
    { head: 'kind', role: 'detail' },
    { head: 'input at this rate', role: 'detail', wrap: true },
    { head: 'level margin dB', align: 'right', role: 'detail' },
  ];
  const table = textTable(columns, shown.map(checkRow), width);
  const omitted = candidate.checksOmitted;
  const rest =
    more > 0
      ? `\n(+${more} more in --json${omitted > 0 ? `, ${omitted} more with --json --all-checks` : ''})`
      : omitted > 0
        ? `\n(+${omitted} more with --json --all-checks)`
        : '';
  return wrapProse(title, width) + '\n' + table + rest;
}

function checkRow(check: ReportedCheck): string[] {
  return [
    check.label,
    check.alias.map(([a, b]) => T.extent(a, b)).join(', '),
    T.frequency(check.margin),
    T.level(check.level),
    yesNo(check.blocking),
    check.pass ? 'pass' : 'FAIL',
    check.kind,
    T.extent(check.input[0], check.input[1]),
    T.decibels(check.levelMargin),
  ];
}

function verdict(report: PlanReport): string {
  if (report.candidates.length > 0 && report.candidates.every((c) => c.origin === 'typed')) {
    return report.candidates
      .map(
        (c) =>
          `${c.label}: ${c.pass ? 'passes' : 'FAILS'}, zone ${zoneText(c)}, worst margin ${T.frequency(c.worstMargin)} (${c.limitedBy}).`,
      )
      .join('\n');
  }
  const best = report.candidates.find((c) => c.label === report.best);
  if (best)
    return `Best: ${best.label} at ${T.rate(best.rate)}, zone ${zoneText(best)}, worst margin ${T.frequency(best.worstMargin)} (${best.limitedBy}).`;
  const nearest = report.candidates[0];
  if (!nearest) return 'No candidate: no legal window inside the rate range.';
  const failing = nearest.checks.filter((c) => !c.pass).sort((a, b) => a.margin - a.requiredMargin - (b.margin - b.requiredMargin))[0];
  const shortfall = maskShortfall(nearest);
  const cause =
    shortfall !== null && nearest.limitedByKind === 'anti-alias mask'
      ? shortfall
      : failing
        ? `${failing.label} lands ${T.frequency(failing.margin)} from the band where ${T.frequency(failing.requiredMargin)} is required (short by ${T.frequency(failing.requiredMargin - failing.margin)})`
        : `the guarded band crosses a zone edge by ${T.frequency(-nearest.zoneEdgeMargin)}`;
  return `No candidate passes. Nearest: ${nearest.label} at ${T.rate(nearest.rate)}: ${cause}.`;
}

function yesNo(value: boolean): string {
  return value ? 'yes' : 'no';
}
