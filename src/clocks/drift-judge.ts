import type { FeasibleInterval } from '../solve/feasible-set.js';

/**
 * The fast judge used by sweeps: the index of the feasible interval that
 * holds a rate's whole drift range [r(1 − ε), r(1 + ε)], found by binary
 * search, or −1 when no single interval holds it. The drift ends are computed
 * as driftRange computes them, so the verdict matches the exact evaluator's
 * except where a drift end lies within rounding of an interval edge, and at
 * the converter's range, which the feasible set ends at and evaluateRate
 * ignores (a rate on the fastest rate fails here once it may drift above it).
 * Sweeps use this; the winners are judged again by evaluateRate.
 *
 * @param feasible the exact feasible set: sorted, disjoint, closed intervals, Hz
 * @param rate nominal rate, Hz
 * @param tolerancePpm ± drift, ppm
 * @returns the interval's index, or −1
 * @example containingInterval([{ minRate: 100e6, maxRate: 110e6, ... }], 105e6, 20) // 0
 */
export function containingInterval(feasible: readonly FeasibleInterval[], rate: number, tolerancePpm: number): number {
  const low = rate * (1 - tolerancePpm * 1e-6);
  const high = rate * (1 + tolerancePpm * 1e-6);
  // The last interval starting at or below the drift range's low end is the only one that can hold it.
  let first = 0;
  let last = feasible.length - 1;
  let found = -1;
  while (first <= last) {
    const middle = (first + last) >> 1;
    if (feasible[middle]!.minRate <= low) {
      found = middle;
      first = middle + 1;
    } else {
      last = middle - 1;
    }
  }
  return found >= 0 && high <= feasible[found]!.maxRate ? found : -1;
}
