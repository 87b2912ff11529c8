import type { PlanReport, ReportedCandidate, ReportedCheck } from '../plan/plan-report.js';
import { foldExtent } from '../math/fold-extent.js';
import { quantityText } from '../text/quantity-text.js';

const T = quantityText('svg');
import { InputError } from '../units/input-error.js';
import { horizontalAxis, numberTicks, verticalAxis } from './axis.js';
import { checkTable } from './check-table.js';
import { frequencyUnit, inUnit } from './frequency-unit.js';
import { packLabels, wrapPhrases } from './label-packing.js';
import { clipped, TEXT_DESCENT, textWidth } from './typography.js';
import { boxSwatch, legendRows } from './legend.js';
import { coveringTicks, linearTicks } from './nice-ticks.js';
import { channelFill, FILL } from './patterns.js';
import { channelTag } from './text-on-white.js';
import { linearScale, type Scale } from './scale.js';
import { element, textElement } from './svg-element.js';
import { svgDocument, type Figure } from './svg-document.js';
import { severalChannels, type ChannelCandidate, type ChannelPlanReport } from './channels.js';

const WIDTH = 960;
const LEFT = 84;
const RIGHT = 28;
const LABEL_ROWS = 5;
const LABEL_ROW = 12;
const PLOT_HEIGHT = 260;
const SMALL = 9.5;
/** Width a heading line may take, px. */
const ROOM = WIDTH - 24 - 12;

/**
 * The spectrum after sampling at one candidate's nominal rate, over
 * [0, rate/2]: the wanted band's image (with its guards, mirrored when the
 * zone is inverted), each interferer's aliased segments as bars as tall as
 * its level in dBFS (blocking and passing: grey; blocking and failing:
 * cross-hatched; not blocking: dashed outline, no fill), the blocking
 * threshold and the weakest wanted level as named lines, and the DC, rate/4
 * and rate/2 marks; the legend keys only the kinds drawn. Bars carry their label,
 * level and margin above the plot where there is room, else their key
 * number; the table below lists every check by key.
 *
 * With several channels, each channel's image is drawn with its guards in a
 * fill of its own (all in the wanted image's blue) and named by its label;
 * each interferer is drawn once, its label naming the channel it comes
 * closest to (`H2 IF-A → IF-B`), its margin to that channel, and failing
 * when it fails against any; the threshold and weakest level are the lowest
 * over the channels, named by channel; the checks that keep two channels
 * apart are listed in the table (the channels' own images are their bars).
 *
 * @param report the solved plan
 * @param candidateLabel a label from report.candidates
 * @returns the figure, 960 px wide
 * @throws InputError when no candidate has that label
 */
