import { describe, expect, it } from 'vitest';
import FFT from 'fft.js';
import { db, hz } from '../../src/units/quantities.js';
import { deriveInterferers } from '../../src/interferers/derive-interferers.js';
import type { Interleave } from '../../src/scenario/scenario.js';
import { converterFixture, scenarioFixture } from '../helpers/scenario-fixture.js';

/**
 * Interleaving images of a blocker against a time-domain simulation of M
 * interleaved cores written here (fft.js, a general-purpose FFT from the npm
 * registry): core m takes the samples n ≡ m (mod M) with its own gain, or at
 * its own instant. A record of N = 4096 samples at R = 4096 Hz puts bin k at
 * k Hz, and every k·R/M ± f on a whole bin (4 divides N), so a rectangular
 * window leaks nothing and a cosine of amplitude A reads 2·|X[k]|/N.
 *
 * The mismatch is the one-core-off pattern: core 0 off by (M − 1)·ε, the
 * others by −ε. Its discrete Fourier series (1/M)·Σ g_m·e^(−2πikm/M) is ε
 * for every k = 1..M−1 (common practice, no source; checked numerically
 * below), so every image sits ε below its source: 20·log10(ε) dBc. For the
 * timing case ε = 2π·f·t at the input frequency f.
 */
const N = 4096;
const R = 4096;
const M = 4;
const BLOCKER_BIN = 1100; // 1100 Hz; images at k·1024 ± 1100
const BLOCKER_LEVEL = -6;

function levels(samples: number[]): (bin: number) => number {
  const fft = new FFT(N);
  const out = fft.createComplexArray() as number[];
  fft.realTransform(out, samples);
  return (bin) => 20 * Math.log10((2 * Math.hypot(out[2 * bin]!, out[2 * bin + 1]!)) / N);
}

const alias = (f: number) => Math.abs(f - R * Math.round(f / R));

/** The plan's images of the blocker: label, bin and level at R. */
function plannedImages(interleave: Interleave) {
  const scenario = scenarioFixture({
    wanted: { low: hz(300), high: hz(400), weakestLevel: db(-60), strongestLevel: db(-1) },
    converter: converterFixture({ minRate: hz(1000), maxRate: hz(10000), harmonics: new Map(), interleave }),
    neighbours: [{ label: 'BLK', low: hz(BLOCKER_BIN), high: hz(BLOCKER_BIN), level: db(BLOCKER_LEVEL) }],
    requirements: { ...scenarioFixture().requirements, margin: hz(10) },
  });
  return deriveInterferers(scenario)
    .filter((i) => i.label.startsWith('IL image') && i.label.endsWith('BLK'))
    .map((i) => ({ label: i.label, bin: alias(i.rateMultiple * R + i.low), level: i.level }));
}

describe('interleaving images of a blocker: M cores with a mismatch, simulated in time (fft.js)', () => {
  it('the one-core-off pattern has the same Fourier coefficient ε at every k = 1..M−1 and none at k = 0', () => {
    const epsilon = 1e-3;
    const g = Array.from({ length: M }, (_, m) => (m === 0 ? (M - 1) * epsilon : -epsilon));
    for (let k = 0; k < M; k++) {
      const re = g.reduce((sum, gm, m) => sum + gm * Math.cos((2 * Math.PI * k * m) / M), 0) / M;
      const im = g.reduce((sum, gm, m) => sum - gm * Math.sin((2 * Math.PI * k * m) / M), 0) / M;
      expect(Math.hypot(re, im)).toBeCloseTo(k === 0 ? 0 : epsilon, 15);
    }
  });

  it('gain mismatch: every image k·R/M ± f of the blocker is where and as strong as the plan lists it (imageLevel −50 dBc)', () => {
    const epsilon = 10 ** (-50 / 20);
    const amplitude = 10 ** (BLOCKER_LEVEL / 20);
    const samples = Array.from(
      { length: N },
      (_, n) => (1 + (n % M === 0 ? (M - 1) * epsilon : -epsilon)) * amplitude * Math.cos((2 * Math.PI * BLOCKER_BIN * n) / N + 0.3),
    );
    const measured = levels(samples);
    const planned = plannedImages({ ways: M, offsetSpur: db(-120), imageLevel: db(-50) });
    expect(planned).toHaveLength(2 * (M - 1));
    for (const image of planned) {
      expect(image.level).toBeCloseTo(BLOCKER_LEVEL - 50, 9);
      expect(measured(image.bin), image.label).toBeGreaterThan(image.level - 0.01);
      expect(measured(image.bin), image.label).toBeLessThan(image.level + 0.01);
    }
    // Where nothing is listed, nothing shows: a bin between the images is at the rounding floor.
    expect(measured(700)).toBeLessThan(-250);
  });

  it('timing skew: the images rise 20 dB per decade; quoted −60 dBc at 220 Hz, they are −60 + 20·log10(1100/220) = −46.02 dBc at the blocker', () => {
    const epsilon = 10 ** (-60 / 20);
    const t = epsilon / (2 * Math.PI * 220); // seconds
    const amplitude = 10 ** (BLOCKER_LEVEL / 20);
    const skew = (m: number) => (m === 0 ? (M - 1) * t : -t);
    const samples = Array.from({ length: N }, (_, n) => amplitude * Math.cos(2 * Math.PI * BLOCKER_BIN * (n / R + skew(n % M)) + 0.3));
    const measured = levels(samples);
    const planned = plannedImages({ ways: M, offsetSpur: db(-120), imageLevel: db(-60), imageReference: hz(220) });
    for (const image of planned) {
      expect(image.level).toBeCloseTo(BLOCKER_LEVEL - 60 + 20 * Math.log10(5), 9);
      // First order in 2π·f·t (≈ 0.005 here): the simulation's exact images differ by well under 0.01 dB.
      expect(Math.abs(measured(image.bin) - image.level), image.label).toBeLessThan(0.01);
    }
  });
});
