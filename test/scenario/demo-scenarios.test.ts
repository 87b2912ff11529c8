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
    const variants = demoFiles.filter(
      (name) => (JSON.parse(readFileSync(path(name), 'utf8')) as { extends?: string }).extends === 'heron-base.json',
    );
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
    expect(base.boardSpurs.find((s) => s.label === 'LO-1 leakage')).toMatchObject({
      low: 760e6,
      high: 760e6,
      coupling: 'before-filter',
      harmonics: 1,
    });
    expect(base.neighbours.find((n) => n.label === 'Paging blocker 175M')).toMatchObject({ low: 174.5e6, high: 175.5e6 });
    expect(base.converter.clockDividers).toEqual([1, 2, 4]);
    expect(base.clocks.map((c) => c.frequency)).toEqual([122.88e6, 153.6e6, 184.32e6, 245.76e6, 61.44e6, 491.52e6, 10e6]);
    expect(base.goal).toEqual({ kind: 'widest-margin' });
    expect(base.ifShift).toBeNull();
  });

  it('gives the base a catalogue of direct, divided and synthesised parts', () => {
    const base = readScenarioFile(path('heron-base.json'));
    const byLabel = new Map(base.clocks.map((part) => [part.label, part]));
    expect(base.clocks.map((part) => part.derivation.kind)).toEqual([
      'direct',
      'direct',
      'direct',
      'direct',
      'direct',
      'divider',
      'synthesiser',
    ]);
    expect(byLabel.get('XO-A 122.88M')).toMatchObject({ tolerancePpm: 20, toleranceBreakdown: null, jitter: 120e-15 });
    // 3 + 5 + 2 ppm, listed separately.
    expect(byLabel.get('VCXO-C 184.32M')).toMatchObject({
      tolerancePpm: 10,
      toleranceBreakdown: { initial: 3, temperature: 5, ageing: 2 },
      jitter: 70e-15,
    });
    expect(byLabel.get('SYN-1 from TCXO-R 10M')?.derivation).toEqual({
      kind: 'synthesiser',
      n: { min: 1, max: 512 },
      m: { min: 1, max: 16 },
      d: { min: 1, max: 8 },
      vco: { low: 800e6, high: 1.6e9 },
    });
    for (const part of base.clocks) expect(part.note, part.label).not.toBe('');
  });

  it('lets every variant choose from the base catalogue, so one part can be sought for the whole family', () => {
    const base = readScenarioFile(path('heron-base.json'));
    for (const name of demoFiles) expect(readScenarioFile(path(name)).clocks, name).toEqual(base.clocks);
  });

  it('gives every fixed rate of the base catalogue a window of its guarded band (Vaughan et al. 1991)', () => {
    // Guarded band 128–152 MHz: n = 2 allows 152–256 MHz, n = 3 allows 101.33–128 MHz, n = 5 allows 60.8–64 MHz.
    const base = readScenarioFile(path('heron-base.json'));
    const fL = base.wanted.low - base.guard.low;
    const fH = base.wanted.high + base.guard.high;
    const inSomeZone = (fs: number) =>
      Array.from({ length: Math.floor(fH / (fH - fL)) }, (_, i) => i + 1).some(
        (n) => (2 * fH) / n <= fs && (n === 1 || fs <= (2 * fL) / (n - 1)),
      );
    const { minRate, maxRate, clockDividers } = base.converter;
    for (const part of base.clocks) {
      if (part.derivation.kind === 'direct') expect(inSomeZone(part.frequency), part.label).toBe(true);
      if (part.derivation.kind !== 'divider') continue;
      // XO-G 491.52M is above the converter's 250 MS/s undivided; /2 (245.76 MHz, n = 2) and /4 (122.88 MHz, n = 3) remain.
      const usable = clockDividers.filter((D) => part.frequency / D >= minRate && part.frequency / D <= maxRate);
      expect(usable, part.label).toEqual([2, 4]);
      for (const D of usable) expect(inSomeZone(part.frequency / D), `${part.label} / ${D}`).toBe(true);
    }
  });

  it('lets the synthesiser lock inside its VCO range at rates the converter takes', () => {
    const base = readScenarioFile(path('heron-base.json'));
    const part = base.clocks.find((p) => p.derivation.kind === 'synthesiser')!;
    const d = part.derivation as Extract<typeof part.derivation, { kind: 'synthesiser' }>;
    const rates: number[] = [];
    for (let N = d.n.min; N <= d.n.max; N += 1) {
      for (let M = d.m.min; M <= d.m.max; M += 1) {
        const vco = (part.frequency * N) / M;
        if (d.vco && (vco < d.vco.low || vco > d.vco.high)) continue;
        for (let D = d.d.min; D <= d.d.max; D += 1)
          if (vco / D >= base.converter.minRate && vco / D <= base.converter.maxRate) rates.push(vco / D);
      }
    }
    // VCO 0.8–1.6 GHz: D = 4..8 give 100–400 MHz, of which 100–250 MHz is inside the SR-QC14's limits (D ≤ 3 gives ≥ 266.7 MHz).
    expect(Math.min(...rates)).toBe(100e6);
    expect(Math.max(...rates)).toBe(250e6);
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
