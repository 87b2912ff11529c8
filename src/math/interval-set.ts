import { sameEdge } from './edge-tolerance.js';

/** An interval [low, high] of numbers (rates or frequencies, Hz). */
export interface Interval {
  readonly low: number;
  readonly high: number;
}

/**
 * Sorts intervals and merges those that overlap or touch.
 *
 * @param intervals any order, low ≤ high
 * @returns disjoint intervals in ascending order
 * @example mergeIntervals([{low: 3, high: 5}, {low: 1, high: 3}]) // [{low: 1, high: 5}]
 */
export function mergeIntervals(intervals: readonly Interval[]): Interval[] {
  const sorted = [...intervals].sort((a, b) => a.low - b.low);
  const merged: Interval[] = [];
  for (const next of sorted) {
    const last = merged[merged.length - 1];
    if (last && next.low <= last.high) merged[merged.length - 1] = { low: last.low, high: Math.max(last.high, next.high) };
    else merged.push(next);
  }
  return merged;
}

/** Whether a closed range meets one of the open intervals. */
export function meetsOpen(range: Interval, open: readonly Interval[]): boolean {
  return open.some((o) => range.high > o.low && range.low < o.high);
}

/**
 * A closed interval minus a union of open intervals, keeping every rate that
 * is left, single points included: two open intervals that meet exactly,
 * (a, p) and (p, b), leave the point p, and an open interval that ends
 * exactly at a closed edge leaves that edge. Edges within the edge tolerance
 * of each other count as one edge, whichever way the rounding fell, so a
 * point that exact arithmetic keeps is neither lost (holes overlapping by
 * noise) nor widened into a sliver (holes apart by noise). The one rule of
 * every feasible set (one band, several channels, several bands): a single
 * valid rate is an answer (at 0 ppm the exact minimum can be one; with a
 * tolerance the drift analysis judges it).
 *
 * @param closed the interval kept from, low ≤ high
 * @param open removed open intervals (low, high), any order
 * @returns disjoint closed pieces in ascending order, a point as {low: p, high: p}
 * @example subtractOpenKeepingPoints({low: 0, high: 10}, [{low: 2, high: 4}, {low: 4, high: 6}]) // [{low: 0, high: 2}, {low: 4, high: 4}, {low: 6, high: 10}]
 */
export function subtractOpenKeepingPoints(closed: Interval, open: readonly Interval[]): Interval[] {
  const pieces: Interval[] = [];
  let start = closed.low;
  for (const hole of mergeOverlapping(open)) {
    if (hole.high <= start || sameEdge(hole.high, start)) continue;
    if (hole.low >= closed.high || sameEdge(hole.low, closed.high)) break;
    const coversStart = hole.low < start && !sameEdge(hole.low, start);
    if (!coversStart) pieces.push({ low: start, high: sameEdge(hole.low, start) ? start : hole.low });
    start = hole.high;
  }
  if (start === Infinity) return pieces; // a hole running to infinity leaves no rate above it
  if (start <= closed.high) pieces.push({ low: start, high: closed.high });
  else if (sameEdge(start, closed.high)) pieces.push({ low: closed.high, high: closed.high });
  return pieces;
}

/**
 * Sorts open intervals and merges those that overlap by more than the edge
 * tolerance; touching ones, (a, p) and (p, b), stay apart, since the point p
 * between them belongs to neither (mergeIntervals, for closed pieces, would
 * join them and lose it).
 *
 * @param intervals open intervals (low, high), any order
 * @returns disjoint open intervals in ascending order
 * @example mergeOverlapping([{low: 4, high: 6}, {low: 2, high: 4}, {low: 5, high: 7}]) // [{low: 2, high: 4}, {low: 4, high: 7}]
 */
export function mergeOverlapping(intervals: readonly Interval[]): Interval[] {
  const sorted = [...intervals].sort((a, b) => a.low - b.low);
  const merged: Interval[] = [];
  for (const next of sorted) {
    const last = merged[merged.length - 1];
    if (last && next.low < last.high && !sameEdge(next.low, last.high)) {
      merged[merged.length - 1] = { low: last.low, high: Math.max(last.high, next.high) };
    } else merged.push(next);
  }
  return merged;
}
