import type { PlanReport, ReportedCandidate } from '../plan/plan-report.js';
import { quantityText } from '../text/quantity-text.js';

const T = quantityText('svg');
import type { RateWindow } from '../windows/rate-window.js';
import { horizontalAxis } from './axis.js';
import { frequencyUnit, inUnit } from './frequency-unit.js';
import { packLabels, wrapPhrases, type PlacedLabel } from './label-packing.js';
import { clipped, TEXT_DESCENT, textWidth } from './typography.js';
import { boxSwatch, legendRows, LEGEND_FONT } from './legend.js';
import { candidateMarker, failMarker, passMarker } from './markers.js';
import { linearTicks, logTicks } from './nice-ticks.js';
import { FILL } from './patterns.js';
import { rateMapView } from './rate-map-view.js';
import { linearScale, logScale, type Scale } from './scale.js';
import { element, px, textElement } from './svg-element.js';
import { svgDocument, type Figure } from './svg-document.js';
import { blockingKeys, blockedGroups, type BlockedGroup } from './blocked-groups.js';
import { severalChannels, type ChannelPlanReport } from './channels.js';
import { channelLaneNotes, channelLanes } from './channel-lanes.js';
import { COLLIDE_FILL } from './patterns.js';

const WIDTH = 960;
const LEFT = 132;
const RIGHT = 24;
const TOP = 60;
const BODY = 16;
const CANDIDATE_ROWS = 4;
const CANDIDATE_ROW = 12;
const BLOCKED_ROWS = 4;
/** A bracket (3 px) over its label's text, clear of the row above's descenders. */
const BLOCKED_ROW = 15;
const SMALL = 9.5;
/** The lane's "not marked" note under its title. */
const NOTE_FONT = 8.5;
const NOTE_LINE = 10;

interface Lane {
  readonly title: string;
  readonly window: RateWindow | null;
  readonly candidates: readonly PlacedLabel<ReportedCandidate>[];
  readonly markers: readonly ReportedCandidate[];
  readonly blocked: readonly PlacedLabel<BlockedGroup>[];
  /** "not marked: …" naming the key numbers of the checks whose brackets found no row, wrapped to the title column. */
  readonly thinned: readonly string[];
  readonly height: number;
  /** What the lane draws from: the report, or with several channels the part of it inside the lane's window. */
  readonly scope: PlanReport;
  /** The window's fill: its zone's (upright or inverted) for one band; one pale fill for the windows of all channels. */
  readonly fill: string;
}

/** The fill of a window where every channel is whole (each channel's zone and inversion is in the lane's name). */
const JOINT_FILL = '#e4ebf2';

/**
 * The rate map as a figure: one lane per Nyquist-zone window (zone 1 at the
 * top, so the lanes step down as the rate falls), each window outlined
 * (inverted zones dotted and marked "(inv)"), its blocked sub-ranges hatched
 * with a bracket labelled by the blocking check (ranges with the same edges
 * share one bracket; a label with no room falls back to its key number and
 * is left out when even that has none), its feasible intervals solid, and
 * the candidates as markers (disc: passes; crossed square: fails). The axis
 * zooms onto the windows drawn and turns logarithmic for long spans (see
 * rateMapView); the legend keys only the kinds drawn, and lists every
 * blocking label with its key.
 *
 * With several channels, lanes above those show each channel's own windows
 * and, for each pair of channels, the rates at which their aliases come too
 * close (see channelLanes); the lanes below them are the channels together.
 *
 * @param report the solved plan
 * @returns the figure (width 960 px, height from the lanes)
 */
