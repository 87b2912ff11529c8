import { hz, type Hz } from '../../units/quantities.js';
import type { Interval } from '../../math/interval-set.js';

/** IF shifts at which the fixed-shift problem is solved to find pieces, by default. */
export const DEFAULT_SEED_COUNT = 17;

/**
 * The shifts at which pieces are sought: `count` evenly spaced over the
 * range, both ends and (for an odd count) the middle included, each from
 * the ends in one expression; and 0 (the nominal IF) when it lies inside and
 * is not among them. Ascending.
 *
 * @param range the shift range, Hz, low ≤ high
 * @param count ≥ 2 points (1 when the range has no width)
 * @returns shifts, Hz
 * @throws RangeError for a count below 2
 * @example seedShifts({ low: -2e6, high: 2e6 }, 5) // [−2e6, −1e6, 0, 1e6, 2e6]
 */
export function seedShifts(range: Interval, count: number = DEFAULT_SEED_COUNT): Hz[] {
  if (!(Number.isInteger(count) && count >= 2)) throw new RangeError(`at least 2 seed shifts, got ${count}`);
  if (range.low === range.high) return [hz(range.low)];
  const shifts = Array.from({ length: count }, (_, i) =>
    i === 0 ? range.low : i === count - 1 ? range.high : (range.low * (count - 1 - i) + range.high * i) / (count - 1),
  );
  if (range.low < 0 && 0 < range.high && !shifts.includes(0)) shifts.push(0);
  return shifts.sort((a, b) => a - b).map(hz);
}
