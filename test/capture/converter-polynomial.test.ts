import { describe, expect, it } from 'vitest';
import FFT from 'fft.js';
import { applyPolynomial, binomial, fitPolynomial, singleToneHarmonic } from '../../src/capture/converter-polynomial.js';
import { enumerateProducts, orderSupremums, productAmplitude, productBound } from '../../src/capture/mixing-products.js';
import { seededUniform } from '../../src/capture/seeded-random.js';

/**
 * The converter polynomial and its mixing products, against spectra taken
 * with fft.js (the independent reference) of whole-cycle tones through the
 * polynomial: no window is needed, each product lands on one bin and reads
 * 2·|X[k]|/N. The relations checked are the trigonometric power-reduction
 * identities and the multinomial expansion of (Σ Aᵢ·cos θᵢ)^k (common
 * practice, no source), e.g. the textbook two-tone 2f1 − f2 amplitude
 * (3/4)·a3·A1²·A2.
 */
const N = 4096;

/** Amplitudes of bins 0..N/2 of the record, on the tone scale 2·|X|/N (fft.js). */
function toneAmplitudes(record: ArrayLike<number>): number[] {
  const fft = new FFT(N);
  const out = fft.createComplexArray() as number[];
  fft.realTransform(out, Array.from(record));
  return Array.from({ length: N / 2 + 1 }, (_, k) => (2 * Math.hypot(out[2 * k]!, out[2 * k + 1]!)) / N);
}

function tones(list: ReadonlyArray<{ cycles: number; amplitude: number; phase: number }>): Float64Array {
  return Float64Array.from({ length: N }, (_, n) =>
    list.reduce((x, t) => x + t.amplitude * Math.cos((2 * Math.PI * ((t.cycles * n) % N)) / N + t.phase), 0),
  );
}

describe('single-tone harmonics of the polynomial (power-reduction identities)', () => {
  it('a2·x² alone gives a 2nd harmonic of a2·A²/2 (cos² θ = (1 + cos 2θ)/2)', () => {
    expect(singleToneHarmonic([0, 1, 0.1], 0.5, 2)).toBeCloseTo(0.0125, 15);
  });

  it('x⁴ adds a4·A⁴/2 to the 2nd harmonic and x⁵ adds 5·a5·A⁵/16 to the 3rd (cos⁴, cos⁵ expansions)', () => {
    expect(singleToneHarmonic([0, 1, 0, 0, 0.2], 0.5, 2)).toBeCloseTo((0.2 * 0.5 ** 4) / 2, 15);
    expect(singleToneHarmonic([0, 1, 0, 0, 0, 0.3], 0.5, 3)).toBeCloseTo((5 * 0.3 * 0.5 ** 5) / 16, 15);
    expect(binomial(5, 2)).toBe(10);
  });

  it('every harmonic of a random polynomial matches the spectrum (fft.js)', () => {
    const random = seededUniform(7);
    const a = [0, 1, ...Array.from({ length: 7 }, () => 0.05 * (2 * random() - 1))];
    const amplitude = 0.8;
    const record = tones([{ cycles: 37, amplitude, phase: 0 }]);
    applyPolynomial(record, a);
    const spectrum = toneAmplitudes(record);
    for (let m = 1; m <= 8; m++) expect(spectrum[37 * m]).toBeCloseTo(Math.abs(singleToneHarmonic(a, amplitude, m)), 12);
    expect(spectrum[0]).toBeLessThan(1e-14); // the even powers' constant is removed
  });
});

describe('fitPolynomial', () => {
  it('puts every stated harmonic exactly at its level for one tone at the reference level, with the higher powers accounted for', () => {
    // The Heron demo converter's figures (invented data): −75, −80, −88, −90 dBc at −1 dBFS.
    const reference = 10 ** (-1 / 20);
    const targets = new Map(
      [
        [2, -76],
        [3, -81],
        [4, -89],
        [5, -91],
      ].map(([k, l]) => [k!, 10 ** (l! / 20)]),
    );
    const a = fitPolynomial(targets, reference, 5);
    const record = tones([{ cycles: 101, amplitude: reference, phase: 0.4 }]);
    applyPolynomial(record, a);
    const spectrum = toneAmplitudes(record);
    for (const [k, target] of targets) expect(20 * Math.log10(spectrum[101 * k]!)).toBeCloseTo(20 * Math.log10(target), 9);
    // The leading-order fit a_m = 2^(m−1)·T_m/A^m alone would miss the 2nd harmonic by the x⁴ share: here it is not small.
    const leading = (2 * targets.get(2)!) / reference ** 2;
    expect(Math.abs(a[2]!) / leading).toBeGreaterThan(1.5);
  });

  it('reduces to the leading-order fit a_k = 2^(k−1)·T_k/A^k when no higher power shares a harmonic (orders 2 and 3)', () => {
    const a = fitPolynomial(
      new Map([
        [2, 1e-4],
        [3, 3e-5],
      ]),
      0.9,
      3,
    );
    expect(a[2]).toBeCloseTo((2 * 1e-4) / 0.9 ** 2, 15);
    expect(a[3]).toBeCloseTo((4 * 3e-5) / 0.9 ** 3, 15);
  });

  it("takes each coefficient's sign so that |a_m| is the largest the figures allow (opposite to the higher powers' share)", () => {
    const a = fitPolynomial(
      new Map([
        [2, 1e-4],
        [3, 1e-4],
        [4, 1e-4],
        [5, 1e-4],
      ]),
      0.9,
      5,
    );
    expect(Math.sign(a[4]!)).toBe(1);
    expect(Math.sign(a[2]!)).toBe(-1);
    expect(Math.abs(singleToneHarmonic(a, 0.9, 2))).toBeCloseTo(1e-4, 15);
  });
});

