/** An integral and the estimate of its absolute error. */
export interface Quadrature {
  readonly value: number;
  /** Sum of the local error estimates |S2 − S1|/15 of the accepted pieces. */
  readonly errorEstimate: number;
}

const DEEPEST = 48;

/**
 * ∫ f over [a, b] by adaptive Simpson quadrature with Richardson
 * extrapolation (Lyness 1969; e.g. Burden & Faires, Numerical Analysis): a
 * piece is accepted when its two-half Simpson sum S2 and its one-piece sum S1
 * agree within 15 × its share of the tolerance, and S2 + (S2 − S1)/15 is kept.
 * The interval is first cut at `cuts` (kinks of the integrand) and into at
 * least `minimumPieces` equal parts, so that a narrow feature between the
 * first samples is not stepped over.
 *
 * @param f the integrand, finite on [a, b]
 * @param a lower limit
 * @param b upper limit (≥ a)
 * @param absoluteTolerance the error allowed over the whole interval (> 0)
 * @param cuts points inside (a, b) where f may have a kink; others are ignored
 * @param minimumPieces least number of equal parts each cut piece is split into (default 8)
 * @returns the integral and its error estimate
 * @example integrate((x) => x * x, 0, 3, 1e-12).value // 9
 */
export function integrate(
  f: (x: number) => number,
  a: number,
  b: number,
  absoluteTolerance: number,
  cuts: readonly number[] = [],
  minimumPieces = 8,
): Quadrature {
  if (!(b >= a)) throw new RangeError(`integration needs a ≤ b, found [${a}, ${b}]`);
  if (!(absoluteTolerance > 0)) throw new RangeError(`integration needs a tolerance > 0, found ${absoluteTolerance}`);
  if (a === b) return { value: 0, errorEstimate: 0 };
  const edges = [a, ...[...new Set(cuts)].filter((c) => c > a && c < b).sort((x, y) => x - y), b];
  const pieces: Array<[number, number]> = [];
  for (let i = 1; i < edges.length; i++) {
    const [lo, hi] = [edges[i - 1]!, edges[i]!];
    for (let p = 0; p < minimumPieces; p++)
      pieces.push([lo + ((hi - lo) * p) / minimumPieces, p === minimumPieces - 1 ? hi : lo + ((hi - lo) * (p + 1)) / minimumPieces]);
  }
  let value = 0;
  let errorEstimate = 0;
  for (const [lo, hi] of pieces) {
    const fa = f(lo);
    const fb = f(hi);
    const fm = f((lo + hi) / 2);
    const piece = adaptive(f, lo, hi, fa, fm, fb, simpson(lo, hi, fa, fm, fb), (absoluteTolerance * (hi - lo)) / (b - a), DEEPEST);
    value += piece.value;
    errorEstimate += piece.errorEstimate;
  }
  return { value, errorEstimate };
}

function simpson(a: number, b: number, fa: number, fm: number, fb: number): number {
  return ((b - a) / 6) * (fa + 4 * fm + fb);
}

function adaptive(
  f: (x: number) => number,
  a: number,
  b: number,
  fa: number,
  fm: number,
  fb: number,
  whole: number,
  tolerance: number,
  depth: number,
): Quadrature {
  const m = (a + b) / 2;
  const flm = f((a + m) / 2);
  const frm = f((m + b) / 2);
  const left = simpson(a, m, fa, flm, fm);
  const right = simpson(m, b, fm, frm, fb);
  const difference = left + right - whole;
  if (depth <= 0 || Math.abs(difference) <= 15 * tolerance || m <= a || m >= b) {
    return { value: left + right + difference / 15, errorEstimate: Math.abs(difference) / 15 };
  }
  const l = adaptive(f, a, m, fa, flm, fm, left, tolerance / 2, depth - 1);
  const r = adaptive(f, m, b, fm, frm, fb, right, tolerance / 2, depth - 1);
  return { value: l.value + r.value, errorEstimate: l.errorEstimate + r.errorEstimate };
}
