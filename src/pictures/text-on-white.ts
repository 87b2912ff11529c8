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