export function spectrumFigure(report: PlanReport, candidateLabel: string): Figure {
  const candidate = findCandidate(report, candidateLabel);
  const multi = severalChannels(report);
  const channels = multi ? channelLevels(multi, candidate) : null;
  const half = candidate.rate / 2;
  const checks = channels ? channels.checks : candidate.checks;
  const { threshold, levelTicks, bottom, top } = levelAxis(checks, channels?.threshold.level);
  const plotX: readonly [number, number] = [LEFT, WIDTH - RIGHT];
  const x = linearScale([0, half], plotX);
  const placed = checkLabels(
    checks.filter((c) => !channelKind(c)),
    x,
    plotX,
  );
  const rows = placed.reduce((n, p) => Math.max(n, p.row + 1), 0);
  const head = multi ? channelHeading(multi, candidate) : { markup: heading(report, candidate), height: 64 };
  const plotTop = head.height + rows * LABEL_ROW + 6;
  const plotBottom = plotTop + PLOT_HEIGHT;
  const y = linearScale([bottom, top], [plotBottom, plotTop]);

  const parts: string[] = [head.markup];
  const wanted = multi ? channelImages(multi, candidate, x, plotTop, plotBottom) : wantedImage(report, candidate, x, plotTop, plotBottom);
  parts.push(wanted.fill);
  // Strongest first, so a weaker bar over a stronger one stays in sight.
  const drawOrder = checks.map((c, i) => ({ c, key: i + 1 })).sort((a, b) => b.c.level - a.c.level);
  for (const { c } of drawOrder) if (!channelKind(c)) parts.push(bars(c, x, y, bottom));
  // Every line first, then the names inside the plot on white boxes over them, so no line runs through a name.
  const weakest = channels ? channels.weakest : { level: report.weakestLevel, channel: null };
  const levels = levelLines(threshold, channels?.threshold.channel ?? null, weakest.level, weakest.channel, candidate, x, y, plotTop);
  const markings = marks(candidate, x, plotTop, plotBottom);
  parts.push(labelLeaders(placed, x, y, bottom, top, head.height), markings.lines, levels.lines, wanted.outline);
  parts.push(wanted.label, levels.names, markings.names, labelTexts(placed, head.height));
  parts.push(verticalAxis(y, numberTicks(levelTicks.values), LEFT, 'level (dBFS)', WIDTH - RIGHT));
  const unit = frequencyUnit(half);
  const freqTicks = linearTicks(0, half, 8).values.map((v) => ({ value: v, label: inUnit(v, unit) }));
  parts.push(horizontalAxis(x, freqTicks, plotBottom, `frequency after sampling (${unit.unit})`));
  const below = legendAndTable(checks, wanted.guarded, plotBottom + 56, multi ? channelSwatches(multi) : null);
  parts.push(below.markup);
  return {
    width: WIDTH,
    height: Math.ceil(below.bottom + 12),
    title: `Spectrum after sampling at ${candidate.label}: ${report.scenario}`,
    body: parts.join(''),
  };
}

/**
 * The level axis: from 0 dBFS (or the strongest level) down past the weakest,
 * at least to −100 dBFS, but no further than 60 dB below the blocking
 * threshold: products far below it (a third-order product of two filtered
 * blockers can compute to −250 dBFS) only squash the levels that matter; they
 * are drawn as stubs on the floor and keep their figures in the table below.
 */
function levelAxis(
  checks: ReportedCandidate['checks'],
  lowestThreshold?: number | null,
): {
  threshold: number | null;
  levelTicks: ReturnType<typeof coveringTicks>;
  bottom: number;
  top: number;
} {
  const threshold = lowestThreshold !== undefined ? lowestThreshold : checks.length > 0 ? checks[0]!.level + checks[0]!.levelMargin : null;
  const levels = [...checks.map((c) => c.level).filter(Number.isFinite), ...(threshold === null ? [] : [threshold])];
  const floor = threshold === null ? -Infinity : threshold - 60;
  const levelTicks = coveringTicks(Math.max(Math.min(-100, ...levels) - 5, floor), Math.max(0, ...levels), 8);
  return { threshold, levelTicks, bottom: levelTicks.values[0]!, top: levelTicks.values[levelTicks.values.length - 1]! };
}

/** Labels above the plot, packed in rows: failing first, then blocking by slack, then the strongest of the rest. */
function checkLabels(checks: ReportedCandidate['checks'], x: Scale, plotX: readonly [number, number]) {
  const order = checks
    .map((c, i) => ({ c, key: i + 1 }))
    .sort((a, b) => priority(a.c) - priority(b.c) || slack(a.c) - slack(b.c) || b.c.level - a.c.level);
  return packLabels(
    order.flatMap(({ c, key }) => {
      const widest = [...c.alias].sort((p, q) => q[1] - q[0] - (p[1] - p[0]))[0];
      if (!widest) return [];
      return [
        {
          x: x.at((widest[0] + widest[1]) / 2),
          text: `${key} ${c.label}, ${T.level(c.level)} dBFS, ${T.frequency(c.margin)}`,
          short: String(key),
          leader: x.at((widest[0] + widest[1]) / 2),
          bold: !c.pass,
          item: { c, key, at: (widest[0] + widest[1]) / 2 },
        },
      ];
    }),
    LABEL_ROWS,
    plotX,
    SMALL,
  );
}

interface Box {
  readonly left: number;
  readonly top: number;
  readonly right: number;
  readonly bottom: number;
}

