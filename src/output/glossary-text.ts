import { glossaryOf, type GlossaryCommand, type GlossaryEntry } from '../text/glossary.js';
import { MINUS } from '../text/quantity-text.js';
import { displayWidth } from './display-width.js';
import { wrapProse } from './wrap-prose.js';

/** Columns of the term in the help's glossary; a longer term puts its meaning on the next line. */
const TERM_COLUMNS = 24;

/**
 * The glossary of one command for its --help: every column header and
 * abbreviation its output uses, in plain words with the unit, and for
 * `compare` the CSV columns that carry each figure.
 *
 * @param command the command
 * @param width characters per line (at least 60)
 * @returns the text, starting with a blank line, no trailing newline
 * @example glossaryHelp('alias', 100).split('\n')[1] // 'Columns and abbreviations of the output:'
 */
export function glossaryHelp(command: GlossaryCommand, width = 100): string {
  const lines = ['', 'Columns and abbreviations of the output:'];
  for (const entry of glossaryOf(command)) {
    const text = wrapProse(entryText(entry, command === 'compare'), Math.max(20, width - TERM_COLUMNS - 2)).split('\n');
    const term = `  ${entry.term}`;
    const first = displayWidth(term) < TERM_COLUMNS + 1 ? [`${term.padEnd(TERM_COLUMNS + 2)}${text.shift()!}`] : [term];
    lines.push(...first, ...text.map((line) => `${' '.repeat(TERM_COLUMNS + 2)}${line}`));
  }
  // The glossary writes a true minus; the terminal's is the hyphen-minus.
  return lines.join('\n').replace(/\u2212(?=\d)/g, MINUS.terminal);
}

/**
 * An entry's meaning with its unit in parentheses, and with `csv` the CSV
 * columns that carry it.
 *
 * @param entry a glossary entry
 * @param csv add the CSV column names
 * @example entryText({ term: 'rate', kind: 'column', commands: [], meaning: 'the rate', unit: 'Hz', csv: ['rate_hz'] }, true) // 'the rate [Hz]; CSV rate_hz'
 */
export function entryText(entry: GlossaryEntry, csv = false): string {
  const unit = entry.unit ? ` [${entry.unit}]` : '';
  const columns = csv && entry.csv ? `; CSV ${entry.csv.join(', ')}` : '';
  return `${entry.meaning}${unit}${columns}`;
}
