import type { ClockPart } from '../scenario/scenario.js';
import { blockingInterferers, evaluateRate, type RateEvaluation } from '../solve/evaluate-rate.js';
import { hz, type Hz, type Ppm } from '../units/quantities.js';
import { planRates, type FeasibleInterval, type FeasibleSet } from '../solve/feasible-set.js';
import { channelPlans, type PlanContext } from '../solve/plan-context.js';
import { driftHeadroom, driftReach, driftSafeRange } from '../solve/drift.js';
import { planSlacks, type LinearSlack } from '../solve/linear-slacks.js';
import { maximiseWorstSlack } from '../solve/widest-margin.js';
import type { Interval } from '../math/interval-set.js';
import { clockSnr } from './clock-snr.js';
import { bestIntegerN, ENUMERATE_UP_TO, modelSlack } from './integer-widest-margin.js';
import type { PartPlan, PartSearch, RateSettings } from './part-plan.js';
import { nRangeFor, partRates, rateFamilies, rateOf, type RateFamily } from './part-rates.js';
import { worstSlackAt } from '../solve/worst-slack.js';
import { NO_WHOLE_MULTIPLE } from '../solve/limited-by.js';
import { limitText } from '../solve/limited-by.js';

/** Tuning of planPart's search (the defaults suit the command line; tests force each path). */
export interface PlanPartOptions {
  /** A part with at most this many rates inside the converter's range has every rate judged exactly. */
  readonly everyRateUpTo?: number;
  /** Inside one feasible interval, N ranges of at most this many values are enumerated, longer ones solved as a MILP. */
  readonly enumerateUpTo?: number;
  /** When nothing passes, every rate is screened when there are at most this many; otherwise a sample of about this many. */
  readonly screenUpTo?: number;
}

const EVERY_RATE_UP_TO = 64;
const SCREEN_UP_TO = 20_000;

/**
 * How far short of the best passing rate the interval search may stop, as a
 * fraction of the wanted bandwidth: a feasible interval is passed over, and
 * the search ends, once the best found is within this of the interval's
 * continuous bound (the widest margin over the interval, maximiseWorstSlack).
 */
export const SEARCH_ALLOWANCE = 1e-6;

/**
 * Relative agreement, in units of the slacks' magnitudes |slope·r| + |offset|,
 * required between the linear model's worst slack at a chosen rate and the
 * exact evaluator's: both compute the same distances with a few rounding
 * steps each (~1e-16 relative), so 1e-9 flags only a real disagreement.
 */
const MODEL_AGREEMENT = 1e-9;

/** Settings of a rate with the rate's exact evaluation, and how many rates the search judged or screened to find it. */
interface Judged {
  readonly settings: RateSettings;
  readonly evaluation: RateEvaluation;
  readonly ratesJudged: number;
}

/**
 * The best rate one clock part offers for a plan: among the rates the part
 * gives (directly, through the converter's dividers, or through its
 * synthesiser), the one that passes over the part's whole tolerance with the
 * widest worst slack; else the failing one with the largest worst slack.
 * Small parts have every rate judged exactly. Otherwise each feasible
 * interval is searched for the best integer N of each (M, D) (enumerated, or
 * a MILP with javascript-lp-solver), intervals taken in order of their
 * continuous bound (the widest margin over all its rates) and dropped once
 * that bound cannot beat the best found;
 * every answer is re-checked by evaluateRate. The converter's range bounds
 * the nominal rate only (evaluateRate judges the drift against the checks),
 * so the intervals searched are those of windows widened by the drift.
 *
 * @param context the plan (its clocking gives the dividers, bits and aperture jitter)
 * @param set the plan's exact feasible set, with blocked ranges (for the
 *   headroom, which runs to the converter's range, and the failing search)
 * @param part the clock part
 * @param options search tuning
 * @returns the part's plan, or null when none of its rates keeps its whole drift inside the converter's rate range
 * @throws Error when an integer answer fails its exact re-check (a bug, not an input error)
 * @example planPart(sContext, planRates(sContext), s.clocks[0]).settings // { N: 1, M: 1, D: 1 }
 */
