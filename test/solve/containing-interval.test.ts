import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { hz, ppm } from '../../src/units/quantities.js';
import { planRates } from '../../src/solve/feasible-set.js';
import { evaluateRate } from '../../src/solve/evaluate-rate.js';
import { containingInterval } from '../../src/solve/drift.js';
import { brutePasses } from '../helpers/brute-force-plan.js';
import { exactEdges, nearAnEdge, planArbitrary, sweepRates } from './random-plan.js';

describe('the fast judge (binary search over the feasible intervals)', () => {
  const intervals = [
    { zone: 3, inverted: false, minRate: hz(100), maxRate: hz(110) },
    { zone: 2, inverted: true, minRate: hz(150), maxRate: hz(151) },
    { zone: 2, inverted: true, minRate: hz(160), maxRate: hz(200) },
  ];

  it('finds the interval holding the whole drift range, closed at both ends', () => {
    expect(containingInterval(intervals, hz(105), ppm(0))).toBe(0);
    expect(containingInterval(intervals, hz(100), ppm(0))).toBe(0);
    expect(containingInterval(intervals, hz(200), ppm(0))).toBe(2);
    expect(containingInterval(intervals, hz(180), ppm(1e5))).toBe(2); // ±10 %: 162–198
    expect(containingInterval(intervals, hz(165), ppm(1e5))).toBe(-1); // 148.5–181.5 leaves the interval
    expect(containingInterval(intervals, hz(130), ppm(0))).toBe(-1);
    expect(containingInterval(intervals, hz(50), ppm(0))).toBe(-1);
    expect(containingInterval([], hz(50), ppm(0))).toBe(-1);
  });

  it('agrees with a plain scan of the intervals, with the exact evaluator and with the brute force on random plans (fast-check)', () => {
    let judged = 0;
    let passing = 0;
    fc.assert(
      fc.property(planArbitrary(), fc.integer({ min: 0, max: 1e6 }), fc.double({ min: 0, max: 1, noNaN: true }), (context, seed, t) => {
        const tolerance = 0.1 * 10000 ** t; // log-uniform 0.1–1000 ppm
        const set = planRates(context);
        const { windows } = set;
        const edges = exactEdges(windows, set);
        const epsilon = tolerance * 1e-6;
        for (const rate of sweepRates(context.limits.minRate, context.limits.maxRate, 40, seed)) {
          const index = containingInterval(set.feasible, hz(rate), ppm(tolerance));
          const low = rate * (1 - epsilon);
          const high = rate * (1 + epsilon);
          const scanned = set.feasible.findIndex((f) => low >= f.minRate && high <= f.maxRate);
          expect(index).toBe(scanned);
          judged++;
          if (nearAnEdge(low, edges) || nearAnEdge(high, edges)) continue;
          // Inside the converter's range the exact evaluator gives the same verdict (it ignores the range itself).
          if (low >= context.limits.minRate && high <= context.limits.maxRate) {
            expect(evaluateRate(context, hz(rate), ppm(tolerance)).pass, `${rate} Hz ±${tolerance} ppm`).toBe(index >= 0);
          }
          if (index >= 0) {
            passing++;
            // Independent brute force (definition of aliasing; common practice, no source) at both drift ends.
            expect(brutePasses(context, low)).toBe(true);
            expect(brutePasses(context, high)).toBe(true);
          }
        }
      }),
      { numRuns: 300 },
    );
    expect(passing).toBeGreaterThan(judged / 20);
  });
});
