import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { hz } from '../../src/units/quantities.js';
import type { Band } from '../../src/math/band.js';
import { foldFrequency } from '../../src/math/fold.js';
import { rateWindows } from '../../src/windows/enumerate-windows.js';
import type { RateWindow } from '../../src/windows/rate-window.js';

/**
 * Property tests with fast-check (npm registry). What is checked comes from
 * the definition of band-pass sampling, not from the enumerator: a rate is
 * legal exactly when no zone boundary k·rate/2 falls strictly inside the band
 * (Vaughan, Scott & White, "The theory of bandpass sampling", IEEE Trans.
 * Signal Processing 39(9), 1991), and folding follows the common rule
 * |f − fs·round(f/fs)| (common practice, no source).
 */

/** Random bands from a few hertz to GHz, up to ~200 zones deep. */
const bands: fc.Arbitrary<Band> = fc
  .tuple(fc.double({ min: 1, max: 1e8, noNaN: true }), fc.double({ min: 0, max: 200, noNaN: true }))
  .map(([width, depth]) => ({ low: hz(depth * width), high: hz(depth * width + width) }))
  .filter((b) => b.high > b.low);

const SAMPLES = 256;

/** SAMPLES + 1 evenly spaced points from low to high inclusive, each from the edges in one expression. */
const pointsOf = (b: Band) => Array.from({ length: SAMPLES + 1 }, (_, i) => b.low + ((b.high - b.low) * i) / SAMPLES);

const insideWindow = (w: RateWindow, rate: number) => w.minRate <= rate && rate <= w.maxRate;

describe('a rate inside a listed window maps the band onto one contiguous image', () => {
  it('monotonic increasing in odd zones, decreasing in even zones, injective', () => {
    fc.assert(
      fc.property(bands, fc.nat(), fc.double({ min: 0, max: 1, noNaN: true }), (band, pick, u) => {
        const windows = rateWindows(band);
        expect(windows.length).toBeGreaterThan(0); // zone 1 always holds a band
        const w = windows[pick % windows.length]!;
        const rate = w.maxRate === Infinity ? w.minRate * (1 + 3 * u) : w.minRate + u * (w.maxRate - w.minRate);
        expect(insideWindow(w, rate)).toBe(true);

        const points = pointsOf(band);
        const folds = points.map((f) => foldFrequency(hz(f), hz(rate)));
        const aliases = folds.map((x) => x.alias);
        // Plain comparisons gathered first: one expect per case keeps thousands of cases fast.
        const wrongWay = aliases.slice(1).flatMap((a, i) => ((w.inverted ? a < aliases[i]! : a > aliases[i]!) ? [] : [i + 1]));
        expect(wrongWay, `zone ${w.zone} at ${rate} Hz: steps not ${w.inverted ? 'decreasing' : 'increasing'}`).toEqual([]);
        // Injective and contiguous: the image is a copy of the band, as wide as the band.
        expect(new Set(aliases).size).toBe(aliases.length);
        const span = Math.abs(aliases[SAMPLES]! - aliases[0]!);
        expect(Math.abs(span - (band.high - band.low))).toBeLessThanOrEqual(1e-9 * Math.max(rate, band.high));
        // Interior points sit in the window's zone (edges may sit on a boundary, which belongs to the lower zone).
        const strayZones = folds
          .slice(1, -1)
          .filter((x) => x.zone !== w.zone)
          .map((x) => x.zone);
        expect(strayZones).toEqual([]);
      }),
      { numRuns: 2000 },
    );
  });
});

