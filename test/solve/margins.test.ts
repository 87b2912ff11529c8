import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { hz, ppm } from '../../src/units/quantities.js';
import { evaluateRate } from '../../src/solve/evaluate-rate.js';
import { foldExtent } from '../../src/math/fold-extent.js';
import {
  bruteAlias,
  bruteClearingShift,
  bruteLeastDistance,
  extentAt,
  foldedPieces,
  overlapWidth,
  unionOf,
  wantedAlias,
} from '../helpers/brute-force-plan.js';
import { planArbitrary, sweepRates } from './random-plan.js';

/**
 * evaluateRate's margins (tolerance 0) against the independent brute-force
 * evaluator (test/helpers/brute-force-plan.ts: definition of aliasing,
 * common practice, no source).
 *
 * Apart (solver margin ≥ 0): the margin is the least distance between the
 * folded extent and the folded wanted band.
 *  - Sampled on a uniform grid of spacing δ alone, the least sampled distance
 *    d̂ obeys t ≤ d̂ ≤ t + δ/2 for the true least distance t, because the
 *    distance is 1-Lipschitz in the input frequency (folding has slope ±1).
 *  - With the fold corners (multiples of r/2) added, d̂ = t: a positive least
 *    distance is reached at an end or a corner.
 * Overlapping (solver margin < 0): the margin is minus the distance the
 * extent would have to move, at the input, to clear the wanted alias: the
 * brute force finds every preimage k·r ± A of the alias interval A from the
 * definition of aliasing and takes, over those the extent overlaps, the worst
 * of the two clearing shifts (bruteClearingShift). A tone inside is checked
 * once more in the alias domain alone: minus its distance to the nearer edge
 * of A (folding is an isometry near a tone that does not sit on a fold edge).
 */

const RATES_PER_PLAN = 200;
/** Uniform grid steps across each extent for the Lipschitz bound. */
const GRID_STEPS = 100;

/** Floating-point noise of a difference of frequencies as large as `scale`, Hz (a few thousand ulps). */
const noiseOf = (scale: number) => 1e-12 * scale;

describe('evaluateRate margins against the brute force (random plans, tolerance 0)', () => {
  it('apart: the least folded distance; overlapping: minus the shift that clears the band', () => {
    const counts = { apart: 0, overlapping: 0, straddling: 0, toneInside: 0 };
    fc.assert(
      fc.property(planArbitrary(), fc.integer({ min: 0, max: 1e6 }), (context, seed) => {
        for (const rate of sweepRates(context.limits.minRate, context.limits.maxRate, RATES_PER_PLAN, seed)) {
          const alias = wantedAlias(context, rate);
          if (!alias) continue; // the band straddles a zone edge: no wanted alias to measure from
          const judged = evaluateRate(context, hz(rate), ppm(0));
          context.interferers.forEach((interferer, i) => {
            const check = judged.checks[i]!;
            const { low, high } = extentAt(interferer, rate);
            const noise = noiseOf(rate + Math.abs(low) + Math.abs(high) + context.band.high);
            const pieces = foldedPieces(interferer, rate);

            // The reported aliased segments are the union of the brute force's folded pieces.
            const union = unionOf(pieces);
            expect(check.alias.length, `${check.label} at ${rate} Hz: segments`).toBe(union.length);
            check.alias.forEach(([lo, hi], s) => {
              expect(Math.abs(lo - union[s]!.low)).toBeLessThanOrEqual(noise);
              expect(Math.abs(hi - union[s]!.high)).toBeLessThanOrEqual(noise);
            });

            if (check.margin >= 0) {
              counts.apart++;
              const spacing = (high - low) / GRID_STEPS;
              const gridOnly = bruteLeastDistance(interferer, alias, rate, spacing || Infinity, false);
              const withCorners = bruteLeastDistance(interferer, alias, rate, spacing || Infinity, true);
              // t ≤ d̂ ≤ t + δ/2 on the grid alone (1-Lipschitz); d̂ = t once the fold corners are sampled.
              expect(gridOnly, `${check.label} at ${rate} Hz: grid`).toBeGreaterThanOrEqual(check.margin - noise);
              expect(gridOnly, `${check.label} at ${rate} Hz: grid`).toBeLessThanOrEqual(check.margin + spacing / 2 + noise);
              expect(Math.abs(withCorners - check.margin), `${check.label} at ${rate} Hz: corners`).toBeLessThanOrEqual(noise);
            } else {
              counts.overlapping++;
              const depth = bruteClearingShift(interferer, alias, rate);
              expect(Math.abs(-check.margin - depth), `${check.label} at ${rate} Hz: clearing shift`).toBeLessThanOrEqual(noise);
              if (low === high) {
                const a = bruteAlias(low, rate);
                expect(
                  Math.abs(-check.margin - Math.min(a - alias.low, alias.high - a)),
                  `${check.label} at ${rate} Hz: tone inside`,
                ).toBeLessThanOrEqual(noise);
                counts.toneInside++;
              }
              // Some part of the extent does land inside: the folded pieces overlap the alias.
              expect(
                pieces.some((p) => overlapWidth(p, alias) > 0 || (p.low > alias.low && p.high < alias.high)),
                `${check.label} at ${rate} Hz: lands inside`,
              ).toBe(true);
              if (pieces.length > 1) counts.straddling++;
            }
          });
        }
      }),
      { numRuns: 120, seed: 31, plugins: [fc.unbiased()] },
    );
    console.info(
      `margins: ${counts.apart} apart, ${counts.overlapping} overlapping (${counts.straddling} of them straddling a fold edge, ${counts.toneInside} tones inside)`,
    );
    expect(counts.apart).toBeGreaterThan(1000);
    expect(counts.overlapping).toBeGreaterThan(1000);
    expect(counts.straddling).toBeGreaterThan(100);
    expect(counts.toneInside).toBeGreaterThan(100);
  }, 30_000);
});

describe('aliased segments of an extent between rate/2 and rate wide', () => {
  // Minimal case shrunk from the property above (definition of aliasing; common practice, no
  // source): at rate 1, every f in [0.7, 1.3] shows at |f − 1| ∈ [0, 0.3]. The extent is 0.6 wide,
  // more than rate/2, yet it holds no whole half-zone, so it does not cover the first zone.
  // foldExtent reported [0, 0.5] for any extent at least rate/2 wide.
  it('[0.7, 1.3] at rate 1 folds onto [0, 0.3]; 70–130 MHz at 100 MHz onto 0–30 MHz', () => {
    expect(foldExtent(hz(0.7), hz(1.3), hz(1))).toEqual([{ low: 0, high: expect.closeTo(0.3, 15) }]);
    expect(foldExtent(hz(70e6), hz(130e6), hz(100e6))).toEqual([{ low: 0, high: 30e6 }]);
  });

  it('an extent holding a whole half-zone still covers the first zone: [0.4, 1.3] at rate 1', () => {
    // [0.5, 1] alone folds onto all of [0, 0.5].
    expect(foldExtent(hz(0.4), hz(1.3), hz(1))).toEqual([{ low: 0, high: 0.5 }]);
  });
});
