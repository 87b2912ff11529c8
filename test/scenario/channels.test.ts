import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { resolveScenario } from '../../src/scenario/resolve-scenario.js';
import { scenarioJsonSchema } from '../../src/scenario/scenario-json-schema.js';
import { ScenarioError } from '../../src/scenario/scenario-issue.js';
import { channelView } from '../../src/scenario/channel-view.js';
import { memoryFiles } from './memory-files.js';
import { jsonSchemaAccepts } from './json-schema-check.js';

/**
 * The `wanted` list of channels: how a file is read (labels, per-channel
 * guards and requirements, `extends`), what is refused with the path, and the
 * JSON Schema of both forms (checked by the schema checker written in this
 * folder, independent of zod). The frequencies are invented plumbing values.
 */

const root = join(import.meta.dirname, '..', '..');
const base = JSON.parse(readFileSync(join(root, 'scenarios', 'heron-base.json'), 'utf8')) as Record<string, unknown>;
const TWO = [
  { label: 'A', center: '140M', width: '20M', weakestLevel: -70, strongestLevel: -20 },
  { label: 'B', low: '30M', high: '40M', weakestLevel: -75, strongestLevel: -18, guard: '10%', requirements: { margin: '2M' } },
];

function read(variant: Record<string, unknown>) {
  return resolveScenario('v.json', memoryFiles({ 'v.json': { extends: 'base.json', ...variant }, 'base.json': base }));
}

function issuesOf(variant: Record<string, unknown>) {
  try {
    read(variant);
  } catch (error) {
    if (error instanceof ScenarioError) return error.issues.map((i) => `${i.path}: ${i.expected}`);
    throw error;
  }
  throw new Error('accepted');
}

const wide = { kind: 'butterworth', order: 5, passLow: '20M', passHigh: '160M' };

