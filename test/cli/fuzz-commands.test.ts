import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { starterScenario } from '../../src/scenario/starter-scenario.js';
import { ifzone, scratchDirectory, type InProcessRun } from '../helpers/run-in-process.js';

/**
 * Hostile, huge and mistyped input through every command, in process
 * (runCli), with fast-check (seeded, so a failure replays). Whatever the
 * input, the answer is exit 0 or 1, or exit 2 with exactly one `ifzone:`
 * line on stderr that names the file or the option at fault and nothing on
 * stdout; never an internal error; and each run ends: a hang guard of
 * RUN_LIMIT_MS, far above any honest run (not a performance figure: those
 * are `npm run bench`).
 */
const RUN_LIMIT_MS = 20_000;
const dir = scratchDirectory('fuzz');
/** The starter scenario with every optional field written out too, so that each field of the format is a path to edit. */
const STARTER = starterScenario('./ifzone-scenario.schema.json') as Record<string, Record<string, unknown>>;
const BASE: Record<string, unknown> = {
  ...STARTER,
  extends: undefined,
  guard: { low: '10%', high: '1M' },
  converter: {
    ...STARTER.converter,
    intercept3: 30,
    intercepts: { '2': 60 },
    interleave: { ways: 2, offsetSpur: -80, imageLevel: -70, imageReference: '70M' },
    rateSpurs: { dc: -70, halfRate: -85, quarterRate: -90, fractions: [{ fraction: '1/3', level: -95 }] },
    clockDividers: [1, 2],
  },
  maxOrder: 3,
  boardSpurs: [
    { label: 'reference clock', frequency: '10M', level: -85, harmonics: 5 },
    { label: 'regulator band', low: '1M', high: '1.2M', level: 10, coupling: 'before-filter', margin: '100k' },
  ],
  neighbours: [
    { label: 'adjacent channel', center: '82M', width: '10M', level: -30 },
    { label: 'blocker', low: '55M', high: '55M', level: 5, margin: 0 },
  ],
  requirements: { ...STARTER.requirements, kindMargins: { harmonic: '200k', intermod: '300k' } },
  filterMask: { outOfBandLevel: -20, passbandRipple: 1 },
  driverNoiseDensity: -155,
  downConverter: { ncoBits: 32, outputRate: '7.68M', usableFraction: 0.8 },
  filter: {
    kind: 'table',
    points: [
      ['40M', 40],
      ['64M', 0],
      ['76M', 0],
      ['100M', 40],
    ],
  },
  clocks: [
    {
      label: 'oscillator part number',
      frequency: '92.16M',
      tolerance: { initial: 10, temperature: 10, ageing: 5 },
      jitter: '150 fs',
      note: 'n',
    },
    { label: 'divided part', frequency: '184.32M', tolerance: 20, derive: 'divider' },
    {
      label: 'synthesised',
      frequency: '10M',
      tolerance: 2,
      derive: { kind: 'synthesiser', n: [80, 120], m: [1, 2], d: 1, vco: { low: '800M', high: '1.2G' } },
    },
  ],
  goal: { kind: 'decimation', outputRate: '7.68M' },
  ifShift: { low: '-1M', high: '1M' },
};
/** Enough for a few thousand runs on a loaded 2-core machine. */
const SUITE_TIMEOUT_MS = 120_000;

/** Values that have broken parsers somewhere: edges of the number line, typos of units, control characters, wrong shapes. */
const HOSTILE_SCALAR = fc.constantFrom<unknown>(
  0,
  -0,
  -1,
  1,
  0.5,
  1e-300,
  1e12,
  1.0000001e12,
  1e15,
  1e18,
  1e308,
  -1e308,
  Number.MAX_SAFE_INTEGER,
  2 ** 53 + 1,
  '70M',
  '1e6k',
  '1e-400',
  '1e999',
  '70m',
  '70 MHz',
  '-5M',
  '+5M',
  '−5M',
  '5%',
  '1000%',
  '150 fs',
  '1 s',
  '',
  ' ',
  'NaN',
  'Infinity',
  '0x10',
  '=HYPERLINK("http://x.invalid")',
  '\u001b[2J\u0007',
  'a\nb',
  '__proto__',
  'x'.repeat(10_000),
  true,
  false,
  null,
  [],
  [1, 2],
  {},
  { kind: 'synthesiser' },
  { __proto__: null, polluted: true },
);
const VALUE: fc.Arbitrary<unknown> = fc.oneof(
  { weight: 6, arbitrary: HOSTILE_SCALAR },
  { weight: 2, arbitrary: fc.double({ noNaN: false }) },
  { weight: 1, arbitrary: fc.string({ maxLength: 12 }) },
  { weight: 1, arbitrary: fc.json({ maxDepth: 2 }).map((text) => JSON.parse(text) as unknown) },
);

