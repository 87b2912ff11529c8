import { hz, type Hz } from '../units/quantities.js';
import { sameEdge } from './edge-tolerance.js';

/** A real frequency band [low, high], Hz. */
export interface Band {
  readonly low: Hz;
  readonly high: Hz;
}

declare const guardBrand: unique symbol;

/**
 * Guard bands below and above a band, Hz: room for the anti-alias filter's
 * transitions. Not a band: a guard is made by guardBands, so that a band is
 * never passed where a guard is expected (the two have the same fields).
 */
export interface Guard {
  readonly low: Hz;
  readonly high: Hz;
  readonly [guardBrand]: 'guard';
}

/**
 * A guard of `low` below the band and `high` above it.
 *
 * @param low guard below the band, Hz, ≥ 0
 * @param high guard above the band, Hz, ≥ 0
 * @returns the guard
 * @example guardBands(hz(2e6), hz(1e6)) // { low: 2000000, high: 1000000 }
 */
export function guardBands(low: Hz, high: Hz): Guard {
  return { low, high } as Guard;
}

/** A band after sampling: its zone and its image inside [0, rate/2]. */
export interface BandImage extends Band {
  readonly zone: number;
  readonly inverted: boolean;
}

/**
 * The Nyquist zone of a band's centre at a rate, ⌈(low + high)/rate⌉, at least 1:
 * the zone the band occupies when it fits in one, and the zone its checks are
 * measured in when it straddles.
 *
 * @param band the band, Hz
 * @param rate sampling rate, Hz
 * @returns the zone, 1-based
 * @example wantedZone({ low: hz(60e6), high: hz(80e6) }, hz(100e6)) // 2
 */
export function wantedZone(band: Band, rate: Hz): number {
  return Math.max(1, Math.ceil((band.low + band.high) / rate));
}

/**
 * Where a whole band lands after sampling, or null when it straddles a zone
 * boundary (then its image folds onto itself). Edges on a boundary count as
 * inside. The image keeps low < high; `inverted` says it is mirrored.
 *
 * @param band the band, Hz
 * @param rate sampling rate, Hz
 * @example bandImage({ low: hz(60e6), high: hz(80e6) }, hz(100e6)) // { zone: 2, inverted: true, low: 20e6, high: 40e6 }
 */
export function bandImage(band: Band, rate: Hz): BandImage | null {
  const zone = wantedZone(band, rate);
  const zoneLow = ((zone - 1) * rate) / 2;
  const zoneHigh = (zone * rate) / 2;
  const fits = (band.low >= zoneLow || sameEdge(band.low, zoneLow)) && (band.high <= zoneHigh || sameEdge(band.high, zoneHigh));
  if (!fits) return null;
  const inverted = zone % 2 === 0;
  const clamp = (f: number) => hz(Math.min(Math.max(f, 0), rate / 2));
  if (inverted) {
    const shift = (zone / 2) * rate;
    return { zone, inverted, low: clamp(shift - band.high), high: clamp(shift - band.low) };
  }
  const shift = ((zone - 1) / 2) * rate;
  return { zone, inverted, low: clamp(band.low - shift), high: clamp(band.high - shift) };
}

/**
 * Widens a band by its guard bands; a lower guard reaching below DC stops at
 * DC (the band is then low-pass and only zone 1 can hold it).
 *
 * @param band the wanted band, Hz
 * @param guard its guards, Hz
 * @returns the guarded band, Hz
 * @example guardedBand({ low: hz(60e6), high: hz(80e6) }, guardBands(hz(1e6), hz(3e6))) // { low: 59000000, high: 83000000 }
 */
export function guardedBand(band: Band, guard: Guard): Band {
  return { low: hz(Math.max(0, band.low - guard.low)), high: hz(band.high + guard.high) };
}
