import { describe, expect, it } from 'vitest';
import { db, hz } from '../../src/units/quantities.js';
import { deriveInterferers } from '../../src/interferers/derive-interferers.js';
import { im3Level } from '../../src/interferers/intermodulation.js';
import { converterFixture, scenarioFixture } from '../helpers/scenario-fixture.js';
import { A2 as a2, A3 as a3, dbfs, polynomialSpectrum as spectrumLevels } from '../helpers/polynomial-converter.js';

// The reference is a direct numeric evaluation of y = x + a2·x² + a3·x³ with fft.js
// (test/helpers/polynomial-converter.ts), independent of the derivation's formulas.

describe('IM3 and neighbour harmonics against a simulated polynomial converter (fft.js)', () => {
  // Reference: one tone at the strongest wanted level gives the converter's HD2/HD3 figures.
  const aRef = 0.5;
  const [fundamental, h2, h3] = spectrumLevels([{ bin: 1000, amplitude: aRef }], [1000, 2000, 3000]);
  const hd2 = h2! - fundamental!;
  const hd3 = h3! - fundamental!;

  // Two neighbours at other levels (no filter: the levels reach the converter unchanged).
  const a1 = 0.2;
  const aN2 = 0.05;
  const scenario = scenarioFixture({
    wanted: { low: hz(65e6), high: hz(75e6), weakestLevel: db(-60), strongestLevel: db(dbfs(aRef)) },
    converter: converterFixture({ harmonics: new Map([[2, db(hd2)], [3, db(hd3)]]), intercept3: null }),
    neighbours: [
      { label: 'N1', low: hz(100e6), high: hz(100e6), level: db(dbfs(a1)) },
      { label: 'N2', low: hz(130e6), high: hz(130e6), level: db(dbfs(aN2)) },
    ],
  });
  const derived = deriveInterferers(scenario);
  const levelOf = (label: string) => derived.find((i) => i.label === label)!.level;

  it('the reference figures are those of the polynomial: HD3 = 20·log10(a3·A²/4), HD2 = 20·log10(a2·A/2)', () => {
    // Leading-order harmonic amplitudes of a cubic (trigonometric identities, common practice, no source).
    expect(hd3).toBeCloseTo(20 * Math.log10((a3 * aRef ** 2) / 4), 2);
    expect(hd2).toBeCloseTo(20 * Math.log10((a2 * aRef) / 2), 2);
  });

  it('2·N1 − N2 and 2·N2 − N1 (bins 700 and 1600) sit at the derived levels', () => {
    const [im3a, im3b] = spectrumLevels([{ bin: 1000, amplitude: a1 }, { bin: 1300, amplitude: aN2 }], [700, 1600]);
    // Tolerance 0.002 dB: the model keeps the leading term; gain compression (3/4·a3·A²) is ~3e-4 dB here.
    expect(Math.abs(levelOf('IM3 2·N1−N2') - im3a!)).toBeLessThan(2e-3);
    expect(Math.abs(levelOf('IM3 2·N2−N1') - im3b!)).toBeLessThan(2e-3);
    // The two differ by L1 − L2 = 12.04 dB: the doubled tone counts twice.
    expect(levelOf('IM3 2·N1−N2') - levelOf('IM3 2·N2−N1')).toBeCloseTo(dbfs(a1) - dbfs(aN2), 9);
  });

  it('IM3 of the wanted band (at its strongest level) with a neighbour', () => {
    const [im3a, im3b] = spectrumLevels([{ bin: 1000, amplitude: aRef }, { bin: 1300, amplitude: a1 }], [700, 1600]);
    expect(Math.abs(levelOf('IM3 2·wanted−N1') - im3a!)).toBeLessThan(2e-3);
    expect(Math.abs(levelOf('IM3 2·N1−wanted') - im3b!)).toBeLessThan(2e-3);
  });

  it('a neighbour\'s H2 and H3 follow (k−1) dB per dB of input', () => {
    const [n1h2, n1h3] = spectrumLevels([{ bin: 1000, amplitude: a1 }], [2000, 3000]);
    expect(Math.abs(levelOf('N1 H2') - n1h2!)).toBeLessThan(2e-3);
    expect(Math.abs(levelOf('N1 H3') - n1h3!)).toBeLessThan(2e-3);
  });

  it('equal tones at the reference level: IM3 is HD3 + 9.54 dB (three times the amplitude)', () => {
    // (3/4)/(1/4) = 3 → 20·log10(3) = 9.542 dB (the trigonometric expansion of x³; common practice, no source).
    const c = converterFixture({ harmonics: new Map([[3, db(-80)]]), intercept3: null });
    expect(im3Level(-6, -6, c, -6)!.level).toBeCloseTo(-6 - 80 + 20 * Math.log10(3), 12);
  });

  it('with an intercept: the product meets the tones at IP3', () => {
    // At L1 = L2 = IP3 the extrapolated product equals the tones (definition of the intercept, IEEE Std 1241 terminology).
    const c = converterFixture({ intercept3: db(25) });
    expect(im3Level(25, 25, c, -1)!.level).toBe(25);
    // 3 dB per dB below it: 10 dB lower tones, 30 dB lower product.
    expect(im3Level(15, 15, c, -1)!.level).toBe(-5);
  });
});
