import { db, type Db, type Hz } from '../units/quantities.js';
import { capAttenuation, ATTENUATION_CAP } from './attenuation-cap.js';

/**
 * A Butterworth band-pass of order N between passband edges passLow < passHigh, Hz.
 * passLow = 0 is the low-pass of cut-off passHigh and passHigh = Infinity the
 * high-pass of cut-off passLow: the limits of the band-pass transform.
 */
export interface ButterworthBandPass {
  readonly order: number;
  readonly passLow: Hz;
  readonly passHigh: Hz;
}

/**
 * The normalised low-pass frequency of the low-pass to band-pass transform,
 * Ω = (f² − f0²)/(f·BW) with f0 = √(passLow·passHigh), BW = passHigh − passLow.
 * Ω = ±1 at the passband edges, 0 at f0; Ω(f0²/f) = −Ω(f) (geometric symmetry).
 *
 * @param filter order and passband edges, Hz
 * @param frequency Hz, > 0
 * @returns Ω, dimensionless (−∞ as frequency → 0)
 * @example butterworthOmega({ order: 5, passLow: hz(30e6), passHigh: hz(80e6) }, hz(120e6)) // 2
 */
export function butterworthOmega(filter: ButterworthBandPass, frequency: Hz): number {
  // passHigh → ∞ takes Ω to −passLow/f, the high-pass transform; passLow = 0 needs no case (Ω = f/passHigh).
  if (filter.passHigh === Infinity) return -filter.passLow / frequency;
  const f0Squared = filter.passLow * filter.passHigh;
  return (frequency * frequency - f0Squared) / (frequency * (filter.passHigh - filter.passLow));
}

/**
 * Attenuation of the Butterworth band-pass, 10·log10(1 + Ω^(2N)) dB, from
 * the standard magnitude |H|² = 1/(1 + Ω^(2N)). The filter is real, so a
 * negative frequency is attenuated as its magnitude. At DC (Ω → −∞) a
 * band-pass or high-pass attenuates infinitely; that is reported as
 * ATTENUATION_CAP (300 dB), as is anything above it. A low-pass (passLow = 0)
 * passes DC (0 dB).
 *
 * @param filter order and passband edges, Hz
 * @param frequency Hz (sign ignored)
 * @returns attenuation in dB, in [0, 300]
 * @example butterworthAttenuation({ order: 5, passLow: hz(30e6), passHigh: hz(80e6) }, hz(120e6)) // 30.11 (Ω = 2.05)
 */
export function butterworthAttenuation(filter: ButterworthBandPass, frequency: Hz): Db {
  const f = Math.abs(frequency);
  if (f === 0) return filter.passLow === 0 ? db(0) : ATTENUATION_CAP;
  const omega = Math.abs(butterworthOmega(filter, f as Hz));
  if (omega <= 1) return capAttenuation(10 * Math.log10(1 + omega ** (2 * filter.order)));
  // Written as 20N·log10|Ω| + 10·log10(1 + |Ω|^(−2N)) so a huge Ω^(2N) never overflows to ∞.
  return capAttenuation(20 * filter.order * Math.log10(omega) + 10 * Math.log10(1 + omega ** (-2 * filter.order)));
}

/**
 * The least attenuation of the Butterworth band-pass over the extent
 * [low, high], dB, found exactly without sampling.
 *
 * Why the ends and f0 suffice: Ω(f) = (f − f0²/f)/BW has derivative
 * (1 + f0²/f²)/BW > 0, so Ω rises strictly on (0, ∞) through 0 at f0. Hence
 * |Ω| falls strictly on (0, f0] and rises strictly on [f0, ∞), and the
 * attenuation, increasing in |Ω|, does the same. An extent holding f0 has
 * least attenuation 0 dB there; one wholly below f0 has it at its upper end,
 * one wholly above at its lower end. A negative extent is attenuated as its
 * magnitudes: [low, high] maps to [min |f|, max |f|], with 0 when it straddles 0.
 *
 * @param filter order and passband edges, Hz
 * @param low lower end of the extent, Hz
 * @param high upper end, Hz (≥ low)
 * @returns least attenuation in dB
 * @example butterworthLeastAttenuation({ order: 5, passLow: hz(30e6), passHigh: hz(80e6) }, hz(120e6), hz(130e6)) // 30.11
 */
export function butterworthLeastAttenuation(filter: ButterworthBandPass, low: Hz, high: Hz): Db {
  const [near, far] = magnitudeRange(low, high);
  // A high-pass's centre is at ∞: every extent lies below it.
  const f0 = filter.passHigh === Infinity ? Infinity : Math.sqrt(filter.passLow * filter.passHigh);
  if (near <= f0 && f0 <= far) return db(0);
  return butterworthAttenuation(filter, (far < f0 ? far : near) as Hz);
}

/**
 * Checks a Butterworth band-pass once at the boundary.
 *
 * @param filter order and passband edges, Hz
 * @throws RangeError unless the order is an integer ≥ 1 and 0 ≤ passLow < passHigh
 *   (passLow = 0: a low-pass; passHigh = Infinity: a high-pass; not both)
 * @example checkButterworth({ order: 0, passLow: hz(1), passHigh: hz(2) }) // throws
 */
export function checkButterworth(filter: ButterworthBandPass): void {
  if (!(Number.isInteger(filter.order) && filter.order >= 1))
    throw new RangeError(`Butterworth order must be an integer ≥ 1, found ${filter.order}`);
  const { passLow, passHigh } = filter;
  if (!(passLow >= 0 && Number.isFinite(passLow) && passHigh > passLow && !(passLow === 0 && passHigh === Infinity))) {
    throw new RangeError(`Butterworth passband needs 0 ≤ passLow < passHigh, not both open, found [${passLow}, ${passHigh}] Hz`);
  }
}

/** [min |f|, max |f|] over f in [low, high]. */
export function magnitudeRange(low: number, high: number): [number, number] {
  if (low <= 0 && high >= 0) return [0, Math.max(-low, high)];
  return low > 0 ? [low, high] : [-high, -low];
}
