import { readFileSync } from 'node:fs';
import { Command } from 'commander';
import fc from 'fast-check';
import { ScenarioError } from '../../src/scenario/scenario-issue.js';
import { describe, expect, it } from 'vitest';
import { addSchemaCommand } from '../../src/cli/commands/schema-command.js';
import { readScenarioFile } from '../../src/cli/read-scenario.js';
import { scenarioFromDocument } from '../../src/scenario/resolve-scenario.js';
import { scenarioJsonSchema } from '../../src/scenario/scenario-json-schema.js';
import { jsonSchemaAccepts } from './json-schema-check.js';
import { scenarioDocument } from './scenario-document.js';

/**
 * The JSON Schema printed by `ifzone schema`, the committed copy editors
 * read, and the round trip Scenario → file document → Scenario. The schema
 * is checked with the independent checker in json-schema-check.ts.
 */
const COMMITTED = new URL('../../scenarios/ifzone-scenario.schema.json', import.meta.url);

async function runSchemaCommand(): Promise<{ out: string; err: string; code: number | undefined }> {
  let out = '';
  let err = '';
  let code: number | undefined;
  const program = new Command('ifzone').exitOverride();
  addSchemaCommand(program, { out: (t) => (out += t), err: (t) => (err += t) }, (c) => (code = c));
  await program.parseAsync(['schema'], { from: 'user' });
  return { out, err, code };
}

describe('ifzone schema', () => {
  it('prints the committed scenarios/ifzone-scenario.schema.json byte for byte', async () => {
    const run = await runSchemaCommand();
    expect(run.code).toBe(0);
    expect(run.err).toBe('');
    // If this fails after a schema change: node bin/ifzone schema > scenarios/ifzone-scenario.schema.json
    expect(run.out).toBe(readFileSync(COMMITTED, 'utf8'));
  });

  it('is a draft 2020-12 schema that closes every object', () => {
    const schema = scenarioJsonSchema();
    expect(schema.$schema).toBe('https://json-schema.org/draft/2020-12/schema');
    const open: string[] = [];
    const visit = (node: unknown, where: string): void => {
      if (Array.isArray(node)) node.forEach((item, i) => visit(item, `${where}/${i}`));
      else if (typeof node === 'object' && node !== null) {
        const record = node as Record<string, unknown>;
        if (record.type === 'object' && record.additionalProperties !== false && record.propertyNames === undefined) open.push(where);
        for (const [key, value] of Object.entries(record)) visit(value, `${where}/${key}`);
      }
    };
    visit(schema, '#');
    expect(open).toEqual([]);
  });

  it('requires the core sections of a complete scenario but nothing of a variant', () => {
    const schema = scenarioJsonSchema() as { else: { required: string[] }; then: { required?: string[] } };
    expect(schema.else.required).toEqual(['name', 'wanted', 'converter', 'requirements']);
    expect(schema.then.required).toBeUndefined();
    expect(jsonSchemaAccepts(scenarioJsonSchema(), { extends: 'heron-base.json', converter: { bits: 12 } })).toBe(true);
    expect(jsonSchemaAccepts(scenarioJsonSchema(), { converter: { bits: 12 } })).toBe(false);
    expect(jsonSchemaAccepts(scenarioJsonSchema(), { extends: 'heron-base.json', converter: { bitz: 12 } })).toBe(false);
    // List entries replace, so a variant's must be complete.
    expect(jsonSchemaAccepts(scenarioJsonSchema(), { extends: 'b.json', clocks: [{ label: 'x' }] })).toBe(false);
  });

  it('holds the clock fields to their shapes, and a variant to none of the IF shift', () => {
    const complete = (fields: object) =>
      jsonSchemaAccepts(scenarioJsonSchema(), {
        name: 'n',
        wanted: { low: 1, high: 2, weakestLevel: -60 },
        converter: { label: 'c', minRate: 1, maxRate: 2, inputBandwidth: 3, bits: 8, harmonics: {}, clockDividers: [1, 2] },
        requirements: { margin: 0, rejection: 0 },
        ...fields,
      });
    const part = (fields: object) => complete({ clocks: [{ label: 'P', frequency: '10M', tolerance: 2, ...fields }] });
    expect(complete({})).toBe(true);
    expect(complete({ ifShift: { low: '-1M', high: '1M' } })).toBe(true);
    expect(complete({ ifShift: { low: '-1M' } })).toBe(false);
    expect(jsonSchemaAccepts(scenarioJsonSchema(), { extends: 'b.json', ifShift: { high: '1M' } })).toBe(true);
    expect(jsonSchemaAccepts(scenarioJsonSchema(), { extends: 'b.json', converter: { clockDividers: [1, 1] } })).toBe(false);
    expect(jsonSchemaAccepts(scenarioJsonSchema(), { extends: 'b.json', converter: { clockDividers: [0] } })).toBe(false);
    expect(part({ tolerance: { initial: 1, temperature: 2, ageing: 3 } })).toBe(true);
    expect(part({ tolerance: { initial: 1, temperature: 2 } })).toBe(false);
    expect(part({ derive: 'divider', jitter: '90 fs', note: 'x' })).toBe(true);
    expect(part({ derive: { kind: 'synthesiser', n: [1, 128], m: 4, d: [1, 8], vco: { low: '1G', high: '2G' } } })).toBe(true);
    expect(part({ derive: { kind: 'synthesiser', n: [1, 2, 3], m: 4 } })).toBe(false);
    expect(part({ derive: { kind: 'synthesiser', n: [0, 2], m: 4 } })).toBe(false);
    expect(part({ derive: { kind: 'synthesiser', n: 2 } })).toBe(false);
    expect(part({ derive: { kind: 'divider', n: 2 } })).toBe(false);
    expect(part({ rate: '10M' })).toBe(false);
  });

  it('holds a variant to one wanted-band form, with null clearing the base form', () => {
    const variant = (wanted: object) => jsonSchemaAccepts(scenarioJsonSchema(), { extends: 'b.json', wanted });
    expect(variant({ low: '1M', high: '2M', center: null, width: null })).toBe(true);
    expect(variant({ weakestLevel: -60 })).toBe(true);
    const complete = (wanted: object) =>
      jsonSchemaAccepts(scenarioJsonSchema(), {
        name: 'n',
        wanted: { weakestLevel: -60, ...wanted },
        converter: { label: 'c', minRate: 1, maxRate: 2, inputBandwidth: 3, bits: 8, harmonics: {} },
        requirements: { margin: 0, rejection: 0 },
      });
    expect(complete({ low: 1, high: 2 })).toBe(true);
    expect(complete({ center: 1, width: 2 })).toBe(true);
    expect(complete({ low: 1, high: 2, center: 1 })).toBe(false);
    expect(complete({ low: 1 })).toBe(false);
  });
});

