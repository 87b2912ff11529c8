import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { hz } from '../../src/units/quantities.js';
import type { LinearSlack } from '../../src/solve/linear-slacks.js';
import { maximiseWorstSlack } from '../../src/solve/widest-margin.js';
import { lpWidestMargin } from '../helpers/lp-widest-margin.js';

/**
 * maximiseWorstSlack walks the lower envelope of the slack lines exactly. It
 * is checked (1) on cases worked on paper, (2) against an independent brute
 * force — the maximum of a concave piecewise-linear function lies at an end
 * of the range or where two of its lines cross (the vertex property of linear
 * programs; Bertsimas & Tsitsiklis, Introduction to Linear Optimization, 1997,
 * ch. 2 and §1.3 on piecewise-linear objectives, from memory) — and (3)
 * against the same problem solved as an LP by javascript-lp-solver.
 */

const worst = (slacks: readonly LinearSlack[], r: number) => Math.min(...slacks.map((s) => s.slope * r + s.offset));

describe('widest margin, worked on paper', () => {
  // min(2r − 1, r + 1, 10 − r, 14 − 2r) on [0, 10]. Rising: 2r − 1 up to r = 2, then r + 1. Falling: 10 − r up to
  // r = 4, then 14 − 2r. r + 1 = 10 − r at 4.5 is not the answer (14 − 2r = 5 there); r + 1 = 14 − 2r at r = 13/3
  // gives 16/3, and 10 − r = 17/3 and 2r − 1 = 23/3 stay above it.
  const slacks = [
    { slope: 2, offset: -1 },
    { slope: 1, offset: 1 },
    { slope: -1, offset: 10 },
    { slope: -2, offset: 14 },
  ];

  it('finds the crossing of the envelope pieces, not of the first rising and falling lines', () => {
    const answer = maximiseWorstSlack(slacks, { low: 0, high: 10 }, hz(1))!;
    expect(answer.rate).toBeCloseTo(13 / 3, 12);
    expect(answer.worstSlack).toBeCloseTo(16 / 3, 12);
  });

  it('stops at the range end when the envelope still rises there (r ≤ 3: r + 1 = 4 at r = 3)', () => {
    expect(maximiseWorstSlack(slacks, { low: 0, high: 3 }, hz(1))).toEqual({ rate: 3, worstSlack: 4 });
  });

  it('stays at the low end when the envelope falls from it (r ≥ 5: 14 − 2r = 4 at r = 5)', () => {
    expect(maximiseWorstSlack(slacks, { low: 5, high: 10 }, hz(1))).toEqual({ rate: 5, worstSlack: 4 });
  });

  it('answers a range of one rate with that rate', () => {
    expect(maximiseWorstSlack(slacks, { low: 2, high: 2 }, hz(1))).toEqual({ rate: 2, worstSlack: 3 });
  });
});

/** Random slack lines as the solver meets them: a rate range of 1 MHz to 3 GHz, slopes of small zone and image multiples. */
const problem = fc
  .record({
    low: fc.double({ min: 1e6, max: 3e9, noNaN: true }),
    widthFraction: fc.double({ min: 1e-6, max: 0.5, noNaN: true }),
    unit: fc.double({ min: 1e4, max: 1e8, noNaN: true }),
    lines: fc.array(
      fc.record({
        slope: fc.oneof(
          fc.constant(0),
          fc.integer({ min: -40, max: 40 }).map((j) => j / 2),
        ),
        drift: fc.constantFrom(1, 1 - 5e-5, 1 + 5e-5),
        /** The slack at the low end, in units. */
        atLow: fc.double({ min: -5, max: 5, noNaN: true }),
      }),
      { minLength: 1, maxLength: 30 },
    ),
  })
  .map(({ low, widthFraction, unit, lines }) => {
    const range = { low, high: low * (1 + widthFraction) };
    const slacks = lines.map((l) => ({ slope: l.slope * l.drift, offset: l.atLow * unit - l.slope * l.drift * low }));
    return { range, unit, slacks };
  });

describe('widest margin against independent references (fast-check)', () => {
  it('equals the best of every range end and every crossing of two lines inside the range (brute force)', () => {
    fc.assert(
      fc.property(problem, ({ range, unit, slacks }) => {
        const answer = maximiseWorstSlack(slacks, range, hz(unit))!;
        const candidates = [range.low, range.high];
        for (const a of slacks)
          for (const b of slacks) {
            if (a.slope === b.slope) continue;
            const r = (b.offset - a.offset) / (a.slope - b.slope);
            if (r > range.low && r < range.high) candidates.push(r);
          }
        const best = Math.max(...candidates.map((r) => worst(slacks, r)));
        // Rounding: each value is one product and one sum on numbers up to |slope|·high + |offset|.
        const scale = Math.max(...slacks.map((s) => Math.abs(s.slope) * range.high + Math.abs(s.offset)));
        expect(answer.rate).toBeGreaterThanOrEqual(range.low);
        expect(answer.rate).toBeLessThanOrEqual(range.high);
        expect(Math.abs(answer.worstSlack - best)).toBeLessThanOrEqual(1e-12 * scale);
        expect(Math.abs(worst(slacks, answer.rate) - best)).toBeLessThanOrEqual(1e-12 * scale);
      }),
      { numRuns: 400, seed: 1031031731 },
    );
  });

  it('agrees with javascript-lp-solver on t* and on the worst varying slack of the rate chosen', () => {
    fc.assert(
      fc.property(problem, ({ range, unit, slacks }) => {
        const exact = maximiseWorstSlack(slacks, range, hz(unit))!;
        const lp = lpWidestMargin(slacks, range, unit);
        expect(lp).not.toBeNull();
        fc.pre(!lp!.breaksItsModel); // an answer that violates the reference's own model is no reference
        // The LP rounds its variables to about 1e-8: x (the rate as a fraction of the width) costs S·1e-8·width of
        // slack at the steepest slope S, and t itself 1e-8 units; ten times both.
        const steepest = Math.max(...slacks.map((s) => Math.abs(s.slope)));
        const allowance = 1e-7 * steepest * (range.high - range.low) + 1e-7 * unit;
        expect(Math.abs(exact.worstSlack - lp!.worstSlack)).toBeLessThanOrEqual(allowance);
        // Ties: both pick a rate among those keeping t*, best for the slacks that vary; the exact one is never worse.
        const varying = slacks.filter((s) => Math.abs(s.slope * (range.high - range.low)) > 1e-9 * unit);
        if (varying.length > 0) expect(worst(varying, exact.rate)).toBeGreaterThanOrEqual(worst(varying, lp!.rate) - allowance);
      }),
      { numRuns: 300, seed: 1031031731 }, // this seed meets a model the reference breaks (discarded above),
    );
  });
});
