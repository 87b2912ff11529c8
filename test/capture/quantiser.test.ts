import { describe, expect, it } from 'vitest';
import { quantise } from '../../src/capture/quantiser.js';
import { expectedNoiseLevel } from '../../src/capture/noise-level.js';
import { seededUniform } from '../../src/capture/seeded-random.js';
import { levelSpectrum } from '../../src/capture/capture-spectrum.js';
import { blackmanHarris } from '../../src/capture/window.js';
import { realFft } from '../../src/capture/fft.js';

/**
 * The quantiser against the ideal quantisation SNR of an N-bit converter for
 * a full-scale sine, 6.02·N + 1.76 dB (IEEE Std 1241-2010; 12 bits: 74.0 dB,
 * 14 bits: 86.0 dB). The spectra use the capture's FFT, itself checked
 * against fft.js in fft.test.ts.
 */
const N = 65536;
const CYCLES = 4099; // odd and prime: the tone visits many codes, so the rounding error is spread, not a few spurs

function fullScaleSine(bits: number, stepsBelow = 1): Float64Array {
  // Full scale is ±1 with codes up to 2^(b−1) − 1: a peak one step under 1 keeps the sine inside the codes (0.004 dB at 12 bits).
  const peak = 1 - stepsBelow * 2 ** (1 - bits);
  return Float64Array.from({ length: N }, (_, n) => peak * Math.cos((2 * Math.PI * ((CYCLES * n) % N)) / N + 0.2));
}

/** Signal-to-noise ratio of a record holding one whole-cycle tone: tone bin against every other bin but DC (no window needed). */
function snr(record: Float64Array): number {
  const { re, im } = realFft(record);
  let noise = 0;
  for (let k = 1; k <= N / 2; k++) if (k !== CYCLES) noise += re[k]! ** 2 + im[k]! ** 2;
  return 10 * Math.log10((re[CYCLES]! ** 2 + im[CYCLES]! ** 2) / noise);
}

describe('quantise', () => {
  for (const bits of [12, 14]) {
    it(`a full-scale sine at ${bits} bits has the ideal SNR 6.02·${bits} + 1.76 dB within 0.2 dB (IEEE Std 1241-2010)`, () => {
      const record = fullScaleSine(bits);
      expect(quantise(record, bits, null)).toBe(0);
      expect(snr(record)).toBeCloseTo(6.02 * bits + 1.76, 0);
      expect(Math.abs(snr(record) - (6.02 * bits + 1.76))).toBeLessThan(0.2);
    });
  }

  it('one step of uniform dither doubles the noise power: the SNR drops by 3.01 dB', () => {
    const record = fullScaleSine(12, 2); // a step more headroom for the dither (0.008 dB)
    expect(quantise(record, 12, seededUniform(3))).toBe(0);
    expect(Math.abs(snr(record) - (6.02 * 12 + 1.76 - 10 * Math.log10(2)))).toBeLessThan(0.2);
  });

  it('puts the median bin 10·log10(ln 2) below the expected mean noise (exponential bin powers)', () => {
    const window = blackmanHarris(N);
    const record = Float64Array.from({ length: N }, (_, n) => 0.5 * Math.cos((2 * Math.PI * ((CYCLES * n) % N)) / N));
    quantise(record, 14, seededUniform(5));
    const { medianLevel } = levelSpectrum(record, window);
    const expected = expectedNoiseLevel(14, N, window.noiseBandwidthBins, true) + 10 * Math.log10(Math.LN2);
    expect(Math.abs(medianLevel - expected)).toBeLessThan(0.3);
  });

  it('without dither, an 8-bit whole-cycle tone leaves spurs far above the noise; with dither they drop into it', () => {
    const window = blackmanHarris(N);
    const strongestSpur = (dither: (() => number) | null) => {
      const record = Float64Array.from({ length: N }, (_, n) => 0.9 * Math.cos((2 * Math.PI * ((512 * n) % N)) / N));
      quantise(record, 8, dither);
      const { levels, medianLevel } = levelSpectrum(record, window);
      let most = -Infinity;
      levels.forEach((l, k) => {
        if (Math.abs(k - 512) > 3) most = Math.max(most, l);
      });
      return most - medianLevel;
    };
    expect(strongestSpur(null)).toBeGreaterThan(40);
    expect(strongestSpur(seededUniform(9))).toBeLessThan(15);
  });

  it('clips beyond full scale and counts the clipped samples', () => {
    const record = Float64Array.of(0.3, 2, -2, -0.3);
    expect(quantise(record, 2, null)).toBe(2);
    expect([...record]).toEqual([0.5, 0.5, -1, -0.5]);
  });
});
