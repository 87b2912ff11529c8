import { hz, type Hz } from '../units/quantities.js';
import type { Band } from '../math/band.js';
import { sameEdge } from '../math/edge-tolerance.js';
import type { RateLimits } from './rate-window.js';
import { rateWindows } from './enumerate-windows.js';

/** A closed interval of rates at which every band of a set sits whole in one Nyquist zone. */
export interface CommonWindow {
  /** Lowest rate, Hz. */
  readonly minRate: Hz;
  /** Highest rate, Hz; Infinity when every band is in zone 1 and nothing limits the rate. */
  readonly maxRate: Hz;
  /** The zone of each band, in the order the bands were given. */
  readonly zones: readonly number[];
}

/**
 * The rates at which several bands each sit whole in a Nyquist zone (not
 * necessarily the same one): the intersection of every band's windows
 * (Vaughan, Scott & White 1991, per band). Each band's windows are disjoint,
 * so the intersection is a sweep over sorted lists. Two edges from different
 * bands that are equal in exact arithmetic but differ by rounding meet in a
 * single rate, kept as a window of zero width, as the twice-the-bandwidth
 * window of one band is.
 *
 * @param bands the bands, Hz, each already widened by its guards
 * @param limits rates outside [minRate, maxRate] are cut away, Hz
 * @returns the common windows ascending by rate; empty when there is none
 * @throws RangeError for a band without width
 * @example commonWindows([{ low: 10e3, high: 14e3 }, { low: 15e3, high: 16e3 }], { minRate: 20e3, maxRate: 40e3 })
 *   // [{ minRate: 20000, maxRate: 20000, zones: [2, 2] }, { minRate: 28000, maxRate: 30000, zones: [1, 2] }, { minRate: 32000, maxRate: 40000, zones: [1, 1] }]
 */
export function commonWindows(bands: readonly Band[], limits: RateLimits): CommonWindow[] {
  let common: CommonWindow[] = [{ minRate: limits.minRate, maxRate: limits.maxRate, zones: [] }];
  for (const band of bands) {
    const ascending = rateWindows(band, limits).reverse();
    common = intersect(
      common,
      ascending.map((w) => ({ minRate: w.minRate, maxRate: w.maxRate, zones: [w.zone] })),
    );
  }
  return common;
}

/** Two ascending lists of disjoint windows intersected, zones concatenated. */
function intersect(first: readonly CommonWindow[], second: readonly CommonWindow[]): CommonWindow[] {
  const out: CommonWindow[] = [];
  let i = 0;
  let k = 0;
  while (i < first.length && k < second.length) {
    const a = first[i]!;
    const b = second[k]!;
    const low = Math.max(a.minRate, b.minRate);
    const high = Math.min(a.maxRate, b.maxRate);
    const zones = [...a.zones, ...b.zones];
    if (low <= high) out.push({ minRate: hz(low), maxRate: hz(high), zones });
    else if (sameEdge(low, high)) out.push({ minRate: hz(low), maxRate: hz(low), zones });
    if (a.maxRate < b.maxRate) i++;
    else k++;
  }
  return out;
}
