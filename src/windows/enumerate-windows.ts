import { hz, type Hz } from '../units/quantities.js';
import type { Band } from '../math/band.js';
import { sameEdge } from '../math/edge-tolerance.js';
import { MOST_WINDOWS, zoneSpan } from '../math/zone-span.js';
import type { RateLimits, RateWindow } from './rate-window.js';

const NO_LIMITS: RateLimits = { minRate: hz(0), maxRate: hz(Infinity) };

/**
 * Every uniform sampling-rate window that holds a band whole in one Nyquist
 * zone (Vaughan, Scott & White, "The theory of bandpass sampling", 1991):
 * for each zone n = 1..⌊high/width⌋, 2·high/n ≤ rate ≤ 2·low/(n − 1), the
 * upper bound absent for n = 1. Only the zones that can meet the limits are
 * visited (zoneSpan), so the work follows the answer, not high/width. Each edge is computed from the inputs in one
 * expression; a window whose edges cross by floating-point noise only (the
 * exact twice-the-width point) is kept with zero width.
 *
 * @param band the band to hold, Hz, already widened by any guard bands;
 *   0 ≤ low < high
 * @param limits rates outside [minRate, maxRate] are cut away
 * @returns windows in ascending zone order (descending rate), clipped to the
 *   limits; empty when none fits
 * @throws RangeError for a band without width (the zone count would be unbounded),
 *   or when the limits hold more than MOST_WINDOWS windows (callers refuse
 *   such a question up front with windowCount, naming what to narrow)
 * @example rateWindows({ low: hz(10e3), high: hz(14e3) }) // [{ zone: 1, minRate: 28e3, maxRate: Infinity }, { zone: 2, minRate: 14e3, maxRate: 20e3 }, { zone: 3, minRate: 9333.333, maxRate: 10e3 }]
 */
export function rateWindows(band: Band, limits: RateLimits = NO_LIMITS): RateWindow[] {
  const width = band.high - band.low;
  if (!(width > 0) || band.low < 0) throw new RangeError(`a band needs 0 ≤ low < high, got ${band.low}–${band.high} Hz`);
  const { first, last } = zoneSpan(band, limits.minRate, limits.maxRate);
  if (last - first + 1 > MOST_WINDOWS) {
    throw new RangeError(
      `the rate range holds ${last - first + 1} windows for this band, more than ${MOST_WINDOWS}; check windowCount first`,
    );
  }
  const windows: RateWindow[] = [];
  for (let zone = first; zone <= last; zone++) {
    const lowest = (2 * band.high) / zone;
    const highest = zone === 1 ? Infinity : (2 * band.low) / (zone - 1);
    const window = clipped(zone, lowest, highest, limits);
    if (window) windows.push(window);
  }
  return windows;
}

function clipped(zone: number, lowest: number, highest: number, limits: RateLimits): RateWindow | null {
  const minRate = Math.max(lowest, limits.minRate);
  let maxRate = Math.min(highest, limits.maxRate);
  // Edges within noise of each other are one rate, whichever way the noise fell.
  if (maxRate !== Infinity && sameEdge(maxRate, minRate)) maxRate = minRate;
  else if (maxRate < minRate) return null;
  if (maxRate === Infinity && minRate === Infinity) return null;
  return { zone, minRate: hz(minRate), maxRate: hz(maxRate), inverted: zone % 2 === 0 };
}

/** Re-exported from math/band.ts, where the scenario checks reach it too. */
export { guardedBand } from '../math/band.js';

/** The lowest legal rate among the windows, Hz, or null when there is none. */
export function lowestLegalRate(windows: readonly RateWindow[]): Hz | null {
  if (windows.length === 0) return null;
  // A loop, not a spread: a spread of thousands of arguments overflows the call stack.
  return hz(windows.reduce((lowest, w) => Math.min(lowest, w.minRate), Infinity));
}
