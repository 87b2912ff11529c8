import { formatFrequency, trimmed } from '../units/format-frequency.js';
import type { PlanReport, ReportedCandidate, ReportedCheck } from '../plan/plan-report.js';
import { plainTable } from './table.js';
import { shiftSection } from './shift-table.js';
import { afterRateSection } from './after-rate-table.js';
import { candidateVerdict, maskShortfall } from './after-rate-words.js';

const MOST_CANDIDATES_SHOWN = 12;
const MOST_CHECKS_SHOWN = 30;

/** The solved plan as text for people: windows, feasible set, candidates, the best one's checks and, with ifShift, the best (IF shift, rate) pair. */
export function planTable(report: PlanReport): string {
  if (report.conflicts.length > 0) return [heading(report), conflictsSection(report), report.caution].join('\n\n') + '\n';
  const sections = [heading(report), windowsSection(report), feasibleSection(report), candidatesSection(report)];
  const focus = report.candidates[0];
  if (focus) sections.push(checksSection(focus));
  if (focus?.afterRate) sections.push(afterRateSection(focus));
  if (report.ifShift) sections.push(shiftSection(report.ifShift));
  sections.push(verdict(report), report.caution);
  return sections.join('\n\n') + '\n';
}

function heading(report: PlanReport): string {
  const { band, guard, search } = report;
  const blocking = report.interferers.filter((i) => i.blocking).length;
  return [
    `Scenario: ${report.scenario}`,
    `Wanted band ${range(band.low, band.high)} (width ${formatFrequency(band.high - band.low)}), guards ${formatFrequency(guard.low)} below and ${formatFrequency(guard.high)} above.`,
    `Rates searched ${range(search.minRate, search.maxRate)}; goal: ${goalText(report)}.`,
    `${report.interferers.length} interferers derived, ${blocking} strong enough to block.`,
    ...(report.derivation ? [derivationText(report.derivation)] : []),
  ].join('\n');
}

function derivationText(d: NonNullable<PlanReport['derivation']>): string {
  const strongest = d.strongestPruned === null ? '' : ` (the strongest at ${trimmed(d.strongestPruned, 4)} dBFS)`;
  const images = d.prunedImages > 0 ? `; ${d.prunedImages} interleaving images under it left out` : '';
  return `Mixing products to order ${d.maxOrder} (harmonics to ${Math.max(d.maxOrder, d.harmonicOrder)}): ${d.products} listed, ${d.pruned} at or under the threshold ${trimmed(d.threshold, 4)} dBFS left out${strongest}${images}.`;
}

function conflictsSection(report: PlanReport): string {
  return 'No sampling rate can work:\n' + report.conflicts.map((c) => `- ${c.sentence}`).join('\n');
}

function goalText(report: PlanReport): string {
  const goal = report.goal;
  return goal.kind === 'decimation' ? `decimation to ${formatFrequency(goal.outputRate)}` : goal.kind;
}

function windowsSection(report: PlanReport): string {
  if (report.windows.length === 0) return 'Legal windows: none inside the rate range.';
  const rows = report.windows.map((w) => [String(w.zone), yesNo(w.inverted), formatFrequency(w.minRate), formatFrequency(w.maxRate), formatFrequency(w.maxRate - w.minRate)]);
  return 'Legal windows (band with guards whole in one zone):\n' + plainTable(['zone', 'inverted', 'min rate', 'max rate', 'width'], rows);
}

function feasibleSection(report: PlanReport): string {
  if (report.feasible.length === 0) return 'Feasible intervals: none; every legal rate is blocked.';
  const rows = report.feasible.map((f) => [String(f.zone), yesNo(f.inverted), formatFrequency(f.minRate), formatFrequency(f.maxRate), formatFrequency(f.width), `±${trimmed(f.widthPpm, 4)}`]);
  return 'Feasible intervals (nothing blocking lands near the band):\n' + plainTable(['zone', 'inverted', 'min rate', 'max rate', 'width', 'ppm at centre'], rows);
}

