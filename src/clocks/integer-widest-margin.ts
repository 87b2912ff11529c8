import { lpSolver, type LinearSlack } from '../solve/widest-margin-lp.js';

/** Ranges of N at or below this many values are enumerated rather than handed to the MILP. */
export const ENUMERATE_UP_TO = 64;

/**
 * How far, in units of the slack scale `unit`, the MILP's promised worst
 * slack may differ from the linear slacks evaluated at its N: the solver
 * rounds its answers to 1e-8 and the lexicographic second stage holds the
 * slacks at the first stage's optimum less 0.5e-6; 1e-6 covers both.
 */
export const MILP_ALLOWANCE = 1e-6;

/** Relative size below which a slack's change over the N range counts as none (the slack is constant). */
const FLAT = 1e-9;

/** The N of an integer line and the rate it gives, Hz: rateAt must be affine in N (up to rounding) and increasing. */
export interface IntegerLine {
  readonly first: number;
  readonly last: number;
  readonly rateAt: (N: number) => number;
}

/** The best N found and how. */
export interface IntegerAnswer {
  readonly N: number;
  /** The worst linear slack at rateAt(N), Hz. */
  readonly worstSlack: number;
  /** What the MILP promised (equal to worstSlack when enumerated), Hz. */
  readonly promised: number;
  readonly method: 'enumeration' | 'milp';
}

/**
 * The least of the linear slacks at a rate: the worst slack the model predicts, Hz.
 *
 * @param slacks t ≤ slope·r + offset bounds, Hz
 * @param rate Hz
 * @example modelSlack([{ slope: 1, offset: -5 }, { slope: -1, offset: 9 }], 3) // −2
 */
export function modelSlack(slacks: readonly LinearSlack[], rate: number): number {
  let least = Infinity;
  for (const s of slacks) least = Math.min(least, s.slope * rate + s.offset);
  return least;
}

/**
 * The integer N in [first, last] that maximises the worst of the linear
 * slacks at rate r(N), lexicographically (as maximiseWorstSlack: then the
 * worst of the slacks that vary over the range, so that a constant slack
 * does not leave an arbitrary tie). A range of at most `enumerateUpTo`
 * values is enumerated; a longer one is a mixed-integer program solved with
 * javascript-lp-solver: max t subject to t ≤ slopeᵢ·(r₀ + step·n) + offsetᵢ,
 * n integer in [0, last − first], scaled (n from the range's start, t in
 * units of `unit`) because the solver rounds to 1e-8.
 *
 * @param slacks the linear slacks, Hz (e.g. linearSlacks of one feasible interval)
 * @param line the N range and the rate of each N, Hz
 * @param unit scale for t, Hz (e.g. the wanted bandwidth)
 * @param enumerateUpTo enumerate ranges of at most this many values
 * @returns the best N, its worst linear slack and the MILP's promise
 * @throws Error when the MILP is infeasible, returns a fractional N, or its
 *   promise differs from the slacks at its N by more than MILP_ALLOWANCE·unit
 * @example bestIntegerN(slacks, { first: 40, last: 400, rateAt: (N) => (10e6 * N) / 3 }, 20e6)
 */
export function bestIntegerN(slacks: readonly LinearSlack[], line: IntegerLine, unit: number, enumerateUpTo = ENUMERATE_UP_TO): IntegerAnswer {
  if (line.last < line.first) throw new Error(`empty N range ${line.first}..${line.last}`);
  const span = line.rateAt(line.last) - line.rateAt(line.first);
  const varying = slacks.filter((s) => Math.abs(s.slope * span) > FLAT * unit);
  if (line.last - line.first + 1 <= enumerateUpTo) return enumerated(slacks, varying, line, unit);
  return milp(slacks, varying, line, unit);
}

function enumerated(slacks: readonly LinearSlack[], varying: readonly LinearSlack[], line: IntegerLine, unit: number): IntegerAnswer {
  const values: number[] = [];
  let best = -Infinity;
  for (let N = line.first; N <= line.last; N++) {
    const value = modelSlack(slacks, line.rateAt(N));
    values.push(value);
    best = Math.max(best, value);
  }
  // Ties at the first stage come from a constant slack (exactly equal values); break them on the varying slacks.
  let chosen = line.first;
  let second = -Infinity;
  values.forEach((value, i) => {
    if (value < best - FLAT * unit) return;
    const tieBreak = varying.length > 0 ? modelSlack(varying, line.rateAt(line.first + i)) : 0;
    if (tieBreak > second) [chosen, second] = [line.first + i, tieBreak];
  });
  const worstSlack = values[chosen - line.first]!;
  return { N: chosen, worstSlack, promised: worstSlack, method: 'enumeration' };
}

function milp(slacks: readonly LinearSlack[], varying: readonly LinearSlack[], line: IntegerLine, unit: number): IntegerAnswer {
  const count = line.last - line.first;
  const r0 = line.rateAt(line.first);
  const step = (line.rateAt(line.last) - r0) / count;
  const first = solveInteger(slacks, [], r0, step, count, unit);
  if (!first) throw new Error(`MILP infeasible over N ${line.first}..${line.last}`);
  let n = first.n;
  if (varying.length > 0) {
    const floor = first.t - 0.5 * MILP_ALLOWANCE * unit;
    const held = varying.map((s) => ({ ...s, offset: s.offset - floor }));
    const second = solveInteger(varying, held, r0, step, count, unit);
    if (second) n = second.n;
  }
  const N = line.first + n;
  const worstSlack = modelSlack(slacks, line.rateAt(N));
  if (Math.abs(worstSlack - first.t) > MILP_ALLOWANCE * unit) {
    throw new Error(`MILP promised a worst slack of ${first.t} Hz over N ${line.first}..${line.last}; the slacks at its N = ${N} give ${worstSlack} Hz`);
  }
  return { N, worstSlack, promised: first.t, method: 'milp' };
}

/** max t: t ≤ bound(r) for each bound, 0 ≤ held(r) for each held, r = r0 + step·n, n integer in [0, count]. */
function solveInteger(bounds: readonly LinearSlack[], held: readonly LinearSlack[], r0: number, step: number, count: number, unit: number): { n: number; t: number } | null {
  const constraints: Record<string, { max: number }> = { span: { max: count } };
  const t: Record<string, number> = {};
  const n: Record<string, number> = { span: 1 };
  const add = (name: string, s: LinearSlack, withT: boolean) => {
    constraints[name] = { max: (s.slope * r0 + s.offset) / unit };
    if (withT) t[name] = 1;
    n[name] = (-s.slope * step) / unit;
  };
  bounds.forEach((s, i) => add(`b${i}`, s, true));
  held.forEach((s, i) => add(`h${i}`, s, false));
  const model = { optimize: 't', opType: 'max' as const, constraints, variables: { t, n }, ints: { n: 1 as const }, unrestricted: { t: 1 as const } };
  const solution = lpSolver.Solve(model) as Record<string, unknown>;
  if (solution['feasible'] !== true) return null;
  const raw = Number(solution['n'] ?? 0);
  const rounded = Math.round(raw);
  if (Math.abs(raw - rounded) > 1e-6 || rounded < 0 || rounded > count) throw new Error(`MILP returned n = ${raw}, not an integer in 0..${count}`);
  return { n: rounded, t: Number(solution['t'] ?? 0) * unit };
}
