import { hz, type Hz } from '../../units/quantities.js';
import type { Interval } from '../../math/interval-set.js';
import { lpSolver } from '../lp-solver.js';

/** t ≤ rate·r + shift·δ + offset: one slack linear in the sampling rate r and the IF shift δ, Hz. */
export interface PlaneSlack {
  /** Hz of slack per Hz of rate. */
  readonly rate: number;
  /** Hz of slack per Hz of IF shift. */
  readonly shift: number;
  /** Hz. */
  readonly offset: number;
}

/** The rectangle searched: nominal rates and IF shifts, Hz. */
export interface PlaneBox {
  readonly rate: Interval;
  readonly shift: Interval;
}

/** The LP's answer: a nominal rate, a shift and the worst slack promised there, Hz. */
export interface PlaneAnswer {
  readonly rate: number;
  readonly shift: number;
  readonly worstSlack: number;
}

/**
 * The value of a slack at (r, δ), Hz.
 *
 * @example slackAt({ rate: 1, shift: -1, offset: -25e6 }, hz(30e6), hz(1e6)) // 4e6
 */
export function slackAt(slack: PlaneSlack, rate: Hz, shift: Hz): Hz {
  return hz(slack.rate * rate + slack.shift * shift + slack.offset);
}

/**
 * Maximises t subject to t ≤ slackᵢ(r, δ) for every bound and 0 ≤ heldⱼ(r, δ)
 * for every held slack, over the box, with javascript-lp-solver. Two stages,
 * as in the one-variable widest margin (maximiseWorstSlack): first the
 * worst slack t*; then, holding every bound at t* or above, the worst of the
 * bounds that vary over the box, so that a slack constant over the box (a
 * neighbour moving in step with the band) does not leave the point to
 * chance. The model is scaled (r = low + x·width, δ = low + y·width, t in
 * units of `unit`) because that solver rounds its answers to about 1e-8.
 *
 * @param bounds linear bounds on t, Hz
 * @param held linear slacks that must stay ≥ 0, Hz
 * @param box rates and shifts, Hz (either may have zero width)
 * @param unit scale for t, Hz (e.g. the wanted bandwidth)
 * @returns the point and t*, or null when the held slacks leave nothing in the box
 * @example maximisePlaneSlack([{ rate: 1, shift: -1, offset: -25e6 }, { rate: -1, shift: 1, offset: 32.5e6 }], [], { rate: { low: 25e6, high: 35e6 }, shift: { low: -2e6, high: 2e6 } }, hz(4e6)).worstSlack // 3.75e6 (r − δ = 28.75 MHz)
 */
export function maximisePlaneSlack(
  bounds: readonly PlaneSlack[],
  held: readonly PlaneSlack[],
  box: PlaneBox,
  unit: Hz,
): PlaneAnswer | null {
  const first = solveStage(bounds, held, box, unit);
  if (!first) return null;
  const rateWidth = box.rate.high - box.rate.low;
  const shiftWidth = box.shift.high - box.shift.low;
  const varying = bounds.filter((s) => Math.abs(s.rate * rateWidth) + Math.abs(s.shift * shiftWidth) > 1e-9 * unit);
  const floor = first.worstSlack - 1e-6 * unit; // the solver rounds t* to about 1e-8 units
  const holdAll = [...held, ...varying.map((s) => ({ ...s, offset: s.offset - floor }))];
  const second = varying.length > 0 ? solveStage(varying, holdAll, box, unit) : null;
  return second ? { rate: second.rate, shift: second.shift, worstSlack: first.worstSlack } : first;
}

/**
 * max t: t ≤ bound(r, δ) for each bound, 0 ≤ held(r, δ) for each held, (r, δ)
 * in the box. t is solved as t' = t + lift ≥ 0, the lift above the least
 * value any bound takes on the box (at a corner, the bounds being linear), so
 * that t' ≥ 0 never binds and no right-hand side of a bound is negative:
 * javascript-lp-solver 1.0.3 calls a model with an unrestricted variable and
 * a negative right-hand side infeasible (seen here: max t, t ≤ −1 + 0.5·x,
 * x ≤ 1 came back infeasible; the one-variable problem, once an LP too, met the same).
 */
function solveStage(bounds: readonly PlaneSlack[], held: readonly PlaneSlack[], box: PlaneBox, unit: Hz): PlaneAnswer | null {
  const rateWidth = box.rate.high - box.rate.low;
  const shiftWidth = box.shift.high - box.shift.low;
  const corners = [box.rate.low, box.rate.high].flatMap((r) => [box.shift.low, box.shift.high].map((d) => [hz(r), hz(d)] as const));
  const least = Math.min(0, ...bounds.flatMap((s) => corners.map(([r, d]) => slackAt(s, r, d) / unit)));
  const lift = 1 - least;
  const constraints: Record<string, { max: number }> = { spanX: { max: 1 }, spanY: { max: 1 } };
  const t: Record<string, number> = {};
  const x: Record<string, number> = { spanX: 1 };
  const y: Record<string, number> = { spanY: 1 };
  const add = (name: string, s: PlaneSlack, withT: boolean) => {
    constraints[name] = { max: slackAt(s, hz(box.rate.low), hz(box.shift.low)) / unit + (withT ? lift : 0) };
    if (withT) t[name] = 1;
    x[name] = (-s.rate * rateWidth) / unit;
    y[name] = (-s.shift * shiftWidth) / unit;
  };
  bounds.forEach((s, i) => add(`b${i}`, s, true));
  held.forEach((s, i) => add(`h${i}`, s, false));
  const solution = lpSolver.Solve({ optimize: 't', opType: 'max', constraints, variables: { t, x, y } }) as Record<string, unknown>;
  if (solution['feasible'] !== true) return null;
  const fraction = (name: string) => Math.min(Math.max(Number(solution[name] ?? 0), 0), 1);
  return {
    rate: box.rate.low + fraction('x') * rateWidth,
    shift: box.shift.low + fraction('y') * shiftWidth,
    worstSlack: (Number(solution['t'] ?? 0) - lift) * unit,
  };
}
