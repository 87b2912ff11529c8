import { displayWidth as length } from './display-width.js';

/**
 * Breaks prose into lines of at most `width` terminal columns at spaces; a word
 * longer than the width stands on its own line. Existing line breaks are
 * kept; a line's leading indent (spaces, or "- " for a list item) is
 * repeated on its continuation lines.
 *
 * @param text one or more paragraphs
 * @param width characters per line (Infinity: no wrapping)
 * @returns the wrapped text
 * @example wrapProse('Best: VCXO-C at 184.32 MHz', 12) // 'Best: VCXO-C\nat 184.32\nMHz'
 */
export function wrapProse(text: string, width: number): string {
  return text
    .split('\n')
    .map((line) => wrapLine(line, width))
    .join('\n');
}

function wrapLine(line: string, width: number): string {
  if (length(line) <= width) return line;
  const indent = /^(\s*(?:- )?)/.exec(line)![1]!;
  const hanging = ' '.repeat(length(indent));
  const words = line
    .slice(indent.length)
    .split(/ +/)
    .filter((w) => w !== '');
  const lines: string[] = [];
  let current = indent;
  for (const word of words) {
    const lead = lines.length === 0 ? indent : hanging;
    if (current !== lead && length(current) + 1 + length(word) > width) {
      lines.push(current);
      current = hanging + word;
    } else current = current === lead ? lead + word : `${current} ${word}`;
  }
  lines.push(current);
  return lines.join('\n');
}
