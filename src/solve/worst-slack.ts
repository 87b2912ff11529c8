import { hz, type Hz, type Ppm } from '../units/quantities.js';
import { wantedZone } from '../math/band.js';
import { channelPlans, hasChannels, type PlanContext } from './plan-context.js';
import { driftRange } from './drift.js';
import { blockingInterferers, leastMargin, zoneEdgeMarginAt } from './evaluate-rate.js';
import type { Interferer } from '../interferers/interferer.js';

/**
 * The worst slack evaluateRate would report at a rate, computed from the same
 * functions (zone-edge margin at the drift ends, each blocking interferer's
 * least margin over the drift range, minus its requirement) but without
 * building the per-check report: a screen for sweeps over many failing rates.
 * The winner of a screen is judged again by evaluateRate.
 *
 * A screen that only needs to know whether a rate beats a slack already
 * found passes it as `floor`: the first check that falls below it ends the
 * work, and the value returned is then some slack below the floor (an upper
 * bound of the worst slack), not the worst slack itself.
 *
 * A sweep of failing rates is mostly stopped by the same few checks, so a
 * screen may pass `memory`: the checks are taken in turn from the one that
 * last fell below the floor (every check still taken when none does), and
 * that one is remembered. The order changes only how soon a screen stops,
 * never the slack of a rate at or above the floor.
 *
 * With several channels, the least over the channels, each on its own
 * blocking interferers (`blocking` and `memory` are then not read).
 *
 * @param context the plan
 * @param blocking the plan's blocking interferers (filtered once by the caller)
 * @param rate nominal rate, Hz
 * @param tolerancePpm ± drift, ppm
 * @param floor stop once the slack is known to be below this, Hz (default: never stop)
 * @param memory the index in `blocking` of the check that last fell below a floor, updated (default: none kept)
 * @returns the least slack, Hz (negative: a check fails); exact when at or above the floor
 * @example worstSlackAt(handWorked, blocking, hz(26e6), ppm(0)) // 1e6 (as evaluateRate(handWorked, hz(26e6), ppm(0)).worstSlack)
 * @example worstSlackAt(handWorked, blocking, hz(26e6), ppm(0), hz(5e6)) // 1e6 (below the floor: the first check under it ends the screen)
 */
export function worstSlackAt(
  context: PlanContext,
  blocking: readonly Interferer[],
  rate: Hz,
  tolerancePpm: Ppm,
  floor = -Infinity,
  memory?: ScreenMemory,
): Hz {
  if (hasChannels(context)) {
    let worst = Infinity;
    for (const plan of channelPlans(context)) {
      if (worst < floor) break;
      worst = Math.min(worst, worstSlackAt(plan, blockingInterferers(plan.interferers), rate, tolerancePpm, floor));
    }
    return hz(worst);
  }
  const drift = driftRange(rate, tolerancePpm);
  const { band, guard } = context;
  const zone = wantedZone(band, rate);
  let worst = Math.min(zoneEdgeMarginAt(band, guard, zone, drift.low), zoneEdgeMarginAt(band, guard, zone, drift.high));
  const start = memory && memory.index < blocking.length ? memory.index : 0;
  for (let k = 0; k < blocking.length && worst >= floor; k++) {
    const i = (start + k) % blocking.length;
    const interferer = blocking[i]!;
    worst = Math.min(worst, leastMargin(interferer, band, drift) - interferer.requiredMargin);
    if (worst < floor && memory) memory.index = i;
  }
  return hz(worst);
}

/** Which blocking check last stopped a screen (see worstSlackAt). */
export interface ScreenMemory {
  index: number;
}
