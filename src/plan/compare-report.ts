import { hz, type Db, type Hz, type Ppm, type Seconds } from '../units/quantities.js';
import type { ClockPart } from '../scenario/scenario.js';
import type { PartPlan, RateSettings } from '../clocks/part-plan.js';
import { limitText, type LimitKind } from '../solve/limited-by.js';
import { nextLimit, tieAllowance } from '../solve/next-limit.js';
import { PAPER_DESIGN_CAUTION } from './caution.js';
import { afterRate, type AfterRateInputs } from '../after-rate/after-rate.js';
import { limitWithMasks, type FilterMask } from '../after-rate/filter-mask.js';
import type { PrototypeOrders } from '../after-rate/prototype-order.js';

/** Why a part has no verdict on a variant. */
export const NOT_PLANNED = "no rate of this part keeps its drift inside the converter's rate range";

/** One part judged on one variant; rate, settings and zone are null when the part gives no rate the converter accepts. */
export interface VariantVerdict {
  readonly variant: string;
  readonly rate: Hz | null;
  readonly settings: RateSettings | null;
  readonly zone: number | null;
  readonly inverted: boolean | null;
  readonly worstMargin: Hz;
  /** Margin minus requirement of the limiting check, Hz: what parts are ranked by. */
  readonly worstSlack: Hz;
  readonly limitedBy: string;
  /** What limitedBy names: 'interferer', 'zone edge', 'anti-alias mask' (every frequency check passes, the mask fails), or 'not planned' for a part the variant cannot plan. */
  readonly limitedByKind: LimitKind | 'not planned';
  /** Null when the nominal rate fails. */
  readonly headroomPpm: { readonly down: Ppm; readonly up: Ppm } | null;
  readonly jitterSnrDb: Db | null;
  readonly channelSnrDb: Db | null;
  /**
   * The least anti-alias filter orders this rate needs (low-pass prototype: Butterworth, Chebyshev I, elliptic); null when
   * the variant was compared without after-rate inputs, the part gives no rate, or no filter can meet the mask.
   */
  readonly filterOrders: PrototypeOrders | null;
  /** The scenario filter's least margin over the rate's alias bands, dB; null as filterOrders or with no alias band. */
  readonly maskMarginDb: Db | null;
  readonly pass: boolean;
  /** With several channels, each channel at the part's rate, in the scenario's order; absent for one wanted band or a part not planned. */
  readonly channels?: readonly ChannelVerdict[];
}

/** One channel of a variant at a part's rate: its zone, NCO, worst check and verdict. */
export interface ChannelVerdict {
  readonly label: string;
  readonly zone: number | null;
  readonly inverted: boolean | null;
  /** The channel's centre after sampling, the NCO frequency, Hz; null when it straddles. */
  readonly nco: Hz | null;
  readonly worstMargin: Hz;
  readonly limitedBy: string;
  readonly limitedByKind: LimitKind;
  readonly pass: boolean;
}

export interface ComparedPart {
  readonly label: string;
  readonly frequency: Hz;
  readonly tolerancePpm: Ppm;
  readonly jitter: Seconds | null;
  readonly note: string;
  readonly perVariant: readonly VariantVerdict[];
  readonly passesAll: boolean;
  /** The least worst margin over the variants, Hz, and the variant where it occurs. */
  readonly familyWorstMargin: Hz;
  readonly familyLimitedBy: string;
}

/** The answer to "which part, with which settings, for these variants?": the `compare` JSON contract. */
export interface CompareReport {
  readonly variants: readonly string[];
  /** Ranked: passing every variant first, then by the worst slack over the variants, ties by the next-tightest check (as solve ranks). */
  readonly parts: readonly ComparedPart[];
  /** Labels of the parts that pass every variant, best first. */
  readonly family: readonly string[];
  readonly caution: string;
}

/** One variant's plans, one per part, in any order, and the parts it could not plan. */
export interface VariantPlans {
  readonly name: string;
  readonly plans: readonly PartPlan[];
  readonly unplanned: readonly ClockPart[];
  /** The variant's after-rate inputs: each verdict then carries the filter orders its rate needs, and a stated out-of-band level can fail it. */
  readonly afterRate?: AfterRateInputs | null;
  /** The wanted band's width, Hz: sets what counts as a tie on the worst slack (as `solve` ranks); without it no two slacks tie. */
  readonly bandwidth?: Hz;
}

/**
 * Compares clock parts across variants. The caller plans the union of the
 * catalogues on each variant; a part that a variant cannot plan (no rate the
 * converter accepts) fails that variant, and so the family.
 *
 * @param variants each variant's name and its part plans
 */
export function compareReport(variants: readonly VariantPlans[]): CompareReport {
  const parts = new Map<string, ClockPart>();
  for (const v of variants)
    for (const part of [...v.plans.map((p) => p.part), ...v.unplanned]) if (!parts.has(part.label)) parts.set(part.label, part);
  const compared = [...parts.values()].map((part) => comparedPart(part, variants));
  const worstSlack = new Map(compared.map((c) => [c, Math.min(...c.perVariant.map((v) => v.worstSlack))]));
  const tie = Math.max(0, ...variants.map((v) => tieAllowance(v.bandwidth ?? 0)));
  // Parts that tie on the worst slack are ranked by the next-tightest check across the variants, as solve ranks its candidates.
  const next = new Map(compared.map((c) => [c, nextSlack(c.label, worstSlack.get(c)!, tie, variants)]));
  const bySlack = (a: ComparedPart, b: ComparedPart) => {
    const difference = worstSlack.get(b)! - worstSlack.get(a)!;
    return Math.abs(difference) <= tie ? 0 : difference;
  };
  compared.sort((a, b) => Number(b.passesAll) - Number(a.passesAll) || bySlack(a, b) || next.get(b)! - next.get(a)!);
  return {
    variants: variants.map((v) => v.name),
    parts: compared,
    family: compared.filter((c) => c.passesAll).map((c) => c.label),
    caution: PAPER_DESIGN_CAUTION,
  };
}