/** A shift of k kHz as a person may write it: signed text with a prefix (ASCII or Unicode minus), or a number of hertz. */
const signedKilohertz = (k: number) =>
  k < 0
    ? fc.constantFrom<string | number>(k * 1e3, `-${-k}k`, `−${-k} kHz`, `- ${-k}k`)
    : fc.constantFrom<string | number>(k * 1e3, `${k}k`, `+${k}k`, `${k / 1000}M`);

/** An integer range written as one number or as a pair, with the range it must read as. */
const rangeArb = (most: number) =>
  fc
    .tuple(fc.integer({ min: 1, max: most }), fc.integer({ min: 0, max: most }))
    .chain(([min, extra]) =>
      fc.constantFrom<{ written: number | [number, number]; range: { min: number; max: number } }>(
        { written: [min, min + extra], range: { min, max: min + extra } },
        ...(extra === 0 ? [{ written: min, range: { min, max: min } }] : []),
      ),
    );

/** A clock part's fields as written (all but label and frequency), with what the loader must make of them. */
const partArb = fc
  .record({
    mhz: fc.integer({ min: 1, max: 4000 }).map((n) => n / 4),
    tolerance: fc.oneof(
      fc.integer({ min: 0, max: 100 }),
      fc.record({
        initial: fc.integer({ min: 0, max: 50 }),
        temperature: fc.integer({ min: 0, max: 50 }),
        ageing: fc.integer({ min: 0, max: 20 }),
      }),
    ),
    jitterFs: fc.option(fc.integer({ min: 0, max: 2000 }), { nil: null }),
    note: fc.option(fc.string({ maxLength: 20 }), { nil: undefined }),
    derive: fc.oneof(
      fc.constantFrom('direct', 'divider', undefined).map((word) => ({ written: word, derivation: { kind: word ?? 'direct' } })),
      fc.constantFrom('direct', 'divider').map((kind) => ({ written: { kind }, derivation: { kind } })),
      fc
        .record({
          n: rangeArb(512),
          m: rangeArb(16),
          d: fc.option(rangeArb(8), { nil: undefined }),
          vco: fc.option(fc.tuple(fc.integer({ min: 1, max: 3000 }), fc.integer({ min: 1, max: 1000 })), { nil: undefined }),
        })
        .map(({ n, m, d, vco }) => ({
          written: {
            kind: 'synthesiser',
            n: n.written,
            m: m.written,
            ...(d ? { d: d.written } : {}),
            ...(vco ? { vco: { low: `${vco[0]}M`, high: `${vco[0] + vco[1]}M` } } : {}),
          },
          derivation: {
            kind: 'synthesiser',
            n: n.range,
            m: m.range,
            d: d?.range ?? { min: 1, max: 1 },
            vco: vco ? { low: vco[0] * 1e6, high: (vco[0] + vco[1]) * 1e6 } : null,
          },
        })),
    ),
  })
  .map(({ mhz, tolerance, jitterFs, note, derive }) => ({
    mhz,
    written: {
      tolerance,
      ...(jitterFs === null ? {} : { jitter: `${jitterFs} fs` }),
      ...(note === undefined ? {} : { note }),
      ...(derive.written === undefined ? {} : { derive: derive.written }),
    },
    expected: {
      tolerancePpm: typeof tolerance === 'number' ? tolerance : tolerance.initial + tolerance.temperature + tolerance.ageing,
      toleranceBreakdown: typeof tolerance === 'number' ? null : tolerance,
      jitterFs,
      derivation: derive.derivation,
    },
  }));

