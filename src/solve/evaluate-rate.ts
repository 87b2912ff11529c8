import { db, hz, type Db, type Hz, type Ppm } from '../units/quantities.js';
import { bandImage, wantedZone, type Band, type Guard } from '../math/band.js';
import { foldExtent } from '../math/fold-extent.js';
import { EDGE_TOLERANCE } from '../math/edge-tolerance.js';
import { meetsOpen } from '../math/interval-set.js';
import {
  breakpointAt,
  firstNearbyImage,
  imageOffsetHigh,
  imageOffsetLow,
  lastNearbyImage,
  marginAt,
  normalisedHigh,
  normalisedLow,
  normalisedMultiple,
} from './fold-images.js';
import { forbiddenRates } from './forbidden-rates.js';
import { guardedBand } from '../windows/enumerate-windows.js';
import type { Interferer, InterfererKind } from '../interferers/interferer.js';
import { channelPlans, hasChannels, type PlanContext } from './plan-context.js';
import { driftRange } from './drift.js';
import { channelCheckLabel, interfererLimit, limitInChannel, ZONE_EDGE, type Limit } from './limited-by.js';

/** One interferer measured at one rate. */
export interface CheckResult {
  readonly label: string;
  readonly kind: InterfererKind;
  readonly source: string;
  /** Aliased segments at the nominal rate, Hz, as [low, high] pairs. */
  readonly alias: ReadonlyArray<readonly [Hz, Hz]>;
  /** Least signed frequency margin to the wanted alias over the drift range, Hz; negative when they overlap: minus the distance the interferer would have to move to clear the band (a tone inside: its distance to the nearer edge). */
  readonly margin: Hz;
  readonly requiredMargin: Hz;
  /** Level at the converter, dBFS. */
  readonly level: Db;
  /** Level threshold minus level, dB: ≥ 0 means weak enough to land anywhere. */
  readonly levelMargin: Db;
  readonly blocking: boolean;
  /** Non-blocking, or the margin holds over the whole drift range. */
  readonly pass: boolean;
}

/**
 * Which interferers an evaluation judges: every one, or the blocking ones
 * only. The blocking ones alone decide pass, worst slack and limitedBy (a
 * check that cannot block always passes), so ranking needs no more; the
 * others are judged for the candidates shown in full.
 */
export type CheckScope = 'all' | 'blocking';

/** A rate judged exactly. */
export interface RateEvaluation {
  readonly rate: Hz;
  readonly tolerancePpm: Ppm;
  /** Zone, inversion and aliased centre of the wanted band; null when it straddles a zone edge. */
  readonly zone: number | null;
  readonly inverted: boolean | null;
  readonly center: Hz | null;
  /** Aliased wanted band at the nominal rate, Hz; null when it straddles. */
  readonly image: { readonly low: Hz; readonly high: Hz } | null;
  /** Least distance from the guarded band to a fold edge over the drift range, Hz (negative: crosses). */
  readonly zoneEdgeMargin: Hz;
  /** One per interferer judged, in the plan's order. */
  readonly checks: readonly CheckResult[];
  /** Which interferers `checks` covers. */
  readonly checkScope: CheckScope;
  /** The check with the least slack (margin − required): a blocking interferer or the zone edge. */
  readonly limitedBy: Limit;
  /** That check's margin, Hz. */
  readonly worstMargin: Hz;
  /** That check's margin minus its requirement, Hz: the figure candidates are ranked by. */
  readonly worstSlack: Hz;
  readonly pass: boolean;
  /**
   * With several channels, each channel judged on its own, in order; the
   * fields above are then the worst over them (worstMargin, worstSlack,
   * zoneEdgeMargin, pass, limitedBy named `channel: check`), the first
   * channel's (zone, inverted, center, image), and every channel's checks
   * with labels `channel: check`. Absent for one wanted band.
   */
  readonly channels?: readonly ChannelEvaluation[];
}

/** One channel of a plan of several channels judged at a rate: its own zone, image, checks and worst. */
export type ChannelEvaluation = Omit<RateEvaluation, 'channels'> & { readonly label: string };

