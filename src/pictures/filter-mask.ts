import type { PlanReport, ReportedCandidate } from '../plan/plan-report.js';
import type { MaskBand } from '../after-rate/filter-mask.js';
import { filterAttenuation } from '../filter/filter-attenuation.js';
import { quantityText } from '../text/quantity-text.js';
import { hz } from '../units/quantities.js';
import { horizontalAxis, numberTicks, verticalAxis } from './axis.js';
import { frequencyUnit, inUnit } from './frequency-unit.js';
import { packLabels } from './label-packing.js';
import { boxSwatch, legendRows } from './legend.js';
import { coveringTicks, linearTicks } from './nice-ticks.js';
import { FILL } from './patterns.js';
import { linearScale, type Scale } from './scale.js';
import { findCandidate } from './spectrum.js';
import { element, pointList, textElement } from './svg-element.js';
import { clipped, TEXT_DESCENT, textWidth, withMinus } from './typography.js';
import { svgDocument, type Figure } from './svg-document.js';

const T = quantityText('svg');
const WIDTH = 960;
const LEFT = 84;
const RIGHT = 28;
const LABEL_ROWS = 4;
const LABEL_ROW = 12;
const PLOT_HEIGHT = 280;
const SMALL = 9.5;
/** Width a heading line may take, px. */
const ROOM = WIDTH - 24 - 12;
/** Samples of the filter curve per pixel of plot width. */
const SAMPLES_PER_PX = 2;

/**
 * The anti-alias filter mask of one candidate: required attenuation against
 * input frequency from 0 Hz to the converter's input bandwidth. Each alias
 * band is a hatched stop region as tall as the attenuation it needs (the
 * filter's curve must stay above it); the channel is the shaded passband;
 * the scenario's filter is drawn over them as a curve (a flat 0 dB line with
 * no filter), its least attenuation over each band as a short bar, and each
 * band's margin labelled above the plot (bold where it falls short), tightest
 * first where labels compete for room.
 *
 * @param report a plan report built with after-rate inputs
 * @param candidateLabel a label from report.candidates
 * @returns the figure, 960 px wide; null when the report carries no after-rate figures
 * @throws InputError when no candidate has that label
 * @example filterMaskFigure(report, report.best!)?.title // 'Anti-alias filter mask at best in 171–194.5 MHz: Heron-4 base'
 */
export function filterMaskFigure(report: PlanReport, candidateLabel: string): Figure | null {
  const candidate = findCandidate(report, candidateLabel);
  const after = candidate.afterRate;
  const inputs = report.afterRateInputs;
  if (after === null || inputs === null) return null;
  const { mask } = after;
  const span = inputs.inputBandwidth;
  const plotX: readonly [number, number] = [LEFT, WIDTH - RIGHT];
  const x = linearScale([0, span], plotX);
  const highest = Math.max(mask.requiredDb, ...mask.bands.map((b) => Math.min(b.givenDb, mask.requiredDb + 60)));
  const levelTicks = coveringTicks(0, Math.max(20, highest + 10), 8);
  const top = levelTicks.values[levelTicks.values.length - 1]!;

  const ordered = [...mask.bands].sort((a, b) => a.marginDb - b.marginDb);
  const placed = packLabels(
    ordered.map((band) => ({
      x: x.at((band.low + band.high) / 2),
      text: withMinus(marginText(band)),
      leader: x.at((band.low + band.high) / 2),
      bold: band.marginDb < 0,
      item: band,
    })),
    LABEL_ROWS,
    plotX,
    SMALL,
  );
  const rows = placed.reduce((n, p) => Math.max(n, p.row + 1), 0);
  const plotTop = 64 + rows * LABEL_ROW + 8;
  const plotBottom = plotTop + PLOT_HEIGHT;
  const y = linearScale([0, top], [plotBottom, plotTop]);
  const clampY = (db: number) => y.at(Math.min(Math.max(db, 0), top));

  const parts: string[] = [heading(report, candidate)];
  // The channel: the passband, shaded the full height.
  const channel = report.band;
  parts.push(
    element('rect', {
      x: x.at(channel.low),
      y: plotTop,
      width: Math.max(x.at(channel.high) - x.at(channel.low), 1.5),
      height: PLOT_HEIGHT,
      fill: FILL.wanted,
      stroke: '#1f4e79',
      'stroke-width': 1,
    }),
  );
  // Stop regions: from 0 dB up to the attenuation needed.
  const stops = mask.bands.map((band) => {
    const x0 = x.at(band.low);
    const w = Math.max(x.at(band.high) - x0, 1.5);
    return element('rect', {
      x: x0,
      y: clampY(band.requiredDb),
      width: w,
      height: plotBottom - clampY(band.requiredDb),
      fill: FILL.blocked,
      stroke: '#8f2d1f',
      'stroke-width': 1,
    });
  });
  parts.push(element('g', { class: 'stop-regions' }, stops.join('')));
  const curve = filterCurve(report, x, y, span);
  parts.push(curve.markup);
  // The filter's least attenuation over each band, and the margin label's leader.
  for (const band of mask.bands) {
    const x0 = x.at(band.low);
    const w = Math.max(x.at(band.high) - x0, 1.5);
    parts.push(
      element('rect', {
        x: x0,
        y: clampY(band.givenDb) - 1.5,
        width: w,
        height: 3,
        fill: band.marginDb >= 0 ? '#000' : '#fff',
        stroke: '#000',
        'stroke-width': 1,
      }),
    );
  }
  const labels: string[] = [];
  for (const p of placed) {
    const baseline = 64 + (p.row + 1) * LABEL_ROW - 2;
    const at = x.at((p.item.low + p.item.high) / 2);
    labels.push(
      element('line', {
        x1: at,
        y1: baseline + TEXT_DESCENT * SMALL + 1,
        x2: at,
        y2: Math.min(clampY(p.item.givenDb), clampY(p.item.requiredDb)) - 2,
        stroke: '#555',
        'stroke-width': 0.5,
        'stroke-dasharray': '1 2',
      }),
    );
    labels.push(
      textElement(p.x, baseline, p.text, {
        'text-anchor': 'middle',
        'font-size': SMALL,
        'font-weight': p.item.marginDb < 0 ? 'bold' : undefined,
      }),
    );
  }
  parts.push(element('g', { class: 'margins' }, labels.join('')));
  const required = `needed ${T.decibels(mask.requiredDb)} dB`;
  const w = textWidth(required, SMALL) + 6;
  parts.push(element('rect', { x: LEFT + 2, y: clampY(mask.requiredDb) - 14, width: w, height: 12, fill: '#fff', opacity: 0.9 }));
  parts.push(textElement(LEFT + 2 + w / 2, clampY(mask.requiredDb) - 5, required, { 'text-anchor': 'middle', 'font-size': SMALL }));

  parts.push(verticalAxis(y, numberTicks(levelTicks.values), LEFT, 'attenuation (dB)', WIDTH - RIGHT));
  const unit = frequencyUnit(span);
  const ticks = linearTicks(0, span, 10).values.map((v) => ({ value: v, label: inUnit(v, unit) }));
  parts.push(horizontalAxis(x, ticks, plotBottom, `input frequency (${unit.unit}), up to the converter's input bandwidth`));
  const legend = legendRows(
    [
      {
        swatch: boxSwatch(FILL.blocked),
        text: `alias band: the filter must give ${T.decibels(mask.requiredDb)} dB or more`,
        drawn: mask.bands.length > 0,
      },
      { swatch: boxSwatch(FILL.wanted), text: 'channel (passband)' },
      {
        swatch: (cx, cy) => element('line', { x1: cx - 11, y1: cy, x2: cx + 11, y2: cy, stroke: '#000', 'stroke-width': 2 }),
        text: report.afterRateInputs?.filter
          ? `the scenario's filter${curve.clipped ? ` (drawn up to ${T.decibels(top)} dB)` : ''}`
          : 'no filter stated (0 dB)',
      },
      {
        swatch: (cx, cy) => element('rect', { x: cx - 11, y: cy - 1.5, width: 22, height: 3, fill: '#000', stroke: '#000' }),
        text: 'its least attenuation over a band (open: short)',
        drawn: mask.bands.length > 0,
      },
    ],
    24,
    plotBottom + 56,
    WIDTH - RIGHT,
  );
  parts.push(legend.markup);
  const height = Math.ceil(plotBottom + 56 + legend.height + 12);
  return { width: WIDTH, height, title: `Anti-alias filter mask at ${candidate.label}: ${report.scenario}`, body: parts.join('') };
}

