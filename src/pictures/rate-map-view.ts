import type { PlanReport } from '../plan/plan-report.js';
import type { RateWindow } from '../windows/rate-window.js';

/** Most window lanes drawn; beyond this the map zooms onto a run of zones. */
export const MOST_LANES = 12;
/** A rate span at least this ratio (high/low) is drawn on a log axis. */
export const LOG_RATIO = 4;

/** What the rate map shows: which windows get a lane, and the axis. */
export interface RateMapView {
  /** Windows drawn, ascending zone (so descending rate), consecutive zones. */
  readonly windows: readonly RateWindow[];
  /** Windows inside the search range but not drawn. */
  readonly hidden: number;
  /** Axis range, Hz. */
  readonly low: number;
  readonly high: number;
  readonly log: boolean;
}

/**
 * Chooses the rate map's view. Narrow windows of high zones crowd the low
 * end of a long rate range, so the map (1) keeps at most MOST_LANES lanes:
 * the run of consecutive zones that holds the best candidate and, among such
 * runs, the best-ranked candidates (each weighing 1/rank); (2) zooms the axis onto the drawn windows (and
 * the candidates that land in none of them), padded by 3 % and kept inside
 * the search range; (3) turns the axis logarithmic when that span's
 * high/low ratio is LOG_RATIO or more, so that a window keeps a width
 * proportional to its relative width rather than shrinking as 1/zone².
 *
 * @param report the solved plan
 * @returns the windows drawn and the axis
 */
export function rateMapView(report: PlanReport): RateMapView {
  const all = [...report.windows].sort((a, b) => a.zone - b.zone);
  const windows = laneRun(all, report);
  const inSearch = (r: number) => r >= report.search.minRate && r <= report.search.maxRate;
  const rates = [
    ...windows.flatMap((w) => [w.minRate, Math.min(w.maxRate, report.search.maxRate)]),
    ...report.candidates
      .filter(
        (c) =>
          (c.zone === null || !report.windows.some((w) => w.zone === c.zone)) &&
          inSearch(c.rate) &&
          (all.length <= MOST_LANES || nearRun(c.rate, windows)),
      )
      .map((c) => c.rate),
  ];
  if (rates.length === 0) rates.push(report.search.minRate, report.search.maxRate);
  let low = Math.min(...rates);
  let high = Math.max(...rates);
  if (high === low) [low, high] = [low * 0.95, high * 1.05];
  const log = low > 0 && high / low >= LOG_RATIO;
  const [paddedLow, paddedHigh] = log
    ? [low / (high / low) ** 0.03, high * (high / low) ** 0.03]
    : [low - 0.03 * (high - low), high + 0.03 * (high - low)];
  return {
    windows,
    hidden: all.length - windows.length,
    low: Math.max(paddedLow, report.search.minRate, 0),
    high: Math.min(paddedHigh, report.search.maxRate),
    log,
  };
}

function laneRun(all: readonly RateWindow[], report: PlanReport): RateWindow[] {
  if (all.length <= MOST_LANES) return [...all];
  const focus = (report.candidates.find((c) => c.label === report.best) ?? report.candidates.find((c) => c.zone !== null))?.zone ?? null;
  let bestStart = 0;
  let bestCount = -1;
  for (let start = 0; start + MOST_LANES <= all.length; start++) {
    const zones = new Set(all.slice(start, start + MOST_LANES).map((w) => w.zone));
    if (focus !== null && !zones.has(focus)) continue;
    // Each candidate weighs 1/rank: the run holding the best-ranked candidates wins.
    const count = report.candidates.reduce((sum, c, i) => sum + (c.zone !== null && zones.has(c.zone) ? 1 / (i + 1) : 0), 0);
    if (count > bestCount) [bestStart, bestCount] = [start, count];
  }
  return all.slice(bestStart, bestStart + MOST_LANES);
}

function nearRun(rate: number, windows: readonly RateWindow[]): boolean {
  const low = Math.min(...windows.map((w) => w.minRate));
  const high = Math.max(...windows.map((w) => w.maxRate));
  return rate >= low && rate <= high;
}
