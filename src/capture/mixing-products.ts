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
 * r = Σ|nᵢ|) factorises into a product of one series per tone. Checks: one
 * tone, n = (m): the power-reduction identity; two tones through a3·x³,
 * n = (2, −1): (3/4)·a3·A1²·A2, the textbook 2f1 − f2 amplitude.
 */

const FACTORIALS: number[] = [1];
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
 * @example productAmplitude([0, 1, 0, 0.04], [0.5, 0.5], [2, -1]) // 0.75·0.04·0.125 = 0.00375
 */
export function productAmplitude(coefficients: Coefficients, amplitudes: readonly number[], net: readonly number[]): number {
  const r = net.reduce((sum, n) => sum + Math.abs(n), 0);
  const highest = coefficients.length - 1;
  if (r === 0 || r > highest) return 0;
  const pairsMost = Math.floor((highest - r) / 2);
  // series[j] = Σ over (j₁..j_T, Σ = j) of Πᵢ Aᵢ^(|nᵢ|+2jᵢ) / ((|nᵢ|+jᵢ)!·jᵢ!)
  let series = [1];
  for (let i = 0; i < net.length; i++) {
    const n = Math.abs(net[i]!);
    const a = amplitudes[i]!;
    const own = Array.from({ length: pairsMost + 1 }, (_, j) => a ** (n + 2 * j) / (factorial(n + j) * factorial(j)));
    const next = new Array<number>(pairsMost + 1).fill(0);
    for (let x = 0; x < series.length; x++) for (let y = 0; x + y <= pairsMost; y++) next[x + y]! += series[x]! * own[y]!;
    series = next;
  }
  let sum = 0;
  for (let j = 0; j <= pairsMost; j++) {
    const k = r + 2 * j;
    sum += ((coefficients[k] ?? 0) * factorial(k) * series[j]!) / 2 ** (k - 1);
  }
  return sum;
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

/**
 * Every product (order 1..K, the tones themselves included) whose amplitude
 * may reach `cutoff`. The search walks the tones one by one and stops a
 * branch when an upper bound falls below the cutoff: with (|n|+j)! ≥ |n|!·j!
 * and the multinomial theorem, any product whose first tones are fixed is
 * at most Π (Aᵢ^|nᵢ| / |nᵢ|!) · H(r), H(r) = max over r' ≥ r of
 * Σ_k |a_k|·k!/2^(k−1) · S^((k−r')/2) / ((k−r')/2)!, S = Σ Aᵢ²; the first
 * factor only shrinks as tones are added (every Aᵢ ≤ 1).
 *
 * @param coefficients a[0..K]
 * @param amplitudes Aᵢ ≤ 1 of the input tones
 * @param cutoff least amplitude kept (> 0)
 * @returns the products at or above the cutoff, with exact amplitudes
 * @example enumerateProducts([0, 1, 0.1], [0.5], 1e-9).map((p) => p.net) // [[1], [2]]
 */
export function enumerateProducts(coefficients: Coefficients, amplitudes: readonly number[], cutoff: number): Product[] {
  const highest = coefficients.length - 1;
  const squares = amplitudes.reduce((sum, a) => sum + a * a, 0);
  const reach = new Array<number>(highest + 2).fill(0);
  for (let r = highest; r >= 1; r--) {
    let h = 0;
    for (let k = r; k <= highest; k += 2) h += (Math.abs(coefficients[k] ?? 0) * factorial(k) * squares ** ((k - r) / 2)) / (2 ** (k - 1) * factorial((k - r) / 2));
    reach[r] = Math.max(h, reach[r + 1]!);
  }
  reach[0] = reach[1]!;
  const found: Product[] = [];
  const net = new Array<number>(amplitudes.length).fill(0);
  const walk = (tone: number, order: number, bound: number, leading: boolean): void => {
    if (bound * reach[order]! < cutoff) return;
    if (tone === amplitudes.length) {
      if (order === 0) return;
      const amplitude = Math.abs(productAmplitude(coefficients, amplitudes, net));
      if (amplitude >= cutoff) found.push({ net: [...net], order, amplitude });
      return;
    }
    const a = amplitudes[tone]!;
    for (let m = 0; order + m <= highest; m++) {
      const factor = (bound * a ** m) / factorial(m);
      if (m > 0 && factor * reach[order + m]! < cutoff) break;
      for (const sign of m === 0 ? [1] : leading ? [1] : [1, -1]) {
        net[tone] = sign * m;
        walk(tone + 1, order + m, factor, leading && m === 0);
      }
    }
    net[tone] = 0;
  };
  walk(0, 0, 1, true);
  return found;
}
