import { guardBands } from '../../src/math/band.js';
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { db, hz, ppm, type Hz } from '../../src/units/quantities.js';
import type { Scenario } from '../../src/scenario/scenario.js';
import { deriveInterferers } from '../../src/interferers/derive-interferers.js';
import { contextFromScenario } from '../../src/solve/context-from-scenario.js';
import { evaluateRate } from '../../src/solve/evaluate-rate.js';
import { bestShiftAndRate } from '../../src/solve/if-shift/best-shift-and-rate.js';
import { maximisePlaneSlack } from '../../src/solve/if-shift/plane-lp.js';
import { seedShifts } from '../../src/solve/if-shift/seed-shifts.js';
import { shiftedScenario, sweptScenario } from '../../src/solve/if-shift/shifted-scenario.js';
import { converterFixture, scenarioFixture } from '../helpers/scenario-fixture.js';

const MHz = 1e6;

/** The scenario with the IF moved by δ, written out here: the wanted band and the neighbours move, nothing else. */
function movedBy(scenario: Scenario, shift: number): Scenario {
  return {
    ...scenario,
    wanted: { ...scenario.wanted, low: hz(scenario.wanted.low + shift), high: hz(scenario.wanted.high + shift) },
    neighbours: scenario.neighbours.map((n) => ({ ...n, low: hz(n.low + shift), high: hz(n.high + shift) })),
    ifShift: null,
  };
}

/**
 * Hand-worked case (invented numbers, worked on paper). Wanted band 21–25 MHz,
 * no guards, converter 30–40 MHz, no harmonic figures and no converter spurs,
 * one fixed board tone at 28.1 MHz (−30 dBFS, blocking), margin 0.5 MHz, no
 * drift, IF shift δ ∈ [−2, +2] MHz. The band is [21 + δ, 25 + δ].
 *
 * Windows (Vaughan, Scott & White 1991: 2·fH/n ≤ r ≤ 2·fL/(n − 1)): zone 1
 * needs r ≥ 50 + 2δ ≥ 46, zone 3 needs r ≤ 21 + δ ≤ 23, so only zone 2,
 * 25 + δ ≤ r ≤ 42 + 2δ, is inside 30–40 MHz. In zone 2 (15–20 MHz edges at
 * r/2 and r) the slacks are
 *   zone edge below: (21 + δ) − r/2;      zone edge above: r − (25 + δ);
 *   tone: 28.1 lies above the band (28.1 > 27 ≥ 25 + δ), in zone 2 too
 *     (r/2 ≤ 28.1 < r), so its alias r − 28.1 lies below the band's alias
 *     [r − 25 − δ, r − 21 − δ] by 3.1 − δ: slack 2.6 − δ;
 *   the next image 2r − (25 + δ) is at least 60 − 27 − 28.1 = 4.9 above the
 *     tone: slack ≥ 4.4, and 8.1 at the optimum below (never binding).
 * Maximise t ≤ 21 + δ − r/2, t ≤ r − 25 − δ, t ≤ 2.6 − δ, 30 ≤ r ≤ 40,
 * −2 ≤ δ ≤ 2. The first and third want r low: at r = 30,
 * min(6 + δ, 2.6 − δ) peaks where 6 + δ = 2.6 − δ: δ = −1.7, t = 4.3
 * (r − 25 − δ = 6.7 there). Optimal and unique: the active constraints
 * t + r/2 − δ ≤ 21, t + δ ≤ 2.6, −r ≤ −30 have gradients (1, ½, −1),
 * (1, 0, 1), (0, −1, 0) in (t, r, δ); (1, 0, 0) = ½·first + ½·second + ¼·third,
 * all multipliers positive. So: δ* = −1.7 MHz (IF centre 21.3 MHz),
 * r* = 30 MHz, worst slack 4.3 MHz (the zone edge and the tone tie; the
 * tone's margin is 4.8 MHz).
 *
 * At the nominal IF (δ = 0) the tone's slack is 2.6 MHz at every rate; the
 * fixed-shift solver then widens the varying slacks, min(21 − r/2, r − 25),
 * equal at r = 92/3 = 30.667 MHz, 5.667 MHz.
 *
 * δ* = −1.7 MHz lies between the seed shifts (every 0.25 MHz), so only the
 * two-variable LP finds it. The LP answers to javascript-lp-solver's rounding
 * (about 1e-8 of the 4 MHz and 10 MHz box, under 0.1 Hz): checked to 1 Hz.
 */
