import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { resolveScenario, scenarioFromDocument } from '../../src/scenario/resolve-scenario.js';
import { ScenarioError, type ScenarioIssue } from '../../src/scenario/scenario-issue.js';
import { InputError } from '../../src/units/input-error.js';
import { memoryFiles } from './memory-files.js';

/**
 * Loading scenario files: `extends` chains and every kind of refusal. The
 * base is the demo base file (invented Heron data); each case changes one
 * thing in a variant and checks the issue's file, path and words.
 */
const BASE_TEXT = readFileSync(new URL('../../scenarios/heron-base.json', import.meta.url), 'utf8');
const BASE = JSON.parse(BASE_TEXT) as Record<string, unknown>;

function refusal(run: () => unknown): ScenarioError {
  try {
    run();
  } catch (error) {
    expect(error).toBeInstanceOf(ScenarioError);
    expect(error).toBeInstanceOf(InputError);
    return error as ScenarioError;
  }
  throw new Error('expected a refusal, but the scenario loaded');
}

/** The variant `s/v.json` over the base `s/heron-base.json`, plus other files. */
function loadVariant(variant: unknown, others: Record<string, unknown> = {}) {
  return resolveScenario('s/v.json', memoryFiles({ 's/heron-base.json': BASE_TEXT, 's/v.json': variant, ...others }));
}
const over = (fields: Record<string, unknown>) => ({ extends: 'heron-base.json', ...fields });

