import { describe, expect, it } from 'vitest';
import FFT from 'fft.js';
import { hz } from '../../src/units/quantities.js';
import { jointFeasibleSet, type JointInterval } from '../../src/solve/joint-feasible-set.js';

/**
 * Three GPS signals digitised together at RF, every reported rate confirmed
 * by sampling tones placed across each band and transforming them with
 * fft.js (a general-purpose FFT from the npm registry).
 *
 * Centres: L1 1575.42 MHz and L2 1227.60 MHz (IS-GPS-200), L5 1176.45 MHz
 * (IS-GPS-705). Widths: the main lobe of each spreading code, twice its chip
 * rate (common practice): C/A on L1 at 1.023 Mchip/s, 2.046 MHz; P(Y) on L2
 * and the L5 codes at 10.23 Mchip/s, 20.46 MHz (chip rates from the same
 * specifications, from memory). The aliases are kept 1 MHz apart.
 *
 * Every tone is coherent (an integer number of cycles in the record, moved
 * inside its band by at most one bin), so it lands on one bin with no
 * leakage. At each rate tested the spectrum must show, for every band: one
 * peak per tone (no tone folded onto another), the peaks in the order of the
 * tones (the band whole, not folded on itself), each where the reported zone
 * and inversion put it; and the bands' peaks at least 1 MHz apart, also in
 * one capture of all the tones together. At the middle of every gap between
 * reported intervals the same checks must fail.
 */
const SIGNALS = [
  { name: 'L1 C/A', centre: 1575.42e6, width: 2.046e6 },
  { name: 'L2 P(Y)', centre: 1227.6e6, width: 20.46e6 },
  { name: 'L5', centre: 1176.45e6, width: 20.46e6 },
];
const BANDS = SIGNALS.map((s) => ({ low: hz(s.centre - s.width / 2), high: hz(s.centre + s.width / 2) }));
const SPACING = 1e6;
const N = 8192;
const TONES_PER_BAND = 17;
const LIMITS = { minRate: hz(80e6), maxRate: hz(250e6) };

interface Tone {
  readonly frequency: number;
  readonly amplitude: number;
}

/** Tones from the low edge to the high edge of a band, each on a whole bin, with distinct amplitudes 1, 0.95, 0.9, … */
function bandTones(band: { low: number; high: number }, rate: number): Tone[] {
  const bin = rate / N;
  return Array.from({ length: TONES_PER_BAND }, (_, t) => {
    const target = band.low + ((band.high - band.low) * t) / (TONES_PER_BAND - 1);
    let cycles = Math.round(target / bin);
    if (cycles * bin < band.low) cycles++;
    if (cycles * bin > band.high) cycles--;
    return { frequency: (cycles * rate) / N, amplitude: 1 - 0.05 * t };
  });
}

/** The peaks of the sampled sum of cosines: frequency and amplitude (fft.js realTransform, bins 0..N/2). */
function peaks(tones: readonly Tone[], rate: number): { frequency: number; amplitude: number }[] {
  const samples = new Array<number>(N).fill(0);
  for (const { frequency, amplitude } of tones) {
    for (let n = 0; n < N; n++) samples[n]! += amplitude * Math.cos((2 * Math.PI * frequency * n) / rate);
  }
  const fft = new FFT(N);
  const out = fft.createComplexArray() as number[];
  fft.realTransform(out, samples);
  const found: { frequency: number; amplitude: number }[] = [];
  for (let k = 0; k <= N / 2; k++) {
    const scale = k === 0 || k === N / 2 ? N : N / 2;
    const amplitude = Math.hypot(out[2 * k]!, out[2 * k + 1]!) / scale;
    if (amplitude > 0.1) found.push({ frequency: (k * rate) / N, amplitude });
  }
  return found;
}

