import { describe, expect, it } from 'vitest';
import { db, hz } from '../../src/units/quantities.js';
import { integrate } from '../../src/after-rate/quadrature.js';
import { driverLimitedSnr, noiseFolding } from '../../src/after-rate/noise-folding.js';
import { filterPowerResponse } from '../../src/after-rate/power-response.js';
import { aliasBands } from '../../src/after-rate/alias-bands.js';

const MHZ = 1e6;

describe('adaptive Simpson quadrature', () => {
  it('the doc example: ∫ x² over [0, 3] = 9', () => {
    expect(integrate((x) => x * x, 0, 3, 1e-12).value).toBeCloseTo(9, 12);
  });

  it('∫ sin over [0, π] = 2 within the error it reports', () => {
    const { value, errorEstimate } = integrate(Math.sin, 0, Math.PI, 1e-10);
    expect(Math.abs(value - 2)).toBeLessThan(1e-9);
    expect(errorEstimate).toBeLessThan(1e-9);
  });

  it('a Butterworth band-pass passes BW·(π/2N)/sin(π/2N) of white noise (its noise bandwidth)', () => {
    // ∫₀^∞ 1/(1 + Ω(f)^(2N)) df with Ω = (f − f0²/f)/BW equals (BW/2)·∫ 1/(1 + Ω^(2N)) dΩ over the real line (Glasser's
    // master theorem, from memory) = BW·(π/2N)/sin(π/2N): 1.5708·BW for N = 1, 1.1107·BW for N = 2, 1.0472·BW for N = 3
    // (the Butterworth noise-bandwidth ratios of filter handbooks; from memory).
    for (const order of [2, 3, 5]) {
      const filter = { kind: 'butterworth', order, passLow: hz(90 * MHZ), passHigh: hz(110 * MHZ) } as const;
      const response = filterPowerResponse(filter);
      const { value } = integrate(response.power, 1, 20e9, 1e-3, response.cuts, 64);
      const expected = (20 * MHZ * (Math.PI / (2 * order))) / Math.sin(Math.PI / (2 * order));
      expect(value / expected).toBeCloseTo(1, 6);
    }
  });
});

describe('noise folding penalty', () => {
  const channel = { low: hz(21 * MHZ), high: hz(25 * MHZ) };

  it('no filter: 10·log10(m) for an input bandwidth of m whole zones (common practice)', () => {
    // Rate 40 MHz, input bandwidth 100 MHz = 5 zones of 20 MHz: the channel and its 4 images (15–19, 55–59, 61–65, 95–99).
    const images = aliasBands(channel, hz(40 * MHZ), hz(40 * MHZ), hz(100 * MHZ));
    const folding = noiseFolding(filterPowerResponse(null), channel, images);
    expect(folding.penaltyDb).toBeCloseTo(10 * Math.log10(5), 9);
    expect(folding.accuracyDb).toBeLessThan(1e-6);
    // 8 zones up to 160 MHz: 10·log10(8) = 9.03 dB.
    const wider = noiseFolding(filterPowerResponse(null), channel, aliasBands(channel, hz(40 * MHZ), hz(40 * MHZ), hz(160 * MHZ)));
    expect(wider.penaltyDb).toBeCloseTo(10 * Math.log10(8), 9);
  });

  it('a brick-wall filter over the channel: no penalty (common practice)', () => {
    const brickWall = { power: (f: number) => (f >= channel.low && f <= channel.high ? 1 : 0), cuts: [channel.low, channel.high] };
    const folding = noiseFolding(brickWall, channel, aliasBands(channel, hz(40 * MHZ), hz(40 * MHZ), hz(100 * MHZ)));
    expect(folding.penaltyDb).toBe(0);
    expect(folding.channelBandwidth).toBeCloseTo(4 * MHZ, 3);
  });

  it('a real filter lies between the two, and a steeper one folds in less', () => {
    const images = aliasBands(channel, hz(40 * MHZ), hz(40 * MHZ), hz(100 * MHZ));
    const penalty = (order: number) =>
      noiseFolding(filterPowerResponse({ kind: 'butterworth', order, passLow: hz(20 * MHZ), passHigh: hz(26 * MHZ) }), channel, images)
        .penaltyDb;
    expect(penalty(2)).toBeGreaterThan(penalty(4));
    expect(penalty(4)).toBeGreaterThan(0);
    expect(penalty(2)).toBeLessThan(10 * Math.log10(5));
  });

  it('the driver-limited SNR: −150 dBFS/Hz over 5 × 4 MHz leaves 76.99 dB (noise powers add; worked by hand)', () => {
    // −150 + 10·log10(20e6) = −150 + 73.0103 = −76.9897 dBFS in the channel.
    const images = aliasBands(channel, hz(40 * MHZ), hz(40 * MHZ), hz(100 * MHZ));
    const folding = noiseFolding(filterPowerResponse(null), channel, images);
    expect(driverLimitedSnr(db(-150), folding)).toBeCloseTo(76.9897, 4);
  });

  it('a table filter against the closed form of its power-law pieces', () => {
    // Between two table points the attenuation is linear in dB over log-frequency, A(f) = a + s·ln(f/fa), so the power
    // 10^(−A/10) = 10^(−a/10)·(f/fa)^(−k) with k = s·ln 10 / 10, and ∫ from f1 to f2 = 10^(−a/10)·fa^k·(f2^(1−k) − f1^(1−k))/(1 − k).
    // Points (10 MHz, 60 dB), (50 MHz, 0 dB), (90 MHz, 0 dB), (400 MHz, 70 dB); channel 60–80 MHz in the flat part: 20 MHz.
    const points = [
      [10e6, 60],
      [50e6, 0],
      [90e6, 0],
      [400e6, 70],
    ] as const;
    const table = { kind: 'table', points: points.map(([f, a]) => ({ frequency: hz(f), attenuation: db(a) })) } as const;
    const piece = (fa: number, a: number, fb: number, b: number, f1: number, f2: number) => {
      const k = ((b - a) / Math.log(fb / fa)) * (Math.LN10 / 10);
      return (10 ** (-a / 10) * fa ** k * (f2 ** (1 - k) - f1 ** (1 - k))) / (1 - k);
    };
    const aliases = [
      { low: hz(20e6), high: hz(40e6) },
      { low: hz(100e6), high: hz(120e6) },
    ];
    const expectedAlias = piece(10e6, 60, 50e6, 0, 20e6, 40e6) + piece(90e6, 0, 400e6, 70, 100e6, 120e6);
    const folding = noiseFolding(filterPowerResponse(table), { low: hz(60e6), high: hz(80e6) }, aliases);
    expect(folding.channelBandwidth / 20e6).toBeCloseTo(1, 12);
    expect(folding.aliasBandwidth / expectedAlias).toBeCloseTo(1, 8);
    expect(folding.penaltyDb).toBeCloseTo(10 * Math.log10(1 + expectedAlias / 20e6), 8);
  });

  it('refuses a filter that stops the whole channel', () => {
    expect(() => noiseFolding({ power: () => 0, cuts: [] }, channel, [])).toThrow(RangeError);
  });
});
