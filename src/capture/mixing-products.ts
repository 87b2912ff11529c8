import type { Coefficients } from './converter-polynomial.js';

/**
 * The mixing products a memoryless polynomial makes of several tones, in
 * closed form (multinomial expansion; common practice, no source). With
 * x = Σᵢ Aᵢ·cos θᵢ = Σᵢ (Aᵢ/2)(e^{iθᵢ} + e^{−iθᵢ}), the power x^k is a sum over
 * ordered k-tuples of signed tones. A product is named by its net multiples
 * nᵢ (frequency Σ nᵢ·fᵢ); a k-tuple with pᵢ plus and qᵢ minus picks of tone i
 * (pᵢ − qᵢ = nᵢ, Σ(pᵢ + qᵢ) = k) occurs k!/Π(pᵢ!·qᵢ!) times, and the real
 * component (it and its conjugate) has amplitude
 *   Σ_k a_k · k!/2^(k−1) · Σ_{pairs} Πᵢ Aᵢ^(pᵢ+qᵢ)/(pᵢ!·qᵢ!),
 * every term with the same phase Σ nᵢ·φᵢ. Writing pᵢ = max(nᵢ, 0) + jᵢ,
 * qᵢ = max(−nᵢ, 0) + jᵢ, the sum over the extra pairs jᵢ (Σ jᵢ = (k − r)/2,
 * r = Σ|nᵢ|) factorises into a product of one series per tone (tones below
 * NEGLIGIBLE_PAIR_AMPLITUDE that take no part are left out). Checks: one
 * tone, n = (m): the power-reduction identity; two tones through a3·x³,
 * n = (2, −1): (3/4)·a3·A1²·A2, the textbook 2f1 − f2 amplitude.
 */

const FACTORIALS: number[] = [1];
/**
 * A tone this weak (−60 dBFS) changes a product it takes no part in by
 * about k²·a²/4 relative (under 6·10⁻⁵, 0.0005 dB, at order 15), so
 * productAmplitude leaves its pairs out.
 */
export const NEGLIGIBLE_PAIR_AMPLITUDE = 1e-3;
function factorial(n: number): number {
  for (let i = FACTORIALS.length; i <= n; i++) FACTORIALS.push(FACTORIALS[i - 1]! * i);
  return FACTORIALS[n]!;
}

/**
 * Signed amplitude of the product with net multiples `net` (the formula above).
 *
 * @param coefficients a[0..K] (a[1] = 1)
 * @param amplitudes Aᵢ of the input tones, full scale = 1
 * @param net nᵢ per tone, not all zero
 * @returns the amplitude (sign: relative to the phase Σ nᵢ·φᵢ)
 * @example productAmplitude([0, 1, 0, 0.04], [0.5, 0.5], [2, -1]) // 0.00375 (0.75·0.04·0.125)
 */
export function productAmplitude(coefficients: Coefficients, amplitudes: readonly number[], net: readonly number[]): number {
  const r = net.reduce((sum, n) => sum + Math.abs(n), 0);
  const highest = coefficients.length - 1;
  if (r === 0 || r > highest) return 0;
  const pairsMost = Math.floor((highest - r) / 2);
  // series[j] = Σ over (j₁..j_T, Σ = j) of Πᵢ Aᵢ^(|nᵢ|+2jᵢ) / ((|nᵢ|+jᵢ)!·jᵢ!); the enumeration calls this thousands of
  // times in one verify, so the terms live in three small arrays reused across tones.
  let series = new Float64Array(pairsMost + 1);
  let next = new Float64Array(pairsMost + 1);
  const own = new Float64Array(pairsMost + 1);
  series[0] = 1;
  let length = 1;
  for (let i = 0; i < net.length; i++) {
    const n = Math.abs(net[i]!);
    const a = amplitudes[i]!;
    // A tone outside the product enters only through pairs (+f, −f), each worth about a² (< 1e-6 here): left out.
    if (n === 0 && a < NEGLIGIBLE_PAIR_AMPLITUDE) continue;
    for (let j = 0; j <= pairsMost; j++) own[j] = a ** (n + 2 * j) / (factorial(n + j) * factorial(j));
    next.fill(0);
    for (let x = 0; x < length; x++) for (let y = 0; x + y <= pairsMost; y++) next[x + y]! += series[x]! * own[y]!;
    const done = next;
    next = series;
    series = done;
    length = pairsMost + 1;
  }
  let sum = 0;
  for (let j = 0; j <= pairsMost; j++) {
    const k = r + 2 * j;
    sum += ((coefficients[k] ?? 0) * factorial(k) * series[j]!) / 2 ** (k - 1);
  }
  return sum;
}

