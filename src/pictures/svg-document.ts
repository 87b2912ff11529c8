import { element } from './svg-element.js';
import { escapeXml } from './escape-xml.js';
import { channelPatternDefs, patternDefs } from './patterns.js';

/** A picture before it is wrapped: its size, its title and its markup. */
export interface Figure {
  /** px */
  readonly width: number;
  /** px */
  readonly height: number;
  /** Said in <title> for screen readers and tooltips. */
  readonly title: string;
  readonly body: string;
}

const SVG_NAMESPACE = 'http://www.w3.org/2000/svg';

/**
 * A standalone SVG document: stated width and height (px) with the same
 * viewBox, a generic sans-serif font, a white background, the shared fill
 * patterns (and the channel fills the body uses), and no reference to anything outside itself. No XML declaration,
 * so the same text can be inlined in an HTML page.
 *
 * @param figure the picture
 * @returns SVG text
 * @example svgDocument({ width: 100, height: 50, title: 't', body: '' }).startsWith('<svg') // true
 */
export function svgDocument(figure: Figure): string {
  const { width, height } = figure;
  return (
    element(
      'svg',
      { xmlns: SVG_NAMESPACE, width, height, viewBox: `0 0 ${width} ${height}`, 'font-family': 'sans-serif', 'font-size': 11, role: 'img' },
      `<title>${escapeXml(figure.title)}</title>` +
        `<defs>${patternDefs()}${channelPatternDefs(figure.body)}</defs>` +
        element('rect', { x: 0, y: 0, width, height, fill: '#fff' }) +
        figure.body,
    ) + '\n'
  );
}

/**
 * Several figures one under another in one document, `gap` px apart.
 *
 * @param figures top to bottom
 * @param title the whole picture's title
 * @param gap px between figures
 */
export function stackFigures(figures: readonly Figure[], title: string, gap = 16): Figure {
  let y = 0;
  const parts: string[] = [];
  for (const figure of figures) {
    parts.push(element('g', { transform: `translate(0 ${y})` }, figure.body));
    y += figure.height + gap;
  }
  return { width: Math.max(0, ...figures.map((f) => f.width)), height: Math.max(0, y - gap), title, body: parts.join('') };
}
