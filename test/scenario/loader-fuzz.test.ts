import { readFileSync } from 'node:fs';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { resolveScenario, scenarioFromDocument } from '../../src/scenario/resolve-scenario.js';
import { ScenarioError } from '../../src/scenario/scenario-issue.js';
import { scenarioJsonSchema } from '../../src/scenario/scenario-json-schema.js';
import { jsonSchemaAccepts } from './json-schema-check.js';
import { memoryFiles } from './memory-files.js';

/**
 * Fuzzing the loader (fast-check): random JSON documents, random edits of
 * the demo base (values replaced, keys dropped, misspelt or added), random
 * text damage and random extends graphs. The loader either returns a
 * scenario or throws a ScenarioError whose every issue names a file, on one
 * line; and whatever it accepts, the published JSON Schema accepts too, so
 * editors never flag a file the tool takes.
 */
const BASE_TEXT = readFileSync(new URL('../../scenarios/heron-base.json', import.meta.url), 'utf8');
const BASE = JSON.parse(BASE_TEXT) as Record<string, unknown>;

/** Thousands of loads take 3–4 s alone and more while other suites share the two cores; vitest's 5 s default is too tight. */
const FUZZ_TIMEOUT_MS = 30_000;

type Outcome = { readonly accepted: true } | { readonly accepted: false; readonly error: ScenarioError };

function outcome(load: () => unknown): Outcome {
  try {
    load();
    return { accepted: true };
  } catch (error) {
    if (!(error instanceof ScenarioError)) throw error;
    for (const issue of error.issues) {
      expect(issue.file).not.toBe('');
      expect(issue.expected).not.toBe('');
      expect(issue.received).not.toBe('');
    }
    expect(error.issues.length).toBeGreaterThan(0);
    expect(error.message).not.toMatch(/\n/);
    expect(error.message.startsWith(error.issues[0]!.file)).toBe(true);
    return { accepted: false, error };
  }
}

type Path = ReadonlyArray<string | number>;

function allPaths(value: unknown, path: Path = []): Path[] {
  const here = [path];
  if (Array.isArray(value)) return here.concat(...value.map((item, i) => allPaths(item, [...path, i])));
  if (typeof value === 'object' && value !== null) return here.concat(...Object.entries(value).map(([k, v]) => allPaths(v, [...path, k])));
  return here;
}

type Edit =
  { kind: 'set'; value: unknown } | { kind: 'drop' } | { kind: 'rename'; to: string } | { kind: 'add'; key: string; value: unknown };

/** A copy of the document with one edit at the path (edits that do not apply leave it as is). */
function edited(document: unknown, path: Path, edit: Edit): unknown {
  if (path.length === 0) {
    if (edit.kind === 'set') return edit.value;
    if (edit.kind === 'add' && typeof document === 'object' && document !== null && !Array.isArray(document)) {
      return Object.fromEntries([...Object.entries(document), [edit.key, edit.value]]);
    }
    return document;
  }
  const [step, ...rest] = path;
  if (Array.isArray(document)) {
    if (rest.length === 0 && edit.kind === 'drop') return document.filter((_, i) => i !== step);
    return document.map((item, i) => (i === step ? edited(item, rest, edit) : item));
  }
  if (typeof document !== 'object' || document === null) return document;
  const entries = Object.entries(document).flatMap(([key, value]): Array<[string, unknown]> => {
    if (key !== step) return [[key, value]];
    if (rest.length === 0 && edit.kind === 'drop') return [];
    if (rest.length === 0 && edit.kind === 'rename') return [[edit.to, value]];
    return [[key, edited(value, rest, edit)]];
  });
  return Object.fromEntries(entries);
}

const typo = (key: string) =>
  fc.oneof(
    fc.constant(key.slice(1)),
    fc.constant(key + 's'),
    fc.constant(key.toUpperCase()),
    fc.nat().map((n) => (key.length < 2 ? key + 'x' : key.slice(0, n % key.length) + key.slice((n % key.length) + 1))),
  );

/** The demo base plus an IF shift (the demo files have none), so edits reach every kind of field. */
const EDIT_BASE: Record<string, unknown> = { ...BASE, ifShift: { low: '-5M', high: '+2.5M' } };
const basePaths = allPaths(EDIT_BASE);
const baseEdit = fc.constantFrom(...basePaths).chain((path) =>
  fc.record({
    path: fc.constant(path),
    edit: fc.oneof(
      fc.jsonValue({ maxDepth: 2 }).map((value): Edit => ({ kind: 'set', value })),
      fc
        .constantFrom<unknown>(
          0,
          -1,
          '',
          'x',
          '10 mhz',
          '10%',
          null,
          true,
          [],
          {},
          1e308,
          '1e400',
          '-5M',
          '2.5G',
          '80 fs',
          1.5,
          [2, 1],
          [1, 2, 3],
          [1, 1],
          'divider',
          'synthesiser',
        )
        .map((value): Edit => ({ kind: 'set', value })),
      fc.constant<Edit>({ kind: 'drop' }),
      typo(String(path.at(-1) ?? 'name')).map((to): Edit => ({ kind: 'rename', to })),
      fc.tuple(fc.string({ maxLength: 12 }), fc.jsonValue({ maxDepth: 1 })).map(([key, value]): Edit => ({ kind: 'add', key, value })),
    ),
  }),
);