function candidatesSection(report: PlanReport): string {
  const shown = report.candidates.slice(0, MOST_CANDIDATES_SHOWN);
  const rows = shown.map((c, i) => [
    String(i + 1),
    c.label,
    formatFrequency(c.rate),
    `±${trimmed(c.tolerancePpm, 4)}`,
    c.zone === null ? 'straddles' : String(c.zone),
    c.inverted === null ? '–' : yesNo(c.inverted),
    c.center === null ? '–' : formatFrequency(c.center),
    formatFrequency(c.worstMargin, 7),
    c.limitedBy,
    settingsText(c.settings),
    c.headroomPpm === null ? '–' : `−${trimmed(c.headroomPpm.down, 3)} / +${trimmed(c.headroomPpm.up, 3)}`,
    candidateVerdict(c),
  ]);
  const more = report.candidates.length - shown.length;
  const table = plainTable(['#', 'candidate', 'rate', 'ppm', 'zone', 'inverted', 'centre / NCO', 'worst margin', 'limited by', 'from part', 'headroom ppm', 'verdict'], rows);
  const unplanned = report.unplannedParts.length > 0 ? `\nNot planned (no rate inside the converter's range): ${report.unplannedParts.join(', ')}.` : '';
  return 'Candidates, best first (margins hold over each rate\'s whole ±ppm):\n' + table + (more > 0 ? `\n(+${more} more in --json)` : '') + unplanned;
}

/** A part's settings for people: "direct", "÷2" through a divider, "×93/1 ÷5" through a synthesiser (rate = f·N/M ÷ D). */
function settingsText(settings: ReportedCandidate['settings']): string {
  if (settings === null) return '–';
  const { N, M, D } = settings;
  if (N === 1 && M === 1) return D === 1 ? 'direct' : `÷${D}`;
  return `×${N}/${M}` + (D === 1 ? '' : ` ÷${D}`);
}

function checksSection(candidate: ReportedCandidate): string {
  const ordered = [...candidate.checks].sort((a, b) => Number(b.blocking) - Number(a.blocking) || a.margin - a.requiredMargin - (b.margin - b.requiredMargin));
  const shown = ordered.slice(0, MOST_CHECKS_SHOWN);
  const rows = shown.map((c) => checkRow(c));
  const more = ordered.length - shown.length;
  const inversion = candidate.conjugate ? '; spectrum inverted: conjugate the complex output (or tune the NCO to the negative frequency)' : '';
  const title = `Checks at ${candidate.label} (${formatFrequency(candidate.rate)}): zone edge margin ${formatFrequency(candidate.zoneEdgeMargin, 7)}` +
    (candidate.nco === null ? '' : `; NCO ${formatFrequency(candidate.nco)}${inversion}`) + ':';
  const omitted = candidate.checksOmitted;
  const rest = more > 0 ? `\n(+${more} more in --json${omitted > 0 ? `, ${omitted} more with --json --all-checks` : ''})` : omitted > 0 ? `\n(+${omitted} more with --json --all-checks)` : '';
  return title + '\n' + plainTable(['check', 'kind', 'input at this rate', 'aliased to', 'margin', 'level dBFS', 'level margin dB', 'blocks', 'verdict'], rows) + rest;
}

function checkRow(check: ReportedCheck): string[] {
  return [
    check.label,
    check.kind,
    range(check.input[0], check.input[1]),
    check.alias.map(([a, b]) => range(a, b)).join(', '),
    formatFrequency(check.margin, 7),
    trimmed(check.level, 4),
    trimmed(check.levelMargin, 4),
    yesNo(check.blocking),
    check.pass ? 'pass' : 'FAIL',
  ];
}

function verdict(report: PlanReport): string {
  const best = report.candidates.find((c) => c.label === report.best);
  if (best) return `Best: ${best.label} at ${formatFrequency(best.rate)}, zone ${best.zone}${best.inverted ? ' (inverted)' : ''}, worst margin ${formatFrequency(best.worstMargin)} (${best.limitedBy}).`;
  const nearest = report.candidates[0];
  if (!nearest) return 'No candidate: no legal window inside the rate range.';
  const failing = nearest.checks.filter((c) => !c.pass).sort((a, b) => a.margin - a.requiredMargin - (b.margin - b.requiredMargin))[0];
  const shortfall = maskShortfall(nearest);
  const cause = shortfall !== null && failing === undefined && nearest.zoneEdgeMargin >= 0
    ? shortfall
    : failing
    ? `${failing.label} lands ${formatFrequency(failing.margin)} from the band where ${formatFrequency(failing.requiredMargin)} is required (short by ${formatFrequency(failing.requiredMargin - failing.margin)})`
    : `the guarded band crosses a zone edge by ${formatFrequency(-nearest.zoneEdgeMargin)}`;
  return `No candidate passes. Nearest: ${nearest.label} at ${formatFrequency(nearest.rate)}: ${cause}.`;
}

function range(low: number, high: number): string {
  return low === high ? formatFrequency(low) : `${formatFrequency(low)} – ${formatFrequency(high)}`;
}

function yesNo(value: boolean): string {
  return value ? 'yes' : 'no';
}