export function rateMapFigure(report: PlanReport): Figure {
  const view = rateMapView(report);
  const plot: readonly [number, number] = [LEFT, WIDTH - RIGHT];
  const scale: Scale = view.log ? logScale([view.low, view.high], plot) : linearScale([view.low, view.high], plot);
  const keys = blockingKeys(report);
  const inAxis = (rate: number) => rate >= view.low && rate <= view.high;
  const zonesWithWindow = new Set(report.windows.map((w) => w.zone));
  const multi = severalChannels(report);
  // With several channels a zone of the first channel holds several windows: each lane draws what lies inside its own.
  const lanes: Lane[] = view.windows.map((w) => {
    const scope = multi ? windowScope(report, w) : report;
    return lane(
      multi ? jointTitle(w) : `zone ${w.zone}${w.inverted ? ' (inv)' : ''}`,
      w,
      scope.candidates.filter((c) => c.zone === w.zone && inAxis(c.rate)),
      blockedGroups(scope, w.zone, keys),
      scale,
      report,
      scope,
      multi ? JOINT_FILL : w.inverted ? FILL.inverted : '#fff',
    );
  });
  const outside = (c: ReportedCandidate) =>
    multi ? !report.windows.some((w) => within(c.rate, w)) : c.zone === null || !zonesWithWindow.has(c.zone);
  const others = report.candidates.filter((c) => outside(c) && inAxis(c.rate));
  if (others.length > 0) lanes.push(lane('outside windows', null, others, [], scale, report, report, '#fff'));
  const markers = lanes.flatMap((l) => l.markers);
  const drawnCandidates = markers.length;
  // The zones whose windows are drawn: only their blocked and feasible ranges are.
  const drawnZones = new Set(view.windows.map((w) => w.zone));

  const parts: string[] = [multi ? channelHeading(multi) : heading(report)];
  let y = TOP;
  const own = multi ? channelLanes(multi, scale, y, view.low, view.high) : null;
  if (own) {
    parts.push(own.markup);
    y += own.height + 6;
  }
  for (const [index, l] of lanes.entries()) {
    parts.push(drawLane(l, y, scale, report, index));
    y += l.height;
  }
  if (lanes.length === 0) {
    parts.push(
      textElement((LEFT + WIDTH - RIGHT) / 2, y + 24, 'No legal window inside the search range', {
        'text-anchor': 'middle',
        'font-size': 12,
      }),
    );
    y += 48;
  }
  const unit = frequencyUnit(view.high);
  const tickValues = view.log ? logTicks(view.low, view.high) : linearTicks(view.low, view.high, 8).values;
  const ticks = tickValues.map((v) => ({ value: v, label: inUnit(v, unit) }));
  parts.push(horizontalAxis(scale, ticks, y + 4, `sampling rate (${unit.unit})${view.log ? ', logarithmic' : ''}`, TOP));
  y += 60;
  const legend = legendRows(
    [
      { swatch: boxSwatch('#fff'), text: 'window, upright zone', drawn: own ? own.drawn.upright : view.windows.some((w) => !w.inverted) },
      {
        swatch: boxSwatch(FILL.inverted),
        text: 'window, inverted zone (inv)',
        drawn: own ? own.drawn.inverted : view.windows.some((w) => w.inverted),
      },
      { swatch: boxSwatch(JOINT_FILL), text: 'every channel whole (zones in order)', drawn: own !== null && view.windows.length > 0 },
      { swatch: boxSwatch(FILL.blocked), text: 'blocked', drawn: report.blocked.some((r) => drawnZones.has(r.zone)) },
      { swatch: boxSwatch(COLLIDE_FILL), text: "two channels' aliases too close", drawn: own?.drawn.collide ?? false },
      { swatch: boxSwatch(FILL.feasible), text: 'feasible', drawn: report.feasible.some((r) => drawnZones.has(r.zone)) },
      { swatch: (x, yy) => passMarker(x, yy), text: 'candidate passes', drawn: markers.some((c) => c.pass), marker: true },
      { swatch: (x, yy) => failMarker(x, yy), text: 'candidate fails', drawn: markers.some((c) => !c.pass), marker: true },
    ],
    LEFT - 100,
    y,
    WIDTH - RIGHT,
  );
  parts.push(legend.markup);
  y += legend.height + 8;
  const notes = [
    ...candidateLines(report),
    ...keyLines(keys),
    ...(multi && own ? channelLaneNotes(multi, own.rates) : []),
    ...viewNotes(view, report, drawnCandidates),
  ];
  for (const line of notes) {
    const indent = line.startsWith('  ') ? 16 : 0;
    parts.push(textElement(LEFT - 100 + indent, y + LEGEND_FONT, line.trim(), { 'font-size': LEGEND_FONT }));
    y += LEGEND_FONT + 5;
  }
  return { width: WIDTH, height: Math.ceil(y + 10), title: `Rate map: ${report.scenario}`, body: parts.join('') };
}

