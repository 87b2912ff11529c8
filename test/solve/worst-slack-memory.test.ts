import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { hz, ppm } from '../../src/units/quantities.js';
import { blockingInterferers, leastMargin, zoneEdgeMarginAt } from '../../src/solve/evaluate-rate.js';
import { worstSlackAt } from '../../src/solve/worst-slack.js';
import { driftRange } from '../../src/solve/drift.js';
import { wantedZone } from '../../src/math/band.js';
import { planArbitrary } from './random-plan.js';

/**
 * A screen that remembers which check last stopped it takes the checks in
 * another order; the least of a set does not depend on the order it is taken
 * in (common practice: the move-to-front heuristic of sequential search), so
 * the slack of a rate at or above the floor must be the plain minimum over
 * every check, and a rate below the floor must still be seen below it.
 */
describe('worstSlackAt with a screen memory (random plans, a sweep of rates sharing one memory)', () => {
  it('returns the least slack over every check whenever it is at or above the floor, and a value below the floor otherwise', () => {
    fc.assert(
      fc.property(
        planArbitrary(),
        fc.array(fc.tuple(fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: -1, max: 1, noNaN: true })), {
          minLength: 1,
          maxLength: 40,
        }),
        (plan, sweep) => {
          const blocking = blockingInterferers(plan.interferers);
          const memory = { index: 0 };
          const width = plan.band.high - plan.band.low;
          for (const [u, f] of sweep) {
            const rate = hz(plan.limits.minRate + u * (plan.limits.maxRate - plan.limits.minRate));
            // The plain minimum, in the input order, straight from the margin functions.
            const drift = driftRange(rate, ppm(0));
            const zone = wantedZone(plan.band, rate);
            let least = Math.min(
              zoneEdgeMarginAt(plan.band, plan.guard, zone, drift.low),
              zoneEdgeMarginAt(plan.band, plan.guard, zone, drift.high),
            );
            for (const i of blocking) least = Math.min(least, leastMargin(i, plan.band, drift) - i.requiredMargin);
            const floor = least + f * width;
            const screened = worstSlackAt(plan, blocking, rate, ppm(0), floor, memory);
            if (least >= floor) expect(screened).toBe(least);
            else expect(screened).toBeLessThan(floor);
            expect(memory.index).toBeLessThan(Math.max(1, blocking.length));
          }
        },
      ),
      { numRuns: 300, seed: 20261202 },
    );
  });
});
