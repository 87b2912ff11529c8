import { hz, type Hz } from '../units/quantities.js';
import type { Band } from '../math/band.js';
import type { Interval } from '../math/interval-set.js';
import type { Interferer } from '../interferers/interferer.js';

/**
 * One image of the wanted band among the input frequencies that alias onto
 * it: j·r + s·[low, high] for an integer j and a side s = ±1. Every input
 * frequency whose alias falls on the wanted alias lies in one such image, and
 * the distance between two aliases is the distance from an input frequency to
 * the nearest image (folding is an isometry on each half-zone), so every
 * margin and every forbidden rate is linear algebra over these images.
 *
 * Against an interferer extent a·r + [l, h] the image moves relative to it at
 * slope c = j − a: all conditions take the form c·r compared with a constant.
 */
export interface BandImageTerm {
  readonly j: number;
  readonly side: 1 | -1;
  /** c = j − rateMultiple of the interferer. */
  readonly slope: number;
}

/** The extent with a non-negative rate multiple: folding is symmetric under negation. */
export interface NormalisedExtent {
  readonly rateMultiple: number;
  readonly low: number;
  readonly high: number;
}

/**
 * Flips a·r + [l, h] with a < 0 to −(…) so that a ≥ 0; aliases are unchanged.
 *
 * @example normalisedExtent(handWorked.interferers[0]) // { rateMultiple: 0, low: 10e6, high: 10e6 }
 */
export function normalisedExtent(interferer: Pick<Interferer, 'rateMultiple' | 'low' | 'high'>): NormalisedExtent {
  return { rateMultiple: normalisedMultiple(interferer), low: normalisedLow(interferer), high: normalisedHigh(interferer) };
}

type Extent = Pick<Interferer, 'rateMultiple' | 'low' | 'high'>;

/**
 * normalisedExtent's rate multiple on plain numbers (no allocation, for inner loops).
 *
 * @example normalisedMultiple({ rateMultiple: -0.25, low: 1e6, high: 2e6 }) // 0.25
 */
export function normalisedMultiple(extent: Extent): number {
  return extent.rateMultiple < 0 ? -extent.rateMultiple : extent.rateMultiple;
}

/**
 * normalisedExtent's lower edge on plain numbers.
 *
 * @example normalisedLow({ rateMultiple: -0.25, low: 1e6, high: 2e6 }) // -2e6
 */
export function normalisedLow(extent: Extent): number {
  return extent.rateMultiple < 0 ? -extent.high : extent.low;
}

/**
 * normalisedExtent's upper edge on plain numbers.
 *
 * @example normalisedHigh({ rateMultiple: -0.25, low: 1e6, high: 2e6 }) // -1e6
 */
export function normalisedHigh(extent: Extent): number {
  return extent.rateMultiple < 0 ? -extent.low : extent.high;
}

/**
 * Image edges as c·r thresholds: the image [j·r + s·band] lies at
 * [c·r + near, c·r + far] relative to the moving extent origin a·r.
 * Returns the offsets of the image's lower and upper edges (s = +1:
 * [low, high]; s = −1: [−high, −low]).
 * @example imageOffsets(handWorked.band, -1) // { low: -25e6, high: -21e6 }
 */
export function imageOffsets(band: Band, side: 1 | -1): Interval {
  return { low: imageOffsetLow(band, side), high: imageOffsetHigh(band, side) };
}

/**
 * imageOffsets' lower offset on plain numbers (no allocation, for inner loops).
 *
 * @example imageOffsetLow({ low: 21e6, high: 25e6 }, -1) // -25e6
 */
export function imageOffsetLow(band: Band, side: number): number {
  return side === 1 ? band.low : -band.high;
}

/**
 * imageOffsets' upper offset on plain numbers.
 *
 * @example imageOffsetHigh({ low: 21e6, high: 25e6 }, -1) // -21e6
 */
export function imageOffsetHigh(band: Band, side: number): number {
  return side === 1 ? band.high : -band.low;
}

/**
 * The images that can come within `reach` of the extent for some rate in
 * [minRate, maxRate]: c·r must fall within (l − imageHigh − reach,
 * h − imageLow + reach), which bounds c, hence j, from the range ends.
 *
 * @param extent the interferer, rate multiple ≥ 0
 * @param band the wanted band, Hz
 * @param reach margin, Hz, ≥ 0
 * @param minRate, maxRate the rate range, Hz, 0 < minRate ≤ maxRate < ∞
 * @example nearbyImages(normalisedExtent(handWorked.interferers[0]), handWorked.band, hz(0.5e6), hz(25e6), hz(42e6)).length // 5
 */
export function nearbyImages(extent: NormalisedExtent, band: Band, reach: Hz, minRate: Hz, maxRate: Hz): BandImageTerm[] {
  const terms: BandImageTerm[] = [];
  for (const side of [1, -1] as const) {
    const image = imageOffsets(band, side);
    const jLast = lastNearbyImage(extent.rateMultiple, extent.high - image.low + reach, minRate, maxRate);
    for (let j = firstNearbyImage(extent.rateMultiple, extent.low - image.high - reach, minRate, maxRate); j <= jLast; j++) {
      terms.push({ j, side, slope: j - extent.rateMultiple });
    }
  }
  return terms;
}

