import { describe, expect, it } from 'vitest';
import { db, hz } from '../../src/units/quantities.js';
import { deriveInterferers } from '../../src/interferers/derive-interferers.js';
import { im2Level } from '../../src/interferers/second-order.js';
import { converterFixture, scenarioFixture } from '../helpers/scenario-fixture.js';
import { A2 as a2, dbfs, polynomialSpectrum as spectrumLevels } from '../helpers/polynomial-converter.js';

/**
 * A direct numeric evaluation of the memoryless polynomial converter
 * y = x + a2·x² + a3·x³ (fft.js, a general-purpose FFT from the npm registry;
 * test/helpers/polynomial-converter.ts). Tones sit on exact FFT bins (coherent
 * sampling), so a rectangular window leaks nothing and a cosine of amplitude
 * A reads 2·|X[k]|/N at its bin; bin k stands for k·0.1 MHz. x³ makes only
 * odd-order products, so every second-order product here is exactly a2·A1·A2;
 * the one inexactness is the reference: x³ lifts the measured fundamental by
 * (3/4)·a3·A² (3.3e-4 dB), which the dBc figure carries, hence 1e-3 dB tolerances.
 */

describe('second-order products against a simulated polynomial converter (fft.js)', () => {
  // Reference: one tone at the strongest wanted level gives the converter's HD2/HD3 figures.
  const aRef = 0.5;
  const [fundamental, h2, h3] = spectrumLevels([{ bin: 700, amplitude: aRef }], [700, 1400, 2100]);
  const hd2 = h2! - fundamental!;
  const hd3 = h3! - fundamental!;
  const a1 = 0.2;
  const aN2 = 0.05;
  // Wanted 65–75 MHz; tone neighbours N1 at 100 MHz, N2 at 130 MHz; no filter, so the levels reach the converter unchanged.
  const scenario = scenarioFixture({
    wanted: { low: hz(65e6), high: hz(75e6), weakestLevel: db(-60), strongestLevel: db(dbfs(aRef)) },
    converter: converterFixture({ harmonics: new Map([[2, db(hd2)], [3, db(hd3)]]), intercept3: null }),
    neighbours: [
      { label: 'N1', low: hz(100e6), high: hz(100e6), level: db(dbfs(a1)) },
      { label: 'N2', low: hz(130e6), high: hz(130e6), level: db(dbfs(aN2)) },
    ],
  });
  const derived = deriveInterferers(scenario);
  const find = (label: string) => derived.find((i) => i.label === label)!;

  it('the reference HD2 is that of the polynomial, 20·log10(a2·A/2)', () => {
    // cos² = (1 + cos 2θ)/2 (trigonometric identity; common practice, no source).
    // The fundamental reads (1 + (3/4)·a3·A²) high through x³, 3.3e-4 dB here, so HD2 (dBc) is that much lower.
    expect(hd2).toBeCloseTo(20 * Math.log10((a2 * aRef) / 2), 3);
  });

  it('N1 − N2 and N1 + N2 (bins 300 and 2300) sit at the derived levels, with the derived extents', () => {
    const [difference, sum] = spectrumLevels([{ bin: 1000, amplitude: a1 }, { bin: 1300, amplitude: aN2 }], [300, 2300]);
    expect(Math.abs(find('IM2 N1−N2').level - difference!)).toBeLessThan(1e-3);
    expect(Math.abs(find('IM2 N1+N2').level - sum!)).toBeLessThan(1e-3);
    expect([find('IM2 N1−N2').low, find('IM2 N1−N2').high]).toEqual([-30e6, -30e6]); // folds as 30 MHz
    expect([find('IM2 N1+N2').low, find('IM2 N1+N2').high]).toEqual([230e6, 230e6]);
  });

  it('a wanted tone at the strongest level with N1: N1 − W (bin 300) and W + N1 (bin 1700)', () => {
    const [difference, sum] = spectrumLevels([{ bin: 700, amplitude: aRef }, { bin: 1000, amplitude: a1 }], [300, 1700]);
    expect(Math.abs(find('IM2 N1−wanted').level - difference!)).toBeLessThan(1e-3);
    expect(Math.abs(find('IM2 wanted+N1').level - sum!)).toBeLessThan(1e-3);
    // Interval arithmetic: [100 − 75, 100 − 65] and [65 + 100, 75 + 100] MHz.
    expect([find('IM2 N1−wanted').low, find('IM2 N1−wanted').high]).toEqual([25e6, 35e6]);
    expect([find('IM2 wanted+N1').low, find('IM2 wanted+N1').high]).toEqual([165e6, 175e6]);
  });

  it('two wanted tones both at the strongest level reach the bound of IM2 wanted difference; weaker ones stay under it', () => {
    const [atBound] = spectrumLevels([{ bin: 650, amplitude: aRef }, { bin: 740, amplitude: aRef }], [90]);
    const band = find('IM2 wanted difference');
    expect(Math.abs(band.level - atBound!)).toBeLessThan(1e-3);
    expect([band.low, band.high]).toEqual([0, 10e6]);
    const [weaker] = spectrumLevels([{ bin: 650, amplitude: aRef / 3 }, { bin: 740, amplitude: aRef / 3 }], [90]);
    expect(Math.abs(band.level - weaker! - 2 * 20 * Math.log10(3))).toBeLessThan(1e-3);
  });

  it('equal tones at the reference level: IM2 is HD2 + 6.02 dB (twice the amplitude)', () => {
    // a2·A² against a2·A²/2: 20·log10(2) = 6.0206 dB (expansion of x²; common practice, no source).
    const c = converterFixture({ harmonics: new Map([[2, db(-75)]]) });
    expect(im2Level(-1, -1, c, -1)!.level).toBeCloseTo(-1 - 75 + 6.0206, 4);
    // One dB per dB of each tone.
    expect(im2Level(-11, -1, c, -1)!.level - im2Level(-1, -1, c, -1)!.level).toBeCloseTo(-10, 12);
  });

  it('without any harmonic figure there are none; without a 2nd-order figure the lowest stated is assumed', () => {
    expect(im2Level(-1, -1, converterFixture({ harmonics: new Map() }), -1)).toBeNull();
    const bare = deriveInterferers({ ...scenario, converter: converterFixture({ harmonics: new Map() }) });
    expect(bare.some((i) => i.label.startsWith('IM2'))).toBe(false);
    const assumed = im2Level(-1, -1, converterFixture({ harmonics: new Map([[3, db(-80)], [4, db(-85)]]) }), -1)!;
    expect(assumed.level).toBeCloseTo(-1 - 85 + 6.0206, 4);
    expect(assumed.note).toMatch(/no 2nd-order figure stated; the lowest stated, −85\.0 dBc, assumed/);
  });
});
