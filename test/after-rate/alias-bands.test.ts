import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { db, hz } from '../../src/units/quantities.js';
import { aliasBands, nearestAliasBands } from '../../src/after-rate/alias-bands.js';
import { filterMask, MASK_CHECK } from '../../src/after-rate/filter-mask.js';

const MHZ = 1e6;
const inMhz = (bands: ReadonlyArray<{ low: number; high: number }>) => bands.map((b) => [b.low / MHZ, b.high / MHZ]);

/**
 * Worked on paper (MHz). Channel 21–25 sampled at 40, converter input bandwidth 100. A frequency lands on the
 * channel's alias exactly when it lies in an image j·r ± [21, 25] (common practice, no source):
 *   j = 1: 40 − [21, 25] = [15, 19]; 40 + [21, 25] = [61, 65];
 *   j = 2: 80 − [21, 25] = [55, 59]; 80 + [21, 25] = [101, 105], above 100, dropped;
 *   j = 3: 120 − [21, 25] = [95, 99];  j = 4: 160 − 25 = 135, above 100.
 */
describe('alias bands of a rate', () => {
  it('the doc example: 21–25 MHz at 40 MHz up to 100 MHz', () => {
    const bands = aliasBands({ low: hz(21 * MHZ), high: hz(25 * MHZ) }, hz(40 * MHZ), hz(40 * MHZ), hz(100 * MHZ));
    expect(inMhz(bands)).toEqual([
      [15, 19],
      [55, 59],
      [61, 65],
      [95, 99],
    ]);
    expect(bands.map((b) => `${b.sense} ${b.multiple}`)).toEqual(['mirrored 1', 'mirrored 2', 'upright 1', 'mirrored 3']);
  });

  it('swept over the drift and cut at the input bandwidth', () => {
    // r ∈ [39.9, 40.1]: j = 1 mirrored [39.9 − 25, 40.1 − 21] = [14.9, 19.1]; j = 2 mirrored [79.8 − 25, 80.2 − 21] = [54.8, 59.2];
    // j = 1 upright [39.9 + 21, 40.1 + 25] = [60.9, 65.1]; j = 3 mirrored [119.7 − 25, 120.3 − 21] = [94.7, 99.3], cut at 97.
    const bands = aliasBands({ low: hz(21 * MHZ), high: hz(25 * MHZ) }, hz(39.9 * MHZ), hz(40.1 * MHZ), hz(97 * MHZ));
    const got = inMhz(bands);
    const expected = [
      [14.9, 19.1],
      [54.8, 59.2],
      [60.9, 65.1],
      [94.7, 97],
    ];
    got.forEach(([low, high], i) => {
      expect(low).toBeCloseTo(expected[i]![0]!, 9);
      expect(high).toBeCloseTo(expected[i]![1]!, 9);
    });
    expect(got).toHaveLength(4);
  });

  it('a mirrored image below zero counts as its magnitudes: 140 MHz at 100 MHz has an alias band at 40 MHz', () => {
    // 100 − [130, 150] = [−50, −30] → [30, 50]; 200 − [130, 150] = [50, 70]; 300 − [130, 150] = [150, 170];
    // 100 + [130, 150] = [230, 250]; 400 − [130, 150] = [250, 270] starts at the input bandwidth, dropped.
    const bands = aliasBands({ low: hz(130 * MHZ), high: hz(150 * MHZ) }, hz(100 * MHZ), hz(100 * MHZ), hz(250 * MHZ));
    expect(inMhz(bands)).toEqual([
      [30, 50],
      [50, 70],
      [150, 170],
      [230, 250],
    ]);
    const nearest = nearestAliasBands(bands, { low: hz(130 * MHZ), high: hz(150 * MHZ) });
    expect([nearest.below?.high, nearest.above?.low]).toEqual([70 * MHZ, 150 * MHZ]);
  });

  it('every frequency of an alias band folds onto the channel, and every other one below the input bandwidth does not (fast-check)', () => {
    // Independent fold (common practice, no source): f shows at |f − r·round(f/r)|.
    const fold = (f: number, r: number) => Math.abs(f - r * Math.round(f / r));
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 400 }),
        fc.integer({ min: 1, max: 50 }),
        fc.integer({ min: 20, max: 300 }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        (lowTenths, widthTenths, rateTenths, where) => {
          const [low, high, rate] = [lowTenths / 10, (lowTenths + widthTenths) / 10, rateTenths / 10];
          const folded = [fold(low, rate), fold(high, rate)];
          // Only a channel whole in one zone has a contiguous alias.
          if (Math.floor((2 * low) / rate) !== Math.floor((2 * high) / rate) || (2 * high) % rate === 0) return;
          const [aliasLow, aliasHigh] = [Math.min(...folded), Math.max(...folded)];
          const bandwidth = 4 * high + 10;
          const bands = aliasBands({ low: hz(low), high: hz(high) }, hz(rate), hz(rate), hz(bandwidth));
          const f = where * bandwidth;
          const a = fold(f, rate);
          const inside = (x: number, lo: number, hi: number) => x >= lo - 1e-9 && x <= hi + 1e-9;
          const inBand = bands.some((b) => inside(f, b.low, b.high)) || inside(f, low, high);
          const strictlyOutside = bands.every((b) => f < b.low - 1e-6 || f > b.high + 1e-6) && (f < low - 1e-6 || f > high + 1e-6);
          if (inBand) expect(inside(a, aliasLow, aliasHigh)).toBe(true);
          if (strictlyOutside) expect(a > aliasLow + 1e-9 && a < aliasHigh - 1e-9).toBe(false);
        },
      ),
      { numRuns: 3000 },
    );
  });

  it('refuses a rate that is not positive', () => {
    expect(() => aliasBands({ low: hz(1), high: hz(2) }, hz(0), hz(1), hz(10))).toThrow(RangeError);
  });
});

