import { hz, type Hz } from '../units/quantities.js';
import { MOST_NCO_BITS } from '../scenario/scenario.js';

/** What the down-converter's NCO is loaded with, and what it gives. */
export interface NcoSetting {
  readonly bits: number;
  /** The frequency asked for, Hz (the channel's aliased centre). */
  readonly target: Hz;
  /** round(target·2^bits / rate): the word for +target. */
  readonly word: number;
  /** word·rate / 2^bits, Hz. */
  readonly actual: Hz;
  /** actual − target, Hz. */
  readonly error: Hz;
  /** The channel arrives mirrored: tune to −target instead (or conjugate the output after tuning to +target). */
  readonly inverted: boolean;
  /** The word for −target, 2^bits − word (mod 2^bits); it gives −actual, so its error is −error. */
  readonly negativeWord: number;
}

/**
 * The NCO tuning word for a frequency at a sample rate (common practice:
 * word = round(f·2^b / rate), frequency given = word·rate / 2^b). When the
 * channel is inverted the mixer is tuned to −f: the word 2^b − word, which
 * gives −actual, so the residual error changes sign.
 *
 * @param target frequency to tune to, Hz, in [0, rate/2]
 * @param rate sample rate, Hz (> 0)
 * @param bits accumulator width, 1 to MOST_NCO_BITS
 * @param inverted whether the channel arrives mirrored
 * @returns the word, the frequency it gives and the error
 * @throws RangeError for bits outside 1–48, a rate ≤ 0 or a target outside [0, rate/2]
 * @example ncoSetting(hz(10e6), hz(100e6), 8, false) // { word: 26, actual: 10156250, error: 156250 }
 */
export function ncoSetting(target: Hz, rate: Hz, bits: number, inverted: boolean): NcoSetting {
  if (!(Number.isInteger(bits) && bits >= 1 && bits <= MOST_NCO_BITS))
    throw new RangeError(`NCO width must be a whole number of bits from 1 to ${MOST_NCO_BITS}, found ${bits}`);
  if (!(rate > 0 && Number.isFinite(rate))) throw new RangeError(`NCO rate must be > 0, found ${rate}`);
  if (!(target >= 0 && target <= rate / 2)) throw new RangeError(`NCO frequency must lie in [0, rate/2], found ${target} Hz at ${rate} Hz`);
  const full = 2 ** bits;
  const word = Math.round((target * full) / rate);
  const actual = (word * rate) / full;
  return { bits, target, word, actual: hz(actual), error: hz(actual - target), inverted, negativeWord: (full - word) % full };
}
