import { db, hz, type Db, type Hz } from '../units/quantities.js';
import type { Band } from '../math/band.js';
import { integrate } from './quadrature.js';
import type { PowerResponse } from './power-response.js';

/** The relative tolerance each integral is asked for. */
export const NOISE_TOLERANCE = 1e-9;

/** Wideband noise folded into the channel. */
export interface NoiseFolding {
  /** ∫|H|² over the channel, Hz: the channel's own noise bandwidth through the filter. */
  readonly channelBandwidth: Hz;
  /** ∫|H|² summed over every alias band of the channel, Hz. */
  readonly aliasBandwidth: Hz;
  /** 10·log10((channel + alias) / channel), dB: how much more wideband noise lands in the channel than the channel's own. */
  readonly penaltyDb: Db;
  /** Bound on the error of penaltyDb from the quadrature's error estimates, dB. */
  readonly accuracyDb: Db;
}

/**
 * The noise-folding penalty: white noise at the filter input reaches the
 * channel through the filter from the channel itself and from every alias
 * band (the images j·r ± channel up to the input bandwidth), so the noise in
 * the channel grows by 10·log10(1 + Σ∫alias|H|² / ∫channel|H|²) dB. Each
 * integral is computed by adaptive Simpson quadrature (see integrate) to a
 * relative tolerance of NOISE_TOLERANCE, and the error estimates are carried
 * to a bound in dB. With no filter and the input bandwidth covering m whole
 * zones the penalty is 10·log10(m); with a brick-wall filter over the channel,
 * 0 dB.
 *
 * @param response the filter's power response and kinks
 * @param channel the wanted band, Hz
 * @param aliases the channel's alias bands (unwidened), Hz
 * @returns the penalty and its parts
 * @throws RangeError when the filter stops the channel completely (no noise bandwidth to compare with)
 * @example noiseFolding(filterPowerResponse(null), { low: hz(10e6), high: hz(20e6) }, [{ low: hz(30e6), high: hz(40e6) }]).penaltyDb // 3.01 (the channel and one image, no filter: 10·log10(2))
 */
export function noiseFolding(response: PowerResponse, channel: Band, aliases: readonly Band[]): NoiseFolding {
  const width = channel.high - channel.low;
  const inChannel = integrate(response.power, channel.low, channel.high, NOISE_TOLERANCE * Math.max(width, 1), response.cuts);
  if (!(inChannel.value > 0)) throw new RangeError(`the filter stops the whole channel [${channel.low}, ${channel.high}] Hz`);
  const share = (NOISE_TOLERANCE * inChannel.value) / Math.max(aliases.length, 1);
  let aliasValue = 0;
  let aliasError = 0;
  for (const band of aliases) {
    const part = integrate(response.power, band.low, band.high, share, response.cuts);
    aliasValue += part.value;
    aliasError += part.errorEstimate;
  }
  const c = inChannel.value;
  const total = c + aliasValue;
  // First-order bound: ∂P/∂Ia = (10/ln 10)/(Ic + Ia), ∂P/∂Ic = −(10/ln 10)·Ia/(Ic·(Ic + Ia)).
  const accuracy = (10 / Math.LN10) * (aliasError / total + (inChannel.errorEstimate * aliasValue) / (c * total));
  return { channelBandwidth: hz(c), aliasBandwidth: hz(aliasValue), penaltyDb: db(10 * Math.log10(total / c)), accuracyDb: db(accuracy) };
}

/**
 * The SNR the driver's wideband noise leaves in the channel after folding:
 * a full-scale sine against noise density N0 (dBFS/Hz) over the total noise
 * bandwidth (channel plus alias bands, through the filter).
 *
 * @param noiseDensity N0, dBFS/Hz
 * @param folding the noise folding at the rate
 * @returns −(N0 + 10·log10(channelBandwidth + aliasBandwidth)), dB
 * @example driverLimitedSnr(db(-150), noiseFolding(filterPowerResponse(null), { low: hz(10e6), high: hz(20e6) }, []) ) // 80.0 (−150 dBFS/Hz over 10 MHz: 150 − 70)
 */
export function driverLimitedSnr(noiseDensity: Db, folding: NoiseFolding): Db {
  return db(-(noiseDensity + 10 * Math.log10(folding.channelBandwidth + folding.aliasBandwidth)));
}
