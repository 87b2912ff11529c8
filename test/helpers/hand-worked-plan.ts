import { guardBands } from '../../src/math/band.js';
import { db, hz, ppm, seconds } from '../../src/units/quantities.js';
import type { Interferer } from '../../src/interferers/interferer.js';
import type { PlanContext } from '../../src/solve/plan-context.js';
import { planRates, type FeasibleSet } from '../../src/solve/feasible-set.js';

export const MHZ = 1e6;

/** A converter side that adds nothing: no dividers, no aperture jitter. */
export const PLAIN_CLOCKING = { clockDividers: [1], bits: 12, apertureJitter: seconds(0) };

/** A blocking tone kept 0.5 MHz from the band: fixed (rateMultiple 0) or tied to the rate. */
export function handWorkedTone(label: string, rateMultiple: number, f: number): Interferer {
  return {
    label,
    kind: rateMultiple === 0 ? 'spur' : 'converter',
    order: null,
    source: label,
    rateMultiple,
    shiftMultiple: 0,
    low: hz(f * MHZ),
    high: hz(f * MHZ),
    level: db(-50),
    requiredMargin: hz(0.5 * MHZ),
    blocking: true,
  };
}

/**
 * The plan worked on paper in test/solve/hand-worked.test.ts (the derivation
 * is there): band 21–25 MHz, no guards, rates 10–60 MHz, a board tone at
 * 10 MHz and a rate/4 converter spur, each kept 0.5 MHz away. Feasible:
 * [20.4, 21], [25, 82/3], [35.5, 42] and [50, 60] MHz.
 */
export function handWorkedContext(overrides: Partial<PlanContext> = {}): PlanContext {
  return {
    band: { low: hz(21 * MHZ), high: hz(25 * MHZ) },
    guard: guardBands(hz(0), hz(0)),
    limits: { minRate: hz(10 * MHZ), maxRate: hz(60 * MHZ) },
    interferers: [handWorkedTone('board tone 10M', 0, 10), handWorkedTone('rate/4 spur', 1 / 4, 0)],
    levelThreshold: db(-90),
    clocks: [],
    clocking: PLAIN_CLOCKING,
    goal: { kind: 'widest-margin' },
    tolerancePpm: ppm(0),
    ...overrides,
  };
}

/** The exact feasible set of a plan, with its blocked ranges. */
export function feasibleSetOf(context: PlanContext): FeasibleSet {
  return planRates(context);
}
