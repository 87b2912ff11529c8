import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import Table from 'cli-table3';
import { plainTable } from '../../src/output/table.js';
import { displayWidth } from '../../src/output/display-width.js';

/**
 * The table writer against cli-table3 (npm registry, a general-purpose table
 * library kept as a development dependency for this check): with the same
 * head and rows, compact style and no colour, both must draw the same text.
 */
function referenceTable(head: string[], rows: string[][]): string {
  const table = new Table({ head, style: { head: [], border: [], compact: true } });
  for (const row of rows) table.push(row);
  return table.toString();
}

describe('displayWidth', () => {
  it('counts the columns a terminal draws (the doc example first)', () => {
    expect(displayWidth('70 MHz – 90 MHz')).toBe(15);
    // East Asian Wide characters take two columns (Unicode Standard Annex #11).
    expect(displayWidth('中文')).toBe(4);
    // A combining acute accent adds no column: e + U+0301 draws as one é.
    expect(displayWidth('e\u0301')).toBe(1);
    expect(displayWidth('')).toBe(0);
  });
});

describe('plainTable', () => {
  it('draws the doc example', () => {
    expect(plainTable(['a', 'bb'], [['1', '22']])).toBe('┌───┬────┐\n│ a │ bb │\n├───┼────┤\n│ 1 │ 22 │\n└───┴────┘');
  });

  it('draws what cli-table3 draws, for texts in several scripts, multi-line cells and empty bodies', () => {
    // Characters on which both width rules agree: ASCII, Latin-1, the symbols our
    // tables print, a combining mark, CJK, Hangul and fullwidth forms.
    const character = fc.constantFrom(...'aZ09 .,:-/()%#±µ°–·×≥≤Ωé', '\u0301', '中', '文', '한', 'Ａ');
    const cell = fc.array(character, { maxLength: 12 }).map((cs) => cs.join(''));
    const multiLine = fc.array(cell, { minLength: 1, maxLength: 3 }).map((lines) => lines.join('\n'));
    const shape = fc.integer({ min: 1, max: 6 }).chain((columns) =>
      fc.record({
        head: fc.array(cell, { minLength: columns, maxLength: columns }),
        rows: fc.array(fc.array(fc.oneof(cell, multiLine), { minLength: columns, maxLength: columns }), { maxLength: 5 }),
      }),
    );
    fc.assert(
      fc.property(shape, ({ head, rows }) => {
        expect(plainTable(head, rows)).toBe(referenceTable(head, rows));
      }),
      { numRuns: 300 },
    );
  });
});