describe('round trip', () => {
  it.each(['heron-base.json', 'heron-narrow.json', 'heron-wide.json', 'heron-lowif.json'])(
    '%s → document in Hz → the same scenario',
    (name) => {
      const scenario = readScenarioFile(new URL(`../../scenarios/${name}`, import.meta.url).pathname);
      const document = scenarioDocument(scenario);
      expect(jsonSchemaAccepts(scenarioJsonSchema(), document)).toBe(true);
      expect(scenarioFromDocument(JSON.parse(JSON.stringify(document)), name)).toEqual(scenario);
    },
  );

  it('holds for random valid scenarios written with prefixes, percentages and times', () => {
    const mhz = fc.integer({ min: 1, max: 4000 }).map((n) => n / 4); // 0.25 MHz steps
    const written = (value: number) => fc.constantFrom(value * 1e6, `${value}M`, `${value} MHz`, `${value * 1000}k`);
    const level = fc.integer({ min: -120, max: -1 });
    const scenarioArb = fc
      .record({
        low: mhz,
        width: mhz,
        rateLow: fc.integer({ min: 1, max: 100 }),
        rateSpan: fc.integer({ min: 0, max: 400 }),
        bits: fc.integer({ min: 1, max: 32 }),
        harmonics: fc.dictionary(fc.integer({ min: 2, max: 15 }).map(String), level, { maxKeys: 5 }),
        guardPercent: fc.integer({ min: 0, max: 50 }),
        jitterFs: fc.integer({ min: 0, max: 1000 }),
        spurs: fc.array(fc.record({ f: mhz, level, harmonics: fc.integer({ min: 1, max: 20 }), before: fc.boolean() }), { maxLength: 4 }),
        order: fc.integer({ min: 1, max: 20 }),
        goal: fc.constantFrom<unknown>('widest-margin', 'lowest-rate', 'quarter-rate', { kind: 'decimation', outputRate: '30.72M' }),
        dividers: fc.option(fc.uniqueArray(fc.integer({ min: 1, max: 64 }), { minLength: 1, maxLength: 5 }), { nil: undefined }),
        parts: fc.array(partArb, { maxLength: 4 }),
        shift: fc.option(fc.tuple(fc.integer({ min: -250, max: 250 }), fc.integer({ min: -250, max: 250 })), { nil: undefined }),
      })
      .chain((r) =>
        fc.record({
          r: fc.constant(r),
          lowText: written(r.low),
          highText: written(r.low + r.width),
          spurTexts: fc.tuple(...r.spurs.map((s) => written(s.f))),
          partTexts: fc.tuple(...r.parts.map((part) => written(part.mhz))),
          shiftTexts: r.shift ? fc.tuple(...[Math.min(...r.shift), Math.max(...r.shift)].map(signedKilohertz)) : fc.constant(undefined),
        }),
      );
    fc.assert(
      fc.property(scenarioArb, ({ r, lowText, highText, spurTexts, partTexts, shiftTexts }) => {
        const document = {
          name: 'Heron fuzz',
          wanted: { low: lowText, high: highText, weakestLevel: -80 },
          guard: `${r.guardPercent}%`,
          converter: {
            label: 'SR-fuzz',
            minRate: `${r.rateLow}M`,
            maxRate: `${r.rateLow + r.rateSpan}M`,
            inputBandwidth: '2.1G',
            bits: r.bits,
            harmonics: r.harmonics,
            apertureJitter: `${r.jitterFs} fs`,
          },
          boardSpurs: r.spurs.map((s, i) => ({
            label: `spur ${i}`,
            frequency: spurTexts[i],
            level: s.level,
            harmonics: s.harmonics,
            coupling: s.before ? 'before-filter' : 'after-filter',
          })),
          filter: { kind: 'butterworth', order: r.order, passLow: lowText, passHigh: `${r.low + r.width + 1}M` },
          requirements: { margin: '100k', rejection: 6 },
          goal: r.goal,
          clocks: r.parts.map((part, i) => ({ label: `part ${i}`, frequency: partTexts[i], ...part.written })),
          ...(shiftTexts ? { ifShift: { low: shiftTexts[0], high: shiftTexts[1] } } : {}),
        };
        if (r.dividers) (document.converter as Record<string, unknown>).clockDividers = r.dividers;
        // A document whose plan would be too much work is refused as a whole (work-bounds.ts, tested on its own): skip it here.
        fc.pre(!tooMuchWork(() => scenarioFromDocument(document, 'fuzz.json')));
        const scenario = scenarioFromDocument(document, 'fuzz.json');
        expect(scenario.converter.clockDividers).toEqual(r.dividers ? [...r.dividers].sort((a, b) => a - b) : [1]);
        expect(scenario.clocks).toHaveLength(r.parts.length);
        scenario.clocks.forEach((part, i) => {
          const { expected, mhz } = r.parts[i]!;
          expect(part.frequency).toBeCloseTo(mhz * 1e6, 3);
          expect(part.tolerancePpm).toBe(expected.tolerancePpm);
          expect(part.toleranceBreakdown).toEqual(expected.toleranceBreakdown);
          expect(part.derivation).toEqual(expected.derivation);
          if (expected.jitterFs === null) expect(part.jitter).toBeNull();
          else expect(part.jitter).toBeCloseTo(expected.jitterFs * 1e-15, 27);
        });
        if (r.shift) expect(scenario.ifShift).toEqual({ low: Math.min(...r.shift) * 1e3, high: Math.max(...r.shift) * 1e3 });
        else expect(scenario.ifShift).toBeNull();
        expect(scenario.wanted.low).toBeCloseTo(r.low * 1e6, 3);
        expect(scenario.guard.low).toBeCloseTo((r.guardPercent / 100) * r.width * 1e6, 3);
        expect(scenario.converter.apertureJitter).toBeCloseTo(r.jitterFs * 1e-15, 27);
        expect(jsonSchemaAccepts(scenarioJsonSchema(), document)).toBe(true);
        const again = scenarioFromDocument(JSON.parse(JSON.stringify(scenarioDocument(scenario))), 'again.json');
        expect(again).toEqual(scenario);
      }),
      { numRuns: 500 },
    );
  });
});

/** Whether loading refuses the document for the work its plan would take, and for nothing else. */
function tooMuchWork(load: () => unknown): boolean {
  try {
    load();
    return false;
  } catch (error) {
    if (!(error instanceof ScenarioError)) throw error;
    return error.issues.every((issue) => /images of the wanted band|windows for the band/.test(issue.expected));
  }
}
