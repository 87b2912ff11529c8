import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { hz, ppm } from '../../src/units/quantities.js';
import { evaluateRate } from '../../src/solve/evaluate-rate.js';
import { foldExtent } from '../../src/math/fold-extent.js';
import { bruteLeastDistance, extentAt, foldedPieces, overlapWidth, unionOf, wantedAlias } from '../helpers/brute-force-plan.js';
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
 * Overlapping (solver margin < 0): the solver's margin is minus the widest
 * overlap of the extent with ONE image j·r ± band. The brute force folds the
 * extent piece by piece (cut at the multiples of r/2; each piece lies in one
 * half-zone, which holds exactly one image), so the solver's figure must be
 * minus the widest piece overlap. The folded overlap (the width of the union
 * of all folded pieces inside the wanted alias) could only be larger if two
 * pieces landed on the band side by side. For one contiguous extent they
 * cannot: consecutive pieces share a fold corner, so an extent holding no
 * whole half-zone has at most two pieces, both running from the same corner's
 * alias (0 or r/2) and hence nested; one holding a whole half-zone has a
 * piece folding onto all of [0, r/2]. Either way the union is the widest
 * piece, and the image-based and folded definitions agree; the test asserts
 * that rather than assuming it.
 */

const RATES_PER_PLAN = 200;
/** Uniform grid steps across each extent for the Lipschitz bound. */
const GRID_STEPS = 100;

/** Floating-point noise of a difference of frequencies as large as `scale`, Hz (a few thousand ulps). */
const noiseOf = (scale: number) => 1e-12 * scale;

describe('evaluateRate margins against the brute force (random plans, tolerance 0)', () => {
  it('apart: the least folded distance; overlapping: minus the widest one-image overlap', () => {
    const counts = { apart: 0, overlapping: 0, straddling: 0 };
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
              const widestPiece = Math.max(...pieces.map((p) => overlapWidth(p, alias)));
              const folded = union.reduce((sum, segment) => sum + overlapWidth(segment, alias), 0);
              expect(Math.abs(-check.margin - widestPiece), `${check.label} at ${rate} Hz: overlap`).toBeLessThanOrEqual(noise);
              // Image-based overlap (solver) and folded overlap (brute force) agree (argument above).
              expect(Math.abs(folded - widestPiece), `${check.label} at ${rate} Hz: folded overlap`).toBeLessThanOrEqual(noise);
              if (pieces.length > 1) counts.straddling++;
            }
          });
        }
      }),
      { numRuns: 120, seed: 31, plugins: [fc.unbiased()] },
    );
    console.info(`margins: ${counts.apart} apart, ${counts.overlapping} overlapping (${counts.straddling} of them straddling a fold edge)`);
    expect(counts.apart).toBeGreaterThan(1000);
    expect(counts.overlapping).toBeGreaterThan(1000);
    expect(counts.straddling).toBeGreaterThan(100);
  }, 30_000);
});

describe('aliased segments of an extent between rate/2 and rate wide', () => {
  // Minimal case shrunk from the property above (definition of aliasing; common practice, no
  // source): at rate 1, every f in [0.7, 1.3] shows at |f − 1| ∈ [0, 0.3]. The extent is 0.6 wide,
  // more than rate/2, yet it holds no whole half-zone, so it does not cover the first zone.
  // foldExtent reported [0, 0.5] for any extent at least rate/2 wide.
  it('[0.7, 1.3] at rate 1 folds onto [0, 0.3]; 70–130 MHz at 100 MHz onto 0–30 MHz', () => {
    expect(foldExtent(0.7, 1.3, 1)).toEqual([{ low: 0, high: expect.closeTo(0.3, 15) }]);
    expect(foldExtent(70e6, 130e6, 100e6)).toEqual([{ low: 0, high: 30e6 }]);
  });

  it('an extent holding a whole half-zone still covers the first zone: [0.4, 1.3] at rate 1', () => {
    // [0.5, 1] alone folds onto all of [0, 0.5].
    expect(foldExtent(0.4, 1.3, 1)).toEqual([{ low: 0, high: 0.5 }]);
  });
});
