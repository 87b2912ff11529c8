import { displayWidth as length } from './display-width.js';

/** A unit written after its number ("184.32 MHz", "-76.0 dB", "±10 ppm"), with the punctuation that may follow it. */
const UNIT_WORD = /^(?:[kMG]?Hz|dB|dBFS|dBFS\/Hz|dBc|ppm|%)[.,;:)]*$/;
/** The inversion mark of a zone ("2 inv"), kept with the zone number before it. */
const INVERTED_ZONE = /^inv[.,;:)"]*$/;

/**
 * The words a line may break between: runs of non-spaces, a unit kept with
 * the number before it (a value is never split from its unit: SI Brochure,
 * 9th ed., 5.4.3, writes a space between them, and typesetters keep it
 * unbroken), and a zone's "inv" with its number ("2 inv", one value).
 *
 * @param text one line
 * @returns the unbreakable words, in order
 * @example proseWords('at 184.32 MHz, then') // ['at', '184.32 MHz,', 'then']
 */
export function proseWords(text: string): string[] {
  return text
    .split(/ +/)
    .filter((w) => w !== '')
    .reduce<string[]>((kept, word) => {
      const previous = kept[kept.length - 1];
      if (previous !== undefined && (UNIT_WORD.test(word) || (INVERTED_ZONE.test(word) && /\d$/.test(previous))))
        kept[kept.length - 1] += ` ${word}`;
      else kept.push(word);
      return kept;
    }, []);
}

/**
 * Breaks prose into lines of at most `width` terminal columns at spaces,
 * never between a number and its unit; a word longer than the width stands on
 * its own line. Existing line breaks are kept; a line's leading indent
 * (spaces, or "- " for a list item) is repeated on its continuation lines.
 *
 * @param text one or more paragraphs
 * @param width characters per line (Infinity: no wrapping)
 * @returns the wrapped text
 * @example wrapProse('Best: VCXO-C at 184.32 MHz', 12) // 'Best: VCXO-C\nat\n184.32 MHz'
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
  const words = proseWords(line.slice(indent.length));
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
