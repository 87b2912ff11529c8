import { hz, ppm, type Hz } from '../../src/units/quantities.js';
import type { Scenario } from '../../src/scenario/scenario.js';
import { contextFromScenario } from '../../src/solve/context-from-scenario.js';
import { solvePlan } from '../../src/plan/solve-plan.js';
import { evaluateRate } from '../../src/solve/evaluate-rate.js';

const MHZ = 1e6;

/** Where a real frequency shows after sampling: |f − R·round(f/R)| (definition of aliasing; common practice, no source). */
export const alias = (f: number, rate: number) => Math.abs(f - rate * Math.round(f / rate));

/** The rates the solver puts forward that pass, best first. */
export function passingRates(scenario: Scenario): Hz[] {
  return solvePlan(contextFromScenario(scenario))
    .candidates.filter((c) => c.evaluation.pass)
    .map((c) => c.evaluation.rate);
}

/**
 * A rate inside a legal window where the plan itself fails a wanted
 * harmonic (its extent meets the band, judged by evaluateRate) and the
 * band-centre tone's harmonic lands well inside the wanted image, away from
 * the tone: searched on a grid of 400 rates per window.
 */
export function badRate(scenario: Scenario): { rate: Hz; order: number } {
  const context = contextFromScenario(scenario);
  const centre = (scenario.wanted.low + scenario.wanted.high) / 2;
  for (const window of solvePlan(context).windows) {
    const top = Number.isFinite(window.maxRate) ? window.maxRate : context.limits.maxRate;
    for (let i = 1; i < 400; i++) {
      const rate = hz(window.minRate + ((top - window.minRate) * i) / 400);
      const evaluation = evaluateRate(context, rate, ppm(0));
      if (!evaluation.image) continue;
      for (const order of [2, 3]) {
        const check = evaluation.checks.find((c) => c.label === `H${order} wanted`);
        const where = alias(order * centre, rate);
        const inside = where > evaluation.image.low + 2 * MHZ && where < evaluation.image.high - 2 * MHZ;
        if (check && !check.pass && inside && Math.abs(where - alias(centre, rate)) > 1 * MHZ) return { rate, order };
      }
    }
  }
  throw new Error('no bad rate found');
}
