import { beforeAll, describe, expect, it } from 'vitest';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import FFT from 'fft.js';
import { ensureBuilt, runBin } from '../helpers/run-bin.js';

/**
 * Three GPS signals as the channels of one scenario, solved through the real
 * bin/ifzone, every valid rate it reports confirmed by an FFT (fft.js, a
 * general-purpose FFT from the npm registry) of tones placed across each band.
 *
 * Centres: L1 1575.42 MHz and L2 1227.60 MHz (IS-GPS-200), L5 1176.45 MHz
 * (IS-GPS-705). Widths: the main lobe of each spreading code, twice its chip
 * rate (common practice): C/A on L1 at 1.023 Mchip/s, 2.046 MHz; P(Y) on L2
 * and the L5 codes at 10.23 Mchip/s, 20.46 MHz (chip rates from the same
 * specifications, from memory). The channels' aliases are kept 1 MHz apart
 * (channelSpacing); the converter states no harmonic or spur, so only the
 * channels themselves constrain the rate. Rates 80–250 MHz, no drift.
 */

const SIGNALS = [
  { label: 'L1', centre: 1575.42e6, width: 2.046e6 },
  { label: 'L2', centre: 1227.6e6, width: 20.46e6 },
  { label: 'L5', centre: 1176.45e6, width: 20.46e6 },
];
const SPACING = 1e6;
const N = 8192;
const TONES = 9;

const scenario = {
  name: 'GPS L1/L2/L5 direct RF',
  wanted: SIGNALS.map((s) => ({ label: s.label, center: s.centre, width: s.width, weakestLevel: -60, strongestLevel: -10 })),
  converter: { label: 'RF sampler', minRate: '80M', maxRate: '250M', inputBandwidth: '2G', bits: 12, harmonics: {} },
  requirements: { margin: '1M', rejection: 10, tolerancePpm: 0, channelSpacing: SPACING },
  goal: 'lowest-rate',
};

interface Tone {
  readonly frequency: number;
  readonly amplitude: number;
}

/** Tones from edge to edge of a band, each on a whole bin (coherent: no leakage), amplitudes 1, 0.9, 0.8, … */
function bandTones(low: number, high: number, rate: number): Tone[] {
  const bin = rate / N;
  return Array.from({ length: TONES }, (_, t) => {
    let cycles = Math.round((low + ((high - low) * t) / (TONES - 1)) / bin);
    if (cycles * bin < low) cycles++;
    if (cycles * bin > high) cycles--;
    return { frequency: cycles * bin, amplitude: 1 - 0.1 * t };
  });
}

/** The peaks (frequency, amplitude) of the sampled sum of cosines, from fft.js's real transform. */
function peaks(tones: readonly Tone[], rate: number): Tone[] {
  const samples = new Array<number>(N).fill(0);
  for (const { frequency, amplitude } of tones)
    for (let n = 0; n < N; n++) samples[n]! += amplitude * Math.cos((2 * Math.PI * frequency * n) / rate);
  const fft = new FFT(N);
  const out = fft.createComplexArray() as number[];
  fft.realTransform(out, samples);
  const found: Tone[] = [];
  for (let k = 0; k <= N / 2; k++) {
    const amplitude = Math.hypot(out[2 * k]!, out[2 * k + 1]!) / (k === 0 || k === N / 2 ? N : N / 2);
    if (amplitude > 0.05) found.push({ frequency: (k * rate) / N, amplitude });
  }
  return found;
}

interface ReportedChannel {
  label: string;
  zone: number;
  inverted: boolean;
  image: { low: number; high: number };
  pass: boolean;
}

let report: {
  channels: { label: string; low: number; high: number }[];
  feasible: { minRate: number; maxRate: number; channelZones: number[] }[];
  candidates: { label: string; rate: number; pass: boolean; zone: number; channels: ReportedChannel[] }[];
  best: string | null;
};
let status: number | null;

beforeAll(() => {
  ensureBuilt();
  const dir = mkdtempSync(join(tmpdir(), 'ifzone-gnss-'));
  const file = join(dir, 'gnss.json');
  writeFileSync(file, JSON.stringify(scenario));
  const run = runBin('solve', file, '--json');
  status = run.status;
  report = JSON.parse(run.stdout);
});