const handWorked: Scenario = scenarioFixture({
  name: 'Heron-HW shift',
  wanted: { low: hz(21 * MHz), high: hz(25 * MHz), weakestLevel: db(-60), strongestLevel: db(-1) },
  guard: guardBands(hz(0), hz(0)),
  converter: converterFixture({ minRate: hz(30 * MHz), maxRate: hz(40 * MHz), harmonics: new Map() }),
  harmonicOrder: 2,
  boardSpurs: [{ label: 'TONE 28.1M', low: hz(28.1 * MHz), high: hz(28.1 * MHz), level: db(-30), coupling: 'after-filter', harmonics: 1 }],
  requirements: { margin: hz(0.5 * MHz), rejection: db(40), tolerancePpm: ppm(0) },
  clocks: [],
  ifShift: { low: hz(-2 * MHz), high: hz(2 * MHz) },
});

describe('bestShiftAndRate: the hand-worked case', () => {
  const search = bestShiftAndRate(handWorked);

  it('finds δ* = −1.7 MHz, r* = 30 MHz, worst slack 4.3 MHz, from the two-variable LP', () => {
    const best = search.best!;
    expect(best.origin).toBe('piece');
    expect(Math.abs(best.shift - -1.7 * MHz)).toBeLessThan(1);
    expect(Math.abs(best.rate - 30 * MHz)).toBeLessThan(1);
    expect(Math.abs(best.evaluation.worstSlack - 4.3 * MHz)).toBeLessThan(1);
    expect(Math.abs(best.promisedSlack! - 4.3 * MHz)).toBeLessThan(1);
    expect(best.evaluation.pass).toBe(true);
    expect(best.evaluation.zone).toBe(2);
    expect([{ kind: 'zone edge' }, { kind: 'interferer', label: 'TONE 28.1M' }]).toContainEqual(best.evaluation.limitedBy);
    const tone = best.evaluation.checks.find((c) => c.label === 'TONE 28.1M')!;
    expect(Math.abs(tone.margin - 4.8 * MHz)).toBeLessThan(1);
    expect(Math.abs(best.evaluation.zoneEdgeMargin - 4.3 * MHz)).toBeLessThan(1);
  });

  it('at the nominal IF: the tone limits at 2.6 MHz, the rate widens the zone edges to 5.667 MHz at 92/3 MHz', () => {
    const nominal = search.atNoShift!;
    expect(nominal.shift).toBe(0);
    expect(nominal.origin).toBe('sample');
    expect(nominal.evaluation.limitedBy).toEqual({ kind: 'interferer', label: 'TONE 28.1M' });
    expect(Math.abs(nominal.evaluation.worstSlack - 2.6 * MHz)).toBeLessThan(1);
    expect(Math.abs(nominal.rate - (92 / 3) * MHz)).toBeLessThan(1);
    expect(Math.abs(nominal.evaluation.zoneEdgeMargin - (17 / 3) * MHz)).toBeLessThan(1);
  });

  it('seeds at the ends, the middle and evenly between; one piece', () => {
    expect(search.seedShifts).toEqual(Array.from({ length: 17 }, (_, i) => (i - 8) * 0.25 * MHz));
    expect(search.piecesSolved).toBe(1);
  });
});

