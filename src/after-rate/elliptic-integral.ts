/**
 * The arithmetic-geometric mean of a and b (both ≥ 0): iterate
 * a ← (a + b)/2, b ← √(a·b) until the two agree to the last bit. It converges
 * quadratically (a handful of steps for any pair of doubles).
 *
 * @param a first number, ≥ 0
 * @param b second number, ≥ 0
 * @returns AGM(a, b)
 * @example arithmeticGeometricMean(1, Math.SQRT1_2) // 0.8472130847939790
 */
export function arithmeticGeometricMean(a: number, b: number): number {
  let [x, y] = [a, b];
  for (let step = 0; step < 64 && x !== y; step++) {
    const next = (x + y) / 2;
    y = Math.sqrt(x * y);
    if (next === x) break;
    x = next;
  }
  return x;
}

/**
 * The complete elliptic integral of the first kind, K(k) = π / (2·AGM(1, k′))
 * with the complementary modulus k′ = √(1 − k²) (Gauss's relation; e.g.
 * Abramowitz & Stegun 17.6). k′ is taken as √((1 − k)(1 + k)) so that a
 * modulus near 1 keeps its precision.
 *
 * @param k modulus, 0 ≤ k < 1
 * @returns K(k) (π/2 at k = 0, growing without bound as k → 1)
 * @throws RangeError unless 0 ≤ k < 1
 * @example completeEllipticK(Math.SQRT1_2) // 1.8540746773013719
 */
export function completeEllipticK(k: number): number {
  if (!(k >= 0 && k < 1)) throw new RangeError(`elliptic modulus must lie in [0, 1), found ${k}`);
  return Math.PI / (2 * arithmeticGeometricMean(1, complementaryModulus(k)));
}

/**
 * √(1 − k²) written as √((1 − k)(1 + k)), exact to rounding near k = 1.
 *
 * @param k modulus in [0, 1]
 * @example complementaryModulus(0.6) // 0.8
 */
export function complementaryModulus(k: number): number {
  return Math.sqrt((1 - k) * (1 + k));
}
