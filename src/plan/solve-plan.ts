import { hz, type Hz } from '../units/quantities.js';
import type { RateWindow } from '../windows/rate-window.js';
import { bestRateIn, goalScore } from '../solve/best-rate.js';
import { evaluateRate, type RateEvaluation } from '../solve/evaluate-rate.js';
import { planRates, type BlockedRange, type FeasibleInterval } from '../solve/feasible-set.js';
import type { PlanContext } from '../solve/plan-context.js';
import { nextLimit, tieAllowance } from '../solve/next-limit.js';
import { quantityText } from '../text/quantity-text.js';
import { planPart } from '../clocks/plan-part.js';
import { driftHeadroom, type DriftHeadroom } from '../solve/drift.js';
import type { ClockSnr, PartPlan, PartSearch, RateSettings } from '../clocks/part-plan.js';

/** Interval candidates are named by the rates of their interval, written as every output writes them. */
const RATES = quantityText('terminal');

/** A rate put forward: a listed clock, or the best rate of a feasible interval. */
export interface Candidate {
  readonly label: string;
  /**
   * "clock" for a listed part, "interval" for the best rate of a feasible
   * interval, "window" for a window's centre, put forward only when nothing
   * is feasible so that the report can say what blocks, "typed" for a rate
   * given on the command line (judgeRates).
   */
  readonly origin: 'clock' | 'interval' | 'window' | 'typed';
  readonly evaluation: RateEvaluation;
  /** Higher is better for the goal. */
  readonly score: number;
  /** The part's settings, rate = f·N/(M·D); null for a rate not from a part. */
  readonly settings: RateSettings | null;
  /** Drift the nominal rate survives each way; null when the nominal rate itself fails. */
  readonly headroom: DriftHeadroom | null;
  /** The SNR the part allows; null for a rate not from a part. */
  readonly snr: ClockSnr | null;
  /** How the part's rate was found and how many rates that judged; null for a rate not from a part. */
  readonly partSearch: { readonly method: PartSearch; readonly ratesJudged: number } | null;
}

/** The solved plan: windows, exact feasible set and ranked candidates. */
export interface PlanResult {
  readonly windows: readonly RateWindow[];
  readonly feasible: readonly FeasibleInterval[];
  readonly blocked: readonly BlockedRange[];
  /** Best first: passing before failing, then by goal, then by worst slack. */
  readonly candidates: readonly Candidate[];
  /** Each clock part's plan, in the scenario's order (the part's candidate above). */
  readonly parts: readonly PartPlan[];
  /** Labels of the parts with no rate inside the converter's rate range (no candidate). */
  readonly unplannedParts: readonly string[];
}

/**
 * Solves a plan: the legal windows inside the converter's rate range, minus
 * every blocking interferer's forbidden rates, then each clock part at its
 * best rate (planPart: direct, divided or synthesised) and the best rate of
 * each feasible interval, judged exactly and ranked. Candidates are judged
 * and ranked on the blocking interferers only (the others cannot change a
 * verdict or a worst slack); the first-ranked one, which the tables, pictures
 * and page show in full, is judged again on every interferer.
 *
 * @param context the plan, with a finite rate range
 * @returns windows, feasible set, blocked ranges, ranked candidates, part plans
 * @throws Error when a part's integer optimum fails its exact re-check (a bug)
 * @example solvePlan(handWorked).candidates[0].evaluation.checkScope // 'all'
 */
