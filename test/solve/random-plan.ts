import { guardBands } from '../../src/math/band.js';
import fc from 'fast-check';
import { db, hz, ppm } from '../../src/units/quantities.js';
import type { Interferer, InterfererKind } from '../../src/interferers/interferer.js';
import type { PlanContext } from '../../src/solve/plan-context.js';
import type { FeasibleSet } from '../../src/solve/feasible-set.js';
import type { RateWindow } from '../../src/windows/rate-window.js';
import { PLAIN_CLOCKING } from '../helpers/hand-worked-plan.js';

/**
 * Random plan contexts for the property tests (fast-check): a band, guards
 * (sometimes reaching below DC), rate limits spanning several zones, and 0–6
 * interferers of mixed kinds — fixed tones, fixed bands, rate-tied spurs
 * k/M·r, rate-tied images k/M·r ± band (M = 2..8) and harmonics k·band.
 * Every required margin is positive: the brute force's "at least m away" is
 * vacuous at m = 0, where the solver still forbids a strict overlap.
 */

const MHZ = 1e6;
/** Uniform in [0, 1] (run the properties with fc.unbiased() so that it stays uniform). */
const unit = fc.integer({ min: 0, max: 2 ** 30 }).map((n) => n / 2 ** 30);
/** Uniform in [low, high]. */
const between = (low: number, high: number) => unit.map((u) => low + u * (high - low));
/** Log-uniform in [low, high]. */
const logBetween = (low: number, high: number) => unit.map((u) => low * (high / low) ** u);

interface Shape {
  readonly band: { low: number; high: number };
}

function interfererArbitrary(shape: Shape, index: number): fc.Arbitrary<Interferer> {
  const { low, high } = shape.band;
  const margin = logBetween(0.02 * MHZ, 1 * MHZ);
  const blocking = fc.integer({ min: 0, max: 4 }).map((n) => n > 0); // four in five block
  const make = (
    kind: InterfererKind,
    order: number | null,
    rateMultiple: number,
    lo: number,
    hi: number,
    requiredMargin: number,
    isBlocking: boolean,
  ): Interferer => ({
    label: `I${index} ${kind}`,
    kind,
    order,
    source: `random ${kind}`,
    rateMultiple,
    shiftMultiple: 0,
    low: hz(lo),
    high: hz(hi),
    level: db(-50),
    requiredMargin: hz(requiredMargin),
    blocking: isBlocking,
  });
  const tone = fc.tuple(unit, margin, blocking).map(([u, m, b]) => make('spur', null, 0, u * 4 * high, u * 4 * high, m, b));
  const fixedBand = fc
    .tuple(unit, unit, margin, blocking)
    .map(([u, w, m, b]) => make('neighbour', null, 0, u * 3 * high, u * 3 * high + w * 5 * MHZ, m, b));
  const rateSpur = fc
    .tuple(fc.integer({ min: 2, max: 8 }), unit, margin, blocking)
    .map(([M, u, m, b]) => make('converter', null, Math.round(u * M) / M, 0, 0, m, b));
  const rateImage = fc.tuple(fc.integer({ min: 2, max: 8 }), unit, fc.boolean(), margin, blocking).map(([M, u, below, m, b]) => {
    const k = 1 + Math.round(u * (M - 2)); // 1..M−1: k = 0 or M would be the band's own image
    return below ? make('converter', null, k / M, -high, -low, m, b) : make('converter', null, k / M, low, high, m, b);
  });
  const harmonic = fc
    .tuple(fc.integer({ min: 2, max: 5 }), margin, blocking)
    .map(([k, m, b]) => make('harmonic', k, 0, k * low, k * high, m, b));
  return fc.oneof(tone, fixedBand, rateSpur, rateImage, harmonic);
}

/** A random plan context (tolerance and goal given by the caller). */
export function planArbitrary(tolerancePpm = 0): fc.Arbitrary<PlanContext> {
  return fc
    .record({
      // One plan in three is near DC, where a lower guard may reach below it.
      // One plan in three is near DC, where a lower guard may reach below it.
      low: fc.oneof({ arbitrary: between(0.2 * MHZ, 4 * MHZ), weight: 1 }, { arbitrary: logBetween(4 * MHZ, 150 * MHZ), weight: 2 }),
      width: logBetween(0.1 * MHZ, 12 * MHZ),
      guardLow: fc.oneof(fc.constant(0), between(0, 3 * MHZ)),
      guardHigh: fc.oneof(fc.constant(0), between(0, 3 * MHZ)),
      start: unit,
      span: unit,
      count: fc.integer({ min: 0, max: 6 }),
    })
    .chain((p) => {
      const band = { low: p.low, high: p.low + p.width };
      const guardedLow = Math.max(0, band.low - p.guardLow);
      const guardedHigh = band.high + p.guardHigh;
      // From just under the narrowest window (2·width) to above the zone-1 edge (2·high), then up to 3× wider.
      const lowest = 1.9 * (guardedHigh - guardedLow);
      const minRate = lowest + p.start * (2.3 * guardedHigh - lowest);
      const maxRate = minRate * (1.05 + 2 * p.span);
      const interferers = Array.from({ length: p.count }, (_, i) => interfererArbitrary({ band }, i));
      return fc.tuple(...interferers).map((list): PlanContext => ({
        band: { low: hz(band.low), high: hz(band.high) },
        guard: guardBands(hz(p.guardLow), hz(p.guardHigh)),
        limits: { minRate: hz(minRate), maxRate: hz(maxRate) },
        interferers: list,
        levelThreshold: db(-90),
        clocks: [],
        clocking: PLAIN_CLOCKING,
        goal: { kind: 'widest-margin' },
        tolerancePpm: ppm(tolerancePpm),
      }));
    });
}

/** Every edge of the exact result: window edges, feasible-interval edges and blocked-range edges, Hz. */
export function exactEdges(windows: readonly RateWindow[], set: FeasibleSet): number[] {
  const edges: number[] = [];
  for (const w of windows) edges.push(w.minRate, w.maxRate);
  for (const f of set.feasible) edges.push(f.minRate, f.maxRate);
  for (const b of set.blocked) edges.push(b.minRate, b.maxRate);
  return edges;
}

/** Whether a rate lies within a relative 1e-9 of one of the edges (the points the agreement test skips). */
export function nearAnEdge(rate: number, edges: readonly number[]): boolean {
  return edges.some((e) => Math.abs(rate - e) < 1e-9 * rate);
}

/** Whether a rate lies in one of the closed feasible intervals. */
export function inFeasible(rate: number, set: FeasibleSet): boolean {
  return set.feasible.some((f) => rate >= f.minRate && rate <= f.maxRate);
}

/** `count` rates uniformly spread over [low, high] with a random phase (deterministic from `seed`). */
export function sweepRates(low: number, high: number, count: number, seed: number): number[] {
  const phase = (Math.abs(Math.sin(seed * 12.9898 + 78.233)) * 43758.5453) % 1;
  return Array.from({ length: count }, (_, i) => low + ((high - low) * (i + phase)) / count);
}
