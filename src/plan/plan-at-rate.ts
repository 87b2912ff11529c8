import type { Hz, Ppm } from '../units/quantities.js';
import type { Scenario } from '../scenario/scenario.js';
import { contextFromScenario } from '../solve/context-from-scenario.js';
import { evaluateRate, type RateEvaluation } from '../solve/evaluate-rate.js';

/**
 * The plan's exact verdict at one rate: every check judged over the given
 * drift, as the candidates of planScenario are judged.
 *
 * @param scenario a validated scenario
 * @param rate the sampling rate, Hz
 * @param tolerancePpm ± drift of that rate, ppm (0: the nominal rate only)
 * @returns the evaluation: zone, inversion, image, every check, worst margin and pass
 * @example planAtRate(heronBase, hz(184.32e6), ppm(0)).pass // true
 */
export function planAtRate(scenario: Scenario, rate: Hz, tolerancePpm: Ppm): RateEvaluation {
  return evaluateRate(contextFromScenario(scenario), rate, tolerancePpm);
}