describe('productAmplitude and enumerateProducts (multinomial expansion)', () => {
  it('gives the textbook two-tone 2f1 − f2 amplitude (3/4)·a3·A1²·A2, which the derivative bound meets exactly for a single power', () => {
    expect(productAmplitude([0, 1, 0, 0.04], [0.5, 0.5], [2, -1])).toBeCloseTo(0.75 * 0.04 * 0.125, 15);
    expect(productBound(orderSupremums([0, 1, 0, 0.04], 1), [0.5, 0.5], [2, -1])).toBeCloseTo(0.75 * 0.04 * 0.125, 15);
  });

  it("bounds the harmonics of one tone through a 15th-order fit by the stated figures' sizes, though its coefficients are large", () => {
    // Fifteen orders at −90 dBc: the exact fit's monomial coefficients reach O(1) and alternate, yet on |x| ≤ A the curve stays tame.
    const reference = 10 ** (-1 / 20);
    const a = fitPolynomial(new Map(Array.from({ length: 14 }, (_, i) => [i + 2, 10 ** (-91 / 20)] as const)), reference, 15);
    expect(Math.max(...a.slice(2).map(Math.abs))).toBeGreaterThan(0.1);
    const bounds = orderSupremums(a, reference);
    for (let m = 2; m <= 15; m++) {
      const exact = Math.abs(singleToneHarmonic(a, reference, m));
      expect(exact).toBeCloseTo(10 ** (-91 / 20), 12);
      expect(exact).toBeLessThanOrEqual(productBound(bounds, [reference], [m]) * (1 + 1e-9));
    }
  });

  it('matches every bin of a three-tone spectrum through a random 6th-order polynomial (fft.js)', () => {
    const random = seededUniform(11);
    const a = [0, 1, ...Array.from({ length: 5 }, () => 0.1 * (2 * random() - 1))];
    const list = [
      { cycles: 211, amplitude: 0.4, phase: 0.1 },
      { cycles: 307, amplitude: 0.25, phase: 1.3 },
      { cycles: 448, amplitude: 0.1, phase: -0.7 },
    ];
    const record = tones(list);
    applyPolynomial(record, a);
    const spectrum = toneAmplitudes(record);
    const found = enumerateProducts(
      a,
      list.map((t) => t.amplitude),
      1e-12,
    );
    expect(found.complete).toBe(true);
    const products = found.products;
    // These cycle counts are chosen so that no two products of order ≤ 6 share a bin: each bin is one product.
    const byBin = new Map<number, number>();
    for (const p of products) {
      const cycles = p.net.reduce((s, n, i) => s + n * list[i]!.cycles, 0);
      const m = ((cycles % N) + N) % N;
      const bin = Math.min(m, N - m);
      expect(byBin.has(bin), `two products on bin ${bin}`).toBe(false);
      byBin.set(bin, p.amplitude);
    }
    for (const [bin, amplitude] of byBin) expect(spectrum[bin]).toBeCloseTo(amplitude, 12);
    // Every product stays under its derivative bound (orderSupremums), which the search prunes with.
    const bounds = orderSupremums(a, 0.75);
    for (const p of products)
      expect(p.amplitude).toBeLessThanOrEqual(
        productBound(
          bounds,
          list.map((t) => t.amplitude),
          p.net,
        ) *
          (1 + 1e-12),
      );
    // ...and nothing the enumeration left out shows above its cutoff.
    spectrum.forEach((value, bin) => {
      if (!byBin.has(bin) && bin !== 0) expect(value, `bin ${bin}`).toBeLessThan(1e-11);
    });
  });
});
