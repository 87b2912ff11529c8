import { hz, type Hz } from '../units/quantities.js';
import type { ClockPart, IntegerRange } from '../scenario/scenario.js';
import type { RateSettings } from './part-plan.js';

/** One rate a part can give, with the settings that give it. */
export interface PartRate {
  readonly rate: Hz;
  readonly settings: RateSettings;
}

/**
 * One family of a part's rates: rate = f·N/(M·D) for the integers N in
 * [nMin, nMax] at fixed M and D (direct: N = M = D = 1; a divider: N = M = 1).
 * Inside a family the rate is linear in N with step f/(M·D).
 */
export interface RateFamily {
  readonly M: number;
  readonly D: number;
  readonly nMin: number;
  readonly nMax: number;
}

/**
 * The rate of a part's frequency through integer settings, in one expression
 * from the integers (never accumulated), so that every caller gets the same
 * floating-point value for the same settings.
 *
 * @param frequency the part's frequency, Hz
 * @param settings N, M, D
 * @returns f·N/(M·D), Hz
 * @example rateOf(hz(10e6), { N: 48, M: 2, D: 2 }) // 120e6 Hz
 */
export function rateOf(frequency: Hz, settings: RateSettings): Hz {
  return hz((frequency * settings.N) / (settings.M * settings.D));
}

/** The VCO frequency f·N/M of synthesiser settings, Hz, in one expression. */
export function vcoOf(frequency: Hz, N: number, M: number): Hz {
  return hz((frequency * N) / M);
}

/**
 * The families of rates a part gives: one for a direct part, one per
 * converter divider, and one per (M, D) for a synthesiser, its N range
 * narrowed to keep the VCO f·N/M inside its range. Families with no N left
 * are dropped.
 *
 * @param part the clock part
 * @param dividers the converter's clock dividers (used by divider parts)
 * @returns families in the order M ascending, then D ascending
 * @throws Error on a non-integer or non-positive range or divider
 * @example rateFamilies(s.clocks[0], [1, 2, 4]).map((f) => f.D) // [1] (a direct part: the converter's dividers are for divider parts)
 */
export function rateFamilies(part: ClockPart, dividers: readonly number[]): RateFamily[] {
  const derivation = part.derivation;
  switch (derivation.kind) {
    case 'direct':
      return [{ M: 1, D: 1, nMin: 1, nMax: 1 }];
    case 'divider':
      for (const D of dividers) checkPositiveInteger(D, `divider of ${part.label}`);
      return [...new Set(dividers)].sort((a, b) => a - b).map((D) => ({ M: 1, D, nMin: 1, nMax: 1 }));
    case 'synthesiser': {
      const { n, m, d, vco } = derivation;
      for (const [name, range] of [
        ['N', n],
        ['M', m],
        ['D', d],
      ] as const)
        checkRange(range, `${name} of ${part.label}`);
      const families: RateFamily[] = [];
      for (let M = m.min; M <= m.max; M++) {
        const span = vco ? vcoRange(part.frequency, M, n, vco) : n;
        if (!span) continue;
        for (let D = d.min; D <= d.max; D++) families.push({ M, D, nMin: span.min, nMax: span.max });
      }
      return families;
    }
  }
}

/**
 * The N of a range that keep f·N/M inside [low, high], from one division,
 * then corrected so that the VCO computed by vcoOf (not the algebra) is in
 * range at both ends.
 */
function vcoRange(frequency: Hz, M: number, n: IntegerRange, vco: { readonly low: number; readonly high: number }): IntegerRange | null {
  return integerSpan(n, (vco.low * M) / frequency, (vco.high * M) / frequency, (N) => vcoOf(frequency, N, M), vco.low, vco.high);
}

/**
 * The integers N of `range` with low ≤ value(N) ≤ high for an increasing
 * value(N) ≈ N·unit: first estimated from the quotients (clamped to the
 * range), then stepped where rounding put the estimate an integer off, so
 * that the test holds for the value as computed.
 */
function integerSpan(
  range: IntegerRange,
  lowQuotient: number,
  highQuotient: number,
  value: (N: number) => number,
  low: number,
  high: number,
): IntegerRange | null {
  const clamp = (k: number) => Math.min(Math.max(k, range.min), range.max);
  let min = clamp(Math.ceil(lowQuotient));
  let max = clamp(Math.floor(highQuotient));
  while (min > range.min && value(min - 1) >= low) min--;
  while (min <= range.max && value(min) < low) min++;
  while (max < range.max && value(max + 1) <= high) max++;
  while (max >= range.min && value(max) > high) max--;
  return min <= max ? { min, max } : null;
}

/**
 * The N of a family whose rate f·N/(M·D), computed by rateOf, lies in
 * [low, high]: from one division each, then corrected by a step where
 * rounding put the algebra's answer an ulp outside.
 *
 * @param frequency the part's frequency, Hz
 * @param family the family (its N range bounds the answer)
 * @param low, high the rate range, Hz
 * @returns the N range, or null when no N of the family gives a rate inside
 */
export function nRangeFor(frequency: Hz, family: RateFamily, low: Hz, high: Hz): IntegerRange | null {
  const K = family.M * family.D;
  const range = { min: family.nMin, max: family.nMax };
  return integerSpan(range, (low * K) / frequency, (high * K) / frequency, (N) => (frequency * N) / K, low, high); // rateOf's expression
}

/**
 * Every rate of a part inside [low, high] (e.g. the converter's range), one
 * per settings (equal rates from different settings are all listed).
 *
 * @param part the clock part
 * @param dividers the converter's clock dividers
 * @param low, high the rate range, Hz
 * @example partRates(s.clocks[0], [1, 2], hz(40e6), hz(250e6)).map((r) => r.rate) // [122.88e6] (a direct part)
 */
export function partRates(part: ClockPart, dividers: readonly number[], low: Hz, high: Hz): PartRate[] {
  const rates: PartRate[] = [];
  for (const family of rateFamilies(part, dividers)) {
    const span = nRangeFor(part.frequency, family, low, high);
    if (!span) continue;
    for (let N = span.min; N <= span.max; N++) {
      const settings = { N, M: family.M, D: family.D };
      rates.push({ rate: rateOf(part.frequency, settings), settings });
    }
  }
  return rates;
}

/** How many rates partRates would list, without listing them. */
export function partRateCount(part: ClockPart, dividers: readonly number[], low: Hz, high: Hz): number {
  let count = 0;
  for (const family of rateFamilies(part, dividers)) {
    const span = nRangeFor(part.frequency, family, low, high);
    if (span) count += span.max - span.min + 1;
  }
  return count;
}

function checkPositiveInteger(value: number, what: string): void {
  if (!Number.isInteger(value) || value < 1) throw new Error(`${what} must be a positive integer (got ${value})`);
}

function checkRange(range: IntegerRange, what: string): void {
  checkPositiveInteger(range.min, `${what} min`);
  checkPositiveInteger(range.max, `${what} max`);
  if (range.max < range.min) throw new Error(`${what}: max ${range.max} below min ${range.min}`);
}
