/**
 * The converter's nonlinearity as a memoryless polynomial
 *   y = x + a2·x² + a3·x³ + … + aK·x^K   (K = the scenario's harmonicOrder),
 * fitted so that one tone at the strongest wanted level shows every harmonic
 * at the stated figure.
 *
 * The fit (trigonometric power-reduction identities; common practice, no
 * source): for x = A·cos θ,
 *   cos^k θ = 2^(1−k) · Σ_{j=0}^{⌊(k−1)/2⌋} C(k, j)·cos((k−2j)·θ)  (+ a constant for even k),
 * so the term a_k·x^k puts a_k·A^k·C(k, j)/2^(k−1) on harmonic m = k − 2j.
 * To leading order the m-th harmonic is a_m·A^m/2^(m−1), but every higher
 * power of the same parity adds to it: x⁴ adds a4·A⁴/2 to the 2nd harmonic,
 * x⁵ adds 5·a5·A⁵/16 to the 3rd, x³ adds (3/4)·a3·A³ to the fundamental.
 * These are not negligible: with −75 dBc at 2 and −88 dBc at 4, the x⁴
 * share of the 2nd harmonic is 4·10^(−13/20) ≈ 0.9 of the whole. So the fit
 * is exact instead: the system is triangular (a_k touches only harmonics
 * ≤ k), solved from the top order down,
 *   a_m = (s_m·T_m − c_m) · 2^(m−1) / A^m,   c_m = Σ_{k>m, k≡m mod 2} a_k·A^k·C(k, (k−m)/2)/2^(k−1),
 * where T_m is the stated harmonic amplitude and s_m = ±1 its sign, which the
 * figures leave free. s_m is taken opposite to c_m, so that |a_m| is the
 * largest the figures allow: at levels below the reference, where the
 * leading term rules, the model's products are then at least as strong as
 * the plan's leading-order (k − 1) dB-per-dB extrapolation — the cautious
 * side for a check of the plan.
 *
 * The fundamental keeps the compression the odd powers give it (for the
 * demo figures about 3·10⁻⁴ of its amplitude, 0.003 dB); the constant the
 * even powers make is removed in the capture (see applyPolynomial): the
 * converter's offset is its stated DC figure.
 */

/** Coefficients a[0..K]: a[0] = 0, a[1] = 1, a[k] for x^k. */
export type Coefficients = readonly number[];

/**
 * C(n, k), exact for the small n used here.
 *
 * @example binomial(5, 2) // 10
 */
export function binomial(n: number, k: number): number {
  if (k < 0 || k > n) return 0;
  let result = 1;
  for (let i = 1; i <= k; i++) result = (result * (n - k + i)) / i;
  return Math.round(result);
}

/**
 * The signed amplitude of harmonic m (m ≥ 1) of one tone A·cos θ through the
 * polynomial, summed over every power that reaches it (the identity above).
 *
 * @param coefficients a[0..K]
 * @param amplitude A, full scale = 1
 * @param order m ≥ 1
 * @example singleToneHarmonic([0, 1, 0.1], 0.5, 2) // 0.0125 (0.1·0.25/2)
 */
export function singleToneHarmonic(coefficients: Coefficients, amplitude: number, order: number): number {
  let sum = 0;
  for (let k = order; k < coefficients.length; k += 2)
    sum += (coefficients[k]! * amplitude ** k * binomial(k, (k - order) / 2)) / 2 ** (k - 1);
  return sum;
}

/**
 * Fits the polynomial to harmonic amplitudes stated for one tone (the fit above).
 *
 * @param targets T_m by order m = 2..K (amplitudes, full scale = 1; absent orders are taken as 0)
 * @param amplitude A of the tone at which they are stated
 * @param highestOrder K ≥ 1 (1: a linear converter)
 * @returns a[0..K]
 * @throws RangeError for a non-positive amplitude
 * @example fitPolynomial(new Map([[2, 0.0125]]), 0.5, 2) // [0, 1, 0.1]
 */
export function fitPolynomial(targets: ReadonlyMap<number, number>, amplitude: number, highestOrder: number): number[] {
  if (!(amplitude > 0)) throw new RangeError(`the reference amplitude must be above zero, got ${amplitude}`);
  const a = new Array<number>(highestOrder + 1).fill(0);
  a[1] = 1;
  for (let m = highestOrder; m >= 2; m--) {
    let higher = 0;
    for (let k = m + 2; k <= highestOrder; k += 2) higher += (a[k]! * amplitude ** k * binomial(k, (k - m) / 2)) / 2 ** (k - 1);
    const target = Math.abs(targets.get(m) ?? 0);
    const sign = higher > 0 ? -1 : 1;
    a[m] = ((sign * target - higher) * 2 ** (m - 1)) / amplitude ** m;
  }
  return a;
}

/**
 * Passes a record through the polynomial in place, y = x + Σ a_k·x^k, and
 * removes the record mean of the nonlinear part (the constant the even
 * powers make; with whole-cycle tones that mean is exactly their DC term).
 *
 * @param samples the record, overwritten
 * @param coefficients a[0..K]
 * @example (() => { const x = Float64Array.of(1, -1); applyPolynomial(x, [0, 1, 0.5]); return x; })() // [1, -1] (0.5·x² is the constant 0.5, removed)
 */
export function applyPolynomial(samples: Float64Array, coefficients: Coefficients): void {
  const order = coefficients.length - 1;
  if (order < 2) return;
  const bent = new Float64Array(samples.length);
  let mean = 0;
  for (let n = 0; n < samples.length; n++) {
    const x = samples[n]!;
    let horner = coefficients[order]!;
    for (let k = order - 1; k >= 2; k--) horner = horner * x + coefficients[k]!;
    bent[n] = horner * x * x;
    mean += bent[n]!;
  }
  mean /= samples.length;
  for (let n = 0; n < samples.length; n++) samples[n] = samples[n]! + bent[n]! - mean;
}
