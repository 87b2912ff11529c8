import { hz, ppmOf, type Db, type Hz, type Ppm } from '../units/quantities.js';
import type { Band, Guard } from '../math/band.js';
import { extentMagnitude } from '../math/fold-extent.js';
import type { Goal } from '../scenario/scenario.js';
import type { Interferer } from '../interferers/interferer.js';
import { channelPlans, hasChannels, type PlanContext } from '../solve/plan-context.js';
import { withFullChecks, type Candidate, type PlanResult } from './solve-plan.js';
import type { ChannelEvaluation, CheckResult, RateEvaluation } from '../solve/evaluate-rate.js';
import type { ShiftSearch } from '../solve/if-shift/best-shift-and-rate.js';
import { channelCheckLabel, limitText, type LimitKind } from '../solve/limited-by.js';
import { nextLimit, type NextLimit } from '../solve/next-limit.js';
import { PAPER_DESIGN_CAUTION } from './caution.js';
import { shiftReport, type ShiftReport } from './shift-report.js';
import { afterRate, channelSnrWithDriver, type AfterRate, type AfterRateInputs } from '../after-rate/after-rate.js';
import { limitWithMasks } from '../after-rate/filter-mask.js';
import { unfixableConflicts, type Conflict } from '../solve/unfixable-conflicts.js';
import type { DerivationSummary } from '../interferers/derive-interferers.js';
import { listedChecks, listedInterferers, type ChecksListed, type Listing } from './listing.js';

/** An interferer as reported: the solver's own record (extent rateMultiple·r + shiftMultiple·δ + [low, high], level, blocking). */
export type ReportedInterferer = Interferer;

export interface ReportedFeasible {
  readonly zone: number;
  readonly inverted: boolean;
  readonly minRate: Hz;
  readonly maxRate: Hz;
  readonly width: Hz;
  /** Drift a rate at the interval's centre may take and stay inside, ±ppm. */
  readonly widthPpm: Ppm;
  /** With several channels, each channel's zone (`zone` is the first one's); absent for one band. */
  readonly channelZones?: readonly number[];
  /** With several channels, whether each arrives inverted; absent for one band. */
  readonly channelInverted?: readonly boolean[];
}

/** One check as reported: the evaluator's result with the interferer's input frequencies at the candidate's rate. */
export interface ReportedCheck extends CheckResult {
  /** Input frequencies at the candidate's nominal rate, Hz (magnitudes). */
  readonly input: readonly [Hz, Hz];
}

/** One channel of the plan as reported (one entry, labelled "wanted", for a single wanted band). */
export interface ReportedChannel {
  readonly label: string;
  readonly low: Hz;
  readonly high: Hz;
  /** dBFS; null for a plan built by hand. */
  readonly weakestLevel: Db | null;
  readonly strongestLevel: Db | null;
  /** Its guard bands below and above, Hz. */
  readonly guard: { readonly below: Hz; readonly above: Hz };
  /**
   * How the interferers against this channel were derived (its own threshold,
   * products listed and pruned); null for a plan built by hand. With one
   * band it is the report's `derivation`.
   */
  readonly derivation: DerivationSummary | null;
}

/** One channel judged at a candidate's rate: its zone, image, NCO, worst check and the checks against it. */
export interface ReportedChannelResult {
  readonly label: string;
  readonly zone: number | null;
  readonly inverted: boolean | null;
  /** Aliased centre of the channel, Hz; null when it straddles a zone edge. */
  readonly center: Hz | null;
  /** Frequency the channel's NCO is tuned to, Hz (its aliased centre). */
  readonly nco: Hz | null;
  /** The channel arrives inverted: conjugate its complex baseband output. */
  readonly conjugate: boolean | null;
  readonly image: { readonly low: Hz; readonly high: Hz } | null;
  readonly zoneEdgeMargin: Hz;
  readonly worstMargin: Hz;
  readonly worstSlack: Hz;
  /** The check with the least slack against this channel: an interferer's label (as in checks), "zone edge", or "anti-alias mask" when only its mask fails. */
  readonly limitedBy: string;
  readonly limitedByKind: LimitKind;
  /** Every check against this channel passes, and its anti-alias mask where an out-of-band level is stated. */
  readonly pass: boolean;
  /**
   * With several channels, the checks against this channel, labelled as its
   * own interferers are (listed as the candidate's checks are). Absent for a
   * single wanted band: they are the candidate's own `checks`, not written
   * twice (with a thousand clock parts the copy alone was megabytes).
   */
  readonly checks?: readonly ReportedCheck[];
  /**
   * With several channels, what the rate asks for this channel: its
   * anti-alias mask, filter orders, noise folding and NCO word; null when the
   * report was built without them. Absent for a single wanted band: it is the
   * candidate's own `afterRate`.
   */
  readonly afterRate?: AfterRate | null;
}

