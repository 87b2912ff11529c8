import { describe, expect, it } from 'vitest';
import { readdirSync } from 'node:fs';
import { hz, ppm } from '../../src/units/quantities.js';
import { readScenarioFile } from '../../src/cli/read-scenario.js';
import { contextFromScenario } from '../../src/solve/context-from-scenario.js';
import { planRates } from '../../src/solve/feasible-set.js';
import { evaluateRate } from '../../src/solve/evaluate-rate.js';
import { planPart, SEARCH_ALLOWANCE } from '../../src/clocks/plan-part.js';
import { everySetting } from './part-fixtures.js';

/**
 * The demo family's parts (invented Heron data, scenarios/heron-*.json)
 * planned on every variant, against exhaustive enumeration of every setting
 * judged by the exact evaluator. The demo files change as the catalogue
 * grows; these tests assert relations, not figures.
 */
const files = readdirSync('scenarios')
  .filter((name) => /^heron-.*\.json$/.test(name))
  .sort();

describe.each(files)('the parts of %s', (file) => {
  const scenario = readScenarioFile(`scenarios/${file}`);
  const context = contextFromScenario(scenario);
  const set = planRates(context);
  const bandwidth = context.band.high - context.band.low;

  it.each(context.clocks.map((p) => [p.label, p] as const))('%s: the planner finds the best of every setting', (_label, part) => {
    const settings = everySetting(part, context.clocking.clockDividers, context.limits.minRate, context.limits.maxRate, 'whole drift');
    if (settings.length === 0) {
      expect(planPart(context, set, part)).toBeNull();
      return;
    }
    let bestPassing = -Infinity;
    let bestAny = -Infinity;
    const seen = new Map<number, number>();
    for (const s of settings) {
      if (seen.has(s.rate)) continue;
      const e = evaluateRate(context, hz(s.rate), ppm(part.tolerancePpm));
      seen.set(s.rate, e.worstSlack);
      bestAny = Math.max(bestAny, e.worstSlack);
      if (e.pass) bestPassing = Math.max(bestPassing, e.worstSlack);
    }
    for (const options of [{}, { everyRateUpTo: 0, enumerateUpTo: 0 }]) {
      const plan = planPart(context, set, part, options)!;
      expect(plan.pass).toBe(bestPassing > -Infinity);
      expect(seen.get(plan.rate), 'the rate is one of the part’s').toBeDefined();
      if (plan.pass) {
        expect(plan.evaluation.worstSlack).toBeLessThanOrEqual(bestPassing);
        expect(plan.evaluation.worstSlack).toBeGreaterThanOrEqual(bestPassing - 1.01 * SEARCH_ALLOWANCE * bandwidth);
      } else if (plan.search === 'every rate') {
        expect(plan.evaluation.worstSlack).toBeCloseTo(bestAny, 6);
      }
    }
  });
});
