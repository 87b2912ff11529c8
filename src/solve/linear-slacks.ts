import type { Band, Guard } from '../math/band.js';
import type { Interval } from '../math/interval-set.js';
import { imageOffsets, nearbyImages, normalisedExtent } from './fold-images.js';
import type { Interferer } from '../interferers/interferer.js';
import { driftFactors } from './drift.js';
import { hz, type Ppm } from '../units/quantities.js';
import { guardedBand } from '../windows/enumerate-windows.js';
import { channelPlans, type PlanContext } from './plan-context.js';
import type { FeasibleInterval } from './feasible-set.js';

/** t ≤ slope·r + offset: one slack that is linear in the rate inside an interval, Hz. */
export interface LinearSlack {
  readonly slope: number;
  readonly offset: number;
}

/**
 * The linear slacks of a whole plan inside one feasible interval: the
 * plan's band in the interval's zone (linearSlacks); with several channels,
 * every channel's, each in its own zone, together (the worst over channels is
 * the least of them all).
 *
 * @param context the plan
 * @param interval the feasible interval (its zone, or its channelZones)
 * @param range the nominal rates allowed, Hz
 * @param tolerancePpm ± drift of the rate, ppm
 * @returns the slacks, t ≤ slope·r + offset, Hz
 * @example planSlacks({ ...handWorked, interferers: [] }, { zone: 2, inverted: true, minRate: hz(30e6), maxRate: hz(40e6) }, { low: 30e6, high: 40e6 }, ppm(0)).length // 4
 */
export function planSlacks(context: PlanContext, interval: FeasibleInterval, range: Interval, tolerancePpm: Ppm): LinearSlack[] {
  return channelPlans(context).flatMap((plan, i) =>
    linearSlacks(
      plan.band,
      plan.guard,
      interval.channelZones?.[i] ?? interval.zone,
      plan.interferers.filter((interferer) => interferer.blocking),
      range,
      tolerancePpm,
    ),
  );
}

/**
 * The slacks (margin − requirement, Hz) that bound the worst margin at rate
 * r inside one feasible interval of zone n, each linear in r: inside a
 * feasible interval no blocking extent overlaps an image, so each image stays
 * on one side of each extent and its gap is linear. Each is taken at both
 * drift ends r·(1 ± ε), which keeps it linear in the nominal rate.
 *
 * @param band the wanted band, Hz
 * @param guard its guards, Hz
 * @param zone the interval's Nyquist zone
 * @param blocking the blocking interferers
 * @param range the nominal rates allowed (drift ends inside the interval), Hz
 * @param tolerancePpm ± drift of the rate, ppm
 * @returns the slacks, t ≤ slope·r + offset, Hz
 * @example linearSlacks(handWorked.band, handWorked.guard, 2, [], { low: 30e6, high: 40e6 }, ppm(0)).length // 4 (two zone edges at each drift end)
 */
export function linearSlacks(
  band: Band,
  guard: Guard,
  zone: number,
  blocking: readonly Interferer[],
  range: Interval,
  tolerancePpm: Ppm,
): LinearSlack[] {
  const { down, up } = driftFactors(tolerancePpm);
  const scales = [down, up];
  const middle = (range.low + range.high) / 2;
  const slacks: LinearSlack[] = [];
  const guarded = guardedBand(band, guard);
  for (const k of scales) {
    slacks.push({ slope: (-(zone - 1) * k) / 2, offset: guarded.low });
    slacks.push({ slope: (zone * k) / 2, offset: -guarded.high });
  }
  const ceiling = range.high / 4;
  for (const interferer of blocking) {
    const extent = normalisedExtent(interferer);
    const reach = interferer.requiredMargin;
    for (const term of nearbyImages(extent, band, reach, hz(range.low * down), hz(range.high * up))) {
      const image = imageOffsets(band, term.side);
      const above = term.slope * middle + image.low >= extent.high;
      for (const k of scales) {
        const slack = above
          ? { slope: term.slope * k, offset: image.low - extent.high - reach }
          : { slope: -term.slope * k, offset: extent.low - image.high - reach };
        const atEnds = Math.min(slack.slope * range.low + slack.offset, slack.slope * range.high + slack.offset);
        if (atEnds <= ceiling) slacks.push(slack);
      }
    }
  }
  return slacks;
}
