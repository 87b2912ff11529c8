import { hz, type Hz } from '../units/quantities.js';
import { sameEdge } from '../math/edge-tolerance.js';

/** How the sample rate comes down to the output rate, and whether the channel fits. */
export interface DecimationPlan {
  readonly outputRate: Hz;
  /** rate / outputRate when it is a whole number (within rounding); null otherwise. */
  readonly factor: number | null;
  /** Why there is no factor, in words; null when there is one. */
  readonly refusal: string | null;
  /** Number of half-band (÷2) stages: the power of two in the factor; 0 without a factor. */
  readonly halfBandStages: number;
  /** factor / 2^halfBandStages: the odd remainder left to one more filter (1: none); null without a factor. */
  readonly remainder: number | null;
  /** The part of the complex output band the digital filter passes, Hz: usableFraction × outputRate. */
  readonly usableBandwidth: Hz;
  /** usableBandwidth/2 − (channelWidth/2 + |NCO error|), Hz: room left on the tighter side (negative: the channel does not fit). */
  readonly fitSlack: Hz;
  readonly fits: boolean;
}

/** The words for a rate the output rate does not divide. */
export const NOT_AN_INTEGER = 'not an integer: needs a fractional resampler';

/**
 * The decimation from the sample rate to a stated output rate: the factor
 * D = rate/outputRate when it is whole (within the edge tolerance), split into
 * the half-band stages its power of two allows and an odd remainder; and
 * whether the channel, centred by the NCO (off by its residual error), fits in
 * the usable fraction of the complex output band, [−u·out/2, +u·out/2].
 *
 * @param rate sample rate, Hz (> 0)
 * @param outputRate complex output rate, Hz (> 0)
 * @param channelWidth the channel's width, Hz
 * @param usableFraction the part of the output band the digital filter's transition leaves, in (0, 1]
 * @param ncoError the NCO's residual error, Hz (its sign does not matter)
 * @returns the plan
 * @example decimationPlan(hz(122.88e6), hz(7.68e6), hz(5e6), 0.8, hz(0)) // { factor: 16, halfBandStages: 4, remainder: 1, usableBandwidth: 6144000, fits: true }
 */
export function decimationPlan(rate: Hz, outputRate: Hz, channelWidth: Hz, usableFraction: number, ncoError: Hz): DecimationPlan {
  const usableBandwidth = hz(usableFraction * outputRate);
  const fitSlack = hz(usableBandwidth / 2 - (channelWidth / 2 + Math.abs(ncoError)));
  const ratio = rate / outputRate;
  const whole = Math.round(ratio);
  const noFactor = (refusal: string): DecimationPlan => ({
    outputRate,
    factor: null,
    refusal,
    halfBandStages: 0,
    remainder: null,
    usableBandwidth,
    fitSlack,
    fits: fitSlack >= 0,
  });
  if (whole < 1 || !sameEdge(ratio, whole)) return noFactor(ratio < 1 ? 'the output rate is above the sample rate' : NOT_AN_INTEGER);
  let halfBandStages = 0;
  let remainder = whole;
  while (remainder % 2 === 0) {
    remainder /= 2;
    halfBandStages++;
  }
  return { outputRate, factor: whole, refusal: null, halfBandStages, remainder, usableBandwidth, fitSlack, fits: fitSlack >= 0 };
}
