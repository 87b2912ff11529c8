import type { Scenario } from '../scenario/scenario.js';
import { deriveInterfererList } from '../interferers/derive-interferers.js';
import { levelThreshold } from '../interferers/level-threshold.js';
import type { PlanContext } from './plan-context.js';

/**
 * The solver's view of a scenario: the wanted band, guards, the converter's
 * rate range, every derived interferer (and how they were derived), the clock parts with the converter's
 * clocking (dividers, bits, aperture jitter) and the goal.
 *
 * @param scenario the validated scenario
 * @param listing the scenario that decides which interferers are listed (see deriveInterfererList; default: the scenario)
 * @example contextFromScenario(s) // { band: { low: 65e6, high: 75e6 }, limits: { minRate: 20e6, maxRate: 250e6 }, levelThreshold: -100 }
 */
export function contextFromScenario(scenario: Scenario, listing: Scenario = scenario): PlanContext {
  const derived = deriveInterfererList(scenario, listing);
  return {
    band: { low: scenario.wanted.low, high: scenario.wanted.high },
    guard: scenario.guard,
    limits: { minRate: scenario.converter.minRate, maxRate: scenario.converter.maxRate },
    interferers: derived.interferers,
    derivation: derived.summary,
    levelThreshold: levelThreshold(scenario),
    weakestLevel: scenario.wanted.weakestLevel,
    clocks: scenario.clocks,
    clocking: {
      clockDividers: scenario.converter.clockDividers,
      bits: scenario.converter.bits,
      apertureJitter: scenario.converter.apertureJitter,
    },
    goal: scenario.goal,
    tolerancePpm: scenario.requirements.tolerancePpm,
    ifShift: scenario.ifShift,
  };
}