describe('a wanted list of channels', () => {
  it('gives one channel per entry, the first also as wanted, guard and requirements', () => {
    const s = read({ name: 'two', wanted: TWO, filter: wide, requirements: { channelSpacing: '3M' } });
    expect(s.channels.map((c) => c.label)).toEqual(['A', 'B']);
    expect(s.wanted).toEqual({ low: 130e6, high: 150e6, weakestLevel: -70, strongestLevel: -20 });
    // A keeps the scenario's guard (heron-base: 2 MHz); B's 10 % is of its own 10 MHz width.
    expect([s.channels[0]!.guard.low, s.channels[0]!.guard.high]).toEqual([2e6, 2e6]);
    expect([s.channels[1]!.guard.low, s.channels[1]!.guard.high]).toEqual([1e6, 1e6]);
    // Requirements: the scenario's (heron-base margin 1 MHz, rejection 10 dB, 50 ppm), B's margin replaced.
    expect(s.channels[0]!.requirements).toEqual({ margin: 1e6, rejection: 10, tolerancePpm: 50, channelSpacing: 3e6 });
    expect(s.channels[1]!.requirements).toEqual({ margin: 2e6, rejection: 10, tolerancePpm: 50, channelSpacing: 3e6 });
    expect(s.requirements).toBe(s.channels[0]!.requirements);
  });

  it('keeps the single-object form as one channel labelled "wanted"', () => {
    const s = read({ name: 'one' });
    expect(s.channels).toHaveLength(1);
    expect(s.channels[0]).toMatchObject({ label: 'wanted', low: 130e6, high: 150e6 });
    expect(channelView(s, 0)).toBe(s);
  });

  it('sees the scenario from each channel (its band, guard and requirements)', () => {
    const s = read({ name: 'two', wanted: TWO, filter: wide });
    const b = channelView(s, 1);
    expect(b.wanted).toEqual({ low: 30e6, high: 40e6, weakestLevel: -75, strongestLevel: -18 });
    expect(b.requirements.margin).toBe(2e6);
    expect(b.channels).toBe(s.channels);
  });

  it('replaces a base list whole under extends, and an object replaces a list', () => {
    const files = memoryFiles({
      'base2.json': { ...base, wanted: TWO, filter: wide },
      'list.json': { extends: 'base2.json', name: 'one in a list', wanted: [TWO[1]] },
      'object.json': { extends: 'base2.json', name: 'object again', wanted: { center: '35M', width: '4M', weakestLevel: -60 } },
    });
    const list = resolveScenario('list.json', files);
    expect(list.channels.map((c) => c.label)).toEqual(['B']);
    const object = resolveScenario('object.json', files);
    expect(object.channels.map((c) => c.label)).toEqual(['wanted']);
    expect(object.wanted).toEqual({ low: 33e6, high: 37e6, weakestLevel: -60, strongestLevel: -1 });
  });

  it('names the path of every refusal', () => {
    expect(issuesOf({ name: 'x', filter: wide, wanted: [TWO[0], { label: 'C', low: '30M', weakestLevel: -70 }] })).toEqual([
      'wanted[1].high: a frequency (with low)',
    ]);
    expect(issuesOf({ name: 'x', wanted: [] })).toEqual(['wanted: a list of at least one channel']);
    const many = Array.from({ length: 17 }, (_, i) => ({
      label: `C${i}`,
      low: 130e6 + i * 1e6,
      high: 130.5e6 + i * 1e6,
      weakestLevel: -60,
    }));
    expect(issuesOf({ name: 'x', filter: null, wanted: many })).toEqual(['wanted: a list of at most 16 channels']);
    expect(issuesOf({ name: 'x', wanted: 'L1' })).toEqual([
      'wanted: the wanted band as an object, or a list of channels each with a label',
    ]);
    expect(issuesOf({ name: 'x', filter: wide, wanted: [TWO[0], { ...TWO[1], label: 'A' }] })).toEqual([
      'wanted[1].label: a label not used elsewhere (wanted[0].label is already "A")',
    ]);
    expect(issuesOf({ name: 'x', filter: wide, wanted: [TWO[0], { ...TWO[1], label: 'Paging blocker 175M' }] })).toEqual([
      'neighbours[1].label: a label not used elsewhere (wanted[1].label is already "Paging blocker 175M")',
    ]);
    expect(issuesOf({ name: 'x', filter: wide, wanted: [{ ...TWO[0], requirements: { margn: 1 } }] })).toEqual([
      'wanted[0].requirements.margn: one of the keys margin, rejection, kindMargins, channelSpacing',
    ]);
  });

  it('refuses a channel outside the filter pass band or the converter input bandwidth', () => {
    // heron-base's filter passes 128–152 MHz; B at 30–40 MHz lies below it.
    expect(issuesOf({ name: 'x', wanted: TWO })).toEqual([
      "wanted[1].low: a channel inside the filter's pass band (filter.passLow 128 MHz)",
    ]);
    expect(issuesOf({ name: 'x', filter: null, wanted: [TWO[0], { ...TWO[1], low: '640M', high: '660M' }] })).toEqual([
      "wanted[1].high: a channel at or below the converter's input bandwidth (converter.inputBandwidth 650 MHz)",
    ]);
    expect(issuesOf({ name: 'x', filter: wide, wanted: TWO, ifShift: { low: '-1M', high: '1M' } })).toEqual([
      'ifShift: no IF shift with a list of channels (the shift search plans one wanted band; give wanted as one object to use it)',
    ]);
  });

  it('is described by the JSON Schema in both forms', () => {
    const schema = scenarioJsonSchema();
    const whole = { ...base, $schema: undefined };
    delete whole.$schema;
    expect(jsonSchemaAccepts(schema, whole)).toBe(true);
    expect(jsonSchemaAccepts(schema, { ...whole, wanted: TWO, filter: wide })).toBe(true);
    expect(jsonSchemaAccepts(schema, { ...whole, wanted: [] })).toBe(false);
    expect(jsonSchemaAccepts(schema, { ...whole, wanted: [{ center: '35M', width: '4M', weakestLevel: -60 }] })).toBe(false); // no label
    expect(jsonSchemaAccepts(schema, { ...whole, wanted: [{ ...TWO[0], colour: 'red' }] })).toBe(false);
    // A variant's list entries stay complete (a list replaces its base's).
    expect(jsonSchemaAccepts(schema, { extends: 'b.json', wanted: [{ label: 'A' }] })).toBe(false);
    expect(jsonSchemaAccepts(schema, { extends: 'b.json', wanted: TWO })).toBe(true);
  });
});
