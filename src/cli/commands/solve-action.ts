import { InputError } from '../../units/input-error.js';
import { parseFrequency } from '../../units/parse-frequency.js';
import { ppm } from '../../units/quantities.js';
import type { Goal, Scenario } from '../../scenario/scenario.js';
import { planRates, solveScenario } from '../../plan/plan-scenario.js';
import { planReport, type PlanReport } from '../../plan/plan-report.js';
import { withFullChecks } from '../../plan/solve-plan.js';
import { writeJson } from '../../output/json.js';
import { readScenarioWithInputs } from '../read-scenario.js';
import { checkOutputPaths, writeFileSafely } from '../safe-write.js';
import { positiveFrequency } from '../option-values.js';
import { layoutWidth } from '../layout-options.js';
import { EXIT, progressNotes, type ExitCode, type Io } from '../io.js';
import type { SolveOptions } from './solve-command.js';

/**
 * Reads, solves and prints one scenario (with ifShift, also its best IF
 * shift and rate; draws it with --svg), or with --rate judges the rates
 * given.
 *
 * @param file the scenario file
 * @param options as written on the command line
 * @param io where the table or JSON goes
 * @returns 0 when a candidate passes (with --rate: when every rate given passes), 1 otherwise
 * @throws InputError (exit 2) for a bad option, or an --svg path that exists (without --force) or is the scenario
 * @example runSolve('scenarios/heron-base.json', { rate: ['184.32M'] }, io) // 0 (184.32 MHz passes every check)
 */
export async function runSolve(file: string, options: SolveOptions, io: Io): Promise<ExitCode> {
  const width = layoutWidth(options, io);
  const { scenario, inputs } = readScenarioWithInputs(file);
  const goal = goalFromOptions(options, scenario);
  const typed = options.rate?.map((r) => positiveFrequency(r, '--rate')) ?? null;
  if (typed === null && options.ppm !== undefined) throw new InputError('--ppm', 'only with --rate', options.ppm);
  if (options.svg !== undefined) checkOutputPaths([options.svg], { force: options.force === true, inputs });
  const progress = progressNotes(io);
  const report =
    typed !== null
      ? planRates(scenario, typed, { goal, ...(options.ppm === undefined ? {} : { tolerancePpm: ppmOption(options.ppm) }) })
      : options.allChecks
        ? everyCheck(solveScenario(scenario, { goal, onStage: progress.note }))
        : solveScenario(scenario, { goal, onStage: progress.note }).report;
  if (options.allChecks && typed === null) progress.note('judging every candidate on every interferer');
  // The tables and the pictures load only when asked for: start-up time matters.
  if (options.svg !== undefined) {
    progress.note('drawing the pictures');
    const { planPicturesSvg } = await import('../../pictures/plan-pictures.js');
    writeFileSafely(options.svg, planPicturesSvg(report), { force: options.force === true, inputs });
  }
  progress.done();
  if (options.json) writeJson(report, io.out);
  else io.out((await import('../../output/plan-table.js')).planTable(report, width));
  const answered = typed !== null ? report.candidates.every((c) => c.pass) : report.best !== null && report.conflicts.length === 0;
  return answered ? EXIT.answered : EXIT.noAnswer;
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
  return planReport(
    report.scenario,
    context,
    { ...result, candidates: withFullChecks(context, result.candidates) },
    shift,
    report.afterRateInputs,
    'all',
  );
}

const GOALS = ['widest-margin', 'lowest-rate', 'quarter-rate', 'decimation'] as const;

function goalFromOptions(options: SolveOptions, scenario: Scenario): Goal {
  // An output rate alone asks for decimation to it.
  const asked = options.goal ?? (options.outputRate !== undefined ? 'decimation' : undefined);
  if (asked === undefined) return scenario.goal;
  const kind = GOALS.find((g) => g === asked);
  if (!kind) throw new InputError('--goal', `one of ${GOALS.join(', ')}`, asked);
  if (kind !== 'decimation') {
    if (options.outputRate !== undefined) throw new InputError('--output-rate', 'only with the decimation goal', options.outputRate);
    return { kind };
  }
  const fromScenario = scenario.goal.kind === 'decimation' ? scenario.goal.outputRate : undefined;
  if (options.outputRate === undefined && fromScenario === undefined)
    throw new InputError('--output-rate', 'an output rate for --goal decimation', 'nothing');
  const outputRate = options.outputRate === undefined ? fromScenario! : parseFrequency(options.outputRate, '--output-rate');
  if (outputRate <= 0) throw new InputError('--output-rate', 'a rate above zero', options.outputRate ?? '');
  return { kind, outputRate };
}

function ppmOption(text: string) {
  const value = Number(text);
  if (text.trim() === '' || !Number.isFinite(value) || value < 0 || value >= 1e6)
    throw new InputError('--ppm', 'a drift in ppm, 0 or more and under 1 000 000', text);
  return ppm(value);
}
