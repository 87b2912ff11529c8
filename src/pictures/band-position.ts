import type { PlanReport, ReportedCandidate } from '../plan/plan-report.js';
import { quantityText } from '../text/quantity-text.js';

const T = quantityText('svg');
import { horizontalAxis, numberTicks, verticalAxis } from './axis.js';
import { spreadApart, wrapPhrases } from './label-packing.js';
import { clipped, textWidth } from './typography.js';
import { boxSwatch, legendRows } from './legend.js';
import { candidateMarker, failMarker, passMarker } from './markers.js';
import { coveringTicks, linearTicks } from './nice-ticks.js';
import { FILL } from './patterns.js';
import { linearScale, type Scale } from './scale.js';
import { findCandidate } from './spectrum.js';
import { element, pointList, textElement } from './svg-element.js';
import { svgDocument, type Figure } from './svg-document.js';
import { textOnWhite } from './text-on-white.js';
import { allowedWedges, type Wedge } from './wedges.js';

const WIDTH = 960;
const LEFT = 78;
const PLOT_RIGHT = 540;
/** Plot height, px. */
const PLOT_HEIGHT = 456;
const SMALL = 9.5;
const HEADING_FONT = 10.5;
const HEADING_LINE = 14;
/** Least room kept at the picture's right edge, px. */
const MARGIN = 12;
/** Most candidates labelled beside the design line, best first; the rest are marked only. */
const MOST_LABELS = 16;

/**
 * The band-position chart of Vaughan, Scott & White (1991): sampling rate
 * over bandwidth (fs/B) against upper band edge over bandwidth (fH/B), with
 * the allowed region of each Nyquist zone n drawn as its exact wedge
 * (upright zones grey, inverted zones dotted, zone numbers along the right
 * edge), the design's guarded band as a vertical line at its fH/B (where it
 * crosses a wedge are the legal windows), the searched rate range, and the
 * candidates as points on the line (disc: passes; crossed square: fails).
 *
 * @param report the solved plan
 * @param candidateLabel mark only this candidate (the others drawn small), or all when absent
 * @returns the figure, 960 px wide, about 620 px high
 * @throws InputError when candidateLabel names no candidate
 */
export function bandPositionFigure(report: PlanReport, candidateLabel?: string): Figure {
  const focus = candidateLabel === undefined ? null : findCandidate(report, candidateLabel);
  const fL = Math.max(0, report.band.low - report.guard.low);
  const fH = report.band.high + report.guard.high;
  const B = fH - fL;
  const design = fH / B;
  const rates = report.candidates.map((c) => c.rate / B);
  const xTicks = coveringTicks(1, Math.max(4, design * 1.12, design + 1), 8);
  const xMax = xTicks.values[xTicks.values.length - 1]!;
  const yTicks = coveringTicks(0, Math.max(4, 2.2 * design, ...rates.map((r) => r * 1.08)), 8);
  const yMax = yTicks.values[yTicks.values.length - 1]!;
  const head = heading(report, fL, fH, design);
  const top = head.bottom + 22;
  const bottom = top + PLOT_HEIGHT;
  const x = linearScale([1, xMax], [LEFT, PLOT_RIGHT]);
  const y = linearScale([0, yMax], [bottom, top]);

  const parts: string[] = [head.markup];
  parts.push(
    element('rect', {
      class: 'plot-edge',
      x: LEFT,
      y: top,
      width: PLOT_RIGHT - LEFT,
      height: bottom - top,
      fill: '#fff',
      stroke: '#000',
      'stroke-width': 0.8,
    }),
  );
  const wedges = allowedWedges(xMax, yMax);
  // Many wedges crowd towards (fH/B, 2): thinner outlines keep them apart.
  const outline = wedges.length > 24 ? 0.25 : 0.7;
  for (const w of wedges)
    parts.push(
      element('polygon', {
        points: pointList(w.points.map(([a, b]) => [x.at(a), y.at(b)])),
        fill: w.inverted ? FILL.inverted : '#dcdcdc',
        stroke: '#000',
        'stroke-width': outline,
      }),
    );
  parts.push(
    element('line', {
      x1: x.at(design),
      y1: top,
      x2: x.at(design),
      y2: bottom,
      stroke: '#000',
      'stroke-width': 1.4,
      'stroke-dasharray': '7 3',
    }),
  );
  parts.push(
    textElement(x.at(design), top - 6, `this design: fH/B = ${T.number(design, 4)}`, {
      'text-anchor': design > (1 + xMax) / 2 ? 'end' : 'start',
      'font-size': SMALL,
      'font-weight': 'bold',
    }),
  );
  const marked = markedCandidates(report, focus, B, yMax);
  parts.push(candidatePoints(report, marked, focus, B, design, x, y));
  // Drawn over the candidates' leader lines, on white: a leader passes behind a zone number or a search line's name.
  parts.push(zoneNumbers(wedges, x, y, xMax, yMax));
  parts.push(searchLines(report, B, x, y, yMax));
  parts.push(verticalAxis(y, numberTicks(yTicks.values), LEFT, 'sampling rate / bandwidth, fs/B', PLOT_RIGHT));
  parts.push(horizontalAxis(x, numberTicks(linearTicks(1, xMax, 8).values), bottom, 'upper band edge / bandwidth, fH/B'));
  const legend = legendRows(
    [
      { swatch: boxSwatch('#dcdcdc'), text: 'allowed, upright zone', drawn: wedges.some((w) => !w.inverted) },
      { swatch: boxSwatch(FILL.inverted), text: 'allowed, inverted zone', drawn: wedges.some((w) => w.inverted) },
      { swatch: boxSwatch('#fff'), text: 'aliasing' },
      { swatch: (a, b) => passMarker(a, b), text: 'candidate passes', drawn: marked.some((c) => c.pass), marker: true },
      { swatch: (a, b) => failMarker(a, b), text: 'candidate fails', drawn: marked.some((c) => !c.pass), marker: true },
    ],
    24,
    bottom + 56,
    WIDTH - 20,
  );
  parts.push(legend.markup);
  return {
    width: WIDTH,
    height: Math.ceil(bottom + 56 + legend.height + 12),
    title: `Band-position chart: ${report.scenario}`,
    body: parts.join(''),
  };
}

