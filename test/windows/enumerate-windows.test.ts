import { guardBands } from '../../src/math/band.js';
import { describe, expect, it } from 'vitest';
import { hz, type Hz } from '../../src/units/quantities.js';
import type { Band } from '../../src/math/band.js';
import { guardedBand, lowestLegalRate, rateWindows } from '../../src/windows/enumerate-windows.js';
import type { RateWindow } from '../../src/windows/rate-window.js';

const band = (low: number, high: number): Band => ({ low: hz(low), high: hz(high) });
const limits = (minRate: number, maxRate: number) => ({ minRate: hz(minRate), maxRate: hz(maxRate) });
const byZone = (windows: readonly RateWindow[], zone: number) => windows.find((w) => w.zone === zone);

/**
 * The condition of Vaughan, Scott & White, "The theory of bandpass sampling",
 * IEEE Trans. Signal Processing 39(9), 1991, written out again here so each
 * expected edge below comes from the paper's formula, not from the code under
 * test: zone n holds [fL, fH] for 2·fH/n ≤ fs ≤ 2·fL/(n − 1), n ≤ ⌊fH/B⌋.
 */
function paperWindow(fL: number, fH: number, n: number): [number, number] {
  return [(2 * fH) / n, n === 1 ? Infinity : (2 * fL) / (n - 1)];
}

describe('rateWindows: the published condition (Vaughan, Scott & White 1991)', () => {
  it('10–14 kHz: ≥ 28 kHz in zone 1, 14–20 kHz in zone 2 (inverted), 9.333–10 kHz in zone 3', () => {
    // The paper's worked case, recomputed from its condition.
    const windows = rateWindows(band(10e3, 14e3));
    expect(windows.map((w) => w.zone)).toEqual([1, 2, 3]); // ⌊14/4⌋ = 3 zones
    expect(windows[0]).toEqual({ zone: 1, minRate: 28e3, maxRate: Infinity, inverted: false });
    expect(windows[1]).toEqual({ zone: 2, minRate: 14e3, maxRate: 20e3, inverted: true });
    expect(windows[2]).toEqual({ zone: 3, minRate: 28e3 / 3, maxRate: 10e3, inverted: false });
    expect(windows[2]!.minRate).toBeCloseTo(9333.333, 3);
    for (const w of windows) {
      const [lo, hi] = paperWindow(10e3, 14e3, w.zone);
      expect(w.minRate).toBe(lo);
      expect(w.maxRate).toBe(hi);
    }
  });

  it('a 5 MHz band centred at 20 MHz allows 22.5–35 MHz, 15–17.5 MHz and 11.25–11.67 MHz', () => {
    // Lyons, Understanding Digital Signal Processing, band-pass sampling section (from memory);
    // the edges are recomputed from the Vaughan, Scott & White condition: fL = 17.5 MHz, fH = 22.5 MHz.
    const windows = rateWindows(band(17.5e6, 22.5e6));
    expect(windows.map((w) => w.zone)).toEqual([1, 2, 3, 4]);
    // Zone 1 (fs ≥ 2·fH = 45 MHz) is the ordinary Nyquist case the textbook list leaves out.
    expect(byZone(windows, 1)).toMatchObject({ minRate: 45e6, maxRate: Infinity, inverted: false });
    expect(byZone(windows, 2)).toMatchObject({ minRate: 22.5e6, maxRate: 35e6, inverted: true });
    expect(byZone(windows, 3)).toMatchObject({ minRate: 15e6, maxRate: 17.5e6, inverted: false });
    // 11.25 MHz = 2·22.5/4 and 11.67 MHz is 35/3 MHz exactly (2·17.5/3), not a rounded figure.
    expect(byZone(windows, 4)).toMatchObject({ minRate: 11.25e6, maxRate: 35e6 / 3, inverted: true });
    expect(byZone(windows, 4)!.maxRate).toBeCloseTo(11.67e6, -4);
  });

  it('agrees with the formula for a spread of bands, zone by zone', () => {
    // Vaughan, Scott & White 1991: the zone count is ⌊fH/B⌋ and each edge is the formula's.
    const cases: Array<[number, number]> = [
      [455e3 - 5e3, 455e3 + 5e3],
      [10.7e6 - 100e3, 10.7e6 + 100e3],
      [21.4e6 - 1e6, 21.4e6 + 1e6],
      [140e6 - 10e6, 140e6 + 10e6],
      [1, 2],
      [0.25, 1.75],
    ];
    for (const [fL, fH] of cases) {
      const windows = rateWindows(band(fL, fH));
      expect(windows.length).toBe(Math.floor(fH / (fH - fL)));
      for (const w of windows) {
        const [lo, hi] = paperWindow(fL, fH, w.zone);
        expect(w.minRate).toBeCloseTo(lo, 6);
        if (hi === Infinity) expect(w.maxRate).toBe(Infinity);
        else expect(w.maxRate / hi).toBeCloseTo(1, 12);
        expect(w.inverted).toBe(w.zone % 2 === 0);
      }
    }
  });

  it('lists windows in ascending zone order, i.e. descending rate, and never overlapping', () => {
    // Vaughan, Scott & White 1991: the wedges of zones n and n+1 are separated by the illegal gap (2·fL/n, 2·fH/n).
    const windows = rateWindows(band(60e6, 80e6));
    for (let i = 1; i < windows.length; i++) {
      expect(windows[i]!.zone).toBe(windows[i - 1]!.zone + 1);
      expect(windows[i]!.maxRate).toBeLessThan(windows[i - 1]!.minRate);
    }
  });
});

