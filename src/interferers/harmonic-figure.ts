import type { Db } from '../units/quantities.js';
import type { Converter } from '../scenario/scenario.js';
import { dbText, ordinal } from './words.js';

/** The converter's k-th harmonic figure, and whether it was stated or assumed. */
export interface HarmonicFigure {
  /** dBc at the strongest wanted level. */
  readonly dbc: Db;
  readonly stated: boolean;
  /** Words for a source text, e.g. '−75.0 dBc' or 'no 4th-order figure stated; the lowest stated, −75.0 dBc, assumed'. */
  readonly note: string;
}

/**
 * The converter's harmonic figure for order k. An order without a stated
 * figure takes the lowest stated figure (the most negative dBc), on the
 * usual pattern that the low orders are the strongest (common practice, no
 * source); the note says so. With no figures at all there is nothing to go on.
 *
 * @param converter the scenario's converter
 * @param order harmonic order k ≥ 2
 * @returns the figure, or null when the converter states no harmonic figure
 * @example harmonicFigure(s.converter, 4) // { stated: false }
 */
export function harmonicFigure(converter: Converter, order: number): HarmonicFigure | null {
  const stated = converter.harmonics.get(order);
  if (stated !== undefined) return { dbc: stated, stated: true, note: dbText(stated, 'dBc') };
  if (converter.harmonics.size === 0) return null;
  const lowest = Math.min(...converter.harmonics.values()) as Db;
  return {
    dbc: lowest,
    stated: false,
    note: `no ${ordinal(order)}-order figure stated; the lowest stated, ${dbText(lowest, 'dBc')}, assumed`,
  };
}
