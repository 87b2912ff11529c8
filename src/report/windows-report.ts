import { hz, ppmOf, type Hz, type Ppm } from '../units/quantities.js';
import { bandImage, type Band, type BandImage, type Guard } from '../math/band.js';
import { guardedBand, lowestLegalRate, rateWindows } from '../windows/enumerate-windows.js';
import type { RateLimits, RateWindow } from '../windows/rate-window.js';
import { PAPER_DESIGN_CAUTION } from '../plan/caution.js';

/** One legal window with what an engineer reads off it. */
export interface WindowRow extends RateWindow {
  /** maxRate − minRate, Hz; Infinity when unbounded. */
  readonly width: Hz;
  /** Middle of the window, Hz; null when unbounded. */
  readonly center: Hz | null;
  /** Clock tolerance a rate at the centre may drift and stay legal, ±ppm; null when unbounded. */
  readonly tolerancePpm: Ppm | null;
  /** Where the wanted (unguarded) band lands when sampled at the centre; null when unbounded. */
  readonly image: BandImage | null;
}

/** The answer to "which sampling rates hold this band?". */
export interface WindowsReport {
  readonly band: Band;
  readonly guard: Guard;
  readonly guardedBand: Band;
  readonly limits: RateLimits;
  readonly windows: readonly WindowRow[];
  /** The lowest legal rate inside the limits, Hz; null when there is no window. */
  readonly minimumRate: Hz | null;
  readonly caution: string;
}

/**
 * Lists the legal rate windows of a band with its guards, and for each the
 * drift it tolerates at its centre and where the band lands there.
 *
 * @param band the wanted band, Hz
 * @param guard guard bands, Hz
 * @param limits the rate range searched, Hz
 */
export function windowsReport(band: Band, guard: Guard, limits: RateLimits): WindowsReport {
  const guarded = guardedBand(band, guard);
  const windows = rateWindows(guarded, limits).map((w) => describeWindow(w, band));
  return {
    band,
    guard,
    guardedBand: guarded,
    limits,
    windows,
    minimumRate: lowestLegalRate(windows),
    caution: PAPER_DESIGN_CAUTION,
  };
}

function describeWindow(window: RateWindow, band: Band): WindowRow {
  const width = hz(window.maxRate - window.minRate);
  if (window.maxRate === Infinity) return { ...window, width, center: null, tolerancePpm: null, image: null };
  const center = hz((window.minRate + window.maxRate) / 2);
  const tolerancePpm = ppmOf(width / 2 / center);
  return { ...window, width, center, tolerancePpm, image: bandImage(band, center) };
}
