import { realFft } from './fft.js';
import type { SpectralWindow } from './window.js';

/** A windowed spectrum read as tone levels. */
export interface LevelSpectrum {
  /** Level of bins 0..N/2, dBFS: the amplitude a tone on that bin would have (full scale = 1). */
  readonly levels: Float64Array;
  /** Median bin level, dBFS: the noise, since tones fill few bins. */
  readonly medianLevel: number;
}

/**
 * Windows a record, transforms it and reads each bin as a tone level:
 * 20·log10(2·|X[k]| / (N·g)) dBFS with g the window's coherent gain, so a
 * whole-cycle tone of amplitude A reads 20·log10 A on its bin. Bins 0 and N/2
 * hold a real component with no mirror, so they read 20·log10(|X| / (N·g)):
 * a constant d (or d·(−1)ⁿ) reads 20·log10 d.
 *
 * @param samples the record, length N
 * @param window its window, same length
 * @returns levels in dBFS (−Infinity for an empty bin) and their median
 * @example levelSpectrum(Float64Array.from({ length: 64 }, (_, n) => 0.5 * Math.cos((2 * Math.PI * 5 * n) / 64)), blackmanHarris(64)).levels[5] // -6.02
 */
export function levelSpectrum(samples: Float64Array, window: SpectralWindow): LevelSpectrum {
  const n = samples.length;
  const windowed = new Float64Array(n);
  for (let i = 0; i < n; i++) windowed[i] = samples[i]! * window.weights[i]!;
  const { re, im } = realFft(windowed);
  const levels = new Float64Array(n / 2 + 1);
  for (let k = 0; k <= n / 2; k++) {
    const scale = k === 0 || k === n / 2 ? n * window.coherentGain : (n * window.coherentGain) / 2;
    levels[k] = 10 * Math.log10((re[k]! * re[k]! + im[k]! * im[k]!) / (scale * scale));
  }
  const sorted = Float64Array.from(levels).sort();
  return { levels, medianLevel: sorted[Math.floor(sorted.length / 2)]! };
}

/**
 * Peaks of a level spectrum: bins above the floor that are at least as high
 * as the bin below and higher than the bin above (a flat top counts once).
 *
 * @param levels dBFS per bin
 * @param floor dBFS; only bins strictly above it count
 * @returns peak bins, ascending
 * @example findPeaks(Float64Array.of(-100, -20, -30, -100, -40, -100), -90) // [1, 4]
 */
export function findPeaks(levels: Float64Array, floor: number): number[] {
  const peaks: number[] = [];
  for (let k = 0; k < levels.length; k++) {
    const level = levels[k]!;
    if (!(level > floor)) continue;
    const below = k > 0 ? levels[k - 1]! : -Infinity;
    const above = k + 1 < levels.length ? levels[k + 1]! : -Infinity;
    if (level >= below && level > above) peaks.push(k);
  }
  return peaks;
}
