import { hz, type Hz } from '../units/quantities.js';

/**
 * Whole numbers of cycles in a record of N samples at rate R: a tone at
 * f = c·R/N repeats exactly over the record, so its FFT holds it in one bin
 * with no leakage, and every sum and difference of such tones is a whole
 * number of cycles too.
 */

/**
 * The whole number of cycles nearest a frequency: round(f·N/R).
 *
 * @param frequency Hz (any sign; undersampled tones exceed N cycles)
 * @param rate sample rate R, Hz
 * @param samples record length N
 * @example nearestCycles(hz(10e6), hz(122.88e6), 65536) // 5333 (10 MHz is 5333.33 bins)
 */
export function nearestCycles(frequency: number, rate: number, samples: number): number {
  return Math.round((frequency * samples) / rate);
}

/**
 * The frequency of c whole cycles in the record, c·R/N, Hz.
 *
 * @example cyclesFrequency(5333, hz(122.88e6), 65536) // 9999375 Hz
 */
export function cyclesFrequency(cycles: number, rate: number, samples: number): Hz {
  return hz((cycles * rate) / samples);
}

/**
 * The bin in 0..N/2 where c cycles show after sampling: c mod N, mirrored
 * about N/2 (the definition of aliasing, in bins; negative c as its magnitude).
 *
 * @param cycles any integer
 * @param samples record length N (even)
 * @example foldCycles(74667, 65536) // 9131 (74667 − 65536)
 * @example foldCycles(40000, 65536) // 25536 (65536 − 40000)
 */
export function foldCycles(cycles: number, samples: number): number {
  const m = ((cycles % samples) + samples) % samples;
  return Math.min(m, samples - m);
}

/**
 * Distance in bins between two folded bins, counting the mirror images about
 * DC and N/2 (a real tone at bin b also has an image at −b): the window
 * spectra of two tones overlap when this is small.
 *
 * @example binDistance(2, 3, 65536) // 1
 * @example binDistance(1, 2, 65536) // 1 (and 3 through the mirror at DC)
 */
export function binDistance(a: number, b: number, samples: number): number {
  return Math.min(Math.abs(a - b), a + b, samples - a - b);
}