const overlaps = (a: Box, b: Box) => a.left < b.right && b.left < a.right && a.top < b.bottom && b.top < a.bottom;

/**
 * The blocking threshold (black, dash-dot) and the weakest wanted level
 * (blue, dashed) as lines across the plot, each named on a white box. The
 * threshold's name sits under its line at the right end; the weakest level's
 * takes the first of right-above, right-below, left-above, left-below that
 * keeps clear of the threshold's name and of the DC, rate/4 and rate/2 marks'
 * names (the weakest level lies at or above the threshold, by the rejection).
 */
function levelLines(
  threshold: number | null,
  thresholdChannel: string | null,
  weakest: number | null,
  weakestChannel: string | null,
  c: ReportedCandidate,
  x: Scale,
  y: Scale,
  plotTop: number,
): { lines: string; names: string } {
  // With several channels the lines are the lowest over them, named by channel.
  const of = (channel: string | null) => (channel === null ? '' : ` (${channel})`);
  const lines: string[] = [];
  const names: string[] = [];
  const taken: Box[] = markBoxes(c, x, plotTop);
  const named = (level: number, text: string, stroke: string, dash: string, places: ReadonlyArray<readonly ['left' | 'right', -1 | 1]>) => {
    const at = y.at(level);
    const w = textWidth(text, SMALL) + 6;
    const boxAt = ([end, side]: readonly ['left' | 'right', -1 | 1]): Box => {
      const left = end === 'right' ? WIDTH - RIGHT - 2 - w : LEFT + 2;
      const top = side === 1 ? at + 2 : at - 14;
      return { left, top, right: left + w, bottom: top + 12 };
    };
    const box = places.map(boxAt).find((b) => !taken.some((t) => overlaps(b, t))) ?? boxAt(places[0]!);
    taken.push(box);
    lines.push(element('line', { x1: LEFT, y1: at, x2: WIDTH - RIGHT, y2: at, stroke, 'stroke-width': 1, 'stroke-dasharray': dash }));
    names.push(
      element('rect', { x: box.left, y: box.top, width: w, height: 12, fill: '#fff', opacity: 0.9 }) +
        textElement(box.left + w / 2, box.top + 9, text, {
          'text-anchor': 'middle',
          'font-size': SMALL,
          fill: stroke === '#000' ? undefined : stroke,
        }),
    );
  };
  if (threshold !== null)
    named(threshold, `blocking threshold${of(thresholdChannel)} ${T.level(threshold)} dBFS`, '#000', '8 3 2 3', [['right', 1]]);
  if (weakest !== null)
    named(weakest, `weakest wanted level${of(weakestChannel)} ${T.level(weakest)} dBFS`, '#1f4e79', '5 3', [
      ['right', -1],
      ['right', 1],
      ['left', -1],
      ['left', 1],
    ]);
  return { lines: element('g', { class: 'levels' }, lines.join('')), names: element('g', { class: 'level-names' }, names.join('')) };
}

/** The baseline of a label row above the plot; the rows start under the heading (64 px, more with several channels). */
const labelBaseline = (row: number, labelsTop: number) => labelsTop + (row + 1) * LABEL_ROW - 2;

/** A dotted leader from under each placed label down to the top of its bar. */
function labelLeaders(placed: ReturnType<typeof checkLabels>, x: Scale, y: Scale, bottom: number, top: number, labelsTop: number): string {
  return placed
    .map((p) => {
      const barTop = y.at(Math.max(Math.min(p.item.c.level, top), bottom));
      const at = x.at(p.item.at);
      const from = labelBaseline(p.row, labelsTop) + TEXT_DESCENT * SMALL + 1;
      return element('line', { x1: at, y1: from, x2: at, y2: barTop, stroke: '#555', 'stroke-width': 0.5, 'stroke-dasharray': '1 2' });
    })
    .join('');
}

