import { hz } from '../units/quantities.js';
import type { ClockPart, Scenario } from '../scenario/scenario.js';
import { compareReport, type CompareReport } from './compare-report.js';
import type { PlanReport } from './plan-report.js';
import { solveCandidates, solveScenario, type PlanOptions } from './plan-scenario.js';
import type { PlanContext } from '../solve/plan-context.js';
import type { PlanResult } from './solve-plan.js';
import { afterRateInputs } from '../after-rate/after-rate.js';

/** One variant of a family: its scenario and where it came from (a file name, used to tell apart two variants of one name). */
export interface FamilyVariant {
  readonly scenario: Scenario;
  readonly source: string;
}

/** Every variant planned, and the clock parts compared across them. */
export interface FamilyPlan {
  /** Each variant's plan, in the order given, named uniquely. */
  readonly plans: readonly PlanReport[];
  readonly comparison: CompareReport;
}

/**
 * Plans every variant of a family with the union of their clock catalogues
 * (with one variant, its own), so that every part is judged on every
 * variant, and compares the parts. Pure; `onVariant` only reports progress.
 *
 * @param variants the scenarios, each with its source
 * @param options the goal for every variant (default: each scenario's own)
 * @param onVariant called before each variant is planned (index from 0, count, name)
 * @returns the plans and the comparison
 * @throws Error as planScenario
 * @example planFamily([{ scenario: heronBase, source: 'heron-base.json' }]).comparison.variants // ['Heron-4 base']
 */
export function planFamily(
  variants: readonly FamilyVariant[],
  options: Pick<PlanOptions, 'goal'> = {},
  onVariant?: (index: number, count: number, name: string) => void,
): FamilyPlan {
  const plans: PlanReport[] = [];
  const comparison = compareVariants(
    variants,
    (scenario, planOptions) => {
      const solved = solveScenario(scenario, { ...options, ...planOptions });
      plans.push(solved.report);
      return solved;
    },
    onVariant,
  );
  return { plans, comparison };
}

/**
 * The comparison of planFamily alone: every variant's clock parts planned
 * with the union of the catalogues and compared, without the IF-shift search
 * and the plan reports, which the comparison does not read (`ifzone compare`
 * writes only the comparison unless it draws the rate maps).
 *
 * @param variants the scenarios, each with its source
 * @param options the goal for every variant (default: each scenario's own)
 * @param onVariant called before each variant is planned (index from 0, count, name)
 * @returns the comparison, the same as planFamily's
 * @throws Error as planScenario
 * @example compareFamily([{ scenario: heronBase, source: 'heron-base.json' }]).variants // ['Heron-4 base']
 */
export function compareFamily(
  variants: readonly FamilyVariant[],
  options: Pick<PlanOptions, 'goal'> = {},
  onVariant?: (index: number, count: number, name: string) => void,
): CompareReport {
  return compareVariants(variants, (scenario, planOptions) => solveCandidates(scenario, { ...options, ...planOptions }), onVariant);
}

/** Plans each variant with `solve` (the union catalogue, a unique name) and compares the parts. */
function compareVariants(
  variants: readonly FamilyVariant[],
  solve: (scenario: Scenario, options: Pick<PlanOptions, 'clocks' | 'name'>) => { context: PlanContext; result: PlanResult },
  onVariant?: (index: number, count: number, name: string) => void,
): CompareReport {
  const clocks = unionCatalogue(variants.map((v) => v.scenario));
  const names = distinctNames(variants);
  const solved = variants.map((v, index) => {
    onVariant?.(index, variants.length, names[index]!);
    return solve(v.scenario, { clocks, name: names[index]! });
  });
  return compareReport(
    solved.map((s, index) => ({
      name: names[index]!,
      plans: s.result.parts,
      unplanned: s.context.clocks.filter((p) => s.result.unplannedParts.includes(p.label)),
      afterRate: afterRateInputs(variants[index]!.scenario, s.context.goal),
      bandwidth: hz(s.context.band.high - s.context.band.low),
    })),
  );
}

/** Every part of every variant, by label; the first variant to define a label defines the part. */
function unionCatalogue(scenarios: readonly Scenario[]): ClockPart[] {
  const parts = new Map<string, ClockPart>();
  for (const s of scenarios) for (const part of s.clocks) if (!parts.has(part.label)) parts.set(part.label, part);
  return [...parts.values()];
}

/** Variant names, made unique with the source where two variants share one. */
function distinctNames(variants: readonly FamilyVariant[]): string[] {
  const count = (name: string) => variants.filter((w) => w.scenario.name === name).length;
  return variants.map((v) => (count(v.scenario.name) > 1 ? `${v.scenario.name} (${v.source})` : v.scenario.name));
}