export function solvePlan(context: PlanContext): PlanResult {
  const set = planRates(context);
  const { windows, feasible, blocked } = set;
  const candidates: Candidate[] = [];
  const parts: PartPlan[] = [];
  const unplannedParts: string[] = [];
  for (const part of context.clocks) {
    const plan = planPart(context, set, part);
    if (!plan) {
      unplannedParts.push(part.label);
      continue;
    }
    parts.push(plan);
    candidates.push({
      label: part.label,
      origin: 'clock',
      evaluation: plan.evaluation,
      score: 0,
      settings: plan.settings,
      headroom: plan.headroom,
      snr: plan.snr,
      partSearch: { method: plan.search, ratesJudged: plan.ratesJudged },
    });
  }
  const unpartnered = (evaluation: RateEvaluation) => ({
    evaluation,
    score: 0,
    settings: null,
    headroom: driftHeadroom(set, context.limits, evaluation.rate),
    snr: null,
    partSearch: null,
  });
  const perZone = new Map<number, number>();
  for (const interval of feasible) {
    const index = (perZone.get(interval.zone) ?? 0) + 1;
    perZone.set(interval.zone, index);
    const evaluation = bestRateIn(context, interval);
    if (evaluation)
      candidates.push({
        label: `best in ${RATES.rateRange(interval.minRate, interval.maxRate)}`,
        origin: 'interval',
        ...unpartnered(evaluation),
      });
  }
  if (feasible.length === 0) {
    for (const window of windows) {
      const evaluation = evaluateRate(context, hz((window.minRate + window.maxRate) / 2), context.tolerancePpm, 'blocking');
      candidates.push({ label: `centre of the zone ${window.zone} window`, origin: 'window', ...unpartnered(evaluation) });
    }
  }
  const scored = candidates.map((c) => ({ ...c, score: goalScore(context, c.evaluation) }));
  const bandwidth = context.band.high - context.band.low;
  // Rates that tie on the worst slack are ranked by the next-tightest check's slack (the report names it).
  const nextSlack = new Map(scored.map((c) => [c, nextLimit(c.evaluation, bandwidth)?.slack ?? Infinity]));
  const tie = tieAllowance(bandwidth);
  const byGoal = (a: Candidate, b: Candidate) =>
    Math.abs(b.score - a.score) <= tie && context.goal.kind !== 'lowest-rate' && context.goal.kind !== 'quarter-rate'
      ? 0
      : b.score - a.score;
  const bySlack = (a: Candidate, b: Candidate) =>
    Math.abs(b.evaluation.worstSlack - a.evaluation.worstSlack) <= tie ? 0 : b.evaluation.worstSlack - a.evaluation.worstSlack;
  scored.sort(
    (a, b) =>
      Number(b.evaluation.pass) - Number(a.evaluation.pass) || byGoal(a, b) || bySlack(a, b) || nextSlack.get(b)! - nextSlack.get(a)!,
  );
  return { windows, feasible, blocked, candidates: withFullChecks(context, scored, 1), parts, unplannedParts };
}

/**
 * The candidates with the first `count` (default all) judged again on every
 * interferer, non-blocking ones included: the same verdict, worst slack and
 * limitedBy, with every check listed.
 *
 * @param context the plan the candidates were judged on
 * @param candidates ranked candidates
 * @param count how many, from the first, to judge in full
 * @returns the same candidates in the same order
 * @example withFullChecks(handWorked, solvePlan(handWorked).candidates).every((c) => c.evaluation.checkScope === 'all') // true
 */
export function withFullChecks(context: PlanContext, candidates: readonly Candidate[], count = candidates.length): Candidate[] {
  return candidates.map((c, i) =>
    i >= count || c.evaluation.checkScope === 'all'
      ? c
      : { ...c, evaluation: evaluateRate(context, c.evaluation.rate, c.evaluation.tolerancePpm, 'all') },
  );
}

/**
 * Judges rates given by the user as candidates: each with every check over
 * the plan's tolerance, its drift room and its verdict, in the order given;
 * the windows and the feasible set come with them.
 * No clock part is planned.
 *
 * @param context the plan (its tolerancePpm is the drift judged)
 * @param rates nominal sampling rates, Hz, in the order given
 * @returns the plan with one candidate per rate, labelled by the rate as written
 * @example judgeRates(handWorked, [hz(26e6)]).candidates[0].label // '26 MHz'
 */
export function judgeRates(context: PlanContext, rates: readonly Hz[]): PlanResult {
  const set = planRates(context);
  const candidates: Candidate[] = rates.map((rate) => {
    const evaluation = evaluateRate(context, rate, context.tolerancePpm, 'all');
    return {
      label: RATES.rate(rate),
      origin: 'typed',
      evaluation,
      score: goalScore(context, evaluation),
      settings: null,
      headroom: driftHeadroom(set, context.limits, rate),
      snr: null,
      partSearch: null,
    };
  });
  return { windows: set.windows, feasible: set.feasible, blocked: set.blocked, candidates, parts: [], unplannedParts: [] };
}
