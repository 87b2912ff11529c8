import lpModule, { type SolverAPI } from 'javascript-lp-solver';
import type { Band, Guard } from '../math/band.js';
import type { Interval } from '../math/interval-set.js';
import { imageOffsets, nearbyImages, normalisedExtent } from './fold-images.js';
import type { Interferer } from '../interferers/interferer.js';
import { driftFactors } from './drift.js';
import { hz, type Hz, type Ppm } from '../units/quantities.js';
import { guardedBand } from '../windows/enumerate-windows.js';
import { channelPlans, type PlanContext } from './plan-context.js';
import type { FeasibleInterval } from './feasible-set.js';

/**
 * javascript-lp-solver's solver. The package's typings describe its CommonJS
 * build; Node's ESM import gets the solver itself as the default export.
 * Accept either shape.
 */
export const lpSolver = ('Solve' in lpModule ? lpModule : (lpModule as { default: unknown }).default) as SolverAPI;

/** t ≤ slope·r + offset: one slack that is linear in the rate inside an interval, Hz. */
export interface LinearSlack {
  readonly slope: number;
  readonly offset: number;
}

/**
 * The linear slacks of a whole plan inside one feasible interval: the
 * plan's band in the interval's zone (linearSlacks); with several channels,
 * every channel's, each in its own zone, together (the worst over channels is
 * the least of them all).
 *
 * @param context the plan
 * @param interval the feasible interval (its zone, or its channelZones)
 * @param range the nominal rates allowed, Hz
 * @param tolerancePpm ± drift of the rate, ppm
 * @returns the slacks, t ≤ slope·r + offset, Hz
 * @example planSlacks({ ...handWorked, interferers: [] }, { zone: 2, inverted: true, minRate: hz(30e6), maxRate: hz(40e6) }, { low: 30e6, high: 40e6 }, ppm(0)).length // 4
 */
export function planSlacks(context: PlanContext, interval: FeasibleInterval, range: Interval, tolerancePpm: Ppm): LinearSlack[] {
  return channelPlans(context).flatMap((plan, i) =>
    linearSlacks(
      plan.band,
      plan.guard,
      interval.channelZones?.[i] ?? interval.zone,
      plan.interferers.filter((interferer) => interferer.blocking),
      range,
      tolerancePpm,
    ),
  );
}

/**
 * The slacks (margin − requirement, Hz) that bound the worst margin at rate
 * r inside one feasible interval of zone n, each linear in r: inside a
 * feasible interval no blocking extent overlaps an image, so each image stays
 * on one side of each extent and its gap is linear. Each is taken at both
 * drift ends r·(1 ± ε), which keeps it linear in the nominal rate.
 *
 * @param band the wanted band, Hz
 * @param guard its guards, Hz
 * @param zone the interval's Nyquist zone
 * @param blocking the blocking interferers
 * @param range the nominal rates allowed (drift ends inside the interval), Hz
 * @param tolerancePpm ± drift of the rate, ppm
 * @returns the slacks, t ≤ slope·r + offset, Hz
 * @example linearSlacks(handWorked.band, handWorked.guard, 2, [], { low: 30e6, high: 40e6 }, ppm(0)).length // 4 (two zone edges at each drift end)
 */
export function linearSlacks(
  band: Band,
  guard: Guard,
  zone: number,
  blocking: readonly Interferer[],
  range: Interval,
  tolerancePpm: Ppm,
): LinearSlack[] {
  const { down, up } = driftFactors(tolerancePpm);
  const scales = [down, up];
  const middle = (range.low + range.high) / 2;
  const slacks: LinearSlack[] = [];
  const guarded = guardedBand(band, guard);
  for (const k of scales) {
    slacks.push({ slope: (-(zone - 1) * k) / 2, offset: guarded.low });
    slacks.push({ slope: (zone * k) / 2, offset: -guarded.high });
  }
  const ceiling = range.high / 4;
  for (const interferer of blocking) {
    const extent = normalisedExtent(interferer);
    const reach = interferer.requiredMargin;
    for (const term of nearbyImages(extent, band, reach, hz(range.low * down), hz(range.high * up))) {
      const image = imageOffsets(band, term.side);
      const above = term.slope * middle + image.low >= extent.high;
      for (const k of scales) {
        const slack = above
          ? { slope: term.slope * k, offset: image.low - extent.high - reach }
          : { slope: -term.slope * k, offset: extent.low - image.high - reach };
        const atEnds = Math.min(slack.slope * range.low + slack.offset, slack.slope * range.high + slack.offset);
        if (atEnds <= ceiling) slacks.push(slack);
      }
    }
  }
  return slacks;
}

