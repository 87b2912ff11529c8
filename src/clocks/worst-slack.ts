import { hz, type Ppm } from '../units/quantities.js';
import { driftRange, type PlanContext } from '../solve/plan-context.js';
import { leastMargin, zoneEdgeMarginAt } from '../solve/evaluate-rate.js';
import type { Interferer } from '../solve/interferer.js';

/**
 * The worst slack evaluateRate would report at a rate, computed from the same
 * functions (zone-edge margin at the drift ends, each blocking interferer's
 * least margin over the drift range, minus its requirement) but without
 * building the per-check report: a screen for sweeps over many failing rates.
 * The winner of a screen is judged again by evaluateRate.
 *
 * @param context the plan
 * @param blocking the plan's blocking interferers (filtered once by the caller)
 * @param rate nominal rate, Hz
 * @param tolerancePpm ± drift, ppm
 * @returns the least slack, Hz (negative: a check fails)
 * @example worstSlackAt(context, blocking, hz(182.5e6), ppm(20)) // equals evaluateRate(...).worstSlack
 */
export function worstSlackAt(context: PlanContext, blocking: readonly Interferer[], rate: number, tolerancePpm: Ppm): number {
  const drift = driftRange(hz(rate), tolerancePpm);
  const { band, guard } = context;
  const zone = Math.max(1, Math.ceil((band.low + band.high) / rate)); // bandImage's zone
  let worst = Math.min(zoneEdgeMarginAt(band, guard, zone, drift.low), zoneEdgeMarginAt(band, guard, zone, drift.high));
  for (const interferer of blocking) worst = Math.min(worst, leastMargin(interferer, band, drift) - interferer.requiredMargin);
  return worst;
}
