import type { Db, Hz } from '../units/quantities.js';

/** What an interferer is; 'channel': another channel of the same scenario (a list of channels in `wanted`). */
export type InterfererKind = 'harmonic' | 'spur' | 'neighbour' | 'intermod' | 'converter' | 'channel';

/**
 * Anything that may alias onto the wanted band, as an input extent linear in
 * the sampling rate r: extent(r) = rateMultiple·r + [low, high]. Fixed
 * sources have rateMultiple 0; converter spurs tied to the rate have
 * rateMultiple k/M; a negative extent folds as its magnitude.
 *
 * When the first LO is retuned and the IF moves by δ, the extent moves to
 * rateMultiple·r + shiftMultiple·δ + [low, high]: the wanted band and each
 * neighbour move by δ (shiftMultiple 1), their k-th harmonics by k·δ, a
 * third-order product 2·f1 − f2 of two moving signals by δ, an interleaving
 * image k/M·r ∓ f by ∓δ; board spurs and rate-tied tones stay (0).
 */
export interface Interferer {
  /** Unique within one plan, e.g. "H3 wanted", "IM3 2·A1−A2". */
  readonly label: string;
  readonly kind: InterfererKind;
  /** Harmonic or intermodulation order; null where none. */
  readonly order: number | null;
  /** Where it comes from, in words, e.g. "3rd harmonic of the wanted band". */
  readonly source: string;
  readonly rateMultiple: number;
  /** How many times the IF shift δ the extent moves by (0 for fixed sources). */
  readonly shiftMultiple: number;
  readonly low: Hz;
  readonly high: Hz;
  /** Level at the converter, dBFS (after the anti-alias filter). */
  readonly level: Db;
  /** Margin to keep from the wanted alias when blocking, Hz. */
  readonly requiredMargin: Hz;
  /** False when the level is at or below the weakest wanted level minus the required rejection. */
  readonly blocking: boolean;
  /**
   * What it is made of, when it comes from the signals at the converter
   * input: each signal with the number of times it is taken with a plus and
   * a minus sign (a neighbour itself: plus 1; 2·A − B: A plus 2, B minus 1).
   * Absent for a rate-tied spur and for interferers built by hand.
   */
  readonly mixing?: readonly MixingTerm[];
  /** For an interleaving image, where it sits: k/M·r + side·(what `mixing` makes). */
  readonly image?: InterleaveImage;
}

/** Which signal at the converter input a mixing term takes. */
export interface SignalRef {
  readonly signal: 'wanted' | 'neighbour' | 'board spur';
  /** Index among the scenario's neighbours or board spurs; for 'wanted', among its channels (0: the wanted band, or the first channel). */
  readonly index: number;
  /** The board spur's own harmonic (1: the fundamental; 1 for other signals). */
  readonly harmonic: number;
}

/** One signal of a mixing product, taken `plus` times with + and `minus` times with −. */
export interface MixingTerm extends SignalRef {
  readonly plus: number;
  readonly minus: number;
}

/** An interleaving image at k/M of the rate, on the side `side` of its source. */
export interface InterleaveImage {
  readonly k: number;
  readonly ways: number;
  readonly side: 1 | -1;
}