describe('extends', () => {
  it('merges objects key by key: a variant setting converter.bits keeps the rest of the base converter', () => {
    const scenario = loadVariant(over({ converter: { bits: 12 } }));
    expect(scenario.converter.bits).toBe(12);
    expect(scenario.converter.label).toBe('SR-QC14 250M');
    expect(scenario.converter.maxRate).toBe(250e6);
    expect(scenario.wanted.low).toBe(130e6);
  });

  it('replaces lists whole: one board spur in the variant leaves one', () => {
    const scenario = loadVariant(over({ boardSpurs: [{ label: 'Fan PWM', frequency: '25k', level: -90 }] }));
    expect(scenario.boardSpurs).toEqual([{ label: 'Fan PWM', low: 25e3, high: 25e3, level: -90, coupling: 'after-filter', harmonics: 1 }]);
  });

  it('follows a chain of relative paths through folders', () => {
    const scenario = resolveScenario(
      'top/variants/x.json',
      memoryFiles({
        'top/variants/x.json': { extends: '../mid/y.json', name: 'X' },
        'top/mid/y.json': { extends: '../../s/heron-base.json', requirements: { margin: '3M' } },
        's/heron-base.json': BASE_TEXT,
      }),
    );
    expect(scenario.name).toBe('X');
    expect(scenario.requirements).toEqual({ margin: 3e6, rejection: 10, tolerancePpm: 50 });
    expect(scenario.clocks).toHaveLength(7);
  });

  it('replaces an object whose kind differs (a table filter over a Butterworth one)', () => {
    const scenario = loadVariant(
      over({
        filter: {
          kind: 'table',
          points: [
            ['100M', 40],
            ['128M', 3],
            ['152M', 3],
            ['180M', 40],
          ],
        },
      }),
    );
    expect(scenario.filter).toEqual({
      kind: 'table',
      points: [
        { frequency: 100e6, attenuation: 40 },
        { frequency: 128e6, attenuation: 3 },
        { frequency: 152e6, attenuation: 3 },
        { frequency: 180e6, attenuation: 40 },
      ],
    });
  });

  it('lets null clear a base key, to switch the wanted band from centre/width to low/high', () => {
    const scenario = loadVariant(over({ wanted: { center: null, width: null, low: '60M', high: '80M' } }));
    expect(scenario.wanted).toMatchObject({ low: 60e6, high: 80e6, weakestLevel: -70 });
  });

  it('lets null remove the base filter', () => {
    expect(loadVariant(over({ filter: null })).filter).toBeNull();
  });

  it('shows the chain when a base file is missing', () => {
    const error = refusal(() =>
      resolveScenario('s/v.json', memoryFiles({ 's/v.json': { extends: 'a.json' }, 's/a.json': { extends: 'sub/gone.json' } })),
    );
    expect(error.issues).toHaveLength(1);
    expect(error.issues[0]).toMatchObject({
      kind: 'unreadable',
      file: 's/a.json',
      path: 'extends',
      chain: ['s/v.json', 's/a.json', 's/sub/gone.json'],
    });
    expect(error.message).toBe(
      's/a.json: extends: expected a base file that can be read (got s/sub/gone.json: no such file); extends chain: s/v.json → s/a.json → s/sub/gone.json',
    );
  });

  it('names the file itself when it is missing', () => {
    const error = refusal(() => resolveScenario('nowhere.json', memoryFiles({})));
    expect(error.issues[0]).toMatchObject({ kind: 'unreadable', file: 'nowhere.json', path: '', received: 'no such file' });
  });

  it('shows the chain of a cycle, a.json → b.json → a.json', () => {
    const error = refusal(() =>
      resolveScenario('a.json', memoryFiles({ 'a.json': { extends: 'b.json' }, 'b.json': { extends: './a.json' } })),
    );
    expect(error.issues[0]).toMatchObject({ kind: 'cycle', file: 'b.json', path: 'extends', chain: ['a.json', 'b.json', 'a.json'] });
    expect(error.message).toContain('extends chain: a.json → b.json → a.json');
  });

  it('refuses a file that extends itself', () => {
    const error = refusal(() => resolveScenario('a.json', memoryFiles({ 'a.json': { extends: 'a.json' } })));
    expect(error.issues[0]?.chain).toEqual(['a.json', 'a.json']);
  });

  it('charges an error to the file that wrote the value', () => {
    const badBase = JSON.stringify({ ...BASE, converter: { ...(BASE.converter as object), bitz: 14 } });
    const fromBase = refusal(() =>
      resolveScenario('s/v.json', memoryFiles({ 's/heron-base.json': badBase, 's/v.json': over({ name: 'V' }) })),
    );
    expect(fromBase.issues[0]).toMatchObject({ file: 's/heron-base.json', path: 'converter.bitz' });
    const fromVariant = refusal(() => loadVariant(over({ boardSpurs: [{ label: 'x', frequency: 'ten', level: -3 }] })));
    expect(fromVariant.issues[0]).toMatchObject({ file: 's/v.json', path: 'boardSpurs[0].frequency' });
    // A missing key in an object both files wrote is charged to the variant.
    const missing = refusal(() =>
      resolveScenario(
        's/v.json',
        memoryFiles({ 's/b.json': { name: 'B' }, 's/v.json': { extends: 'b.json', wanted: { low: 1, high: 2 } } }),
      ),
    );
    expect(missing.issues.map((issue) => `${issue.file} ${issue.path}`)).toContain('s/v.json wanted.weakestLevel');
    expect(missing.issues.map((issue) => `${issue.file} ${issue.path}`)).toContain('s/v.json converter');
  });

  it('refuses an extends that is not a file name', () => {
    const error = refusal(() => loadVariant({ extends: 3 }));
    expect(error.issues[0]).toMatchObject({ file: 's/v.json', path: 'extends', received: '3' });
  });
});

interface Case {
  readonly variant: Record<string, unknown>;
  readonly path: string;
  readonly kind?: ScenarioIssue['kind'];
  readonly words: string;
}

