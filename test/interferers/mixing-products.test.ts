import { describe, expect, it } from 'vitest';
import { db, hz } from '../../src/units/quantities.js';
import { deriveInterferers } from '../../src/interferers/derive-interferers.js';
import { orderLaw } from '../../src/interferers/converter-law.js';
import type { Neighbour } from '../../src/scenario/scenario.js';
import { converterFixture, scenarioFixture } from '../helpers/scenario-fixture.js';
import { A3 as a3, dbfs, polynomialSpectrum as spectrumLevels } from '../helpers/polynomial-converter.js';

/**
 * Mixing-product levels against a direct numeric evaluation of the
 * memoryless polynomial converter y = x + a2·x² + a3·x³, transformed with
 * fft.js (a general-purpose FFT from the npm registry;
 * test/helpers/polynomial-converter.ts). Bin k stands for k·0.1 MHz. The
 * three tone neighbours sit at bins 1000, 1370 and 1730: every product of
 * order 1..3 of them lands on its own bin (checked below), so each reads
 * alone. x² makes only even-order products and x³ only odd ones, so every
 * product of order 2 or 3 here is exactly its leading term; the one
 * inexactness is the reference fundamental, lifted by (3/4)·a3·A² (3.3e-4 dB)
 * through x³, hence 2e-3 dB tolerances.
 */
const BINS = [1000, 1370, 1730] as const;
const AMPLITUDES = [0.2, 0.05, 0.1] as const;
const aRef = 0.5;

const tone = (label: string, bin: number, amplitude: number): Neighbour => ({
  label,
  low: hz(bin * 1e5),
  high: hz(bin * 1e5),
  level: db(dbfs(amplitude)),
});
const neighbours = BINS.map((bin, i) => tone(`N${i + 1}`, bin, AMPLITUDES[i]!));
const threeTones = BINS.map((bin, i) => ({ bin, amplitude: AMPLITUDES[i]! }));

/** The scenario: wanted 65–75 MHz at the reference level, no filter, a threshold far below every product (nothing pruned). */
function threeToneScenario(converter = converterFixture()) {
  return scenarioFixture({
    wanted: { low: hz(65e6), high: hz(75e6), weakestLevel: db(-60), strongestLevel: db(dbfs(aRef)) },
    converter,
    neighbours,
    requirements: { margin: hz(1e6), rejection: db(300), tolerancePpm: scenarioFixture().requirements.tolerancePpm },
  });
}

describe('mixing products of three tones against a simulated polynomial converter (fft.js)', () => {
  const [fundamental, h2, h3] = spectrumLevels([{ bin: 700, amplitude: aRef }], [700, 1400, 2100]);
  const hd2 = h2! - fundamental!;
  const hd3 = h3! - fundamental!;
  const derived = deriveInterferers(
    threeToneScenario(
      converterFixture({
        harmonics: new Map([
          [2, db(hd2)],
          [3, db(hd3)],
        ]),
      }),
    ),
  );
  const find = (label: string) => {
    const found = derived.find((i) => i.label === label);
    if (!found) throw new Error(`${label} not derived; have ${derived.map((i) => i.label).join(', ')}`);
    return found;
  };
  // [label, bin]: every product the FFT reads, by the plan's label.
  const cases: Array<[string, number]> = [
    ['IM3 2·N1+N2', 2 * 1000 + 1370],
    ['IM3 2·N1−N2', 2 * 1000 - 1370],
    ['IM3 N1+N2−N3', 1000 + 1370 - 1730],
    ['IM3 N1+N3−N2', 1000 + 1730 - 1370],
    ['IM3 N2+N3−N1', 1370 + 1730 - 1000],
    ['IM3 N1+N2+N3', 1000 + 1370 + 1730],
    ['IM3 2·N3−N1', 2 * 1730 - 1000],
    ['IM3 N1+2·N2', 1000 + 2 * 1370],
    ['IM2 N1+N2', 1000 + 1370],
    ['IM2 N2−N1', 1370 - 1000],
    ['IM2 N3−N2', 1730 - 1370],
    ['N1 H2', 2000],
    ['N3 H3', 3 * 1730],
  ];

  it('every product of order 1..3 of the three tones lands on its own bin (so each reads alone)', () => {
    const seen = new Map<number, string>();
    for (let a = -3; a <= 3; a++)
      for (let b = -3; b <= 3; b++)
        for (let c = -3; c <= 3; c++) {
          const order = Math.abs(a) + Math.abs(b) + Math.abs(c);
          if (order === 0 || order > 3) continue;
          const bin = Math.abs(a * BINS[0] + b * BINS[1] + c * BINS[2]);
          const key = [a, b, c].join(',');
          const negative = [-a, -b, -c].join(',');
          const earlier = seen.get(bin);
          expect(earlier === undefined || earlier === negative, `bin ${bin}: ${earlier} and ${key}`).toBe(true);
          seen.set(bin, key);
        }
  });

  it.each(cases)('%s at bin %i sits at the derived level, with the derived extent', (label, bin) => {
    const [measured] = spectrumLevels(threeTones, [bin]);
    expect(Math.abs(find(label).level - measured!)).toBeLessThan(2e-3);
    expect(find(label).low).toBeCloseTo(bin * 1e5, 3);
    expect(find(label).high).toBeCloseTo(bin * 1e5, 3);
  });

  it('at equal drive: 2·f1 + f2 is 2·f1 − f2; a triple beat f1 + f2 − f3 is 6.02 dB above 2·f1 − f2', () => {
    const equal = [0.1, 0.1, 0.1];
    const [im3, sum3, triple] = spectrumLevels(
      BINS.map((bin, i) => ({ bin, amplitude: equal[i]! })),
      [2 * 1000 - 1370, 2 * 1000 + 1370, 1000 + 1370 - 1730],
    );
    // (3/4)·a3·A³ for both 2f1 ± f2, (6/4)·a3·A³ for f1 + f2 − f3 (multinomial counts 3 and 6; common practice, no source).
    expect(sum3! - im3!).toBeCloseTo(0, 6);
    expect(triple! - im3!).toBeCloseTo(20 * Math.log10(2), 6);
  });
});

