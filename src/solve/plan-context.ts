import type { Db, Ppm } from '../units/quantities.js';
import type { Band, Guard } from '../math/band.js';
import type { ClockPart, Converter, Goal } from '../scenario/scenario.js';
import type { RateLimits } from '../windows/rate-window.js';
import type { Interferer } from './interferer.js';

/** Everything the solver needs, independent of how the scenario was written. */
export interface PlanContext {
  readonly band: Band;
  readonly guard: Guard;
  /** The converter's rate range searched, Hz (finite). */
  readonly limits: RateLimits;
  readonly interferers: readonly Interferer[];
  /** Weakest wanted level minus the required rejection, dBFS. */
  readonly levelThreshold: Db;
  /** The clock parts to plan; each is put forward at its best rate (src/clocks/plan-part.ts). */
  readonly clocks: readonly ClockPart[];
  /** What the part planner needs of the converter: its clock dividers, resolution and aperture jitter. */
  readonly clocking: ConverterClocking;
  readonly goal: Goal;
  /** Drift a solver-chosen rate must survive, ±ppm. */
  readonly tolerancePpm: Ppm;
}

/** The converter's side of clock planning. */
export type ConverterClocking = Pick<Converter, 'clockDividers' | 'bits' | 'apertureJitter'>;