export interface ReportedCandidate {
  readonly label: string;
  readonly origin: Candidate['origin'];
  readonly rate: Hz;
  readonly tolerancePpm: Ppm;
  readonly zone: number | null;
  readonly inverted: boolean | null;
  /** Aliased centre of the wanted band, Hz. */
  readonly center: Hz | null;
  /** Frequency the digital down-converter's NCO is tuned to, Hz (the aliased centre). */
  readonly nco: Hz | null;
  /** The band arrives inverted: conjugate the complex baseband output (or tune the NCO to −nco). */
  readonly conjugate: boolean | null;
  readonly image: { readonly low: Hz; readonly high: Hz } | null;
  readonly zoneEdgeMargin: Hz;
  readonly worstMargin: Hz;
  /** The limiting check in words: an interferer's label, "zone edge", or "anti-alias mask" when every frequency check passes and the mask fails. */
  readonly limitedBy: string;
  /** What kind of check limitedBy names: 'interferer', 'zone edge' or 'anti-alias mask' (so that a label reading "zone edge" is never the zone edge). */
  readonly limitedByKind: LimitKind;
  readonly worstSlack: Hz;
  readonly pass: boolean;
  /** The part's settings, rate = f·N/(M·D); null for a rate not from a part. */
  readonly settings: { readonly N: number; readonly M: number; readonly D: number } | null;
  /** How far the nominal rate may move down and up before a check fails, ppm; null when it already fails. */
  readonly headroomPpm: { readonly down: Ppm; readonly up: Ppm } | null;
  /** The check met first each way ("zone edge", "rate limit" or an interferer label); null with headroomPpm. */
  readonly headroomLimitedBy: { readonly down: string; readonly up: string } | null;
  /** The kind of each headroomLimitedBy: 'interferer', 'zone edge' or 'rate limit'; null with headroomPpm. */
  readonly headroomLimitedByKind: { readonly down: LimitKind; readonly up: LimitKind } | null;
  /** Jitter-limited SNR at the band's highest frequency, dB; null when not from a part or the part states no jitter. */
  readonly jitterSnrDb: Db | null;
  /** Combined jitter and quantisation SNR plus the processing gain to the channel, dB; null when not from a part. */
  readonly channelSnrDb: Db | null;
  /**
   * For a clock part: how its rate was found ("every rate" judged; "intervals": the best of every feasible
   * interval's integer optimum; "sampled": nothing passes and a sample within a budget was screened, not proven
   * the nearest) and how many rates that judged or screened. Null for a rate not from a part.
   */
  readonly partSearch: Candidate['partSearch'];
  /** The checks listed (see checksListed), in the plan's order of interferers. */
  readonly checks: readonly ReportedCheck[];
  /** The filter mask, filter orders, noise folding and down-converter settings at this rate; null when the report was built without them. */
  readonly afterRate: AfterRate | null;
  /** channelSnrDb lowered by the driver's noise folded into the channel, dB; null without both. */
  readonly channelSnrWithDriverDb: Db | null;
  /**
   * What `checks` holds: "all" (every interferer, the first-ranked candidate
   * and, with every check asked for, all of them); "nearest" (the same, cut
   * to the blocking checks and the non-blocking ones nearest to blocking, a
   * thousand in all, when the plan has more interferers); "limiting" (a
   * candidate judged on the blocking interferers only: the check that limits
   * it, none when the zone edge does).
   */
  readonly checksListed: ChecksListed;
  /** How many interferers have no check listed here. */
  readonly checksOmitted: number;
  /**
   * How many of the anti-alias mask's alias bands `afterRate.mask.bands` leaves
   * out: 0 for a candidate shown in full; for the others (checksListed
   * "limiting") only the worst band is listed, as in `afterRate.mask.worst`.
   */
  readonly maskBandsOmitted: number;
  /** The tightest check with more slack than the worst: what ranks candidates that tie on the worst margin; null when none. */
  readonly next: NextLimit | null;
  /** rate ÷ the output rate under the decimation goal (a whole number when the rate decimates exactly); null under other goals. */
  readonly decimationFactor: number | null;
  /** Input centre minus the nearest odd multiple of rate/4, Hz (0: the band's centre lands on rate/4); null when the band straddles. */
  readonly quarterRateOffset: Hz | null;
  /**
   * Each channel judged on its own, in the scenario's order (one entry for a
   * single wanted band). With several channels the fields above are the worst
   * over them (worstMargin, worstSlack, pass, limitedBy written
   * `channel: check`) or the first channel's (zone, inverted, center, nco,
   * image), and `checks` holds every channel's, labelled `channel: check`.
   */
  readonly channels: readonly ReportedChannelResult[];
}

