import type { Interval } from '../../src/math/interval-set.js';
import type { LinearSlack } from '../../src/solve/linear-slacks.js';
import { lpSolver } from '../../src/solve/lp-solver.js';

/**
 * The widest-margin problem handed to a general LP solver (javascript-lp-solver,
 * from the registry), as a reference for the exact envelope walk of
 * maximiseWorstSlack: max t subject to t ≤ slopeᵢ·r + offsetᵢ, r in the range,
 * then, lexicographically, holding every varying slack at t* or above, the
 * worst varying slack. The model is scaled (r = low + x·width, t in units of
 * `unit`) because that solver rounds its answers to 1e-8. Returns null when the
 * solver calls the model infeasible. `breaksItsModel` is true when the solver's
 * own answer violates a constraint of its model by more than its rounding
 * (javascript-lp-solver 1.0.3 does so on some near-degenerate models, e.g. a
 * constant slack of 0 beside a line crossing 0 within 1e-8 units of the range's
 * low end): such an answer is no reference.
 */
export function lpWidestMargin(
  slacks: readonly LinearSlack[],
  range: Interval,
  unit: number,
): { rate: number; worstSlack: number; breaksItsModel: boolean } | null {
  const first = solveStage(slacks, [], range, unit);
  if (!first) return null;
  const varying = slacks.filter((s) => Math.abs(s.slope * (range.high - range.low)) > 1e-9 * unit);
  const floor = first.worstSlack - 1e-6 * unit; // the solver rounds t* to 1e-8 units
  const second =
    varying.length > 0 && varying.length < slacks.length
      ? solveStage(
          varying,
          varying.map((s) => ({ ...s, offset: s.offset - floor })),
          range,
          unit,
        )
      : null;
  return { rate: second ? second.rate : first.rate, worstSlack: first.worstSlack, breaksItsModel: first.breaksItsModel };
}

/**
 * max t: t ≤ bound(r) for each bound, 0 ≤ held(r) for each held, r in range;
 * t solved as t + shift ≥ 0 with every right-hand side positive
 * (javascript-lp-solver 1.0.3 calls a model with an unrestricted variable and a
 * negative right-hand side infeasible).
 */
function solveStage(bounds: readonly LinearSlack[], held: readonly LinearSlack[], range: Interval, unit: number) {
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
  const rate = range.low + fraction * width;
  const worstSlack = (Number(solution['t'] ?? 0) - shift) * unit;
  // The model's own rows at the answer, in units (its rounding is 1e-8 units; ten times that allowed).
  const breaksItsModel = bounds.some((s) => worstSlack / unit > (s.slope * rate + s.offset) / unit + 1e-7);
  return { rate, worstSlack, breaksItsModel };
}
