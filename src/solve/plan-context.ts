import type { Db, Hz, Ppm } from '../units/quantities.js';
import type { Band, Guard } from '../math/band.js';
import type { ClockPart, Converter, Goal } from '../scenario/scenario.js';
import type { RateLimits } from '../windows/rate-window.js';
import type { Interferer } from '../interferers/interferer.js';
import type { DerivationSummary } from '../interferers/derive-interferers.js';

/** Everything the solver needs, independent of how the scenario was written. */
export interface PlanContext {
  readonly band: Band;
  readonly guard: Guard;
  /** The converter's rate range searched, Hz (finite). */
  readonly limits: RateLimits;
  readonly interferers: readonly Interferer[];
  /** Weakest wanted level minus the required rejection, dBFS. */
  readonly levelThreshold: Db;
  /** Weakest wanted level at which the requirements apply, dBFS; absent for a plan built by hand. */
  readonly weakestLevel?: Db;
  /** Strongest wanted level, dBFS; absent for a plan built by hand. */
  readonly strongestLevel?: Db;
  /** The clock parts to plan; each is put forward at its best rate (src/clocks/plan-part.ts). */
  readonly clocks: readonly ClockPart[];
  /** What the part planner needs of the converter: its clock dividers, resolution and aperture jitter. */
  readonly clocking: ConverterClocking;
  readonly goal: Goal;
  /** Drift a solver-chosen rate must survive, ±ppm. */
  readonly tolerancePpm: Ppm;
  /** How far the IF may move (the band and LO-converted sources by δ), Hz; absent or null when the LO is fixed. */
  readonly ifShift?: { readonly low: Hz; readonly high: Hz } | null;
  /** How the interferer list was made (generated, pruned); absent for a plan built by hand. */
  readonly derivation?: DerivationSummary;
  /**
   * With two channels or more, each channel's side of the plan, in the
   * scenario's order (the first is also `band`, `guard`, `interferers`, …);
   * absent or of length 1 for one wanted band.
   */
  readonly channels?: readonly ChannelContext[];
}

/** One channel's side of a plan of several channels: its band, guards and the interferers derived against it. */
export interface ChannelContext {
  readonly label: string;
  readonly band: Band;
  readonly guard: Guard;
  /** Derived against this channel: every other channel among them (kind 'channel'). */
  readonly interferers: readonly Interferer[];
  /** This channel's weakest level minus its required rejection, dBFS. */
  readonly levelThreshold: Db;
  readonly weakestLevel?: Db;
  readonly strongestLevel?: Db;
  readonly derivation?: DerivationSummary;
}

/**
 * Whether a plan has several channels (each judged on its own, the plan on the worst).
 *
 * @param context the plan
 * @returns true with two channels or more
 * @example hasChannels(handWorked) // false
 */
export function hasChannels(context: Pick<PlanContext, 'channels'>): boolean {
  return (context.channels?.length ?? 0) > 1;
}

/**
 * Each channel of a plan as a plan of one wanted band: the plan with that
 * channel's band, guards, interferers and threshold. A plan of one wanted
 * band gives itself.
 *
 * @param context the plan
 * @returns one plan per channel, in order
 * @example channelPlans(handWorked).length // 1
 */
export function channelPlans<T extends Pick<PlanContext, 'channels'>>(context: T): Array<T & Partial<ChannelContext>> {
  if (!hasChannels(context)) return [context];
  return context.channels!.map((channel) => ({ ...context, ...channel, channels: undefined }));
}

/** The converter's side of clock planning. */
export type ConverterClocking = Pick<Converter, 'clockDividers' | 'bits' | 'apertureJitter'>;