export function planPart(plan: PlanContext, set: FeasibleSet, part: ClockPart, options: PlanPartOptions = {}): PartPlan | null {
  // The part's drift must stay inside the converter's rate range too: its nominal rates are searched in that range
  // shrunk by the drift, [min/(1 − ε), max/(1 + ε)], so that the drift ends r·(1 ± ε) land inside it.
  const context: PlanContext = { ...plan, limits: driftInsideLimits(plan.limits, part.tolerancePpm) };
  const families = rateFamilies(part, context.clocking.clockDividers);
  const { minRate, maxRate } = context.limits;
  const spans = families.flatMap((family) => {
    const span = nRangeFor(part.frequency, family, minRate, maxRate);
    return span ? [{ family, span }] : [];
  });
  const count = spans.reduce((sum, { span }) => sum + span.max - span.min + 1, 0);
  if (count === 0) return null;
  let chosen: Judged;
  let search: PartSearch;
  const goal = plan.goal;
  const multiple = goal.kind === 'decimation' ? bestWholeMultiple(context, part, families, goal.outputRate) : null;
  if (goal.kind === 'decimation' && multiple !== null) {
    chosen = multiple;
    search = 'every rate';
  } else if (count <= (options.everyRateUpTo ?? EVERY_RATE_UP_TO)) {
    chosen = bestOfEvery(context, part);
    search = 'every rate';
  } else {
    const passing = bestPassing(context, part, families, options.enumerateUpTo ?? ENUMERATE_UP_TO);
    if (passing) {
      chosen = passing;
      search = 'intervals';
    } else {
      const budget = options.screenUpTo ?? SCREEN_UP_TO;
      const every = count <= budget;
      chosen = nearestFailing(context, set, part, families, every, budget);
      search = every ? 'every rate' : 'sampled';
    }
  }
  // Under decimation a part passes only at a whole multiple of the output rate: without one, its best rate fails.
  if (goal.kind === 'decimation' && multiple === null)
    chosen = { ...chosen, evaluation: { ...chosen.evaluation, pass: false, limitedBy: NO_WHOLE_MULTIPLE } };
  const rate = chosen.evaluation.rate;
  return {
    part,
    rate,
    settings: chosen.settings,
    evaluation: chosen.evaluation,
    headroom: driftHeadroom(set, plan.limits, rate),
    snr: planSnr(context, rate, part),
    pass: chosen.evaluation.pass,
    search,
    ratesJudged: chosen.ratesJudged,
  };
}

/** Most whole-multiple rates judged for one part under the decimation goal; beyond it an even sample of them. */
const MOST_MULTIPLES_JUDGED = 2048;

/**
 * The part's best rate among those that are whole multiples of the output
 * rate. For each (M, D), f·N/(M·D) is a whole multiple of out exactly when
 * f·N is a multiple of M·D·out, that is when N is a multiple of
 * M·D·out / gcd(f, M·D·out) (integer arithmetic; figures that are not whole
 * hertz are tried multiple by multiple to 1e-12). Those N inside the
 * family's range (VCO limits included) are judged exactly, at most
 * MOST_MULTIPLES_JUDGED of them (an even sample beyond).
 *
 * @returns the best (passing first, then widest worst slack), or null when the part makes no whole multiple
 */
