import type { Interval } from '../math/interval-set.js';
import type { Hz } from '../units/quantities.js';
import type { LinearSlack } from './linear-slacks.js';

/** The widest-margin answer of one interval: the nominal rate and the worst slack t* no rate of it beats, Hz. */
export interface WidestMarginAnswer {
  readonly rate: number;
  readonly worstSlack: number;
}

/** Slacks whose change across the whole range is below this fraction of `unit` count as constant. */
const CONSTANT_CHANGE = 1e-9;

/**
 * Maximises the worst slack t = minᵢ (slopeᵢ·r + offsetᵢ) over r in the
 * range, exactly: the minimum of lines is concave and piecewise linear, so
 * its maximum lies where its lower envelope stops rising, at one end of the
 * range or where a rising piece meets a falling one. The envelope is walked
 * from the low end, breakpoint by breakpoint, each breakpoint one division.
 * Then, lexicographically, among the rates that keep t*, the rate that
 * maximises the worst of the slacks that vary with the rate: without that
 * second stage, a slack that is constant across the interval (a neighbour
 * folding in step with the band) makes a whole stretch of rates tie, and the
 * answer would be an arbitrary end of it.
 *
 * @param slacks linear bounds on t, Hz
 * @param range the rate range, Hz, low ≤ high
 * @param unit the scale of t, Hz (the wanted bandwidth): a slack changing by
 *   less than 1e-9 of it across the range counts as constant
 * @returns the chosen rate and t*, or null when no slack bounds t
 * @example maximiseWorstSlack([{ slope: 1, offset: -5 }, { slope: -1, offset: 9 }], { low: 0, high: 10 }, hz(1)) // { rate: 7, worstSlack: 2 } (where r − 5 = 9 − r)
 */
export function maximiseWorstSlack(slacks: readonly LinearSlack[], range: Interval, unit: Hz): WidestMarginAnswer | null {
  if (slacks.length === 0) return null;
  const rate = peakOfEnvelope(slacks, range);
  const worstSlack = worstAt(slacks, rate);
  const width = range.high - range.low;
  const varying = slacks.filter((s) => Math.abs(s.slope * width) > CONSTANT_CHANGE * unit);
  // Every constant slack is at t* or above everywhere (t* is at most each of them), so the rate that is best for the
  // varying slacks alone keeps t* and needs no holding constraint.
  if (varying.length === 0 || varying.length === slacks.length) return { rate, worstSlack };
  return { rate: peakOfEnvelope(varying, range), worstSlack };
}

/** minᵢ (slopeᵢ·r + offsetᵢ), Hz. */
function worstAt(slacks: readonly LinearSlack[], rate: number): number {
  let worst = Infinity;
  for (const s of slacks) worst = Math.min(worst, s.slope * rate + s.offset);
  return worst;
}

/**
 * The lowest rate of the range at which the lower envelope of the lines stops
 * rising. From the low end, the envelope follows the lowest line (of equal
 * ones, the one falling fastest); while that line rises, the next breakpoint
 * is the nearest crossing of a line with a smaller slope, and the envelope
 * continues along the line crossing there (of crossings at one rate, the
 * smallest slope). Each step lowers the slope followed, so the walk ends
 * within as many steps as there are slopes.
 */
function peakOfEnvelope(lines: readonly LinearSlack[], range: Interval): number {
  let rate = range.low;
  let active = lines[0]!;
  let lowest = active.slope * rate + active.offset;
  for (const line of lines) {
    const value = line.slope * rate + line.offset;
    if (value < lowest || (value === lowest && line.slope < active.slope)) {
      active = line;
      lowest = value;
    }
  }
  while (active.slope > 0) {
    let next: LinearSlack | null = null;
    let at = Infinity;
    for (const line of lines) {
      if (line.slope >= active.slope) continue;
      // Not below the active line at `rate`, so the crossing lies at `rate` or beyond; rounding can put it a hair before.
      const crossing = Math.max(rate, (line.offset - active.offset) / (active.slope - line.slope));
      if (crossing < at || (crossing === at && line.slope < next!.slope)) {
        next = line;
        at = crossing;
      }
    }
    if (next === null || at >= range.high) return range.high;
    rate = at;
    active = next;
  }
  return rate;
}
