import { hz, type Hz, type Ppm } from '../../units/quantities.js';
import type { Scenario } from '../../scenario/scenario.js';
import { deriveInterferers } from '../../interferers/derive-interferers.js';
import { bestRateIn } from '../best-rate.js';
import { driftSafeRange } from '../drift.js';
import { contextFromScenario } from '../context-from-scenario.js';
import { evaluateRate, type RateEvaluation } from '../evaluate-rate.js';
import { planRates, planWindows, type FeasibleInterval } from '../feasible-set.js';
import type { PlanContext } from '../plan-context.js';
import { maximisePlaneSlack, type PlaneSlack } from './plane-lp.js';
import { DEFAULT_SEED_COUNT, seedShifts } from './seed-shifts.js';
import { shiftPieces, type PieceInputs, type ShiftPiece } from './shift-piece.js';
import { shiftedScenario, sweptScenario } from './shifted-scenario.js';
import { limitText } from '../limited-by.js';

/** An IF shift and a sampling rate, judged exactly. */
export interface ShiftedRate {
  /** δ, Hz: the IF centre moves from its nominal value by this much. */
  readonly shift: Hz;
  readonly rate: Hz;
  /** "piece": a two-variable LP optimum; "sample": the fixed-shift solver's best rate at a seed shift. */
  readonly origin: 'piece' | 'sample';
  /** evaluateRate on the scenario shifted by δ (its interferers derived afresh), over the rate's ±tolerance. */
  readonly evaluation: RateEvaluation;
  /** The worst slack the LP promised, Hz; null for a sample. */
  readonly promisedSlack: Hz | null;
}

/** The search for the best (IF shift, rate) pair. */
export interface ShiftSearch {
  readonly range: { readonly low: Hz; readonly high: Hz };
  /** The best pair found: passing first, then the widest worst slack (ties: the next-worst, and so on); null when no seed shift has a feasible rate. */
  readonly best: ShiftedRate | null;
  /** The best rate at the nominal IF (δ = 0) by the same ranking; null when 0 is outside the range or nothing is feasible there. */
  readonly atNoShift: ShiftedRate | null;
  /** The shifts at which pieces were sought, Hz. */
  readonly seedShifts: readonly Hz[];
  /** Distinct pieces whose LP was solved and re-checked. */
  readonly piecesSolved: number;
}

export interface ShiftSearchOptions {
  /** Evenly spaced seed shifts over the range (default 17). */
  readonly seeds?: number;
}

/**
 * The best IF shift and sampling rate of a scenario whose first LO may be
 * retuned (scenario.ifShift), for the widest worst margin over the rate's
 * ±tolerance (requirements.tolerancePpm), whatever the scenario's goal.
 *
 * Moving the IF by δ moves the wanted band and every interferer extent by
 * shiftMultiple·δ (neighbours, harmonics, products, interleaving images;
 * board spurs and rate-tied tones stay), so inside a piece of the (r, δ)
 * plane where every image of the band keeps its side of every extent, each
 * margin is linear in both (see shiftPiece) and the widest worst margin is a
 * two-variable LP (maximisePlaneSlack).
 *
 * Pieces are discovered from seeds: the exact fixed-shift problem (windows
 * minus forbidden rates) is solved at a set of shifts spanning the range
 * (seedShifts: the ends, the middle, evenly between, and 0), and each
 * feasible interval found there seeds the piece that holds its middle. A
 * piece that is feasible at none of the seed shifts can therefore be missed.
 * Every answer is exact: each LP optimum is placed inside its zone's
 * drift-safe window at δ* and judged by evaluateRate on the scenario moved
 * by δ*, and the fixed-shift solver's own best rate at each seed shift
 * (bestRateIn) is a candidate too, so the answer is never worse than the
 * best seed shift.
 *
 * Levels: the anti-alias filter stays put while signals move through it, so
 * a neighbour's level changes with δ. The LP counts an interferer as
 * blocking when it blocks at some shift of the range (sweptScenario), a
 * superset of those that block at δ*: its promise is a lower bound on the
 * exact worst slack, never above it, and the optimum may be conservative
 * where a neighbour blocks at only part of the range.
 *
 * @param scenario a validated scenario with ifShift
 * @param options seed count
 * @returns the best pair, the best at δ = 0, and what was searched
 * @throws RangeError when the scenario has no ifShift, or one the schema would refuse
 * @throws Error when an LP optimum's exact re-check falls short of its
 *   promise by more than the allowance 1e-6·(Sr·Δr + Sδ·Δδ + B) — Sr, Sδ the
 *   largest slopes of its slacks, Δr, Δδ the box's widths, B the bandwidth —
 *   well above the LP's 1e-8 rounding: a bug, not a property of the plan
 * @example bestShiftAndRate(heronNarrow).best // { shift: 1e6, evaluation: { pass: true } }
 */
