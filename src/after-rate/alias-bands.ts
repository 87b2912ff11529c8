import { hz, type Hz } from '../units/quantities.js';
import type { Band } from '../math/band.js';
import { extentMagnitude } from '../math/fold-extent.js';

/**
 * One input range that lands on the channel after sampling: the image
 * j·r + [channel] (upright) or j·r − [channel] (mirrored), as magnitudes.
 */
export interface AliasBand {
  /** The image's rate multiple j ≥ 1. */
  readonly multiple: number;
  /** 'upright': j·r + channel; 'mirrored': j·r − channel (arrives inverted relative to the channel). */
  readonly sense: 'upright' | 'mirrored';
  /** Input frequencies, Hz, low ≤ high, within [0, the converter's input bandwidth]. */
  readonly low: Hz;
  readonly high: Hz;
}

/**
 * Every input range that aliases onto the channel at a rate, up to the
 * converter's analog input bandwidth: the images j·r ± [channel] for j ≥ 1
 * (a negative image counts as its magnitudes; j ≤ −1 repeats these), the
 * channel itself left out. Each image is swept over the rate's drift
 * r ∈ [rateLow, rateHigh], so a band covers every frequency that lands on the
 * channel at some rate in the drift: upright [j·rateLow + low, j·rateHigh + high],
 * mirrored [j·rateLow − high, j·rateHigh − low]. Exact: one expression per
 * edge, no grid.
 *
 * @param channel the range to protect, Hz (the wanted band widened by the required margin, or the band itself)
 * @param rateLow lowest rate of the drift, Hz (> 0)
 * @param rateHigh highest rate of the drift, Hz (≥ rateLow)
 * @param inputBandwidth the converter's analog input bandwidth, Hz: bands from it up are dropped, a band across it is cut there
 * @returns the alias bands ascending by their lower edge
 * @throws RangeError unless 0 < rateLow ≤ rateHigh (finite) and channel.low ≤ channel.high
 * @example aliasBands({ low: hz(21e6), high: hz(25e6) }, hz(40e6), hz(40e6), hz(100e6)).map((b) => [b.low, b.high]) // [[15e6, 19e6], [55e6, 59e6], [61e6, 65e6], [95e6, 99e6]]
 */
export function aliasBands(channel: Band, rateLow: Hz, rateHigh: Hz, inputBandwidth: Hz): AliasBand[] {
  if (!(rateLow > 0 && rateHigh >= rateLow && Number.isFinite(rateHigh)))
    throw new RangeError(`alias bands need 0 < rateLow ≤ rateHigh, found [${rateLow}, ${rateHigh}] Hz`);
  if (!(channel.high >= channel.low))
    throw new RangeError(`alias bands need channel.low ≤ channel.high, found [${channel.low}, ${channel.high}] Hz`);
  const bands: AliasBand[] = [];
  // Past this multiple even the mirrored image starts above the input bandwidth.
  const last = Math.ceil((inputBandwidth + channel.high) / rateLow);
  for (let j = 1; j <= last; j++) {
    const images: Array<[AliasBand['sense'], number, number]> = [
      ['upright', j * rateLow + channel.low, j * rateHigh + channel.high],
      ['mirrored', j * rateLow - channel.high, j * rateHigh - channel.low],
    ];
    for (const [sense, low, high] of images) {
      const magnitude = extentMagnitude(hz(low), hz(high));
      if (magnitude.low >= inputBandwidth) continue;
      bands.push({ multiple: j, sense, low: hz(magnitude.low), high: hz(Math.min(magnitude.high, inputBandwidth)) });
    }
  }
  return bands.sort((a, b) => a.low - b.low || a.high - b.high);
}

/**
 * The alias bands nearest the channel on each side: the one below with the
 * highest upper edge and the one above with the lowest lower edge. A band
 * that overlaps the channel counts on the side of its centre.
 *
 * @param bands alias bands (any order)
 * @param channel the passband, Hz
 * @returns the nearest band each side, or null where there is none
 * @example nearestAliasBands(aliasBands({ low: hz(21e6), high: hz(25e6) }, hz(40e6), hz(40e6), hz(100e6)), { low: hz(21e6), high: hz(25e6) }).above.low // 55e6
 */
export function nearestAliasBands(bands: readonly AliasBand[], channel: Band): { below: AliasBand | null; above: AliasBand | null } {
  const centre = (channel.low + channel.high) / 2;
  let below: AliasBand | null = null;
  let above: AliasBand | null = null;
  for (const band of bands) {
    if ((band.low + band.high) / 2 < centre) {
      if (below === null || band.high > below.high) below = band;
    } else if (above === null || band.low < above.low) above = band;
  }
  return { below, above };
}
