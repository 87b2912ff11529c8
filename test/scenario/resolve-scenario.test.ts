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
    expect(scenario.clocks).toHaveLength(4);
  });

  it('replaces an object whose kind differs (a table filter over a Butterworth one)', () => {
    const scenario = loadVariant(over({ filter: { kind: 'table', points: [['100M', 40], ['128M', 3], ['152M', 3], ['180M', 40]] } }));
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
    const error = refusal(() => resolveScenario('s/v.json', memoryFiles({ 's/v.json': { extends: 'a.json' }, 's/a.json': { extends: 'sub/gone.json' } })));
    expect(error.issues).toHaveLength(1);
    expect(error.issues[0]).toMatchObject({ kind: 'unreadable', file: 's/a.json', path: 'extends', chain: ['s/v.json', 's/a.json', 's/sub/gone.json'] });
    expect(error.message).toBe(
      's/a.json: extends: expected a base file that can be read (got s/sub/gone.json: no such file); extends chain: s/v.json → s/a.json → s/sub/gone.json',
    );
  });

  it('names the file itself when it is missing', () => {
    const error = refusal(() => resolveScenario('nowhere.json', memoryFiles({})));
    expect(error.issues[0]).toMatchObject({ kind: 'unreadable', file: 'nowhere.json', path: '', received: 'no such file' });
  });

  it('shows the chain of a cycle, a.json → b.json → a.json', () => {
    const error = refusal(() => resolveScenario('a.json', memoryFiles({ 'a.json': { extends: 'b.json' }, 'b.json': { extends: './a.json' } })));
    expect(error.issues[0]).toMatchObject({ kind: 'cycle', file: 'b.json', path: 'extends', chain: ['a.json', 'b.json', 'a.json'] });
    expect(error.message).toContain('extends chain: a.json → b.json → a.json');
  });

  it('refuses a file that extends itself', () => {
    const error = refusal(() => resolveScenario('a.json', memoryFiles({ 'a.json': { extends: 'a.json' } })));
    expect(error.issues[0]?.chain).toEqual(['a.json', 'a.json']);
  });

  it('charges an error to the file that wrote the value', () => {
    const badBase = JSON.stringify({ ...BASE, converter: { ...(BASE.converter as object), bitz: 14 } });
    const fromBase = refusal(() => resolveScenario('s/v.json', memoryFiles({ 's/heron-base.json': badBase, 's/v.json': over({ name: 'V' }) })));
    expect(fromBase.issues[0]).toMatchObject({ file: 's/heron-base.json', path: 'converter.bitz' });
    const fromVariant = refusal(() => loadVariant(over({ boardSpurs: [{ label: 'x', frequency: 'ten', level: -3 }] })));
    expect(fromVariant.issues[0]).toMatchObject({ file: 's/v.json', path: 'boardSpurs[0].frequency' });
    // A missing key in an object both files wrote is charged to the variant.
    const missing = refusal(() => resolveScenario('s/v.json', memoryFiles({ 's/b.json': { name: 'B' }, 's/v.json': { extends: 'b.json', wanted: { low: 1, high: 2 } } })));
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
  'unknown key, with the nearest known key': { variant: { converter: { bitz: 12 } }, path: 'converter.bitz', kind: 'unknown-key', words: 'did you mean "bits"?' },
  'unknown key in a list entry': {
    variant: { boardSpurs: [{ lable: 'x', frequency: '1M', level: -90 }] },
    path: 'boardSpurs[0].lable',
    kind: 'unknown-key',
    words: 'did you mean "label"?',
  },
  'unknown top-level key': { variant: { neighbors: [] }, path: 'neighbors', kind: 'unknown-key', words: 'did you mean "neighbours"?' },
  'unknown key in a union branch': { variant: { guard: { low: '1M', hgh: '1M' } }, path: 'guard.hgh', kind: 'unknown-key', words: 'did you mean "high"?' },
  'unknown key in a discriminated branch': {
    variant: { filter: { kind: 'butterworth', order: 5, passLow: '128M', passHigh: '152M', ordre: 3 } },
    path: 'filter.ordre',
    kind: 'unknown-key',
    words: 'did you mean "order"?',
  },
  'unknown key with nothing near': { variant: { converter: { colour: 'blue' } }, path: 'converter.colour', kind: 'unknown-key', words: 'expected one of the keys label, minRate' },
  'wrong type': { variant: { converter: { bits: '14' } }, path: 'converter.bits', words: 'expected a whole number from 1 to 32 (got "14")' },
  'wrong type for a frequency': { variant: { converter: { maxRate: true } }, path: 'converter.maxRate', words: 'expected a frequency: hertz as a number, or text such as "70M"' },
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
  'zero rate': { variant: { clocks: [{ label: 'z', rate: 0, tolerancePpm: 1 }] }, path: 'clocks[0].rate', words: 'a frequency above zero (got 0)' },
  'negative tolerance': { variant: { clocks: [{ label: 'z', rate: '1M', tolerancePpm: -1 }] }, path: 'clocks[0].tolerancePpm', words: 'not negative' },
  'bad time': { variant: { converter: { apertureJitter: '80 f' } }, path: 'converter.apertureJitter', words: 'e.g. 80 fs' },
  'bad guard': { variant: { guard: 'wide' } , path: 'guard', words: 'a percentage of the wanted width' },
  'bad guard type': { variant: { guard: true }, path: 'guard', words: 'a guard: a frequency or percentage for both sides' },
  'harmonic order key below 2': { variant: { converter: { harmonics: { '1': -70 } } }, path: 'converter.harmonics["1"]', words: 'a whole number 2 or more' },
  'harmonic level not a number': { variant: { converter: { harmonics: { '2': 'low' } } }, path: 'converter.harmonics["2"]', words: 'a number' },
  'harmonicOrder out of range': { variant: { harmonicOrder: 16 }, path: 'harmonicOrder', words: 'a whole number from 2 to 15 (got 16)' },
  'spur harmonics out of range': { variant: { boardSpurs: [{ label: 'a', frequency: '1M', level: -90, harmonics: 0 }] }, path: 'boardSpurs[0].harmonics', words: 'from 1 to 20' },
  'bad coupling': { variant: { boardSpurs: [{ label: 'a', frequency: '1M', level: -90, coupling: 'inside' }] }, path: 'boardSpurs[0].coupling', words: '"before-filter", "after-filter"' },
  'blank label': { variant: { clocks: [{ label: ' ', rate: '1M', tolerancePpm: 1 }] }, path: 'clocks[0].label', words: 'not blank' },
  'missing key': { variant: { requirements: { rejection: null } }, path: 'requirements.rejection', words: 'a number (got null)' },
  'wanted level above full scale': { variant: { wanted: { weakestLevel: 3 } }, path: 'wanted.weakestLevel', words: 'at most 0' },
  'bad goal word': { variant: { goal: 'fastest' }, path: 'goal', words: 'one of "widest-margin", "lowest-rate", "quarter-rate" (got "fastest")' },
  'bad goal kind': { variant: { goal: { kind: 'decimate', outputRate: '30.72M' } }, path: 'goal.kind', words: '"decimation" (got "decimate")' },
  'decimation without its rate': { variant: { goal: { kind: 'decimation' } }, path: 'goal.outputRate', words: 'got nothing' },
  'bad filter kind': { variant: { filter: { kind: 'elliptic' } }, path: 'filter.kind', words: 'one of "butterworth", "table" (got "elliptic")' },
  'filter order out of range': { variant: { filter: { order: 21 } }, path: 'filter.order', words: 'from 1 to 20' },
  'table with one point': { variant: { filter: { kind: 'table', points: [['100M', 3]] } }, path: 'filter.points', words: 'at least 2' },
  'table point not a pair': { variant: { filter: { kind: 'table', points: [['100M', 3], ['200M']] } }, path: 'filter.points[1]', words: 'a [frequency, attenuation dB] pair' },
  'table frequencies not increasing': {
    variant: { filter: { kind: 'table', points: [['100M', 40], ['120M', 3], ['120M', 3]] } },
    path: 'filter.points[2][0]',
    words: 'above the point before (120 MHz)',
  },
  'wanted high not above low': { variant: { wanted: { center: null, width: null, low: '150M', high: '130M' } }, path: 'wanted.high', words: 'above low (150 MHz) (got 130 MHz)' },
  'wanted band of no width': { variant: { wanted: { width: 0 } }, path: 'wanted.width', words: 'a width above zero' },
  'wanted width over twice the centre': { variant: { wanted: { center: '5M', width: '20M' } }, path: 'wanted.width', words: 'at most twice the centre (5 MHz)' },
  'wanted in two forms at once': { variant: { wanted: { low: '130M', high: '150M' } }, path: 'wanted', words: 'either low and high, or center and width, not a mix' },
  'wanted edge missing': { variant: { wanted: { center: null, width: null, low: '130M' } }, path: 'wanted.high', words: 'a frequency (with low) (got nothing)' },
  'spur with neither form': { variant: { boardSpurs: [{ label: 'a', level: -90 }] }, path: 'boardSpurs[0]', words: 'frequency, or low and high (got none of them)' },
  'neighbour upside down': { variant: { neighbours: [{ label: 'n', low: '20M', high: '10M', level: -30 }] }, path: 'neighbours[0].high', words: 'above low (20 MHz)' },
  'wanted band above the input bandwidth': {
    variant: { wanted: { center: '700M' } },
    path: 'wanted.high',
    words: "at or below the converter's input bandwidth (converter.inputBandwidth 650 MHz) (got wanted band up to 710 MHz)",
  },
  'minRate above maxRate': { variant: { converter: { minRate: '300M' } }, path: 'converter.maxRate', words: 'at or above minRate (300 MHz) (got 250 MHz)' },
  'passLow not below passHigh': { variant: { filter: { passLow: '160M' } }, path: 'filter.passHigh', words: 'above passLow (160 MHz) (got 152 MHz)' },
  'strongest below weakest': { variant: { wanted: { strongestLevel: -80 } }, path: 'wanted.strongestLevel', words: 'at or above weakestLevel (-70 dBFS) (got -80 dBFS)' },
  'label used twice across lists': {
    variant: { clocks: [{ label: 'LO-1 leakage', rate: '100M', tolerancePpm: 20 }] },
    path: 'clocks[0].label',
    words: 'boardSpurs[3].label is already "LO-1 leakage"',
  },
  'label used twice in one list': {
    variant: { neighbours: [{ label: 'n', low: '1M', high: '2M', level: -3 }, { label: 'n', low: '3M', high: '4M', level: -3 }] },
    path: 'neighbours[1].label',
    words: 'neighbours[0].label is already "n"',
  },
};

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

describe('JSON syntax errors', () => {
  it('give the file, line and column of a missing comma', () => {
    const text = '{\n  "extends": "heron-base.json",\n  "name": "x"\n  "harmonicOrder": 3\n}\n';
    const error = refusal(() => loadVariant(text));
    expect(error.issues[0]).toMatchObject({ kind: 'syntax', file: 's/v.json', path: '4:3' });
    expect(error.message).toBe('s/v.json:4:3: JSON syntax error: expected \',\' or \'}\' (got "\\"")');
  });

  it('give the end of the text for a cut-off file', () => {
    const error = refusal(() => loadVariant('{\n  "name": "x",'));
    expect(error.issues[0]).toMatchObject({ path: '2:15', received: 'the end of the text' });
  });

  it('come from the base file when the base is broken', () => {
    const error = refusal(() => resolveScenario('s/v.json', memoryFiles({ 's/v.json': over({}), 's/heron-base.json': '{ "name": "b", }' })));
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
