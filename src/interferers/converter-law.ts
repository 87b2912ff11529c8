import { db, type Db } from '../units/quantities.js';
import type { Converter } from '../scenario/scenario.js';
import { harmonicFigure } from './harmonic-figure.js';
import { dbText, ordinal } from './words.js';

/**
 * The converter's nonlinearity of one order n, as the level law of every
 * product of that order. Model: a memoryless polynomial y = Σ a_k·x^k. For
 * x = Σᵢ Aᵢ·cos θᵢ, the leading term of the product that takes signal i pᵢ
 * times with + and qᵢ times with − (order n = Σ(pᵢ + qᵢ)) is, by the
 * multinomial expansion (common practice, no source),
 *   a_n · n!/2^(n−1) · Πᵢ Aᵢ^(pᵢ+qᵢ) / (pᵢ!·qᵢ!),
 * so in dB its level is gain_n + 20·log10(n!/Π pᵢ!·qᵢ!) + Σ (pᵢ + qᵢ)·Lᵢ with
 * gain_n = 20·log10(|a_n|/2^(n−1)) and Lᵢ the signals' levels (dBFS, full
 * scale = amplitude 1). Each product rises n dB per dB of drive.
 *
 * gain_n comes from a stated intercept IIPn when there is one: the two-tone
 * product ⌈n/2⌉·f1 − ⌊n/2⌋·f2 (f1 ± f2 for n = 2, 2·f1 − f2 for n = 3) meets
 * the fundamentals at IIPn, n·P − (n − 1)·IIPn at drive P (the intercept law;
 * common practice), so gain_n = −(n − 1)·IIPn − 20·log10(C_n), C_n its
 * multinomial count n!/(⌈n/2⌉!·⌊n/2⌋!). Otherwise from the n-th harmonic
 * figure HDn (dBc at the reference level Lref): one tone at Lref makes the
 * n-th harmonic (count 1) at Lref + HDn, so gain_n = HDn − (n − 1)·Lref
 * (an unstated order takes harmonicFigure's rule).
 *
 * Checks at equal drive L = Lref: 2·f1 − f2 and 2·f1 + f2 are 3× the third
 * harmonic (+9.54 dB), f1 + f2 − f3 is 6× (+15.56 dB), f1 ± f2 is 2× the
 * second harmonic (+6.02 dB).
 */
export interface OrderLaw {
  readonly order: number;
  /** gain_n, dB. */
  readonly gain: Db;
  /** Where it comes from, for source texts. */
  readonly note: string;
}

/**
 * The level law of order n, or null when the converter states neither an
 * intercept of that order nor any harmonic figure.
 *
 * @param converter the converter (intercepts, harmonic figures)
 * @param order n ≥ 2
 * @param referenceLevel Lref, dBFS (the strongest wanted level, at which harmonic figures are quoted)
 * @returns the law
 * @example orderLaw(s.converter, 3, -1).gain // -78 (HD3 −80 dBc at −1 dBFS, no intercept)
 */
export function orderLaw(converter: Converter, order: number, referenceLevel: number): OrderLaw | null {
  const intercept = converter.intercepts?.get(order) ?? (order === 3 ? (converter.intercept3 ?? undefined) : undefined);
  if (intercept !== undefined) {
    const gain = -(order - 1) * intercept - 20 * Math.log10(twoToneCount(order));
    return { order, gain: db(gain), note: `from the ${ordinal(order)}-order intercept ${dbText(intercept, 'dBFS')}` };
  }
  const figure = harmonicFigure(converter, order);
  if (figure === null) return null;
  return {
    order,
    gain: db(figure.dbc - (order - 1) * referenceLevel),
    note: `from the ${ordinal(order)}-harmonic figure, ${figure.note} at ${dbText(referenceLevel, 'dBFS')}`,
  };
}

/**
 * The multinomial count of the two-tone product that defines IIPn:
 * n!/(⌈n/2⌉!·⌊n/2⌋!).
 *
 * @example twoToneCount(3) // 3
 */
export function twoToneCount(order: number): number {
  return factorial(order) / (factorial(Math.ceil(order / 2)) * factorial(Math.floor(order / 2)));
}

/**
 * n!, exact for the small n used here.
 *
 * @example factorial(5) // 120
 */
export function factorial(n: number): number {
  let product = 1;
  for (let i = 2; i <= n; i++) product *= i;
  return product;
}

/**
 * 20·log10 of the multinomial count n!/Π(pᵢ!·qᵢ!) of a product.
 *
 * @param picks each signal's (plus, minus) counts
 * @returns dB
 * @example countDb([[1, 0], [1, 0], [0, 1]]) // 15.56 (20·log10(6))
 */
export function countDb(picks: ReadonlyArray<readonly [number, number]>): number {
  let order = 0;
  let denominator = 1;
  for (const [plus, minus] of picks) {
    order += plus + minus;
    denominator *= factorial(plus) * factorial(minus);
  }
  return 20 * Math.log10(factorial(order) / denominator);
}

/**
 * The level of one product by the law of its order (see OrderLaw).
 *
 * @param law the order's law
 * @param picks each signal's level (dBFS) with its (plus, minus) counts
 * @returns dBFS
 * @example productLevel({ order: 3, gain: db(-78), note: '' }, [[-1, 2, 0], [-1, 0, 1]]) // -71.46 (−78 + 9.54 − 3)
 */
export function productLevel(law: OrderLaw, picks: ReadonlyArray<readonly [number, number, number]>): Db {
  const drive = picks.reduce((sum, [level, plus, minus]) => sum + (plus + minus) * level, 0);
  return db(law.gain + countDb(picks.map(([, plus, minus]) => [plus, minus] as const)) + drive);
}
