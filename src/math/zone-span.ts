import type { Hz } from '../units/quantities.js';
import type { Band } from './band.js';
import { floorTolerant } from './edge-tolerance.js';

/**
 * Most rate windows one question may hold. A window costs the solver a
 * search of every interferer's images; ten thousand windows already take
 * seconds, and no real design needs that many (each is a Nyquist zone).
 */
export const MOST_WINDOWS = 10_000;

/** The Nyquist zones whose rate windows can meet a rate range: first ≤ n ≤ last (empty when last < first). */
export interface ZoneSpan {
  readonly first: number;
  readonly last: number;
}

/**
 * The zones n whose window 2·high/n ≤ rate ≤ 2·low/(n − 1) (Vaughan, Scott &
 * White 1991) can meet [minRate, maxRate], found from the limits rather than
 * by walking every zone: the window's upper edge reaches minRate only when
 * n ≤ 1 + 2·low/minRate, its lower edge stays under maxRate only when
 * n ≥ 2·high/maxRate. One zone of slack on each side leaves the exact edge
 * test to the caller; never beyond the highest zone, ⌊high/width⌋.
 *
 * @param band the band, Hz, 0 ≤ low < high
 * @param minRate lowest rate, Hz, ≥ 0
 * @param maxRate highest rate, Hz (may be Infinity)
 * @returns the zone span; its size (last − first + 1) is the work of enumerating it
 * @example zoneSpan({ low: hz(10e3), high: hz(14e3) }, hz(0), hz(Infinity)) // { first: 1, last: 3 }
 */
export function zoneSpan(band: Band, minRate: Hz, maxRate: Hz): ZoneSpan {
  const highestZone = Math.max(1, floorTolerant(band.high / (band.high - band.low)));
  const first = Math.max(1, Math.floor((2 * band.high) / maxRate) - 1);
  const last = minRate > 0 ? Math.min(highestZone, Math.floor(1 + (2 * band.low) / minRate) + 1) : highestZone;
  return { first, last };
}

/**
 * How many windows a rate range holds for a band, at most (see zoneSpan).
 *
 * @example windowCount({ low: hz(10e3), high: hz(14e3) }, hz(0), hz(Infinity)) // 3
 */
export function windowCount(band: Band, minRate: Hz, maxRate: Hz): number {
  const { first, last } = zoneSpan(band, minRate, maxRate);
  return Math.max(0, last - first + 1);
}