describe('loader fuzz', () => {
  it(
    'random JSON documents: a scenario or a ScenarioError, never anything else',
    () => {
      fc.assert(
        fc.property(fc.jsonValue({ maxDepth: 4 }), (document) => {
          const result = outcome(() => scenarioFromDocument(document, 'fuzz.json'));
          if (result.accepted) expect(jsonSchemaAccepts(scenarioJsonSchema(), document)).toBe(true);
        }),
        { numRuns: 4000 },
      );
    },
    FUZZ_TIMEOUT_MS,
  );

  it(
    'random edits of the demo base: accepted only what the JSON Schema accepts, each issue at a real place',
    () => {
      let refused = 0;
      let accepted = 0;
      fc.assert(
        fc.property(fc.array(baseEdit, { minLength: 1, maxLength: 3 }), (edits) => {
          const document = edits.reduce<unknown>((doc, { path, edit }) => edited(doc, path, edit), EDIT_BASE);
          const result = outcome(() => scenarioFromDocument(document, 'heron-base.json'));
          if (result.accepted) {
            accepted += 1;
            expect(jsonSchemaAccepts(scenarioJsonSchema(), document)).toBe(true);
            return;
          }
          refused += 1;
          for (const issue of result.error.issues) {
            expect(issue.file).toBe('heron-base.json');
            if (issue.kind === 'unknown-key') expect(issue.path).not.toBe('');
          }
        }),
        { numRuns: 4000 },
      );
      // Both sides exercised: many refusals, and enough acceptances for the schema comparison to mean something.
      expect(refused).toBeGreaterThan(1000);
      expect(accepted).toBeGreaterThan(100);
    },
    FUZZ_TIMEOUT_MS,
  );

  it('random damage to the text of a variant and its base: syntax errors carry a line and column', () => {
    const damage = fc.tuple(fc.nat(), fc.nat({ max: 3 }), fc.constantFrom('', ',', '}', '"', ':', '{', '[', 'x', '\n', '\\'));
    fc.assert(
      fc.property(damage, fc.boolean(), ([at, cut, insert], inBase) => {
        const variant = JSON.stringify({ extends: 'heron-base.json', name: 'Damaged', converter: { bits: 12 } }, null, 2);
        const target = inBase ? BASE_TEXT : variant;
        const i = at % (target.length + 1);
        const damaged = target.slice(0, i) + insert + target.slice(i + cut);
        const files = { 'd/v.json': inBase ? variant : damaged, 'd/heron-base.json': inBase ? damaged : BASE_TEXT };
        const result = outcome(() => resolveScenario('d/v.json', memoryFiles(files)));
        if (result.accepted) return;
        for (const issue of result.error.issues.filter((each) => each.kind === 'syntax')) {
          expect(issue.file).toBe(inBase ? 'd/heron-base.json' : 'd/v.json');
          const [line, column] = issue.path.split(':').map(Number);
          expect(line).toBeGreaterThanOrEqual(1);
          expect(column).toBeGreaterThanOrEqual(1);
          expect(line).toBeLessThanOrEqual(damaged.split('\n').length);
        }
      }),
      { numRuns: 2000 },
    );
  });

  it('random extends graphs: cycles and missing files refused with their chain', () => {
    const names = ['a.json', 'b.json', 'c.json', 'd.json'];
    const graph = fc.array(fc.option(fc.constantFrom(...names, 'gone.json', '../up.json'), { nil: undefined }), {
      minLength: 4,
      maxLength: 4,
    });
    fc.assert(
      fc.property(graph, fc.constantFrom(...names), (targets, start) => {
        const files: Record<string, unknown> = { 'up.json': BASE };
        names.forEach((name, i) => {
          files[`g/${name}`] = targets[i] === undefined ? BASE : { extends: targets[i], name: `Heron ${name}` };
        });
        const result = outcome(() => resolveScenario(`g/${start}`, memoryFiles(files)));
        if (result.accepted) return;
        const issue = result.error.issues[0]!;
        expect(['cycle', 'unreadable']).toContain(issue.kind);
        expect(issue.chain?.[0]).toBe(`g/${start}`);
        if (issue.kind === 'cycle') {
          const chain = issue.chain!;
          expect(chain.slice(0, -1)).toContain(chain.at(-1));
        }
      }),
      { numRuns: 2000 },
    );
  });
});