function bestWholeMultiple(context: PlanContext, part: ClockPart, families: readonly RateFamily[], outputRate: Hz): Judged | null {
  const { minRate, maxRate } = context.limits;
  const options: RateSettings[] = [];
  const seen = new Set<number>();
  for (const family of families) {
    const span = nRangeFor(part.frequency, family, minRate, maxRate);
    if (!span) continue;
    for (const N of wholeMultipleNs(part.frequency, family.M * family.D, outputRate, span)) {
      const settings = { N, M: family.M, D: family.D };
      const rate = rateOf(part.frequency, settings);
      if (seen.has(rate)) continue;
      seen.add(rate);
      options.push(settings);
    }
  }
  const step = Math.max(1, options.length / MOST_MULTIPLES_JUDGED);
  let best: Judged | undefined;
  let judged = 0;
  for (let i = 0; i < options.length; i += step) {
    const settings = options[Math.floor(i)]!;
    const evaluation = evaluateRate(context, rateOf(part.frequency, settings), part.tolerancePpm, 'blocking');
    judged += 1;
    if (better(context, evaluation, best?.evaluation)) best = { settings, evaluation, ratesJudged: 0 };
  }
  return best ? { ...best, ratesJudged: judged } : null;
}

/** The N in span with f·N/K a whole multiple of out, ascending, at most MOST_MULTIPLES_JUDGED·4 of them. */
function wholeMultipleNs(frequency: number, K: number, outputRate: number, span: { readonly min: number; readonly max: number }): number[] {
  const limit = MOST_MULTIPLES_JUDGED * 4;
  const found: number[] = [];
  if (Number.isSafeInteger(frequency) && Number.isSafeInteger(outputRate)) {
    const modulus = BigInt(K) * BigInt(outputRate);
    const stride = Number(modulus / gcd(BigInt(frequency), modulus));
    const every = Math.max(1, Math.ceil((Math.floor(span.max / stride) - Math.ceil(span.min / stride) + 1) / limit));
    for (let m = Math.ceil(span.min / stride); m * stride <= span.max; m += every) found.push(m * stride);
    return found;
  }
  const first = Math.ceil((frequency * span.min) / K / outputRate);
  const last = Math.floor((frequency * span.max) / K / outputRate);
  const every = Math.max(1, Math.ceil((last - first + 1) / limit));
  for (let k = first; k <= last; k += every) {
    const N = Math.round((k * outputRate * K) / frequency);
    if (N >= span.min && N <= span.max && Math.abs((frequency * N) / K - k * outputRate) <= 1e-12 * k * outputRate) found.push(N);
  }
  return found;
}

function gcd(a: bigint, b: bigint): bigint {
  while (b !== 0n) [a, b] = [b, a % b];
  return a;
}

/** Ties within this fraction of the bandwidth keep the earlier (simpler) settings. */
export const TIE = 1e-9;

function better(context: PlanContext, a: RateEvaluation, b: RateEvaluation | undefined): boolean {
  if (!b) return true;
  if (a.pass !== b.pass) return a.pass;
  return a.worstSlack > b.worstSlack + TIE * (context.band.high - context.band.low);
}

/** Every rate in the converter's range judged exactly (each distinct rate once, with its first settings). */
function bestOfEvery(context: PlanContext, part: ClockPart): Judged {
  const seen = new Set<number>();
  let best: Judged | undefined;
  for (const { rate, settings } of partRates(part, context.clocking.clockDividers, context.limits.minRate, context.limits.maxRate)) {
    if (seen.has(rate)) continue;
    seen.add(rate);
    const evaluation = evaluateRate(context, rate, part.tolerancePpm, 'blocking');
    if (better(context, evaluation, best?.evaluation)) best = { settings, evaluation, ratesJudged: 0 };
  }
  return { ...best!, ratesJudged: seen.size };
}

interface Piece {
  readonly interval: FeasibleInterval;
  readonly range: Interval;
  readonly slacks: LinearSlack[];
  /** The widest margin over the whole range (maximiseWorstSlack): no rate inside does better, Hz. */
  readonly bound: number;
}

