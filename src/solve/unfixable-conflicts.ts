import { db, hz, type Db, type Hz } from '../units/quantities.js';
import { quantityText } from '../text/quantity-text.js';
import type { Band } from '../math/band.js';
import type { Interferer } from '../interferers/interferer.js';
import { imageMargin, normalisedExtent } from './fold-images.js';
import { channelPlans, hasChannels, type PlanContext } from './plan-context.js';
import { channelCheckLabel } from './limited-by.js';

/** A blocking interferer that no sampling rate can clear, and what can. */
export interface Conflict {
  readonly label: string;
  readonly kind: Interferer['kind'];
  /** Signed distance from the wanted band where it sits still relative to the band (at the converter input for a fixed source), Hz; negative: inside by that much. */
  readonly distance: Hz;
  readonly requiredMargin: Hz;
  /** How far its level is above the threshold, dB: the rejection that would make it non-blocking. */
  readonly excess: Db;
  /** One sentence, naming what can fix it. */
  readonly sentence: string;
}

/**
 * The blocking interferers that are too close to the wanted band at every
 * rate, found exactly before solving. Folding never increases the distance
 * between two frequencies (it is 1-Lipschitz: each half-zone maps by a
 * translation or a reflection, and the pieces meet), so a source that sits
 * closer to the band at the converter input than its required margin is
 * closer after sampling at every rate. In the solver's terms: an extent
 * a·r + [l, h] with a whole a has an image of the band, j = a, that moves
 * with it (slope 0); when that image is within reach, closeRates forbids
 * every rate (stillDistance). With an IF shift the band and the source move by δ and b·δ:
 * the distance is convex in δ, so a source too close at both ends of the
 * shift range is too close over all of it.
 *
 * @param context the plan (interferers, band, level threshold, ifShift)
 * @returns the conflicts, in the order of the interferers
 * @example unfixableConflicts(sContext) // []
 */
export function unfixableConflicts(context: PlanContext): Conflict[] {
  // Several channels: each channel's own conflicts, named as its checks are.
  if (hasChannels(context)) return channelPlans(context).flatMap((plan) => conflictsOf(plan, plan.label ?? null));
  return conflictsOf(context, null);
}

/** The conflicts of one band; with a channel's label, named `channel: interferer` and said of that channel. */
function conflictsOf(context: PlanContext, channel: string | null): Conflict[] {
  const shifts = context.ifShift ? [context.ifShift.low, context.ifShift.high] : [0];
  const conflicts: Conflict[] = [];
  for (const interferer of context.interferers) {
    if (!interferer.blocking || !Number.isInteger(interferer.rateMultiple)) continue;
    let nearest = Infinity;
    let always = true;
    for (const shift of shifts) {
      const moved = {
        ...interferer,
        low: (interferer.low + interferer.shiftMultiple * shift) as Hz,
        high: (interferer.high + interferer.shiftMultiple * shift) as Hz,
      };
      const band: Band = { low: hz(context.band.low + shift), high: hz(context.band.high + shift) };
      const distance = stillDistance(moved, band);
      nearest = Math.min(nearest, distance);
      if (!(distance < interferer.requiredMargin)) always = false;
    }
    if (!always) continue;
    const excess = db(interferer.level - context.levelThreshold);
    conflicts.push({
      label: channel === null ? interferer.label : channelCheckLabel(channel, interferer.label),
      kind: interferer.kind,
      distance: hz(nearest),
      requiredMargin: interferer.requiredMargin,
      excess,
      sentence: conflictSentence(interferer, nearest, excess, channel),
    });
  }
  return conflicts;
}

/**
 * The least signed distance from the extent to the band's images that move
 * with it (j = rateMultiple, both sides), Hz. Below the required margin it
 * is exactly the case in which closeRates forbids every rate (slope 0:
 * max(imageLow − h, l − imageHigh) < reach).
 */
function stillDistance(interferer: Interferer, band: Band): number {
  const extent = normalisedExtent(interferer);
  return Math.min(...([1, -1] as const).map((side) => imageMargin(extent, band, { j: extent.rateMultiple, side, slope: 0 }, hz(0))));
}

/** The sentence is printed in the terminal (and carried in the JSON): written as the terminal writes numbers. */
const T = quantityText('terminal');

function conflictSentence(interferer: Interferer, distance: number, excess: number, channel: string | null): string {
  const band = channel === null ? 'the wanted band' : `channel ${channel}`;
  const where =
    distance < 0 ? `lies inside ${band} (${T.frequency(-distance)} from its nearer edge)` : `lies ${T.frequency(distance)} from ${band}`;
  const required = `where ${T.frequency(interferer.requiredMargin)} is required`;
  const weaker = `${T.decibels(excess)} dB less level would make it harmless`;
  const fixes = {
    neighbour: `more anti-alias filter rejection of it (${weaker}), a different channel plan, or a smaller required margin for it (its "margin") can`,
    spur: `better isolation or filtering of it (${weaker}), moving the spur, or a smaller required margin for it (its "margin") can`,
    harmonic: `a more linear converter or less drive (${weaker}), more filter rejection of the signals that make it, a different channel plan, or a smaller margin for harmonics (requirements.kindMargins.harmonic) can`,
    intermod: `a more linear converter or less drive (${weaker}), more filter rejection of the signals that make it, a different channel plan, or a smaller margin for mixing products (requirements.kindMargins.intermod) can`,
    converter: `a different channel plan, a converter with a lower spur (${weaker}), or a smaller margin for converter spurs (requirements.kindMargins.converter) can`,
    channel: 'moving one of the two channels apart or a smaller spacing between channels (requirements.channelSpacing) can',
  }[interferer.kind];
  return `${interferer.label} (${interferer.kind}) ${where} ${required}; folding never moves two frequencies further apart, so no sampling rate can clear it: ${fixes}.`;
}