/**
 * The rate map as a standalone SVG document (see rateMapFigure).
 *
 * @param report the solved plan
 * @returns SVG text, 960 px wide
 * @example rateMapSvg(report).includes('zone 2 (inv)') // true
 */
export function rateMapSvg(report: PlanReport): string {
  return svgDocument(rateMapFigure(report));
}

function heading(report: PlanReport): string {
  const { band, guard, search } = report;
  const sub = `wanted ${T.extent(band.low, band.high)}, guards ${T.frequency(guard.low)} below / ${T.frequency(guard.high)} above; rates searched ${T.extent(search.minRate, search.maxRate)}`;
  return (
    textElement(LEFT - 100, 22, clipped(`Sampling-rate map: ${report.scenario}`, WIDTH - LEFT + 100 - 12, 14, { bold: true }), {
      'font-size': 14,
      'font-weight': 'bold',
    }) + textElement(LEFT - 100, 40, clipped(sub, WIDTH - LEFT + 100 - 12, 11), { 'font-size': 11 })
  );
}

function channelHeading(report: ChannelPlanReport): string {
  const channels = report.channels.map((c) => `${c.label} ${T.extent(c.low, c.high)}`).join(', ');
  const sub = `${report.channels.length} channels: ${channels}; rates searched ${T.extent(report.search.minRate, report.search.maxRate)}`;
  return (
    textElement(LEFT - 100, 22, `Sampling-rate map: ${report.scenario}`, { 'font-size': 14, 'font-weight': 'bold' }) +
    textElement(LEFT - 100, 40, sub, { 'font-size': 11 })
  );
}

/** A lane of the channels together: each channel's zone in order, the inverted ones marked. */
function jointTitle(w: RateWindow): string {
  return `zones ${(w.channelZones ?? [w.zone]).map((z) => (z % 2 === 0 ? `${z}i` : String(z))).join(' / ')}`;
}

function within(rate: number, w: RateWindow): boolean {
  return rate >= w.minRate && rate <= w.maxRate;
}

/** The part of a report inside one window: its blocked ranges, feasible intervals and candidates. */
function windowScope(report: PlanReport, w: RateWindow): PlanReport {
  const inside = (r: { readonly minRate: number; readonly maxRate: number }) => r.minRate >= w.minRate && r.maxRate <= w.maxRate;
  return {
    ...report,
    blocked: report.blocked.filter((b) => b.zone === w.zone && inside(b)),
    feasible: report.feasible.filter((f) => f.zone === w.zone && inside(f)),
    candidates: report.candidates.filter((c) => within(c.rate, w)),
  };
}

