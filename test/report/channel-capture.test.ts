import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import FFT from 'fft.js';
import { hz } from '../../src/units/quantities.js';
import { readScenarioFile } from '../../src/cli/read-scenario.js';
import { planScenario } from '../../src/plan/plan-scenario.js';
import { verifyCaptureWithSpectrum } from '../../src/report/verify-capture.js';
import type { VerifyResult } from '../../src/report/verify-result.js';

/**
 * verify with tones in three channels: GPS L1, L2 and L5 digitised together
 * at RF, the capture of each rate set against fft.js (a general-purpose FFT
 * from the npm registry) of the same tones, windowed by the 4-term
 * Blackman–Harris window (coefficients 0.35875, 0.48829, 0.14128, 0.01168:
 * Harris, "On the use of windows for harmonic analysis with the discrete
 * Fourier transform", Proc. IEEE 66(1), 1978).
 *
 * Centres: L1 1575.42 MHz and L2 1227.60 MHz (IS-GPS-200), L5 1176.45 MHz
 * (IS-GPS-705). Widths: twice the chip rate (the main lobe, common
 * practice): 2.046 MHz for the C/A code on L1, 20.46 MHz for P(Y) on L2 and
 * for L5 (chip rates from the same specifications, from memory). Aliases
 * kept 1 MHz apart. The converter states no harmonic or spur, so what the
 * capture shows is the channels' own tones: where each channel lands, in
 * which order, and on which other channel.
 *
 * Where a tone shows is checked against the definition of aliasing,
 * |f − r·round(f/r)| (common practice), and against fft.js's peak.
 */
const MHZ = 1e6;
const N = 16384;
const TONES = 3;
const SIGNALS = [
  { label: 'L1', centre: 1575.42e6, width: 2.046e6 },
  { label: 'L2', centre: 1227.6e6, width: 20.46e6 },
  { label: 'L5', centre: 1176.45e6, width: 20.46e6 },
];

const dir = mkdtempSync(join(tmpdir(), 'ifzone-channel-capture-'));
const file = join(dir, 'gps.json');
writeFileSync(
  file,
  JSON.stringify({
    name: 'GPS L1/L2/L5 direct RF (test)',
    wanted: SIGNALS.map((s) => ({ label: s.label, center: s.centre, width: s.width, weakestLevel: -60, strongestLevel: -10 })),
    converter: { label: 'RF sampler', minRate: '80M', maxRate: '250M', inputBandwidth: '2G', bits: 12, harmonics: {} },
    requirements: { margin: '1M', rejection: 10, tolerancePpm: 0, channelSpacing: '1M' },
    goal: 'lowest-rate',
  }),
);
const scenario = readScenarioFile(file);
const report = planScenario(scenario);

const alias = (f: number, rate: number) => Math.abs(f - rate * Math.round(f / rate));

/** The level of each bin 0..N/2 of the sampled tones, by fft.js, under the Blackman–Harris window, dBFS (a full-scale sine: 0). */
function fftLevels(tones: ReadonlyArray<{ frequency: number; level: number }>, rate: number): Float64Array {
  const samples = new Array<number>(N).fill(0);
  const [a0, a1, a2, a3] = [0.35875, 0.48829, 0.14128, 0.01168];
  for (const t of tones) {
    const amplitude = 10 ** (t.level / 20);
    for (let n = 0; n < N; n++) samples[n]! += amplitude * Math.cos((2 * Math.PI * t.frequency * n) / rate);
  }
  for (let n = 0; n < N; n++) {
    const phase = (2 * Math.PI * n) / N;
    samples[n]! *= a0 - a1 * Math.cos(phase) + a2 * Math.cos(2 * phase) - a3 * Math.cos(3 * phase);
  }
  const fft = new FFT(N);
  const out = fft.createComplexArray() as number[];
  fft.realTransform(out, samples);
  const levels = new Float64Array(N / 2 + 1);
  for (let k = 0; k <= N / 2; k++) levels[k] = 20 * Math.log10(Math.hypot(out[2 * k]!, out[2 * k + 1]!) / ((N / 2) * a0) + 1e-300);
  return levels;
}

/** The channel's tones as the capture synthesised them, in input order, each with the bin fft.js peaks at (near its alias). */
function channelTones(result: VerifyResult, label: string, fft: Float64Array) {
  return result.tones
    .filter((t) => t.role === 'wanted' && t.label.startsWith(`${label}.`))
    .sort((a, b) => a.frequency - b.frequency)
    .map((t) => {
      const near = Math.round((alias(t.frequency, result.rate) * N) / result.rate);
      const bin = [near - 1, near, near + 1].reduce((best, k) => (fft[k]! > fft[best]! ? k : best), near);
      return { tone: t, bin, level: fft[bin]! };
    });
}

