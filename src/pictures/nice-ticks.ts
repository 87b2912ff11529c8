/** A tick step m·10^exponent with m in {1, 2, 5}: every tick is an integer multiple of it. */
export interface TickStep {
  readonly mantissa: 1 | 2 | 5;
  readonly exponent: number;
}

/** Ticks over a range: the step and each tick as k·step. */
export interface Ticks {
  readonly step: TickStep;
  /** Integer multiples k of the step, ascending. */
  readonly multiples: readonly number[];
  /** The tick values k·step, each made from integers in one expression. */
  readonly values: readonly number[];
}

/**
 * The value k·m·10^e from integers in one operation, so that a tick such as
 * 0.3 is the double nearest 3/10 (not 3 × 0.1) and prints exactly.
 *
 * @param k integer multiple
 * @param step the tick step
 * @example tickValue(3, { mantissa: 1, exponent: -1 }) // 0.3
 */
export function tickValue(k: number, step: TickStep): number {
  const units = k * step.mantissa;
  return step.exponent >= 0 ? units * 10 ** step.exponent : units / 10 ** -step.exponent;
}

/**
 * "Nice" ticks (1-2-5 steps) covering [low, high] with about `count` intervals.
 *
 * @param low, high the range, any unit, low ≤ high, finite
 * @param count wanted number of intervals (≥ 1)
 * @returns the step and the ticks inside [low, high]
 * @example linearTicks(0, 61.44e6, 8).values // [0, 1e7, 2e7, 3e7, 4e7, 5e7, 6e7]
 */
export function linearTicks(low: number, high: number, count: number): Ticks {
  // A bound within 1e-9 of a step beyond a multiple still counts as that multiple.
  return ticksBetween(
    low,
    high,
    count,
    (q) => Math.ceil(q - 1e-9),
    (q) => Math.floor(q + 1e-9),
  );
}

/**
 * "Nice" ticks whose first and last enclose [low, high]: for an axis that
 * should start and end on a tick.
 *
 * @param low, high the range to cover, low ≤ high, finite
 * @param count wanted number of intervals (≥ 1)
 * @example coveringTicks(-186, 0, 10).values // [-200, -180, -160, -140, -120, -100, -80, -60, -40, -20, 0]
 */
export function coveringTicks(low: number, high: number, count: number): Ticks {
  return ticksBetween(
    low,
    high,
    count,
    (q) => Math.floor(q + 1e-9),
    (q) => Math.ceil(q - 1e-9),
    1,
  );
}

/** Most ticks one axis gets; a step that would give more (a span tiny beside its values) is coarsened. */
const MOST_TICKS = 200;

function ticksBetween(
  low: number,
  high: number,
  count: number,
  firstOf: (q: number) => number,
  lastOf: (q: number) => number,
  leastIntervals = 0,
): Ticks {
  let step = niceStep((high - low) / Math.max(1, count) || Math.abs(high) || 1);
  for (;;) {
    const size = tickValue(1, step);
    const first = firstOf(low / size);
    const last = Math.max(lastOf(high / size), first + leastIntervals);
    // Multiples past 2^53 are not distinct doubles: coarsen the step until they are few and exact.
    if (Number.isSafeInteger(first) && Number.isSafeInteger(last) && last - first <= MOST_TICKS) {
      const multiples = Array.from({ length: Math.max(0, last - first + 1) }, (_, i) => first + i);
      return { step, multiples, values: multiples.map((k) => tickValue(k, step)) };
    }
    step =
      step.mantissa === 1
        ? { mantissa: 2, exponent: step.exponent }
        : step.mantissa === 2
          ? { mantissa: 5, exponent: step.exponent }
          : { mantissa: 1, exponent: step.exponent + 1 };
  }
}

/**
 * The smallest 1-2-5 step at least `raw`.
 *
 * @param raw a positive spacing
 * @example niceStep(0.13) // { mantissa: 2, exponent: -1 }
 */
export function niceStep(raw: number): TickStep {
  let exponent = Math.floor(Math.log10(raw));
  // log10 may land a hair off for exact powers of ten: correct the exponent with exact comparisons.
  if (tickValue(1, { mantissa: 1, exponent }) > raw) exponent -= 1;
  if (tickValue(10, { mantissa: 1, exponent }) <= raw) exponent += 1;
  for (const mantissa of [1, 2, 5] as const) {
    if (tickValue(1, { mantissa, exponent }) >= raw) return { mantissa, exponent };
  }
  return { mantissa: 1, exponent: exponent + 1 };
}

/**
 * Ticks for a log axis over [low, high]: m·10^d for m in {1, 2, 5}, or in
 * {1, 1.5, 2, 2.5, 3, ..., 9} when that gives fewer than four ticks.
 *
 * @param low, high the range, 0 < low ≤ high
 * @returns tick values ascending, each m·10^d made in one operation
 * @example logTicks(30e6, 250e6) // [3e7, 4e7, 5e7, 6e7, 7e7, 8e7, 9e7, 1e8, 1.5e8, 2e8, 2.5e8]
 */
export function logTicks(low: number, high: number): number[] {
  const coarse = decadeTicks(low, high, [1, 2, 5]);
  return coarse.length >= 4 ? coarse : decadeTicks(low, high, [1, 1.5, 2, 2.5, 3, 4, 5, 6, 7, 8, 9]);
}

function decadeTicks(low: number, high: number, mantissas: readonly number[]): number[] {
  const ticks: number[] = [];
  for (let d = Math.floor(Math.log10(low)) - 1; d <= Math.ceil(Math.log10(high)); d++) {
    for (const m of mantissas) {
      const value = d >= 0 ? m * 10 ** d : m / 10 ** -d;
      if (value >= low * (1 - 1e-12) && value <= high * (1 + 1e-12)) ticks.push(value);
    }
  }
  return ticks;
}
