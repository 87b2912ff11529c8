import type { PeakRow, PredictionRow, VerifyResult } from '../report/verify-result.js';
import { CONTRADICTING } from '../report/verify-result.js';
import { quantityText } from '../text/quantity-text.js';

const T = quantityText('svg');
import { horizontalAxis, numberTicks, verticalAxis } from './axis.js';
import { frequencyUnit, inUnit } from './frequency-unit.js';
import { packLabels } from './label-packing.js';
import { boxSwatch, legendRows, type LegendEntry } from './legend.js';
import { failMarker, markerGroup } from './markers.js';
import { maxHoldColumns } from './max-hold-columns.js';
import { coveringTicks, linearTicks } from './nice-ticks.js';
import { channelFill, FILL } from './patterns.js';
import { channelTag } from './text-on-white.js';
import { linearScale, type Scale } from './scale.js';
import { element, pointList, textElement } from './svg-element.js';
import { clipped, TEXT_DESCENT, textWidth, withMinus } from './typography.js';
import { svgDocument, type Figure } from './svg-document.js';

const WIDTH = 960;
const LEFT = 84;
const RIGHT = 28;
const LABEL_ROWS = 4;
const LABEL_ROW = 12;
const PLOT_HEIGHT = 300;
const SMALL = 9.5;
/** Width a heading line may take, px. */
const ROOM = WIDTH - 24 - 12;
/** Bottom of the heading, px: the label rows start here. */
const HEAD = 80;
/** The level axis reaches this far below the noise median, dB, so the noise band shows as a band. */
const BELOW_NOISE = 10;
/** Half the width of a marker with its outline, px. */
const MARKER_REACH = 5.5;
/** Peaks listed in words under the legend; the rest are counted. */
const LISTED_PEAKS = 8;

/**
 * The simulated capture of `ifzone verify` as a figure: the measured
 * spectrum over [0, R/2] as one polyline (max-hold to one column per pixel,
 * so no peak is lost), the wanted image shaded and its margin hatched, the
 * threshold and the peak floor as labelled dashed lines, each predicted line
 * marked where the plan puts it (an open triangle at its plan level; filled
 * when its judgement contradicts the plan) with its check's label above the
 * plot (thinned when crowded: contradicting lines, then the strongest, first),
 * measured peaks no line accounts for (open diamonds) and intrusions into
 * the wanted image's margin (crossed squares), which are also listed in
 * words under the legend.
 *
 * @param result the result of verifyCapture
 * @param levels the measured spectrum, bins 0..N/2, dBFS (verifyCaptureWithSpectrum)
 * @returns the figure, 960 px wide
 * @throws RangeError when levels does not hold N/2 + 1 bins
 * @example captureFigure(verified.result, verified.levels).width // 960
 */