/** One change each to a valid variant; the first issue must name this path and say these words. */
const CASES: Record<string, Case> = {
  'unknown key, with the nearest known key': {
    variant: { converter: { bitz: 12 } },
    path: 'converter.bitz',
    kind: 'unknown-key',
    words: 'did you mean "bits"?',
  },
  'unknown key in a list entry': {
    variant: { boardSpurs: [{ lable: 'x', frequency: '1M', level: -90 }] },
    path: 'boardSpurs[0].lable',
    kind: 'unknown-key',
    words: 'did you mean "label"?',
  },
  'unknown top-level key': { variant: { neighbors: [] }, path: 'neighbors', kind: 'unknown-key', words: 'did you mean "neighbours"?' },
  'unknown key in a union branch': {
    variant: { guard: { low: '1M', hgh: '1M' } },
    path: 'guard.hgh',
    kind: 'unknown-key',
    words: 'did you mean "high"?',
  },
  'unknown key in a discriminated branch': {
    variant: { filter: { kind: 'butterworth', order: 5, passLow: '128M', passHigh: '152M', ordre: 3 } },
    path: 'filter.ordre',
    kind: 'unknown-key',
    words: 'did you mean "order"?',
  },
  'unknown key with nothing near': {
    variant: { converter: { colour: 'blue' } },
    path: 'converter.colour',
    kind: 'unknown-key',
    words: 'expected one of the keys label, minRate',
  },
  'wrong type': {
    variant: { converter: { bits: '14' } },
    path: 'converter.bits',
    words: 'expected a whole number from 1 to 32 (got "14")',
  },
  'wrong type for a frequency': {
    variant: { converter: { maxRate: true } },
    path: 'converter.maxRate',
    words: 'expected a frequency: hertz as a number, or text such as "70M"',
  },
  'bad frequency text, naming its path': {
    variant: {
      boardSpurs: [
        { label: 'a', frequency: '1M', level: -90 },
        { label: 'b', frequency: '2M', level: -90 },
        { label: 'c', frequency: '10 mhz', level: -90 },
      ],
    },
    path: 'boardSpurs[2].frequency',
    words: "'m' is milli",
  },
  'negative frequency': { variant: { requirements: { margin: -1 } }, path: 'requirements.margin', words: 'not negative' },
  'zero clock frequency': {
    variant: { clocks: [{ label: 'z', frequency: 0, tolerance: 1 }] },
    path: 'clocks[0].frequency',
    words: 'a frequency above zero (got 0)',
  },
  'negative tolerance': {
    variant: { clocks: [{ label: 'z', frequency: '1M', tolerance: -1 }] },
    path: 'clocks[0].tolerance',
    words: 'not negative',
  },
  'bad time': { variant: { converter: { apertureJitter: '80 f' } }, path: 'converter.apertureJitter', words: 'e.g. 80 fs' },
  'bad guard': { variant: { guard: 'wide' }, path: 'guard', words: 'a percentage of the wanted width' },
  'bad guard type': { variant: { guard: true }, path: 'guard', words: 'a guard: a frequency or percentage for both sides' },
  'harmonic order key below 2': {
    variant: { converter: { harmonics: { '1': -70 } } },
    path: 'converter.harmonics["1"]',
    words: 'a whole number 2 or more',
  },
  'harmonic level not a number': {
    variant: { converter: { harmonics: { '2': 'low' } } },
    path: 'converter.harmonics["2"]',
    words: 'a number',
  },
  'harmonicOrder out of range': { variant: { harmonicOrder: 16 }, path: 'harmonicOrder', words: 'a whole number from 2 to 15 (got 16)' },
  'spur harmonics out of range': {
    variant: { boardSpurs: [{ label: 'a', frequency: '1M', level: -90, harmonics: 0 }] },
    path: 'boardSpurs[0].harmonics',
    words: 'from 1 to 20',
  },
  'bad coupling': {
    variant: { boardSpurs: [{ label: 'a', frequency: '1M', level: -90, coupling: 'inside' }] },
    path: 'boardSpurs[0].coupling',
    words: '"before-filter", "after-filter"',
  },
  'blank label': { variant: { clocks: [{ label: ' ', frequency: '1M', tolerance: 1 }] }, path: 'clocks[0].label', words: 'not blank' },
  'missing key': { variant: { requirements: { rejection: null } }, path: 'requirements.rejection', words: 'a number (got null)' },
  'wanted level above full scale': { variant: { wanted: { weakestLevel: 3 } }, path: 'wanted.weakestLevel', words: 'at most 0' },
  'bad goal word': {
    variant: { goal: 'fastest' },
    path: 'goal',
    words: 'one of "widest-margin", "lowest-rate", "quarter-rate" (got "fastest")',
  },
  'bad goal kind': {
    variant: { goal: { kind: 'decimate', outputRate: '30.72M' } },
    path: 'goal.kind',
    kind: 'unknown-value',
    words: 'unknown value "decimate"; did you mean "decimation"?',
  },
  'decimation without its rate': { variant: { goal: { kind: 'decimation' } }, path: 'goal.outputRate', words: 'got nothing' },
  'bad filter kind': {
    variant: { filter: { kind: 'elliptic' } },
    path: 'filter.kind',
    words: 'one of "butterworth", "table" (got "elliptic")',
  },
  'filter order out of range': { variant: { filter: { order: 21 } }, path: 'filter.order', words: 'from 1 to 20' },
  'table with one point': { variant: { filter: { kind: 'table', points: [['100M', 3]] } }, path: 'filter.points', words: 'at least 2' },
  'table point not a pair': {
    variant: { filter: { kind: 'table', points: [['100M', 3], ['200M']] } },
    path: 'filter.points[1]',
    words: 'a [frequency, attenuation dB] pair',
  },
  'table frequencies not increasing': {
    variant: {
      filter: {
        kind: 'table',
        points: [
          ['100M', 40],
          ['120M', 3],
          ['120M', 3],
        ],
      },
    },
    path: 'filter.points[2][0]',
    words: 'above the point before (120 MHz)',
  },
  'wanted high not above low': {
    variant: { wanted: { center: null, width: null, low: '150M', high: '130M' } },
    path: 'wanted.high',
    words: 'above low (150 MHz) (got 130 MHz)',
  },
  'wanted band of no width': { variant: { wanted: { width: 0 } }, path: 'wanted.width', words: 'a width above zero' },
  'wanted width over twice the centre': {
    variant: { wanted: { center: '5M', width: '20M' } },
    path: 'wanted.width',
    words: 'at most twice the centre (5 MHz)',
  },
  'wanted in two forms at once': {
    variant: { wanted: { low: '130M', high: '150M' } },
    path: 'wanted',
    words: 'either low and high, or center and width, not a mix',
  },
  'wanted edge missing': {
    variant: { wanted: { center: null, width: null, low: '130M' } },
    path: 'wanted.high',
    words: 'a frequency (with low) (got nothing)',
  },
  'spur with neither form': {
    variant: { boardSpurs: [{ label: 'a', level: -90 }] },
    path: 'boardSpurs[0]',
    words: 'frequency, or low and high (got none of them)',
  },
  'neighbour upside down': {
    variant: { neighbours: [{ label: 'n', low: '20M', high: '10M', level: -30 }] },
    path: 'neighbours[0].high',
    words: 'above low (20 MHz)',
  },
  'wanted band above the input bandwidth': {
    variant: { wanted: { center: '700M' } },
    path: 'wanted.high',
    words: "at or below the converter's input bandwidth (converter.inputBandwidth 650 MHz) (got wanted band up to 710 MHz)",
  },
  'minRate above maxRate': {
    variant: { converter: { minRate: '300M' } },
    path: 'converter.maxRate',
    words: 'at or above minRate (300 MHz) (got 250 MHz)',
  },
  'passLow not below passHigh': {
    variant: { filter: { passLow: '160M' } },
    path: 'filter.passHigh',
    words: 'above passLow (160 MHz) (got 152 MHz)',
  },
  'strongest below weakest': {
    variant: { wanted: { strongestLevel: -80 } },
    path: 'wanted.strongestLevel',
    words: 'at or above weakestLevel (-70 dBFS) (got -80 dBFS)',
  },
  'label used twice across lists': {
    variant: { clocks: [{ label: 'LO-1 leakage', frequency: '100M', tolerance: 20 }] },
    path: 'clocks[0].label',
    words: 'boardSpurs[3].label is already "LO-1 leakage"',
  },
  'label used twice in one list': {
    variant: {
      neighbours: [
        { label: 'n', low: '1M', high: '2M', level: -3 },
        { label: 'n', low: '3M', high: '4M', level: -3 },
      ],
    },
    path: 'neighbours[1].label',
    words: 'neighbours[0].label is already "n"',
  },
  ...CLOCK_CASES(),
};

