import { element, textElement } from './svg-element.js';
import { textBox, type TextStyle } from './typography.js';

/** Room between a text's box and the edge of its white backing, px. */
const PAD = 1.5;

/**
 * A text on a white box just larger than the box it may ink (textBox), so
 * that lines drawn before it pass behind the words instead of through them.
 *
 * @param x, y anchor point, px (y the baseline)
 * @param text the words
 * @param fontSize px
 * @param anchor SVG text-anchor
 * @param style bold, italic
 * @returns the box and the text, as markup
 * @example textOnWhite(10, 20, 'zone 3', 9.5).startsWith('<rect x="8.5"') // true
 */
export function textOnWhite(
  x: number,
  y: number,
  text: string,
  fontSize: number,
  anchor: 'start' | 'middle' | 'end' = 'start',
  style: TextStyle = {},
): string {
  const box = textBox(x, y, text, fontSize, anchor, style);
  return (
    element('rect', {
      x: box.left - PAD,
      y: box.top - PAD,
      width: box.right - box.left + 2 * PAD,
      height: box.bottom - box.top + 2 * PAD,
      fill: '#fff',
      opacity: 0.9,
    }) +
    textElement(x, y, text, {
      'text-anchor': anchor === 'start' ? undefined : anchor,
      'font-size': fontSize,
      'font-weight': style.bold ? 'bold' : undefined,
      'font-style': style.italic ? 'italic' : undefined,
    })
  );
}

/**
 * A channel's name in a framed white tag (the spectrum's and the capture's
 * channel images): bold, centred on x, the frame 4 px wider than the text on
 * each side.
 *
 * @param x centre, px
 * @param top top of the tag, px (14 px tall)
 * @param textWidth the name's width, px (as label packing measured it)
 * @param text the name
 * @param fontSize px
 * @returns the frame and the name, as markup
 * @example channelTag(100, 20, 30, 'IF-A', 9.5).startsWith('<rect x="81" y="20" width="38" height="14"') // true
 */
export function channelTag(x: number, top: number, textWidth: number, text: string, fontSize: number): string {
  const w = textWidth + 8;
  return (
    element('rect', { x: x - w / 2, y: top, width: w, height: 14, fill: '#fff', stroke: '#1f4e79', 'stroke-width': 0.8 }) +
    textElement(x, top + 11, text, { 'text-anchor': 'middle', 'font-size': fontSize, 'font-weight': 'bold' })
  );
}
