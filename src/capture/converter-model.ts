import type { Scenario } from '../scenario/scenario.js';
import { harmonicFigure } from '../interferers/harmonic-figure.js';
import { fitPolynomial } from './converter-polynomial.js';

/**
 * The scenario's converter polynomial: fitted (fitPolynomial) to the
 * harmonic figures of orders 2..harmonicOrder at the strongest wanted level,
 * an unstated order taking the plan's rule (harmonicFigure: the lowest
 * stated figure). With no figures at all the converter is linear, as the
 * plan then has no harmonics either.
 *
 * @param scenario the validated scenario
 * @returns a[0..K]
 * @example converterCoefficients(s).length // harmonicOrder + 1
 */
export function converterCoefficients(scenario: Scenario): number[] {
  const reference = scenario.wanted.strongestLevel;
  const targets = new Map<number, number>();
  for (let k = 2; k <= scenario.harmonicOrder; k++) {
    const figure = harmonicFigure(scenario.converter, k);
    if (figure === null) return [0, 1];
    targets.set(k, 10 ** ((reference + figure.dbc) / 20));
  }
  return fitPolynomial(targets, 10 ** (reference / 20), scenario.harmonicOrder);
}
