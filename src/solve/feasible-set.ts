import type { Hz } from '../units/quantities.js';
import { hz } from '../units/quantities.js';
import type { Band } from '../math/band.js';
import { subtractOpen, type Interval } from '../math/interval-set.js';
import type { RateLimits, RateWindow } from '../windows/rate-window.js';
import { guardedBand, rateWindows } from '../windows/enumerate-windows.js';
import { forbiddenRates } from './forbidden-rates.js';
import type { Interferer } from '../interferers/interferer.js';
import type { PlanContext } from './plan-context.js';

/** A closed interval of rates where the band fits and nothing blocking lands near it. */
export interface FeasibleInterval {
  readonly zone: number;
  readonly inverted: boolean;
  readonly minRate: Hz;
  readonly maxRate: Hz;
}

/** Rates inside a window at which one interferer lands too close (an open interval). */
export interface BlockedRange {
  /** Label of the interferer that blocks. */
  readonly label: string;
  readonly zone: number;
  readonly minRate: Hz;
  readonly maxRate: Hz;
}

export interface FeasibleSet {
  readonly feasible: readonly FeasibleInterval[];
  /** Every blocked range, clipped to its window, ascending by rate. */
  readonly blocked: readonly BlockedRange[];
}

/**
 * The exact feasible set: the legal windows minus every blocking
 * interferer's forbidden rates.
 *
 * @param windows legal windows with finite edges, Hz
 * @param interferers all interferers; only blocking ones remove rates
 * @param band the wanted band (unguarded), Hz
 * @returns feasible intervals ascending by rate, and the blocked ranges
 * @example feasibleSet(planWindows(handWorked), handWorked.interferers, handWorked.band).feasible.map((f) => f.minRate) // [20.4e6, 25e6, 35.5e6, 50e6]
 */
export function feasibleSet(windows: readonly RateWindow[], interferers: readonly Interferer[], band: Band): FeasibleSet {
  const feasible: FeasibleInterval[] = [];
  const blocked: BlockedRange[] = [];
  const blocking = interferers.filter((i) => i.blocking);
  for (const window of windows) {
    const holes: Interval[] = [];
    for (const interferer of blocking) {
      for (const hole of forbiddenRates(interferer, band, window.minRate, window.maxRate)) {
        holes.push(hole);
        blocked.push({
          label: interferer.label,
          zone: window.zone,
          minRate: hz(Math.max(hole.low, window.minRate)),
          maxRate: hz(Math.min(hole.high, window.maxRate)),
        });
      }
    }
    for (const piece of subtractOpen({ low: window.minRate, high: window.maxRate }, holes)) {
      feasible.push({ zone: window.zone, inverted: window.inverted, minRate: hz(piece.low), maxRate: hz(piece.high) });
    }
  }
  const byRate = <T extends { minRate: number }>(a: T, b: T) => a.minRate - b.minRate;
  return { feasible: feasible.sort(byRate), blocked: blocked.sort(byRate) };
}

/** A plan's legal windows and its exact feasible set in them. */
export interface PlanRates extends FeasibleSet {
  readonly windows: readonly RateWindow[];
}

/**
 * The one chain from a plan to its rates: the band widened by its guards, the
 * legal windows of that guarded band inside the rate limits, and the exact
 * feasible set in those windows.
 *
 * @param plan the wanted band, guards, rate limits and interferers (a PlanContext)
 * @param limits the rates searched, Hz (default: the plan's own limits)
 * @returns the windows, the feasible intervals and the blocked ranges
 * @example planRates(handWorked).feasible.length // 4 ([20.4, 21], [25, 82/3], [35.5, 42], [50, 60] MHz)
 */
export function planRates(
  plan: Pick<PlanContext, 'band' | 'guard' | 'limits' | 'interferers'>,
  limits: RateLimits = plan.limits,
): PlanRates {
  const windows = planWindows(plan, limits);
  return { windows, ...feasibleSet(windows, plan.interferers, plan.band) };
}

/**
 * The first link of planRates alone: the legal windows of the plan's guarded band.
 *
 * @param plan the wanted band, guards and rate limits
 * @param limits the rates searched, Hz (default: the plan's own limits)
 * @returns the windows, ascending by rate
 * @example planWindows(handWorked).map((w) => w.zone) // [1, 2, 3, 4, 5]
 */
export function planWindows(plan: Pick<PlanContext, 'band' | 'guard' | 'limits'>, limits: RateLimits = plan.limits): RateWindow[] {
  return rateWindows(guardedBand(plan.band, plan.guard), limits);
}
