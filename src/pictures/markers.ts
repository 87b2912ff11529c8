import { element } from './svg-element.js';

/**
 * Candidate markers that differ in shape, not only in tone: a filled disc
 * for a rate that passes, an open square with a cross for one that fails.
 * White outlines keep them visible on solid and hatched fills.
 */

/**
 * A passing candidate: a black disc ringed in white.
 *
 * @param x, y centre, px
 */
export function passMarker(x: number, y: number): string {
  return element('circle', { cx: x, cy: y, r: 4.5, fill: '#000', stroke: '#fff', 'stroke-width': 1.5 });
}

/**
 * A failing candidate: an open square crossed.
 *
 * @param x, y centre, px
 */
export function failMarker(x: number, y: number): string {
  const s = 4;
  return (
    element('rect', { x: x - s, y: y - s, width: 2 * s, height: 2 * s, fill: '#fff', stroke: '#000', 'stroke-width': 1.3 }) +
    element('path', { d: `M${x - s} ${y - s}L${x + s} ${y + s}M${x + s} ${y - s}L${x - s} ${y + s}`, stroke: '#000', 'stroke-width': 1.3 })
  );
}

/**
 * A marker's shapes as one group that names the text labelling it (the
 * label beside it, its key number, or the legend entry of its kind), so
 * that a reader of the SVG, and the picture tests, can tell every marker
 * is labelled or keyed.
 *
 * @param label the words drawn elsewhere in the picture that label this marker
 * @param shapes the marker's markup
 * @example markerGroup('3', '') // '<g class="marker" data-label="3"></g>'
 */
export function markerGroup(label: string, shapes: string): string {
  return element('g', { class: 'marker', 'data-label': label }, shapes);
}

/**
 * The marker for a candidate's verdict, naming its label.
 *
 * @param pass whether the candidate passes
 * @param x, y centre, px
 * @param label the text that labels it (see markerGroup)
 */
export function candidateMarker(pass: boolean, x: number, y: number, label: string): string {
  return markerGroup(label, pass ? passMarker(x, y) : failMarker(x, y));
}