type Path = ReadonlyArray<string | number>;

function allPaths(value: unknown, path: Path = []): Path[] {
  if (Array.isArray(value)) return [path, ...value.flatMap((item, i) => allPaths(item, [...path, i]))];
  if (typeof value === 'object' && value !== null) return [path, ...Object.entries(value).flatMap(([k, v]) => allPaths(v, [...path, k]))];
  return [path];
}

const PATHS = allPaths(BASE).filter((path) => path.length > 0);

/** One edit of the document, as JSON text (so that repeated keys and raw numbers can be written too). */
type Edit =
  | { kind: 'set'; path: Path; value: unknown }
  | { kind: 'drop'; path: Path }
  | { kind: 'add'; path: Path; key: string; value: unknown }
  | { kind: 'text'; what: 'repeat-key' | 'raw-number' | 'truncate'; at: number; number: string };

const EDIT: fc.Arbitrary<Edit> = fc.oneof(
  { weight: 6, arbitrary: fc.record({ kind: fc.constant('set' as const), path: fc.constantFrom(...PATHS), value: VALUE }) },
  { weight: 2, arbitrary: fc.record({ kind: fc.constant('drop' as const), path: fc.constantFrom(...PATHS) }) },
  {
    weight: 2,
    arbitrary: fc.record({
      kind: fc.constant('add' as const),
      path: fc.constantFrom<Path>([], ...PATHS),
      key: fc.constantFrom('__proto__', 'constructor', 'kind', 'lable', 'extends', 'passHigh', 'coupling', 'x'),
      value: VALUE,
    }),
  },
  {
    weight: 1,
    arbitrary: fc.record({
      kind: fc.constant('text' as const),
      what: fc.constantFrom('repeat-key' as const, 'raw-number' as const, 'truncate' as const),
      at: fc.nat(),
      number: fc.constantFrom('1e999', '-1e400', '1e-400', '4e-320', '123456789012345678901234567890', '-0.0e-0'),
    }),
  },
);

function edited(
  document: unknown,
  path: Path,
  change: (holder: Record<string, unknown> | unknown[], key: string | number) => void,
): unknown {
  const copy = structuredClone(document) as Record<string, unknown>;
  let holder: unknown = copy;
  for (const step of path.slice(0, -1))
    holder = typeof holder === 'object' && holder !== null ? (holder as Record<string | number, unknown>)[step] : undefined;
  if (typeof holder === 'object' && holder !== null) change(holder as Record<string, unknown>, path.at(-1)!);
  return copy;
}

