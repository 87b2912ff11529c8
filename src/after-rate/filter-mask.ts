import { db, type Db } from '../units/quantities.js';
import type { AntiAliasFilter } from '../scenario/scenario.js';
import { leastAttenuation } from '../filter/filter-attenuation.js';
import type { AliasBand } from './alias-bands.js';
import { ANTI_ALIAS_MASK, limitInChannel, limitText, type Limit } from '../solve/limited-by.js';

/** The label the mask check carries when it blocks a rate: the text of its limit. */
export const MASK_CHECK: string = limitText(ANTI_ALIAS_MASK);

/** One alias band with what the filter must give there and what it gives. */
export interface MaskBand extends AliasBand {
  /** Attenuation needed so that the out-of-band level lands at or below the non-blocking threshold, dB (≥ 0). */
  readonly requiredDb: Db;
  /** The scenario filter's least attenuation over the band, dB (exact; 0 with no filter). */
  readonly givenDb: Db;
  /** givenDb − requiredDb: negative is a shortfall. */
  readonly marginDb: Db;
}

/** The anti-alias mask at one rate. */
export interface FilterMask {
  /** The strongest out-of-band level assumed at the filter input, dBFS. */
  readonly outOfBandLevel: Db;
  /** True when the scenario states that level (then a shortfall blocks the rate); false: full scale assumed, reported only. */
  readonly levelStated: boolean;
  /** The level at or below which a signal may land anywhere, dBFS. */
  readonly threshold: Db;
  /** outOfBandLevel − threshold, at least 0, dB: the same at every alias band. */
  readonly requiredDb: Db;
  readonly bands: readonly MaskBand[];
  /** The band with the least margin; null when no alias band lies below the input bandwidth. */
  readonly worst: MaskBand | null;
  /** False only when the level is stated and some band falls short. */
  readonly pass: boolean;
}

/**
 * The attenuation the anti-alias filter must give over each alias band, what
 * the scenario's filter gives there (its exact least attenuation over the
 * band, see leastAttenuation), and the margin. A signal at the out-of-band
 * level L that reaches the converter at or below the threshold T may land on
 * the channel (it does not block), so the filter must give L − T dB.
 *
 * @param bands the alias bands of the rate (widened by the required margin)
 * @param filter the scenario's filter, or null (0 dB everywhere)
 * @param outOfBandLevel the strongest level outside the channel at the filter input, dBFS; null: full scale (0 dBFS), reported only
 * @param threshold the non-blocking threshold, dBFS (weakest wanted level − rejection)
 * @returns the mask with a margin per band
 * @example filterMask([{ multiple: 1, sense: 'mirrored', low: hz(15e6), high: hz(19e6) }], null, db(-20), db(-80)).worst.marginDb // −60
 */
export function filterMask(
  bands: readonly AliasBand[],
  filter: AntiAliasFilter | null,
  outOfBandLevel: Db | null,
  threshold: Db,
): FilterMask {
  const level = outOfBandLevel ?? db(0);
  const requiredDb = db(Math.max(0, level - threshold));
  const masked = bands.map((band): MaskBand => {
    const givenDb = leastAttenuation(filter, band.low, band.high);
    return { ...band, requiredDb, givenDb, marginDb: db(givenDb - requiredDb) };
  });
  const worst = masked.reduce<MaskBand | null>((w, b) => (w === null || b.marginDb < w.marginDb ? b : w), null);
  const levelStated = outOfBandLevel !== null;
  return {
    outOfBandLevel: level,
    levelStated,
    threshold,
    requiredDb,
    bands: masked,
    worst,
    pass: !levelStated || worst === null || worst.marginDb >= 0,
  };
}

/** One channel's mask at a rate, with the channel's label (null for a single wanted band). */
export interface ChannelMask {
  readonly channel: string | null;
  /** Null when the after-rate figures were not computed. */
  readonly mask: FilterMask | null;
}

/**
 * What limits a rate once its anti-alias masks are judged: while a frequency
 * check or the zone edge fails, the checks' own limit; when they all pass
 * but a mask falls short, the anti-alias mask (of the channel that falls
 * shortest, named when it is one of several); else the checks' limit.
 *
 * @param limit what limits the frequency checks (the evaluation's limitedBy)
 * @param checksPass whether every frequency check and the zone edge pass (the evaluation's pass)
 * @param masks each channel's mask (one entry with channel null for one wanted band)
 * @returns the limit to show
 * @example limitWithMasks({ kind: 'zone edge' }, true, [{ channel: null, mask: filterMask([{ multiple: 1, sense: 'mirrored', low: hz(15e6), high: hz(19e6) }], null, db(-20), db(-80)) }]) // { kind: 'anti-alias mask' }
 */
export function limitWithMasks(limit: Limit, checksPass: boolean, masks: readonly ChannelMask[]): Limit {
  if (!checksPass) return limit;
  let shortest: { channel: string | null; marginDb: number } | null = null;
  for (const { channel, mask } of masks) {
    if (mask === null || mask.pass || mask.worst === null) continue;
    if (shortest === null || mask.worst.marginDb < shortest.marginDb) shortest = { channel, marginDb: mask.worst.marginDb };
  }
  if (shortest === null) return limit;
  return shortest.channel === null ? ANTI_ALIAS_MASK : limitInChannel(ANTI_ALIAS_MASK, shortest.channel);
}
