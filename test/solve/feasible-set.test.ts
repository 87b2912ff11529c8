import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { hz, ppm } from '../../src/units/quantities.js';
import { planRates } from '../../src/solve/feasible-set.js';
import { evaluateRate } from '../../src/solve/evaluate-rate.js';
import type { PlanContext } from '../../src/solve/plan-context.js';
import { brutePasses } from '../helpers/brute-force-plan.js';
import { exactEdges, inFeasible, nearAnEdge, planArbitrary, sweepRates } from './random-plan.js';

/**
 * The exact feasible set against the independent brute-force evaluator
 * (test/helpers/brute-force-plan.ts, written for this test from the
 * definition of aliasing; common practice, no source), on random plans from
 * fast-check. Rates within a relative 1e-9 of an edge of the exact result
 * (a window edge, a feasible-interval edge or a blocked-range edge) are
 * skipped: there the verdict is decided by floating-point noise on either side.
 */

const RATES = 2000;

function exactResult(context: PlanContext) {
  const set = planRates(context);
  const { windows } = set;
  return { windows, set, edges: exactEdges(windows, set) };
}

interface Tally {
  compared: number;
  skipped: number;
  feasible: number;
}

const tally: Tally = { compared: 0, skipped: 0, feasible: 0 };

describe('feasibleSet and evaluateRate against the brute force (random plans)', () => {
  it('agree at 2,000 rates per plan everywhere but within 1e-9 of an edge', () => {
    fc.assert(
      fc.property(planArbitrary(), fc.integer({ min: 0, max: 1e6 }), (context, seed) => {
        const { set, edges } = exactResult(context);
        for (const rate of sweepRates(context.limits.minRate, context.limits.maxRate, RATES, seed)) {
          if (nearAnEdge(rate, edges)) {
            tally.skipped++;
            continue;
          }
          const brute = brutePasses(context, rate);
          const exact = inFeasible(rate, set);
          // Independent brute-force evaluator vs the exact feasible set (definition of aliasing; common practice, no source).
          expect(exact, `feasible set at ${rate} Hz`).toBe(brute);
          // The exact judge of one rate at zero tolerance must give the same verdict.
          expect(evaluateRate(context, hz(rate), ppm(0)).pass, `evaluateRate at ${rate} Hz`).toBe(brute);
          tally.compared++;
          if (brute) tally.feasible++;
        }
      }),
      { numRuns: 60, seed: 20261202, plugins: [fc.unbiased()] },
    );
    console.info(
      `feasible-set agreement: ${tally.compared} rates compared (${tally.feasible} feasible), ${tally.skipped} skipped near an edge`,
    );
    // The sweep must actually see both verdicts, or the agreement proves little.
    expect(tally.feasible).toBeGreaterThan(0.05 * tally.compared);
    expect(tally.compared - tally.feasible).toBeGreaterThan(0.05 * tally.compared);
  }, 30_000);

  it('agree just beside every exact edge (1e-8 to 1e-6 relative away, outside the skip rule)', () => {
    // A grid sweep cannot see this: an edge placed 1e-8·r off its algebraic value (about 1 Hz at
    // 100 MHz) is caught here, since both sides of every edge are probed against the brute force.
    let probed = 0;
    fc.assert(
      fc.property(planArbitrary(), (context) => {
        const { set, edges } = exactResult(context);
        for (const edge of edges) {
          for (const offset of [-1e-6, -1e-7, -1e-8, 1e-8, 1e-7, 1e-6]) {
            const rate = edge * (1 + offset);
            if (rate < context.limits.minRate || rate > context.limits.maxRate || nearAnEdge(rate, edges)) continue;
            const brute = brutePasses(context, rate);
            // Independent brute-force evaluator (definition of aliasing; common practice, no source).
            expect(inFeasible(rate, set), `feasible set at ${rate} Hz, edge ${edge} Hz`).toBe(brute);
            expect(evaluateRate(context, hz(rate), ppm(0)).pass, `evaluateRate at ${rate} Hz`).toBe(brute);
            probed++;
          }
        }
      }),
      { numRuns: 150, seed: 7, plugins: [fc.unbiased()] },
    );
    console.info(`edge probes: ${probed} rates beside exact edges`);
    expect(probed).toBeGreaterThan(1000);
  }, 30_000);
});