/**
 * The band-position chart as a standalone SVG document (see bandPositionFigure).
 *
 * @param report the solved plan
 * @param candidateLabel mark only this candidate, or all when absent
 * @returns SVG text, 960 px wide
 * @example bandPositionSvg(report).includes('fs/B') // true
 */
export function bandPositionSvg(report: PlanReport, candidateLabel?: string): string {
  return svgDocument(bandPositionFigure(report, candidateLabel));
}

/** The title and the chart's rule, wrapped to the picture's width; returns the markup and the last baseline, px. */
function heading(report: PlanReport, fL: number, fH: number, design: number): { markup: string; bottom: number } {
  const B = fH - fL;
  const lines = wrapPhrases(
    [
      'zone n allows 2·fH/n ≤ fs ≤ 2·(fH − B)/(n − 1) (Vaughan, Scott & White 1991);',
      `guarded band ${T.extent(fL, fH)}, B = ${T.frequency(B)}`,
      '(the guarded width: fs/B and fH/B divide by it),',
      `fH/B = ${T.number(design, 4)}`,
    ],
    WIDTH - 24 - MARGIN,
    HEADING_FONT,
    ' ',
  );
  const markup =
    textElement(24, 22, clipped(`Band-position chart: ${report.scenario}`, WIDTH - 24 - MARGIN, 14, { bold: true }), {
      'font-size': 14,
      'font-weight': 'bold',
    }) + lines.map((line, i) => textElement(24, 40 + i * HEADING_LINE, line, { 'font-size': HEADING_FONT })).join('');
  return { markup, bottom: 40 + (lines.length - 1) * HEADING_LINE };
}

/** Zone numbers in the gutter right of the plot, each beside its wedge's right end; crowded ones thinned. */
function zoneNumbers(wedges: readonly Wedge[], x: Scale, y: Scale, xMax: number, yMax: number): string {
  const parts: string[] = [];
  let lastY = -Infinity;
  for (const w of wedges) {
    // Middle of the wedge's section at the right edge, or where it leaves through the top.
    const low = (2 * xMax) / w.zone;
    const high = w.zone === 1 ? yMax : Math.min((2 * (xMax - 1)) / (w.zone - 1), yMax);
    if (low >= yMax) {
      const inside = w.points.reduce((sum, [a]) => sum + a, 0) / w.points.length;
      parts.push(textOnWhite(x.at(inside), y.at(yMax) + 12, zoneName(w, wedges.length), SMALL, 'middle'));
      continue;
    }
    // Zones step down the page as n grows: keep a number only when clear of the one above.
    const at = y.at((low + high) / 2);
    if (at < lastY + 11) continue;
    lastY = at;
    const name = zoneName(w, wedges.length);
    parts.push(element('line', { x1: x.at(xMax), y1: at, x2: x.at(xMax) + 5, y2: at, stroke: '#000', 'stroke-width': 0.6 }));
    parts.push(textOnWhite(x.at(xMax) + 7, at + 3.5, name, SMALL));
  }
  return element('g', { class: 'zones' }, parts.join(''));
}

