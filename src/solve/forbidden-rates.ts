import type { Hz } from '../units/quantities.js';
import type { Band } from '../math/band.js';
import { mergeOverlapping, type Interval } from '../math/interval-set.js';
import { closeRates, nearbyImages, normalisedExtent, type NormalisedExtent } from './fold-images.js';
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
 * @example forbiddenRates(handWorked.interferers[0], handWorked.band, hz(25e6), hz(42e6)) // [{ low: 30.5e6, high: 35.5e6 }]
 */
export function forbiddenRates(interferer: Interferer, band: Band, minRate: Hz, maxRate: Hz): Interval[] {
  return closeImageRates(normalisedExtent(interferer), interferer.requiredMargin, band, minRate, maxRate);
}

/**
 * The rates inside [minRate, maxRate] at which an extent comes closer than
 * `reach` to the band's alias: one open interval per image j·r ± band
 * (`closeRates`), merged where they overlap (two that only touch stay apart:
 * the rate between them is valid, the margin there exactly the reach). The algebra of `forbiddenRates`, for any extent:
 * another channel's band is one too (rate multiple 0, the inter-channel
 * spacing as its reach).
 *
 * @param extent the extent, rate multiple ≥ 0 (see normalisedExtent)
 * @param reach the least distance kept, Hz, ≥ 0
 * @param band the band whose images are taken, Hz
 * @param minRate, maxRate the range searched, Hz, 0 < minRate ≤ maxRate < ∞
 * @returns disjoint open intervals, ascending, that meet the range
 * @example closeImageRates({ rateMultiple: 0, low: 3, high: 5 }, hz(0), { low: hz(10), high: hz(14) }, hz(14), hz(20)) // [{ low: 13, high: 19 }] (r − [10, 14] meets 3–5 for 13 < r < 19)
 */
export function closeImageRates(extent: NormalisedExtent, reach: Hz, band: Band, minRate: Hz, maxRate: Hz): Interval[] {
  const found: Interval[] = [];
  for (const term of nearbyImages(extent, band, reach, minRate, maxRate)) {
    const close = closeRates(extent, band, term, reach);
    if (close && close.high > minRate && close.low < maxRate) found.push(close);
  }
  return mergeOverlapping(found);
}
