import { readdirSync, readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { readScenarioFile } from '../../src/cli/read-scenario.js';
import { scenarioJsonSchema } from '../../src/scenario/scenario-json-schema.js';
import { jsonSchemaAccepts } from './json-schema-check.js';

/**
 * The demo family (invented: Saltmarsh Radio's Heron line). Every file loads;
 * the values checked are the files' own, re-derived by hand from what they
 * write (centre ± width/2, percentage guards), and the windows facts from
 * Vaughan, Scott & White 1991 (2·fH/n ≤ fs ≤ 2·fL/(n − 1)).
 */
const DIR = new URL('../../scenarios/', import.meta.url);
const demoFiles = readdirSync(DIR).filter((name) => name.startsWith('heron-') && name.endsWith('.json'));
const path = (name: string) => new URL(name, DIR).pathname;

describe('demo scenarios', () => {
  it('has a base and at least three variants extending it', () => {
    expect(demoFiles).toContain('heron-base.json');
    const variants = demoFiles.filter((name) => (JSON.parse(readFileSync(path(name), 'utf8')) as { extends?: string }).extends === 'heron-base.json');
    expect(variants.length).toBeGreaterThanOrEqual(3);
  });

  it.each(demoFiles)('%s loads, points at the committed schema and passes the JSON Schema', (name) => {
    const scenario = readScenarioFile(path(name));
    expect(scenario.name).toMatch(/^Heron/);
    const document = JSON.parse(readFileSync(path(name), 'utf8')) as Record<string, unknown>;
    expect(document.$schema).toBe('./ifzone-scenario.schema.json');
    expect(jsonSchemaAccepts(scenarioJsonSchema(), document)).toBe(true);
  });

  it('reads the base in Hz with its defaults', () => {
    const base = readScenarioFile(path('heron-base.json'));
    expect(base.wanted).toEqual({ low: 130e6, high: 150e6, weakestLevel: -70, strongestLevel: -1 });
    expect(base.guard).toEqual({ low: 2e6, high: 2e6 });
    expect(base.converter.bits).toBe(14);
    expect([...base.converter.harmonics]).toEqual([
      [2, -75],
      [3, -80],
      [4, -88],
      [5, -90],
    ]);
    expect(base.converter.apertureJitter).toBe(80e-15);
    expect(base.converter.interleave).toBeNull();
    expect(base.boardSpurs.find((s) => s.label === 'LO-1 leakage')).toMatchObject({ low: 760e6, high: 760e6, coupling: 'before-filter', harmonics: 1 });
    expect(base.neighbours.find((n) => n.label === 'Paging blocker 175M')).toMatchObject({ low: 174.5e6, high: 175.5e6 });
    expect(base.clocks.map((c) => c.rate)).toEqual([122.88e6, 153.6e6, 184.32e6, 245.76e6]);
    expect(base.goal).toEqual({ kind: 'widest-margin' });
  });

  it('gives every base clock a window of its guarded band (Vaughan et al. 1991)', () => {
    // Guarded band 128–152 MHz: n = 2 allows 152–256 MHz, n = 3 allows 101.33–128 MHz.
    const base = readScenarioFile(path('heron-base.json'));
    const fL = base.wanted.low - base.guard.low;
    const fH = base.wanted.high + base.guard.high;
    const inSomeZone = (fs: number) =>
      Array.from({ length: Math.floor(fH / (fH - fL)) }, (_, i) => i + 1).some((n) => 2 * fH / n <= fs && (n === 1 || fs <= (2 * fL) / (n - 1)));
    for (const clock of base.clocks) expect(inSomeZone(clock.rate), clock.label).toBe(true);
  });

  it('narrows the channel and takes the guard as 20 % of its width', () => {
    const narrow = readScenarioFile(path('heron-narrow.json'));
    expect(narrow.wanted).toMatchObject({ low: 137.5e6, high: 142.5e6, weakestLevel: -76, strongestLevel: -1 });
    expect(narrow.guard.low).toBeCloseTo(1e6, 6);
    expect(narrow.requirements).toEqual({ margin: 500e3, rejection: 10, tolerancePpm: 50 });
    expect(narrow.converter.label).toBe('SR-QC14 250M');
    expect(narrow.neighbours).toHaveLength(3);
  });

  it('moves the wide variant to 184.32 MHz, 40 MHz wide', () => {
    const wide = readScenarioFile(path('heron-wide.json'));
    expect(wide.wanted.low).toBeCloseTo(164.32e6, 3);
    expect(wide.wanted.high).toBeCloseTo(204.32e6, 3);
    expect(wide.filter).toEqual({ kind: 'butterworth', order: 5, passLow: 161.32e6, passHigh: 207.32e6 });
  });

  it('gives the low-IF variant its own converter, merged key by key over the base', () => {
    const lowIf = readScenarioFile(path('heron-lowif.json'));
    expect(lowIf.converter).toMatchObject({ label: 'SR-DC12 125M dual-core', minRate: 40e6, maxRate: 125e6, bits: 12 });
    expect(lowIf.converter.interleave).toEqual({ ways: 2, offsetSpur: -78, imageLevel: -72 });
    expect(lowIf.converter.rateSpurs).toEqual({ dc: -68, halfRate: -84, quarterRate: null });
    expect(lowIf.converter.apertureJitter).toBe(0.15e-12);
    expect(lowIf.boardSpurs.map((s) => s.label)).toContain('LO-2 leakage');
    expect(lowIf.boardSpurs.map((s) => s.label)).not.toContain('LO-1 leakage');
  });
});