/**
 * Judges one sampling rate against every check, exactly, over the clock's
 * whole ±tolerance: pass/fail from the exact forbidden intervals; margins as
 * the least over the drift range, found at its ends and at the rates where a
 * margin changes slope (it is linear between them).
 *
 * With scope 'blocking' only the blocking interferers are judged: the
 * verdict, worst margin, worst slack and limitedBy are the same, the work is
 * proportional to the blocking interferers, and `checks` lists only those.
 *
 * @param context the plan
 * @param rate nominal sampling rate, Hz
 * @param tolerancePpm ± drift of that rate, ppm
 * @param scope every interferer (default), or the blocking ones only
 * @returns zone, inversion, image, the checks, worst margin and slack, limitedBy and pass
 * @example evaluateRate(handWorked, hz(26e6), ppm(0)) // { pass: true, zone: 2, worstSlack: 1e6, limitedBy: { kind: 'zone edge' } }
 * @example evaluateRate(handWorked, hz(26e6), ppm(0), 'blocking') // { pass: true, zone: 2, worstSlack: 1e6, checkScope: 'blocking' }
 */
export function evaluateRate(context: PlanContext, rate: Hz, tolerancePpm: Ppm, scope: CheckScope = 'all'): RateEvaluation {
  if (hasChannels(context)) return evaluateChannels(context, rate, tolerancePpm, scope);
  const drift = driftRange(rate, tolerancePpm);
  const image = bandImage(context.band, rate);
  const zone = image?.zone ?? wantedZone(context.band, rate);
  const zoneEdgeMargin = hz(
    Math.min(
      zoneEdgeMarginAt(context.band, context.guard, zone, drift.low),
      zoneEdgeMarginAt(context.band, context.guard, zone, drift.high),
    ),
  );
  const zonePass = image !== null && zoneEdgeMargin >= -EDGE_TOLERANCE * rate;
  const judged = scope === 'all' ? context.interferers : blockingInterferers(context.interferers);
  const checks = judged.map((i) => checkInterferer(context, i, rate, drift));
  let limitedBy: Limit = ZONE_EDGE;
  let worstMargin: number = zoneEdgeMargin;
  let worstSlack: number = zoneEdgeMargin;
  for (const check of checks) {
    if (!check.blocking) continue;
    const slack = check.margin - check.requiredMargin;
    if (slack < worstSlack) [limitedBy, worstMargin, worstSlack] = [interfererLimit(check.label), check.margin, slack];
  }
  return {
    rate,
    tolerancePpm,
    zone: image ? zone : null,
    inverted: image ? image.inverted : null,
    center: image ? hz((image.low + image.high) / 2) : null,
    image: image ? { low: image.low, high: image.high } : null,
    zoneEdgeMargin,
    checks,
    checkScope: scope,
    limitedBy,
    worstMargin: hz(worstMargin),
    worstSlack: hz(worstSlack),
    pass: zonePass && checks.every((c) => c.pass),
  };
}

/** Every channel judged on its own, and the plan judged on the worst of them (see RateEvaluation.channels). */
function evaluateChannels(context: PlanContext, rate: Hz, tolerancePpm: Ppm, scope: CheckScope): RateEvaluation {
  const channels: ChannelEvaluation[] = channelPlans(context).map((plan) => ({
    label: plan.label ?? '',
    ...evaluateRate(plan, rate, tolerancePpm, scope),
  }));
  const first = channels[0]!;
  const worst = channels.reduce((a, b) => (b.worstSlack < a.worstSlack ? b : a));
  return {
    rate,
    tolerancePpm,
    zone: first.zone,
    inverted: first.inverted,
    center: first.center,
    image: first.image,
    zoneEdgeMargin: hz(Math.min(...channels.map((c) => c.zoneEdgeMargin))),
    checks: channels.flatMap((c) => c.checks.map((check) => ({ ...check, label: channelCheckLabel(c.label, check.label) }))),
    checkScope: scope,
    limitedBy: limitInChannel(worst.limitedBy, worst.label),
    worstMargin: worst.worstMargin,
    worstSlack: worst.worstSlack,
    pass: channels.every((c) => c.pass),
    channels,
  };
}