export function bestShiftAndRate(scenario: Scenario, options: ShiftSearchOptions = {}): ShiftSearch {
  const range = scenario.ifShift;
  if (range === null) throw new RangeError(`scenario ${scenario.name} has no ifShift: its IF cannot move`);
  if (!(range.low <= range.high) || scenario.wanted.low + range.low < 0) {
    throw new RangeError(`an IF shift range with low ≤ high that keeps the band at or above 0 Hz, got ${range.low}–${range.high} Hz`);
  }
  const widest: Scenario = { ...scenario, goal: { kind: 'widest-margin' } };
  // Every shift lists the interferers that block somewhere in the range, in one order: the listing is decided on the swept scenario.
  const swept = sweptScenario(widest, { low: hz(range.low), high: hz(range.high) });
  // Each shift's plan is derived once: pieces often end at a seed shift or a range end, and the derivation is the costly part.
  const contexts = new Map<number, PlanContext>();
  const contextAt = (shift: number): PlanContext => {
    let context = contexts.get(shift);
    if (context === undefined) contexts.set(shift, (context = contextFromScenario(shiftedScenario(widest, hz(shift)), swept)));
    return context;
  };
  const base = contextAt(0);
  const inputs: PieceInputs = {
    band: base.band,
    guard: base.guard,
    limits: base.limits,
    interferers: base.interferers,
    blocking: blockingSomewhere(swept, base),
    shifts: range,
    tolerancePpm: base.tolerancePpm,
  };
  const unit = hz(base.band.high - base.band.low);
  const shifts = seedShifts(range, options.seeds ?? DEFAULT_SEED_COUNT);
  const found: ShiftedRate[] = [];
  let atNoShift: ShiftedRate | null = null;
  const solved = new Set<string>();
  for (const shift of shifts) {
    const context = contextAt(shift);
    for (const interval of planRates(context).feasible) {
      const sampled = bestRateIn(context, interval);
      if (sampled) {
        const candidate: ShiftedRate = { shift: hz(shift), rate: sampled.rate, origin: 'sample', evaluation: sampled, promisedSlack: null };
        found.push(candidate);
        if (shift === 0 && (atNoShift === null || better(candidate, atNoShift, unit))) atNoShift = candidate;
      }
      for (const piece of shiftPieces(inputs, interval.zone, { shift, rate: seedRate(interval, base.tolerancePpm) })) {
        if (solved.has(piece.key)) continue;
        solved.add(piece.key);
        const answer = solvePiece(piece, contextAt, base.tolerancePpm, unit);
        if (answer) found.push(answer);
      }
    }
  }
  const best = found.reduce<ShiftedRate | null>(
    (champion, next) => (champion === null || better(next, champion, unit) ? next : champion),
    null,
  );
  return { range, best, atNoShift, seedShifts: shifts.map(hz), piecesSolved: solved.size };
}

/** The nominal rate a feasible interval seeds its piece at: the middle of its drift-safe range (or of the interval). */
function seedRate(interval: FeasibleInterval, tolerancePpm: Ppm): Hz {
  const safe = driftSafeRange(interval, tolerancePpm);
  return hz(safe ? (safe.low + safe.high) / 2 : (interval.minRate + interval.maxRate) / 2);
}