/**
 * Upper bounds on a product's amplitude by its order, from the derivatives
 * of the transfer curve. For one tone, the m-th Chebyshev coefficient of
 * f(cos θ) is at most sup|f^(m)| / (2^(m−1)·m!) (integrate by parts m times
 * with Rodrigues' formula for T_m; common practice, no source); applied to
 * each tone in turn, a product with net multiples nᵢ and order r = Σ|nᵢ| has
 * an amplitude of at most
 *   Πᵢ (Aᵢ^|nᵢ| / |nᵢ|!) · sup_{|x| ≤ P} |y^(r)(x)| / 2^(r−1),   P = Σ Aᵢ,
 * with equality for a single power (e.g. (3/4)·a3·A1²·A2 for 2f1 − f2 of
 * a3·x³). The supremum is bounded by the sum of the magnitudes of the
 * Chebyshev coefficients of y^(r)(P·u) on [−1, 1] (each |T_k| ≤ 1), which
 * keeps the cancellation between large coefficients of opposite sign.
 *
 * @param coefficients a[0..K] (a[1] = 1)
 * @param peak P, the largest input value, ≥ 0
 * @returns H[r] = sup|y^(r)| / 2^(r−1) for r = 0..K+1 (H[0] = 0, H[K+1] = 0)
 * @example orderSupremums([0, 1, 0, 0.04], 1)[3] // 0.06 (0.04·3!/4)
 */
export function orderSupremums(coefficients: Coefficients, peak: number): number[] {
  const highest = coefficients.length - 1;
  const bounds = new Array<number>(highest + 2).fill(0);
  for (let r = 1; r <= highest; r++) {
    // y^(r)(P·u) as a polynomial in u, then in Chebyshev terms: u^k = 2^(1−k)·Σ_j C(k, j)·T_(k−2j) (the T_0 term halved).
    const chebyshev = new Array<number>(highest - r + 1).fill(0);
    for (let k = 0; k + r <= highest; k++) {
      const e = (((coefficients[k + r] ?? 0) * factorial(k + r)) / factorial(k)) * peak ** k;
      if (e === 0) continue;
      for (let j = 0; 2 * j <= k; j++) {
        const m = k - 2 * j;
        chebyshev[m]! += (e * binomialCount(k, j)) / 2 ** (m === 0 ? k : k - 1);
      }
    }
    bounds[r] = chebyshev.reduce((sum, c) => sum + Math.abs(c), 0) / 2 ** (r - 1);
  }
  return bounds;
}

/**
 * The running maximum of orderSupremums from the top order down: a bound
 * for every product of order r or more, as a search that fixes tones one by
 * one needs (adding a tone can only raise the order).
 *
 * @example orderBounds([0, 1, 0, 0.04], 1)[1] // 1.12
 */
export function orderBounds(coefficients: Coefficients, peak: number): number[] {
  const own = orderSupremums(coefficients, peak);
  for (let r = own.length - 2; r >= 0; r--) own[r] = Math.max(own[r]!, own[r + 1]!);
  return own;
}

function binomialCount(n: number, k: number): number {
  return factorial(n) / (factorial(k) * factorial(n - k));
}

/**
 * The bound of orderSupremums for one product: Πᵢ (Aᵢ^|nᵢ| / |nᵢ|!) · H[r].
 *
 * @param bounds orderSupremums(coefficients, peak)
 * @param amplitudes Aᵢ
 * @param net nᵢ
 * @example productBound(orderSupremums([0, 1, 0, 0.04], 1), [0.5, 0.5], [2, -1]) // 0.00375
 */