describe('seedShifts and the plane LP', () => {
  it('spaces seeds evenly with the ends exact and adds 0 when it falls between', () => {
    expect(seedShifts({ low: -2e6, high: 2e6 }, 5)).toEqual([-2e6, -1e6, 0, 1e6, 2e6]);
    expect(seedShifts({ low: -1e6, high: 2e6 }, 3)).toEqual([-1e6, 0, 0.5e6, 2e6]);
    expect(seedShifts({ low: 1e6, high: 1e6 }, 17)).toEqual([1e6]);
    expect(() => seedShifts({ low: 0, high: 1 }, 1)).toThrow(RangeError);
  });

  it('solves a plane LP whose optimum is negative (javascript-lp-solver 1.0.3 calls the plain model infeasible)', () => {
    // max t: t ≤ −1 + 0.5·x, x in [0, 1]: t* = −0.5 at x = 1 (worked by hand); y is free and idle.
    const answer = maximisePlaneSlack(
      [{ rate: 0.5, shift: 0, offset: -1 }],
      [],
      { rate: { low: 0, high: 1 }, shift: { low: 0, high: 1 } },
      hz(1),
    );
    expect(answer).not.toBeNull();
    expect(answer!.worstSlack).toBeCloseTo(-0.5, 7);
    expect(answer!.rate).toBeCloseTo(1, 7);
  });

  it('solves the two-variable example of its doc comment: r − δ = 28.75, t* = 3.75 (worked by hand)', () => {
    // t ≤ r − δ − 25, t ≤ 32.5 − r + δ (MHz): equal at r − δ = 28.75, t = 3.75; the box leaves a line of optima.
    const box = { rate: { low: 20e6, high: 40e6 }, shift: { low: -2e6, high: 2e6 } };
    const answer = maximisePlaneSlack(
      [
        { rate: 1, shift: -1, offset: -25e6 },
        { rate: -1, shift: 1, offset: 32.5e6 },
      ],
      [],
      box,
      hz(4e6),
    )!;
    expect(Math.abs(answer.worstSlack - 3.75e6)).toBeLessThan(1);
    expect(Math.abs(answer.rate - answer.shift - 28.75e6)).toBeLessThan(1);
  });

  it('refuses a scenario whose LO cannot move', () => {
    expect(() => bestShiftAndRate(scenarioFixture())).toThrow(RangeError);
  });
});

describe('levels across the shift range (the filter stays put)', () => {
  /**
   * A neighbour at the filter's upper edge that blocks at one end of the
   * shift range and not at the other. 5th-order Butterworth 63–77 MHz:
   * Ω = (f² − 63·77)/(14·f) (MHz): Ω(76) = 0.869 (0.95 dB), Ω(80) = 1.383
   * (14.2 dB) (the transform and magnitude of filter design handbooks, e.g.
   * Williams & Taylor; from memory). At −95 dBFS and a threshold of −100 dBFS
   * (weakest −60, rejection 40), 76–82 MHz (δ = −2 MHz) blocks and 80–86 MHz
   * (δ = +2 MHz) does not.
   */
  const edge = scenarioFixture({
    neighbours: [{ label: 'EDGE', low: hz(78 * MHz), high: hz(84 * MHz), level: db(-95) }],
    filter: { kind: 'butterworth', order: 5, passLow: hz(63 * MHz), passHigh: hz(77 * MHz) },
    ifShift: { low: hz(-2 * MHz), high: hz(2 * MHz) },
  });

  it('the swept scenario blocks everything that blocks at any shift, with a level at least as high', () => {
    const swept = deriveInterferers(sweptScenario(edge, edge.ifShift!));
    const seen = new Set<boolean>();
    for (let i = 0; i <= 40; i++) {
      const shift = -2 * MHz + (4 * MHz * i) / 40;
      const at = deriveInterferers(shiftedScenario(edge, hz(shift)));
      expect(at.map((x) => x.label)).toEqual(swept.map((x) => x.label));
      at.forEach((x, k) => {
        expect(swept[k]!.level).toBeGreaterThanOrEqual(x.level - 1e-9);
        if (x.blocking) expect(swept[k]!.blocking).toBe(true);
      });
      seen.add(at.find((x) => x.label === 'EDGE')!.blocking);
    }
    expect([...seen].sort()).toEqual([false, true]); // the neighbour really changes over the range
  });

  it('still returns an exactly re-checked pair', () => {
    const search = bestShiftAndRate(edge);
    const best = search.best!;
    // Judged again over the same interferers (a sampled rate is judged on the blocking ones only).
    const again = evaluateRate(
      contextFromScenario(movedBy(edge, best.shift)),
      best.rate,
      edge.requirements.tolerancePpm,
      best.evaluation.checkScope,
    );
    expect(again).toEqual(best.evaluation);
  });
});

// ---------------------------------------------------------------------------
// Against a brute force over a (δ, r) grid, on random small plans.

