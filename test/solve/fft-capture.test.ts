import { guardBands } from '../../src/math/band.js';
import { describe, expect, it } from 'vitest';
import FFT from 'fft.js';
import { db, hz, ppm } from '../../src/units/quantities.js';
import type { Interferer } from '../../src/interferers/interferer.js';
import type { PlanContext } from '../../src/solve/plan-context.js';
import { solvePlan } from '../../src/plan/solve-plan.js';
import { evaluateRate, type RateEvaluation } from '../../src/solve/evaluate-rate.js';
import { PLAIN_CLOCKING } from '../helpers/hand-worked-plan.js';

/**
 * A simulated capture, with fft.js (a general-purpose FFT from the npm
 * registry) as the independent reference: three tones across the wanted band
 * pass through the polynomial nonlinearity y = x + a2·x² + a3·x³, are sampled
 * at each rate the solver puts forward, and every peak of the spectrum must
 * sit inside an aliased segment the solver reports.
 *
 * What the polynomial makes (trigonometric product identities; common
 * practice, no source): from x = Σ Aᵢ·cos(2π fᵢ t), x² holds fᵢ + fⱼ (inside
 * 2·[low, high], the 2nd harmonic's extent) and |fᵢ − fⱼ| (inside [0, B], with
 * DC); x³ holds fᵢ + fⱼ + fₖ (inside 3·[low, high], the 3rd harmonic's extent)
 * and fᵢ + fⱼ − fₖ (inside [2·low − high, 2·high − low]: the tones themselves
 * and the in-band third-order products). The plan's blocking interferers are
 * the 2nd and 3rd harmonics (kind 'harmonic', extents k·[low, high]); the
 * difference and in-band products, which no sampling rate can move off the
 * band, are carried as non-blocking checks so that their segments are
 * reported too.
 *
 * Coherent capture: each tone is a whole number mᵢ of cycles in N samples
 * (fᵢ = mᵢ·r/N), so every product is a whole number of cycles too and falls
 * on one bin with no leakage.
 */

const MHZ = 1e6;
const N = 8192;
const BAND = { low: 61 * MHZ, high: 64 * MHZ };
const B = BAND.high - BAND.low;
const A2 = 0.05;
const A3 = 0.02;
const MARGIN = 0.5 * MHZ;

function extent(label: string, kind: Interferer['kind'], order: number | null, low: number, high: number, isBlocking: boolean): Interferer {
  return {
    label,
    kind,
    order,
    source: label,
    rateMultiple: 0,
    shiftMultiple: 0,
    low: hz(low),
    high: hz(high),
    level: db(isBlocking ? -60 : -120),
    requiredMargin: hz(MARGIN),
    blocking: isBlocking,
  };
}

const context: PlanContext = {
  band: { low: hz(BAND.low), high: hz(BAND.high) },
  guard: guardBands(hz(0.5 * MHZ), hz(0.5 * MHZ)),
  limits: { minRate: hz(20 * MHZ), maxRate: hz(50 * MHZ) },
  interferers: [
    extent('H2', 'harmonic', 2, 2 * BAND.low, 2 * BAND.high, true),
    extent('H3', 'harmonic', 3, 3 * BAND.low, 3 * BAND.high, true),
    extent('IM2 difference', 'intermod', 2, 0, B, false),
    extent('IM3 in band', 'intermod', 3, 2 * BAND.low - BAND.high, 2 * BAND.high - BAND.low, false),
  ],
  levelThreshold: db(-90),
  clocks: [],
  clocking: PLAIN_CLOCKING,
  goal: { kind: 'widest-margin' },
  tolerancePpm: ppm(20),
};

interface Tone {
  readonly cycles: number;
  readonly amplitude: number;
}

/** |X[k]| for k = 0..N/2 of the nonlinearity's output (fft.js realTransform). */
function capture(tones: readonly Tone[]): number[] {
  const samples = new Array<number>(N);
  for (let n = 0; n < N; n++) {
    // (m·n mod N)/N keeps the phase exact for large n.
    let x = 0;
    for (const t of tones) x += t.amplitude * Math.cos((2 * Math.PI * ((t.cycles * n) % N)) / N);
    samples[n] = x + A2 * x * x + A3 * x * x * x;
  }
  const fft = new FFT(N);
  const out = fft.createComplexArray() as number[];
  fft.realTransform(out, samples);
  return Array.from({ length: N / 2 + 1 }, (_, k) => Math.hypot(out[2 * k]!, out[2 * k + 1]!));
}

/** Bin of a whole number of cycles after sampling: k mod N, folded about N/2 (definition of aliasing, in bins). */
const foldBin = (cycles: number) => {
  const k = ((cycles % N) + N) % N;
  return Math.min(k, N - k);
};

