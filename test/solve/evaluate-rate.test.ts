import { guardBands } from '../../src/math/band.js';
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { db, hz, ppm } from '../../src/units/quantities.js';
import { planRates } from '../../src/solve/feasible-set.js';
import { blockingInterferers, evaluateRate, leastMargin } from '../../src/solve/evaluate-rate.js';
import { imageMargin, marginBreakpoints, nearbyImages, normalisedExtent } from '../../src/solve/fold-images.js';
import { planArbitrary } from './random-plan.js';
import type { PlanContext } from '../../src/solve/plan-context.js';
import { brutePasses } from '../helpers/brute-force-plan.js';
import { PLAIN_CLOCKING } from '../helpers/hand-worked-plan.js';

const MHZ = 1e6;

describe('evaluateRate: a lower guard reaching below DC', () => {
  // Minimal case shrunk by fast-check from the brute-force agreement test: band 1–5 MHz,
  // 2 MHz lower guard, no interferers. The guard stops at DC (guardedBand's documented rule),
  // so the guarded band is 0–5 MHz, whole in zone 1 for every rate ≥ 10 MHz (Vaughan, Scott &
  // White 1991, n = 1: fs ≥ 2·fH). The feasible set says so; evaluateRate measured the zone-edge
  // margin from 1 − 2 = −1 MHz instead of from DC and failed every rate.
  const context: PlanContext = {
    band: { low: hz(1 * MHZ), high: hz(5 * MHZ) },
    guard: guardBands(hz(2 * MHZ), hz(0)),
    limits: { minRate: hz(5 * MHZ), maxRate: hz(30 * MHZ) },
    interferers: [],
    levelThreshold: db(-90),
    clocks: [],
    clocking: PLAIN_CLOCKING,
    goal: { kind: 'widest-margin' },
    tolerancePpm: ppm(0),
  };

  it('passes at 20 MHz, as the feasible set and the brute force say', () => {
    expect(planRates({ ...context, interferers: [] }).feasible).toEqual([
      { zone: 1, inverted: false, minRate: 10 * MHZ, maxRate: 30 * MHZ },
    ]);
    // Independent brute-force evaluator (definition of aliasing; common practice, no source).
    expect(brutePasses(context, 20 * MHZ)).toBe(true);
    const judged = evaluateRate(context, hz(20 * MHZ), ppm(0));
    expect(judged.pass).toBe(true);
    // The guarded band 0–5 MHz touches DC and lies 10 − 5 = 5 MHz under rate/2: the nearer edge is DC.
    expect(judged.zoneEdgeMargin).toBe(0);
  });

  it('still fails below the zone-1 edge 2·5 MHz = 10 MHz', () => {
    expect(brutePasses(context, 9.9 * MHZ)).toBe(false);
    expect(evaluateRate(context, hz(9.9 * MHZ), ppm(0)).pass).toBe(false);
  });
});

describe('evaluateRate on the blocking interferers only', () => {
  it('gives the verdict, margins and limiting check of the full evaluation, and the blocking checks (the doc example first)', () => {
    fc.assert(
      fc.property(planArbitrary(20), fc.integer({ min: 0, max: 2 ** 30 }), (context, u) => {
        const rate = hz(context.limits.minRate + ((context.limits.maxRate - context.limits.minRate) * u) / 2 ** 30);
        const blockingOnly = evaluateRate(context, rate, ppm(20), 'blocking');
        expect(blockingOnly.checks.every((c) => c.blocking)).toBe(true);
        expect(blockingInterferers(context.interferers).every((i) => i.blocking)).toBe(true);
        // The reference is the evaluation over every interferer (itself checked against the brute force above).
        const full = evaluateRate(context, rate, ppm(20));
        expect(full.checkScope).toBe('all');
        expect(blockingOnly.checkScope).toBe('blocking');
        const { checks: everyCheck, checkScope: _all, ...summary } = full;
        const { checks: blockingChecks, checkScope: _blocking, ...blockingSummary } = blockingOnly;
        expect(blockingSummary).toEqual(summary);
        expect(blockingChecks).toEqual(everyCheck.filter((c) => c.blocking));
      }),
      { numRuns: 300 },
    );
  });
});

describe('leastMargin without allocation', () => {
  it('equals the least image margin over the nearby images at the range ends and the breakpoints inside, bit for bit', () => {
    // The reference walks the image terms as objects (nearbyImages, imageMargin, marginBreakpoints);
    // both are checked against the brute-force folding in margins.test.ts.
    fc.assert(
      fc.property(planArbitrary(), fc.integer({ min: 0, max: 2 ** 30 }), fc.integer({ min: 0, max: 200 }), (context, u, ppmWide) => {
        const rate = context.limits.minRate + ((context.limits.maxRate - context.limits.minRate) * u) / 2 ** 30;
        const range = { low: hz(rate * (1 - ppmWide * 1e-6)), high: hz(rate * (1 + ppmWide * 1e-6)) };
        for (const interferer of context.interferers) {
          const extent = normalisedExtent(interferer);
          let expected = Infinity;
          for (const term of nearbyImages(extent, context.band, hz(0), range.low, range.high)) {
            const inside = marginBreakpoints(extent, context.band, term).filter((r) => r > range.low && r < range.high);
            for (const r of [range.low, range.high, ...inside])
              expected = Math.min(expected, imageMargin(extent, context.band, term, hz(r)));
          }
          expect(leastMargin(interferer, context.band, range)).toBe(expected);
        }
      }),
      { numRuns: 300 },
    );
  });
});
