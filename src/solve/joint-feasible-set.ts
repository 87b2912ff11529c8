import { hz, type Hz } from '../units/quantities.js';
import type { Band } from '../math/band.js';
import { subtractOpenKeepingPoints, type Interval } from '../math/interval-set.js';
import type { RateLimits } from '../windows/rate-window.js';
import { commonWindows, type CommonWindow } from '../windows/common-windows.js';
import { closeImageRates } from './forbidden-rates.js';

/** A closed interval of rates valid for every band together; minRate = maxRate for a single rate. */
export interface JointInterval {
  readonly minRate: Hz;
  readonly maxRate: Hz;
  /** The Nyquist zone of each band, in the order given. */
  readonly zones: readonly number[];
  /** Whether each band arrives spectrally inverted (an even zone). */
  readonly inverted: readonly boolean[];
}

/** Rates inside a common window at which two bands' aliases come closer than the spacing (an open interval). */
export interface BandCollision {
  /** Indexes of the two bands, first < second. */
  readonly first: number;
  readonly second: number;
  readonly minRate: Hz;
  readonly maxRate: Hz;
}

export interface JointFeasibleSet {
  /** The rates at which every band is whole in a zone, before the collisions are removed. */
  readonly windows: readonly CommonWindow[];
  /** The valid rates, ascending. */
  readonly feasible: readonly JointInterval[];
  /** Every collision, clipped to its window, ascending by rate. */
  readonly collisions: readonly BandCollision[];
  /** The lowest valid rate, Hz (a single exact rate when the lowest interval is a point), or null when none. */
  readonly lowestRate: Hz | null;
}

/**
 * The exact set of rates at which several bands go through one converter
 * together: each band whole in a Nyquist zone (the intersection of the
 * bands' windows) and no band's alias closer than `spacing` to another's.
 * A band is an interferer to every other: two bands' aliases come closer
 * than the spacing exactly when one band comes that close to an image
 * j·r ± the other (Akos et al. 1999; Tseng & Chou 2006), one open interval
 * of rates per image, from the solver's image algebra (`closeImageRates`).
 * No grid: every edge is one division, and a rate left alone between two
 * collisions, or between a collision and a window edge, is kept as a point.
 *
 * @param bands the bands, Hz, each already widened by its guards; at least one
 * @param spacing the least distance kept between two bands' aliases, Hz, ≥ 0
 *   (0: aliases may touch, not overlap)
 * @param limits the rates searched, Hz
 * @returns the common windows, the valid intervals with each band's zone and
 *   inversion, the collisions and the lowest valid rate
 * @throws RangeError for a band without width
 * @example jointFeasibleSet([{ low: 10e3, high: 14e3 }, { low: 15e3, high: 16e3 }], hz(0), { minRate: 20e3, maxRate: 40e3 }).lowestRate // 20000
 */
export function jointFeasibleSet(bands: readonly Band[], spacing: Hz, limits: RateLimits): JointFeasibleSet {
  const windows = commonWindows(bands, limits);
  const feasible: JointInterval[] = [];
  const collisions: BandCollision[] = [];
  for (const window of windows) {
    const searchedTo = hz(window.maxRate === Infinity ? Math.max(window.minRate, quietAbove(bands, spacing)) : window.maxRate);
    const holes: Interval[] = [];
    for (let first = 0; first < bands.length; first++) {
      for (let second = first + 1; second < bands.length; second++) {
        const other = { rateMultiple: 0, low: bands[second]!.low, high: bands[second]!.high };
        for (const hole of closeImageRates(other, spacing, bands[first]!, window.minRate, searchedTo)) {
          holes.push(hole);
          collisions.push({
            first,
            second,
            minRate: hz(Math.max(hole.low, window.minRate)),
            maxRate: hz(Math.min(hole.high, window.maxRate)),
          });
        }
      }
    }
    const inverted = window.zones.map((zone) => zone % 2 === 0);
    for (const piece of subtractOpenKeepingPoints({ low: window.minRate, high: window.maxRate }, holes)) {
      feasible.push({ minRate: hz(piece.low), maxRate: hz(piece.high), zones: window.zones, inverted });
    }
  }
  collisions.sort((a, b) => a.minRate - b.minRate);
  return { windows, feasible, collisions, lowestRate: feasible.length > 0 ? feasible[0]!.minRate : null };
}

/**
 * A rate above which no two bands in zone 1 can come closer as the rate
 * rises, Hz: there every alias is the band itself, the nearest moving image
 * r − band lies at least r − 2·(highest edge) away, and the images that do
 * not move (the bands themselves and their mirrors about DC) forbid all
 * rates or none.
 */
function quietAbove(bands: readonly Band[], spacing: Hz): number {
  return 2 * Math.max(...bands.map((b) => b.high)) + spacing;
}
