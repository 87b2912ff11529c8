import { db, seconds, type Db, type Hz, type Seconds } from '../units/quantities.js';

/**
 * SNR limit that rms sampling jitter sets for a full-scale sine:
 * −20·log10(2π·f·σ) (IEEE Std 1241-2010 terms; the standard formula).
 *
 * @param frequency the input frequency, Hz (the band's highest, for the worst case)
 * @param jitter rms jitter, s
 * @returns dB; Infinity for zero jitter or DC
 * @example jitterLimitedSnr(hz(100e6), seconds(1e-12)) // 64.0 dB
 */
export function jitterLimitedSnr(frequency: Hz, jitter: Seconds): Db {
  return db(-20 * Math.log10(2 * Math.PI * frequency * jitter));
}

/**
 * Independent jitter sources add in quadrature.
 *
 * @param sources rms jitters, s
 * @example totalJitter([seconds(3e-13), seconds(4e-13)]) // 5e-13 s
 */
export function totalJitter(sources: readonly Seconds[]): Seconds {
  return seconds(Math.hypot(...sources));
}

/**
 * Ideal quantisation SNR of an N-bit converter for a full-scale sine: 6.02·N + 1.76 dB.
 *
 * @param bits resolution
 * @example quantisationSnr(12) // 74.0 dB
 */
export function quantisationSnr(bits: number): Db {
  return db(6.02 * bits + 1.76);
}

/**
 * Two independent noise limits together: their noise powers add.
 *
 * @param limits SNRs, dB (Infinity contributes nothing)
 * @example combinedSnr([db(74), db(74)]) // 71.0 dB
 */
export function combinedSnr(limits: readonly Db[]): Db {
  const noise = limits.reduce((sum, snr) => sum + 10 ** (-snr / 10), 0);
  return db(-10 * Math.log10(noise));
}

/**
 * Processing gain of keeping a channel of width B from a converter at rate fs:
 * 10·log10(fs / (2·B)) dB (noise spread evenly over [0, fs/2]).
 *
 * @param rate sampling rate, Hz
 * @param bandwidth channel width, Hz
 * @example processingGain(hz(122.88e6), hz(20e6)) // 4.87 dB
 */
export function processingGain(rate: Hz, bandwidth: Hz): Db {
  return db(10 * Math.log10(rate / (2 * bandwidth)));
}