/**
 * nearbyImages' first j on plain numbers (no allocation, for inner loops):
 * c·r ≥ lowest over the range gives j ≥ a + min(lowest/minRate, lowest/maxRate),
 * one image of slack against rounding.
 *
 * @param rateMultiple a ≥ 0
 * @param lowest l − imageHigh − reach, Hz
 * @param minRate, maxRate the rate range, Hz
 * @returns the first image index j
 * @example firstNearbyImage(0, -15e6, 10e6, 60e6) // -2
 */
export function firstNearbyImage(rateMultiple: number, lowest: number, minRate: number, maxRate: number): number {
  return Math.ceil(rateMultiple + Math.min(lowest / minRate, lowest / maxRate)) - 1;
}

/**
 * nearbyImages' last j on plain numbers: c·r ≤ highest over the range.
 *
 * @param rateMultiple a ≥ 0
 * @param highest h − imageLow + reach, Hz
 * @param minRate, maxRate the rate range, Hz
 * @returns the last image index j
 * @example lastNearbyImage(0, 35e6, 10e6, 60e6) // 4
 */
export function lastNearbyImage(rateMultiple: number, highest: number, minRate: number, maxRate: number): number {
  return Math.floor(rateMultiple + Math.max(highest / minRate, highest / maxRate)) + 1;
}

/**
 * The open set of rates at which the extent comes closer than `reach` to this
 * image: c·r ∈ (l − imageHigh − reach, h − imageLow + reach). Empty, one
 * interval, or all rates (slope 0 with the extent inside the reach).
 * @example closeRates(normalisedExtent(handWorked.interferers[0]), handWorked.band, { j: -1, side: 1, slope: -1 }, hz(0.5e6)) // { low: 10.5e6, high: 15.5e6 }
 */
export function closeRates(extent: NormalisedExtent, band: Band, term: BandImageTerm, reach: Hz): Interval | null {
  const image = imageOffsets(band, term.side);
  const lowest = extent.low - image.high - reach;
  const highest = extent.high - image.low + reach;
  const c = term.slope;
  if (c === 0) return lowest < 0 && 0 < highest ? { low: -Infinity, high: Infinity } : null;
  return c > 0 ? { low: lowest / c, high: highest / c } : { low: highest / c, high: lowest / c };
}

/**
 * Signed distance, Hz, between the extent and one image at rate r: the gap
 * when apart; when they overlap, minus the distance the extent would have to
 * move to clear the image (the smaller of the two clearing shifts: a tone
 * inside is its distance to the nearer edge). Both cases are one expression,
 * max(imageLow − high, low − imageHigh) = |centre offset| − (sum of the half
 * widths), so a deeper intrusion is always a more negative margin.
 *
 * @example imageMargin({ rateMultiple: 0, low: 72e6, high: 72e6 }, { low: 70e6, high: 80e6 }, { j: 0, side: 1, slope: 0 }, 100e6) // -2e6 (2 MHz inside)
 */
export function imageMargin(extent: NormalisedExtent, band: Band, term: BandImageTerm, rate: Hz): Hz {
  const image = imageOffsets(band, term.side);
  return hz(marginAt(extent.low, extent.high, image.low, image.high, term.slope * rate));
}

/**
 * imageMargin on plain numbers (no allocation, for inner loops): the extent
 * [low, high] against the image [shift + imageLow, shift + imageHigh].
 *
 * @param low, high the extent's edges relative to a·r, Hz
 * @param imageLow, imageHigh the image's offsets (imageOffsets), Hz
 * @param shift c·r, Hz
 * @returns the signed margin, Hz
 * @example marginAt(72e6, 72e6, 70e6, 80e6, 0) // -2e6 (2 MHz inside)
 */
export function marginAt(low: number, high: number, imageLow: number, imageHigh: number, shift: number): number {
  return Math.max(shift + imageLow - high, low - (shift + imageHigh));
}

/**
 * The rate at which `imageMargin` changes slope: where the centres of the
 * extent and the image meet (the margin is |c·r − k| − const, V-shaped).
 * Between breakpoints the margin is linear in the rate.
 * @example marginBreakpoints(normalisedExtent(handWorked.interferers[0]), handWorked.band, { j: -1, side: 1, slope: -1 }) // [13e6] (where −r + 23 MHz meets the tone at 10 MHz)
 */
export function marginBreakpoints(extent: NormalisedExtent, band: Band, term: BandImageTerm): Hz[] {
  if (term.slope === 0) return [];
  const image = imageOffsets(band, term.side);
  return [hz(breakpointAt(extent.low, extent.high, image.low, image.high, term.slope))];
}

/**
 * marginBreakpoints on plain numbers, for a slope c ≠ 0.
 *
 * @param low, high the extent's edges relative to a·r, Hz
 * @param imageLow, imageHigh the image's offsets, Hz
 * @param slope c = j − a, not 0
 * @returns the rate where the centres meet, Hz
 * @example breakpointAt(10e6, 10e6, 21e6, 25e6, 1) // -13e6 (no positive rate: the margin is linear for every r > 0)
 */
export function breakpointAt(low: number, high: number, imageLow: number, imageHigh: number, slope: number): number {
  return (low + high - imageLow - imageHigh) / (2 * slope);
}
