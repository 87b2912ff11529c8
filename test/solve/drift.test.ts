import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { hz, ppm } from '../../src/units/quantities.js';
import { planRates, type FeasibleSet } from '../../src/solve/feasible-set.js';
import { evaluateRate } from '../../src/solve/evaluate-rate.js';
import { solvePlan } from '../../src/plan/solve-plan.js';
import type { PlanContext } from '../../src/solve/plan-context.js';
import { brutePasses } from '../helpers/brute-force-plan.js';
import { exactEdges, nearAnEdge, planArbitrary, sweepRates } from './random-plan.js';

/**
 * Pass/fail over a clock's ±tolerance against the independent brute-force
 * evaluator (test/helpers/brute-force-plan.ts, definition of aliasing; common
 * practice, no source). A rate r at ±T ppm may run anywhere in
 * [r(1 − T·1e−6), r(1 + T·1e−6)] (crystal tolerance: common practice, no source).
 *  - A rate that passes at ±T: every sampled rate of its drift range passes
 *    the brute force (rates within 1e-9 relative of an exact edge skipped).
 *  - A rate that passes at its nominal value but fails at ±T: the brute force
 *    finds a failing rate inside the drift range.
 * Candidates: random rates, rates a fraction of the drift inside each
 * feasible edge (nominal passes, the drift crosses the edge), and the rates
 * solvePlan itself puts forward at ±T.
 */

const DRIFT_SAMPLES = 60;

/** The parts of [low, high] outside every closed feasible interval. */
function infeasibleParts(low: number, high: number, set: FeasibleSet): { low: number; high: number }[] {
  const parts: { low: number; high: number }[] = [];
  let start = low;
  for (const f of set.feasible) {
    if (f.maxRate < start) continue;
    if (f.minRate > high) break;
    if (f.minRate > start) parts.push({ low: start, high: f.minRate });
    start = Math.max(start, f.maxRate);
  }
  if (start < high) parts.push({ low: start, high });
  return parts;
}

describe('drift: pass/fail over ±tolerance against the brute force (random plans)', () => {
  it('a passing rate passes everywhere in its drift range; a nominal-only pass has a failing rate inside it', () => {
    const counts = { passing: 0, driftSamples: 0, nominalOnly: 0, witnessed: 0, tooNarrow: 0 };
    fc.assert(
      fc.property(planArbitrary(), fc.integer({ min: 0, max: 1e6 }), fc.integer({ min: 0, max: 2 ** 30 }), (base, seed, t) => {
        const tolerance = 0.5 * 4000 ** (t / 2 ** 30); // log-uniform 0.5–2000 ppm
        const context: PlanContext = { ...base, tolerancePpm: ppm(tolerance) };
        const epsilon = tolerance * 1e-6;
        const set = planRates(context);
        const { windows } = set;
        const edges = exactEdges(windows, set);

        const rates = sweepRates(context.limits.minRate, context.limits.maxRate, 30, seed);
        for (const f of set.feasible) for (const u of [0.3, 0.7]) rates.push(f.minRate * (1 + u * epsilon), f.maxRate * (1 - u * epsilon));
        for (const c of solvePlan(context).candidates) rates.push(c.evaluation.rate);

        for (const rate of rates) {
          const judged = evaluateRate(context, hz(rate), ppm(tolerance));
          const low = rate * (1 - epsilon);
          const high = rate * (1 + epsilon);
          if (judged.pass) {
            counts.passing++;
            for (const r of [low, high, ...sweepRates(low, high, DRIFT_SAMPLES, seed + 1)]) {
              if (nearAnEdge(r, edges)) continue;
              expect(brutePasses(context, r), `${r} Hz in the drift range of ${rate} Hz ±${tolerance} ppm`).toBe(true);
              counts.driftSamples++;
            }
          } else if (evaluateRate(context, hz(rate), ppm(0)).pass && !nearAnEdge(rate, edges)) {
            counts.nominalOnly++;
            expect(brutePasses(context, rate), `nominal ${rate} Hz`).toBe(true);
            // A witness: a dense sweep of the drift range, plus the middle of the widest part the
            // exact set calls infeasible (the brute force, not the exact set, gives the verdict).
            const parts = infeasibleParts(low, high, set).sort((a, b) => b.high - b.low - (a.high - a.low));
            const widest = parts[0];
            expect(widest, `exact set: some infeasible part in the drift of ${rate} Hz`).toBeDefined();
            if (widest!.high - widest!.low < 2e-9 * rate) {
              counts.tooNarrow++; // the failing part lies entirely within the skip distance of its edges
              continue;
            }
            const tries = [(widest!.low + widest!.high) / 2, ...sweepRates(low, high, 200, seed + 2)];
            const failing = tries.find((r) => !nearAnEdge(r, edges) && !brutePasses(context, r));
            expect(failing, `a failing rate in the drift range of ${rate} Hz ±${tolerance} ppm`).toBeDefined();
            expect(failing!).toBeGreaterThanOrEqual(low);
            expect(failing!).toBeLessThanOrEqual(high);
            counts.witnessed++;
          }
        }
      }),
      { numRuns: 150, seed: 47, plugins: [fc.unbiased()] },
    );
    console.info(
      `drift: ${counts.passing} passing rates (${counts.driftSamples} drift samples checked), ` +
        `${counts.nominalOnly} nominal-only passes (${counts.witnessed} failing rates found, ${counts.tooNarrow} too narrow to witness)`,
    );
    expect(counts.passing).toBeGreaterThan(100);
    expect(counts.witnessed).toBeGreaterThan(100);
  }, 30_000);
});
