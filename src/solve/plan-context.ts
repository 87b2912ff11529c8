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
}

/** The converter's side of clock planning. */
export type ConverterClocking = Pick<Converter, 'clockDividers' | 'bits' | 'apertureJitter'>;