/** "zone n (inv)" while there are few zones, the bare number when many crowd the gutter. */
function zoneName(w: Wedge, count: number): string {
  return count <= 12 ? `zone ${w.zone}${w.inverted ? ' (inv)' : ''}` : String(w.zone);
}

function searchLines(report: PlanReport, B: number, x: Scale, y: Scale, yMax: number): string {
  const parts: string[] = [];
  // The slowest rate is labelled under its line and the fastest over it, so close lines keep both labels clear.
  for (const [rate, text, below] of [
    [report.search.minRate, 'slowest rate searched', true],
    [report.search.maxRate, 'fastest rate searched', false],
  ] as const) {
    const at = rate / B;
    if (at <= 0 || at > yMax) continue;
    parts.push(
      element('line', {
        x1: x.range[0],
        y1: y.at(at),
        x2: x.range[1],
        y2: y.at(at),
        stroke: '#000',
        'stroke-width': 0.8,
        'stroke-dasharray': '2 2',
      }),
    );
    parts.push(textOnWhite(x.range[0] + 5, below ? y.at(at) + 10 : y.at(at) - 4, text, 8.5, 'start', { italic: true }));
  }
  return element('g', { class: 'search' }, parts.join(''));
}

/** The candidates drawn as markers: the one in focus, else every one whose fs/B is inside the chart. */
function markedCandidates(report: PlanReport, focus: ReportedCandidate | null, B: number, yMax: number): ReportedCandidate[] {
  return focus ? [focus] : report.candidates.filter((c) => c.rate / B <= yMax);
}

function candidatePoints(
  report: PlanReport,
  marked: readonly ReportedCandidate[],
  focus: ReportedCandidate | null,
  B: number,
  design: number,
  x: Scale,
  y: Scale,
): string {
  const parts: string[] = [];
  const at = x.at(design);
  const inChart = (c: ReportedCandidate) => c.rate / B <= y.domain[1];
  if (focus) {
    for (const c of report.candidates.filter((c) => c !== focus && inChart(c)))
      parts.push(element('circle', { cx: at, cy: y.at(c.rate / B), r: 1.8, fill: '#777' }));
  }
  const labelled = marked.slice(0, MOST_LABELS).sort((a, b) => b.rate - a.rate);
  const wanted = labelled.map((c) => y.at(c.rate / B));
  const [bottom, top] = y.range;
  const placed = spreadApart(wanted, 12, top + 6, bottom - 4);
  const labelX = Math.max(at, x.range[1]) + 76;
  const textOf = new Map<ReportedCandidate, string>();
  labelled.forEach((c, i) => {
    const bold = c.label === report.best;
    const text = fitted(
      [`${c.label}: ${T.rate(c.rate)} = ${T.number(c.rate / B, 4)}·B`, `${c.label}: ${T.rate(c.rate)}`, c.label],
      WIDTH - MARGIN - labelX,
      bold,
    );
    textOf.set(c, text);
    parts.push(
      element('path', {
        d: `M${at + 6} ${wanted[i]}L${labelX - 36} ${wanted[i]}L${labelX - 4} ${placed[i]}`,
        fill: 'none',
        stroke: '#777',
        'stroke-width': 0.5,
      }),
    );
    parts.push(textElement(labelX, placed[i]! + 3.5, text, { 'font-size': SMALL, 'font-weight': bold ? 'bold' : undefined }));
  });
  // A marker past MOST_LABELS is keyed by its kind's legend entry (the note under the chart counts them).
  for (const c of marked)
    parts.push(candidateMarker(c.pass, at, y.at(c.rate / B), textOf.get(c) ?? (c.pass ? 'candidate passes' : 'candidate fails')));
  const unlabelled = marked.length - labelled.length;
  if (unlabelled > 0)
    parts.push(
      textElement(labelX, bottom + 12, `+${unlabelled} more candidates marked, not labelled`, {
        'font-size': SMALL,
        'font-style': 'italic',
      }),
    );
  return element('g', { class: 'candidates' }, parts.join(''));
}

/** The first text that fits `room` px, else the last one cut with an ellipsis to fit. */
function fitted(texts: readonly string[], room: number, bold: boolean): string {
  const fits = (t: string) => textWidth(t, SMALL, { bold }) <= room;
  const found = texts.find(fits);
  if (found !== undefined) return found;
  const chars = [...texts[texts.length - 1]!];
  while (chars.length > 1 && !fits(chars.join('') + '…')) chars.pop();
  return chars.join('') + '…';
}
