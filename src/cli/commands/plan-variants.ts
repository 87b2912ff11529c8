import { basename } from 'node:path';
import { compareFamily, planFamily, type FamilyPlan } from '../../plan/plan-family.js';
import { readScenarioWithInputs } from '../read-scenario.js';
import { checkOutputPaths } from '../safe-write.js';
import type { Io } from '../io.js';

/** The output paths of a command, and whether it may replace existing files. */
export interface OutputPaths {
  readonly paths: readonly string[];
  readonly force: boolean;
}

const NO_OUTPUTS: OutputPaths = { paths: [], force: false };

/** Progress is shown only for runs longer than this, ms. */
const PROGRESS_AFTER_MS = 1000;

/**
 * Reads every scenario file and plans the family (planFamily), with progress
 * notes on long runs.
 *
 * @param files the scenario files, in the order given
 * @param io where progress goes
 * @param outputs the files the command will write, checked once the inputs are known and before planning
 * @param withPlans false: the comparison alone (compareFamily), `plans` empty
 * @returns the plans and the comparison, and every file read (for refusing to write over an input)
 * @throws InputError for a file that cannot be read or is not a valid scenario, or an output path refused
 */
export function planVariants(
  files: readonly string[],
  io: Io,
  outputs: OutputPaths = NO_OUTPUTS,
  withPlans = true,
): FamilyPlan & { inputs: string[] } {
  const read = files.map((file) => ({ file, ...readScenarioWithInputs(file) }));
  checkOutputPaths(outputs.paths, { force: outputs.force, inputs: read.flatMap((r) => r.inputs) });
  const started = Date.now();
  const slow = () => io.progress !== undefined && Date.now() - started > PROGRESS_AFTER_MS;
  const variants = read.map((r) => ({ scenario: r.scenario, source: basename(r.file) }));
  const onVariant = (index: number, count: number, name: string) => {
    if (slow()) io.progress!(`planning variant ${index + 1} of ${count}: ${name}`);
  };
  const family = withPlans ? planFamily(variants, {}, onVariant) : { plans: [], comparison: compareFamily(variants, {}, onVariant) };
  if (slow()) io.progress!('');
  return { ...family, inputs: read.flatMap((r) => r.inputs) };
}