/** Each placed label in its row above the plot (failing checks in bold). */
function labelTexts(placed: ReturnType<typeof checkLabels>, labelsTop: number): string {
  return placed
    .map((p) =>
      textElement(p.x, labelBaseline(p.row, labelsTop), p.text, {
        'text-anchor': 'middle',
        'font-size': SMALL,
        'font-weight': p.item.c.pass ? undefined : 'bold',
      }),
    )
    .join('');
}

/** The legend and the table of checks under the plot, from `top`; returns the markup and where it ends. */
function legendAndTable(
  checks: ReportedCandidate['checks'],
  guarded: boolean,
  top: number,
  channels: ReturnType<typeof channelSwatches> | null,
): { markup: string; bottom: number } {
  // A check is drawn when it has an aliased segment (bars draws one box per segment); a channel's is its image.
  const drawn = checks.filter((c) => c.alias.length > 0 && !channelKind(c));
  const legend = legendRows(
    [
      ...(channels ?? [{ swatch: boxSwatch(FILL.wanted), text: 'wanted image' }]),
      { swatch: boxSwatch(FILL.guard), text: 'guard', drawn: guarded },
      { swatch: boxSwatch(FILL.passing), text: 'blocking check, passes', drawn: drawn.some((c) => c.blocking && c.pass) },
      { swatch: boxSwatch(FILL.failing), text: 'blocking check, FAILS', drawn: drawn.some((c) => c.blocking && !c.pass) },
      { swatch: boxSwatch('none', true), text: 'below the threshold (does not block)', drawn: drawn.some((c) => !c.blocking) },
    ],
    24,
    top,
    WIDTH - RIGHT,
  );
  const tableTop = top + legend.height + 10;
  const table = checkTable(checks, 24, tableTop);
  return { markup: legend.markup + table.markup, bottom: tableTop + table.height };
}

/**
 * The spectrum after sampling as a standalone SVG document (see spectrumFigure).
 *
 * @param report the solved plan
 * @param candidateLabel a label from report.candidates
 * @returns SVG text, 960 px wide
 * @throws InputError when no candidate has that label
 * @example spectrumSvg(report, report.best ?? report.candidates[0].label) // '<svg ...'
 */
export function spectrumSvg(report: PlanReport, candidateLabel: string): string {
  return svgDocument(spectrumFigure(report, candidateLabel));
}

/**
 * The candidate with the given label.
 *
 * @throws InputError naming the labels there are
 */
export function findCandidate(report: PlanReport, label: string): ReportedCandidate {
  const found = report.candidates.find((c) => c.label === label);
  if (found) return found;
  const known = report.candidates.map((c) => c.label);
  throw new InputError('candidate', known.length > 0 ? `one of ${known.join(', ')}` : 'a plan with candidates', label);
}

function priority(c: ReportedCheck): number {
  return !c.pass ? 0 : c.blocking ? 1 : 2;
}

function slack(c: ReportedCheck): number {
  return c.blocking ? c.margin - c.requiredMargin : 0;
}

function heading(report: PlanReport, c: ReportedCandidate): string {
  const zone =
    c.zone === null ? 'band straddles a zone edge' : `zone ${c.zone}${c.inverted ? ' (inverted)' : ''}, centre ${T.rate(c.center ?? 0)}`;
  const verdict = c.pass
    ? `passes; worst margin ${T.frequency(c.worstMargin)} (${c.limitedBy})`
    : `FAILS; limited by ${c.limitedBy}, margin ${T.frequency(c.worstMargin)}`;
  return (
    textElement(24, 22, clipped(`Spectrum after sampling at ${c.label}: ${report.scenario}`, ROOM, 14, { bold: true }), {
      'font-size': 14,
      'font-weight': 'bold',
    }) +
    textElement(24, 40, clipped(`rate ${T.rate(c.rate)} ${T.tolerance(c.tolerancePpm)}; ${zone}; ${verdict}`, ROOM, 11), {
      'font-size': 11,
    }) +
    textElement(24, 56, 'Labels: key, check, level, margin to the wanted image.', { 'font-size': SMALL, 'font-style': 'italic' })
  );
}

