import FFT from 'fft.js';

/**
 * A direct numeric evaluation of the memoryless polynomial converter
 * y = x + a2·x² + a3·x³, transformed with fft.js (a general-purpose FFT from
 * the npm registry). Tones sit on exact bins of an N-point record (coherent
 * sampling), so a rectangular window leaks nothing and a cosine of amplitude
 * A reads 2·|X[k]|/N at its bin. Levels are dBFS, full scale amplitude 1.
 */
export const RECORD = 1 << 14;
export const A2 = 3e-4;
export const A3 = 2e-4;

/** The levels, dBFS, at the given bins of the converter's output for a sum of cosines. */
export function polynomialSpectrum(tones: ReadonlyArray<{ bin: number; amplitude: number }>, bins: readonly number[]): number[] {
  const x = new Array<number>(RECORD);
  for (let n = 0; n < RECORD; n++) {
    let v = 0;
    for (const t of tones) v += t.amplitude * Math.cos((2 * Math.PI * t.bin * n) / RECORD);
    x[n] = v + A2 * v * v + A3 * v * v * v;
  }
  const fft = new FFT(RECORD);
  const out = fft.createComplexArray() as number[];
  fft.realTransform(out, x);
  return bins.map((k) => 20 * Math.log10((2 * Math.hypot(out[2 * k]!, out[2 * k + 1]!)) / RECORD));
}

/** An amplitude as a level, dBFS. */
export const dbfs = (amplitude: number) => 20 * Math.log10(amplitude);