describe('GPS L1, L2, L5 (IS-GPS-200, IS-GPS-705) as the channels of one scenario through solve', () => {
  it('reports the three channels, valid intervals and the lowest rate first', () => {
    expect(status).toBe(0);
    expect(report.channels.map((c) => [c.label, (c.low + c.high) / 2])).toEqual(SIGNALS.map((s) => [s.label, s.centre]));
    expect(report.feasible.length).toBeGreaterThan(10);
    expect(report.candidates[0]!.rate).toBe(report.feasible[0]!.minRate);
    expect(report.candidates[0]!.pass).toBe(true);
  });

  it('keeps, at every passing candidate, each signal whole where its channel says and 1 MHz from the others (FFT)', () => {
    const passing = report.candidates.filter((c) => c.pass);
    expect(passing.length).toBe(report.feasible.length);
    for (const candidate of passing) {
      const rate = candidate.rate;
      const all: Tone[] = [];
      const hulls = candidate.channels.map((channel, b) => {
        const s = SIGNALS[b]!;
        expect(channel.label).toBe(s.label);
        const tones = bandTones(s.centre - s.width / 2, s.centre + s.width / 2, rate);
        all.push(...tones);
        const seen = peaks(tones, rate);
        expect(seen, `${s.label} at ${rate} Hz: one peak per tone`).toHaveLength(TONES);
        const at = tones.map((tone) => seen.find((p) => Math.abs(p.amplitude - tone.amplitude) < 0.02)!.frequency);
        // Where zone n puts a tone (facts of the trade): f − (n − 1)/2·rate in an odd zone, n/2·rate − f in an even one.
        const n = channel.zone;
        at.forEach((f, t) => {
          const predicted = n % 2 === 1 ? tones[t]!.frequency - ((n - 1) / 2) * rate : (n / 2) * rate - tones[t]!.frequency;
          expect(Math.abs(f - predicted), `${s.label} tone ${t} at ${rate} Hz, zone ${n}`).toBeLessThanOrEqual(rate / N / 2);
        });
        expect(at[1]! < at[0]!, `${s.label} inversion at ${rate} Hz`).toBe(channel.inverted);
        // The reported image holds every peak (to within a bin).
        for (const f of at) {
          expect(f).toBeGreaterThanOrEqual(channel.image.low - rate / N);
          expect(f).toBeLessThanOrEqual(channel.image.high + rate / N);
        }
        return { low: Math.min(...at), high: Math.max(...at) };
      });
      for (let i = 0; i < hulls.length; i++)
        for (let k = i + 1; k < hulls.length; k++) {
          const gap = Math.max(hulls[k]!.low - hulls[i]!.high, hulls[i]!.low - hulls[k]!.high);
          expect(gap, `${SIGNALS[i]!.label}–${SIGNALS[k]!.label} at ${rate} Hz`).toBeGreaterThanOrEqual(SPACING - 2 * (rate / N));
        }
      expect(peaks(all, rate), `all tones together at ${rate} Hz`).toHaveLength(all.length);
    }
  });

  it('fails, in the middle of each gap between valid intervals, where the FFT shows a fold or two signals too close', () => {
    // The typed rates are judged by the same exact evaluator; the FFT says why they fail.
    const gaps = report.feasible.slice(1).map((f, i) => (report.feasible[i]!.maxRate + f.minRate) / 2);
    const dir = mkdtempSync(join(tmpdir(), 'ifzone-gnss-'));
    const file = join(dir, 'gnss.json');
    writeFileSync(file, JSON.stringify(scenario));
    const run = runBin('solve', file, '--json', '--rate', ...gaps.map((g) => String(g)));
    const typed = JSON.parse(run.stdout) as typeof report;
    expect(typed.candidates.map((c) => c.pass)).toEqual(gaps.map(() => false));
    for (const rate of gaps) {
      const problems = SIGNALS.map((s) => bandTones(s.centre - s.width / 2, s.centre + s.width / 2, rate)).map((tones) => {
        const seen = peaks(tones, rate);
        if (seen.length !== tones.length) return 'fold';
        const at = tones.map((tone) => seen.find((p) => Math.abs(p.amplitude - tone.amplitude) < 0.02)?.frequency ?? NaN);
        const monotone = at.every((f, t) => t === 0 || f > at[t - 1]!) || at.every((f, t) => t === 0 || f < at[t - 1]!);
        return monotone ? { low: Math.min(...at), high: Math.max(...at) } : 'fold';
      });
      const folded = problems.some((p) => p === 'fold');
      const hulls = problems.filter((p): p is { low: number; high: number } => p !== 'fold');
      const tooClose = hulls.some((a, i) => hulls.some((b, k) => k > i && Math.max(b.low - a.high, a.low - b.high) < SPACING));
      expect(folded || tooClose, `${rate} Hz`).toBe(true);
    }
  });
});