describe('a rate just outside every window folds two band frequencies together', () => {
  /** Two different band frequencies mirrored about the zone edge e inside the band, and their aliases. */
  function foldedPair(band: Band, edge: number, rate: number) {
    expect(edge).toBeGreaterThan(band.low);
    expect(edge).toBeLessThan(band.high);
    const d = Math.min(edge - band.low, band.high - edge) / 2;
    const [f1, f2] = [edge - d, edge + d];
    expect(f1).not.toBe(f2);
    expect(f1).toBeGreaterThanOrEqual(band.low);
    expect(f2).toBeLessThanOrEqual(band.high);
    return [foldFrequency(hz(f1), hz(rate)), foldFrequency(hz(f2), hz(rate))] as const;
  }

  it('slightly below a window’s minRate', () => {
    fc.assert(
      fc.property(bands, fc.nat(), fc.double({ min: 1e-6, max: 0.999, noNaN: true }), (band, pick, share) => {
        const windows = rateWindows(band);
        const w = windows[pick % windows.length]!;
        // Below 2·high/n by less than the gap down to the next zone's 2·low/n.
        const rate = w.minRate * (1 - share * (1 - band.low / band.high));
        fc.pre(rate < w.minRate * (1 - 1e-10));
        expect(windows.some((x) => insideWindow(x, rate))).toBe(false);
        // The top edge of zone n, n·rate/2, now falls inside the band.
        const [a, b] = foldedPair(band, (w.zone * rate) / 2, rate);
        expect(Math.abs(a.alias - b.alias)).toBeLessThanOrEqual(1e-9 * rate);
        expect([a.zone, b.zone]).toEqual([w.zone, w.zone + 1]);
      }),
      { numRuns: 2000 },
    );
  });

  it('slightly above a bounded window’s maxRate', () => {
    fc.assert(
      fc.property(bands, fc.nat(), fc.double({ min: 1e-6, max: 0.999, noNaN: true }), (band, pick, share) => {
        const bounded = rateWindows(band).filter((w) => w.maxRate !== Infinity);
        fc.pre(bounded.length > 0);
        const w = bounded[pick % bounded.length]!;
        // Above 2·low/(n − 1) by less than the gap up to the lower zone's 2·high/(n − 1).
        const rate = w.maxRate * (1 + share * (band.high / band.low - 1));
        fc.pre(rate > w.maxRate * (1 + 1e-10) && rate < ((2 * band.high) / (w.zone - 1)) * (1 - 1e-10));
        expect(rateWindows(band).some((x) => insideWindow(x, rate))).toBe(false);
        // The bottom edge of zone n, (n − 1)·rate/2, now falls inside the band.
        const [a, b] = foldedPair(band, ((w.zone - 1) * rate) / 2, rate);
        expect(Math.abs(a.alias - b.alias)).toBeLessThanOrEqual(1e-9 * rate);
        expect([a.zone, b.zone]).toEqual([w.zone - 1, w.zone]);
      }),
      { numRuns: 2000 },
    );
  });
});

describe('the windows are exactly the rates with no zone boundary inside the band', () => {
  it('for random rates, listed ⇔ no k·rate/2 strictly inside (low, high)', () => {
    // Vaughan, Scott & White 1991: the band is held whole by one zone exactly when no boundary cuts it.
    fc.assert(
      fc.property(bands, fc.double({ min: 0.01, max: 3, noNaN: true }), (band, share) => {
        const rate = share * 2 * band.high;
        const k = Math.floor((2 * band.low) / rate) + 1; // first boundary above low
        const boundary = (k * rate) / 2;
        // Keep away from the exact edges, where the answer rests on the edge tolerance (tested elsewhere).
        fc.pre(Math.abs(boundary - band.high) > 1e-9 * band.high && Math.abs(boundary - band.low) > 1e-9 * band.high);
        const cut = boundary < band.high;
        const listed = rateWindows(band).filter((w) => insideWindow(w, rate));
        expect(listed.length).toBe(cut ? 0 : 1);
        if (!cut) expect(listed[0]!.zone).toBe(k);
      }),
      { numRuns: 5000 },
    );
  });

  it('lists ⌊high/width⌋ zones, each no wider than it is, inverted exactly in even zones', () => {
    fc.assert(
      fc.property(bands, (band) => {
        const windows = rateWindows(band);
        const q = band.high / (band.high - band.low);
        if (Math.abs(q - Math.round(q)) > 1e-9 * q) expect(windows.length).toBe(Math.floor(q));
        const faulty = windows.filter(
          (w) => !(w.minRate <= w.maxRate && w.inverted === (w.zone % 2 === 0) && w.minRate >= 2 * (band.high - band.low) * (1 - 1e-12)),
        );
        expect(faulty).toEqual([]);
      }),
      { numRuns: 3000 },
    );
  });
});
