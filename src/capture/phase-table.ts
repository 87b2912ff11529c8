/** cos and sin of 2π·m/N for m = 0..N−1. */
export interface PhaseTable {
  readonly cos: Float64Array;
  readonly sin: Float64Array;
}

/** The table last made: one capture asks for one length several times (tones, window, FFT). */
let last: PhaseTable | null = null;

/**
 * cos and sin of 2π·m/N, each from its index in one expression (not by
 * rotation, so every entry is as exact as Math.cos allows). The tone
 * synthesis, the window and the FFT's twiddle factors all read it: for a
 * length L = N/2^s, cos(2π·j/L) is entry j·2^s exactly (the scaling by a
 * power of two is exact in floating point), so a transform of any
 * power-of-two length up to N reads the same values it would compute. The
 * last table made is kept, so a capture computes its sines once.
 *
 * @param samples record length N
 * @returns the table (shared: read only)
 * @example phaseTable(4).cos // [1, 0, −1, 0] (to rounding)
 */
export function phaseTable(samples: number): PhaseTable {
  if (last !== null && last.cos.length === samples) return last;
  const cos = new Float64Array(samples);
  const sin = new Float64Array(samples);
  for (let m = 0; m < samples; m++) {
    cos[m] = Math.cos((2 * Math.PI * m) / samples);
    sin[m] = Math.sin((2 * Math.PI * m) / samples);
  }
  last = { cos, sin };
  return last;
}
