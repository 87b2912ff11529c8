import { ppm } from '../units/quantities.js';
import { sameEdge } from '../math/edge-tolerance.js';
import type { RateLimits } from '../windows/rate-window.js';
import { ZONE_EDGE } from '../solve/evaluate-rate.js';
import type { FeasibleSet } from '../solve/feasible-set.js';
import { containingInterval } from './drift-judge.js';
import type { DriftHeadroom } from './part-plan.js';

/** The limit named when a feasible interval ends at the converter's slowest or fastest rate. */
export const RATE_LIMIT = 'rate limit';

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
 * @example driftHeadroom(set, limits, 182.5e6) // { downPpm: 63013.7, downLimitedBy: 'H3 wanted', ... }
 */
export function driftHeadroom(set: FeasibleSet, limits: RateLimits, rate: number): DriftHeadroom | null {
  const index = containingInterval(set.feasible, rate, 0);
  if (index < 0) return null;
  const interval = set.feasible[index]!;
  const sameZone = set.blocked.filter((b) => b.zone === interval.zone);
  const below = sameZone.find((b) => b.minRate < b.maxRate && sameEdge(b.maxRate, interval.minRate));
  const above = sameZone.find((b) => b.minRate < b.maxRate && sameEdge(b.minRate, interval.maxRate));
  const edge = (at: number, blocker: { label: string } | undefined, limit: number) =>
    blocker ? blocker.label : sameEdge(at, limit) ? RATE_LIMIT : ZONE_EDGE;
  return {
    downPpm: ppm((1 - interval.minRate / rate) * 1e6),
    upPpm: ppm((interval.maxRate / rate - 1) * 1e6),
    downLimitedBy: edge(interval.minRate, below, limits.minRate),
    upLimitedBy: edge(interval.maxRate, above, limits.maxRate),
  };
}
