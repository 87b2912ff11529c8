import { describe, expect, it } from 'vitest';
import FFT from 'fft.js';
import { hz } from '../../src/units/quantities.js';
import { foldFrequency, lookalikes } from '../../src/math/fold.js';

/**
 * An independent simulation of uniform sampling: cosines are sampled at the
 * rate and transformed with fft.js (a general-purpose FFT from the npm
 * registry), and the peaks are read off the spectrum. Every tone is coherent,
 * an integer number m of cycles in the record (f = m·rate/N), so each lands on
 * one bin with no leakage and the peak bin is the alias to the exact hertz.
 */
const N = 4096;

interface Tone {
  readonly frequency: number;
  readonly amplitude: number;
}

/** Magnitudes of bins 0..N/2 of the sampled sum of cosines (fft.js realTransform). */
function sampledSpectrum(tones: readonly Tone[], rate: number): number[] {
  const samples = new Array<number>(N).fill(0);
  for (let n = 0; n < N; n++) {
    for (const { frequency, amplitude } of tones) samples[n]! += amplitude * Math.cos((2 * Math.PI * frequency * n) / rate);
  }
  const fft = new FFT(N);
  const out = fft.createComplexArray() as number[];
  fft.realTransform(out, samples);
  const magnitudes: number[] = [];
  for (let k = 0; k <= N / 2; k++) magnitudes.push(Math.hypot(out[2 * k]!, out[2 * k + 1]!));
  return magnitudes;
}

/** The `count` largest bins, strongest first. */
function strongestBins(magnitudes: readonly number[], count: number): number[] {
  return magnitudes
    .map((m, bin) => [m, bin] as const)
    .sort((a, b) => b[0] - a[0])
    .slice(0, count)
    .map(([, bin]) => bin);
}

/** The bin where the alias calculator puts a tone; it must be a whole bin for a coherent tone. */
function predictedBin(frequency: number, rate: number): number {
  const bin = foldFrequency(hz(frequency), hz(rate)).alias / (rate / N);
  expect(Math.abs(bin - Math.round(bin))).toBeLessThan(1e-6);
  return Math.round(bin);
}

describe('fft.js simulation: each peak sits where the alias calculator says', () => {
  // 100 MHz / 4096 = 24 414.0625 Hz and 61.44 MHz / 4096 = 15 kHz: both bin widths are exact in binary.
  for (const rate of [100e6, 61.44e6]) {
    it(`single tones in zones 1 to 8 at ${rate / 1e6} MHz`, () => {
      const binWidth = rate / N;
      for (let zone = 1; zone <= 8; zone++) {
        for (const offset of [1, 157, 1000, 2047]) {
          const m = (zone - 1) * (N / 2) + offset; // cycles in the record
          const frequency = m * binWidth;
          const spectrum = sampledSpectrum([{ frequency, amplitude: 1 }], rate);
          const [peak] = strongestBins(spectrum, 1);
          expect(peak, `zone ${zone}, ${frequency} Hz`).toBe(predictedBin(frequency, rate));
          expect(foldFrequency(hz(frequency), hz(rate)).zone).toBe(zone);
          // A unit cosine on one interior bin has magnitude N/2; nothing else rises above numerical noise.
          expect(spectrum[peak!]! / (N / 2)).toBeCloseTo(1, 9);
          const others = spectrum.filter((_, bin) => bin !== peak);
          expect(Math.max(...others)).toBeLessThan(1e-6 * spectrum[peak!]!);
        }
      }
    });
  }

  it('a sum of tones from several zones: every peak where predicted, with its own strength', () => {
    const rate = 61.44e6;
    const binWidth = rate / N;
    // 10.7, 21.4, 70 and 140 MHz rounded to the 15 kHz grid, plus a tone in zone 7 (distinct aliases).
    const tones: Tone[] = [
      { frequency: 713 * binWidth, amplitude: 1 },
      { frequency: 1427 * binWidth, amplitude: 0.5 },
      { frequency: 4667 * binWidth, amplitude: 0.25 },
      { frequency: 9333 * binWidth, amplitude: 0.125 },
      { frequency: (6 * 2048 + 300) * binWidth, amplitude: 0.0625 },
    ];
    const spectrum = sampledSpectrum(tones, rate);
    const peaks = strongestBins(spectrum, tones.length);
    expect(peaks).toEqual(tones.map((t) => predictedBin(t.frequency, rate)));
    for (const [i, t] of tones.entries()) expect(spectrum[peaks[i]!]! / (N / 2)).toBeCloseTo(t.amplitude, 9);
  });

  it('a tone on a zone edge shows at DC or at rate/2', () => {
    // Common practice, no source: k·rate/2 folds to rate/2 for odd k, to 0 for even k.
    const rate = 100e6;
    for (let k = 1; k <= 6; k++) {
      const frequency = (k * rate) / 2;
      const [peak] = strongestBins(sampledSpectrum([{ frequency, amplitude: 1 }], rate), 1);
      expect(peak).toBe(k % 2 === 1 ? N / 2 : 0);
      expect(predictedBin(frequency, rate)).toBe(peak);
    }
  });
});

describe('fft.js simulation: a two-tone of unequal strength', () => {
  // Common practice, no source: even Nyquist zones arrive spectrally inverted, odd zones upright.
  const rate = 100e6;
  const binWidth = rate / N;
  for (let zone = 1; zone <= 8; zone++) {
    const inverted = zone % 2 === 0;
    it(`reads ${inverted ? 'reversed' : 'in order'} in zone ${zone}`, () => {
      const lowerCycles = (zone - 1) * (N / 2) + 600;
      const lower = { frequency: lowerCycles * binWidth, amplitude: 1 }; // the stronger tone is the lower one
      const upper = { frequency: (lowerCycles + 40) * binWidth, amplitude: 0.25 };
      const spectrum = sampledSpectrum([lower, upper], rate);
      const [strongBin, weakBin] = strongestBins(spectrum, 2);
      expect(spectrum[strongBin!]! / spectrum[weakBin!]!).toBeCloseTo(4, 6);
      // After sampling the stronger tone appears above the weaker one exactly in even zones.
      expect(strongBin! > weakBin!).toBe(inverted);
      expect(foldFrequency(hz(lower.frequency), hz(rate)).inverted).toBe(inverted);
      expect(strongBin).toBe(predictedBin(lower.frequency, rate));
      expect(weakBin).toBe(predictedBin(upper.frequency, rate));
    });
  }
});

describe('sampled lookalikes give the same samples', () => {
  it('1 Hz at 7 Hz: the samples of 6, 8, 13 and 15 Hz equal those of 1 Hz', () => {
    // Common practice, no source; checked on the samples themselves, cos(2π·f·n/fs).
    const rate = 7;
    const found = lookalikes(hz(1), hz(rate), 2);
    expect(found).toEqual([6, 8, 13, 15]);
    for (const g of found) {
      for (let n = 0; n < 64; n++) {
        expect(Math.cos((2 * Math.PI * g * n) / rate)).toBeCloseTo(Math.cos((2 * Math.PI * 1 * n) / rate), 9);
      }
    }
  });

  it('70 MHz at 61.44 MHz: every lookalike samples identically', () => {
    const rate = 61.44e6;
    for (const g of lookalikes(hz(70e6), hz(rate), 3)) {
      for (let n = 0; n < 64; n++) {
        expect(Math.cos((2 * Math.PI * g * n) / rate)).toBeCloseTo(Math.cos((2 * Math.PI * 70e6 * n) / rate), 7);
      }
    }
  });
});
