import { fractionOf, hz, ppm, ppmOf, type Hz, type Ppm } from '../units/quantities.js';
import { sameEdge } from '../math/edge-tolerance.js';
import type { Interval } from '../math/interval-set.js';
import type { RateLimits } from '../windows/rate-window.js';
import { interfererLimit, RATE_LIMIT, ZONE_EDGE, type Limit } from './limited-by.js';
import type { FeasibleInterval, FeasibleSet } from './feasible-set.js';

/**
 * A clock's drift: every question the solver and the part planner ask about a
 * rate that may run anywhere in r·(1 ± ε), ε = tolerance·10⁻⁶ (crystal
 * tolerance as quoted in ppm). The range itself is computed here once
 * (driftRange); everything else reads it.
 */

/** How far a rate may drift each way before its first check fails, ±ppm, and which check fails there. */
export interface DriftHeadroom {
  readonly downPpm: Ppm;
  readonly upPpm: Ppm;
  /** The check that fails first below: an interferer, the zone edge or the converter's rate limit. */
  readonly downLimitedBy: Limit;
  readonly upLimitedBy: Limit;
}

/**
 * The factors a drifting rate is multiplied by at its ends: 1 − ε and 1 + ε.
 *
 * @param tolerancePpm ± drift, ppm
 * @returns the two factors (dimensionless)
 * @example driftFactors(ppm(20)) // { down: 0.99998, up: 1.00002 }
 */
export function driftFactors(tolerancePpm: Ppm): { readonly down: number; readonly up: number } {
  const epsilon = fractionOf(tolerancePpm);
  return { down: 1 - epsilon, up: 1 + epsilon };
}

/**
 * The rates a clock at `rate` may take over its ±tolerance: [r·(1 − ε), r·(1 + ε)].
 *
 * @param rate nominal rate, Hz
 * @param tolerancePpm ± drift, ppm
 * @returns the drift range's ends, Hz
 * @example driftRange(hz(100e6), ppm(20)) // { low: 99998000, high: 100002000 }
 */
export function driftRange(rate: Hz, tolerancePpm: Ppm): { low: Hz; high: Hz } {
  const { down, up } = driftFactors(tolerancePpm);
  return { low: hz(rate * down), high: hz(rate * up) };
}

/**
 * The nominal rates of a range (a feasible interval, the converter's rate
 * limits) whose whole drift range stays inside it: [low/(1 − ε), high/(1 + ε)],
 * stepped in where rounding left a drift end (as driftRange computes it)
 * outside.
 *
 * @param interval the range, Hz
 * @param tolerancePpm ± drift, ppm
 * @returns the nominal rates, Hz; null when the drift is wider than the range
 * @example driftSafeRange({ minRate: hz(99e6), maxRate: hz(101e6) }, ppm(10000)) // { low: 100e6, high: 100e6 } (up to an ulp)
 */
export function driftSafeRange(interval: { readonly minRate: Hz; readonly maxRate: Hz }, tolerancePpm: Ppm): Interval | null {
  const { down, up } = driftFactors(tolerancePpm);
  let low = interval.minRate / down;
  let high = interval.maxRate / up;
  // (x/(1 − ε))·(1 − ε) may round an ulp below x, putting the drift end inside the open forbidden interval beyond the edge: step in.
  while (driftRange(hz(low), tolerancePpm).low < interval.minRate) low += low * Number.EPSILON;
  while (driftRange(hz(high), tolerancePpm).high > interval.maxRate) high -= high * Number.EPSILON;
  return low <= high ? { low, high } : null;
}

/**
 * The rate range a drifting clock may reach when its nominal rate lies in
 * `limits`: [min·(1 − ε), max·(1 + ε)].
 *
 * @param limits the nominal rates, Hz
 * @param tolerancePpm ± drift, ppm
 * @returns the widened range, Hz
 * @example driftReach({ minRate: hz(100e6), maxRate: hz(200e6) }, ppm(10)) // { minRate: 99999000, maxRate: 200002000 }
 */
export function driftReach(limits: RateLimits, tolerancePpm: Ppm): RateLimits {
  return { minRate: driftRange(limits.minRate, tolerancePpm).low, maxRate: driftRange(limits.maxRate, tolerancePpm).high };
}

/**
 * The fast judge used by sweeps: the index of the feasible interval that
 * holds a rate's whole drift range, found by binary search, or −1 when no
 * single interval holds it. The verdict matches the exact evaluator's except
 * where a drift end lies within rounding of an interval edge, and at the
 * converter's range, which the feasible set ends at and evaluateRate ignores
 * (a rate on the fastest rate fails here once it may drift above it). Sweeps
 * use this; the winners are judged again by evaluateRate.
 *
 * @param feasible the exact feasible set: sorted, disjoint, closed intervals, Hz
 * @param rate nominal rate, Hz
 * @param tolerancePpm ± drift, ppm
 * @returns the interval's index, or −1
 * @example containingInterval([{ zone: 1, inverted: false, minRate: hz(100e6), maxRate: hz(110e6) }], hz(105e6), ppm(20)) // 0
 */
export function containingInterval(feasible: readonly FeasibleInterval[], rate: Hz, tolerancePpm: Ppm): number {
  const { low, high } = driftRange(rate, tolerancePpm);
  // The last interval starting at or below the drift range's low end is the only one that can hold it.
  let first = 0;
  let last = feasible.length - 1;
  let found = -1;
  while (first <= last) {
    const middle = (first + last) >> 1;
    if (feasible[middle]!.minRate <= low) {
      found = middle;
      first = middle + 1;
    } else {
      last = middle - 1;
    }
  }
  return found >= 0 && high <= feasible[found]!.maxRate ? found : -1;
}

/**
 * How far a rate may move down and up, ppm of the nominal rate, before its
 * first check fails, and which check: the feasible interval holding the rate
 * ends where a blocked range begins (that interferer's label), at a window
 * edge ("zone edge": the guarded band would cross a fold edge), or at the
 * converter's range ("rate limit"). Each figure comes from one division.
 *
 * @param set the exact feasible set with its blocked ranges
 * @param limits the converter's rate range searched, Hz
 * @param rate the nominal rate, Hz
 * @returns the headroom, or null when the nominal rate itself is in no feasible interval
 * @example driftHeadroom(handWorkedSet, { minRate: hz(20e6), maxRate: hz(60e6) }, hz(26e6)) // { downPpm: 38461.5, upPpm: 51282.1, downLimitedBy: { kind: 'zone edge' }, upLimitedBy: { kind: 'interferer', label: 'rate/4 spur' } }
 */
export function driftHeadroom(set: FeasibleSet, limits: RateLimits, rate: Hz): DriftHeadroom | null {
  const index = containingInterval(set.feasible, rate, ppm(0));
  if (index < 0) return null;
  const interval = set.feasible[index]!;
  const sameZone = set.blocked.filter((b) => b.zone === interval.zone);
  const below = sameZone.find((b) => b.minRate < b.maxRate && sameEdge(b.maxRate, interval.minRate));
  const above = sameZone.find((b) => b.minRate < b.maxRate && sameEdge(b.minRate, interval.maxRate));
  const edge = (at: number, blocker: { label: string } | undefined, limit: number): Limit =>
    blocker ? interfererLimit(blocker.label) : sameEdge(at, limit) ? RATE_LIMIT : ZONE_EDGE;
  return {
    downPpm: ppmOf(1 - interval.minRate / rate),
    upPpm: ppmOf(interval.maxRate / rate - 1),
    downLimitedBy: edge(interval.minRate, below, limits.minRate),
    upLimitedBy: edge(interval.maxRate, above, limits.maxRate),
  };
}
