import type { Scenario } from '../scenario/scenario.js';
import { orderLaw } from '../interferers/converter-law.js';
import { DEFAULT_MAX_ORDER } from '../interferers/derive-interferers.js';
import { fitPolynomial } from './converter-polynomial.js';

/**
 * The scenario's converter polynomial, of degree K = max(harmonicOrder,
 * maxOrder): fitted (fitPolynomial) so that one tone at the strongest wanted
 * level shows, at each order k = 2..K, the harmonic the plan's law of that
 * order gives (orderLaw: a stated intercept of that order, else the harmonic
 * figure, an unstated order taking the lowest stated figure). With neither
 * at some order the converter is linear, as the plan then has no products
 * either.
 *
 * @param scenario the validated scenario
 * @returns a[0..K]
 * @example converterCoefficients(s).length // 6 (orders 0 to harmonicOrder 5)
 */
export function converterCoefficients(scenario: Scenario): number[] {
  const reference = scenario.wanted.strongestLevel;
  const highest = Math.max(scenario.harmonicOrder, scenario.maxOrder ?? DEFAULT_MAX_ORDER);
  const targets = new Map<number, number>();
  for (let k = 2; k <= highest; k++) {
    const law = orderLaw(scenario.converter, k, reference);
    if (law === null) return [0, 1];
    targets.set(k, 10 ** ((law.gain + k * reference) / 20));
  }
  return fitPolynomial(targets, 10 ** (reference / 20), highest);
}