function lane(
  title: string,
  window: RateWindow | null,
  candidates: readonly ReportedCandidate[],
  groups: readonly BlockedGroup[],
  scale: Scale,
  report: PlanReport,
  scope: PlanReport,
  fill: string,
): Lane {
  const plot = scale.range;
  const placedCandidates = packLabels(
    // A label with no room falls back to the candidate's rank, the number every table gives it; the notes list them.
    candidates.map((c) => ({
      x: scale.at(c.rate),
      text: c.label,
      short: String(report.candidates.indexOf(c) + 1),
      leader: scale.at(c.rate),
      bold: c.label === report.best,
      item: c,
    })),
    CANDIDATE_ROWS,
    plot,
    SMALL,
  );
  const placedBlocked = packLabels(
    groups.map((g) => {
      const spans = g.ranges.map(([a, b]) => [scale.at(a), scale.at(b)] as const);
      const [a, b] = spans[0]!;
      return { x: (a + b) / 2, text: g.labels.join(', '), short: g.keys.join(','), spans, item: g };
    }),
    BLOCKED_ROWS,
    plot,
    SMALL,
  );
  const candidateRows = rowsUsed(placedCandidates);
  const blockedRows = rowsUsed(placedBlocked);
  const unmarked = groups
    .filter((g) => !placedBlocked.some((p) => p.item === g))
    .flatMap((g) => g.keys)
    .sort((a, b) => a - b);
  const thinned =
    unmarked.length === 0
      ? []
      : wrapPhrases(['not marked:', ...unmarked.map((k, i) => `${k}${i < unmarked.length - 1 ? ',' : ''}`)], LEFT - 18, NOTE_FONT, ' ', {
          italic: true,
        });
  return {
    title,
    window,
    candidates: placedCandidates,
    markers: candidates,
    blocked: placedBlocked,
    thinned,
    // Room for the blocked rows, and for the lines of "not marked" under the lane's title.
    height: Math.max(
      candidateRows * CANDIDATE_ROW + BODY + blockedRows * BLOCKED_ROW + 10,
      34,
      candidateRows * CANDIDATE_ROW + 4 + BODY / 2 + 16 + thinned.length * NOTE_LINE,
    ),
    scope,
    fill,
  };
}

function rowsUsed<T>(placed: readonly PlacedLabel<T>[]): number {
  return placed.reduce((n, p) => Math.max(n, p.row + 1), 0);
}

function drawLane(l: Lane, top: number, scale: Scale, report: PlanReport, index: number): string {
  const parts: string[] = [];
  if (index % 2 === 1) parts.push(element('rect', { x: 8, y: top, width: WIDTH - 16, height: l.height, fill: '#f6f6f6' }));
  const candidateRows = rowsUsed(l.candidates);
  const bodyTop = top + 4 + candidateRows * CANDIDATE_ROW;
  const mid = bodyTop + BODY / 2;
  parts.push(textElement(LEFT - 10, mid + 4, l.title, { 'text-anchor': 'end', 'font-size': 11, 'font-weight': 'bold' }));
  l.thinned.forEach((line, i) =>
    parts.push(
      textElement(LEFT - 10, mid + 16 + i * NOTE_LINE, line, { 'text-anchor': 'end', 'font-size': NOTE_FONT, 'font-style': 'italic' }),
    ),
  );
  const w = l.window;
  if (w) {
    const [a, b] = [scale.at(w.minRate), scale.at(Math.min(w.maxRate, report.search.maxRate))];
    const box = (x0: number, x1: number, fill: string) =>
      element('rect', { x: x0, y: bodyTop, width: Math.max(x1 - x0, 1.5), height: BODY, fill });
    parts.push(box(a, b, l.fill));
    for (const g of l.scope.blocked.filter((r) => r.zone === w.zone))
      parts.push(box(scale.at(g.minRate), scale.at(g.maxRate), FILL.blocked));
    for (const f of l.scope.feasible.filter((r) => r.zone === w.zone))
      parts.push(box(scale.at(f.minRate), scale.at(f.maxRate), FILL.feasible));
    parts.push(
      element('rect', { x: a, y: bodyTop, width: Math.max(b - a, 1.5), height: BODY, fill: 'none', stroke: '#000', 'stroke-width': 1 }),
    );
  } else {
    parts.push(element('line', { x1: LEFT, y1: mid, x2: WIDTH - RIGHT, y2: mid, stroke: '#777', 'stroke-dasharray': '2 3' }));
  }
  for (const p of l.blocked) {
    const rowTop = bodyTop + BODY + 3 + p.row * BLOCKED_ROW;
    const d = p.item.ranges
      .map(([min, max]) => `M${px(scale.at(min))} ${px(rowTop - 2)}V${px(rowTop + 1)}H${px(scale.at(max))}V${px(rowTop - 2)}`)
      .join('');
    parts.push(element('path', { d, fill: 'none', stroke: '#8f2d1f', 'stroke-width': 1 }));
    parts.push(textElement(p.x, rowTop + 10, p.text, { 'text-anchor': 'middle', 'font-size': SMALL }));
    // The other brackets of the same checks carry the key number where it fits clear of the label.
    const key = p.item.keys.join(',');
    const keyWidth = textWidth(key, SMALL);
    for (const [min, max] of p.item.ranges.slice(1)) {
      const [a, b] = [scale.at(min), scale.at(max)];
      const centre = (a + b) / 2;
      const clear = centre + keyWidth / 2 + 4 < p.x - p.width / 2 || centre - keyWidth / 2 - 4 > p.x + p.width / 2;
      if (b - a >= keyWidth + 4 && clear)
        parts.push(textElement(centre, rowTop + 10, key, { 'text-anchor': 'middle', 'font-size': SMALL }));
    }
  }
  for (const p of l.candidates) {
    const baseline = bodyTop - 3 - (candidateRows - 1 - p.row) * CANDIDATE_ROW;
    const x = scale.at(p.item.rate);
    if (Math.abs(p.x - x) > 1 || p.row < candidateRows - 1)
      parts.push(
        element('line', { x1: x, y1: baseline + TEXT_DESCENT * SMALL + 1, x2: x, y2: mid - 4, stroke: '#000', 'stroke-width': 0.6 }),
      );
    const best = p.item.label === report.best;
    parts.push(
      textElement(p.x, baseline - 1, p.text, { 'text-anchor': 'middle', 'font-size': SMALL, 'font-weight': best ? 'bold' : undefined }),
    );
  }
  // Each marker names its label, or its kind's legend entry when even its number found no room (the notes list it by rank).
  const labelOf = new Map(l.candidates.map((p) => [p.item, p.text]));
  for (const c of l.markers)
    parts.push(candidateMarker(c.pass, scale.at(c.rate), mid, labelOf.get(c) ?? (c.pass ? 'candidate passes' : 'candidate fails')));
  return element('g', { class: 'lane' }, parts.join(''));
}

