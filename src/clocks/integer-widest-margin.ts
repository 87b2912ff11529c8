import { hz, type Hz } from '../units/quantities.js';
import { lpSolver } from '../solve/lp-solver.js';
import type { LinearSlack } from '../solve/linear-slacks.js';

/** Ranges of N at or below this many values are enumerated rather than handed to the MILP. */
export const ENUMERATE_UP_TO = 64;

/**
 * How far the MILP's answer may fall short of the best N, as a fraction of
 * the largest change of a binding slack over the N range (the model's scale).
 * The solver rounds its answers to 1e-8, and its branch and bound resolves a
 * slack only to about 1e-5 of the scale: seen, a shortfall of 6.7e-6 of the
 * scale on a slack whose whole change was 1.3e-5 of it (a fast-check case).
 * 1e-4 covers that; beyond it an answer is a bug and is thrown. The N returned
 * does not rest on this figure: the climb from the solver's N stops only where
 * no neighbour does better, which for a concave worst slack is the best N.
 */
export const MILP_ALLOWANCE = 1e-4;

/** Relative size below which a slack's change over the N range counts as none (the slack is constant). */
const FLAT = 1e-9;

/** Rounding noise of one slack value, relative to its terms' magnitudes (a few ulps, with room). */
const NOISE = 1e-12;

/** The N of an integer line and the rate it gives, Hz: rateAt must be affine in N (up to rounding) and increasing. */
export interface IntegerLine {
  readonly first: number;
  readonly last: number;
  /** The rate at N, Hz. */
  readonly rateAt: (N: number) => Hz;
}

/** The best N found and how. */
export interface IntegerAnswer {
  readonly N: number;
  /** The worst linear slack at rateAt(N), Hz. */
  readonly worstSlack: number;
  /** What the MILP promised (equal to worstSlack when enumerated), Hz. */
  readonly promised: number;
  /** How far the MILP's own N fell short of the answer (0 when enumerated), Hz: at most `allowance`. */
  readonly shortfall: number;
  /** The allowance the MILP was held to, Hz (0 when enumerated). */
  readonly allowance: number;
  readonly method: 'enumeration' | 'milp';
}

/**
 * The least of the linear slacks at a rate: the worst slack the model predicts, Hz.
 *
 * @param slacks t ≤ slope·r + offset bounds, Hz
 * @param rate Hz
 * @example modelSlack([{ slope: 1, offset: -5 }, { slope: -1, offset: 9 }], 3) // −2
 */
export function modelSlack(slacks: readonly LinearSlack[], rate: Hz): Hz {
  let least = Infinity;
  for (const s of slacks) least = Math.min(least, s.slope * rate + s.offset);
  return hz(least);
}

/**
 * The integer N in [first, last] that maximises the worst of the linear
 * slacks at rate r(N), lexicographically (as maximiseWorstSlack: then the
 * worst of the slacks that vary over the range, so that a constant slack
 * does not leave an arbitrary tie). A range of at most `enumerateUpTo`
 * values is enumerated. A longer one is a mixed-integer program solved with
 * javascript-lp-solver: max t subject to t ≤ slopeᵢ·(r₀ + step·n) + offsetᵢ,
 * n integer in [0, last − first], with t measured from its value at n = 0 in
 * units of the largest change of a binding slack over the range (the solver
 * rounds to 1e-8, so raw hertz would lose the answer). The worst slack is
 * concave in N (a minimum of affine functions), so an N whose neighbours do
 * no better is the best: the MILP's answer is certified that way, climbing
 * to the best neighbour where it is not, and a climb that gains more than
 * the allowance is thrown.
 *
 * @param slacks the linear slacks, Hz (e.g. linearSlacks of one feasible interval)
 * @param line the N range and the rate of each N, Hz
 * @param unit a slack scale, Hz (e.g. the wanted bandwidth): slacks changing by
 *   less than 1e-9 of it over the range count as constant
 * @param enumerateUpTo enumerate ranges of at most this many values
 * @returns the best N, its worst linear slack, and the MILP's promise and allowance
 * @throws Error when the MILP is infeasible, returns a fractional N, or its
 *   answer misses its promise or the best N by more than the allowance
 * @example bestIntegerN([{ slope: 1, offset: -5 }, { slope: -1, offset: 9 }], { first: 0, last: 10, rateAt: (N) => hz(N) }, hz(1)).N // 7
 */
