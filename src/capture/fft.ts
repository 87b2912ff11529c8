import { phaseTable, type PhaseTable } from './phase-table.js';

/**
 * A small radix-2 FFT, so that the capture does not depend at run time on a
 * test-only library. Forward transform X[k] = Σₙ x[n]·e^(−2πi·kn/N), no
 * scaling. Twiddles are read from phaseTable, each computed from its index
 * in one expression (cos(2π·j/N)), not by accumulated rotation, so every
 * factor is as exact as Math.cos allows; a real transform of N samples and
 * its complex one of N/2 read one table of N, which the capture's tones and
 * window read too.
 */

/**
 * Whether n is a power of two ≥ 1.
 *
 * @example isPowerOfTwo(65536) // true
 */
export function isPowerOfTwo(n: number): boolean {
  return Number.isInteger(n) && n >= 1 && (n & (n - 1)) === 0;
}

/**
 * In-place complex FFT (iterative decimation in time: bit-reversal, then
 * log2(N) butterfly stages).
 *
 * @param re real parts, length N (a power of two); overwritten by Re X[k]
 * @param im imaginary parts, length N; overwritten by Im X[k]
 * @throws RangeError when the lengths differ or are not a power of two
 * @example (() => { const re = Float64Array.of(1, 0, 0, 0), im = new Float64Array(4); fftInPlace(re, im); return re; })() // [1, 1, 1, 1]
 */
export function fftInPlace(re: Float64Array, im: Float64Array): void {
  const n = re.length;
  if (im.length !== n || !isPowerOfTwo(n))
    throw new RangeError(`FFT needs two arrays of one power-of-two length, got ${re.length} and ${im.length}`);
  transform(re, im, phaseTable(n));
}

/** fftInPlace on checked arrays, its twiddles read from a table of any power-of-two length L ≥ N (entry j·L/N). */
function transform(re: Float64Array, im: Float64Array, table: PhaseTable): void {
  const n = re.length;
  for (let i = 1, j = 0; i < n; i++) {
    let bit = n >> 1;
    for (; j & bit; bit >>= 1) j ^= bit;
    j ^= bit;
    if (i < j) {
      const r = re[i]!;
      re[i] = re[j]!;
      re[j] = r;
      const m = im[i]!;
      im[i] = im[j]!;
      im[j] = m;
    }
  }
  const { cos, sin } = table;
  const stride = cos.length / n;
  for (let size = 2; size <= n; size <<= 1) {
    const half = size >> 1;
    const step = (n / size) * stride;
    for (let start = 0; start < n; start += size) {
      for (let k = 0; k < half; k++) {
        const wr = cos[k * step]!;
        const wi = -sin[k * step]!;
        const a = start + k;
        const b = a + half;
        const tr = wr * re[b]! - wi * im[b]!;
        const ti = wr * im[b]! + wi * re[b]!;
        re[b] = re[a]! - tr;
        im[b] = im[a]! - ti;
        re[a] = re[a]! + tr;
        im[a] = im[a]! + ti;
      }
    }
  }
}

/** Bins 0..N/2 of the FFT of a real record. */
export interface HalfSpectrum {
  readonly re: Float64Array;
  readonly im: Float64Array;
}

/**
 * FFT of a real record of N samples, bins 0..N/2 (the rest are their
 * conjugates). Done as one complex FFT of N/2 points on z[m] = x[2m] +
 * i·x[2m+1], then split: with E, O the transforms of the even and odd
 * samples, Z[k] = E[k] + i·O[k], so E[k] = (Z[k] + conj Z[N/2−k])/2,
 * O[k] = (Z[k] − conj Z[N/2−k])/(2i), and X[k] = E[k] + e^(−2πik/N)·O[k].
 *
 * @param samples real record, length N (a power of two ≥ 2)
 * @returns Re and Im of X[0..N/2], length N/2 + 1
 * @throws RangeError when N is not a power of two ≥ 2
 * @example realFft(Float64Array.of(1, 1, 1, 1)).re // [4, 0, 0]
 */
export function realFft(samples: ArrayLike<number>): HalfSpectrum {
  const n = samples.length;
  if (!isPowerOfTwo(n) || n < 2) throw new RangeError(`real FFT needs a power-of-two length ≥ 2, got ${n}`);
  const half = n >> 1;
  const zr = new Float64Array(half);
  const zi = new Float64Array(half);
  for (let m = 0; m < half; m++) {
    zr[m] = samples[2 * m]!;
    zi[m] = samples[2 * m + 1]!;
  }
  const table = phaseTable(n);
  transform(zr, zi, table);
  const re = new Float64Array(half + 1);
  const im = new Float64Array(half + 1);
  for (let k = 0; k <= half; k++) {
    const a = k % half;
    const b = (half - k) % half;
    const er = (zr[a]! + zr[b]!) / 2;
    const ei = (zi[a]! - zi[b]!) / 2;
    const or = (zi[a]! + zi[b]!) / 2;
    const oi = (zr[b]! - zr[a]!) / 2;
    const c = table.cos[k]!;
    const s = -table.sin[k]!;
    re[k] = er + c * or - s * oi;
    im[k] = ei + c * oi + s * or;
  }
  return { re, im };
}