/**
 * The brute force, written here from the definition of aliasing (common
 * practice, no source): a real frequency f sampled at rate ρ shows at
 * |f − ρ·round(f/ρ)| in [0, ρ/2]; a band lies in zone ⌈2·f/ρ⌉ of its centre.
 * Between consecutive multiples of ρ/2 the alias is linear in f with slope
 * ±1, so a piece of an extent between them aliases onto the interval between
 * its ends' aliases, and the least distance from an extent to the wanted
 * alias is the least over those pieces, exactly. The worst slack at (δ, r):
 * over drift rates ρ in r·[1 − ε, 1 + ε] (5 points when ε > 0), the least of
 * the guarded band's distance to its zone's edges (a lower guard stops at DC)
 * and each blocking interferer's distance minus its margin. Interferers come
 * from deriveInterferers on the scenario moved by δ (written out above);
 * nothing here comes from src/solve or src/math.
 */
function aliasOf(f: number, rate: number): number {
  return Math.abs(f - rate * Math.round(f / rate));
}

function gapBetween(a: { low: number; high: number }, b: { low: number; high: number }): number {
  return Math.max(0, a.low - b.high, b.low - a.high);
}

interface BruteInterferer {
  readonly rateMultiple: number;
  readonly low: number;
  readonly high: number;
  readonly requiredMargin: number;
}

function bruteSlack(
  band: { low: number; high: number },
  guard: { low: number; high: number },
  blocking: readonly BruteInterferer[],
  rate: number,
  epsilon: number,
): number {
  const guardedLow = Math.max(0, band.low - guard.low);
  const guardedHigh = band.high + guard.high;
  const zone = Math.max(1, Math.ceil((band.low + band.high) / rate));
  const drifts = epsilon > 0 ? [-1, -0.5, 0, 0.5, 1].map((u) => rate * (1 + u * epsilon)) : [rate];
  let worst = Infinity;
  for (const rho of drifts) {
    const zoneSlack = Math.min(guardedLow - ((zone - 1) * rho) / 2, (zone * rho) / 2 - guardedHigh);
    worst = Math.min(worst, zoneSlack);
    if (zoneSlack < 0) continue; // the band straddles a zone edge: the alias below is not one interval
    const a = aliasOf(band.low, rho);
    const b = aliasOf(band.high, rho);
    const wanted = { low: Math.min(a, b), high: Math.max(a, b) };
    for (const i of blocking) {
      const low = i.rateMultiple * rho + i.low;
      const high = i.rateMultiple * rho + i.high;
      const points = [low];
      for (let k = Math.floor((2 * low) / rho) + 1; (k * rho) / 2 < high; k++) points.push((k * rho) / 2);
      points.push(high);
      let least = Infinity;
      for (let p = 0; p + 1 < points.length; p++) {
        const x = aliasOf(points[p]!, rho);
        const y = aliasOf(points[p + 1]!, rho);
        least = Math.min(least, gapBetween({ low: Math.min(x, y), high: Math.max(x, y) }, wanted));
      }
      worst = Math.min(worst, least - i.requiredMargin);
    }
  }
  return worst;
}

const unit = fc.integer({ min: 0, max: 2 ** 30 }).map((n) => n / 2 ** 30);
const between = (low: number, high: number) => unit.map((u) => low + u * (high - low));
const logBetween = (low: number, high: number) => unit.map((u) => low * (high / low) ** u);