/**
 * The filter mask as a standalone SVG document (see filterMaskFigure).
 *
 * @param report a plan report built with after-rate inputs
 * @param candidateLabel a label from report.candidates
 * @returns SVG text; '' when the report carries no after-rate figures
 * @throws InputError when no candidate has that label
 * @example filterMaskSvg(report, report.best!) // '<svg ...'
 */
export function filterMaskSvg(report: PlanReport, candidateLabel: string): string {
  const figure = filterMaskFigure(report, candidateLabel);
  return figure === null ? '' : svgDocument(figure);
}

function marginText(band: MaskBand): string {
  return `${T.signedDecibels(band.marginDb)} dB`;
}

function heading(report: PlanReport, c: ReportedCandidate): string {
  const mask = c.afterRate!.mask;
  const level = mask.levelStated
    ? `out-of-band level ${T.level(mask.outOfBandLevel)} dBFS (stated)`
    : 'out-of-band level not stated: full scale assumed, reported only';
  const worst = mask.worst ? `; least margin ${T.decibels(mask.worst.marginDb)} dB at ${T.extent(mask.worst.low, mask.worst.high)}` : '';
  return (
    textElement(
      24,
      22,
      clipped(`Anti-alias filter mask at ${T.candidate(c.label, c.rate)}: ${report.scenario}`, ROOM, 14, { bold: true }),
      {
        'font-size': 14,
        'font-weight': 'bold',
      },
    ) +
    textElement(24, 40, clipped(`${level}; threshold ${T.level(mask.threshold)} dBFS${worst}`, ROOM, 11), { 'font-size': 11 }) +
    textElement(
      24,
      56,
      'Alias bands: every input range that lands on the channel (widened by the required margin) at this rate and its ±ppm. Labels: margin, dB.',
      { 'font-size': SMALL, 'font-style': 'italic' },
    )
  );
}

/** The scenario filter's attenuation sampled across the plot, clipped to the axis (and whether it was). */
function filterCurve(report: PlanReport, x: Scale, y: Scale, span: number): { markup: string; clipped: boolean } {
  const filter = report.afterRateInputs?.filter ?? null;
  const top = y.domain[1];
  const count = Math.ceil((x.range[1] - x.range[0]) * SAMPLES_PER_PX);
  const points: Array<[number, number]> = [];
  let clipped = false;
  for (let i = 0; i <= count; i++) {
    const f = hz((span * i) / count);
    const attenuation = filterAttenuation(filter, f);
    clipped ||= attenuation > top;
    points.push([x.at(f), y.at(Math.min(attenuation, top))]);
  }
  return {
    markup: element('polyline', {
      class: 'filter-curve',
      points: pointList(points),
      fill: 'none',
      stroke: '#000',
      'stroke-width': 2,
      'stroke-linejoin': 'round',
    }),
    clipped,
  };
}
