import type { Hz } from '../units/quantities.js';
import type { Band } from '../math/band.js';
import { mergeIntervals, type Interval } from '../math/interval-set.js';
import { closeRates, nearbyImages, normalisedExtent } from './fold-images.js';
import type { Interferer } from '../interferers/interferer.js';

/**
 * The exact open set of rates inside [minRate, maxRate] at which the
 * interferer's alias comes closer than its required margin to the wanted
 * band's alias: for each image j·r ± band, the extent a·r + [l, h] meets the
 * image widened by the margin when (j − a)·r lies between two constants, so
 * each image forbids one open interval of rates, derived in one division.
 *
 * @param interferer the extent and its required margin, Hz
 * @param band the wanted band, Hz
 * @param minRate, maxRate the range searched, Hz, 0 < minRate ≤ maxRate < ∞
 * @returns disjoint open intervals, ascending, that meet the range (their
 *   ends may lie outside it, so that subtracting them from a closed window
 *   also removes an edge they cover)
 */
export function forbiddenRates(interferer: Interferer, band: Band, minRate: Hz, maxRate: Hz): Interval[] {
  const extent = normalisedExtent(interferer);
  const reach = interferer.requiredMargin;
  const found: Interval[] = [];
  for (const term of nearbyImages(extent, band, reach, minRate, maxRate)) {
    const close = closeRates(extent, band, term, reach);
    if (close && close.high > minRate && close.low < maxRate) found.push(close);
  }
  return mergeIntervals(found);
}