/** The LP's answer: the nominal rate and the worst slack it promises, Hz. */
export interface LpAnswer {
  readonly rate: number;
  readonly worstSlack: number;
}

/**
 * Maximises t subject to t ≤ slopeᵢ·r + offsetᵢ for r in the range, with
 * javascript-lp-solver, lexicographically: first the worst slack t*; then,
 * holding every slack at t* or above, the worst of the slacks that vary with
 * the rate. Without the second stage a slack that is constant across the
 * interval (a neighbour folding in step with the band) makes every rate a
 * tie, and the solver returns an arbitrary end of the interval. The model is
 * scaled (r = low + x·width, t in units of `unit`) because that solver rounds
 * its answers to 1e-8 and loses precision on raw hertz coefficients.
 *
 * @param slacks linear bounds on t, Hz
 * @param range the rate range, Hz, low < high
 * @param unit scale for t, Hz (e.g. the wanted bandwidth)
 * @returns the chosen rate and the worst slack t* it keeps, or null when the
 *   LP is infeasible
 * @example maximiseWorstSlack([{ slope: 1, offset: -5 }, { slope: -1, offset: 9 }], { low: 0, high: 10 }, hz(1)) // { rate: 7, worstSlack: 2 } (where r − 5 = 9 − r)
 */
export function maximiseWorstSlack(slacks: readonly LinearSlack[], range: Interval, unit: Hz): LpAnswer | null {
  const first = solveStage(slacks, [], range, unit);
  if (!first) return null;
  const varying = slacks.filter((s) => Math.abs(s.slope * (range.high - range.low)) > 1e-9 * unit);
  const floor = first.worstSlack - 1e-6 * unit; // the solver rounds t* to 1e-8 units
  // Constant slacks are at t* or above by the first stage; only the varying ones need holding.
  const second =
    varying.length > 0
      ? solveStage(
          varying,
          varying.map((s) => ({ ...s, offset: s.offset - floor })),
          range,
          unit,
        )
      : null;
  return { rate: second ? second.rate : first.rate, worstSlack: first.worstSlack };
}

/**
 * max t: t ≤ bound(r) for each bound, 0 ≤ held(r) for each held, r in range.
 * t is solved as t + shift ≥ 0 with every right-hand side made positive:
 * javascript-lp-solver 1.0.3 calls a model with an unrestricted variable and
 * a negative right-hand side infeasible (seen: t + 0.1n ≤ −1, t ≤ 0, n ≤ 1).
 */
function solveStage(bounds: readonly LinearSlack[], held: readonly LinearSlack[], range: Interval, unit: number): LpAnswer | null {
  const width = range.high - range.low;
  const atLow = (s: LinearSlack) => (s.slope * range.low + s.offset) / unit;
  const shift = 1 + Math.max(0, ...bounds.map((s) => -atLow(s)));
  const constraints: Record<string, { max: number }> = { span: { max: 1 } };
  const t: Record<string, number> = {};
  const x: Record<string, number> = { span: 1 };
  bounds.forEach((s, i) => {
    constraints[`b${i}`] = { max: atLow(s) + shift };
    t[`b${i}`] = 1;
    x[`b${i}`] = (-s.slope * width) / unit;
  });
  held.forEach((s, i) => {
    constraints[`h${i}`] = { max: atLow(s) };
    x[`h${i}`] = (-s.slope * width) / unit;
  });
  const solution = lpSolver.Solve({ optimize: 't', opType: 'max', constraints, variables: { t, x } }) as Record<string, unknown>;
  if (solution['feasible'] !== true) return null;
  const fraction = Math.min(Math.max(Number(solution['x'] ?? 0), 0), 1);
  return { rate: range.low + fraction * width, worstSlack: (Number(solution['t'] ?? 0) - shift) * unit };
}
