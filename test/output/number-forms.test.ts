import { mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { ensureBuilt } from '../helpers/run-bin.js';
import { runExample, TEXT_EXAMPLES } from './examples.js';

/**
 * One way of writing each quantity, read off every output of the demo
 * scenarios as drawn: the terminal tables and prose, the CSV headers, the
 * HTML page, the SVG pictures. The rules are the text layer's (the issue's
 * wording; significant digits and SI prefixes as BIPM, The International
 * System of Units, 9th ed., writes them): one minus sign per medium (the
 * terminal's hyphen-minus, HTML's and SVG's U+2212), frequencies to four
 * significant digits unless written to 1 Hz as a rate that programs a part
 * (an NCO's tuned frequency alone to 0.1 mHz), margins and extents to four
 * significant digits in their columns, levels and dB figures to 0.1 dB and
 * nothing below −200 dBFS.
 */

const scenario = (name: string) => join('scenarios', `heron-${name}.json`);
const VARIANTS = ['base', 'lowif', 'narrow', 'wide'];
const dir = mkdtempSync(join(tmpdir(), 'ifzone-number-forms-'));

type Medium = 'terminal' | 'html' | 'svg' | 'csv';
interface Output {
  readonly name: string;
  readonly medium: Medium;
  /** The text people read: for HTML and SVG the text content, markup taken out. */
  readonly text: string;
  /** For the terminal: the same command laid out --wide, one header line per table. */
  readonly wide?: string;
  /** For HTML: the page, to read its tables by column. */
  readonly html?: string;
}
const outputs: Output[] = [];

const unescape = (t: string) =>
  t
    .replace(/&lt;/g, '<')
    .replace(/&gt;/g, '>')
    .replace(/&quot;/g, '"')
    .replace(/&apos;/g, "'")
    .replace(/&amp;/g, '&');
/** Text content of HTML or SVG: style sheets and tags out, each tag a line break (so a cell or a label stands on its own). */
const textOf = (markup: string) => unescape(markup.replace(/<style>[\s\S]*?<\/style>/g, '\n').replace(/<[^>]+>/g, '\n'));

function written(name: string, args: readonly string[]): string {
  const file = join(dir, name);
  const run = runExample(args, file);
  expect(run.stderr, name).toBe('');
  return readFileSync(file, 'utf8');
}

beforeAll(() => {
  ensureBuilt();
  for (const [name, args] of TEXT_EXAMPLES) {
    const run = runExample(args);
    if (name.endsWith('.csv')) outputs.push({ name, medium: 'csv', text: run.stdout.split('\r\n')[0]! });
    else outputs.push({ name, medium: 'terminal', text: run.stdout, wide: runExample([...args, '--wide']).stdout });
  }
  for (const v of VARIANTS) {
    outputs.push({ name: `solve ${v} --svg`, medium: 'svg', text: textOf(written(`${v}.svg`, ['solve', scenario(v), '--svg', '{out}'])) });
  }
  outputs.push({
    name: 'compare --svg',
    medium: 'svg',
    text: textOf(written('compare.svg', ['compare', ...VARIANTS.map(scenario), '--svg', '{out}'])),
  });
  for (const rate of ['184.32M', '245.76M']) {
    const svg = written(`verify-${rate}.svg`, ['verify', scenario('base'), '--rate', rate, '--samples', '16384', '--svg', '{out}']);
    outputs.push({ name: `verify ${rate} --svg`, medium: 'svg', text: textOf(svg) });
  }
  for (const [name, files] of [
    ['family', VARIANTS],
    ['narrow', ['narrow']],
  ] as const) {
    const html = written(`${name}.html`, ['report', ...files.map(scenario), '--html', '{out}']);
    outputs.push({ name: `report ${name}`, medium: 'html', text: textOf(html), html });
  }
}, 120_000);

/** Significant digits of a number as written: leading zeros, the point and an integer's trailing zeros not counted. */
function significant(number: string): number {
  const digits = number.replace(/^[−+-]/, '');
  const [whole, fraction = ''] = digits.split('.');
  const all = `${whole}${fraction}`.replace(/^0+/, '');
  return (fraction === '' ? all.replace(/0+$/, '') : all).length || 1;
}

/** Hz per unit of the prefix. */
const SCALE: Record<string, number> = { Hz: 1, kHz: 1e3, MHz: 1e6, GHz: 1e9 };

/** The place value, in Hz, of a frequency's last written digit. */
function lastPlace(number: string, unit: string): number {
  const fraction = number.split('.')[1] ?? '';
  return SCALE[unit]! / 10 ** fraction.length;
}

const NUMBER = String.raw`[−+-]?\d+(?:\.\d+)?`;
/** A frequency with its unit, or the two ends of an extent sharing one. */
const FREQUENCY = new RegExp(String.raw`(?<![\p{L}\p{N}.·/])(${NUMBER})(?:–(${NUMBER}))? ?([kMG]?Hz)\b`, 'gu');

describe('one minus sign per medium', () => {
  it('HTML and SVG write U+2212 before a digit, never the hyphen-minus', () => {
    const found = outputs
      .filter((o) => o.medium === 'html' || o.medium === 'svg')
      .flatMap((o) => [...o.text.matchAll(/(?<![\p{L}\p{N}])-(?=\d)[^\n]{0,30}/gu)].map((m) => `${o.name}: ${m[0]}`));
    expect(outputs.filter((o) => o.medium === 'svg').length).toBe(7);
    expect(found).toEqual([]);
  });
  it('the terminal and the CSV headers write the hyphen-minus before a digit, never U+2212', () => {
    const found = outputs
      .filter((o) => o.medium === 'terminal' || o.medium === 'csv')
      .flatMap((o) => [...o.text.matchAll(/\u2212(?=\d)[^\n]{0,30}/g)].map((m) => `${o.name}: ${m[0]}`));
    expect(outputs.filter((o) => o.medium === 'terminal').length).toBeGreaterThan(10);
    expect(found).toEqual([]);
  });
});

describe('no more digits than the quantity allows', () => {
  it('a frequency has at most 4 significant digits, unless written to 1 Hz as a rate (an NCO tuning to 0.1 mHz)', () => {
    const found: string[] = [];
    for (const o of outputs) {
      // The terminal's --wide layout wraps no sentence, so the NCO's stays on its line.
      for (const line of (o.wide ?? o.text).split('\n')) {
        const nco = /\bNCO \(\d+-bit\): word\b/.test(line);
        for (const m of line.matchAll(FREQUENCY)) {
          const unit = m[3]!;
          for (const n of [m[1]!, m[2]].filter((x): x is string => x !== undefined)) {
            const ok = significant(n) <= 4 || lastPlace(n, unit) >= (nco ? 1e-4 : 1);
            if (!ok) found.push(`${o.name}: ${m[0]} in "${line.trim().slice(0, 80)}"`);
          }
        }
      }
    }
    expect(found).toEqual([]);
  });

  it('an extent writes its unit once ("222.3–244.3 MHz"), never both ends in the same unit', () => {
    const found = outputs.flatMap((o) =>
      [...(o.wide ?? o.text).matchAll(new RegExp(String.raw`(${NUMBER}) ([kMG]?Hz) – (${NUMBER}) \2\b`, 'gu'))].map(
        (m) => `${o.name}: ${m[0]}`,
      ),
    );
    expect(found).toEqual([]);
  });

  // Columns whose figures are margins, distances, widths or extents: four significant digits, never a rate's.
  const SHORT = new Set([
    'worst margin',
    'margin',
    'width',
    'aliased to',
    'input at this rate',
    'alias band (input)',
    'predicted',
    'measured',
    'from band',
    'frequency',
    'moved',
    'next margin',
    'centre from odd·rate/4',
    'edges',
    'guard below',
    'guard above',
    'holding',
    'IF shift',
    'required margin',
  ]);
  const shortCell = (cell: string) =>
    [...cell.matchAll(FREQUENCY)].every((m) => [m[1]!, m[2]].every((n) => n === undefined || significant(n) <= 4));

  it('margins, distances and extents in the terminal tables: 4 significant digits', () => {
    const found: string[] = [];
    let cells = 0;
    for (const o of outputs.filter((x) => x.wide !== undefined && !x.name.startsWith('alias'))) {
      const lines = o.wide!.split('\n');
      lines.forEach((rule, i) => {
        if (i === 0 || !/^[─ ]+$/.test(rule) || !rule.includes('─')) return;
        const spans = [...rule.matchAll(/─+/g)].map((s) => [s.index, s.index + s[0].length] as const);
        const heads = spans.map(([a, b]) => [...lines[i - 1]!].slice(a, b).join('').trim());
        for (let r = i + 1; r < lines.length && lines[r]!.trim() !== ''; r++) {
          const chars = [...lines[r]!];
          spans.forEach(([a, b], k) => {
            if (!SHORT.has(heads[k]!)) return;
            const cell = chars.slice(a, b).join('').trim();
            cells++;
            if (!shortCell(cell)) found.push(`${o.name}: ${heads[k]} = ${cell}`);
          });
        }
      });
    }
    expect(cells).toBeGreaterThan(300);
    expect(found).toEqual([]);
  });

  it('margins, distances and extents in the HTML tables: 4 significant digits', () => {
    const found: string[] = [];
    let cells = 0;
    for (const o of outputs.filter((x) => x.html !== undefined)) {
      for (const table of o.html!.matchAll(/<table>([\s\S]*?)<\/table>/g)) {
        const heads = [...table[1]!.matchAll(/<th>([^<]*)<\/th>/g)].map((m) => unescape(m[1]!));
        for (const row of table[1]!.matchAll(/<tr>((?:<td[^>]*>[^<]*<\/td>)+)<\/tr>/g)) {
          [...row[1]!.matchAll(/<td[^>]*>([^<]*)<\/td>/g)].forEach((m, k) => {
            if (!SHORT.has(heads[k] ?? '')) return;
            cells++;
            if (!shortCell(unescape(m[1]!))) found.push(`${o.name}: ${heads[k]} = ${unescape(m[1]!)}`);
          });
        }
      }
    }
    expect(cells).toBeGreaterThan(300);
    expect(found).toEqual([]);
  });

  it('levels to 0.1 dB and none below −200 dBFS; dB figures to 0.1 dB', () => {
    const found: string[] = [];
    for (const o of outputs) {
      for (const m of o.text.matchAll(new RegExp(String.raw`(?<![\p{L}\p{N}.·/^(])(${NUMBER}) (dBFS|dBc|dB)(?![\p{L}/])`, 'gu'))) {
        const [, n, unit] = m;
        const tail = o.text.slice(m.index + m[0].length, m.index + m[0].length + 12);
        // A slope is a law, not a figure of this plan ("rises 20 dB per decade").
        if (/^ per decade/.test(tail)) continue;
        const value = Number(n!.replace('−', '-'));
        if (!/^[−+-]?\d+\.\d$/.test(n!)) found.push(`${o.name}: ${m[0]}${tail}`);
        else if (unit === 'dBFS' && value < -200) found.push(`${o.name}: ${m[0]} (below −200 dBFS)`);
      }
    }
    expect(found).toEqual([]);
  });

  it('relative drift: ppm whole numbers up to 10 000 (3 significant digits under 100), per cent to 3 significant digits', () => {
    const found: string[] = [];
    for (const o of outputs) {
      for (const m of o.text.matchAll(new RegExp(String.raw`(?<![\p{L}\p{N}.])(${NUMBER}) (ppm|%)`, 'gu'))) {
        const n = m[1]!;
        const magnitude = Math.abs(Number(n.replace('−', '-')));
        const ok =
          m[2] === '%' ? significant(n) <= 3 : magnitude >= 100 ? /^[−+-]?\d+$/.test(n) && magnitude <= 10_000 : significant(n) <= 3;
        if (!ok) found.push(`${o.name}: ${m[0]}`);
      }
    }
    expect(found).toEqual([]);
  });
});