const blockingOf = new WeakMap<readonly Interferer[], readonly Interferer[]>();

/**
 * The blocking interferers of a plan's list, in its order; filtered once per
 * list (kept while the list lives), since every candidate asks.
 *
 * @param interferers a plan's interferers
 * @returns those with blocking set
 * @example blockingInterferers(handWorked.interferers).length // 2
 */
export function blockingInterferers(interferers: readonly Interferer[]): readonly Interferer[] {
  let blocking = blockingOf.get(interferers);
  if (!blocking) {
    blocking = interferers.filter((i) => i.blocking);
    blockingOf.set(interferers, blocking);
  }
  return blocking;
}

/**
 * Distance from the guarded band to the nearer edge of zone n at rate r, Hz. A lower guard stops at DC, as in guardedBand.
 *
 * @example zoneEdgeMarginAt(handWorked.band, handWorked.guard, 2, hz(26e6)) // 1e6 (25 MHz is 1 MHz below the top of zone 2, [13, 26] MHz)
 */
export function zoneEdgeMarginAt(band: Band, guard: Guard, zone: number, rate: Hz): Hz {
  const guarded = guardedBand(band, guard);
  const below = guarded.low - ((zone - 1) * rate) / 2;
  const above = (zone * rate) / 2 - guarded.high;
  return hz(Math.min(below, above));
}

function checkInterferer(
  context: PlanContext,
  interferer: Interferer,
  rate: Hz,
  drift: { readonly low: Hz; readonly high: Hz },
): CheckResult {
  const margin = leastMargin(interferer, context.band, drift);
  const levelMargin = db(context.levelThreshold - interferer.level);
  const blocked = interferer.blocking && meetsOpen(drift, forbiddenRates(interferer, context.band, drift.low, drift.high));
  const alias = foldExtent(hz(interferer.rateMultiple * rate + interferer.low), hz(interferer.rateMultiple * rate + interferer.high), rate);
  return {
    label: interferer.label,
    kind: interferer.kind,
    source: interferer.source,
    alias: alias.map((s) => [hz(s.low), hz(s.high)] as const),
    margin: hz(margin),
    requiredMargin: interferer.requiredMargin,
    level: interferer.level,
    levelMargin,
    blocking: interferer.blocking,
    pass: !blocked,
  };
}

/**
 * The least signed margin of an interferer to the wanted band over a range of
 * rates: the minimum over every nearby image, each image's margin being
 * piecewise linear with known breakpoints.
 * @example leastMargin(handWorked.interferers[0], handWorked.band, { low: hz(26e6), high: hz(26e6) }) // 5e6
 */
export function leastMargin(interferer: Interferer, band: Band, range: { readonly low: Hz; readonly high: Hz }): Hz {
  // Allocation-free: the screens call this for every blocking interferer at every rate they try.
  const rateMultiple = normalisedMultiple(interferer);
  const low = normalisedLow(interferer);
  const high = normalisedHigh(interferer);
  let least = Infinity;
  for (let side = 1; side >= -1; side -= 2) {
    const imageLow = imageOffsetLow(band, side);
    const imageHigh = imageOffsetHigh(band, side);
    const last = lastNearbyImage(rateMultiple, high - imageLow, range.low, range.high);
    for (let j = firstNearbyImage(rateMultiple, low - imageHigh, range.low, range.high); j <= last; j++) {
      const slope = j - rateMultiple;
      least = Math.min(
        least,
        marginAt(low, high, imageLow, imageHigh, slope * range.low),
        marginAt(low, high, imageLow, imageHigh, slope * range.high),
      );
      if (slope === 0) continue;
      const bend = breakpointAt(low, high, imageLow, imageHigh, slope);
      if (bend > range.low && bend < range.high) least = Math.min(least, marginAt(low, high, imageLow, imageHigh, slope * bend));
    }
  }
  return hz(least);
}
