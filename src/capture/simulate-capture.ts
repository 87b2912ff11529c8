import type { Hz } from '../units/quantities.js';
import type { CaptureTone } from './capture-tones.js';
import { applyPolynomial } from './converter-polynomial.js';
import { applyCoreGains, type CoreMismatch } from './interleave-mismatch.js';
import { quantise } from './quantiser.js';
import { seededUniform } from './seeded-random.js';
import { findPeaks, levelSpectrum, type LevelSpectrum } from './capture-spectrum.js';
import { phaseTable } from './phase-table.js';
import { addSkewedTones, addTones } from './tone-synthesis.js';
import type { SpectralWindow } from './window.js';

/** Peaks count this far above the median bin, dB: noise bins (exponentially distributed power) pass it about once in 3·10⁹. */
export const FLOOR_ABOVE_MEDIAN = 15;
const DITHER_SEED = 0x5eed;

/** What the converter is: its bits, its polynomial and, when interleaved, its cores' mismatch. */
export interface SimulatedConverter {
  readonly bits: number;
  /** a[0..K] of y = x + Σ a_k·x^k. */
  readonly coefficients: readonly number[];
  readonly mismatch: CoreMismatch | null;
}

/** One simulated record, transformed. */
export interface SimulatedCapture {
  readonly spectrum: LevelSpectrum;
  /** Peaks count above this, dBFS: the median bin plus FLOOR_ABOVE_MEDIAN. */
  readonly floor: number;
  /** Peak bins above the floor, ascending. */
  readonly peaks: readonly number[];
  readonly clippedSamples: number;
}

/**
 * The simulated capture itself, from time samples: the input tones sampled by
 * the M cores at their own instants (a timing mismatch), through the
 * converter polynomial, each core at its own gain, quantised with one step of
 * uniform dither (fixed seed), the rate-tied tones added, windowed and
 * transformed; then the floor and the peaks above it. Knows nothing of the
 * folding algebra.
 *
 * @param tones the tones of the record (inputs first, then rate-tied tones), at whole cycles
 * @param samples the record length N, a power of two
 * @param rate the sample rate, Hz
 * @param converter bits, polynomial and core mismatch
 * @param window the spectral window
 * @returns the level spectrum, its floor, the peaks and the clipped sample count
 * @example simulateCapture(tones, 65536, hz(184.32e6), { bits: 14, coefficients: converterCoefficients(heronBase), mismatch: null }, blackmanHarris(65536)).peaks.length > 0 // true
 */
export function simulateCapture(
  tones: readonly CaptureTone[],
  samples: number,
  rate: Hz,
  converter: SimulatedConverter,
  window: SpectralWindow,
): SimulatedCapture {
  const capture = new Float64Array(samples);
  const table = phaseTable(samples);
  const { mismatch } = converter;
  const inputs = tones.filter((t) => t.input);
  if (mismatch && mismatch.skews.some((tau) => tau !== 0)) addSkewedTones(capture, inputs, rate, mismatch.skews, table);
  else addTones(capture, inputs, table);
  applyPolynomial(capture, converter.coefficients);
  if (mismatch) applyCoreGains(capture, mismatch.gains);
  const clippedSamples = quantise(capture, converter.bits, seededUniform(DITHER_SEED));
  addTones(
    capture,
    tones.filter((t) => !t.input),
    table,
  );
  const spectrum = levelSpectrum(capture, window);
  const floor = spectrum.medianLevel + FLOOR_ABOVE_MEDIAN;
  return { spectrum, floor, peaks: findPeaks(spectrum.levels, floor), clippedSamples };
}
