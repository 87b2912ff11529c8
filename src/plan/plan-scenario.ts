import type { Hz, Ppm } from '../units/quantities.js';
import type { ClockPart, Goal, Scenario } from '../scenario/scenario.js';
import { contextFromScenario } from '../solve/context-from-scenario.js';
import type { PlanContext } from '../solve/plan-context.js';
import { bestShiftAndRate, type ShiftSearch } from '../solve/if-shift/best-shift-and-rate.js';
import { planReport, type PlanReport } from './plan-report.js';
import { judgeRates, solvePlan, type PlanResult } from './solve-plan.js';
import { afterRateInputs } from '../after-rate/after-rate.js';

// planAtRate lives apart so that `verify` judging one rate loads neither the candidate search nor the LP solver.
export { planAtRate } from './plan-at-rate.js';

/** What a caller may change about a scenario's plan without editing the scenario. */
export interface PlanOptions {
  /** The goal candidates are ranked by (default: the scenario's). */
  readonly goal?: Goal;
  /** The clock parts to plan (default: the scenario's); the family comparison plans every variant's parts on each. */
  readonly clocks?: readonly ClockPart[];
  /** The name the report carries (default: the scenario's). */
  readonly name?: string;
  /** Told the name of each stage as it starts, for progress notes. */
  readonly onStage?: (stage: string) => void;
}

/** The whole pipeline of one scenario: the solver's view of it, what the solver found, and the IF-shift search. */
export interface SolvedScenario {
  readonly context: PlanContext;
  readonly result: PlanResult;
  /** Null when the scenario's first LO is fixed (no ifShift). */
  readonly shift: ShiftSearch | null;
  readonly report: PlanReport;
}

/**
 * Plans one scenario end to end, the one composition every command uses:
 * the solver's view of the scenario (interferers, level threshold, rate
 * range), the legal windows of the guarded band, the exact feasible set,
 * each clock part at its best rate, the best rate of each feasible interval,
 * drift headroom and SNR, when the first LO may move, the best
 * (IF shift, rate) pair, and for every candidate what its rate asks of the
 * anti-alias filter and the down-converter (src/after-rate/). Pure.
 *
 * @param scenario a validated scenario (readScenarioFile or resolveScenario)
 * @param options goal, clock parts or name instead of the scenario's
 * @returns the report the table, JSON, SVG and HTML writers read
 * @throws Error when an optimum fails its exact re-check (a bug, never a property of the plan)
 * @example planScenario(heronBase).best // 'best in 171–194.5 MHz' (the label of the best passing candidate)
 */
export function planScenario(scenario: Scenario, options: PlanOptions = {}): PlanReport {
  return solveScenario(scenario, options).report;
}

/**
 * planScenario, also handing back the solver's own records (the part plans
 * the family comparison reads).
 *
 * @param scenario a validated scenario
 * @param options as planScenario
 * @returns the context, the solver's result, the IF-shift search and the report
 * @throws Error as planScenario
 * @example solveScenario(heronBase).result.parts.length // 7 (the clock parts with a rate in range)
 */
export function solveScenario(scenario: Scenario, options: PlanOptions = {}): SolvedScenario {
  const { planned, context, result } = solveCandidates(scenario, options);
  if (planned.ifShift) options.onStage?.('searching the best IF shift and rate');
  const shift = planned.ifShift ? bestShiftAndRate(planned) : null;
  const report = planReport(options.name ?? scenario.name, context, result, shift, afterRateInputs(planned, planned.goal));
  return { context, result, shift, report };
}

/**
 * The first half of solveScenario: the scenario with the options applied,
 * the solver's view of it and the candidates (the feasible set, each clock
 * part at its best rate, the best rate of each feasible interval), without
 * the IF-shift search or the report. What the family comparison reads.
 *
 * @param scenario a validated scenario
 * @param options as planScenario
 * @returns the scenario planned (goal and clocks applied), the context and the solver's result
 * @throws Error as planScenario
 * @example solveCandidates(heronBase).result.parts.length // 7 (the clock parts with a rate in range)
 */
export function solveCandidates(
  scenario: Scenario,
  options: PlanOptions = {},
): { readonly planned: Scenario; readonly context: PlanContext; readonly result: PlanResult } {
  const planned = { ...scenario, goal: options.goal ?? scenario.goal, clocks: options.clocks ?? scenario.clocks };
  options.onStage?.('deriving the interferers');
  const context = contextFromScenario(planned);
  options.onStage?.('finding the feasible rates and planning the clock parts');
  return { planned, context, result: solvePlan(context) };
}

/**
 * The plan's verdict on rates the user gives: each judged as a candidate
 * (every check over the drift, drift room, verdict), in the order given,
 * with the scenario's windows and feasible set. No clock part is planned
 * and the IF is not shifted.
 *
 * @param scenario a validated scenario
 * @param rates nominal sampling rates, Hz
 * @param options goal and name as planScenario; tolerancePpm the drift judged (default: the scenario's)
 * @returns the report, one candidate per rate (origin "typed", labelled by the rate)
 * @example planRates(heronBase, [hz(200e6)]).candidates[0].pass // false (the band's second harmonic lands on it)
 */
export function planRates(
  scenario: Scenario,
  rates: readonly Hz[],
  options: PlanOptions & { readonly tolerancePpm?: Ppm } = {},
): PlanReport {
  const planned = { ...scenario, goal: options.goal ?? scenario.goal };
  const base = contextFromScenario(planned);
  const context = options.tolerancePpm === undefined ? base : { ...base, tolerancePpm: options.tolerancePpm };
  return planReport(options.name ?? scenario.name, context, judgeRates(context, rates), null, afterRateInputs(planned, planned.goal));
}
