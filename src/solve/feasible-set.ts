import type { Hz } from '../units/quantities.js';
import { hz } from '../units/quantities.js';
import type { Band } from '../math/band.js';
import { subtractOpenKeepingPoints, type Interval } from '../math/interval-set.js';
import { commonWindows } from '../windows/common-windows.js';
import { channelCheckLabel } from './limited-by.js';
import type { RateLimits, RateWindow } from '../windows/rate-window.js';
import { guardedBand, rateWindows } from '../windows/enumerate-windows.js';
import { forbiddenRates } from './forbidden-rates.js';
import type { Interferer } from '../interferers/interferer.js';
import { channelPlans, hasChannels, type PlanContext } from './plan-context.js';

/** A closed interval of rates where the band fits and nothing blocking lands near it. */
export interface FeasibleInterval {
  readonly zone: number;
  readonly inverted: boolean;
  readonly minRate: Hz;
  readonly maxRate: Hz;
  /** With several channels, the zone of each channel in order (`zone` is the first one's); absent for one band. */
  readonly channelZones?: readonly number[];
  /** With several channels, whether each arrives inverted (`inverted` is the first one's); absent for one band. */
  readonly channelInverted?: readonly boolean[];
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
 * interferer's forbidden rates. A rate left alone between two forbidden
 * (open) intervals, or between one and a window edge, is kept as a single
 * point (subtractOpenKeepingPoints), the same rule as for several channels.
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
    for (const piece of subtractOpenKeepingPoints({ low: window.minRate, high: window.maxRate }, holes)) {
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
 * feasible set in those windows. A plan of several channels goes through
 * channelsFeasibleSet.
 *
 * @param plan the wanted band, guards, rate limits and interferers (a PlanContext)
 * @param limits the rates searched, Hz (default: the plan's own limits)
 * @returns the windows, the feasible intervals and the blocked ranges
 * @example planRates(handWorked).feasible.length // 4 ([20.4, 21], [25, 82/3], [35.5, 42], [50, 60] MHz)
 */
export function planRates(
  plan: Pick<PlanContext, 'band' | 'guard' | 'limits' | 'interferers' | 'channels'>,
  limits: RateLimits = plan.limits,
): PlanRates {
  if (hasChannels(plan)) return channelsFeasibleSet(plan, limits);
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

/**
 * The exact feasible set of several channels together: the intersection of
 * each channel's own feasible set. The rates at which every channel's guarded
 * band sits whole in a zone (commonWindows), minus, for every channel, every
 * blocking interferer's forbidden rates against that channel (the other
 * channels among them, kind 'channel', at the channel's spacing): one
 * algebra, one division per edge, no grid. A rate left alone between two
 * forbidden intervals, or between one and a window edge, is kept as a single
 * point (subtractOpenKeepingPoints), as a lowest valid rate can be one.
 *
 * @param plan the channels (each with its band, guards and interferers) and the rate limits
 * @param limits the rates searched, Hz (default: the plan's own limits)
 * @returns the common windows (zone and inversion of the first channel, channelZones of all),
 *   the feasible intervals with each channel's zone and inversion, and the blocked ranges
 *   labelled `channel: interferer`
 * @example channelsFeasibleSet({ ...handWorked, channels: [{ ...handWorked, label: 'A' }, { ...handWorked, label: 'B', band: { low: hz(40e6), high: hz(42e6) }, interferers: [] }] }).feasible.length > 0 // true
 */
export function channelsFeasibleSet(
  plan: Pick<PlanContext, 'band' | 'guard' | 'limits' | 'interferers' | 'channels'>,
  limits: RateLimits = plan.limits,
): PlanRates {
  const channels = channelPlans(plan);
  const common = commonWindows(
    channels.map((c) => guardedBand(c.band, c.guard)),
    limits,
  );
  const feasible: FeasibleInterval[] = [];
  const blocked: BlockedRange[] = [];
  for (const window of common) {
    const zone = window.zones[0]!;
    const holes: Interval[] = [];
    for (const channel of channels) {
      for (const interferer of channel.interferers) {
        if (!interferer.blocking) continue;
        for (const hole of forbiddenRates(interferer, channel.band, window.minRate, window.maxRate)) {
          holes.push(hole);
          blocked.push({
            label: channelCheckLabel(channel.label ?? '', interferer.label),
            zone,
            minRate: hz(Math.max(hole.low, window.minRate)),
            maxRate: hz(Math.min(hole.high, window.maxRate)),
          });
        }
      }
    }
    const channelInverted = window.zones.map((z) => z % 2 === 0);
    for (const piece of subtractOpenKeepingPoints({ low: window.minRate, high: window.maxRate }, holes)) {
      feasible.push({
        zone,
        inverted: channelInverted[0]!,
        minRate: hz(piece.low),
        maxRate: hz(piece.high),
        channelZones: window.zones,
        channelInverted,
      });
    }
  }
  const windows: RateWindow[] = common.map((w) => ({
    zone: w.zones[0]!,
    minRate: w.minRate,
    maxRate: w.maxRate,
    inverted: w.zones[0]! % 2 === 0,
    channelZones: w.zones,
  }));
  blocked.sort((a, b) => a.minRate - b.minRate);
  return { windows, feasible, blocked };
}