/** The solved plan for people and programs alike: the `solve` JSON contract. */
export interface PlanReport {
  readonly scenario: string;
  /** The wanted band; with several channels, the first one's. */
  readonly band: Band;
  readonly guard: Guard;
  /** Every channel, in the scenario's order (one entry, labelled "wanted", for a single wanted band). */
  readonly channels: readonly ReportedChannel[];
  /** Weakest wanted level at which the requirements apply, dBFS; null for a plan built by hand. */
  readonly weakestLevel: Db | null;
  readonly search: { readonly minRate: Hz; readonly maxRate: Hz };
  readonly goal: Goal;
  /** Every interferer, or past a thousand the blocking ones and the strongest others (see interferersListed); with several channels, every channel's, labelled `channel: interferer`. */
  readonly interferers: readonly ReportedInterferer[];
  /** "all", or "nearest": the blocking interferers and the strongest of the others, a thousand in all. */
  readonly interferersListed: 'all' | 'nearest';
  /** How many interferers were derived but are not listed. */
  readonly interferersOmitted: number;
  readonly windows: PlanResult['windows'];
  readonly feasible: readonly ReportedFeasible[];
  readonly blocked: PlanResult['blocked'];
  readonly candidates: readonly ReportedCandidate[];
  /** Label of the best passing candidate, or null when none passes. */
  readonly best: string | null;
  /** Clock parts left out: none of their rates lies inside the converter's rate range. */
  readonly unplannedParts: readonly string[];
  /** The best (IF shift, rate) pair when the scenario lets the first LO move (ifShift); null when the LO is fixed. */
  readonly ifShift: ShiftReport | null;
  /** What the after-rate figures of the candidates were computed from (the filter, the input bandwidth, the settings); null when they were not. */
  readonly afterRateInputs: AfterRateInputs | null;
  /** Blocking interferers no sampling rate can clear (closer to the band where they sit still than their margin), each with a sentence naming what can; empty when none. */
  readonly conflicts: readonly Conflict[];
  /** How the interferers were derived: mixing products listed and left out below the threshold; null for a plan built by hand. */
  readonly derivation: DerivationSummary | null;
  readonly caution: string;
}

/**
 * Builds the report of a solved plan.
 *
 * @param name the scenario's name
 * @param context the plan that was solved
 * @param result what the solver found
 * @param shift what bestShiftAndRate found, when the scenario has ifShift
 * @param after the scenario's after-rate inputs (afterRateInputs): each candidate then carries its filter mask, filter
 *   orders, noise folding and down-converter settings, and a stated out-of-band level the filter cannot hold back fails it
 * @param listing bounded (default: at most a thousand interferers and checks
 *   per candidate) or all
 * @returns the `solve` report
 * @example planReport('hand-worked', handWorked, solvePlan(handWorked)).candidates[0].checksListed // 'all'
 */
export function planReport(
  name: string,
  context: PlanContext,
  result: PlanResult,
  shift: ShiftSearch | null = null,
  after: AfterRateInputs | null = null,
  listing: Listing = 'bounded',
): PlanReport {
  const all = everyInterferer(context);
  const listed = listedInterferers(all, listing);
  const byLabel = new Map(all.map((i) => [i.label, i]));
  const report = (c: Candidate) => reportedCandidate(context, byLabel, c, after, listing);
  // A candidate the mask fails moves behind the passing ones (stable: the solver's order is kept otherwise).
  const ordered = result.candidates
    .map((c) => ({ c, reported: report(c) }))
    .sort((a, b) => Number(b.reported.pass) - Number(a.reported.pass));
  // The first one is the one shown in full: judged on every interferer if the mask moved another ahead.
  const first = ordered[0];
  if (first && first.c.evaluation.checkScope !== 'all') first.reported = report(withFullChecks(context, [first.c])[0]!);
  const candidates = ordered.map((o) => o.reported);
  const passing = candidates.find((c) => c.pass);
  return {
    scenario: name,
    band: context.band,
    guard: context.guard,
    channels: channelPlans(context).map((plan) => ({
      label: plan.label ?? context.channels?.[0]?.label ?? 'wanted',
      low: plan.band.low,
      high: plan.band.high,
      weakestLevel: plan.weakestLevel ?? null,
      strongestLevel: plan.strongestLevel ?? null,
      guard: { below: plan.guard.low, above: plan.guard.high },
      derivation: plan.derivation ?? null,
    })),
    weakestLevel: context.weakestLevel ?? null,
    search: { minRate: context.limits.minRate, maxRate: context.limits.maxRate },
    goal: context.goal,
    interferers: listed.interferers,
    interferersListed: listed.listed,
    interferersOmitted: all.length - listed.interferers.length,
    windows: result.windows,
    feasible: result.feasible.map((f) => {
      const width = hz(f.maxRate - f.minRate);
      return { ...f, width, widthPpm: ppmOf(width / (f.maxRate + f.minRate)) };
    }),
    blocked: result.blocked,
    candidates,
    best: passing ? passing.label : null,
    unplannedParts: result.unplannedParts,
    ifShift: shift ? shiftReport(context.band, shift) : null,
    afterRateInputs: after,
    conflicts: unfixableConflicts(context),
    derivation: context.derivation ?? null,
    caution: PAPER_DESIGN_CAUTION,
  };
}