function bestPassing(context: PlanContext, part: ClockPart, families: readonly RateFamily[], enumerateUpTo: number): Judged | null {
  const unit = hz(context.band.high - context.band.low);
  const { minRate, maxRate } = context.limits;
  const pieces = feasiblePieces(context, driftFeasibleSet(context, part.tolerancePpm), part).sort((a, b) => b.bound - a.bound);
  const allowance = SEARCH_ALLOWANCE * unit;
  let best: Judged | undefined;
  let judged = 0;
  for (const piece of pieces) {
    if (best && piece.bound + allowance <= best.evaluation.worstSlack) break;
    const lines = new Set<string>();
    for (const family of families) {
      const span = nRangeFor(part.frequency, family, hz(Math.max(piece.range.low, minRate)), hz(Math.min(piece.range.high, maxRate)));
      if (!span) continue;
      const key = `${family.M * family.D}:${span.min}:${span.max}`; // the same rates as an earlier family
      if (lines.has(key)) continue;
      lines.add(key);
      const rateAt = (N: number) => rateOf(part.frequency, { N, M: family.M, D: family.D });
      const answer = bestIntegerN(piece.slacks, { first: span.min, last: span.max, rateAt }, unit, enumerateUpTo);
      const settings = { N: answer.N, M: family.M, D: family.D };
      const evaluation = evaluateRate(context, rateAt(answer.N), part.tolerancePpm, 'blocking');
      judged++;
      recheck(part, piece, evaluation, answer.worstSlack);
      if (better(context, evaluation, best?.evaluation)) best = { settings, evaluation, ratesJudged: 0 };
      // Within the allowance of this piece's bound, and so of every later piece's: nothing left can do better.
      if (best && best.evaluation.worstSlack >= piece.bound - allowance) return { ...best, ratesJudged: judged };
    }
  }
  return best ? { ...best, ratesJudged: judged } : null;
}

/**
 * The feasible set for a part's nominal rates: the converter's range bounds
 * the nominal rate, and evaluateRate judges the drift around it against the
 * checks only, so here the windows are clipped to that range widened by the
 * drift (driftReach), and a
 * rate passes exactly when its drift lies inside one of these intervals.
 */
function driftFeasibleSet(context: PlanContext, tolerancePpm: Ppm): FeasibleSet {
  return planRates(context, driftReach(context.limits, tolerancePpm));
}

/** The feasible intervals wide enough for the part's drift, their linear slacks and continuous bounds. */
function feasiblePieces(context: PlanContext, set: FeasibleSet, part: ClockPart): Piece[] {
  const unit = hz(context.band.high - context.band.low);
  const pieces: Piece[] = [];
  for (const interval of set.feasible) {
    const range = driftSafeRange(interval, part.tolerancePpm);
    if (!range) continue;
    const slacks = planSlacks(context, interval, range, part.tolerancePpm);
    let bound: number;
    if (range.low === range.high) {
      bound = modelSlack(slacks, hz(range.low));
    } else {
      const answer = maximiseWorstSlack(slacks, range, unit);
      if (!answer)
        throw new Error(
          `widest margin: no slack bounds the worst slack on ${interval.minRate}–${interval.maxRate} Hz, a feasible interval`,
        );
      bound = answer.worstSlack;
    }
    pieces.push({ interval, range, slacks, bound });
  }
  return pieces;
}

/** The exact evaluator must pass a rate whose drift lies inside a feasible interval, and agree with the linear slacks. */
function recheck(part: ClockPart, piece: Piece, evaluation: RateEvaluation, modelled: number): void {
  const { interval } = piece;
  const where = `${part.label} at ${evaluation.rate} Hz (feasible interval ${interval.minRate}–${interval.maxRate} Hz)`;
  if (!evaluation.pass)
    throw new Error(
      `${where}: its drift range lies inside the interval, yet the exact evaluator fails it (${limitText(evaluation.limitedBy)})`,
    );
  let scale = 0;
  for (const s of piece.slacks) scale = Math.max(scale, Math.abs(s.slope * evaluation.rate) + Math.abs(s.offset));
  if (Math.abs(evaluation.worstSlack - modelled) > MODEL_AGREEMENT * scale) {
    throw new Error(
      `${where}: the linear slacks give a worst slack of ${modelled} Hz, the exact evaluator ${evaluation.worstSlack} Hz (${limitText(evaluation.limitedBy)})`,
    );
  }
}

