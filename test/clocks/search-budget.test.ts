import { describe, expect, it, vi } from 'vitest';
import fc from 'fast-check';
import { hz, ppm, seconds } from '../../src/units/quantities.js';
import type { PlanContext } from '../../src/solve/plan-context.js';
import { evaluateRate } from '../../src/solve/evaluate-rate.js';
import { planPart } from '../../src/clocks/plan-part.js';
import { feasibleSetOf } from '../helpers/hand-worked-plan.js';
import { planArbitrary } from '../solve/random-plan.js';
import { everySetting, part, synthesiser } from './part-fixtures.js';
import type * as WorstSlack from '../../src/solve/worst-slack.js';

// Every rate the sampled search screens goes through worstSlackAt: count the calls
// from outside the search, instead of trusting the count it reports.
const screens = vi.hoisted(() => ({ count: 0 }));
vi.mock('../../src/solve/worst-slack.js', async (original) => {
  const module = await original<typeof WorstSlack>();
  return {
    ...module,
    worstSlackAt: (...args: Parameters<typeof module.worstSlackAt>) => {
      screens.count++;
      return module.worstSlackAt(...args);
    },
  };
});

const CLOCKING = { clockDividers: [1], bits: 12, apertureJitter: seconds(0) };

describe('the sampled search keeps its budget (random plans where nothing passes)', () => {
  it('screens at most the budget, and reports as judged what it screened plus the final judgement', () => {
    let sampled = 0;
    fc.assert(
      fc.property(planArbitrary(), fc.double({ min: 0, max: 1, noNaN: true }), fc.integer({ min: 20, max: 400 }), (base, u, budget) => {
        const context: PlanContext = { ...base, clocking: CLOCKING };
        const f = context.limits.minRate * 0.01 * 10 ** u;
        // Many (M, D) families and long N ranges: the anchors alone would pass a small budget.
        const syn = part('SYN-B', f, synthesiser([1, 2000], [1, 6], [1, 4]), 50);
        const settings = everySetting(syn, [1], context.limits.minRate, context.limits.maxRate, 'whole drift');
        fc.pre(settings.length > budget && settings.every((s) => !evaluateRate(context, hz(s.rate), ppm(50), 'blocking').pass));
        screens.count = 0;
        const plan = planPart(context, feasibleSetOf(context), syn, { everyRateUpTo: 0, screenUpTo: budget })!;
        expect(plan.search).toBe('sampled');
        expect(screens.count).toBeLessThanOrEqual(budget);
        expect(plan.ratesJudged).toBe(screens.count + 1);
        sampled++;
      }),
      { numRuns: 40 },
    );
    expect(sampled).toBeGreaterThan(10);
  }, 60_000);
});
