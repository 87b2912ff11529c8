/**
 * A number's text with the typographic minus (U+2212) in place of the
 * hyphen-minus, as printed figures set it.
 *
 * @param text e.g. '-76 dBFS' or 'margin -5 MHz'
 * @example withMinus('-76, -5 MHz') // '−76, −5 MHz'
 */
export function withMinus(text: string): string {
  return text.replace(/(^|[\s(,=])-(?=\d|∞)/g, '$1\u2212');
}

/** How a text is set: its weight and slant change how wide it runs. */
export interface TextStyle {
  readonly bold?: boolean;
  readonly italic?: boolean;
}

/**
 * Advance of each character class, in em, regular and bold: the widest of
 * DejaVu Sans (what Linux renders "sans-serif" with) and Liberation Sans
 * (metric-compatible with Arial), rounded up, so that the estimate errs wide
 * whichever of the common sans-serif faces a reader has. Measured by
 * rendering each glyph repeated with @resvg/resvg-js; the picture tests
 * render every text the pictures write and check that its ink lies inside
 * textBox.
 */
const CLASSES: ReadonlyArray<readonly [RegExp, number, number]> = [
  [/[ '.,:;·!|/()[\]ijlIfrt-]/u, 0.4, 0.5],
  [/[a-kn-vx-z0-9"*°–_?µJLFT]/u, 0.65, 0.74],
  [/[A-LN-VX-Z&Ω]/u, 0.8, 0.87],
];
/** Every other character (m, w, M, W, %, −, ±, ×, ≤, …, → and anything unmeasured), em. */
const WIDEST: readonly [number, number] = [1.0, 1.1];

/** Tallest ink above the baseline (capitals, parentheses, the bar) and deepest below it (g, p, y, parentheses), em. */
export const TEXT_ASCENT = 0.8;
export const TEXT_DESCENT = 0.25;
/** Ascent of a text holding a character outside the measured set (an accented capital reaches about 0.93 em). */
const TALL_ASCENT = 1.0;
/** Characters whose advance and height were measured: printable ASCII and the symbols the pictures write. */
const MEASURED = /^[\x20-\x7e−±×÷≤≥…→·–—°µΩ]*$/u;
/** How far an oblique face leans past the last advance at the ascent, and before the origin at the descent, em. */
const ITALIC_LEAN = 0.2;
const ITALIC_BACK = 0.1;

/**
 * Width a line of sans-serif text may ink, px: the sum of its characters'
 * class advances (see CLASSES), plus the lean of an italic face. An upper
 * bound for DejaVu Sans and Liberation Sans, never an exact advance.
 *
 * @param text the words (runs of spaces counted in full, though SVG shows one)
 * @param fontSize px
 * @param style bold and italic change the width
 * @example textWidth('zone 2', 10) // 36.5
 */
export function textWidth(text: string, fontSize: number, style: TextStyle = {}): number {
  const column = style.bold ? 2 : 1;
  let em = 0;
  for (const char of text) em += (CLASSES.find(([pattern]) => pattern.test(char)) ?? [null, ...WIDEST])[column]!;
  return (em + (style.italic && text !== '' ? ITALIC_LEAN : 0)) * fontSize;
}

/** A text's box: left, top, right, bottom, px. */
export interface TextBox {
  readonly left: number;
  readonly top: number;
  readonly right: number;
  readonly bottom: number;
}

/**
 * The box a <text> may ink, from its anchor point, anchor and size: its
 * textWidth across (an italic face also leans a little before its origin),
 * TEXT_ASCENT above the baseline (more for a character outside the measured
 * set, such as an accented capital) and TEXT_DESCENT below.
 *
 * @param x, y the anchor point, px (y is the baseline)
 * @param text the words
 * @param fontSize px
 * @param anchor SVG text-anchor
 * @param style bold, italic
 * @example textBox(100, 50, 'fs/2', 10, 'middle') // { left: 89.5, top: 42, right: 110.5, bottom: 52.5 }
 */
export function textBox(
  x: number,
  y: number,
  text: string,
  fontSize: number,
  anchor: 'start' | 'middle' | 'end' = 'start',
  style: TextStyle = {},
): TextBox {
  const width = textWidth(text, fontSize, style);
  const left = anchor === 'start' ? x : anchor === 'middle' ? x - width / 2 : x - width;
  const ascent = MEASURED.test(text) ? TEXT_ASCENT : TALL_ASCENT;
  const back = style.italic ? ITALIC_BACK * fontSize : 0;
  return { left: left - back, top: y - ascent * fontSize, right: left + width, bottom: y + TEXT_DESCENT * fontSize };
}

/**
 * The text as it fits `width` px: whole when it does, else cut at a
 * character and ended with an ellipsis (the tables and the JSON keep the
 * whole text).
 *
 * @param text the words
 * @param width px available
 * @param fontSize px
 * @param style bold, italic
 * @example [...clipped('Sampling-rate map: Heron-4 base', 100, 10)].length // 15 (14 characters and the ellipsis)
 */
export function clipped(text: string, width: number, fontSize: number, style: TextStyle = {}): string {
  if (textWidth(text, fontSize, style) <= width) return text;
  const chars = [...text];
  while (chars.length > 0 && textWidth(chars.join('') + '…', fontSize, style) > width) chars.pop();
  return chars.join('') + '…';
}
