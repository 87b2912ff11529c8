import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { hz } from '../../src/units/quantities.js';
import { jointFeasibleSet } from '../../src/solve/joint-feasible-set.js';
import { bruteBandsValid, bruteBandsValidWithin } from '../helpers/brute-force-bands.js';
import { nearAnEdge, sweepRates } from './random-plan.js';

/**
 * The exact feasible set of several bands against the independent brute force
 * of test/helpers/brute-force-bands.ts (each band folded point by point from
 * the definition of aliasing, |f − r·round(f/r)|; common practice, no
 * source), on random sets of two to four bands from fast-check (seeded).
 * Rates within a relative 1e-9 of an edge of a valid interval are skipped:
 * there the verdict is decided by rounding on either side. Single-rate
 * answers are checked apart: valid within a slack of 1e-9 of the rate, and
 * invalid a relative 1e-7 either side.
 */

const RATES = 800;

/** Two to four bands with edges on a 10 Hz grid, 1–120 kHz, 0.5–15 kHz wide (they may overlap), and a spacing of 0–2 kHz. */
const bandSet = fc.record({
  bands: fc.array(
    fc
      .record({ low: fc.integer({ min: 100, max: 12_000 }), width: fc.integer({ min: 50, max: 1_500 }) })
      .map(({ low, width }) => ({ low: low * 10, high: (low + width) * 10 })),
    { minLength: 2, maxLength: 4 },
  ),
  spacing: fc.oneof(
    fc.constant(0),
    fc.integer({ min: 1, max: 200 }).map((s) => s * 10),
  ),
});

const tally = { compared: 0, valid: 0, skipped: 0, points: 0 };

describe('jointFeasibleSet against a point-by-point fold of every band (random band sets)', () => {
  it('agree at 800 rates per set from 1 kHz to past the last collision in zone 1', () => {
    fc.assert(
      fc.property(bandSet, fc.integer({ min: 0, max: 1e6 }), ({ bands, spacing }, seed) => {
        const highest = Math.max(...bands.map((b) => b.high));
        const limits = { minRate: hz(1e3), maxRate: hz(2.5 * highest + spacing) };
        const set = jointFeasibleSet(
          bands.map((b) => ({ low: hz(b.low), high: hz(b.high) })),
          hz(spacing),
          limits,
        );
        const edges = set.feasible.flatMap((f) => [f.minRate, f.maxRate]);
        for (const rate of sweepRates(limits.minRate, limits.maxRate, RATES, seed)) {
          if (nearAnEdge(rate, edges)) {
            tally.skipped++;
            continue;
          }
          const exact = set.feasible.some((f) => rate >= f.minRate && rate <= f.maxRate);
          // Independent point-by-point fold (definition of aliasing; common practice, no source).
          expect(exact, `valid at ${rate} Hz for ${JSON.stringify(bands)} spaced ${spacing}`).toBe(bruteBandsValid(bands, spacing, rate));
          tally.compared++;
          if (exact) tally.valid++;
        }
        for (const f of set.feasible) {
          if (f.minRate !== f.maxRate) {
            expect(bruteBandsValid(bands, spacing, (f.minRate + f.maxRate) / 2)).toBe(true);
            continue;
          }
          tally.points++;
          expect(bruteBandsValidWithin(bands, spacing, f.minRate, 1e-9 * f.minRate), `point ${f.minRate}`).toBe(true);
          expect(bruteBandsValid(bands, spacing, f.minRate * (1 + 1e-7)), `above point ${f.minRate}`).toBe(false);
          expect(bruteBandsValid(bands, spacing, f.minRate * (1 - 1e-7)), `below point ${f.minRate}`).toBe(false);
        }
        const lowest = set.feasible[0];
        expect(set.lowestRate).toBe(lowest ? lowest.minRate : null);
        if (lowest && lowest.minRate > limits.minRate) {
          // Nothing valid below the lowest rate: every rate of the sweep below it was compared or skipped above.
          expect(bruteBandsValid(bands, spacing, lowest.minRate * (1 - 1e-7))).toBe(false);
        }
      }),
      { numRuns: 120, seed: 20261202 },
    );
    console.info(
      `joint agreement: ${tally.compared} rates compared (${tally.valid} valid), ${tally.skipped} skipped near an edge, ${tally.points} single-rate answers`,
    );
    // Both verdicts must be seen, and single-rate answers met, or the agreement proves little.
    expect(tally.valid).toBeGreaterThan(0.05 * tally.compared);
    expect(tally.compared - tally.valid).toBeGreaterThan(0.05 * tally.compared);
  });
});
