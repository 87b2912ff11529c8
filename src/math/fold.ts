import { hz, type Hz } from '../units/quantities.js';
import { ceilTolerant, sameEdge } from './edge-tolerance.js';

/** Where one real frequency shows after uniform sampling. */
export interface Fold {
  /** The alias in [0, rate/2], Hz. */
  readonly alias: Hz;
  /** Nyquist zone, 1-based: zone n spans ((n−1)·rate/2, n·rate/2]. */
  readonly zone: number;
  /** Whether the zone is even, so the spectrum arrives mirrored. */
  readonly inverted: boolean;
}

/**
 * The Nyquist zone holding a frequency. A frequency exactly on a zone
 * boundary belongs to the lower zone; DC belongs to zone 1.
 *
 * @param frequency Hz, not negative
 * @param rate sampling rate in Hz, positive
 * @example nyquistZone(hz(70e6), hz(100e6)) // 2
 */
export function nyquistZone(frequency: Hz, rate: Hz): number {
  return Math.max(1, ceilTolerant((2 * frequency) / rate));
}

/**
 * Folds a frequency into the first Nyquist zone. The alias is derived from the
 * zone in one expression (odd zones shift down, even zones mirror), so a tone
 * on a zone edge lands exactly on 0 or rate/2.
 *
 * @param frequency Hz, not negative
 * @param rate sampling rate in Hz, positive
 * @returns alias in [0, rate/2], zone and inversion
 * @example foldFrequency(hz(1), hz(1.5)) // { alias: 0.5, zone: 2, inverted: true }
 */
export function foldFrequency(frequency: Hz, rate: Hz): Fold {
  const zone = nyquistZone(frequency, rate);
  const inverted = zone % 2 === 0;
  // On the zone's top edge (within tolerance) the alias is the edge itself, not the noise of a subtraction.
  if (sameEdge((2 * frequency) / rate, zone)) return { alias: hz(inverted ? 0 : rate / 2), zone, inverted };
  const alias = inverted ? (zone / 2) * rate - frequency : frequency - ((zone - 1) / 2) * rate;
  return { alias: hz(Math.min(Math.max(alias, 0), rate / 2)), zone, inverted };
}

/**
 * The other frequencies that sampling at `rate` makes indistinguishable from
 * `frequency`: k·rate ± alias for k = 0..multiples, without the frequency
 * itself, ascending.
 *
 * @param frequency Hz, not negative
 * @param rate sampling rate in Hz, positive
 * @param multiples largest k listed (≥ 1)
 * @example lookalikes(hz(1), hz(7), 2) // [6, 8, 13, 15]
 */
export function lookalikes(frequency: Hz, rate: Hz, multiples: number): Hz[] {
  const { alias } = foldFrequency(frequency, rate);
  const found: number[] = [];
  for (let k = 0; k <= multiples; k++) {
    for (const candidate of [k * rate - alias, k * rate + alias]) {
      const isSelf = Math.abs(candidate - frequency) <= 1e-12 * Math.max(rate, frequency);
      const isRepeat = found.some((f) => Math.abs(f - candidate) <= 1e-12 * rate);
      if (candidate >= 0 && !isSelf && !isRepeat) found.push(candidate);
    }
  }
  return found.sort((a, b) => a - b).map(hz);
}
