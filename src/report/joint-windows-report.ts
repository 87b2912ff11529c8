import { hz, ppmOf, type Hz, type Ppm } from '../units/quantities.js';
import { bandImage, type Band, type BandImage, type Guard } from '../math/band.js';
import { guardedBand } from '../windows/enumerate-windows.js';
import type { RateLimits } from '../windows/rate-window.js';
import { jointFeasibleSet, type JointInterval } from '../solve/joint-feasible-set.js';
import { PAPER_DESIGN_CAUTION } from '../plan/caution.js';

/** One band of the set, with its guards. */
export interface JointBand {
  readonly band: Band;
  readonly guard: Guard;
  readonly guardedBand: Band;
}

/** One interval of rates valid for every band, with what an engineer reads off it. */
export interface JointRow extends JointInterval {
  /** maxRate − minRate, Hz (0 for a single rate); Infinity when unbounded. */
  readonly width: Hz;
  /** Middle of the interval, Hz; null when unbounded. */
  readonly center: Hz | null;
  /** Clock tolerance a rate at the centre may drift and stay valid, ±ppm; null when unbounded. */
  readonly tolerancePpm: Ppm | null;
  /** Where each (unguarded) band lands when sampled at the centre; null when unbounded. */
  readonly images: readonly (BandImage | null)[] | null;
}

/** The answer to "which sampling rates hold all these bands together?". */
export interface JointWindowsReport {
  readonly bands: readonly JointBand[];
  /** Least distance kept between two guarded bands' aliases, Hz. */
  readonly spacing: Hz;
  readonly limits: RateLimits;
  /** The valid intervals, ascending; a single rate has minRate = maxRate. */
  readonly intervals: readonly JointRow[];
  /** The lowest valid rate inside the limits, Hz; null when there is none. */
  readonly minimumRate: Hz | null;
  /** Whether the lowest valid rate is a single rate (a hair above or below it fails). */
  readonly minimumIsSingleRate: boolean;
  readonly caution: string;
}

/**
 * Lists the rates at which several bands, each widened by its guards, sit
 * whole in Nyquist zones with their aliases at least `spacing` apart, and
 * for each interval every band's zone, inversion and image at its centre.
 *
 * @param bands the bands with their guards, Hz; at least two
 * @param spacing least distance between two guarded bands' aliases, Hz, ≥ 0
 * @param limits the rate range searched, Hz
 * @returns the report
 * @example jointWindowsReport([{ band: { low: hz(10e3), high: hz(14e3) }, guard: guardBands(hz(0), hz(0)) }, { band: { low: hz(15e3), high: hz(16e3) }, guard: guardBands(hz(0), hz(0)) }], hz(0), { minRate: hz(0), maxRate: hz(Infinity) }).minimumRate // 10000 (a single rate)
 */
export function jointWindowsReport(bands: readonly { band: Band; guard: Guard }[], spacing: Hz, limits: RateLimits): JointWindowsReport {
  const held = bands.map(({ band, guard }) => ({ band, guard, guardedBand: guardedBand(band, guard) }));
  const set = jointFeasibleSet(
    held.map((b) => b.guardedBand),
    spacing,
    limits,
  );
  const intervals = set.feasible.map((interval) => describeInterval(interval, held));
  const lowest = intervals[0];
  return {
    bands: held,
    spacing,
    limits,
    intervals,
    minimumRate: set.lowestRate,
    minimumIsSingleRate: lowest !== undefined && lowest.minRate === lowest.maxRate,
    caution: PAPER_DESIGN_CAUTION,
  };
}

function describeInterval(interval: JointInterval, bands: readonly JointBand[]): JointRow {
  const width = hz(interval.maxRate - interval.minRate);
  if (interval.maxRate === Infinity) return { ...interval, width, center: null, tolerancePpm: null, images: null };
  const center = hz((interval.minRate + interval.maxRate) / 2);
  return {
    ...interval,
    width,
    center,
    tolerancePpm: ppmOf(width / 2 / center),
    images: bands.map(({ band }) => bandImage(band, center)),
  };
}