export function bestIntegerN(slacks: readonly LinearSlack[], line: IntegerLine, unit: Hz, enumerateUpTo = ENUMERATE_UP_TO): IntegerAnswer {
  if (line.last < line.first) throw new Error(`empty N range ${line.first}..${line.last}`);
  const span = line.rateAt(line.last) - line.rateAt(line.first);
  const varying = slacks.filter((s) => Math.abs(s.slope * span) > FLAT * unit);
  if (line.last - line.first + 1 <= enumerateUpTo) return enumerated(slacks, varying, line);
  return milp(slacks, varying, line);
}

function enumerated(slacks: readonly LinearSlack[], varying: readonly LinearSlack[], line: IntegerLine): IntegerAnswer {
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
    if (value < best) return;
    const tieBreak = varying.length > 0 ? modelSlack(varying, line.rateAt(line.first + i)) : 0;
    if (tieBreak > second) [chosen, second] = [line.first + i, tieBreak];
  });
  const worstSlack = values[chosen - line.first]!;
  return { N: chosen, worstSlack, promised: worstSlack, shortfall: 0, allowance: 0, method: 'enumeration' };
}

function milp(slacks: readonly LinearSlack[], varying: readonly LinearSlack[], line: IntegerLine): IntegerAnswer {
  const count = line.last - line.first;
  const r0 = line.rateAt(line.first);
  const rLast = line.rateAt(line.last);
  const step = (rLast - r0) / count;
  // A slack whose least value over the range is above the best any N can reach never binds: leave it out.
  const ceiling = Math.min(...slacks.map((s) => Math.max(s.slope * r0 + s.offset, s.slope * rLast + s.offset)));
  const binding = slacks.filter((s) => Math.min(s.slope * r0 + s.offset, s.slope * rLast + s.offset) <= ceiling);
  const base = modelSlack(binding, hz(r0));
  const scale = Math.max(...binding.map((s) => Math.abs(s.slope * (rLast - r0))));
  let noise = 0;
  for (const s of slacks)
    noise = Math.max(noise, NOISE * (Math.abs(s.slope) * Math.max(Math.abs(r0), Math.abs(rLast)) + Math.abs(s.offset)));
  const allowance = MILP_ALLOWANCE * scale + noise;
  const value = (N: number) => modelSlack(slacks, line.rateAt(N));
  let n = 0;
  let promised: number = base;
  if (scale > 0) {
    const model = { base, scale, r0, step, count };
    const first = solveInteger(binding, [], model, 0);
    if (!first) throw new Error(`MILP infeasible over N ${line.first}..${line.last}`);
    promised = first.t;
    if (Math.abs(value(line.first + first.n) - promised) > allowance) {
      throw new Error(
        `MILP promised a worst slack of ${promised} Hz over N ${line.first}..${line.last}; the slacks at its N = ${line.first + first.n} give ${value(line.first + first.n)} Hz`,
      );
    }
    n = first.n;
    const heldVarying = binding.filter((s) => varying.includes(s));
    if (heldVarying.length > 0) {
      const floor = promised - 0.5 * MILP_ALLOWANCE * scale;
      const second = solveInteger(heldVarying, heldVarying, model, floor);
      if (second && value(line.first + second.n) >= promised - allowance) n = second.n;
    }
  }
  const solverN = line.first + n;
  const N = climb(line, value, varying.length > 0 ? (k) => modelSlack(varying, line.rateAt(k)) : () => 0, solverN);
  const worstSlack = value(N);
  const shortfall = worstSlack - value(solverN);
  if (shortfall > allowance) {
    throw new Error(
      `MILP answer N = ${solverN} over ${line.first}..${line.last} gives ${value(solverN)} Hz; N = ${N} gives ${worstSlack} Hz, beyond the allowance of ${allowance} Hz`,
    );
  }
  return { N, worstSlack, promised, shortfall: Math.max(0, shortfall), allowance, method: 'milp' };
}