export function productBound(bounds: readonly number[], amplitudes: readonly number[], net: readonly number[]): number {
  // Either the per-order supremums or their running maximum will do: both bound the product of that order.
  let product = 1;
  let order = 0;
  net.forEach((n, i) => {
    const m = Math.abs(n);
    if (m === 0) return;
    product *= amplitudes[i]! ** m / factorial(m);
    order += m;
  });
  return order < bounds.length ? product * bounds[order]! : 0;
}

/** One product found by enumerateProducts. */
export interface Product {
  /** Net multiples per input tone; the first nonzero one is positive. */
  readonly net: readonly number[];
  /** Σ|nᵢ|: the product's order. */
  readonly order: number;
  /** Absolute amplitude, full scale = 1. */
  readonly amplitude: number;
}

/** The products found, and whether the search ran to its end. */
export interface ProductList {
  readonly products: readonly Product[];
  /** False when the search stopped at its budget: weaker products of high order may be missing. */
  readonly complete: boolean;
}

/** Exact amplitudes the search may compute before it stops (a few hundred milliseconds of work at the highest orders). */
export const PRODUCT_BUDGET = 50_000;

/**
 * Every product (order 1..K, the tones themselves included) whose amplitude
 * reaches `cutoff`. The search walks the tones one by one and stops a branch
 * when the bound of orderBounds falls below the cutoff (the factor
 * Π Aᵢ^|nᵢ|/|nᵢ|! only shrinks as tones are added, every Aᵢ ≤ 1, and that
 * bound only falls as the order grows), and computes a product's exact
 * amplitude only when its own order's bound reaches the cutoff. The orders
 * are searched lowest first, so a spent budget leaves out only the highest.
 *
 * @param coefficients a[0..K]
 * @param amplitudes Aᵢ ≤ 1 of the input tones
 * @param cutoff least amplitude kept (> 0)
 * @param budget most exact amplitudes computed
 * @returns the products at or above the cutoff, with exact amplitudes, and whether the list is complete
 * @example enumerateProducts([0, 1, 0.1], [0.5], 1e-9).products.map((p) => p.net) // [[1], [2]]
 */
export function enumerateProducts(
  coefficients: Coefficients,
  amplitudes: readonly number[],
  cutoff: number,
  budget = PRODUCT_BUDGET,
): ProductList {
  const highest = coefficients.length - 1;
  const peak = amplitudes.reduce((sum, a) => sum + a, 0);
  const own = orderSupremums(coefficients, peak);
  const reach = orderBounds(coefficients, peak);
  const found: Product[] = [];
  const net = new Array<number>(amplitudes.length).fill(0);
  let evaluated = 0;
  // One pass per order, lowest first, so that a spent budget leaves out only the highest orders.
  const walk = (target: number, tone: number, order: number, bound: number, leading: boolean): void => {
    if (evaluated >= budget || bound * reach[order]! < cutoff) return;
    if (tone === amplitudes.length) {
      if (order !== target || bound * own[order]! < cutoff) return;
      evaluated++;
      const amplitude = Math.abs(productAmplitude(coefficients, amplitudes, net));
      if (amplitude >= cutoff) found.push({ net: [...net], order, amplitude });
      return;
    }
    const a = amplitudes[tone]!;
    for (let m = 0; order + m <= target; m++) {
      const factor = (bound * a ** m) / factorial(m);
      if (m > 0 && factor * reach[order + m]! < cutoff) break;
      for (const sign of m === 0 ? [1] : leading ? [1] : [1, -1]) {
        net[tone] = sign * m;
        walk(target, tone + 1, order + m, factor, leading && m === 0);
      }
    }
    net[tone] = 0;
  };
  for (let target = 1; target <= highest && evaluated < budget; target++) walk(target, 0, 0, 1, true);
  return { products: found, complete: evaluated < budget };
}
