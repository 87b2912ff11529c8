import { element, px, textElement } from './svg-element.js';
import type { Scale } from './scale.js';
import { quantityText } from '../text/quantity-text.js';
import { textWidth } from './typography.js';

/** One tick: where it sits in data units and what it reads. */
export interface Tick {
  readonly value: number;
  readonly label: string;
}

export const AXIS_FONT = 11;
const TICK = 5;

/**
 * A horizontal axis: a line at `y`, ticks down, labels below (a label that
 * would touch its left neighbour is left out, the tick kept), the title
 * centred under them, and optional light grid lines up to `gridTop`.
 *
 * @param scale data → x, px
 * @param ticks ticks inside the scale's domain, labels as written (numberTicks, inUnit: the text layer's)
 * @param y the axis line, px
 * @param title e.g. 'sampling rate (MHz)'
 * @param gridTop y of the plot's top edge for grid lines, or undefined for none
 * @returns SVG markup
 */
export function horizontalAxis(scale: Scale, ticks: readonly Tick[], y: number, title: string, gridTop?: number): string {
  const [x0, x1] = scale.range;
  const parts = [element('line', { x1: x0, y1: y, x2: x1, y2: y, stroke: '#000', 'stroke-width': 1 })];
  let lastRight = -Infinity;
  for (const tick of ticks) {
    const x = scale.at(tick.value);
    if (gridTop !== undefined)
      parts.push(
        element('line', {
          class: 'grid',
          x1: x,
          y1: gridTop,
          x2: x,
          y2: y,
          stroke: '#c8c8c8',
          'stroke-width': 0.5,
          'stroke-dasharray': '2 3',
        }),
      );
    parts.push(element('line', { x1: x, y1: y, x2: x, y2: y + TICK, stroke: '#000', 'stroke-width': 1 }));
    const half = textWidth(tick.label, AXIS_FONT) / 2;
    if (x - half < lastRight + 6) continue;
    lastRight = x + half;
    parts.push(textElement(x, y + TICK + AXIS_FONT + 2, tick.label, { 'text-anchor': 'middle', 'font-size': AXIS_FONT }));
  }
  parts.push(textElement((x0 + x1) / 2, y + TICK + 2 * AXIS_FONT + 10, title, { 'text-anchor': 'middle', 'font-size': AXIS_FONT + 1 }));
  return element('g', { class: 'axis-x' }, parts.join(''));
}

/**
 * A vertical axis: a line at `x`, ticks left, labels right-aligned beside
 * them (one that would touch the one below is left out), the title turned
 * upright along the axis, optional grid lines across to `gridRight`.
 *
 * @param scale data → y, px
 * @param ticks ticks inside the scale's domain
 * @param x the axis line, px
 * @param title e.g. 'level (dBFS)'
 * @param gridRight x of the plot's right edge for grid lines, or undefined
 * @returns SVG markup
 */
export function verticalAxis(scale: Scale, ticks: readonly Tick[], x: number, title: string, gridRight?: number): string {
  const [y0, y1] = scale.range;
  const parts = [element('line', { x1: x, y1: y0, x2: x, y2: y1, stroke: '#000', 'stroke-width': 1 })];
  let lastTop = Infinity;
  let widest = 0;
  for (const tick of ticks) {
    const y = scale.at(tick.value);
    if (gridRight !== undefined)
      parts.push(
        element('line', {
          class: 'grid',
          x1: x,
          y1: y,
          x2: gridRight,
          y2: y,
          stroke: '#c8c8c8',
          'stroke-width': 0.5,
          'stroke-dasharray': '2 3',
        }),
      );
    parts.push(element('line', { x1: x - TICK, y1: y, x2: x, y2: y, stroke: '#000', 'stroke-width': 1 }));
    if (y + AXIS_FONT / 2 > lastTop - 2) continue;
    lastTop = y - AXIS_FONT / 2;
    widest = Math.max(widest, textWidth(tick.label, AXIS_FONT));
    parts.push(textElement(x - TICK - 3, y + AXIS_FONT * 0.35, tick.label, { 'text-anchor': 'end', 'font-size': AXIS_FONT }));
  }
  const titleX = x - TICK - 3 - widest - 10;
  const titleY = (y0 + y1) / 2;
  parts.push(
    textElement(titleX, titleY, title, {
      'text-anchor': 'middle',
      'font-size': AXIS_FONT + 1,
      transform: `rotate(-90 ${px(titleX)} ${px(titleY)})`,
    }),
  );
  return element('g', { class: 'axis-y' }, parts.join(''));
}

/**
 * Ticks labelled by their value as a plain number (levels in dBFS,
 * attenuation in dB, ratios), written by the text layer for SVG: the
 * decimals the set needs and the true minus.
 *
 * @param values the tick values
 * @returns one tick per value
 * @example numberTicks([-20, -7.5, 0])[0].label // '−20.0'
 */
export function numberTicks(values: readonly number[]): Tick[] {
  const labels = quantityText('svg').ticks(values);
  return values.map((value, i) => ({ value, label: labels[i]! }));
}