/**
 * From N, steps to a neighbour while it does better: first on the worst
 * slack (concave in N, so where no neighbour does better is the best), then,
 * among the N that tie with that best (a constant slack: exactly equal
 * values), on the varying slacks (concave too).
 */
function climb(line: IntegerLine, value: (N: number) => number, tieBreak: (N: number) => number, start: number): number {
  let N = start;
  const up = (f: (k: number) => number, allowed: (k: number) => boolean) => {
    for (;;) {
      if (N < line.last && allowed(N + 1) && f(N + 1) > f(N)) N++;
      else if (N > line.first && allowed(N - 1) && f(N - 1) > f(N)) N--;
      else return;
    }
  };
  up(value, () => true);
  const best = value(N);
  up(tieBreak, (k) => value(k) >= best);
  return N;
}

interface ScaledModel {
  /** The worst slack at n = 0, Hz: t is measured from it. */
  readonly base: number;
  /** Hz per unit of the scaled t. */
  readonly scale: number;
  readonly r0: number;
  readonly step: number;
  readonly count: number;
}

/**
 * max t: t ≤ bound(n) for each bound, and, when held slacks are given,
 * held(n) ≥ floor for each; n integer in [0, count]; t = base + scale·τ,
 * solved for τ + lift ≥ 0. (javascript-lp-solver 1.0.3 reports such a model
 * infeasible when τ is declared unrestricted and a bound's right-hand side is
 * negative — seen here: t + 0.1·n ≤ −1, t ≤ 0, n ≤ 1 came back infeasible —
 * so τ is kept non-negative instead: without held slacks τ ≥ 0 at n = 0; with
 * them τ ≥ floor, lifted by −floor when that is negative.)
 */
function solveInteger(
  bounds: readonly LinearSlack[],
  held: readonly LinearSlack[],
  m: ScaledModel,
  floor: number,
): { n: number; t: number } | null {
  const lift = held.length > 0 ? Math.max(0, -(floor - m.base) / m.scale) : 0;
  const constraints: Record<string, { max: number }> = { span: { max: m.count } };
  const tau: Record<string, number> = {};
  const n: Record<string, number> = { span: 1 };
  bounds.forEach((s, i) => {
    constraints[`b${i}`] = { max: (s.slope * m.r0 + s.offset - m.base) / m.scale + lift };
    tau[`b${i}`] = 1;
    n[`b${i}`] = (-s.slope * m.step) / m.scale;
  });
  held.forEach((s, i) => {
    constraints[`h${i}`] = { max: (s.slope * m.r0 + s.offset - floor) / m.scale };
    n[`h${i}`] = (-s.slope * m.step) / m.scale;
  });
  const solution = lpSolver.Solve({ optimize: 'tau', opType: 'max', constraints, variables: { tau, n }, ints: { n: 1 } }) as Record<
    string,
    unknown
  >;
  if (solution['feasible'] !== true) return null;
  const raw = Number(solution['n'] ?? 0);
  const rounded = Math.round(raw);
  if (Math.abs(raw - rounded) > 1e-6 || rounded < 0 || rounded > m.count)
    throw new Error(`MILP returned n = ${raw}, not an integer in 0..${m.count}`);
  return { n: rounded, t: m.base + (Number(solution['tau'] ?? 0) - lift) * m.scale };
}