/** How many of the best sampled rates are refined by climbing to better neighbours. */
const CLIMBED = 8;

/**
 * When nothing passes: the rate with the largest worst slack, screened with
 * worstSlackAt, then judged by evaluateRate. Either every rate is screened
 * (at most the budget); or, when there are more, a sample that keeps to the
 * budget of screened rates: every k-th N of each family (half the budget),
 * the N next to anchor rates (the converter's limits, the rates that centre
 * the band in each zone, the edges of the feasible intervals and blocked
 * ranges; a quarter of the budget, anchors thinned evenly when there are
 * more), and the best few of those climbed to better neighbours with what
 * is left. A sample is not proven best. A rate that cannot beat the ones
 * kept is screened only until it is known to fall short.
 */
function nearestFailing(
  context: PlanContext,
  set: FeasibleSet,
  part: ClockPart,
  families: readonly RateFamily[],
  every: boolean,
  budget: number,
): Judged {
  const blocking = blockingInterferers(context.interferers);
  const { minRate, maxRate } = context.limits;
  const tie = TIE * (context.band.high - context.band.low);
  let screened = 0;
  const memory = { index: 0 };
  const slackOf = (settings: RateSettings, floor: number) => {
    screened++;
    return worstSlackAt(context, blocking, rateOf(part.frequency, settings), part.tolerancePpm, floor, memory);
  };
  let best: { settings: RateSettings; slack: number } | undefined;
  // The CLIMBED largest slacks screened so far, ascending: a rate below the smallest cannot start a climb or win.
  const kept: number[] = [];
  const floorNow = () => Math.max(best ? best.slack + tie : -Infinity, kept.length < CLIMBED ? -Infinity : kept[0]!);
  const consider = (settings: RateSettings, slack: number) => {
    if (!best || slack > best.slack + tie) best = { settings, slack };
    if (kept.length < CLIMBED || slack > kept[0]!) {
      kept.splice(kept.findIndex((k) => k >= slack) === -1 ? kept.length : kept.findIndex((k) => k >= slack), 0, slack);
      if (kept.length > CLIMBED) kept.shift();
    }
    return slack;
  };
  if (every) {
    for (const { settings } of partRates(part, context.clocking.clockDividers, minRate, maxRate))
      consider(settings, slackOf(settings, best ? best.slack + tie : -Infinity));
  } else {
    const spans = families.flatMap((family) => {
      const span = nRangeFor(part.frequency, family, minRate, maxRate);
      return span ? [{ family, span }] : [];
    });
    const total = spans.reduce((sum, { span }) => sum + span.max - span.min + 1, 0);
    // Half the budget for the stride, up to three quarters with the anchors, the rest for climbing.
    const strideBudget = Math.floor(budget / 2);
    const anchorBudget = Math.floor((3 * budget) / 4);
    const stride = Math.max(1, Math.ceil(total / Math.max(1, strideBudget - spans.length)));
    const anchors = anchorRates(context, set, Math.floor(budget / 4 / (2 * spans.length)));
    const sampled: { family: RateFamily; min: number; max: number; N: number; slack: number }[] = [];
    for (const { family, span } of spans) {
      const K = family.M * family.D;
      const tried = new Set<number>();
      const at = (N: number, cap: number) => {
        if (N < span.min || N > span.max || tried.has(N) || screened >= cap) return;
        tried.add(N);
        const settings = { N, M: family.M, D: family.D };
        const slack = consider(settings, slackOf(settings, floorNow()));
        sampled.push({ family, min: span.min, max: span.max, N, slack });
      };
      for (let N = span.min; N <= span.max && screened < strideBudget; N += stride) at(N, strideBudget);
      for (const anchor of anchors) {
        const near = (anchor * K) / part.frequency;
        at(Math.floor(near), anchorBudget);
        at(Math.ceil(near), anchorBudget);
      }
    }
    // Only the CLIMBED largest slacks are exact (the others stopped below them), and only those are climbed.
    sampled.sort((a, b) => b.slack - a.slack);
    for (const start of sampled.slice(0, CLIMBED)) {
      const { family } = start;
      const settingsAt = (N: number) => ({ N, M: family.M, D: family.D });
      let { N, slack } = start;
      while (screened + 2 <= budget) {
        const up = N < start.max ? slackOf(settingsAt(N + 1), slack) : -Infinity;
        const down = N > start.min ? slackOf(settingsAt(N - 1), slack) : -Infinity;
        if (Math.max(up, down) <= slack) break;
        [N, slack] = up >= down ? [N + 1, up] : [N - 1, down];
      }
      consider(settingsAt(N), slack);
    }
  }
  if (!best) throw new Error(`${part.label}: no rate inside the converter's range`);
  const evaluation = evaluateRate(context, rateOf(part.frequency, best.settings), part.tolerancePpm, 'blocking');
  if (evaluation.worstSlack !== best.slack) {
    throw new Error(
      `${part.label} at ${evaluation.rate} Hz: the screen found a worst slack of ${best.slack} Hz, the exact evaluator ${evaluation.worstSlack} Hz`,
    );
  }
  return { settings: best.settings, evaluation, ratesJudged: screened + 1 };
}

