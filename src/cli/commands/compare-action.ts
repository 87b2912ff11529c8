import { basename } from 'node:path';
import { InputError } from '../../units/input-error.js';
import type { ClockPart, Scenario } from '../../scenario/scenario.js';
import { contextFromScenario } from '../../solve/context-from-scenario.js';
import { solvePlan } from '../../solve/solve-plan.js';
import { compareReport, type VariantPlans } from '../../report/compare-report.js';
import { compareCsv, compareTable } from '../../output/compare-table.js';
import { toJson } from '../../output/json.js';
import { readScenarioWithInputs } from '../read-scenario.js';
import { writeFileSafely } from '../safe-write.js';
import { EXIT, type ExitCode, type Io } from '../io.js';
import type { CompareOptions } from './compare-command.js';

/** Progress is shown only for runs longer than this, ms. */
const PROGRESS_AFTER_MS = 1000;

/**
 * Plans the union of the variants' clock catalogues on every variant and
 * prints the comparison; exit 0 when a part passes (with several variants:
 * passes every one), 1 when none does.
 */
export function runCompare(files: readonly string[], options: CompareOptions, io: Io): ExitCode {
  if (options.json && options.csv) throw new InputError('--csv', 'either --json or --csv, not both', '--json --csv');
  const read = files.map((file) => ({ file, ...readScenarioWithInputs(file) }));
  const catalogue = unionCatalogue(read.map((r) => r.scenario));
  const names = distinctNames(read.map((r) => ({ name: r.scenario.name, file: r.file })));
  const started = Date.now();
  const variants: VariantPlans[] = read.map((r, index) => {
    if (io.progress && Date.now() - started > PROGRESS_AFTER_MS) io.progress(`planning variant ${index + 1} of ${read.length}: ${names[index]}`);
    const result = solvePlan(contextFromScenario({ ...r.scenario, clocks: catalogue }));
    return { name: names[index]!, plans: result.parts, unplanned: catalogue.filter((p) => result.unplannedParts.includes(p.label)) };
  });
  if (io.progress && Date.now() - started > PROGRESS_AFTER_MS) io.progress('');
  const report = compareReport(variants);
  const text = options.json ? toJson(report) : options.csv ? compareCsv(report) : compareTable(report);
  if (options.output !== undefined) writeFileSafely(options.output, text, { force: options.force === true, inputs: read.flatMap((r) => r.inputs) });
  else io.out(text);
  const answered = read.length > 1 ? report.family.length > 0 : report.parts.some((p) => p.passesAll);
  return answered ? EXIT.answered : EXIT.noAnswer;
}

/** Every part of every variant, by label; the first variant to define a label defines the part. */
function unionCatalogue(scenarios: readonly Scenario[]): ClockPart[] {
  const parts = new Map<string, ClockPart>();
  for (const s of scenarios) for (const part of s.clocks) if (!parts.has(part.label)) parts.set(part.label, part);
  return [...parts.values()];
}

/** Variant names, made unique with the file name where two variants share one. */
function distinctNames(variants: ReadonlyArray<{ name: string; file: string }>): string[] {
  return variants.map((v) => (variants.filter((w) => w.name === v.name).length > 1 ? `${v.name} (${basename(v.file)})` : v.name));
}
