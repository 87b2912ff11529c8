import { hz, type Hz } from '../units/quantities.js';
import type { Interval } from '../math/interval-set.js';
import { evaluateRate, type RateEvaluation } from './evaluate-rate.js';
import type { FeasibleInterval } from './feasible-set.js';
import type { PlanContext } from './plan-context.js';
import { driftSafeRange } from './drift.js';
import { planSlacks } from './linear-slacks.js';
import { maximiseWorstSlack } from './widest-margin.js';
import { limitText } from './limited-by.js';

/** Decimation ratios tried one by one inside an interval before falling back to the widest-margin optimum's neighbours. */
const MOST_RATIOS_TRIED = 200;

/**
 * The best rate of one feasible interval for the plan's goal, judged exactly.
 * The widest-margin goal is the maximum of the least of linear slacks (every
 * margin is linear inside the interval), found exactly on their envelope
 * (maximiseWorstSlack); its answer is re-checked by the exact evaluator, and
 * a disagreement is thrown as a bug rather than hidden.
 *
 * @returns the evaluation, or null when the goal has no rate in this
 *   interval (decimation with no integer ratio inside it)
 * @throws Error when the promised worst slack fails the exact re-check
 * @example bestRateIn(handWorked, { zone: 2, inverted: true, minRate: hz(25e6), maxRate: hz(82e6 / 3) }).rate // 26e6 (the widest worst margin, 1 MHz)
 */
export function bestRateIn(context: PlanContext, interval: FeasibleInterval): RateEvaluation | null {
  const range = driftSafeRange(interval, context.tolerancePpm);
  const judge = (rate: number) => evaluateRate(context, hz(rate), context.tolerancePpm, 'blocking');
  if (!range) return judge((interval.minRate + interval.maxRate) / 2);
  switch (context.goal.kind) {
    case 'lowest-rate':
      return judge(range.low);
    case 'quarter-rate': {
      const center = (context.band.low + context.band.high) / 2;
      const ideal = (4 * center) / (2 * interval.zone - 1);
      return judge(Math.min(Math.max(ideal, range.low), range.high));
    }
    case 'decimation':
      return bestRatio(context, interval, range, context.goal.outputRate, judge);
    case 'widest-margin':
      return widestMargin(context, interval, range, judge);
  }
}

function widestMargin(
  context: PlanContext,
  interval: FeasibleInterval,
  range: Interval,
  judge: (rate: number) => RateEvaluation,
): RateEvaluation {
  if (range.low === range.high) return judge(range.low);
  const slacks = planSlacks(context, interval, range, context.tolerancePpm);
  const answer = maximiseWorstSlack(slacks, range, hz(context.band.high - context.band.low));
  if (!answer)
    throw new Error(`widest margin: no slack bounds the worst slack on ${interval.minRate}–${interval.maxRate} Hz, a feasible interval`);
  const judged = judge(answer.rate);
  const allowance = 1e-6 * (range.high + context.band.high - context.band.low);
  if (judged.worstSlack < answer.worstSlack - allowance) {
    throw new Error(
      `widest margin promised ${answer.worstSlack} Hz at ${answer.rate} Hz; the exact re-check found ${judged.worstSlack} Hz (${limitText(judged.limitedBy)})`,
    );
  }
  return judged;
}

function bestRatio(
  context: PlanContext,
  interval: FeasibleInterval,
  range: Interval,
  outputRate: Hz,
  judge: (rate: number) => RateEvaluation,
): RateEvaluation | null {
  const first = Math.ceil(range.low / outputRate);
  const last = Math.floor(range.high / outputRate);
  if (first > last) return null;
  let ratios: number[];
  if (last - first < MOST_RATIOS_TRIED) {
    ratios = Array.from({ length: last - first + 1 }, (_, i) => first + i);
  } else {
    const optimum = widestMargin(context, interval, range, judge).rate / outputRate;
    ratios = [Math.max(first, Math.floor(optimum)), Math.min(last, Math.ceil(optimum))];
  }
  return ratios.map((n) => judge(n * outputRate)).reduce((best, next) => (next.worstSlack > best.worstSlack ? next : best));
}

/**
 * Higher is better for the goal; ties are broken by the worst slack.
 *
 * @example goalScore(handWorked, evaluateRate(handWorked, hz(26e6), ppm(0))) // 1e6 (widest margin: the worst slack)
 */
export function goalScore(context: PlanContext, evaluation: RateEvaluation): number {
  switch (context.goal.kind) {
    case 'lowest-rate':
      return -evaluation.rate;
    case 'quarter-rate':
      return evaluation.center === null ? -Infinity : -Math.abs(evaluation.center - evaluation.rate / 4);
    case 'decimation':
    case 'widest-margin':
      return evaluation.worstSlack;
  }
}
