import { hz } from '../units/quantities.js';
import { guardedBand, rateWindows } from '../windows/enumerate-windows.js';
import type { RateWindow } from '../windows/rate-window.js';
import { bestRateIn, goalScore } from './best-rate.js';
import { evaluateRate, type RateEvaluation } from './evaluate-rate.js';
import { feasibleSet, type BlockedRange, type FeasibleInterval } from './feasible-set.js';
import type { PlanContext } from './plan-context.js';

/** A rate put forward: a listed clock, or the best rate of a feasible interval. */
export interface Candidate {
  readonly label: string;
  /**
   * "clock" for a listed part, "interval" for the best rate of a feasible
   * interval, "window" for a window's centre, put forward only when nothing
   * is feasible so that the report can say what blocks.
   */
  readonly origin: 'clock' | 'interval' | 'window';
  readonly evaluation: RateEvaluation;
  /** Higher is better for the goal. */
  readonly score: number;
}

/** The solved plan: windows, exact feasible set and ranked candidates. */
export interface PlanResult {
  readonly windows: readonly RateWindow[];
  readonly feasible: readonly FeasibleInterval[];
  readonly blocked: readonly BlockedRange[];
  /** Best first: passing before failing, then by goal, then by worst slack. */
  readonly candidates: readonly Candidate[];
}

/**
 * Solves a plan: the legal windows inside the converter's rate range, minus
 * every blocking interferer's forbidden rates, then the listed clocks and the
 * best rate of each feasible interval, judged exactly and ranked.
 *
 * @param context the plan, with a finite rate range
 */
export function solvePlan(context: PlanContext): PlanResult {
  const windows = rateWindows(guardedBand(context.band, context.guard.low, context.guard.high), context.limits);
  const { feasible, blocked } = feasibleSet(windows, context.interferers, context.band);
  const candidates: Candidate[] = context.clocks.map((clock) => ({
    label: clock.label,
    origin: 'clock' as const,
    evaluation: evaluateRate(context, clock.rate, clock.tolerancePpm),
    score: 0,
  }));
  const perZone = new Map<number, number>();
  for (const interval of feasible) {
    const index = (perZone.get(interval.zone) ?? 0) + 1;
    perZone.set(interval.zone, index);
    const evaluation = bestRateIn(context, interval);
    if (evaluation) candidates.push({ label: `Z${interval.zone}.${index}`, origin: 'interval', evaluation, score: 0 });
  }
  if (feasible.length === 0) {
    for (const window of windows) {
      const evaluation = evaluateRate(context, hz((window.minRate + window.maxRate) / 2), context.tolerancePpm);
      candidates.push({ label: `W${window.zone}`, origin: 'window', evaluation, score: 0 });
    }
  }
  const scored = candidates.map((c) => ({ ...c, score: goalScore(context, c.evaluation) }));
  scored.sort((a, b) => Number(b.evaluation.pass) - Number(a.evaluation.pass) || b.score - a.score || b.evaluation.worstSlack - a.evaluation.worstSlack);
  return { windows, feasible, blocked, candidates: scored };
}

