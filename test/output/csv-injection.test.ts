import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { csvCell, toCsv } from '../../src/output/csv.js';
import { visibleText } from '../../src/units/visible-text.js';
import { ifzone, scratchDirectory, writeInto } from '../helpers/run-in-process.js';

/**
 * Output injection. OWASP, "CSV Injection" (owasp.org community pages): a
 * cell beginning with =, +, -, @ (or tab, carriage return) may be run as a
 * formula by a spreadsheet; prefix it with a single quote. ECMA-48 (control
 * functions for coded character sets): ESC and the C1 controls start
 * terminal control sequences. Before, a clock label `=HYPERLINK(…)` reached
 * the CSV as a live formula and an ESC in a scenario's name reached the
 * terminal raw.
 */
describe('csvCell: formulas neutralised, numbers kept', () => {
  it.each([
    ['=HYPERLINK("http://x.invalid","click")', `'=HYPERLINK("http://x.invalid","click")`],
    ['+cmd|calc', "'+cmd|calc"],
    ['-2+3', "'-2+3"],
    ['@SUM(A1:A9)', "'@SUM(A1:A9)"],
    ['\t=1+1', "'\\t=1+1"],
    ['XO-A 122.88M', 'XO-A 122.88M'],
    ['-3.5', '-3.5'],
    ['+20', '+20'],
    ['-1e-3', '-1e-3'],
  ])('%j → %j', (value, cell) => {
    expect(csvCell(value)).toBe(cell);
  });

  it('leaves numbers, booleans and empty cells alone', () => {
    expect(toCsv(['a', 'b', 'c'], [[-76.5, true, null]])).toBe('a,b,c\r\n-76.5,true,\r\n');
  });
});

describe('visibleText', () => {
  it('escapes ESC, BEL, DEL and C1 controls; keeps lines when asked', () => {
    expect(visibleText('a\u001b[31mb\u0007\u007f\u009b')).toBe('a\\u001b[31mb\\u0007\\u007f\\u009b');
    expect(visibleText('one\ntwo\r\n\tthree\rfour', true)).toBe('one\ntwo\r\n\tthree\\rfour');
    expect(visibleText('one\ntwo')).toBe('one\\ntwo');
  });
});

describe('scenario text through the commands', () => {
  const dir = scratchDirectory('injection');
  const base = JSON.parse(readFileSync(new URL('../../scenarios/heron-base.json', import.meta.url), 'utf8')) as Record<string, unknown> & {
    clocks: Record<string, unknown>[];
  };
  const hostile = {
    ...base,
    $schema: undefined,
    name: 'Heron \u001b]0;owned\u0007\u001b[2J',
    clocks: [{ ...base.clocks[0], label: '=HYPERLINK("http://x.invalid","part")' }],
  };
  const file = writeInto(dir, 'hostile.json', hostile);

  it('compare --csv: the label arrives as text, not as a formula', async () => {
    const run = await ifzone('compare', file, '--csv');
    expect(run.out).toContain(`"'=HYPERLINK(""http://x.invalid"",""part"")"`);
    expect(run.out).not.toMatch(/(^|,)"?=HYPERLINK/m);
  });

  it.each([['solve'], ['compare']])('%s: no raw ESC or BEL reaches the terminal', async (command) => {
    const run = await ifzone(command, file);
    expect([0, 1]).toContain(run.code);
    expect(run.out).toContain('Heron \\u001b]0;owned\\u0007\\u001b[2J');
    // eslint-disable-next-line no-control-regex -- looking for raw control characters is the point
    expect(run.out + run.err).not.toMatch(/[\u0000-\u0008\u000b\u000c\u000e-\u001f\u007f-\u009f]/);
  });
});