export function captureFigure(result: VerifyResult, levels: ArrayLike<number>): Figure {
  if (levels.length !== result.samples / 2 + 1)
    throw new RangeError(`the spectrum must hold N/2 + 1 = ${result.samples / 2 + 1} bins, got ${levels.length}`);
  const half = result.rate / 2;
  const plotX: readonly [number, number] = [LEFT, WIDTH - RIGHT];
  const x = linearScale([0, half], plotX);
  const { threshold, floor, noiseMedian } = result.levels;
  const columns = maxHoldColumns(levels, Math.round(plotX[1] - plotX[0]));
  const strongest = Math.max(0, ...columns.map((c) => c.level).filter(Number.isFinite));
  const levelTicks = coveringTicks(Math.min(noiseMedian - BELOW_NOISE, threshold - 5), strongest, 8);
  const bottom = levelTicks.values[0]!;
  const top = levelTicks.values[levelTicks.values.length - 1]!;
  const clamp = (v: number) => Math.min(Math.max(Number.isFinite(v) ? v : bottom, bottom), top);

  // Labels above the plot: contradicting lines first, then by plan level.
  const order = [...result.predictions].sort((a, b) => Number(contradicts(b)) - Number(contradicts(a)) || b.planLevel - a.planLevel);
  const placed = packLabels(
    order.map((p) => {
      const at = Math.min(Math.max(x.at(p.predicted.frequency), plotX[0] + MARKER_REACH), plotX[1] - MARKER_REACH);
      return { x: at, text: p.check, leader: at, bold: contradicts(p), item: p };
    }),
    LABEL_ROWS,
    plotX,
    SMALL,
  );
  const rows = placed.reduce((n, p) => Math.max(n, p.row + 1), 0);
  const plotTop = HEAD + rows * LABEL_ROW + 8;
  const plotBottom = plotTop + PLOT_HEIGHT;
  const y = linearScale([bottom, top], [plotBottom, plotTop]);

  const parts: string[] = [heading(result)];
  const wanted = wantedImage(result, x, plotTop, plotBottom);
  parts.push(wanted.fill);
  parts.push(verticalAxis(y, numberTicks(levelTicks.values), LEFT, 'level (dBFS)', WIDTH - RIGHT));
  const binWidth = result.binWidth;
  const points = columns.map((c) => [x.at(((c.first + c.last) / 2) * binWidth), y.at(clamp(c.level))] as const);
  parts.push(
    element('polyline', {
      class: 'spectrum',
      points: pointList(points),
      fill: 'none',
      stroke: '#000',
      'stroke-width': 0.8,
      'stroke-linejoin': 'round',
    }),
  );
  // Markers sit wholly inside the plot (one at DC or at R/2 moves in by its half-width, 5 px).
  const markerX = (f: number) => Math.min(Math.max(x.at(f), plotX[0] + MARKER_REACH), plotX[1] - MARKER_REACH);
  const markerY = (level: number) => Math.min(Math.max(y.at(clamp(level)), plotTop + MARKER_REACH), plotBottom - MARKER_REACH);
  for (const p of placed) {
    const at = markerX(p.item.predicted.frequency);
    const from = labelBaseline(p.row) + TEXT_DESCENT * SMALL + 1;
    const to = markerY(p.item.planLevel) - MARKER_REACH;
    if (to > from)
      parts.push(element('line', { x1: at, y1: from, x2: at, y2: to, stroke: '#555', 'stroke-width': 0.5, 'stroke-dasharray': '1 2' }));
  }
  const intrusionBins = new Set(result.intrusions.map((r) => r.bin));
  // The level lines' names keep clear of every marker and of each other.
  const taken: Box[] = [
    ...result.predictions.map((p) => markerBox(markerX(p.predicted.frequency), markerY(p.planLevel))),
    ...result.unlisted.map((u) => markerBox(markerX(u.frequency), markerY(u.level))),
  ];
  const thresholdLine = levelLine(y.at(threshold), `threshold ${T.level(threshold)} dBFS`, '8 3 2 3', 'end', taken);
  if (thresholdLine.box) taken.push(thresholdLine.box);
  const floorLine = levelLine(y.at(floor), `peak floor ${T.level(floor)} dBFS`, '4 3', 'start', taken);
  // Lines first, then the names on white over them, so no line runs through a name.
  parts.push(thresholdLine.line, floorLine.line, wanted.outline, wanted.label, thresholdLine.name, floorLine.name);
  for (const p of placed)
    parts.push(
      textElement(p.x, labelBaseline(p.row), p.text, {
        'text-anchor': 'middle',
        'font-size': SMALL,
        'font-weight': contradicts(p.item) ? 'bold' : undefined,
      }),
    );
  const entries = legendEntries(result, intrusionBins);
  const keyed = (kind: Kind) => entries.find((e) => e.kind === kind)!.text;
  // A predicted line is named by its label, or, when thinned out, keyed by its kind in the legend; peaks by their kind.
  const labelOf = new Map(placed.map((p) => [p.item, p.text]));
  for (const p of result.predictions)
    parts.push(
      markerGroup(
        labelOf.get(p) ?? keyed(contradicts(p) ? 'contradicting' : 'predicted'),
        predictionMarker(contradicts(p), markerX(p.predicted.frequency), markerY(p.planLevel)),
      ),
    );
  for (const u of result.unlisted)
    if (!intrusionBins.has(u.bin)) parts.push(markerGroup(keyed('unlisted'), unlistedMarker(markerX(u.frequency), markerY(u.level))));
  for (const u of result.intrusions) parts.push(markerGroup(keyed('intrusion'), failMarker(markerX(u.frequency), markerY(u.level))));

  const unit = frequencyUnit(half);
  const freqTicks = linearTicks(0, half, 8).values.map((v) => ({ value: v, label: inUnit(v, unit) }));
  parts.push(horizontalAxis(x, freqTicks, plotBottom, `frequency after sampling (${unit.unit})`));

  let cursor = plotBottom + 56;
  const legend = legendRows(entries, 24, cursor, WIDTH - RIGHT);
  parts.push(legend.markup);
  cursor += legend.height + 8;
  const list = peakList(result, intrusionBins, 24, cursor);
  parts.push(list.markup);
  cursor += list.height;
  return {
    width: WIDTH,
    height: Math.ceil(cursor + 12),
    title: `Simulated capture at ${T.rate(result.rate)}: ${result.scenario}`,
    body: parts.join(''),
  };
}