/** Refusals of the clock-planning fields: parts, synthesiser settings, converter dividers, IF shift. */
function CLOCK_CASES(): Record<string, Case> {
  const part = (fields: Record<string, unknown>) => ({ clocks: [{ label: 'P', frequency: '10M', tolerance: 2, ...fields }] });
  const synth = (fields: Record<string, unknown>) => part({ derive: { kind: 'synthesiser', n: [1, 128], m: [1, 16], ...fields } });
  return {
    'old clock field name, with the new one suggested': {
      variant: { clocks: [{ label: 'P', frequency: '10M', tolerancePpm: 2 }] },
      path: 'clocks[0].tolerancePpm',
      kind: 'unknown-key',
      words: 'did you mean "tolerance"?',
    },
    'tolerance breakdown missing a contribution': {
      variant: part({ tolerance: { initial: 1, temperature: 2 } }),
      path: 'clocks[0].tolerance.ageing',
      words: 'expected a number (got nothing)',
    },
    'negative tolerance contribution': {
      variant: part({ tolerance: { initial: 1, temperature: -2, ageing: 0 } }),
      path: 'clocks[0].tolerance.temperature',
      words: 'not negative (got -2)',
    },
    'unknown key in a tolerance breakdown': {
      variant: part({ tolerance: { initial: 1, temperature: 2, aging: 0 } }),
      path: 'clocks[0].tolerance.aging',
      kind: 'unknown-key',
      words: 'did you mean "ageing"?',
    },
    'tolerance as text': {
      variant: part({ tolerance: '20 ppm' }),
      path: 'clocks[0].tolerance',
      words: 'a tolerance in ppm, or { "initial": ..., "temperature": ..., "ageing": ... }',
    },
    'bad jitter': { variant: part({ jitter: '90 f' }), path: 'clocks[0].jitter', words: 'a time with its unit, e.g. 90 fs (got "90 f")' },
    'note not text': { variant: part({ note: 3 }), path: 'clocks[0].note', words: 'expected text (got 3)' },
    'bad derivation word': {
      variant: part({ derive: 'divided' }),
      path: 'clocks[0].derive',
      kind: 'unknown-value',
      words: 'unknown value "divided"; did you mean "divider"? (expected one of "direct", "divider")',
    },
    'bad derivation kind': {
      variant: part({ derive: { kind: 'pll' } }),
      path: 'clocks[0].derive.kind',
      words: 'one of "direct", "divider", "synthesiser" (got "pll")',
    },
    'derivation of the wrong type': {
      variant: part({ derive: 4 }),
      path: 'clocks[0].derive',
      words: 'a derivation: "direct", "divider" or { "kind": "synthesiser"',
    },
    'unknown key in a synthesiser, with a suggestion': {
      variant: synth({ vcoo: { low: '1G', high: '2G' } }),
      path: 'clocks[0].derive.vcoo',
      kind: 'unknown-key',
      words: 'did you mean "vco"?',
    },
    'unknown key in a VCO range': {
      variant: synth({ vco: { low: '1G', hihg: '2G' } }),
      path: 'clocks[0].derive.vco.hihg',
      kind: 'unknown-key',
      words: 'did you mean "high"?',
    },
    'synthesiser without N': { variant: part({ derive: { kind: 'synthesiser', m: 1 } }), path: 'clocks[0].derive.n', words: 'got nothing' },
    'setting of zero': { variant: synth({ n: 0 }), path: 'clocks[0].derive.n', words: 'a whole number 1 or more (got 0)' },
    'range end of zero': { variant: synth({ m: [0, 16] }), path: 'clocks[0].derive.m[0]', words: 'a whole number 1 or more (got 0)' },
    'range not whole': {
      variant: synth({ d: 1.5 }),
      path: 'clocks[0].derive.d',
      words: 'a whole number 1 or more, or a [min, max] pair of them (got 1.5)',
    },
    'range of three numbers': { variant: synth({ n: [1, 2, 3] }), path: 'clocks[0].derive.n', words: 'a list of at most 2 entries' },
    'range as text': { variant: synth({ n: '1-128' }), path: 'clocks[0].derive.n', words: 'a [min, max] pair of them (got "1-128")' },
    'range min above max': {
      variant: synth({ n: [128, 1] }),
      path: 'clocks[0].derive.n[1]',
      words: 'a whole number at or above min (128) (got 1)',
    },
    'VCO low equal to high': {
      variant: synth({ vco: { low: '2G', high: '2G' } }),
      path: 'clocks[0].derive.vco.high',
      words: 'a frequency above low (2 GHz) (got 2 GHz)',
    },
    'VCO low above high': {
      variant: synth({ vco: { low: '2.4G', high: '1.2G' } }),
      path: 'clocks[0].derive.vco.high',
      words: 'a frequency above low (2.4 GHz) (got 1.2 GHz)',
    },
    'VCO edge missing': { variant: synth({ vco: { low: '1G' } }), path: 'clocks[0].derive.vco.high', words: 'got nothing' },
    'repeated clock divider': {
      variant: { converter: { clockDividers: [1, 2, 4, 2] } },
      path: 'converter.clockDividers[3]',
      words: 'a divider not listed already (clockDividers[1] is 2) (got 2)',
    },
    'clock divider of zero': {
      variant: { converter: { clockDividers: [0, 1] } },
      path: 'converter.clockDividers[0]',
      words: 'a whole number 1 or more (got 0)',
    },
    'fractional clock divider': {
      variant: { converter: { clockDividers: [1, 2.5] } },
      path: 'converter.clockDividers[1]',
      words: 'a whole number 1 or more (got 2.5)',
    },
    'no clock dividers': {
      variant: { converter: { clockDividers: [] } },
      path: 'converter.clockDividers',
      words: 'at least one clock divider',
    },
    'clock dividers not a list': {
      variant: { converter: { clockDividers: 2 } },
      path: 'converter.clockDividers',
      words: 'a list of whole-number clock dividers',
    },
    'IF shift low above high': {
      variant: { ifShift: { low: '2M', high: '-2M' } },
      path: 'ifShift.high',
      words: 'a shift at or above low (2 MHz) (got -2 MHz)',
    },
    'IF shift with two signs': { variant: { ifShift: { low: '--5M', high: '5M' } }, path: 'ifShift.low', words: 'at most one sign' },
    'IF shift sign alone': { variant: { ifShift: { low: '-', high: '5M' } }, path: 'ifShift.low', words: 'a frequency such as 70M' },
    'IF shift in milli': { variant: { ifShift: { low: '-5m', high: '5M' } }, path: 'ifShift.low', words: "'m' is milli" },
    'IF shift of the wrong type': { variant: { ifShift: { low: true, high: '5M' } }, path: 'ifShift.low', words: 'a frequency, signed' },
    'IF shift edge missing': { variant: { ifShift: { low: '-5M' } }, path: 'ifShift.high', words: 'got nothing' },
    'IF shift below 0 Hz': {
      variant: { ifShift: { low: '-131M', high: 0 } },
      path: 'ifShift.low',
      words: 'a shift that keeps the wanted band at or above 0 Hz (at least -130 MHz) (got -131 MHz)',
    },
    'IF shift above the input bandwidth': {
      variant: { ifShift: { low: 0, high: '501M' } },
      path: 'ifShift.high',
      words: "within the converter's input bandwidth (converter.inputBandwidth 650 MHz; at most 500 MHz) (got 501 MHz)",
    },
    'unknown key in an IF shift': {
      variant: { ifShift: { low: 0, high: 0, center: 0 } },
      path: 'ifShift.center',
      kind: 'unknown-key',
      words: 'expected one of the keys low, high',
    },
  };
}