/** The document with its edits applied, as the text of a file. */
function documentText(edits: readonly Edit[]): string {
  let document: unknown = BASE;
  const textEdits: Extract<Edit, { kind: 'text' }>[] = [];
  for (const edit of edits) {
    if (edit.kind === 'set')
      document = edited(document, edit.path, (holder, key) => void ((holder as Record<string | number, unknown>)[key] = edit.value));
    else if (edit.kind === 'drop') {
      document = edited(document, edit.path, (holder, key) => {
        if (Array.isArray(holder)) holder.splice(Number(key), 1);
        else delete holder[key as string];
      });
    } else if (edit.kind === 'add') {
      document = edited(document, [...edit.path, edit.key], (holder, key) => {
        if (!Array.isArray(holder))
          Object.defineProperty(holder, key, { value: edit.value, enumerable: true, writable: true, configurable: true });
      });
    } else textEdits.push(edit);
  }
  let text = JSON.stringify(document, null, 2) ?? 'null';
  for (const edit of textEdits) {
    const keys = [...text.matchAll(/\n(\s*)("[^"\n]*": [^\n]*?),?\n/g)];
    if (edit.what === 'repeat-key' && keys.length > 0) {
      const match = keys[edit.at % keys.length]!;
      const line = match[2]!.replace(/[[{]\s*$/, 'null');
      text = text.replace(match[0], `\n${match[1]}${line},\n${match[0].slice(1)}`);
    } else if (edit.what === 'raw-number') {
      const numbers = [...text.matchAll(/: (-?\d[\d.eE+-]*)/g)];
      if (numbers.length > 0) {
        const match = numbers[edit.at % numbers.length]!;
        text = text.slice(0, match.index) + `: ${edit.number}` + text.slice(match.index! + match[0].length);
      }
    } else if (edit.what === 'truncate') text = text.slice(0, edit.at % (text.length + 1));
  }
  return text;
}

let fileCount = 0;
function scenarioFile(text: string): string {
  const path = join(dir, `fuzz-${fileCount++}.json`);
  writeFileSync(path, text);
  return path;
}

/** The contract every run keeps, whatever it was given. */
async function keepsTheContract(args: string[], names: readonly string[]): Promise<InProcessRun> {
  const started = Date.now();
  const run = await ifzone(...args);
  expect(Date.now() - started).toBeLessThan(RUN_LIMIT_MS);
  expect([0, 1, 2]).toContain(run.code);
  expect(run.err).not.toContain('internal error');
  if (run.code === 2) {
    expect(run.out).toBe('');
    const lines = run.err.split('\n').filter((line) => line !== '');
    expect(lines).toHaveLength(1);
    expect(lines[0]!.startsWith('ifzone: ')).toBe(true);
    expect(names.some((name) => lines[0]!.includes(name))).toBe(true);
  }
  return run;
}

describe('fuzz: every scenario field through ifzone solve', () => {
  it(
    'a few thousand edited documents: exit 0, 1 or 2 with one line naming the file',
    async () => {
      const outcomes = { 0: 0, 1: 0, 2: 0 } as Record<number, number>;
      await fc.assert(
        fc.asyncProperty(fc.array(EDIT, { minLength: 1, maxLength: 3 }), async (edits) => {
          const file = scenarioFile(documentText(edits));
          const run = await keepsTheContract(['solve', file], [file]);
          outcomes[run.code] = (outcomes[run.code] ?? 0) + 1;
        }),
        { numRuns: 2000, seed: 140014 },
      );
      // The generator reaches both sides of the contract: answers and refusals.
      expect(outcomes[2]).toBeGreaterThan(400);
      expect((outcomes[0] ?? 0) + (outcomes[1] ?? 0)).toBeGreaterThan(100);
    },
    SUITE_TIMEOUT_MS,
  );
});

const OPTION_VALUE = fc.oneof(
  fc.constantFrom(
    '70M',
    '140M',
    '20M',
    '1',
    '0',
    '-5M',
    '1e6k',
    '1e999',
    '1e-400',
    '5%',
    '200%',
    'x',
    '',
    '1k',
    '2G',
    '1000G',
    '3',
    '1024',
    '65536',
    '7',
    '1e3',
  ),
  fc.string({ maxLength: 8 }),
);

describe('fuzz: every command option', () => {
  const valid = scenarioFile(JSON.stringify(BASE));

  it(
    'windows, alias, solve, compare, verify, report and init with random option values',
    async () => {
      const command = fc.oneof(
        fc
          .record({
            low: OPTION_VALUE,
            high: OPTION_VALUE,
            guard: OPTION_VALUE,
            min: OPTION_VALUE,
            max: OPTION_VALUE,
            json: fc.boolean(),
            centred: fc.boolean(),
          })
          .map((o) => [
            'windows',
            ...(o.centred ? ['--center', o.low, '--width', o.high] : ['--low', o.low, '--high', o.high]),
            '--guard',
            o.guard,
            '--min-rate',
            o.min,
            '--max-rate',
            o.max,
            ...(o.json ? ['--json'] : []),
          ]),
        fc
          .record({ rate: OPTION_VALUE, tones: fc.array(OPTION_VALUE, { minLength: 1, maxLength: 3 }), k: OPTION_VALUE })
          .map((o) => ['alias', '--rate', o.rate, '--multiples', o.k, ...o.tones]),
        fc
          .record({
            goal: fc.constantFrom('widest-margin', 'lowest-rate', 'quarter-rate', 'decimation', 'fastest', ''),
            rate: OPTION_VALUE,
          })
          .map((o) => ['solve', valid, '--goal', o.goal, '--output-rate', o.rate]),
        fc
          .record({ json: fc.boolean(), csv: fc.boolean() })
          .map((o) => ['compare', valid, ...(o.json ? ['--json'] : []), ...(o.csv ? ['--csv'] : [])]),
        fc
          .record({ rate: OPTION_VALUE, tones: OPTION_VALUE, samples: fc.constantFrom('1024', '2048', '1000', '0', 'x', '1048577', '') })
          .map((o) => ['verify', valid, '--rate', o.rate, '--tones', o.tones, '--samples', o.samples]),
        fc.constantFrom<string[]>(
          ['report', valid, '--html', join(dir, 'page.html'), '--force'],
          ['report', valid, '--html', dir],
          ['init', '--from', valid],
          ['init', join(dir, 'no-such-dir', 'x.json')],
        ),
      );
      await fc.assert(
        fc.asyncProperty(command, async (args) => {
          await keepsTheContract(args, [valid, dir, '--', 'option', 'argument', 'frequency ']);
        }),
        { numRuns: 400, seed: 140015 },
      );
    },
    SUITE_TIMEOUT_MS,
  );
});
