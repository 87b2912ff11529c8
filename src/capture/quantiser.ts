/**
 * Quantises a record in place to a converter of `bits` bits, full scale ±1:
 * step q = 2^(1−bits), codes −2^(bits−1) … 2^(bits−1) − 1 (mid-tread), values
 * beyond full scale clipped to the end codes.
 *
 * With `dither` a uniform value of ±½ step is added before rounding (the
 * converter's own noise stands in for it). A whole-cycle tone repeats exactly
 * over the record, so without it the quantisation error repeats too and
 * shows as spurs at multiples of the tone rather than as noise; uniform
 * dither of one step makes the error's mean independent of the signal, which
 * removes those spurs at the cost of doubling the noise power (common
 * practice, no source).
 *
 * @param samples the record, overwritten with the quantised values
 * @param bits resolution, 1..32
 * @param dither a uniform generator on [0, 1), or null for none
 * @returns the number of samples clipped
 * @example (() => { const x = Float64Array.of(0.3, 2); const clipped = quantise(x, 2, null); return [...x, clipped]; })() // [0.5, 0.5, 1] (the record, then the samples clipped)
 */
export function quantise(samples: Float64Array, bits: number, dither: (() => number) | null): number {
  const step = 2 ** (1 - bits);
  const lowest = -(2 ** (bits - 1));
  const highest = 2 ** (bits - 1) - 1;
  let clipped = 0;
  for (let n = 0; n < samples.length; n++) {
    const level = samples[n]! / step + (dither ? dither() - 0.5 : 0);
    let code = Math.round(level);
    if (code > highest) [code, clipped] = [highest, clipped + 1];
    else if (code < lowest) [code, clipped] = [lowest, clipped + 1];
    samples[n] = code * step;
  }
  return clipped;
}