/**
 * The simulated capture as a standalone SVG document (see captureFigure).
 *
 * @param result the result of verifyCapture
 * @param levels the measured spectrum, bins 0..N/2, dBFS
 * @returns SVG text, 960 px wide
 * @throws RangeError when levels does not hold N/2 + 1 bins
 * @example captureSvg(verified.result, verified.levels).startsWith('<svg') // true
 */
export function captureSvg(result: VerifyResult, levels: ArrayLike<number>): string {
  return svgDocument(captureFigure(result, levels));
}

function contradicts(p: PredictionRow): boolean {
  return CONTRADICTING.has(p.status);
}

function heading(r: VerifyResult): string {
  const reasons = r.contradictions.length;
  const plan = r.plan.pass ? 'the plan passes at this rate' : 'the plan fails at this rate';
  const verdict = r.consistent
    ? `the capture agrees with the plan (${plan})`
    : `the capture CONTRADICTS the plan (${plan}; ${reasons} reason${reasons === 1 ? '' : 's'})`;
  const perChannel = `${r.wantedTones} wanted tone${r.wantedTones === 1 ? '' : 's'}`;
  const tones = r.channels.length > 1 ? `${perChannel} in each of ${r.channels.length} channels` : perChannel;
  return (
    textElement(24, 22, clipped(`Simulated capture at ${T.rate(r.rate)}: ${r.scenario}`, ROOM, 14, { bold: true }), {
      'font-size': 14,
      'font-weight': 'bold',
    }) +
    textElement(
      24,
      40,
      `rate ${T.rate(r.rate)}; ${r.samples} samples, bin width ${T.frequency(r.binWidth)}; ${r.window.name} window; ${tones}`,
      { 'font-size': 11 },
    ) +
    textElement(24, 56, clipped(`Verdict: ${verdict}.`, ROOM, 11, { bold: !r.consistent }), {
      'font-size': 11,
      'font-weight': r.consistent ? undefined : 'bold',
    }) +
    textElement(24, 72, 'Labels: the check of the plan each predicted line belongs to, over its marker at the plan level.', {
      'font-size': SMALL,
      'font-style': 'italic',
    })
  );
}

/** The wanted image (shaded, outlined, named) and its margin either side (hatched), under the spectrum. */
function wantedImage(r: VerifyResult, x: Scale, top: number, bottom: number): { fill: string; outline: string; label: string } {
  const half = r.rate / 2;
  const fills: string[] = [];
  const outlines: string[] = [];
  const box = (a: number, b: number, fill: string, outline: boolean) => {
    const lo = Math.max(0, a);
    const hi = Math.min(half, b);
    if (!(hi > lo)) return;
    const shape = { x: x.at(lo), y: top, width: Math.max(x.at(hi) - x.at(lo), 1.5), height: bottom - top };
    fills.push(element('rect', { ...shape, fill }));
    if (outline) outlines.push(element('rect', { ...shape, fill: 'none', stroke: '#1f4e79', 'stroke-width': 1.2 }));
  };
  for (const [low, high] of r.wantedImage) {
    box(low - r.margin, low, FILL.guard, false);
    box(high, high + r.margin, FILL.guard, false);
  }
  // With several channels: each channel's image in its own fill, named by its label (packed in rows at the plot's foot).
  if (r.channels.length > 1) {
    for (const [low, high] of r.channels.slice(1).flatMap((c) => c.image)) {
      box(low - r.margin, low, FILL.guard, false);
      box(high, high + r.margin, FILL.guard, false);
    }
    r.channels.forEach((c, i) => c.image.forEach(([low, high]) => box(low, high, channelFill(i), true)));
    const names = packLabels(
      r.channels.flatMap((c) => {
        const widest = [...c.image].sort((p, q) => q[1] - q[0] - (p[1] - p[0]))[0];
        return widest
          ? [{ x: x.at((widest[0] + widest[1]) / 2), text: c.inverted ? `${c.label} (inverted)` : c.label, item: c, bold: true }]
          : [];
      }),
      r.channels.length,
      x.range,
      SMALL,
    );
    const labels = names.map((p) => channelTag(p.x, bottom - 20 - 16 * p.row, p.width, p.text, SMALL));
    return {
      fill: element('g', { class: 'wanted' }, fills.join('')),
      outline: element('g', { class: 'wanted-outline' }, outlines.join('')),
      label: element('g', { class: 'wanted-label' }, labels.join('')),
    };
  }
  for (const [low, high] of r.wantedImage) box(low, high, FILL.wanted, true);
  const first = r.wantedImage[0];
  let label = '';
  if (first) {
    const text = 'wanted image';
    const w = textWidth(text, SMALL, { bold: true }) + 8;
    const centre = Math.min(Math.max(x.at((first[0] + first[1]) / 2), x.range[0] + w / 2), x.range[1] - w / 2);
    label =
      element('rect', { x: centre - w / 2, y: bottom - 20, width: w, height: 14, fill: '#fff', stroke: '#1f4e79', 'stroke-width': 0.8 }) +
      textElement(centre, bottom - 9, text, { 'text-anchor': 'middle', 'font-size': SMALL, 'font-weight': 'bold' });
  }
  return {
    fill: element('g', { class: 'wanted' }, fills.join('')),
    outline: element('g', { class: 'wanted-outline' }, outlines.join('')),
    label: element('g', { class: 'wanted-label' }, label),
  };
}