function verified(rate: number) {
  const { result, levels } = verifyCaptureWithSpectrum(scenario, { rate: hz(rate), samples: N, wantedTones: TONES });
  const fft = fftLevels(
    result.tones.filter((t) => t.role === 'wanted'),
    rate,
  );
  return { result, levels, fft };
}

describe('verify with tones in three GPS channels, against fft.js', () => {
  const passing = report.candidates.filter((c) => c.pass).slice(0, 4);

  it('the plan offers passing rates to capture', () => {
    expect(passing.length).toBeGreaterThanOrEqual(2);
  });

  for (const candidate of passing) {
    it(`at ${(candidate.rate / MHZ).toFixed(6)} MHz each channel's tones show where folding and fft.js put them, whole, in the plan's order`, () => {
      const { result, levels, fft } = verified(candidate.rate);
      expect(result.channels.map((c) => c.label)).toEqual(['L1', 'L2', 'L5']);
      for (const [i, channel] of result.channels.entries()) {
        const plan = candidate.channels[i]!;
        const tones = channelTones(result, channel.label, fft);
        expect(tones).toHaveLength(TONES);
        for (const { tone, bin, level } of tones) {
          // fft.js peaks where folding puts the tone, and the capture measures the same level there (its own FFT, quantised, dithered).
          expect(Math.abs((bin * result.rate) / N - alias(tone.frequency, result.rate))).toBeLessThanOrEqual(result.binWidth);
          expect(level).toBeCloseTo(tone.level, 1);
          expect(Math.abs(levels[bin]! - level)).toBeLessThan(0.5);
          // Inside the plan's image of this channel.
          expect((bin * result.rate) / N).toBeGreaterThanOrEqual(plan.image!.low - result.binWidth);
          expect((bin * result.rate) / N).toBeLessThanOrEqual(plan.image!.high + result.binWidth);
        }
        // The order fft.js shows: rising for an upright zone, falling for an inverted one; the capture reads the same.
        const rising = tones.every((t, k) => k === 0 || t.bin > tones[k - 1]!.bin);
        const falling = tones.every((t, k) => k === 0 || t.bin < tones[k - 1]!.bin);
        expect(rising || falling).toBe(true);
        expect(falling).toBe(plan.inverted);
        expect(channel.order).toBe(falling ? 'inverted' : 'upright');
        expect(channel.tonesSeen).toBe(TONES);
        expect(channel.zone).toBe(plan.zone);
        expect(channel.intrusions).toEqual([]);
        expect(channel.consistent, channel.contradictions.join('\n')).toBe(true);
      }
      expect(result.consistent, result.contradictions.join('\n')).toBe(true);
    });
  }

  // Where one channel's alias lands on another's: the middle of ranges the plan blocks for a channel check.
  const collisions = report.blocked.filter((b) => /^L\d: L\d$/.test(b.label) && b.maxRate - b.minRate > 0.2 * MHZ);

  it('the plan blocks rates where two channels collide', () => {
    expect(collisions.length).toBeGreaterThan(0);
  });

  it("where two channels collide, the capture shows one channel's tones on the other, each named, confirming the plan's failure", () => {
    // Three tones stand for a band: where a narrow channel meets a wide one they may all miss it, so the ranges are tried until
    // four show a tone landing, by fft.js.
    let shown = 0;
    for (const blocked of collisions) {
      if (shown === 4) break;
      const rate = (blocked.minRate + blocked.maxRate) / 2;
      const [victim, other] = blocked.label.split(': ') as [string, string];
      const { result, fft } = verified(rate);
      const side = result.channels.find((c) => c.label === victim)!;
      const [low, high] = [Math.min(...side.image.map((s) => s[0])), Math.max(...side.image.map((s) => s[1]))];
      const landing = channelTones(result, other, fft).filter(({ bin }) => {
        const f = (bin * rate) / N;
        return f > low - 1 * MHZ + result.binWidth && f < high + 1 * MHZ - result.binWidth && fft[bin]! > side.threshold;
      });
      if (landing.length === 0) continue;
      shown++;
      expect(side.planPass, `${blocked.label} at ${rate}`).toBe(false);
      // Each tone fft.js finds on (or within 1 MHz of) the victim's image is an intrusion the capture names.
      for (const { bin } of landing) expect(side.intrusions.some((p) => Math.abs(p.bin - bin) <= 1)).toBe(true);
      // The plan fails there for this very reason: no contradiction.
      expect(result.consistent, result.contradictions.join('\n')).toBe(true);
    }
    console.info(`channel collisions captured: ${shown} of ${collisions.length} blocked ranges tried`);
    expect(shown).toBeGreaterThan(0);
  });
});