/** The wanted image and guards: fills (under the bars) and outlines with the label (over them). */
function wantedImage(
  report: PlanReport,
  c: ReportedCandidate,
  x: ReturnType<typeof linearScale>,
  top: number,
  bottom: number,
): { fill: string; outline: string; label: string; guarded: boolean } {
  const half = c.rate / 2;
  const fills: string[] = [];
  const outlines: string[] = [];
  const names: string[] = [];
  let guarded = false;
  const box = (a: number, b: number, fill: string) => {
    if (fill === FILL.guard) guarded = true;
    const shape = { x: x.at(a), y: top, width: Math.max(x.at(b) - x.at(a), 1.5), height: bottom - top };
    fills.push(element('rect', { ...shape, fill }));
    outlines.push(element('rect', { ...shape, fill: 'none', stroke: '#1f4e79', 'stroke-width': 1.2 }));
  };
  const label = (at: number, text: string) => {
    const w = textWidth(text, SMALL, { bold: true }) + 8;
    const centre = Math.min(Math.max(at, x.range[0] + w / 2), x.range[1] - w / 2);
    names.push(
      element('rect', { x: centre - w / 2, y: bottom - 20, width: w, height: 14, fill: '#fff', stroke: '#1f4e79', 'stroke-width': 0.8 }),
    );
    names.push(textElement(centre, bottom - 9, text, { 'text-anchor': 'middle', 'font-size': SMALL, 'font-weight': 'bold' }));
  };
  if (c.image) {
    const below = c.inverted ? report.guard.high : report.guard.low;
    const above = c.inverted ? report.guard.low : report.guard.high;
    if (below > 0) box(Math.max(0, c.image.low - below), c.image.low, FILL.guard);
    if (above > 0) box(c.image.high, Math.min(half, c.image.high + above), FILL.guard);
    box(c.image.low, c.image.high, FILL.wanted);
    label(x.at((c.image.low + c.image.high) / 2), c.inverted ? 'wanted (inverted)' : 'wanted');
  } else {
    for (const s of foldExtent(report.band.low, report.band.high, c.rate)) box(s.low, s.high, FILL.wanted);
    label((x.range[0] + x.range[1]) / 2, 'wanted band folds onto itself (straddles a zone edge)');
  }
  return {
    fill: element('g', { class: 'wanted' }, fills.join('')),
    outline: element('g', { class: 'wanted-outline' }, outlines.join('')),
    label: element('g', { class: 'wanted-label' }, names.join('')),
    guarded,
  };
}

function bars(c: ReportedCheck, x: ReturnType<typeof linearScale>, y: ReturnType<typeof linearScale>, bottom: number): string {
  const [low, high] = [y.domain[0], y.domain[1]];
  const level = Math.min(Math.max(c.level, low), high);
  const style = !c.blocking
    ? { fill: 'none', stroke: '#666', 'stroke-width': 1, 'stroke-dasharray': '3 2' }
    : { fill: c.pass ? FILL.passing : FILL.failing, stroke: '#000', 'stroke-width': c.pass ? 1 : 1.6 };
  return c.alias
    .map(([a, b]) => {
      const x0 = x.at(a);
      const w = Math.max(x.at(b) - x0, 2);
      return element('rect', {
        x: x0 - (w > 2 ? 0 : 1),
        y: y.at(level),
        width: w,
        height: Math.max(y.at(bottom) - y.at(level), 1),
        ...style,
      });
    })
    .join('');
}

/**
 * The DC, rate/4 and rate/2 marks: where each is and the box its name takes at the plot's top.
 * Named and written as the checks of the converter's spurs there are in the table below ("rate/4", 4 digits).
 */
function markPlaces(c: ReportedCandidate, x: Scale, top: number): Array<{ at: number; text: string; box: Box }> {
  const places: ReadonlyArray<readonly [number, string, 'start' | 'middle' | 'end']> = [
    [0, 'DC', 'start'],
    [c.rate / 4, `rate/4 = ${T.frequency(c.rate / 4)}`, 'middle'],
    [c.rate / 2, 'rate/2', 'end'],
  ];
  return places.map(([f, text, anchor]) => {
    const at = x.at(f);
    const w = textWidth(text, SMALL) + 6;
    const left = anchor === 'start' ? at + 1 : anchor === 'end' ? at - 1 - w : at - w / 2;
    return { at, text, box: { left, top: top + 2, right: left + w, bottom: top + 15 } };
  });
}