describe('validation errors', () => {
  it.each(Object.entries(CASES))('%s', (_name, { variant, path, kind, words }) => {
    const error = refusal(() => loadVariant(over(variant)));
    const first = error.issues[0]!;
    expect(first.path).toBe(path);
    expect(first.file).toBe('s/v.json');
    expect(first.kind).toBe(kind ?? 'invalid');
    expect(error.message).toContain(words);
    expect(error.message.startsWith(`s/v.json: ${path}: `)).toBe(true);
    expect(error.message).not.toContain('\n');
  });

  it('lists every issue, and says how many more after the first', () => {
    const error = refusal(() => loadVariant(over({ converter: { bitz: 1, lable: 'x' }, harmonicOrder: 1 })));
    expect(error.issues.map((issue) => issue.path)).toEqual(['converter.bitz', 'converter.lable', 'harmonicOrder']);
    expect(error.message).toMatch(/did you mean "bits"\? \(and 2 more issues\)$/);
  });

  it('drops the missing-key issue that a typo explains', () => {
    const error = refusal(() => loadVariant(over({ boardSpurs: [{ lable: 'x', frequency: '1M', level: -90 }] })));
    expect(error.issues.map((issue) => issue.path)).toEqual(['boardSpurs[0].lable']);
  });

  it('keeps the InputError fields of the first issue', () => {
    const error = refusal(() => loadVariant(over({ converter: { bits: 0 } })));
    expect(error.where).toBe('s/v.json: converter.bits');
    expect(error.expected).toBe('a whole number from 1 to 32');
    expect(error.received).toBe('0');
  });
});