function reportedCandidate(
  context: PlanContext,
  byLabel: ReadonlyMap<string, Interferer>,
  candidate: Candidate,
  after: AfterRateInputs | null,
  listing: Listing,
): ReportedCandidate {
  const e: RateEvaluation = candidate.evaluation;
  const atRate = after === null ? null : afterRate(after, e.rate, e.tolerancePpm, e.center, e.inverted);
  const channelSnrDb = candidate.snr ? candidate.snr.channelSnrDb : null;
  const listed = listedChecks(e.checks, e.checkScope === 'all', e.limitedBy, listing);
  // A candidate not shown in full lists its mask's worst alias band only: with a thousand parts the bands alone are megabytes.
  const inFull = e.checkScope === 'all' || listing === 'all';
  const shown = (full: AfterRate | null): AfterRate | null =>
    full === null || inFull ? full : { ...full, mask: { ...full.mask, bands: full.mask.worst === null ? [] : [full.mask.worst] } };
  const shownAfter = shown(atRate);
  // Several channels: each channel's own figures after the rate; every channel's mask must hold.
  const channelAfter =
    after?.channels && e.channels
      ? e.channels.map((c, i) => afterRate(after.channels![i]!, e.rate, e.tolerancePpm, c.center, c.inverted))
      : [atRate];
  const masksPass = channelAfter.every((a) => a === null || a.mask.pass);
  // A rate every frequency check passes but a mask fails is limited by that mask.
  const masks = e.channels
    ? e.channels.map((c, i) => ({ channel: c.label, mask: channelAfter[i]?.mask ?? null }))
    : [{ channel: null, mask: atRate?.mask ?? null }];
  const limit = limitWithMasks(e.limitedBy, e.pass, masks);
  return {
    label: candidate.label,
    origin: candidate.origin,
    rate: e.rate,
    tolerancePpm: e.tolerancePpm,
    zone: e.zone,
    inverted: e.inverted,
    center: e.center,
    nco: e.center,
    conjugate: e.inverted,
    image: e.image,
    zoneEdgeMargin: e.zoneEdgeMargin,
    worstMargin: e.worstMargin,
    limitedBy: limitText(limit),
    limitedByKind: limit.kind,
    worstSlack: e.worstSlack,
    pass: e.pass && masksPass,
    settings: candidate.settings ? { N: candidate.settings.N, M: candidate.settings.M, D: candidate.settings.D } : null,
    headroomPpm: candidate.headroom ? { down: candidate.headroom.downPpm, up: candidate.headroom.upPpm } : null,
    headroomLimitedBy: candidate.headroom
      ? { down: limitText(candidate.headroom.downLimitedBy), up: limitText(candidate.headroom.upLimitedBy) }
      : null,
    headroomLimitedByKind: candidate.headroom
      ? { down: candidate.headroom.downLimitedBy.kind, up: candidate.headroom.upLimitedBy.kind }
      : null,
    jitterSnrDb: candidate.snr ? candidate.snr.jitterSnrDb : null,
    channelSnrDb,
    partSearch: candidate.partSearch,
    checks: listed.checks.map((check) => reportedCheck(check, byLabel, e.rate)),
    afterRate: shownAfter,
    channelSnrWithDriverDb: channelSnrWithDriver(channelSnrDb, atRate?.noise ?? null),
    checksListed: listed.listed,
    checksOmitted: byLabel.size - listed.checks.length,
    maskBandsOmitted: atRate === null || shownAfter === null ? 0 : atRate.mask.bands.length - shownAfter.mask.bands.length,
    next: nextLimit(e, context.band.high - context.band.low),
    decimationFactor: context.goal.kind === 'decimation' ? e.rate / context.goal.outputRate : null,
    quarterRateOffset: e.zone === null ? null : quarterRateOffset((context.band.low + context.band.high) / 2, e.rate),
    channels: channelResults(context, e, listing, channelAfter.map(shown)),
  };
}