/** Every candidate by its rank number, as the tables number them: the key of a marker whose label had no room. */
function candidateLines(report: PlanReport): string[] {
  if (report.candidates.length === 0) return [];
  const phrases = report.candidates.map((c, i) => `${i + 1} = ${c.label} (${T.rate(c.rate)}, ${c.pass ? 'passes' : 'fails'})`);
  return [
    'Candidates by rank (a number stands in where a label has no room):',
    ...wrapPhrases(phrases, WIDTH - LEFT - RIGHT + 80, LEGEND_FONT, ';   ').map((line) => `    ${line}`),
  ];
}

function keyLines(keys: ReadonlyMap<string, number>): string[] {
  if (keys.size === 0) return ['Blocking checks: none blocks a rate inside the windows.'];
  const phrases = [...keys].map(([label, key]) => `${key} = ${label}`);
  return [
    'Blocking checks, by key number (a key stands in where a label has no room):',
    ...wrapPhrases(phrases, WIDTH - LEFT - RIGHT + 80, LEGEND_FONT, ';   ').map((line) => `    ${line}`),
  ];
}

function viewNotes(view: ReturnType<typeof rateMapView>, report: PlanReport, drawnCandidates: number): string[] {
  const notes: string[] = [];
  if (view.hidden > 0) {
    const zones = view.windows.map((w) => w.zone);
    notes.push(
      `Zones ${Math.min(...zones)}–${Math.max(...zones)} drawn; ${view.hidden} more window${view.hidden > 1 ? 's' : ''} inside the search range ${view.hidden > 1 ? 'are' : 'is'} not (see the table or JSON).`,
    );
  }
  const missing = report.candidates.length - drawnCandidates;
  if (missing > 0) notes.push(`${missing} candidate${missing > 1 ? 's' : ''} outside the drawn rates not marked.`);
  notes.push(
    view.log ? 'Rate axis logarithmic: the drawn span is wide, so equal widths mean equal relative (ppm) widths.' : 'Rate axis linear.',
  );
  return notes;
}
