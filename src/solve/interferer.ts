import type { Db, Hz } from '../units/quantities.js';

export type InterfererKind = 'harmonic' | 'spur' | 'neighbour' | 'intermod' | 'converter';

/**
 * Anything that may alias onto the wanted band, as an input extent linear in
 * the sampling rate r: extent(r) = rateMultiple·r + [low, high]. Fixed
 * sources have rateMultiple 0; converter spurs tied to the rate have
 * rateMultiple k/M; a negative extent folds as its magnitude.
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
  readonly low: Hz;
  readonly high: Hz;
  /** Level at the converter, dBFS (after the anti-alias filter). */
  readonly level: Db;
  /** Margin to keep from the wanted alias when blocking, Hz. */
  readonly requiredMargin: Hz;
  /** False when the level is at or below the weakest wanted level minus the required rejection. */
  readonly blocking: boolean;
}