interface Box {
  readonly left: number;
  readonly top: number;
  readonly right: number;
  readonly bottom: number;
}

const overlaps = (a: Box, b: Box) => a.left < b.right && b.left < a.right && a.top < b.bottom && b.top < a.bottom;
const markerBox = (cx: number, cy: number): Box => ({
  left: cx - MARKER_REACH,
  top: cy - MARKER_REACH,
  right: cx + MARKER_REACH,
  bottom: cy + MARKER_REACH,
});

/**
 * A dashed horizontal line across the plot, and its words on a white box
 * (drawn later, over every line): under the line (by a marker's half-width)
 * at the preferred end when that keeps clear of `taken`, else the first
 * clear place stepping along the line under it, then over it; no words when
 * none is clear (the legend names the line and its level).
 */
function levelLine(
  at: number,
  text: string,
  dash: string,
  end: 'start' | 'end',
  taken: readonly Box[],
): { line: string; name: string; box: Box | null } {
  const label = withMinus(text);
  const w = textWidth(label, SMALL) + 6;
  const [first, last] = [LEFT + 2, WIDTH - RIGHT - 2 - w];
  const steps = Math.max(1, Math.floor((last - first) / 24));
  const lefts = Array.from({ length: steps + 1 }, (_, i) =>
    end === 'end' ? last - ((last - first) * i) / steps : first + ((last - first) * i) / steps,
  );
  // Under the line, clear of a marker sitting on it (peaks lie above the floor, so their markers too).
  const places = [at + MARKER_REACH + 1, at - 14].flatMap((top) =>
    lefts.map((left): Box => ({ left, top, right: left + w, bottom: top + 12 })),
  );
  const box = places.find((b) => !taken.some((t) => overlaps(b, t))) ?? null;
  const line = element('line', {
    x1: LEFT,
    y1: at,
    x2: WIDTH - RIGHT,
    y2: at,
    stroke: '#000',
    'stroke-width': 1,
    'stroke-dasharray': dash,
  });
  if (box === null) return { line, name: '', box };
  return {
    line,
    name:
      element('rect', { x: box.left, y: box.top, width: w, height: 12, fill: '#fff', opacity: 0.9 }) +
      textElement(box.left + w / 2, box.top + 9, label, { 'text-anchor': 'middle', 'font-size': SMALL }),
    box,
  };
}

const labelBaseline = (row: number) => HEAD + (row + 1) * LABEL_ROW - 2;

/** The kinds of marker the legend keys. */
type Kind = 'predicted' | 'contradicting' | 'unlisted' | 'intrusion';

/** A predicted line: a triangle pointing down at the plan level, open when its judgement agrees, filled when it contradicts. */
function predictionMarker(filled: boolean, cx: number, cy: number): string {
  const s = 4.5;
  return element('path', {
    d: `M${cx - s} ${cy - s}L${cx + s} ${cy - s}L${cx} ${cy + s * 0.6}Z`,
    fill: filled ? '#000' : '#fff',
    stroke: '#000',
    'stroke-width': 1.1,
  });
}

/** A measured peak no line of the plan accounts for: an open diamond. */
function unlistedMarker(cx: number, cy: number): string {
  const s = 4.5;
  return element('path', {
    d: `M${cx} ${cy - s}L${cx + s} ${cy}L${cx} ${cy + s}L${cx - s} ${cy}Z`,
    fill: '#fff',
    stroke: '#000',
    'stroke-width': 1.2,
  });
}