/** Random small plans with a movable IF: tones, a neighbour, wanted harmonics, DC and 2-way interleaving spurs; no filter. */
const planArbitrary: fc.Arbitrary<Scenario> = fc
  .record({
    low: fc.oneof(between(0.5 * MHz, 5 * MHz), logBetween(5 * MHz, 80 * MHz)),
    width: logBetween(0.5 * MHz, 6 * MHz),
    guardLow: fc.oneof(fc.constant(0), between(0, 1.5 * MHz)),
    guardHigh: fc.oneof(fc.constant(0), between(0, 1.5 * MHz)),
    shiftA: between(-3 * MHz, 3 * MHz),
    shiftB: between(-3 * MHz, 3 * MHz),
    start: unit,
    span: unit,
    harmonics: fc.boolean(),
    tones: fc.array(unit, { maxLength: 3 }),
    neighbour: fc.option(fc.record({ above: fc.boolean(), gap: between(0.2 * MHz, 3 * MHz), width: between(0.2 * MHz, 3 * MHz) })),
    dc: fc.boolean(),
    interleave: fc.boolean(),
    margin: logBetween(0.05 * MHz, 0.5 * MHz),
    tolerance: fc.constantFrom(0, 0, 20),
  })
  .map((p): Scenario => {
    const wanted = { low: hz(p.low), high: hz(p.low + p.width), weakestLevel: db(-60), strongestLevel: db(-1) };
    const shiftLow = Math.max(Math.min(p.shiftA, p.shiftB), -p.low); // the band stays at or above 0 Hz, as the schema demands
    const shift = { low: hz(shiftLow), high: hz(Math.max(p.shiftA, p.shiftB, shiftLow)) };
    const lowest = 1.9 * (p.width + p.guardLow + p.guardHigh);
    const top = 2.3 * (wanted.high + Math.max(0, shift.high) + p.guardHigh);
    const minRate = lowest + p.start * (top - lowest);
    const neighbours = [];
    if (p.neighbour) {
      const n = p.neighbour;
      const below = wanted.low - n.gap - n.width;
      const nLow = n.above || below < 0 ? wanted.high + n.gap : below;
      neighbours.push({ label: 'N', low: hz(nLow), high: hz(nLow + n.width), level: db(-40) });
    }
    return scenarioFixture({
      wanted,
      guard: guardBands(hz(p.guardLow), hz(p.guardHigh)),
      converter: converterFixture({
        minRate: hz(minRate),
        maxRate: hz(minRate * (1.05 + 1.5 * p.span)),
        harmonics: p.harmonics
          ? new Map([
              [2, db(-70)],
              [3, db(-75)],
            ])
          : new Map(),
        rateSpurs: { dc: p.dc ? db(-80) : null, halfRate: null, quarterRate: null },
        interleave: p.interleave ? { ways: 2, offsetSpur: db(-85), imageLevel: db(-70) } : null,
      }),
      harmonicOrder: 3,
      boardSpurs: p.tones.map((u, i) => ({
        label: `T${i}`,
        low: hz(u * 4 * wanted.high),
        high: hz(u * 4 * wanted.high),
        level: db(-50),
        coupling: 'after-filter' as const,
        harmonics: 1,
      })),
      neighbours,
      filter: null,
      requirements: { margin: hz(p.margin), rejection: db(40), tolerancePpm: ppm(p.tolerance) },
      clocks: [],
      ifShift: shift,
    });
  });

const SHIFT_POINTS = 33;
const RATE_POINTS = 400;

