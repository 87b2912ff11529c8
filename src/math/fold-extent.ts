import type { Hz } from '../units/quantities.js';
import { mergeIntervals, type Interval } from './interval-set.js';

/**
 * Where a band of input frequencies shows after sampling: its aliased
 * segments in [0, rate/2]. A negative extent folds as its magnitude. Each
 * piece inside one half-zone [(k−1)·rate/2, k·rate/2] maps by one expression
 * (odd k shifts down, even k mirrors); an extent at least rate wide holds a
 * whole half-zone and so covers the whole first zone (one only rate/2 wide
 * need not: [0.7, 1.3] at rate 1 folds onto [0, 0.3]).
 *
 * @param low, high the extent, Hz, low ≤ high (may be negative)
 * @param rate sampling rate, Hz, positive
 * @returns merged segments, ascending
 * @example foldExtent(60e6, 70e6, 100e6) // [{low: 30e6, high: 40e6}]
 */
export function foldExtent(low: Hz, high: Hz, rate: Hz): Interval[] {
  const half = rate / 2;
  const magnitude = extentMagnitude(low, high);
  // Only an extent at least rate wide surely holds a whole half-zone; a narrower one (up to three pieces) is folded piece by piece.
  if (magnitude.high - magnitude.low >= rate) return [{ low: 0, high: half }];
  const k = Math.floor(magnitude.low / half) + 1;
  const pieces: (readonly [number, number, number])[] = [[k, magnitude.low, Math.min(magnitude.high, k * half)]];
  for (let next = k + 1; (next - 1) * half < magnitude.high; next++)
    pieces.push([next, (next - 1) * half, Math.min(magnitude.high, next * half)]);
  return mergeIntervals(pieces.map(([zone, a, b]) => foldedPiece(zone, a, b, rate)));
}

/**
 * The magnitudes of an extent's frequencies: a real signal at −f is the one
 * at f. [−3, −1] → [1, 3]; [−1, 2] → [0, 2].
 */
export function extentMagnitude(low: Hz, high: Hz): Interval {
  if (high <= 0) return { low: -high, high: -low };
  return low >= 0 ? { low, high } : { low: 0, high: Math.max(-low, high) };
}

function foldedPiece(zone: number, low: number, high: number, rate: number): Interval {
  const clamp = (f: number) => Math.min(Math.max(f, 0), rate / 2);
  if (zone % 2 === 0) return { low: clamp((zone / 2) * rate - high), high: clamp((zone / 2) * rate - low) };
  return { low: clamp(low - ((zone - 1) / 2) * rate), high: clamp(high - ((zone - 1) / 2) * rate) };
}