function markBoxes(c: ReportedCandidate, x: Scale, top: number): Box[] {
  return markPlaces(c, x, top).map((p) => p.box);
}

/** The DC, rate/4 and rate/2 lines, and their names on white boxes (drawn later, over every line). */
function marks(c: ReportedCandidate, x: Scale, top: number, bottom: number): { lines: string; names: string } {
  const places = markPlaces(c, x, top);
  const lines = places.map(({ at }) =>
    element('line', { x1: at, y1: top, x2: at, y2: bottom, stroke: '#000', 'stroke-width': 1, 'stroke-dasharray': '6 2 1 2' }),
  );
  const names = places.map(
    ({ text, box }) =>
      element('rect', { x: box.left, y: box.top, width: box.right - box.left, height: 13, fill: '#fff', opacity: 0.9 }) +
      textElement((box.left + box.right) / 2, top + 12, text, { 'text-anchor': 'middle', 'font-size': SMALL }),
  );
  return { lines: element('g', { class: 'marks' }, lines.join('')), names: element('g', { class: 'mark-names' }, names.join('')) };
}

/** A check that keeps two channels apart: its alias is the other channel's image, drawn as such. */
function channelKind(c: ReportedCheck): boolean {
  return (c.kind as string) === 'channel';
}

/**
 * Every check of a candidate over all its channels, one per interferer: the
 * one against the channel it comes closest to (least slack when it blocks,
 * least margin when not), labelled `check → channel`, failing when it fails
 * against any channel; and the lowest blocking threshold and weakest wanted
 * level over the channels, with the channel each belongs to.
 */
function channelLevels(report: ChannelPlanReport, candidate: ChannelCandidate) {
  const byLabel = new Map<string, { check: ReportedCheck; channel: string; pass: boolean }>();
  const tightness = (c: ReportedCheck) => (c.blocking ? c.margin - c.requiredMargin : c.margin);
  let threshold: { level: number | null; channel: string | null } = { level: null, channel: null };
  for (const result of candidate.channels) {
    const own = result.checks ?? [];
    const first = own[0];
    if (first && (threshold.level === null || first.level + first.levelMargin < threshold.level))
      threshold = { level: first.level + first.levelMargin, channel: result.label };
    for (const check of own) {
      const seen = byLabel.get(check.label);
      if (!seen) byLabel.set(check.label, { check, channel: result.label, pass: check.pass });
      else
        byLabel.set(check.label, {
          ...(tightness(check) < tightness(seen.check) ? { check, channel: result.label } : seen),
          pass: seen.pass && check.pass,
        });
    }
  }
  const checks = [...byLabel.values()].map(({ check, channel, pass }) => ({ ...check, label: `${check.label} → ${channel}`, pass }));
  let weakest: { level: number | null; channel: string | null } = { level: null, channel: null };
  for (const channel of report.channels)
    if (channel.weakestLevel !== null && (weakest.level === null || channel.weakestLevel < weakest.level))
      weakest = { level: channel.weakestLevel, channel: channel.label };
  return { checks, threshold, weakest };
}

