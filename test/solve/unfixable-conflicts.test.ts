import { guardBands } from '../../src/math/band.js';
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { db, hz, ppm } from '../../src/units/quantities.js';
import { foldFrequency } from '../../src/math/fold.js';
import type { Interferer } from '../../src/interferers/interferer.js';
import { unfixableConflicts } from '../../src/solve/unfixable-conflicts.js';
import type { PlanContext } from '../../src/solve/plan-context.js';
import { bruteAlias, bruteLeastDistance, wantedAlias } from '../helpers/brute-force-plan.js';
import { PLAIN_CLOCKING } from '../helpers/hand-worked-plan.js';

const MHZ = 1e6;
/** Uniform in [low, high] on a fine grid (fc.double leans to the ends). */
const uniform = (low: number, high: number) => fc.integer({ min: 0, max: 1e6 }).map((n) => low + ((high - low) * n) / 1e6);

/**
 * The basis of the conflict check: folding is 1-Lipschitz, |alias(a) − alias(b)| ≤ |a − b| at every rate
 * (each half-zone maps by a translation or a reflection and the pieces meet; common practice, no source).
 */
describe('folding never moves two frequencies further apart (fast-check)', () => {
  it('|fold(a) − fold(b)| ≤ |a − b| for every rate', () => {
    fc.assert(
      fc.property(uniform(0, 1e9), fc.oneof(uniform(0, 1e9), uniform(0, 1e4)), uniform(1e3, 5e8), (a, near, rate) => {
        const b = near < 1e4 ? a + near : near; // pairs far apart and pairs close together
        const folded = Math.abs(foldFrequency(hz(a), hz(rate)).alias - foldFrequency(hz(b), hz(rate)).alias);
        expect(folded).toBeLessThanOrEqual(Math.abs(a - b) + 1e-9 * Math.max(a, b, rate));
      }),
      { numRuns: 20_000, seed: 1729 },
    );
  });

  it('and the definition of aliasing alone says the same (|f − r·round(f/r)|)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 1e9, noNaN: true }),
        fc.double({ min: -1e6, max: 1e6, noNaN: true }),
        fc.double({ min: 1e3, max: 5e8, noNaN: true }),
        (a, step, rate) => {
          expect(Math.abs(bruteAlias(a + step, rate) - bruteAlias(a, rate))).toBeLessThanOrEqual(Math.abs(step) + 1e-9 * (a + rate));
        },
      ),
      { numRuns: 20_000, seed: 1730 },
    );
  });
});

const band = { low: hz(60 * MHZ), high: hz(70 * MHZ) };
const context = (interferers: Interferer[], ifShift: PlanContext['ifShift'] = null): PlanContext => ({
  band,
  guard: guardBands(hz(0), hz(0)),
  limits: { minRate: hz(20 * MHZ), maxRate: hz(300 * MHZ) },
  interferers,
  levelThreshold: db(-100),
  clocks: [],
  clocking: PLAIN_CLOCKING,
  goal: { kind: 'widest-margin' },
  tolerancePpm: ppm(0),
  ifShift,
});
const neighbour = (low: number, high: number, margin: number, shiftMultiple = 1): Interferer => ({
  label: 'N',
  kind: 'neighbour',
  order: null,
  source: 'test',
  rateMultiple: 0,
  shiftMultiple,
  low: hz(low * MHZ),
  high: hz(high * MHZ),
  level: db(-40),
  requiredMargin: hz(margin * MHZ),
  blocking: true,
});

describe('conflicts no rate can fix, found exactly before solving', () => {
  it('a neighbour 0.2 MHz from the band with 0.5 MHz required conflicts; at exactly 0.5 MHz it does not', () => {
    const [near] = unfixableConflicts(context([neighbour(70.2, 75, 0.5)]));
    expect(near!.distance).toBeCloseTo(0.2 * MHZ, 3);
    expect(near!.excess).toBe(60);
    expect(near!.sentence).toMatch(
      /^N \(neighbour\) lies 200 kHz from the wanted band where 500 kHz is required; .*a different channel plan/,
    );
    expect(unfixableConflicts(context([neighbour(70.5, 75, 0.5)]))).toEqual([]);
  });

  it('a tone inside the band: its distance to the nearer edge, even with no margin required', () => {
    const [inside] = unfixableConflicts(context([neighbour(62, 62, 0)]));
    expect(inside!.distance).toBeCloseTo(-2 * MHZ, 3);
    expect(inside!.sentence).toMatch(/lies inside the wanted band \(2 MHz from its nearer edge\)/);
    // Touching the edge with no margin required is allowed.
    expect(unfixableConflicts(context([neighbour(70, 70, 0)]))).toEqual([]);
  });

  it('a weak (non-blocking) neighbour never conflicts; with an IF shift, only one close at both ends of the range', () => {
    expect(unfixableConflicts(context([{ ...neighbour(70.2, 75, 0.5), blocking: false }]))).toEqual([]);
    // A board spur (shiftMultiple 0) at 71 MHz: the band moves ±3 MHz, so at δ = −3 MHz it is 4 MHz away.
    expect(unfixableConflicts(context([neighbour(71, 71, 2, 0)], { low: hz(-3 * MHZ), high: hz(3 * MHZ) }))).toEqual([]);
    expect(unfixableConflicts(context([neighbour(71, 71, 2, 0)], { low: hz(-0.5 * MHZ), high: hz(0.5 * MHZ) }))).toHaveLength(1);
  });

  it('every conflict is too close at every rate, by the brute force (definition of aliasing, random sources and rates)', () => {
    let conflicts = 0;
    fc.assert(
      fc.property(
        uniform(0, 150),
        uniform(0, 5),
        uniform(0.01, 20),
        fc.array(uniform(20, 300), { minLength: 20, maxLength: 20 }),
        (low, width, margin, rates) => {
          const source = neighbour(low, low + width, margin);
          const found = unfixableConflicts(context([source]));
          if (found.length === 0) return;
          conflicts++;
          for (const r of rates) {
            const rate = r * MHZ;
            const alias = wantedAlias({ band, guard: { low: 0, high: 0 }, interferers: [] }, rate);
            if (!alias) continue;
            expect(bruteLeastDistance(source, alias, rate, Math.max(width * MHZ, 1) / 200)).toBeLessThan(source.requiredMargin);
          }
        },
      ),
      { numRuns: 3000, seed: 77 },
    );
    expect(conflicts).toBeGreaterThan(100);
  });
});
