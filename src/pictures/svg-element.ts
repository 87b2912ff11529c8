import { escapeXml } from './escape-xml.js';

/** Attribute values; undefined and false leave the attribute out. */
export type Attributes = Readonly<Record<string, string | number | undefined | false>>;

/**
 * A coordinate or length for SVG, rounded to 0.01 px: short text, and no
 * exponent notation (which some readers refuse).
 *
 * @param value user units (px)
 * @example px(12.3456) // '12.35'
 */
export function px(value: number): string {
  const rounded = Math.round(value * 100) / 100;
  return Object.is(rounded, -0) ? '0' : String(rounded);
}

/**
 * One SVG element as text, attributes escaped; numbers written with px().
 *
 * @param name element name, e.g. 'rect'
 * @param attributes attribute values (numbers in user units)
 * @param content markup already built (escape text with escapeXml or use textElement)
 * @example element('rect', { x: 1, width: 2.5 }) // '<rect x="1" width="2.5"/>'
 */
export function element(name: string, attributes: Attributes, content?: string): string {
  const attrs = Object.entries(attributes)
    .filter(([, v]) => v !== undefined && v !== false)
    .map(([k, v]) => ` ${k}="${typeof v === 'number' ? px(v) : escapeXml(String(v))}"`)
    .join('');
  return content === undefined ? `<${name}${attrs}/>` : `<${name}${attrs}>${content}</${name}>`;
}

/**
 * A <text> element carrying escaped text (kept as text, never as outlines).
 *
 * @param x, y anchor point, px
 * @param text the words shown
 * @param attributes more attributes (text-anchor, font-size, ...)
 * @example textElement(10, 20, 'zone 2 (inv)', { 'text-anchor': 'end' }) // '<text x="10" y="20" text-anchor="end">zone 2 (inv)</text>'
 */
export function textElement(x: number, y: number, text: string, attributes: Attributes = {}): string {
  return element('text', { x, y, ...attributes }, escapeXml(text));
}

/**
 * A polyline or polygon's `points` attribute.
 *
 * @param points [x, y] pairs, px
 * @example pointList([[0, 0], [1.5, 2]]) // '0,0 1.5,2'
 */
export function pointList(points: ReadonlyArray<readonly [number, number]>): string {
  return points.map(([x, y]) => `${px(x)},${px(y)}`).join(' ');
}