describe('rateWindows: the zero-width window at twice the width', () => {
  // Common practice, no source (follows from the condition above): the lowest rate for a band of width B is 2B,
  // reached only when fH is an integer multiple of B; there zone n = fH/B has 2·fH/n = 2·fL/(n − 1) = 2B.

  it('60–80 MHz (80 = 4·20) has the single rate 40 MHz in zone 4', () => {
    const w = byZone(rateWindows(band(60e6, 80e6)), 4);
    expect(w).toEqual({ zone: 4, minRate: 40e6, maxRate: 40e6, inverted: true });
  });

  /** Checks the zone-n window of a guarded band that should be the single point 2·width. */
  function expectZeroWidthPoint(guarded: Band, n: number, width: number, label: string): void {
    const windows = rateWindows(guarded);
    const w = byZone(windows, n);
    expect(w, `${label}: zone ${n} window missing`).toBeDefined();
    expect(w!.minRate, `${label}: zone ${n} window has width ${w!.maxRate - w!.minRate}`).toBe(w!.maxRate);
    expect(Math.abs(w!.minRate - 2 * width) / (2 * width), label).toBeLessThan(1e-12);
    expect(windows.length, label).toBe(n); // zones 1..n, no more
    for (const x of windows) expect(x.minRate <= x.maxRate, `${label}: zone ${x.zone} inside out`).toBe(true);
  }

  it('is present with minRate === maxRate for thousands of awkward floating-point bands', () => {
    // Widths like 0.1 MHz·k and decimal clock fractions such as 12.288 MHz/7 are not exact in binary,
    // so fH/B and the two edges carry rounding noise that must neither drop the window nor open it.
    const unitWidths = [0.1e6, 12.288e6 / 7, 61.44e6 / 9, 122.88e6 / 11, 1 / 3, 0.7, 7e-3, 19.2e6 / 13];
    let checked = 0;
    for (const unit of unitWidths) {
      for (let k = 1; k <= 25; k++) {
        const width = unit * k;
        for (let n = 2; n <= 40; n++) {
          expectZeroWidthPoint(band((n - 1) * width, n * width), n, width, `unit ${unit}, k ${k}, n ${n}`);
          checked++;
        }
      }
    }
    expect(checked).toBe(8 * 25 * 39);
  });

  it('is present with minRate === maxRate when guard bands bring the band to the multiple', () => {
    // The wanted band sits inside [(n−1)·B, n·B] and the guards fill the rest; guardedBand adds them back
    // in floating point, so the guarded edges are only approximately (n−1)·B and n·B.
    const unitWidths = [0.1e6, 12.288e6 / 7, 61.44e6 / 9, 1 / 3, 0.7];
    const guardShares: Array<[number, number]> = [
      [0.1, 0.2],
      [1 / 3, 1 / 7],
      [0.05, 0.05],
      [0, 0.3],
      [0.3, 0],
    ];
    let checked = 0;
    for (const unit of unitWidths) {
      for (let k = 1; k <= 12; k++) {
        const width = unit * k;
        for (let n = 2; n <= 30; n++) {
          for (const [gl, gh] of guardShares) {
            const guardLow = hz(gl * width);
            const guardHigh = hz(gh * width);
            const wanted = band((n - 1) * width + guardLow, n * width - guardHigh);
            const guarded = guardedBand(wanted, guardBands(guardLow, guardHigh));
            expectZeroWidthPoint(guarded, n, width, `unit ${unit}, k ${k}, n ${n}, guards ${gl}/${gh}`);
            checked++;
          }
        }
      }
    }
    expect(checked).toBe(5 * 12 * 29 * 5);
  });

  it('is kept when a rate limit sits exactly on it, and dropped when the limit excludes it', () => {
    const width = 12.288e6 / 7;
    const b = band(5 * width, 6 * width);
    const point = byZone(rateWindows(b), 6)!.minRate;
    expect(byZone(rateWindows(b, limits(point, point)), 6)).toMatchObject({ minRate: point, maxRate: point });
    expect(byZone(rateWindows(b, limits(0, point * (1 - 1e-9))), 6)).toBeUndefined();
    expect(byZone(rateWindows(b, limits(point * (1 + 1e-9), Infinity)), 6)).toBeUndefined();
  });
});

