import type { Interleave } from '../scenario/scenario.js';

/**
 * M interleaved cores that differ just enough to make the stated image
 * level. Core m takes samples n ≡ m (mod M). A periodic gain pattern
 * 1 + g_m multiplies the record by it, which puts a copy of every component
 * at k·R/M + f with the relative amplitude |G_k|, G_k = (1/M)·Σ_m g_m·e^(−2πikm/M)
 * (the discrete Fourier series of the pattern; common practice, no source).
 * A timing pattern τ_m samples x(n/R + τ_m); to first order its copies have
 * the relative amplitude 2π·f·|T_k|, T_k the same series of τ_m, rising
 * 20 dB per decade of f. The pattern used here is one core off, the others
 * the same: g = ε·(M − 1) on core 0 and −ε on the rest, whose series is
 * exactly ε for every k = 1..M−1 (and 0 for k = 0: no overall gain change);
 * the same for τ with t = ε/(2π·f_ref), so each image is at the stated
 * level (at f_ref for the timing case) for every k.
 */
export interface CoreMismatch {
  readonly ways: number;
  /** Gain of each core (1 + g_m); all 1 for a timing mismatch. */
  readonly gains: readonly number[];
  /** Sampling-time offset of each core, s; all 0 for a gain mismatch. */
  readonly skews: readonly number[];
  /** Relative amplitude of each image of a component at input frequency f (Hz, any sign). */
  readonly imageFactor: (frequency: number) => number;
}

/**
 * The core mismatch that makes the converter's stated image level: a gain
 * pattern when the level is flat, a timing pattern when it is quoted at a
 * reference frequency.
 *
 * @param interleave the converter's interleaving
 * @returns gains, skews and the image factor
 * @example coreMismatch({ ways: 2, offsetSpur: db(-90), imageLevel: db(-60) }).gains // [1.001, 0.999]
 */
export function coreMismatch(interleave: Interleave): CoreMismatch {
  const m = interleave.ways;
  const epsilon = 10 ** (interleave.imageLevel / 20);
  const pattern = (size: number) => Array.from({ length: m }, (_, core) => (core === 0 ? size * (m - 1) : -size));
  const reference = interleave.imageReference ?? null;
  if (reference === null) {
    return { ways: m, gains: pattern(epsilon).map((g) => 1 + g), skews: new Array<number>(m).fill(0), imageFactor: () => epsilon };
  }
  const t = epsilon / (2 * Math.PI * reference);
  return {
    ways: m,
    gains: new Array<number>(m).fill(1),
    skews: pattern(t),
    imageFactor: (frequency) => 2 * Math.PI * Math.abs(frequency) * t,
  };
}

/**
 * Multiplies each sample by its core's gain, in place.
 *
 * @param samples the record
 * @param gains 1 + g_m for m = 0..M−1
 * @example (() => { const x = Float64Array.of(1, 1, 1, 1); applyCoreGains(x, [1.5, 0.5]); return x; })() // [1.5, 0.5, 1.5, 0.5]
 */
export function applyCoreGains(samples: Float64Array, gains: readonly number[]): void {
  const m = gains.length;
  for (let n = 0; n < samples.length; n++) samples[n] = samples[n]! * gains[n % m]!;
}
