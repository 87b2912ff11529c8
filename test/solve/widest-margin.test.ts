import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { hz, ppm } from '../../src/units/quantities.js';
import { planRates } from '../../src/solve/feasible-set.js';
import { evaluateRate } from '../../src/solve/evaluate-rate.js';
import { bestRateIn } from '../../src/solve/best-rate.js';
import type { PlanContext } from '../../src/solve/plan-context.js';
import { planArbitrary, sweepRates } from './random-plan.js';

/**
 * The widest-margin LP (javascript-lp-solver) against a dense search: inside
 * each feasible interval, the rate the LP picks must have a worst slack
 * (exact evaluateRate over the drift) at least as large as the best of 2,000
 * rates swept across the drift-safe range, less an allowance for the LP's
 * rounding; and bestRateIn must never throw its re-check error.
 *
 * The allowance, derived rather than tuned: the worst slack is the minimum of
 * linear functions of the rate, each with slope at most S in magnitude, so a
 * rate δ away from the optimum loses at most S·δ. The LP solves for the
 * position x = (r − low)/width in [0, 1]; javascript-lp-solver rounds its
 * answers to about 1e-8 (its documented default precision, from memory), so
 * δ ≤ 1e-8·width, and we allow ten times that: 1e-7·S·width, plus 1e-7 of the
 * bandwidth for the rounding of t itself (the LP's t is in bandwidth units).
 * S: the zone edges move at (n − 1)/2 and n/2 times the rate; an image
 * j·r ± band moves against an extent a·r + [l, h] at |j − a|, and only images
 * within reach matter, so |j − a| ≤ (max(|l|, |h|) + high + margin)/low + 1;
 * all times (1 + ε).
 */

const SWEEP = 2000;

function slopeBound(context: PlanContext, zone: number, rangeLow: number, epsilon: number): number {
  let bound = zone / 2;
  for (const i of context.interferers) {
    if (!i.blocking) continue;
    bound = Math.max(
      bound,
      (Math.max(Math.abs(i.low), Math.abs(i.high)) + context.band.high + i.requiredMargin) / (rangeLow * (1 - epsilon)) + 1,
    );
  }
  return bound * (1 + epsilon);
}

describe('widest-margin LP against a dense sweep (random plans)', () => {
  it('the LP rate is at least as good as the best of 2,000 swept rates, less the rounding allowance', () => {
    const counts = { intervals: 0, lpBetter: 0, lpBehindWithinAllowance: 0 };
    let largestShortfall = 0;
    fc.assert(
      fc.property(planArbitrary(), fc.constantFrom(0, 0, 5, 50, 500), fc.integer({ min: 0, max: 1e6 }), (base, tolerance, seed) => {
        const context: PlanContext = { ...base, goal: { kind: 'widest-margin' }, tolerancePpm: ppm(tolerance) };
        const epsilon = tolerance * 1e-6;
        for (const interval of planRates(context).feasible) {
          // The drift-safe range, written out again: nominal rates whose whole drift stays inside.
          const low = interval.minRate / (1 - epsilon);
          const high = interval.maxRate / (1 + epsilon);
          if (!(high - low > 1e-9 * low)) continue; // no room to search
          const chosen = bestRateIn(context, interval); // throws on a failed re-check
          expect(chosen, `interval ${interval.minRate}–${interval.maxRate} Hz`).not.toBeNull();
          expect(chosen!.rate).toBeGreaterThanOrEqual(low * (1 - 1e-15));
          expect(chosen!.rate).toBeLessThanOrEqual(high * (1 + 1e-15));
          // Dense search, each rate judged exactly over its drift; the ends of the range included.
          let best = -Infinity;
          for (const r of [low, high, ...sweepRates(low, high, SWEEP, seed)]) {
            const r1 = Math.min(Math.max(r, low), high);
            best = Math.max(best, evaluateRate(context, hz(r1), ppm(tolerance)).worstSlack);
          }
          const allowance =
            1e-7 * slopeBound(context, interval.zone, low, epsilon) * (high - low) + 1e-7 * (context.band.high - context.band.low);
          expect(
            chosen!.worstSlack,
            `LP at ${chosen!.rate} Hz vs sweep best ${best} Hz (allowance ${allowance} Hz)`,
          ).toBeGreaterThanOrEqual(best - allowance);
          counts.intervals++;
          if (chosen!.worstSlack >= best) counts.lpBetter++;
          else {
            counts.lpBehindWithinAllowance++;
            largestShortfall = Math.max(largestShortfall, (best - chosen!.worstSlack) / allowance);
          }
        }
      }),
      { numRuns: 60, seed: 71, plugins: [fc.unbiased()] },
    );
    console.info(
      `widest margin: ${counts.intervals} intervals; LP at least the sweep's best in ${counts.lpBetter}, ` +
        `behind within the allowance in ${counts.lpBehindWithinAllowance} (largest shortfall ${largestShortfall.toFixed(3)} of the allowance)`,
    );
    expect(counts.intervals).toBeGreaterThan(100);
  }, 30_000);
});
