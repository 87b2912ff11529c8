import { InputError } from '../../units/input-error.js';
import { parseFrequency } from '../../units/parse-frequency.js';
import type { Goal, Scenario } from '../../scenario/scenario.js';
import { solveScenario } from '../../plan/plan-scenario.js';
import { planReport, type PlanReport } from '../../plan/plan-report.js';
import { withFullChecks } from '../../plan/solve-plan.js';
import { writeJson } from '../../output/json.js';
import { readScenarioWithInputs } from '../read-scenario.js';
import { checkOutputPaths, writeFileSafely } from '../safe-write.js';
import { EXIT, progressNotes, type ExitCode, type Io } from '../io.js';
import type { SolveOptions } from './solve-command.js';

/** Reads, solves and prints one scenario (with ifShift, also its best IF shift and rate; draws it with --svg); exit 0 when a candidate passes, 1 when none does. */
export async function runSolve(file: string, options: SolveOptions, io: Io): Promise<ExitCode> {
  const { scenario, inputs } = readScenarioWithInputs(file);
  const goal = goalFromOptions(options, scenario);
  if (options.svg !== undefined) checkOutputPaths([options.svg], { force: options.force === true, inputs });
  const progress = progressNotes(io);
  const solved = solveScenario(scenario, { goal, onStage: progress.note });
  if (options.allChecks) progress.note('judging every candidate on every interferer');
  const report = options.allChecks ? everyCheck(solved) : solved.report;
  // The tables and the pictures load only when asked for: start-up time matters.
  if (options.svg !== undefined) {
    progress.note('drawing the pictures');
    const { planPicturesSvg } = await import('../../pictures/plan-pictures.js');
    writeFileSafely(options.svg, planPicturesSvg(report), { force: options.force === true, inputs });
  }
  progress.done();
  if (options.json) writeJson(report, io.out);
  else io.out((await import('../../output/plan-table.js')).planTable(report));
  return report.best === null || report.conflicts.length > 0 ? EXIT.noAnswer : EXIT.answered;
}

/**
 * Most checks `--all-checks` lists in one run (candidates × interferers):
 * about half a kilobyte of memory and of JSON each.
 */
export const MOST_CHECKS_IN_FULL = 500_000;

/** The report with every candidate judged and listed on every interferer; refused past MOST_CHECKS_IN_FULL. */
function everyCheck({ context, result, shift, report }: ReturnType<typeof solveScenario>): PlanReport {
  const count = result.candidates.length * context.interferers.length;
  if (count > MOST_CHECKS_IN_FULL) {
    throw new InputError(
      '--all-checks',
      `at most ${MOST_CHECKS_IN_FULL.toLocaleString('en')} checks in one run; leave out --all-checks to list the first candidate's checks in full and the others' limiting check`,
      `${result.candidates.length.toLocaleString('en')} candidates × ${context.interferers.length.toLocaleString('en')} interferers = ${count.toLocaleString('en')} checks`,
    );
  }
  return planReport(report.scenario, context, { ...result, candidates: withFullChecks(context, result.candidates) }, shift, report.afterRateInputs, 'all');
}

const GOALS = ['widest-margin', 'lowest-rate', 'quarter-rate', 'decimation'] as const;

function goalFromOptions(options: SolveOptions, scenario: Scenario): Goal {
  if (options.goal === undefined) {
    if (options.outputRate !== undefined) throw new InputError('--output-rate', 'only with --goal decimation', options.outputRate);
    return scenario.goal;
  }
  const kind = GOALS.find((g) => g === options.goal);
  if (!kind) throw new InputError('--goal', `one of ${GOALS.join(', ')}`, options.goal);
  if (kind !== 'decimation') return { kind };
  const fromScenario = scenario.goal.kind === 'decimation' ? scenario.goal.outputRate : undefined;
  if (options.outputRate === undefined && fromScenario === undefined) throw new InputError('--output-rate', 'an output rate for --goal decimation', 'nothing');
  const outputRate = options.outputRate === undefined ? fromScenario! : parseFrequency(options.outputRate, '--output-rate');
  if (outputRate <= 0) throw new InputError('--output-rate', 'a rate above zero', options.outputRate ?? '');
  return { kind, outputRate };
}
