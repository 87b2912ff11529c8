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

/**
 * A closed interval minus a union of open intervals: the closed pieces left.
 * A piece narrower than the edge tolerance is floating-point residue between
 * two open intervals that meet exactly in theory, and is dropped, unless the
 * closed interval itself is a single point.
 *
 * @param closed the interval kept from, low ≤ high
 * @param open removed open intervals (low, high), any order
 * @returns disjoint closed pieces in ascending order
 * @example subtractOpen({low: 0, high: 10}, [{low: 2, high: 4}]) // [{low: 0, high: 2}, {low: 4, high: 10}]
 */
export function subtractOpen(closed: Interval, open: readonly Interval[]): Interval[] {
  const pieces: Interval[] = [];
  let start = closed.low;
  for (const hole of mergeIntervals(open)) {
    if (hole.high <= start) continue;
    if (hole.low >= closed.high) break;
    if (hole.low < start) {
      start = hole.high;
      continue;
    }
    pieces.push({ low: start, high: hole.low });
    start = hole.high;
  }
  if (start <= closed.high) pieces.push({ low: start, high: closed.high });
  const point = closed.low === closed.high;
  return pieces.filter((p) => point || !sameEdge(p.low, p.high));
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
 * noise) nor widened into a sliver (holes apart by noise). Used where a
 * single exact rate is an answer (several bands together); `subtractOpen`
 * keeps its own rule for one band.
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

/** Sorted open intervals, merged only where they overlap by more than the edge tolerance (touching ones stay apart). */
function mergeOverlapping(intervals: readonly Interval[]): Interval[] {
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
