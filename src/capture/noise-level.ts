/**
 * The mean level of the quantisation noise in one bin, read on the tone
 * scale of levelSpectrum, dBFS. Each error source (the rounding, and the
 * uniform dither when used) is white with variance q²/12, q = 2^(1−bits) (the
 * model behind the 6.02·N + 1.76 dB ideal SNR, IEEE Std 1241-2010). White
 * noise of variance σ² puts σ²·Σw² into each bin of the windowed FFT, and
 * the tone scale multiplies |X|² by 4/(N·g)², so the bin reads
 * 10·log10(4·σ²·B/N) with B = N·Σw²/(Σw)² the noise bandwidth in bins.
 * The median bin sits 10·log10(ln 2) ≈ −1.59 dB below this mean (the power
 * of a noise bin is exponentially distributed).
 *
 * @param bits converter resolution
 * @param samples record length N
 * @param noiseBandwidthBins the window's B
 * @param dithered whether one step of uniform dither was added
 * @returns dBFS
 * @example expectedNoiseLevel(14, 65536, 2.0044, true) // -125.2
 */
export function expectedNoiseLevel(bits: number, samples: number, noiseBandwidthBins: number, dithered: boolean): number {
  const step = 2 ** (1 - bits);
  const variance = ((dithered ? 2 : 1) * step * step) / 12;
  return 10 * Math.log10((4 * variance * noiseBandwidthBins) / samples);
}
