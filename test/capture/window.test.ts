import { describe, expect, it } from 'vitest';
import FFT from 'fft.js';
import { blackmanHarris, BLACKMAN_HARRIS_4 } from '../../src/capture/window.js';
import { findPeaks, levelSpectrum } from '../../src/capture/capture-spectrum.js';

/**
 * The 4-term Blackman–Harris window: coefficients and figures from F. J.
 * Harris, "On the use of windows for harmonic analysis with the discrete
 * Fourier transform", Proc. IEEE 66(1), 1978 (from memory: coherent gain
 * 0.36, equivalent noise bandwidth 2.00 bins, highest side lobe −92 dB).
 */
const N = 4096;

describe('blackmanHarris', () => {
  const window = blackmanHarris(N);

  it('has the coefficient sum 1 at the centre and a coherent gain of a0 = 0.35875 (Σw/N)', () => {
    expect(BLACKMAN_HARRIS_4.reduce((s, a) => s + a, 0)).toBeCloseTo(1, 12);
    expect(window.weights[N / 2]).toBeCloseTo(1, 12);
    const sum = window.weights.reduce((s, w) => s + w, 0);
    expect(sum / N).toBeCloseTo(0.35875, 12);
    expect(window.coherentGain).toBe(0.35875);
  });

  it('has a noise bandwidth of about 2.00 bins (Harris 1978, from memory)', () => {
    // Closed form for a cosine-sum window: (a0² + (a1² + a2² + a3²)/2) / a0².
    const [a0, a1, a2, a3] = BLACKMAN_HARRIS_4;
    expect(window.noiseBandwidthBins).toBeCloseTo((a0 ** 2 + (a1 ** 2 + a2 ** 2 + a3 ** 2) / 2) / a0 ** 2, 9);
    expect(window.noiseBandwidthBins).toBeCloseTo(2.0, 1);
  });

  it('spreads a whole-cycle tone over its bin and 3 either side, nothing else (fft.js as reference)', () => {
    const cycles = 700;
    const samples = Array.from({ length: N }, (_, n) => 0.5 * Math.cos((2 * Math.PI * cycles * n) / N + 0.3) * window.weights[n]!);
    const fft = new FFT(N);
    const out = fft.createComplexArray() as number[];
    fft.realTransform(out, samples);
    const magnitude = (k: number) => Math.hypot(out[2 * k]!, out[2 * k + 1]!);
    // Bin k holds A·N·a_|d|/2 (a cosine sum's DFT, halved for each sign of frequency) for |d| ≤ 3.
    const [a0, a1, a2, a3] = BLACKMAN_HARRIS_4;
    [a0, a1 / 2, a2 / 2, a3 / 2].forEach((a, d) => {
      expect(magnitude(cycles + d)).toBeCloseTo((0.5 * N * a) / 2, 9);
      expect(magnitude(cycles - d)).toBeCloseTo((0.5 * N * a) / 2, 9);
    });
    for (let k = 0; k <= N / 2; k++) if (Math.abs(k - cycles) > 3) expect(magnitude(k)).toBeLessThan(1e-9);
  });
});

describe('levelSpectrum and findPeaks', () => {
  const window = blackmanHarris(N);

  it('reads a whole-cycle tone of amplitude A as 20·log10 A on its bin, and a constant d as 20·log10 d at DC', () => {
    const record = Float64Array.from({ length: N }, (_, n) => 0.25 + 0.1 * Math.cos((2 * Math.PI * 333 * n) / N + 1));
    const { levels } = levelSpectrum(record, window);
    expect(levels[333]).toBeCloseTo(20 * Math.log10(0.1), 9);
    expect(levels[0]).toBeCloseTo(20 * Math.log10(0.25), 9);
  });

  it("finds one peak per tone, none on the window's skirts", () => {
    const record = Float64Array.from(
      { length: N },
      (_, n) => 0.5 * Math.cos((2 * Math.PI * 100 * n) / N) + 1e-3 * Math.cos((2 * Math.PI * 900 * n) / N),
    );
    const { levels } = levelSpectrum(record, window);
    expect(findPeaks(levels, -200)).toEqual([100, 900]);
  });
});
