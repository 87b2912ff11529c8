import { phaseTable, type PhaseTable } from './phase-table.js';

export { phaseTable, type PhaseTable };

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
 * @param table phaseTable(N), when one is at hand
 * @example (() => { const x = new Float64Array(4); addTones(x, [{ cycles: 1, amplitude: 1, phase: 0 }], phaseTable(4)); return x.map((v) => Math.round(v)); })() // [1, 0, -1, 0]
 */
export function addTones(samples: Float64Array, tones: readonly SampledTone[], table: PhaseTable = phaseTable(samples.length)): void {
  const n = samples.length;
  const { cos, sin } = table;
  if (cos.length !== n) throw new RangeError(`phase table of ${cos.length} entries for a record of ${n}`);
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

/**
 * addTones with each sample taken by one of M cores at its own time offset:
 * sample n of a tone of c cycles (f = c·R/N) is A·cos(2π·c·n/N + φ + 2π·f·τ_(n mod M)).
 * The per-core phase is folded into the tone's phase once per core, so the
 * cost stays one table look-up per tone and sample.
 *
 * @param samples the record (length N), added to
 * @param tones the tones
 * @param rate R, Hz
 * @param skews τ_m of each core, s
 * @param table phaseTable(N), when one is at hand
 * @example (() => { const x = new Float64Array(4); addSkewedTones(x, [{ cycles: 1, amplitude: 1, phase: 0 }], 4, [0, 0]); return x.map((v) => Math.round(v)); })() // [1, 0, -1, 0]
 */
export function addSkewedTones(
  samples: Float64Array,
  tones: readonly SampledTone[],
  rate: number,
  skews: readonly number[],
  table: PhaseTable = phaseTable(samples.length),
): void {
  const n = samples.length;
  const m = skews.length;
  const { cos, sin } = table;
  if (cos.length !== n) throw new RangeError(`phase table of ${cos.length} entries for a record of ${n}`);
  for (const tone of tones) {
    const step = ((tone.cycles % n) + n) % n;
    const frequency = (tone.cycles * rate) / n;
    const inPhase = skews.map((tau) => tone.amplitude * Math.cos(tone.phase + 2 * Math.PI * frequency * tau));
    const quadrature = skews.map((tau) => tone.amplitude * Math.sin(tone.phase + 2 * Math.PI * frequency * tau));
    for (let i = 0, k = 0; i < n; i++) {
      const core = i % m;
      samples[i] = samples[i]! + inPhase[core]! * cos[k]! - quadrature[core]! * sin[k]!;
      k += step;
      if (k >= n) k -= n;
    }
  }
}
