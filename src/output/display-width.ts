/**
 * Code points that a terminal draws two columns wide: the East Asian Wide and
 * Fullwidth ranges (Unicode Standard Annex #11) that CJK text, Hangul and
 * fullwidth forms use, and emoji drawn as pictures.
 */
const WIDE: ReadonlyArray<readonly [number, number]> = [
  [0x1100, 0x115f],
  [0x2329, 0x232a],
  [0x2e80, 0x303e],
  [0x3040, 0x3247],
  [0x3250, 0x4dbf],
  [0x4e00, 0xa4c6],
  [0xa960, 0xa97c],
  [0xac00, 0xd7a3],
  [0xf900, 0xfaff],
  [0xfe10, 0xfe19],
  [0xfe30, 0xfe6b],
  [0xff01, 0xff60],
  [0xffe0, 0xffe6],
  [0x1b000, 0x1b001],
  [0x1f200, 0x1f251],
  [0x20000, 0x3fffd],
];

// Marks that combine with the character before them, and format characters
// (zero-width joiner, direction marks) take no column of their own.
const ZERO_WIDTH = /^[\p{Mn}\p{Me}\p{Cf}]$/u;
const PICTURE = /^\p{Emoji_Presentation}$/u;

/**
 * The number of terminal columns a text takes: control characters and
 * combining marks none, wide East Asian characters and emoji two, everything
 * else one. Tables pad their cells by it, so that a label in any script keeps
 * the columns straight.
 *
 * @param text one line of text (no line breaks)
 * @returns its width in columns
 * @example displayWidth('70 MHz – 90 MHz') // 15
 */
export function displayWidth(text: string): number {
  let width = 0;
  for (const character of text) {
    const code = character.codePointAt(0)!;
    if (code < 0x20 || (code >= 0x7f && code <= 0x9f)) continue;
    if (code < 0x300) {
      width += 1;
      continue;
    }
    if (ZERO_WIDTH.test(character)) continue;
    width += isWide(code) || PICTURE.test(character) ? 2 : 1;
  }
  return width;
}

function isWide(code: number): boolean {
  return WIDE.some(([low, high]) => code >= low && code <= high);
}