describe('the anti-alias mask', () => {
  const butterworth = { kind: 'butterworth', order: 5, passLow: hz(30 * MHZ), passHigh: hz(80 * MHZ) } as const;
  const band = { multiple: 1, sense: 'mirrored', low: hz(120 * MHZ), high: hz(130 * MHZ) } as const;

  it('the doc example: no filter falls 60 dB short of a −20 dBFS level against a −80 dBFS threshold', () => {
    const mask = filterMask([{ multiple: 1, sense: 'mirrored', low: hz(15e6), high: hz(19e6) }], null, db(-20), db(-80));
    expect(mask.worst?.marginDb).toBe(-60);
    expect(mask.pass).toBe(false);
  });

  it('a monotone Butterworth skirt gives its least at the band edge nearest the passband: Ω = 2 → 30.107 dB', () => {
    // 5th order, 30–80 MHz: f0² = 2400, BW = 50; Ω(120) = (14400 − 2400)/(120·50) = 2; 10·log10(1 + 2^10) = 30.107 dB
    // (Butterworth magnitude and the low-pass to band-pass transform, filter design handbooks, e.g. Williams & Taylor; from memory).
    const mask = filterMask([band], butterworth, db(-20), db(-80));
    expect(mask.requiredDb).toBe(60);
    expect(mask.bands[0]!.givenDb).toBeCloseTo(30.1072, 4);
    expect(mask.bands[0]!.marginDb).toBeCloseTo(-29.8928, 4);
    expect(mask.pass).toBe(false);
    expect(MASK_CHECK).toBe('anti-alias mask');
  });

  it('a table filter with a dip inside the band: the least is at the table point, not at either end', () => {
    // Points (100 MHz, 60 dB), (150 MHz, 20 dB), (200 MHz, 70 dB), linear in dB over log-frequency.
    // Ends: 120 MHz: 60 − 40·ln(1.2)/ln(1.5) = 42.02 dB; 190 MHz: 20 + 50·ln(190/150)/ln(4/3) = 61.08 dB; inside: 20 dB at 150 MHz.
    const table = {
      kind: 'table',
      points: [
        { frequency: hz(100e6), attenuation: db(60) },
        { frequency: hz(150e6), attenuation: db(20) },
        { frequency: hz(200e6), attenuation: db(70) },
      ],
    } as const;
    const mask = filterMask([{ multiple: 1, sense: 'upright', low: hz(120e6), high: hz(190e6) }], table, db(-50), db(-80));
    expect(mask.bands[0]!.givenDb).toBe(20);
    expect(mask.worst?.marginDb).toBe(-10);
  });

  it('without a stated level full scale is assumed and the shortfall is reported only', () => {
    const mask = filterMask([band], butterworth, null, db(-80));
    expect(mask).toMatchObject({ outOfBandLevel: 0, levelStated: false, requiredDb: 80, pass: true });
    expect(mask.worst!.marginDb).toBeLessThan(0);
  });

  it('a level already below the threshold needs no attenuation; a filter that holds passes', () => {
    expect(filterMask([band], null, db(-90), db(-80))).toMatchObject({ requiredDb: 0, pass: true });
    expect(filterMask([band], butterworth, db(-60), db(-80))).toMatchObject({ requiredDb: 20, pass: true });
  });
});