/** The heading of a multi-channel spectrum: title, rate and verdict, then each channel's zone and centre (wrapped), then the label key. */
function channelHeading(report: ChannelPlanReport, c: ChannelCandidate): { markup: string; height: number } {
  const verdict = c.pass
    ? `passes; worst margin ${T.frequency(c.worstMargin)} (${c.limitedBy})`
    : `FAILS; limited by ${c.limitedBy}, margin ${T.frequency(c.worstMargin)}`;
  const phrases = c.channels.map((ch) =>
    ch.zone === null || ch.image === null
      ? `${ch.label}: straddles a zone edge`
      : `${ch.label}: zone ${ch.zone}${ch.inverted ? ' (inverted)' : ''}, centre ${T.rate(ch.center ?? 0)}, ${ch.pass ? 'passes' : 'FAILS'}`,
  );
  const lines = wrapPhrases(phrases, WIDTH - 48, 11, ';   ');
  const parts = [
    textElement(24, 22, `Spectrum after sampling at ${c.label}: ${report.scenario}`, { 'font-size': 14, 'font-weight': 'bold' }),
    textElement(24, 40, `rate ${T.rate(c.rate)} ${T.tolerance(c.tolerancePpm)}; ${c.channels.length} channels; ${verdict}`, {
      'font-size': 11,
    }),
    ...lines.map((line, i) => textElement(24, 56 + 15 * i, line, { 'font-size': 11 })),
  ];
  const keyLine = 56 + 15 * lines.length;
  parts.push(
    textElement(24, keyLine, 'Labels: key, check → the channel it comes closest to, level, margin to that channel.', {
      'font-size': SMALL,
      'font-style': 'italic',
    }),
  );
  return { markup: parts.join(''), height: keyLine + 8 };
}

/** Each channel's image and guards in its own fill, outlined and named by its label (inverted ones say so). */
function channelImages(
  report: ChannelPlanReport,
  c: ChannelCandidate,
  x: Scale,
  top: number,
  bottom: number,
): { fill: string; outline: string; label: string; guarded: boolean } {
  const half = c.rate / 2;
  const fills: string[] = [];
  const outlines: string[] = [];
  const labels: Array<{ at: number; text: string }> = [];
  let guarded = false;
  const box = (a: number, b: number, fill: string) => {
    const shape = { x: x.at(a), y: top, width: Math.max(x.at(b) - x.at(a), 1.5), height: bottom - top };
    fills.push(element('rect', { ...shape, fill }));
    outlines.push(element('rect', { ...shape, fill: 'none', stroke: '#1f4e79', 'stroke-width': 1.2 }));
  };
  c.channels.forEach((ch, i) => {
    const spec = report.channels[i]!;
    const fill = channelFill(i);
    if (ch.image) {
      const below = ch.inverted ? spec.guard.above : spec.guard.below;
      const above = ch.inverted ? spec.guard.below : spec.guard.above;
      if (below > 0 || above > 0) guarded = true;
      if (below > 0) box(Math.max(0, ch.image.low - below), ch.image.low, FILL.guard);
      if (above > 0) box(ch.image.high, Math.min(half, ch.image.high + above), FILL.guard);
      box(ch.image.low, ch.image.high, fill);
      labels.push({ at: x.at((ch.image.low + ch.image.high) / 2), text: ch.inverted ? `${ch.label} (inverted)` : ch.label });
    } else {
      const segments = foldExtent(spec.low, spec.high, c.rate);
      for (const s of segments) box(s.low, s.high, fill);
      const widest = [...segments].sort((p, q) => q.high - q.low - (p.high - p.low))[0];
      if (widest) labels.push({ at: x.at((widest.low + widest.high) / 2), text: `${ch.label} folds onto itself` });
    }
  });
  // The names sit in rows under the DC, rate/4 and rate/2 names at the plot's top (clear of the level lines' names), packed so that close images keep both.
  const placed = packLabels(
    labels.map((l) => ({ x: l.at, text: l.text, item: l, bold: true })),
    labels.length,
    x.range,
    SMALL,
  );
  const names = placed.map((p) => channelTag(p.x, top + 18 + 16 * p.row, p.width, p.text, SMALL));
  return {
    fill: element('g', { class: 'wanted' }, fills.join('')),
    outline: element('g', { class: 'wanted-outline' }, outlines.join('')),
    label: element('g', { class: 'wanted-label' }, names.join('')),
    guarded,
  };
}

/** Legend entries: one per channel, its fill and its label. */
function channelSwatches(report: ChannelPlanReport): Array<{ swatch: (x: number, y: number) => string; text: string }> {
  return report.channels.map((ch, i) => ({ swatch: boxSwatch(channelFill(i)), text: `channel ${ch.label}` }));
}
