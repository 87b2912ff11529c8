import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { butterworthAttenuation, butterworthLeastAttenuation } from '../../src/filter/butterworth-attenuation.js';
import { hz } from '../../src/units/quantities.js';
import { ifzone, scratchDirectory, writeInto } from '../helpers/run-in-process.js';

/**
 * The low-pass (passLow 0) and high-pass (no passHigh) limits of the
 * Butterworth band-pass, against the Butterworth magnitudes themselves
 * (filter design handbooks, e.g. Williams & Taylor, Electronic Filter Design
 * Handbook; from memory): low-pass |H|² = 1/(1 + (f/fc)^(2N)), high-pass
 * |H|² = 1/(1 + (fc/f)^(2N)). Before, passLow 0 ended every command in
 * "internal error: Butterworth passband needs 0 < passLow < passHigh".
 */
const lowPass = (order: number, cutoff: number) => ({ order, passLow: hz(0), passHigh: hz(cutoff) });
const highPass = (order: number, cutoff: number) => ({ order, passLow: hz(cutoff), passHigh: hz(Infinity) });
const magnitudeDb = (ratio: number, order: number) => 10 * Math.log10(1 + ratio ** (2 * order));

describe('Butterworth low-pass and high-pass', () => {
  it.each([0, 0.5, 1, 2, 3.7, 10])('low-pass of order 5 at %f × fc', (ratio) => {
    expect(butterworthAttenuation(lowPass(5, 100e6), hz(ratio * 100e6))).toBeCloseTo(magnitudeDb(ratio, 5), 9);
  });

  it.each([0.1, 0.5, 1, 2, 10])('high-pass of order 3 at %f × fc', (ratio) => {
    expect(butterworthAttenuation(highPass(3, 10e6), hz(ratio * 10e6))).toBeCloseTo(magnitudeDb(1 / ratio, 3), 9);
  });

  it('3.0103 dB at the cut-off, 30.10 dB an octave past it at order 5 (10·log10 1025)', () => {
    expect(butterworthAttenuation(lowPass(5, 1e6), hz(1e6))).toBeCloseTo(3.0103, 4);
    expect(butterworthAttenuation(lowPass(5, 1e6), hz(2e6))).toBeCloseTo(30.1072, 4);
    expect(butterworthAttenuation(highPass(5, 2e6), hz(1e6))).toBeCloseTo(30.1072, 4);
  });

  it('least attenuation over an extent: its lower end for a low-pass, its upper end for a high-pass, 0 dB at DC for a low-pass', () => {
    expect(butterworthLeastAttenuation(lowPass(4, 1e6), hz(2e6), hz(3e6))).toBeCloseTo(magnitudeDb(2, 4), 9);
    expect(butterworthLeastAttenuation(lowPass(4, 1e6), hz(0), hz(3e6))).toBe(0);
    expect(butterworthLeastAttenuation(lowPass(4, 1e6), hz(-3e6), hz(-2e6))).toBeCloseTo(magnitudeDb(2, 4), 9);
    expect(butterworthLeastAttenuation(highPass(4, 4e6), hz(1e6), hz(2e6))).toBeCloseTo(magnitudeDb(2, 4), 9);
    expect(butterworthAttenuation(highPass(4, 4e6), hz(0))).toBe(300);
  });
});

describe('a low-pass or high-pass scenario through every command', () => {
  const dir = scratchDirectory('low-pass');
  const base = JSON.parse(readFileSync(new URL('../../scenarios/heron-base.json', import.meta.url), 'utf8')) as Record<string, unknown>;
  const filters = {
    'low-pass': { kind: 'butterworth', order: 5, passLow: 0, passHigh: '160M' },
    'high-pass': { kind: 'butterworth', order: 5, passLow: '120M' },
    'band-pass above the input bandwidth': { kind: 'butterworth', order: 5, passLow: '120M', passHigh: '2G' },
  };

  it.each(Object.entries(filters))('%s: solve, compare, report and verify answer (exit 0 or 1)', async (name, filter) => {
    const file = writeInto(dir, `${name.replace(/\W+/g, '-')}.json`, { ...base, $schema: undefined, filter });
    for (const args of [
      ['solve', file],
      ['compare', file],
      ['report', file, '--html', `${file}.html`],
      ['verify', file, '--rate', '184.32M', '--samples', '8192'],
    ]) {
      const run = await ifzone(...args);
      expect(run.err).toBe('');
      expect([0, 1]).toContain(run.code);
    }
  });

  it('refuses passLow 0 with no passHigh (it would pass everything), naming the field', async () => {
    const file = writeInto(dir, 'all-pass.json', { ...base, $schema: undefined, filter: { kind: 'butterworth', order: 5, passLow: 0 } });
    const run = await ifzone('solve', file);
    expect(run.code).toBe(2);
    expect(run.err).toContain(`${file}: filter.passLow: expected a frequency above 0 for a high-pass`);
  });
});
