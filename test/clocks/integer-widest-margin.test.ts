import { hz } from '../../src/units/quantities.js';
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { bestIntegerN, modelSlack } from '../../src/clocks/integer-widest-margin.js';
import type { LinearSlack } from '../../src/solve/linear-slacks.js';

/** Plain enumeration of every N: the reference (definition of the maximum; no source needed). */
function exhaustive(slacks: readonly LinearSlack[], first: number, last: number, rateAt: (N: number) => number): number {
  let best = -Infinity;
  for (let N = first; N <= last; N++) {
    let least = Infinity;
    for (const s of slacks) least = Math.min(least, s.slope * rateAt(N) + s.offset);
    best = Math.max(best, least);
  }
  return best;
}

describe('the best integer N for the worst of linear slacks', () => {
  // Worked by hand: t ≤ 2r − 10 and t ≤ −r + 20 meet at r = 10 (t = 10). With r = 0.7·N the
  // neighbours are N = 14 (r = 9.8: min(9.6, 10.2) = 9.6) and N = 15 (r = 10.5: min(11, 9.5) = 9.5),
  // so the integer optimum is N = 14 with t = 9.6.
  const slacks: LinearSlack[] = [
    { slope: 2, offset: -10 },
    { slope: -1, offset: 20 },
  ];
  const line = { first: 1, last: 100, rateAt: (N: number) => hz(0.7 * N) };

  it('enumeration and the MILP both find N = 14, t = 9.6 (worked by hand)', () => {
    for (const enumerateUpTo of [Infinity, 0]) {
      const answer = bestIntegerN(slacks, line, hz(1), enumerateUpTo);
      expect(answer.method).toBe(enumerateUpTo === 0 ? 'milp' : 'enumeration');
      expect(answer.N).toBe(14);
      expect(answer.worstSlack).toBeCloseTo(9.6, 12);
    }
  });

  it('a constant slack does not leave an arbitrary tie: the varying slacks decide (lexicographic, as the LP)', () => {
    // t ≤ 3 everywhere; both varying slacks reach 3 for r in [6.5, 17], N = 10..24, a plateau; the varying pair peaks at N = 14 as above.
    const withConstant = [...slacks, { slope: 0, offset: 3 }];
    for (const enumerateUpTo of [Infinity, 0]) {
      const answer = bestIntegerN(withConstant, line, hz(1), enumerateUpTo);
      expect(answer.worstSlack).toBe(3);
      expect(answer.N).toBe(14);
    }
  });

  it('MILP and enumeration agree with plain enumeration on random slacks and ranges (fast-check)', () => {
    let milps = 0;
    const shortfalls: number[] = [];
    fc.assert(
      fc.property(
        fc.array(fc.tuple(fc.double({ min: -6, max: 6, noNaN: true }), fc.double({ min: -1, max: 1, noNaN: true })), {
          minLength: 1,
          maxLength: 12,
        }),
        fc.integer({ min: 1, max: 2000 }),
        fc.integer({ min: 0, max: 3000 }),
        fc.double({ min: 1e5, max: 2e7, noNaN: true }),
        fc.integer({ min: 1, max: 64 }),
        (shape, first, span, frequency, K) => {
          // Rates f·N/K around 1e7–1e10 Hz; slacks scaled so that they cross inside the range.
          const rateAt = (N: number) => hz((frequency * N) / K);
          const middle = rateAt(first + span / 2);
          const unit = 1e6;
          // Slopes below 1e-9 read as 0: denormal slopes only test the arithmetic of denormals.
          const slacks = shape.map(([x, u]) => {
            const slope = Math.abs(x) < 1e-9 ? 0 : x;
            return { slope, offset: -slope * middle + u * 10 * unit };
          });
          const reference = exhaustive(slacks, first, first + span, rateAt);
          for (const enumerateUpTo of [Infinity, 0]) {
            const answer = bestIntegerN(slacks, { first, last: first + span, rateAt }, hz(unit), enumerateUpTo);
            if (answer.method === 'milp') milps++;
            expect(answer.N).toBeGreaterThanOrEqual(first);
            expect(answer.N).toBeLessThanOrEqual(first + span);
            expect(answer.worstSlack).toBe(modelSlack(slacks, rateAt(answer.N)));
            // The worst slack is concave in N, so the certified answer is the best N itself, to rounding noise.
            const noise = 1e-12 * Math.max(...slacks.map((s) => Math.abs(s.slope) * rateAt(first + span) + Math.abs(s.offset)));
            expect(answer.worstSlack).toBeLessThanOrEqual(reference + noise);
            expect(answer.worstSlack).toBeGreaterThanOrEqual(reference - noise);
            // The solver's own N within its allowance (stated in the module) of the best.
            expect(answer.shortfall).toBeLessThanOrEqual(answer.allowance);
            if (answer.method === 'milp') shortfalls.push(answer.shortfall / Math.max(answer.allowance, 1e-300));
          }
        },
      ),
      { numRuns: 300 },
    );
    expect(milps).toBe(300);
    console.log(
      `MILP shortfall before the neighbour check, as a fraction of its allowance: max ${Math.max(...shortfalls).toExponential(2)}, ${shortfalls.filter((x) => x > 0).length} of ${shortfalls.length} above 0`,
    );
  });
});
