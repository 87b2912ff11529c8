import { element, textElement } from './svg-element.js';
import { markerGroup } from './markers.js';
import { textWidth } from './typography.js';

/** A legend entry: a swatch drawn centred on (x, y) and its words. */
export interface LegendEntry {
  readonly swatch: (x: number, y: number) => string;
  readonly text: string;
  /** False when the picture draws nothing of this kind: the entry is left out. */
  readonly drawn?: boolean;
  /** The swatch is a marker of the plot: grouped as one that this entry keys (markerGroup). */
  readonly marker?: boolean;
}

export const LEGEND_FONT = 10.5;
const ROW = 17;
const SWATCH = 22;

/**
 * Legend entries laid out left to right, wrapping to a new row at `right`;
 * an entry whose kind the picture does not draw (drawn: false) is left out,
 * so the legend keys only what is there.
 *
 * @param entries in reading order
 * @param left, top the legend's top-left corner, px
 * @param right px the entries must not pass
 * @returns the markup and the height used, px (0 when no entry is drawn)
 * @example legendRows([{ swatch: boxSwatch('#fff'), text: 'window', drawn: false }], 24, 0, 900).height // 0
 */
export function legendRows(all: readonly LegendEntry[], left: number, top: number, right: number): { markup: string; height: number } {
  const entries = all.filter((entry) => entry.drawn !== false);
  const parts: string[] = [];
  let x = left;
  let y = top + ROW / 2;
  for (const entry of entries) {
    const width = SWATCH + 6 + textWidth(entry.text, LEGEND_FONT) + 18;
    if (x > left && x + width > right) {
      x = left;
      y += ROW;
    }
    const swatch = entry.swatch(x + SWATCH / 2, y);
    parts.push(entry.marker ? markerGroup(entry.text, swatch) : swatch);
    parts.push(textElement(x + SWATCH + 6, y + LEGEND_FONT * 0.35, entry.text, { 'font-size': LEGEND_FONT }));
    x += width;
  }
  return { markup: element('g', { class: 'legend' }, parts.join('')), height: entries.length === 0 ? 0 : y + ROW / 2 - top };
}

/**
 * A swatch: a small box with the given fill, outlined.
 *
 * @param fill a colour or pattern url
 * @param dashed outline dashed (for things drawn dashed in the plot)
 */
export function boxSwatch(fill: string, dashed = false): (x: number, y: number) => string {
  return (x, y) =>
    element('rect', { x: x - SWATCH / 2, y: y - 6, width: SWATCH, height: 12, fill: '#fff' }) +
    element('rect', {
      x: x - SWATCH / 2,
      y: y - 6,
      width: SWATCH,
      height: 12,
      fill,
      stroke: '#000',
      'stroke-width': 1,
      'stroke-dasharray': dashed ? '3 2' : undefined,
    });
}