describe('bestShiftAndRate against a brute-force (δ, r) grid (random plans, fast-check)', () => {
  it('its answer is at least the grid best (less the LP allowance), at most the grid best plus the grid spacing, and re-checks exactly', () => {
    const counts = { plans: 0, lowerChecked: 0, upperChecked: 0, fromPieces: 0 };
    fc.assert(
      fc.property(planArbitrary, (scenario) => {
        counts.plans++;
        const range = scenario.ifShift!;
        const epsilon = scenario.requirements.tolerancePpm * 1e-6;
        const rateLow = scenario.converter.minRate / (1 - epsilon);
        const rateHigh = scenario.converter.maxRate / (1 + epsilon);
        const search = bestShiftAndRate(scenario); // throws on a failed re-check
        // The grid: every shift point's interferers derived afresh, every rate judged by the brute force.
        const shifts =
          range.low === range.high
            ? [range.low]
            : Array.from({ length: SHIFT_POINTS }, (_, i) => range.low + ((range.high - range.low) * i) / (SHIFT_POINTS - 1));
        const rates = Array.from({ length: RATE_POINTS }, (_, i) => rateLow + ((rateHigh - rateLow) * i) / (RATE_POINTS - 1));
        let gridBest = -Infinity;
        const judged = (shift: number) => {
          const moved = movedBy(scenario, shift);
          const blocking = deriveInterferers(moved).filter((i) => i.blocking);
          return { moved, blocking };
        };
        for (const shift of shifts) {
          const { moved, blocking } = judged(shift);
          for (const r of rates) gridBest = Math.max(gridBest, bruteSlack(moved.wanted, moved.guard, blocking, r, epsilon));
        }
        // Slopes of the worst slack: per Hz of shift, 1 for the zone edges and |s − b| ≤ 1 + |b| for an image;
        // per Hz of rate, n/2 for the zone edges and |j − a| for the nearest image, which lies within
        // rate/2 of the extent, so |j − a| ≤ (max|extent| + fH)/rate + 2|a| + 1.
        const base = deriveInterferers(scenario).filter((i) => i.blocking);
        const reachShift = Math.max(Math.abs(range.low), Math.abs(range.high));
        const bandTop = scenario.wanted.high + reachShift;
        const slopeShift = Math.max(1, ...base.map((i) => 1 + Math.abs(i.shiftMultiple)));
        const topZone = Math.ceil((2 * (bandTop + scenario.guard.high)) / (rateLow * (1 - epsilon)));
        const slopeRate =
          (1 + epsilon) *
          Math.max(
            topZone / 2,
            ...base.map(
              (i) =>
                (Math.max(Math.abs(i.low), Math.abs(i.high)) + Math.abs(i.shiftMultiple) * reachShift + bandTop) /
                  (rateLow * (1 - epsilon)) +
                2 * Math.abs(i.rateMultiple) +
                1,
            ),
          );
        const width = scenario.wanted.high - scenario.wanted.low;
        // The brute force reads the drift at 5 points: it may miss the least by slopeRate·(spacing ε·r/2)/2.
        const driftError = slopeRate * ((epsilon * rateHigh) / 4);
        const lpAllowance = 1e-6 * (slopeRate * (rateHigh - rateLow) + slopeShift * (range.high - range.low) + width);
        const seedSpacing = (range.high - range.low) / 16;
        const best = search.best;
        // Lower side: a grid point with slack t lies in a piece that reaches every shift within t/slopeShift at
        // its rate, so a seed shift (spacing h) hits it when t > slopeShift·h/2; the LP then finds at least t.
        if (gridBest - driftError > (slopeShift * seedSpacing) / 2 + 1e-6 * width) {
          counts.lowerChecked++;
          expect(best, 'a feasible grid point but no answer').not.toBeNull();
          expect(best!.evaluation.worstSlack, `grid best ${gridBest} Hz`).toBeGreaterThanOrEqual(gridBest - driftError - lpAllowance);
        }
        if (best) {
          if (best.origin === 'piece') counts.fromPieces++;
          // The exact re-check, done again here on the scenario moved by δ*.
          const again = evaluateRate(
            contextFromScenario(movedBy(scenario, best.shift)),
            best.rate as Hz,
            scenario.requirements.tolerancePpm,
            best.evaluation.checkScope,
          );
          expect(again).toEqual(best.evaluation);
          // The brute force at the answer reads the least over a subset of the drift: never below the exact value.
          const { moved, blocking } = judged(best.shift);
          if (best.evaluation.worstSlack > 0) {
            expect(bruteSlack(moved.wanted, moved.guard, blocking, best.rate, epsilon)).toBeGreaterThanOrEqual(
              best.evaluation.worstSlack - 1e-6 * width,
            );
          }
          // Upper side: within half a grid step of the answer a grid point keeps all but the slopes times the step.
          const step =
            (slopeRate * (rateHigh - rateLow)) / (RATE_POINTS - 1) / 2 +
            (shifts.length > 1 ? (slopeShift * (range.high - range.low)) / (SHIFT_POINTS - 1) / 2 : 0);
          if (best.evaluation.worstSlack > step) {
            counts.upperChecked++;
            expect(gridBest).toBeGreaterThanOrEqual(best.evaluation.worstSlack - step - 1e-6 * width);
          }
        }
      }),
      { numRuns: Number(process.env.IFS_RUNS ?? 40), seed: Number(process.env.IFS_SEED ?? 2718) },
    );
    console.info(
      `if shift vs grid: ${counts.plans} plans; lower side checked on ${counts.lowerChecked}, upper on ${counts.upperChecked}; answer from a piece LP on ${counts.fromPieces}`,
    );
    expect(counts.lowerChecked).toBeGreaterThan(counts.plans / 4); // the property must not be vacuous
  }, 60_000);
});