/** What the spectrum shows wrong at one rate, in words; empty when every band is whole, where the zones say, and apart. */
function spectrumProblems(rate: number, zones: readonly number[] | null): string[] {
  const problems: string[] = [];
  const hulls: { low: number; high: number }[] = [];
  const allTones: Tone[] = [];
  BANDS.forEach((band, b) => {
    const tones = bandTones(band, rate);
    allTones.push(...tones);
    const seen = peaks(tones, rate);
    if (seen.length !== tones.length) {
      problems.push(`${SIGNALS[b]!.name}: ${seen.length} peaks for ${tones.length} tones`);
      return;
    }
    // Each peak is the tone of the nearest amplitude; the amplitudes are 0.05 apart.
    const byTone = tones.map((tone) => seen.find((p) => Math.abs(p.amplitude - tone.amplitude) < 0.01));
    if (byTone.some((p) => p === undefined)) {
      problems.push(`${SIGNALS[b]!.name}: a peak of the wrong strength (tones added in one bin)`);
      return;
    }
    const at = byTone.map((p) => p!.frequency);
    const rising = at.every((f, t) => t === 0 || f > at[t - 1]!);
    const falling = at.every((f, t) => t === 0 || f < at[t - 1]!);
    if (!rising && !falling) problems.push(`${SIGNALS[b]!.name}: folded onto itself`);
    if (zones) {
      // Where zone n puts a tone (facts of the trade): f − (n − 1)/2·rate in an odd zone, n/2·rate − f in an even one.
      const n = zones[b]!;
      const predicted = tones.map((tone) => (n % 2 === 1 ? tone.frequency - ((n - 1) / 2) * rate : (n / 2) * rate - tone.frequency));
      if (predicted.some((f, t) => Math.abs(f - at[t]!) > rate / N / 2)) problems.push(`${SIGNALS[b]!.name}: not where zone ${n} puts it`);
      if (n % 2 === 0 ? !falling : !rising) problems.push(`${SIGNALS[b]!.name}: inversion not as zone ${n} says`);
    }
    hulls.push({ low: Math.min(...at), high: Math.max(...at) });
  });
  for (let i = 0; i < hulls.length; i++) {
    for (let k = i + 1; k < hulls.length; k++) {
      const gap = Math.max(hulls[k]!.low - hulls[i]!.high, hulls[i]!.low - hulls[k]!.high);
      if (gap < SPACING * (1 - 1e-9)) problems.push(`${SIGNALS[i]!.name} and ${SIGNALS[k]!.name} ${gap} Hz apart`);
    }
  }
  if (problems.length === 0 && peaks(allTones, rate).length !== allTones.length) problems.push('tones of two bands share a bin');
  return problems;
}

describe('GPS L1, L2 and L5 sampled together (IS-GPS-200, IS-GPS-705), confirmed with fft.js', () => {
  const set = jointFeasibleSet(BANDS, hz(SPACING), LIMITS);

  it('has valid rates from 80 to 250 MHz to check', () => {
    // No reference for the count: the check below is what matters; it must have something to check.
    expect(set.feasible.length).toBeGreaterThan(10);
    expect(set.lowestRate).toBe(set.feasible[0]!.minRate);
  });

  it('at each valid interval’s edges and centre every band is whole, where its zone says, and 1 MHz from the others', () => {
    const checked: string[] = [];
    for (const interval of set.feasible) {
      for (const rate of ratesIn(interval)) {
        expect(spectrumProblems(rate, interval.zones), `${rate} Hz, zones ${interval.zones.join('/')}`).toEqual([]);
        checked.push(String(rate));
      }
    }
    expect(checked.length).toBeGreaterThan(30);
  });

  it('in the middle of every gap between valid intervals the spectrum shows a fold or two bands too close', () => {
    for (let i = 0; i + 1 < set.feasible.length; i++) {
      const rate = (set.feasible[i]!.maxRate + set.feasible[i + 1]!.minRate) / 2;
      expect(spectrumProblems(rate, null), `${rate} Hz`).not.toEqual([]);
    }
  });
});

function ratesIn(interval: JointInterval): number[] {
  if (interval.minRate === interval.maxRate) return [interval.minRate];
  return [interval.minRate, (interval.minRate + interval.maxRate) / 2, interval.maxRate];
}