describe('the intercept law (common practice: the product of order n rises n dB per dB and meets the tones at IIPn)', () => {
  // For y = x + a3·x³ the 2·f1 − f2 amplitude (3/4)·a3·A³ equals the tone A at A² = 4/(3·a3): IIP3 = 10·log10(4/(3·a3)) dBFS.
  const iip3 = 10 * Math.log10(4 / (3 * a3));
  const iip2 = 30; // stated outright for the order-2 law below
  const [fundamental, h2] = spectrumLevels([{ bin: 700, amplitude: aRef }], [700, 1400]);
  const converter = converterFixture({
    harmonics: new Map([[2, db(h2! - fundamental!)]]),
    intercepts: new Map([
      [2, db(iip2)],
      [3, db(iip3)],
    ]),
    intercept3: db(iip3),
  });
  const derived = deriveInterferers(threeToneScenario(converter));
  const levelOf = (label: string) => derived.find((i) => i.label === label)!.level;
  const [p1, p2, p3] = AMPLITUDES.map(dbfs) as [number, number, number];

  it('2·f1 − f2 = 2·P1 + P2 − 2·IIP3', () => {
    expect(levelOf('IM3 2·N1−N2')).toBeCloseTo(2 * p1 + p2 - 2 * iip3, 9);
  });

  it('f1 + f2 − f3 = P1 + P2 + P3 − 2·IIP3 + 20·log10(2); H3 = 3·P − 2·IIP3 − 20·log10(3)', () => {
    expect(levelOf('IM3 N1+N2−N3')).toBeCloseTo(p1 + p2 + p3 - 2 * iip3 + 20 * Math.log10(2), 9);
    expect(levelOf('N1 H3')).toBeCloseTo(3 * p1 - 2 * iip3 - 20 * Math.log10(3), 9);
  });

  it('f1 + f2 = P1 + P2 − IIP2', () => {
    expect(levelOf('IM2 N1+N2')).toBeCloseTo(p1 + p2 - iip2, 9);
  });

  it("the intercept stated for y = x + a3·x³ reproduces that converter's products (fft.js)", () => {
    // The polynomial helper has a3 = A3: its third-order products are those of the intercept law at IIP3 above.
    const [im3, triple, sum3] = spectrumLevels(threeTones, [2 * 1000 - 1370, 1000 + 1370 - 1730, 2 * 1000 + 1370]);
    expect(Math.abs(levelOf('IM3 2·N1−N2') - im3!)).toBeLessThan(2e-3);
    expect(Math.abs(levelOf('IM3 N1+N2−N3') - triple!)).toBeLessThan(2e-3);
    expect(Math.abs(levelOf('IM3 2·N1+N2') - sum3!)).toBeLessThan(2e-3);
  });

  it('a stated intercept replaces the harmonic figure for its order only', () => {
    const law3 = orderLaw(converter, 3, -1)!;
    const law2 = orderLaw(converterFixture({ harmonics: new Map([[2, db(-75)]]) }), 2, -1)!;
    expect(law3.note).toMatch(/intercept/);
    expect(law2.note).toMatch(/harmonic figure/);
    // HD2 −75 dBc at −1 dBFS: gain2 = −75 − 1·(−1) = −74 (harmonic at −1 − 75 = −76 = gain2 + 2·(−1)).
    expect(law2.gain).toBeCloseTo(-74, 12);
  });
});