describe('rateWindows: limits', () => {
  it('clips each window to [minRate, maxRate]', () => {
    // 10–14 kHz windows from Vaughan, Scott & White 1991 (see above), cut to 15–30 kHz.
    const windows = rateWindows(band(10e3, 14e3), limits(15e3, 30e3));
    expect(windows).toEqual([
      { zone: 1, minRate: 28e3, maxRate: 30e3, inverted: false },
      { zone: 2, minRate: 15e3, maxRate: 20e3, inverted: true },
    ]);
  });

  it('bounds the unbounded zone-1 window by the upper limit', () => {
    const [w] = rateWindows(band(10e3, 14e3), limits(0, 50e3));
    expect(w).toEqual({ zone: 1, minRate: 28e3, maxRate: 50e3, inverted: false });
  });

  it('keeps a window touched by a limit at a single rate', () => {
    expect(rateWindows(band(10e3, 14e3), limits(20e3, 28e3))).toEqual([
      { zone: 1, minRate: 28e3, maxRate: 28e3, inverted: false },
      { zone: 2, minRate: 20e3, maxRate: 20e3, inverted: true },
    ]);
  });

  it('returns an empty list when no window fits the limits', () => {
    // 10–14 kHz: rates in the gaps (10, 14) kHz and (20, 28) kHz alias the band.
    expect(rateWindows(band(10e3, 14e3), limits(21e3, 27e3))).toEqual([]);
    expect(rateWindows(band(10e3, 14e3), limits(10.5e3, 13.5e3))).toEqual([]);
    expect(rateWindows(band(10e3, 14e3), limits(0, 9e3))).toEqual([]);
    expect(lowestLegalRate([])).toBeNull();
  });
});

describe('guardedBand', () => {
  it('widens the band by its guards before the test', () => {
    // Vaughan, Scott & White 1991 apply guard bands by widening the band; 60–80 MHz with 2 MHz guards is 58–82 MHz.
    const guarded = guardedBand(band(60e6, 80e6), guardBands(hz(2e6), hz(2e6)));
    expect(guarded).toEqual({ low: 58e6, high: 82e6 });
    const windows = rateWindows(guarded);
    expect(windows.map((w) => w.zone)).toEqual([1, 2, 3]); // ⌊82/24⌋ = 3
    expect(byZone(windows, 2)).toMatchObject({ minRate: 82e6, maxRate: 116e6 });
    expect(byZone(windows, 3)).toMatchObject({ minRate: 164e6 / 3, maxRate: 58e6 });
    // The guards narrow every window compared with the bare band.
    const bare = rateWindows(band(60e6, 80e6));
    expect(byZone(bare, 2)!.minRate).toBeLessThan(byZone(windows, 2)!.minRate);
    expect(byZone(bare, 2)!.maxRate).toBeGreaterThan(byZone(windows, 2)!.maxRate);
  });

  it('applies unequal guards on their own sides', () => {
    expect(guardedBand(band(60e6, 80e6), guardBands(hz(1e6), hz(3e6)))).toEqual({ low: 59e6, high: 83e6 });
  });

  it('stops a lower guard reaching below DC at DC, leaving only zone 1', () => {
    // A band reaching DC is low-pass: only Nyquist-rate sampling (fs ≥ 2·fH) holds it (common practice, no source).
    const guarded = guardedBand(band(1e6, 5e6), guardBands(hz(3e6), hz(1e6)));
    expect(guarded).toEqual({ low: 0, high: 6e6 });
    expect(rateWindows(guarded)).toEqual([{ zone: 1, minRate: 12e6, maxRate: Infinity, inverted: false }]);
  });
});

describe('lowestLegalRate', () => {
  it('is the highest zone’s lower edge, 2B at the integer-multiple point', () => {
    // Common practice, no source: no band of width B can be sampled below 2B.
    expect(lowestLegalRate(rateWindows(band(10e3, 14e3)))).toBe(28e3 / 3);
    expect(lowestLegalRate(rateWindows(band(60e6, 80e6)))).toBe(40e6);
    const someBands: Array<[number, number]> = [
      [17.5e6, 22.5e6],
      [58e6, 82e6],
      [450e3, 460e3],
      [3, 4.5],
    ];
    for (const [fL, fH] of someBands) {
      expect(lowestLegalRate(rateWindows(band(fL, fH)))! as Hz).toBeGreaterThanOrEqual(2 * (fH - fL));
    }
  });
});
