import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { hz, ppm, seconds } from '../../src/units/quantities.js';
import type { PlanContext } from '../../src/solve/plan-context.js';
import { evaluateRate } from '../../src/solve/evaluate-rate.js';
import { driftHeadroom } from '../../src/solve/drift.js';
import { feasibleSetOf, handWorkedContext, MHZ } from '../helpers/hand-worked-plan.js';
import { bruteGuarded, bruteLeastDistance, brutePasses, verdictSpacing, wantedAlias, wholeInOneZone } from '../helpers/brute-force-plan.js';
import { planArbitrary } from './random-plan.js';

const setOf = feasibleSetOf;

describe('drift headroom on the plan worked on paper (test/solve/hand-worked.test.ts)', () => {
  // Feasible there: [25, 82/3] MHz (zone 2 from its window edge 2·25/2 = 25 up to the rate/4 spur's blocked
  // range from 82/3) and [35.5, 42] (from the tone's blocked range ending at 35.5 up to the window edge
  // 2·21/1 = 42), [50, 60] (window edge 50, rate limit 60).
  const context = handWorkedContext();
  const set = setOf(context);

  it('at 26 MHz: (1 − 25/26)·1e6 = 38 461.5 ppm down to the zone edge, (82/78 − 1)·1e6 = 51 282.1 ppm up to the spur', () => {
    const headroom = driftHeadroom(set, context.limits, hz(26 * MHZ))!;
    expect(headroom.downPpm).toBeCloseTo((1 - 25 / 26) * 1e6, 6);
    expect(headroom.downLimitedBy).toEqual({ kind: 'zone edge' });
    expect(headroom.upPpm).toBeCloseTo((82 / 78 - 1) * 1e6, 6);
    expect(headroom.upLimitedBy).toEqual({ kind: 'interferer', label: 'rate/4 spur' });
  });

  it('at 113/3 MHz: (1 − 106.5/113)·1e6 ppm down to the tone, (126/113 − 1)·1e6 ppm up to the zone edge', () => {
    const headroom = driftHeadroom(set, context.limits, hz((113 / 3) * MHZ))!;
    expect(headroom.downPpm).toBeCloseTo((1 - 106.5 / 113) * 1e6, 6);
    expect(headroom.downLimitedBy).toEqual({ kind: 'interferer', label: 'board tone 10M' });
    expect(headroom.upPpm).toBeCloseTo((126 / 113 - 1) * 1e6, 6);
    expect(headroom.upLimitedBy).toEqual({ kind: 'zone edge' });
  });

  it('is null at a rate that already fails (30 MHz lies in the tone and spur blocked ranges)', () => {
    expect(driftHeadroom(set, context.limits, hz(30 * MHZ))).toBeNull();
  });
});

describe('drift headroom ± 1 ppm on random plans (fast-check)', () => {
  it('moved by the headroom plus 1 ppm the named check fails; by the headroom minus 1 ppm the rate passes', () => {
    const counts = { rates: 0, moves: 0, zoneEdge: 0, rateLimit: 0, interferer: 0, skippedNarrow: 0 };
    fc.assert(
      fc.property(
        planArbitrary(),
        fc.array(fc.double({ min: 0.05, max: 0.95, noNaN: true }), { minLength: 1, maxLength: 3 }),
        (base, fractions) => {
          const context: PlanContext = { ...base, clocking: { clockDividers: [1], bits: 12, apertureJitter: seconds(0) } };
          const set = setOf(context);
          for (const interval of set.feasible) {
            if (interval.maxRate - interval.minRate < 8e-6 * interval.maxRate) continue; // too narrow for ±1 ppm steps inside
            for (const u of fractions) {
              const rate = interval.minRate + u * (interval.maxRate - interval.minRate);
              const headroom = driftHeadroom(set, context.limits, hz(rate))!;
              expect(headroom).not.toBeNull();
              counts.rates++;
              for (const [ppmAway, limit, sign] of [
                [headroom.downPpm, headroom.downLimitedBy, -1],
                [headroom.upPpm, headroom.upLimitedBy, 1],
              ] as const) {
                const label = limit.kind === 'interferer' ? limit.label : limit.kind;
                // Inside by 1 ppm: passes, by the exact evaluator (tolerance 0) and by the independent brute force
                // (test/helpers/brute-force-plan.ts: the definition of aliasing; common practice, no source).
                const inside = rate * (1 + sign * (ppmAway - 1) * 1e-6);
                expect(evaluateRate(context, hz(inside), ppm(0)).pass, `${inside} Hz, 1 ppm inside the ${label} limit`).toBe(true);
                expect(brutePasses(context, inside)).toBe(true);
                // Beyond by 1 ppm: the named check fails.
                const beyond = rate * (1 + sign * (ppmAway + 1) * 1e-6);
                const judged = evaluateRate(context, hz(beyond), ppm(0));
                counts.moves++;
                if (limit.kind === 'rate limit') {
                  counts.rateLimit++;
                  expect(sign < 0 ? beyond < context.limits.minRate : beyond > context.limits.maxRate).toBe(true);
                } else if (limit.kind === 'zone edge') {
                  counts.zoneEdge++;
                  expect(judged.pass).toBe(false);
                  expect(judged.image === null || judged.zoneEdgeMargin < 0).toBe(true);
                  const guarded = bruteGuarded(context);
                  expect(wholeInOneZone(guarded.low, guarded.high, beyond)).toBe(false);
                } else {
                  // A blocked range narrower than the 1 ppm step may be stepped over: skip those (counted).
                  const edge = sign < 0 ? interval.minRate : interval.maxRate;
                  const range = set.blocked.find(
                    (b) => b.label === label && b.zone === interval.zone && (sign < 0 ? b.maxRate === edge : b.minRate === edge),
                  )!;
                  expect(range, `a blocked range of ${label} at ${edge} Hz`).toBeDefined();
                  if (range.maxRate - range.minRate < 2e-6 * rate) {
                    counts.skippedNarrow++;
                    continue;
                  }
                  counts.interferer++;
                  const check = judged.checks.find((c) => c.label === label)!;
                  expect(check.pass, `${label} at ${beyond} Hz`).toBe(false);
                  const extent = context.interferers.find((i) => i.label === label)!;
                  const alias = wantedAlias(context, beyond);
                  if (alias) expect(bruteLeastDistance(extent, alias, beyond, verdictSpacing(extent))).toBeLessThan(extent.requiredMargin);
                }
              }
            }
          }
        },
      ),
      { numRuns: 300 },
    );
    console.log(
      `headroom: ${counts.rates} rates, ${counts.moves} moves beyond (${counts.zoneEdge} zone edge, ${counts.rateLimit} rate limit, ${counts.interferer} interferer, ${counts.skippedNarrow} skipped: blocked range under 2 ppm)`,
    );
    expect(counts.zoneEdge).toBeGreaterThan(50);
    expect(counts.interferer).toBeGreaterThan(50);
    expect(counts.rateLimit).toBeGreaterThan(10);
  });
});