describe('clock parts, converter dividers and IF shift', () => {
  const onePart = (fields: Record<string, unknown>) =>
    loadVariant(over({ clocks: [{ label: 'P', frequency: '10M', tolerance: 2, ...fields }] })).clocks[0]!;

  it('fills a part written with the least: direct, no jitter, no note, one tolerance figure', () => {
    expect(onePart({})).toEqual({
      label: 'P',
      frequency: 10e6,
      tolerancePpm: 2,
      toleranceBreakdown: null,
      jitter: null,
      note: '',
      derivation: { kind: 'direct' },
    });
  });

  it('plans for the sum of a tolerance breakdown and keeps the contributions', () => {
    // ±10 initial, ±15 over temperature, ±5 ageing: the part may be off by up to ±30 ppm (worst case adds).
    const part = onePart({ tolerance: { initial: 10, temperature: 15, ageing: 5 } });
    expect(part.tolerancePpm).toBe(30);
    expect(part.toleranceBreakdown).toEqual({ initial: 10, temperature: 15, ageing: 5 });
  });

  it('reads jitter in fs or ps and keeps the note', () => {
    expect(onePart({ jitter: '90 fs', note: 'in stock' })).toMatchObject({ jitter: 90e-15, note: 'in stock' });
    expect(onePart({ jitter: '0.3 ps' }).jitter).toBeCloseTo(0.3e-12, 27);
    expect(onePart({ jitter: null }).jitter).toBeNull();
  });

  it('takes a derivation as a word or as an object of the same kind', () => {
    expect(onePart({ derive: 'divider' }).derivation).toEqual({ kind: 'divider' });
    expect(onePart({ derive: { kind: 'divider' } }).derivation).toEqual({ kind: 'divider' });
    expect(onePart({ derive: { kind: 'direct' } }).derivation).toEqual({ kind: 'direct' });
  });

  it('reads synthesiser ranges, a single integer as a range of one, D defaulting to 1 and no VCO range', () => {
    expect(onePart({ derive: { kind: 'synthesiser', n: 40, m: [1, 16] } }).derivation).toEqual({
      kind: 'synthesiser',
      n: { min: 40, max: 40 },
      m: { min: 1, max: 16 },
      d: { min: 1, max: 1 },
      vco: null,
    });
    expect(
      onePart({ derive: { kind: 'synthesiser', n: [1, 128], m: 2, d: [2, 2], vco: { low: '2.4G', high: '3.2G' } } }).derivation,
    ).toEqual({
      kind: 'synthesiser',
      n: { min: 1, max: 128 },
      m: { min: 2, max: 2 },
      d: { min: 2, max: 2 },
      vco: { low: 2.4e9, high: 3.2e9 },
    });
  });

  it('sorts the converter clock dividers and defaults them to [1]', () => {
    expect(loadVariant(over({ converter: { clockDividers: [4, 1, 2] } })).converter.clockDividers).toEqual([1, 2, 4]);
    const { clockDividers: _given, ...converter } = BASE.converter as Record<string, unknown>;
    expect(scenarioFromDocument({ ...BASE, converter }, 'b.json').converter.clockDividers).toEqual([1]);
  });

  it('has no IF shift unless one is written', () => {
    expect(loadVariant(over({})).ifShift).toBeNull();
  });

  it.each([
    [{ low: '-5M', high: '5M' }, -5e6, 5e6],
    [{ low: '−2.5 MHz', high: '+2.5 MHz' }, -2.5e6, 2.5e6],
    [{ low: -1e6, high: 250e3 }, -1e6, 250e3],
    [{ low: '- 300k', high: '-100k' }, -300e3, -100e3],
    [{ low: '3M', high: '3M' }, 3e6, 3e6],
  ])('accepts the IF shift %j', (ifShift, low, high) => {
    expect(loadVariant(over({ ifShift })).ifShift).toEqual({ low, high });
  });

  it('reads a shift of minus zero as zero, so it writes back the same', () => {
    const shift = loadVariant(over({ ifShift: { low: '-0', high: -0 } })).ifShift!;
    expect(Object.is(shift.low, 0)).toBe(true);
    expect(Object.is(shift.high, 0)).toBe(true);
  });

  it('merges an IF shift key by key over the base, and null removes it', () => {
    const files = { 's/mid.json': over({ ifShift: { low: '-5M', high: '5M' } }) };
    expect(loadVariant({ extends: 'mid.json', ifShift: { high: '1M' } }, files).ifShift).toEqual({ low: -5e6, high: 1e6 });
    expect(loadVariant({ extends: 'mid.json', ifShift: null }, files).ifShift).toBeNull();
  });

  it('charges a shift that takes the band past the input bandwidth to the variant that moved the band', () => {
    const files = { 's/mid.json': over({ ifShift: { low: 0, high: '400M' } }) };
    const error = refusal(() => loadVariant({ extends: 'mid.json', wanted: { center: '300M' } }, files));
    expect(error.issues[0]).toMatchObject({ file: 's/v.json', path: 'ifShift.high' });
  });
});