/** Every product of the polynomial, by family, as cycle counts in the record (the identities above). */
function products(m: readonly number[]): Record<string, number[]> {
  const pairs = m.flatMap((a) => m.map((b) => [a, b] as const));
  const triples = pairs.flatMap(([a, b]) => m.map((c) => [a, b, c] as const));
  return {
    wanted: [...m],
    H2: pairs.map(([a, b]) => a + b),
    'IM2 difference': pairs.map(([a, b]) => Math.abs(a - b)),
    H3: triples.map(([a, b, c]) => a + b + c),
    'IM3 in band': triples.map(([a, b, c]) => a + b - c),
  };
}

function segmentsOf(evaluation: RateEvaluation, family: string): (readonly [number, number])[] {
  if (family === 'wanted') return [[evaluation.image!.low, evaluation.image!.high]];
  return evaluation.checks.find((c) => c.label === family)!.alias.map(([lo, hi]) => [lo, hi] as const);
}

const inside = (f: number, segments: readonly (readonly [number, number])[], slack: number) =>
  segments.some(([lo, hi]) => f >= lo - slack && f <= hi + slack);

describe('simulated capture (fft.js): every harmonic and intermodulation peak where the solver says', () => {
  const result = solvePlan(context);
  const passing = result.candidates.filter((c) => c.evaluation.pass);

  it('the solver puts forward passing rates in several zones, inverted and not', () => {
    expect(passing.length).toBeGreaterThanOrEqual(3);
    expect(new Set(passing.map((c) => c.evaluation.inverted))).toEqual(new Set([true, false]));
  });

  for (const candidate of passing) {
    const rate = candidate.evaluation.rate;
    it(`${candidate.label} at ${(rate / MHZ).toFixed(6)} MHz (zone ${candidate.evaluation.zone})`, () => {
      const evaluation = evaluateRate(context, rate, ppm(0));
      const binWidth = rate / N;
      // Three tones at about 20 %, 50 % and 85 % across the band, each a whole number of cycles.
      const m = [0.2, 0.5, 0.85].map((x) => Math.round(((BAND.low + x * B) * N) / rate));
      for (const cycles of m) {
        expect(cycles * binWidth).toBeGreaterThan(BAND.low);
        expect(cycles * binWidth).toBeLessThan(BAND.high);
      }
      const spectrum = capture(m.map((cycles, i) => ({ cycles, amplitude: [0.3, 0.25, 0.2][i]! })));
      const threshold = 1e-9 * Math.max(...spectrum);
      const slack = 1e-9 * rate; // floating-point noise of the bin frequency and of the segment edges

      // 1. Every product family lands inside its own reported segments, and the FFT shows a peak there.
      const families = products(m);
      for (const [family, list] of Object.entries(families)) {
        const segments = segmentsOf(evaluation, family);
        for (const cycles of list) {
          const bin = foldBin(cycles);
          if (family === 'IM2 difference' && bin === 0) continue; // DC: the x² term's constant, folded nowhere
          expect(inside(bin * binWidth, segments, slack), `${family} product at bin ${bin}`).toBe(true);
          expect(spectrum[bin]!, `${family} peak at bin ${bin}`).toBeGreaterThan(threshold);
        }
      }

      // 2. fft.js as the reference: every bin above the threshold is explained by some reported segment.
      const all = Object.keys(families).flatMap((f) => segmentsOf(evaluation, f));
      const peaks = spectrum.flatMap((mag, bin) => (mag > threshold ? [bin] : []));
      console.info(`${candidate.label}: ${peaks.length} bins above the threshold, all explained`);
      for (const bin of peaks)
        if (bin !== 0) expect(inside(bin * binWidth, all, slack), `peak at bin ${bin} (${bin * binWidth} Hz)`).toBe(true);
      // ...and the strongest three are the tones, inside the wanted image.
      const strongest = [...peaks].sort((a, b) => spectrum[b]! - spectrum[a]!).slice(0, 3);
      expect(strongest.sort((a, b) => a - b)).toEqual(m.map(foldBin).sort((a, b) => a - b));
      for (const bin of strongest) expect(inside(bin * binWidth, segmentsOf(evaluation, 'wanted'), slack)).toBe(true);

      // 3. The solver's promise, seen on the spectrum: no 2nd- or 3rd-harmonic peak within the margin of the band's alias.
      const image = evaluation.image!;
      for (const family of ['H2', 'H3']) {
        for (const cycles of families[family]!) {
          const f = foldBin(cycles) * binWidth;
          const distance = f < image.low ? image.low - f : f > image.high ? f - image.high : 0;
          expect(distance, `${family} product at ${f} Hz`).toBeGreaterThanOrEqual(MARGIN - slack);
        }
      }
    });
  }
});
