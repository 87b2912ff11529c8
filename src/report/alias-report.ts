import type { Hz } from '../units/quantities.js';
import { foldFrequency, lookalikes, type Fold } from '../math/fold.js';
import { PAPER_DESIGN_CAUTION } from '../plan/caution.js';

/** One frequency after sampling. */
export interface ToneFold extends Fold {
  readonly frequency: Hz;
  /** Frequencies sampling cannot tell from this one (k·rate ± alias), Hz. */
  readonly lookalikes: readonly Hz[];
}

/** The answer to "where do these frequencies show at this rate?". */
export interface AliasReport {
  readonly rate: Hz;
  readonly tones: readonly ToneFold[];
  readonly caution: string;
}

/**
 * Folds each frequency at the rate.
 *
 * @param rate sampling rate, Hz, positive
 * @param frequencies Hz, not negative
 * @param multiples largest k of the lookalikes k·rate ± alias
 */
export function aliasReport(rate: Hz, frequencies: readonly Hz[], multiples: number): AliasReport {
  const tones = frequencies.map((frequency) => ({
    frequency,
    ...foldFrequency(frequency, rate),
    lookalikes: lookalikes(frequency, rate, multiples),
  }));
  return { rate, tones, caution: PAPER_DESIGN_CAUTION };
}
