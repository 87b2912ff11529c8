/** A tone to synthesise: A·cos(2π·c·n/N + φ) with c whole cycles in the record. */
export interface SampledTone {
  readonly cycles: number;
  readonly amplitude: number;
  /** Phase φ, radians. */
  readonly phase: number;
}

/**
 * Adds whole-cycle tones to a record of N samples, in place. The phase of
 * sample n is read from a table of cos/sin(2π·m/N) at m = c·n mod N, kept as
 * an integer, so that even a tone of many more cycles than N (an
 * undersampled one) is exact at every sample and the sum costs one table
 * look-up per tone and sample.
 *
 * @param samples the record (length N), added to
 * @param tones the tones; cycles may be any integer (they fold as sampling folds them)
 * @example addTones(new Float64Array(4), [{ cycles: 1, amplitude: 1, phase: 0 }]) // [1, 0, −1, 0]
 */
export function addTones(samples: Float64Array, tones: readonly SampledTone[]): void {
  const n = samples.length;
  const cos = new Float64Array(n);
  const sin = new Float64Array(n);
  for (let m = 0; m < n; m++) {
    cos[m] = Math.cos((2 * Math.PI * m) / n);
    sin[m] = Math.sin((2 * Math.PI * m) / n);
  }
  for (const tone of tones) {
    const step = ((tone.cycles % n) + n) % n;
    const inPhase = tone.amplitude * Math.cos(tone.phase);
    const quadrature = tone.amplitude * Math.sin(tone.phase);
    for (let i = 0, m = 0; i < n; i++) {
      samples[i] = samples[i]! + inPhase * cos[m]! - quadrature * sin[m]!;
      m += step;
      if (m >= n) m -= n;
    }
  }
}