/** The nominal rates whose whole drift stays inside the limits; an empty range (min > max) when the drift is wider. */
function driftInsideLimits(limits: PlanContext['limits'], tolerancePpm: Ppm): PlanContext['limits'] {
  const range = driftSafeRange(limits, tolerancePpm);
  return range ? { minRate: hz(range.low), maxRate: hz(range.high) } : { minRate: limits.maxRate, maxRate: limits.minRate };
}

/**
 * Rates worth screening near when nothing passes, at most `most`: the
 * converter's limits and the rates that centre the band in each zone first,
 * then the feasible intervals' edges and middles and the blocked ranges'
 * edges, thinned evenly when they are more than the rest of the room.
 */
function anchorRates(context: PlanContext, set: FeasibleSet, most: number): number[] {
  const { minRate, maxRate } = context.limits;
  const first: number[] = [minRate, maxRate];
  // The band's centre c sits mid-zone n at rate 4c/(2n − 1).
  const centre = (context.band.low + context.band.high) / 2;
  for (let n = 1; (4 * centre) / (2 * n - 1) >= minRate; n++) {
    const rate = (4 * centre) / (2 * n - 1);
    if (rate <= maxRate) first.push(rate);
  }
  const edges: number[] = [];
  for (const f of set.feasible) edges.push(f.minRate, f.maxRate, (f.minRate + f.maxRate) / 2);
  for (const b of set.blocked) edges.push(b.minRate, b.maxRate);
  const chosen = first.slice(0, Math.max(0, most));
  const room = Math.max(0, most - chosen.length);
  if (edges.length <= room) return [...chosen, ...edges];
  // Every (edges / room)-th edge, from indices computed once each (no accumulated step).
  for (let k = 0; k < room; k++) chosen.push(edges[Math.floor((k * edges.length) / room)]!);
  return chosen;
}

/**
 * The SNR a part allows for the plan's band; with several channels, the
 * figures of the channel whose channel SNR is least (its jitter, width and
 * the rate decide it).
 */
function planSnr(context: PlanContext, rate: Hz, part: ClockPart): PartPlan['snr'] {
  const { apertureJitter, bits } = context.clocking;
  return channelPlans(context)
    .map((plan) => clockSnr(plan.band, rate, part.jitter, apertureJitter, bits))
    .reduce((worst, next) => (next.channelSnrDb < worst.channelSnrDb ? next : worst));
}