describe('JSON syntax errors', () => {
  it('give the file, line and column of a missing comma', () => {
    const text = '{\n  "extends": "heron-base.json",\n  "name": "x"\n  "harmonicOrder": 3\n}\n';
    const error = refusal(() => loadVariant(text));
    expect(error.issues[0]).toMatchObject({ kind: 'syntax', file: 's/v.json', path: '4:3' });
    expect(error.message).toBe("s/v.json:4:3: JSON syntax error: expected ',' or '}' (got \"\\\"\")");
  });

  it('give the end of the text for a cut-off file', () => {
    const error = refusal(() => loadVariant('{\n  "name": "x",'));
    expect(error.issues[0]).toMatchObject({ path: '2:15', received: 'the end of the text' });
  });

  it('come from the base file when the base is broken', () => {
    const error = refusal(() =>
      resolveScenario('s/v.json', memoryFiles({ 's/v.json': over({}), 's/heron-base.json': '{ "name": "b", }' })),
    );
    expect(error.issues[0]).toMatchObject({ kind: 'syntax', file: 's/heron-base.json', path: '1:16' });
  });

  it('refuse a document that is not an object', () => {
    const error = refusal(() => loadVariant('[1, 2]'));
    expect(error.message).toBe('s/v.json: expected a JSON object holding the scenario (got a list of 2)');
  });
});

describe('scenarioFromDocument', () => {
  it('validates one document with no base', () => {
    expect(scenarioFromDocument(BASE, 'heron-base.json').name).toBe('Heron-4 base');
  });

  it('refuses a document that names a base', () => {
    const error = refusal(() => scenarioFromDocument({ ...BASE, extends: 'x.json' }, 'v.json'));
    expect(error.issues[0]).toMatchObject({ file: 'v.json', path: 'extends' });
  });

  it('refuses nesting deeper than any scenario needs', () => {
    let deep: unknown = 1;
    for (let i = 0; i < 100_000; i += 1) deep = [deep];
    const error = refusal(() => scenarioFromDocument({ ...BASE, name: deep }, 'v.json'));
    expect(error.issues[0]?.expected).toContain('nesting at most 32 levels');
  });
});