/**
 * The slack of a part's tightest check beyond its worst over the variants, Hz: a variant whose own worst is beyond the
 * part's worst (by more than the tie) counts with that worst, one that ties with it with its next-tightest check.
 * Infinity when no check is beyond the worst (nothing left to rank by).
 */
function nextSlack(label: string, worst: number, tie: number, variants: readonly VariantPlans[]): number {
  let least = Infinity;
  for (const v of variants) {
    const plan = v.plans.find((p) => p.part.label === label);
    if (!plan) continue;
    const e = plan.evaluation;
    const slack = e.worstSlack > worst + tie ? e.worstSlack : (nextLimit(e, v.bandwidth ?? 0)?.slack ?? Infinity);
    least = Math.min(least, slack);
  }
  return least;
}

function comparedPart(part: ClockPart, variants: readonly VariantPlans[]): ComparedPart {
  const perVariant = variants.flatMap((v) => {
    const plan = v.plans.find((p) => p.part.label === part.label);
    if (plan) return [verdict(v.name, plan, v.afterRate ?? null)];
    return v.unplanned.some((u) => u.label === part.label) ? [unplanned(v.name)] : [];
  });
  const worst = perVariant.reduce<VariantVerdict | null>((w, v) => (w === null || v.worstSlack < w.worstSlack ? v : w), null);
  return {
    label: part.label,
    frequency: part.frequency,
    tolerancePpm: part.tolerancePpm,
    jitter: part.jitter,
    note: part.note,
    perVariant,
    passesAll: perVariant.length === variants.length && perVariant.every((v) => v.pass),
    familyWorstMargin: worst ? worst.worstMargin : hz(-Infinity),
    familyLimitedBy: worst ? `${worst.limitedBy} (${worst.variant})` : 'not planned',
  };
}

function unplanned(variant: string): VariantVerdict {
  return {
    variant,
    rate: null,
    settings: null,
    zone: null,
    inverted: null,
    worstMargin: hz(-Infinity),
    worstSlack: hz(-Infinity),
    limitedBy: NOT_PLANNED,
    limitedByKind: 'not planned',
    headroomPpm: null,
    jitterSnrDb: null,
    channelSnrDb: null,
    filterOrders: null,
    maskMarginDb: null,
    pass: false,
  };
}

function verdict(variant: string, plan: PartPlan, inputs: AfterRateInputs | null): VariantVerdict {
  const e = plan.evaluation;
  const after = inputs === null ? null : afterRate(inputs, plan.rate, e.tolerancePpm, e.center, e.inverted);
  const masks = channelMasks(inputs, plan);
  // Every frequency check passing and a mask failing: the mask limits the rate.
  const limit = limitWithMasks(
    e.limitedBy,
    plan.pass,
    e.channels && masks
      ? e.channels.map((c, i) => ({ channel: c.label, mask: masks[i]! }))
      : [{ channel: null, mask: after?.mask ?? null }],
  );
  return {
    variant,
    rate: plan.rate,
    settings: plan.settings,
    zone: e.zone,
    inverted: e.inverted,
    worstMargin: e.worstMargin,
    worstSlack: e.worstSlack,
    limitedBy: limitText(limit),
    limitedByKind: limit.kind,
    headroomPpm: plan.headroom ? { down: plan.headroom.downPpm, up: plan.headroom.upPpm } : null,
    jitterSnrDb: plan.snr.jitterSnrDb,
    channelSnrDb: plan.snr.channelSnrDb,
    filterOrders: after ? after.design.orders : null,
    maskMarginDb: after?.mask.worst ? after.mask.worst.marginDb : null,
    // Several channels: every channel's mask must hold too.
    pass: plan.pass && (after === null || after.mask.pass) && (masks?.every((m) => m.pass) ?? true),
    ...(e.channels
      ? {
          channels: e.channels.map((c, i) => {
            const channelLimit = limitWithMasks(c.limitedBy, c.pass, [{ channel: null, mask: masks?.[i] ?? null }]);
            return {
              label: c.label,
              zone: c.zone,
              inverted: c.inverted,
              nco: c.center,
              worstMargin: c.worstMargin,
              limitedBy: limitText(channelLimit),
              limitedByKind: channelLimit.kind,
              pass: c.pass && (masks?.[i]?.pass ?? true),
            };
          }),
        }
      : {}),
  };
}

/** With several channels, each channel's own anti-alias mask at the part's rate; null for one band. */
function channelMasks(inputs: AfterRateInputs | null, plan: PartPlan): FilterMask[] | null {
  const e = plan.evaluation;
  if (!inputs?.channels || !e.channels) return null;
  return e.channels.map((c, i) => afterRate(inputs.channels![i]!, plan.rate, e.tolerancePpm, c.center, c.inverted).mask);
}