/** Each channel's result at the candidate's rate (the evaluation itself, labelled "wanted", for one band). */
function channelResults(
  context: PlanContext,
  e: RateEvaluation,
  listing: Listing,
  after: readonly (AfterRate | null)[],
): ReportedChannelResult[] {
  if (!e.channels) return [channelSummary({ ...e, label: context.channels?.[0]?.label ?? 'wanted' }, after[0] ?? null)];
  const plans = channelPlans(context);
  return e.channels.map((c, i) => reportedChannelResult(c, plans[i]!, listing, after[i] ?? null));
}

/** One check with the interferer's input frequencies at the rate. */
function reportedCheck(check: CheckResult, byLabel: ReadonlyMap<string, Interferer>, rate: Hz): ReportedCheck {
  const interferer = byLabel.get(check.label)!;
  const offset = interferer.rateMultiple * rate;
  const magnitude = extentMagnitude(hz(offset + interferer.low), hz(offset + interferer.high));
  return { ...check, input: [hz(magnitude.low), hz(magnitude.high)] as const };
}

/** A channel's own result at a candidate's rate, its checks listed as the candidate's are. */
function reportedChannelResult(c: ChannelEvaluation, plan: PlanContext, listing: Listing, after: AfterRate | null): ReportedChannelResult {
  const byLabel = labelsOf(plan.interferers);
  const listed = listedChecks(c.checks, c.checkScope === 'all', c.limitedBy, listing);
  return {
    ...channelSummary(c, after),
    checks: listed.checks.map((check) => reportedCheck(check, byLabel, c.rate)),
    afterRate: after,
  };
}

/** A channel's zone, centre, margins and verdict at a candidate's rate, without its checks and figures after the rate. */
function channelSummary(c: ChannelEvaluation, after: AfterRate | null): ReportedChannelResult {
  // Every frequency check against the channel passing and its mask failing: the mask limits it.
  const limit = limitWithMasks(c.limitedBy, c.pass, [{ channel: null, mask: after?.mask ?? null }]);
  return {
    label: c.label,
    zone: c.zone,
    inverted: c.inverted,
    center: c.center,
    nco: c.center,
    conjugate: c.inverted,
    image: c.image,
    zoneEdgeMargin: c.zoneEdgeMargin,
    worstMargin: c.worstMargin,
    worstSlack: c.worstSlack,
    limitedBy: limitText(limit),
    limitedByKind: limit.kind,
    pass: c.pass && (after === null || after.mask.pass),
  };
}

const labelMaps = new WeakMap<readonly Interferer[], ReadonlyMap<string, Interferer>>();

/** An interferer list by label, built once per list (every candidate asks). */
function labelsOf(interferers: readonly Interferer[]): ReadonlyMap<string, Interferer> {
  let map = labelMaps.get(interferers);
  if (!map) {
    map = new Map(interferers.map((i) => [i.label, i]));
    labelMaps.set(interferers, map);
  }
  return map;
}

/** Every interferer of the plan: its own list, or with several channels every channel's, labelled `channel: interferer`. */
function everyInterferer(context: PlanContext): readonly Interferer[] {
  if (!hasChannels(context)) return context.interferers;
  return channelPlans(context).flatMap((plan) =>
    plan.interferers.map((i) => ({ ...i, label: channelCheckLabel(plan.label ?? '', i.label) })),
  );
}

/**
 * How far a frequency lies from the nearest odd multiple of rate/4, where a
 * digital mixer by rate/4 needs no multiplier: f − (2k + 1)·rate/4 for the
 * nearest k ≥ 0.
 *
 * @param frequency input frequency, Hz
 * @param rate sampling rate, Hz
 * @returns the signed distance, Hz
 * @example quarterRateOffset(140e6, 184.32e6) // 1.76e6 (3·46.08 MHz = 138.24 MHz)
 */
export function quarterRateOffset(frequency: number, rate: number): Hz {
  const quarter = rate / 4;
  const k = Math.max(0, Math.round((frequency / quarter - 1) / 2));
  return hz(frequency - (2 * k + 1) * quarter);
}
