import type { Hz } from '../units/quantities.js';
import { hz } from '../units/quantities.js';
import type { Band } from '../math/band.js';
import { subtractOpen, type Interval } from '../math/interval-set.js';
import type { RateWindow } from '../windows/rate-window.js';
import { forbiddenRates } from './forbidden-rates.js';
import type { Interferer } from '../interferers/interferer.js';

/** A closed interval of rates where the band fits and nothing blocking lands near it. */
export interface FeasibleInterval {
  readonly zone: number;
  readonly inverted: boolean;
  readonly minRate: Hz;
  readonly maxRate: Hz;
}

/** Rates inside a window at which one interferer lands too close (an open interval). */
export interface BlockedRange {
  /** Label of the interferer that blocks. */
  readonly label: string;
  readonly zone: number;
  readonly minRate: Hz;
  readonly maxRate: Hz;
}

export interface FeasibleSet {
  readonly feasible: readonly FeasibleInterval[];
  /** Every blocked range, clipped to its window, ascending by rate. */
  readonly blocked: readonly BlockedRange[];
}

/**
 * The exact feasible set: the legal windows minus every blocking
 * interferer's forbidden rates.
 *
 * @param windows legal windows with finite edges, Hz
 * @param interferers all interferers; only blocking ones remove rates
 * @param band the wanted band (unguarded), Hz
 * @returns feasible intervals ascending by rate, and the blocked ranges
 */
export function feasibleSet(windows: readonly RateWindow[], interferers: readonly Interferer[], band: Band): FeasibleSet {
  const feasible: FeasibleInterval[] = [];
  const blocked: BlockedRange[] = [];
  const blocking = interferers.filter((i) => i.blocking);
  for (const window of windows) {
    const holes: Interval[] = [];
    for (const interferer of blocking) {
      for (const hole of forbiddenRates(interferer, band, window.minRate, window.maxRate)) {
        holes.push(hole);
        blocked.push({
          label: interferer.label,
          zone: window.zone,
          minRate: hz(Math.max(hole.low, window.minRate)),
          maxRate: hz(Math.min(hole.high, window.maxRate)),
        });
      }
    }
    for (const piece of subtractOpen({ low: window.minRate, high: window.maxRate }, holes)) {
      feasible.push({ zone: window.zone, inverted: window.inverted, minRate: hz(piece.low), maxRate: hz(piece.high) });
    }
  }
  const byRate = <T extends { minRate: number }>(a: T, b: T) => a.minRate - b.minRate;
  return { feasible: feasible.sort(byRate), blocked: blocked.sort(byRate) };
}