function legendEntries(r: VerifyResult, intrusionBins: ReadonlySet<number>): Array<LegendEntry & { kind?: Kind }> {
  const line = (dash: string | undefined, width: number) => (cx: number, cy: number) =>
    element('line', { x1: cx - 11, y1: cy, x2: cx + 11, y2: cy, stroke: '#000', 'stroke-width': width, 'stroke-dasharray': dash });
  const unlisted = r.unlisted.filter((u) => !intrusionBins.has(u.bin)).length;
  const contradicting = r.predictions.filter(contradicts).length;
  return [
    { swatch: line(undefined, 0.8), text: 'measured (max-hold, one column per pixel)' },
    ...(r.channels.length > 1
      ? r.channels.map((c, i) => ({ swatch: boxSwatch(channelFill(i)), text: `channel ${c.label}`, drawn: c.image.length > 0 }))
      : [{ swatch: boxSwatch(FILL.wanted), text: 'wanted image', drawn: r.wantedImage.length > 0 }]),
    { swatch: boxSwatch(FILL.guard), text: `margin ${T.frequency(r.margin)}`, drawn: r.wantedImage.length > 0 && r.margin > 0 },
    { swatch: line('8 3 2 3', 1), text: withMinus(`threshold ${T.level(r.levels.threshold)} dBFS`) },
    {
      swatch: line('4 3', 1),
      text: withMinus(
        `peak floor ${T.level(r.levels.floor)} dBFS (noise median + ${T.decibels(r.levels.floor - r.levels.noiseMedian)} dB)`,
      ),
    },
    {
      swatch: (cx, cy) => predictionMarker(false, cx, cy),
      text: `predicted line (${r.predictions.length})`,
      drawn: r.predictions.some((p) => !contradicts(p)),
      marker: true,
      kind: 'predicted',
    },
    {
      swatch: (cx, cy) => predictionMarker(true, cx, cy),
      text: `predicted, contradicts the plan (${contradicting})`,
      drawn: contradicting > 0,
      marker: true,
      kind: 'contradicting',
    },
    { swatch: unlistedMarker, text: `unlisted peak (${unlisted})`, drawn: unlisted > 0, marker: true, kind: 'unlisted' },
    {
      swatch: failMarker,
      text: `intrusion into the margin (${r.intrusions.length})`,
      drawn: r.intrusions.length > 0,
      marker: true,
      kind: 'intrusion',
    },
  ];
}

/** Intrusions, then the strongest unlisted peaks, one line each with their marker. */
function peakList(r: VerifyResult, intrusionBins: ReadonlySet<number>, left: number, top: number): { markup: string; height: number } {
  const several = r.channels.length > 1;
  // With several channels each intrusion is named by the channel it lands on.
  const rows: Array<{ row: PeakRow; intrusion: boolean; image: string }> = [
    ...(several
      ? r.channels.flatMap((c) => c.intrusions.map((row) => ({ row, intrusion: true, image: `the ${c.label} image` })))
      : r.intrusions.map((row) => ({ row, intrusion: true, image: 'the wanted image' }))),
    ...r.unlisted
      .filter((u) => !intrusionBins.has(u.bin))
      .sort((a, b) => b.level - a.level)
      .map((row) => ({ row, intrusion: false, image: several ? 'the nearest channel image' : 'the wanted image' })),
  ];
  if (rows.length === 0) return { markup: '', height: 0 };
  const step = 14;
  const parts: string[] = [];
  const shown = rows.slice(0, LISTED_PEAKS);
  shown.forEach(({ row, intrusion, image }, i) => {
    const cy = top + i * step + 6;
    const shape = intrusion ? failMarker(left + 6, cy) : unlistedMarker(left + 6, cy);
    const where = row.distance === 0 ? `inside ${image}` : `${T.frequency(row.distance)} from ${image}`;
    // A peak a predicted line was measured on carries no explanation of its own: name that line, as the verdict does.
    const line = r.predictions.find((p) => p.measured?.bin === row.bin);
    const what = row.explainedBy ?? (line ? `${line.check}, ${line.line}` : 'unexplained');
    const text = `${T.frequency(row.frequency)}, ${T.level(row.level)} dBFS, ${intrusion ? 'intrusion, ' : ''}${where}: ${what}`;
    const shown = clipped(withMinus(text), WIDTH - left - 18 - 12, SMALL);
    parts.push(markerGroup(shown, shape), textElement(left + 18, cy + 3.5, shown, { 'font-size': SMALL }));
  });
  let height = shown.length * step;
  if (rows.length > shown.length) {
    parts.push(
      textElement(left + 18, top + height + 9.5, `and ${rows.length - shown.length} more (see the table or --json)`, {
        'font-size': SMALL,
        'font-style': 'italic',
      }),
    );
    height += step;
  }
  return { markup: element('g', { class: 'peaks' }, parts.join('')), height };
}
