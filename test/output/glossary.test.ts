import { mkdtempSync, readFileSync, readdirSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { ensureBuilt, ROOT, runBin } from '../helpers/run-bin.js';
import { TEXT_EXAMPLES } from './examples.js';
import { GLOSSARY, glossaryEntry, glossaryOf, type GlossaryCommand } from '../../src/text/glossary.js';

/**
 * Every column and abbreviation explained: the headers of each table read
 * as drawn (terminal, CSV, HTML) and the abbreviations of the text, each
 * with an entry in the one glossary, listed in its command's --help and, on
 * the review page, in the page's legend. Common practice (no source): a
 * report defines every abbreviation and column it uses.
 */

beforeAll(() => ensureBuilt());

const scenarios = readdirSync(join(ROOT, 'scenarios')).filter((f) => /^heron-.*\.json$/.test(f));

/** Every text a scenario file supplies (names, labels, notes): not the tool's words, so not looked up. */
const scenarioTexts = (() => {
  const texts = new Set<string>();
  const walk = (value: unknown) => {
    if (typeof value === 'string') texts.add(value);
    else if (Array.isArray(value)) value.forEach(walk);
    else if (value !== null && typeof value === 'object') Object.values(value).forEach(walk);
  };
  for (const file of scenarios) walk(JSON.parse(readFileSync(join(ROOT, 'scenarios', file), 'utf8')));
  // Longest first, so that a label is removed before a shorter text inside it.
  return [...texts].filter((t) => t.length >= 2).sort((a, b) => b.length - a.length);
})();

/** The headers of every terminal table in a text: the line above each rule, cut at the rule's segments. */
function terminalHeaders(text: string): string[] {
  const lines = text.split('\n');
  const headers: string[] = [];
  lines.forEach((line, i) => {
    if (i === 0 || !/^[─ ]+$/.test(line) || !line.includes('─')) return;
    const head = [...lines[i - 1]!];
    for (const segment of line.matchAll(/─+/g))
      headers.push(
        head
          .slice(segment.index, segment.index + segment[0].length)
          .join('')
          .trim(),
      );
  });
  return headers;
}

/**
 * Words that look like abbreviations (DC, SNR, H2, IM3, dBFS, kHz), in the
 * tool's own text: scenario texts are taken out first, so that "H5" of
 * "TCXO-R 10M reference H5" is looked up and the part name is not.
 */
function abbreviations(text: string): Set<string> {
  const oneLine = (t: string) => t.replace(/\s+/g, ' ');
  let own = oneLine(text);
  for (const t of scenarioTexts) own = own.split(oneLine(t)).join(' ');
  const words = own.split(/[^\p{L}\p{N}_]+/u);
  // FAIL is the verdict written in capitals (the "verdict" entry says so), not an abbreviation.
  return new Set(
    words.filter(
      (w) => !/^FAILS?$/.test(w) && /^(?:\p{Lu}{2,}\p{N}*|\p{Lu}\p{N}+|\p{Ll}+\p{Lu}\p{L}*|\p{Lu}\p{Ll}*\p{Lu}\p{L}*)$/u.test(w),
    ),
  );
}

/** An abbreviation entry that matches the word, or a column named by it (NCO). */
function explains(command: GlossaryCommand, word: string): boolean {
  return glossaryOf(command).some((e) => (e.kind === 'abbreviation' && e.matches ? e.matches.test(word) : e.term === word));
}

const helpOf = (command: string) => runBin(command, '--help').stdout;
/** The terms a --help lists: each glossary line starts with two spaces and the term. */
const listedIn = (help: string, term: string) => help.split('\n').some((l) => l === `  ${term}` || l.startsWith(`  ${term}  `));

describe('the glossary explains every column header as drawn', () => {
  // Laid out with --wide, so that each header stands whole on the line above its rule.
  for (const [name, args] of TEXT_EXAMPLES.filter(([n]) => n.endsWith('.txt'))) {
    const command = args[0] as GlossaryCommand;
    it(`${name}: each header has an entry, listed in ${command} --help`, () => {
      const run = runBin(...args, '--wide');
      expect(run.stderr).toBe('');
      const headers = [...new Set(terminalHeaders(run.stdout))];
      expect(headers.length).toBeGreaterThan(2);
      const help = helpOf(command);
      const missing = headers.filter((h) => glossaryEntry(h, command) === undefined);
      expect(missing, `headers of ${name} with no glossary entry`).toEqual([]);
      const unlisted = headers.filter((h) => !listedIn(help, glossaryEntry(h, command)!.term));
      expect(unlisted, `headers of ${name} not in ${command} --help`).toEqual([]);
    });
  }

  it('the CSV of compare: each column carried by an entry that compare --help lists with it', () => {
    const run = runBin('compare', ...scenarios.map((f) => join('scenarios', f)), '--csv');
    const columns = run.stdout.split('\r\n')[0]!.split(',');
    expect(columns).toContain('headroom_down_ppm');
    const help = helpOf('compare').replace(/\n\s+/g, ' ');
    const missing = columns.filter((c) => !glossaryOf('compare').some((e) => e.csv?.includes(c)));
    expect(missing, 'CSV columns no entry carries').toEqual([]);
    const unlisted = columns.filter((c) => !new RegExp(`CSV [^\\[]*\\b${c}\\b`).test(help));
    expect(unlisted, 'CSV columns compare --help does not name').toEqual([]);
  });
});

describe('the review page explains its own words', () => {
  const dir = mkdtempSync(join(tmpdir(), 'ifzone-glossary-'));
  const pages: Array<[string, string]> = [];
  beforeAll(() => {
    for (const [name, files] of [
      ['family', scenarios],
      ['narrow', ['heron-narrow.json']],
    ] as const) {
      const out = join(dir, `${name}.html`);
      expect(runBin('report', ...files.map((f) => join('scenarios', f)), '--html', out).status).toBe(0);
      pages.push([name, readFileSync(out, 'utf8')]);
    }
  });
  const unescape = (t: string) =>
    t
      .replace(/&lt;/g, '<')
      .replace(/&gt;/g, '>')
      .replace(/&quot;/g, '"')
      .replace(/&apos;/g, "'")
      .replace(/&amp;/g, '&');
  const legendOf = (html: string) => {
    const legend = /<dl class="glossary">([\s\S]*?)<\/dl>/.exec(html);
    expect(legend, 'the page has a legend').not.toBeNull();
    return [...legend![1]!.matchAll(/<dt>([^<]*)<\/dt>/g)].map((m) => unescape(m[1]!));
  };

  it('every <th> has an entry, in the legend and in report --help', () => {
    const help = helpOf('report');
    for (const [name, html] of pages) {
      const headers = [...new Set([...html.matchAll(/<th>([^<]*)<\/th>/g)].map((m) => unescape(m[1]!)))];
      expect(headers.length).toBeGreaterThan(20);
      const legend = legendOf(html);
      expect(
        headers.filter((h) => glossaryEntry(h, 'report') === undefined),
        `${name}: headers with no entry`,
      ).toEqual([]);
      expect(
        headers.filter((h) => !legend.includes(glossaryEntry(h, 'report')!.term)),
        `${name}: headers not in the legend`,
      ).toEqual([]);
      expect(
        headers.filter((h) => !listedIn(help, glossaryEntry(h, 'report')!.term)),
        'headers not in report --help',
      ).toEqual([]);
    }
  });

  it('every abbreviation of the page (tables, prose, pictures) is in its legend', () => {
    for (const [name, html] of pages) {
      const legend = legendOf(html);
      const body = html.replace(/<dl class="glossary">[\s\S]*?<\/dl>/, ' ').replace(/<style>[\s\S]*?<\/style>/, ' ');
      const words = abbreviations(unescape(body.replace(/<[^>]+>/g, ' ')));
      expect(words.size).toBeGreaterThan(5);
      expect(
        [...words].filter((w) => !explains('report', w)),
        `${name}: abbreviations with no entry`,
      ).toEqual([]);
      const inLegend = (w: string) =>
        glossaryOf('report').some(
          (e) => legend.includes(e.term) && (e.kind === 'abbreviation' && e.matches ? e.matches.test(w) : e.term === w),
        );
      expect(
        [...words].filter((w) => !inLegend(w)),
        `${name}: abbreviations not in the legend`,
      ).toEqual([]);
    }
  });

  it('the legend lists only entries the page uses', () => {
    const [, narrow] = pages.find(([n]) => n === 'narrow')!;
    const legend = legendOf(narrow);
    // A single scenario has no comparison of parts and no interleaved converter on this variant.
    expect(legend).not.toContain('filter orders B/C/E');
    expect(legend).not.toContain('part');
    expect(legend).toContain('worst margin');
    expect(legend).toContain('SNR');
  });
});

describe('the abbreviations of the terminal outputs are in their command --help', () => {
  for (const [name, args] of TEXT_EXAMPLES.filter(([n]) => n.endsWith('.txt'))) {
    const command = args[0] as GlossaryCommand;
    it(name, () => {
      // --wide: nothing wrapped, so that a scenario's label stands whole and is left out.
      const words = abbreviations(runBin(...args, '--wide').stdout);
      const help = helpOf(command);
      expect(
        [...words].filter((w) => !explains(command, w)),
        `abbreviations of ${name} with no entry`,
      ).toEqual([]);
      const unlisted = [...words].filter(
        (w) =>
          !glossaryOf(command).some(
            (e) => (e.kind === 'abbreviation' && e.matches ? e.matches.test(w) : e.term === w) && listedIn(help, e.term),
          ),
      );
      expect(unlisted, `abbreviations of ${name} not in ${command} --help`).toEqual([]);
    });
  }
});

describe('the README speaks the tables’ words', () => {
  const readme = readFileSync(join(ROOT, 'README.md'), 'utf8');
  it('uses none of the spellings the glossary sets aside', () => {
    const avoided = GLOSSARY.flatMap((e) => (e.avoid ?? []).map((a) => [a, e.term] as const));
    expect(avoided.length).toBeGreaterThan(0);
    expect(avoided.filter(([a]) => readme.toLowerCase().includes(a.toLowerCase()))).toEqual([]);
  });
  it('names the columns of the candidate table as the table does', () => {
    // The README's reading guide names these columns; each must be spelt as the glossary (and so the table) spells it.
    for (const term of ['worst margin', 'limited by', 'drift room', 'tolerance', 'settings', 'decimation factor', 'NCO']) {
      expect(glossaryEntry(term, 'solve')?.term).toBe(term);
      expect(readme).toContain(term);
    }
  });
});
