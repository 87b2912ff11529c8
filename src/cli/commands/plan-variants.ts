import { basename } from 'node:path';
import type { ClockPart, Scenario } from '../../scenario/scenario.js';
import { contextFromScenario } from '../../solve/context-from-scenario.js';
import type { PlanContext } from '../../solve/plan-context.js';
import { solvePlan, type PlanResult } from '../../solve/solve-plan.js';
import type { VariantPlans } from '../../report/compare-report.js';
import { readScenarioWithInputs } from '../read-scenario.js';
import type { Io } from '../io.js';

/** Progress is shown only for runs longer than this, ms. */
const PROGRESS_AFTER_MS = 1000;

/** One variant read and solved. */
export interface PlannedVariant {
  readonly file: string;
  /** Unique among the variants (the file name is added where two share a name). */
  readonly name: string;
  readonly scenario: Scenario;
  readonly context: PlanContext;
  readonly result: PlanResult;
}

/**
 * Reads every scenario file and solves each with the union of all their clock
 * catalogues (with one file, its own), so that every part is judged on every
 * variant.
 *
 * @returns the variants, and every file read (for refusing to write over an input)
 */
export function planVariants(files: readonly string[], io: Io): { variants: PlannedVariant[]; inputs: string[] } {
  const read = files.map((file) => ({ file, ...readScenarioWithInputs(file) }));
  const catalogue = unionCatalogue(read.map((r) => r.scenario));
  const names = distinctNames(read.map((r) => ({ name: r.scenario.name, file: r.file })));
  const started = Date.now();
  const slow = () => io.progress !== undefined && Date.now() - started > PROGRESS_AFTER_MS;
  const variants = read.map((r, index) => {
    if (slow()) io.progress!(`planning variant ${index + 1} of ${read.length}: ${names[index]}`);
    const context = contextFromScenario({ ...r.scenario, clocks: catalogue });
    return { file: r.file, name: names[index]!, scenario: r.scenario, context, result: solvePlan(context) };
  });
  if (slow()) io.progress!('');
  return { variants, inputs: read.flatMap((r) => r.inputs) };
}

/** The part plans of each variant, for the comparison. */
export function variantPlans(variants: readonly PlannedVariant[]): VariantPlans[] {
  return variants.map((v) => ({
    name: v.name,
    plans: v.result.parts,
    unplanned: v.context.clocks.filter((p) => v.result.unplannedParts.includes(p.label)),
  }));
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