/**
 * Per interferer of the δ = 0 plan, whether it blocks at some shift of the
 * range: its level in the swept scenario (see sweptScenario). With the swept
 * scenario deciding the listing, every shift lists the same interferers in
 * the same order (products and images pruned by their strongest level over
 * the range, each written one way round); a mismatch is a bug.
 */
function blockingSomewhere(sweptOver: Scenario, base: PlanContext): boolean[] {
  const swept = deriveInterferers(sweptOver);
  if (swept.length !== base.interferers.length || swept.some((s, i) => s.label !== base.interferers[i]!.label)) {
    throw new Error('the swept scenario derived a different list of interferers');
  }
  return swept.map((s, i) => s.blocking || base.interferers[i]!.blocking);
}

/**
 * Solves a piece's LP, places the optimum in its zone's drift-safe window at
 * δ* (the LP's rounding may leave it a hair outside) and judges it exactly.
 * Null when the zone leaves no room at δ* (a window narrower than the drift).
 */
function solvePiece(piece: ShiftPiece, contextAt: (shift: number) => PlanContext, tolerancePpm: Ppm, unit: Hz): ShiftedRate | null {
  const answer = maximisePlaneSlack(piece.bounds, piece.held, piece.box, unit);
  if (!answer) return null;
  const shift = Math.min(Math.max(answer.shift, piece.box.shift.low), piece.box.shift.high);
  const context = contextAt(shift);
  const windows = planWindows(context);
  const window = windows.find((w) => w.zone === piece.zone);
  const safe = window ? driftSafeRange(window, tolerancePpm) : null;
  if (!safe) return null;
  const rate = Math.min(Math.max(answer.rate, safe.low), safe.high);
  const evaluation = evaluateRate(context, hz(rate), context.tolerancePpm);
  const allowance =
    1e-6 *
    (largest(piece.bounds, 'rate') * (piece.box.rate.high - piece.box.rate.low) +
      largest(piece.bounds, 'shift') * (piece.box.shift.high - piece.box.shift.low) +
      unit);
  if (evaluation.worstSlack < answer.worstSlack - allowance) {
    throw new Error(
      `IF-shift LP promised ${answer.worstSlack} Hz at shift ${shift} Hz, rate ${rate} Hz (zone ${piece.zone}); ` +
        `the exact re-check found ${evaluation.worstSlack} Hz (${limitText(evaluation.limitedBy)}), allowance ${allowance} Hz`,
    );
  }
  return { shift: hz(shift), rate: hz(rate), origin: 'piece', evaluation, promisedSlack: hz(answer.worstSlack) };
}

function largest(slacks: readonly PlaneSlack[], key: 'rate' | 'shift'): number {
  return slacks.reduce((most, s) => Math.max(most, Math.abs(s[key])), 0);
}

/**
 * Whether a beats b: passing first; then leximin over the slacks (zone edge
 * and every blocking check's margin − requirement, ascending), entries within
 * 1e-9 of the bandwidth counted equal, so that a worst slack shared by every
 * pair (a neighbour moving with the band) gives way to the next one.
 */
function better(a: ShiftedRate, b: ShiftedRate, unit: number): boolean {
  if (a.evaluation.pass !== b.evaluation.pass) return a.evaluation.pass;
  const sa = sortedSlacks(a.evaluation);
  const sb = sortedSlacks(b.evaluation);
  for (let i = 0; i < Math.min(sa.length, sb.length); i++) {
    if (Math.abs(sa[i]! - sb[i]!) > 1e-9 * unit) return sa[i]! > sb[i]!;
  }
  return false;
}

function sortedSlacks(evaluation: RateEvaluation): number[] {
  const slacks = [evaluation.zoneEdgeMargin as number];
  for (const check of evaluation.checks) if (check.blocking) slacks.push(check.margin - check.requiredMargin);
  return slacks.sort((x, y) => x - y);
}
