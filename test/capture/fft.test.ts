import { describe, expect, it } from 'vitest';
import FFT from 'fft.js';
import { fftInPlace, isPowerOfTwo, realFft } from '../../src/capture/fft.js';
import { seededUniform } from '../../src/capture/seeded-random.js';

/**
 * The capture's own radix-2 FFT against fft.js (a general-purpose FFT from
 * the npm registry, the independent reference) on random records of every
 * power-of-two length from 2 to 65536. fft.js uses the same forward sign,
 * X[k] = Σ x[n]·e^(−2πi·kn/N), and no scaling.
 */
const random = seededUniform(20261202);
const LENGTHS = Array.from({ length: 16 }, (_, i) => 2 ** (i + 1));

/** Largest |ours − reference| relative to the largest reference magnitude. */
function relativeError(ours: { re: ArrayLike<number>; im: ArrayLike<number> }, reference: number[], bins: number): number {
  let error = 0;
  let scale = 0;
  for (let k = 0; k < bins; k++) {
    error = Math.max(error, Math.hypot(ours.re[k]! - reference[2 * k]!, ours.im[k]! - reference[2 * k + 1]!));
    scale = Math.max(scale, Math.hypot(reference[2 * k]!, reference[2 * k + 1]!));
  }
  return error / scale;
}

describe('fftInPlace against fft.js (complex records)', () => {
  for (const n of LENGTHS) {
    it(`agrees to 1e-12 at N = ${n}`, () => {
      const re = Float64Array.from({ length: n }, () => 2 * random() - 1);
      const im = Float64Array.from({ length: n }, () => 2 * random() - 1);
      const reference = new FFT(n);
      const input = reference.createComplexArray() as number[];
      for (let i = 0; i < n; i++) [input[2 * i], input[2 * i + 1]] = [re[i]!, im[i]!];
      const out = reference.createComplexArray() as number[];
      reference.transform(out, input);
      fftInPlace(re, im);
      expect(relativeError({ re, im }, out, n)).toBeLessThan(1e-12);
    });
  }
});

describe('realFft against fft.js (real records, bins 0..N/2)', () => {
  for (const n of LENGTHS) {
    it(`agrees to 1e-12 at N = ${n}`, () => {
      const samples = Array.from({ length: n }, () => 2 * random() - 1);
      const reference = new FFT(n);
      const out = reference.createComplexArray() as number[];
      reference.realTransform(out, samples);
      reference.completeSpectrum(out);
      expect(relativeError(realFft(samples), out, n / 2 + 1)).toBeLessThan(1e-12);
    });
  }
});

describe('small cases worked by hand (definition of the DFT)', () => {
  it('an impulse transforms to all ones; a constant to N at DC', () => {
    const re = Float64Array.of(1, 0, 0, 0);
    const im = new Float64Array(4);
    fftInPlace(re, im);
    expect([...re]).toEqual([1, 1, 1, 1]);
    expect([...realFft([1, 1, 1, 1]).re]).toEqual([4, 0, 0]);
  });

  it('cos(2π·n/4) puts N/2 = 2 into bins 1 and 3', () => {
    const { re, im } = realFft([1, 0, -1, 0]);
    expect([...re].map((v) => Math.round(v * 1e12) / 1e12)).toEqual([0, 2, 0]);
    expect([...im].map((v) => Math.abs(Math.round(v * 1e12) / 1e12))).toEqual([0, 0, 0]);
  });

  it('refuses lengths that are not a power of two', () => {
    expect(isPowerOfTwo(6)).toBe(false);
    expect(() => realFft([1, 2, 3])).toThrow(RangeError);
    expect(() => fftInPlace(new Float64Array(4), new Float64Array(2))).toThrow(RangeError);
  });
});
