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
