import { describe, expect, it } from 'vitest';
import { hz } from '../../src/units/quantities.js';
import type { Band } from '../../src/math/band.js';
import { commonWindows } from '../../src/windows/common-windows.js';
import { jointFeasibleSet } from '../../src/solve/joint-feasible-set.js';
import { subtractOpenKeepingPoints } from '../../src/math/interval-set.js';
import { bruteBandsValid, bruteBandsValidWithin } from '../helpers/brute-force-bands.js';
import { closeImageRates } from '../../src/solve/forbidden-rates.js';
import { jointWindowsReport } from '../../src/report/joint-windows-report.js';
import { bandFromPair } from '../../src/cli/option-values.js';
import { guardBands } from '../../src/math/band.js';

const band = (low: number, high: number): Band => ({ low: hz(low), high: hz(high) });
const NO_LIMITS = { minRate: hz(0), maxRate: hz(Infinity) };
const limits = (minRate: number, maxRate: number) => ({ minRate: hz(minRate), maxRate: hz(maxRate) });
const rows = (set: ReturnType<typeof jointFeasibleSet>) => set.feasible.map((f) => [f.minRate, f.maxRate, f.zones]);
/** A relative step far above the edge tolerance (1e-12) and far below any gap in these cases. */
const HAIR = 1e-9;

describe('the doc-comment examples', () => {
  it('commonWindows, jointFeasibleSet, closeImageRates, jointWindowsReport and bandFromPair give what their comments say', () => {
    // Vaughan, Scott & White 1991 per band: 10–14 kHz holds at [28, ∞), [14, 20]; 15–16 kHz at [32, ∞), [16, 30].
    expect(commonWindows([band(10e3, 14e3), band(15e3, 16e3)], limits(20e3, 40e3)).map((w) => [w.minRate, w.maxRate, w.zones])).toEqual([
      [20e3, 20e3, [2, 2]],
      [28e3, 30e3, [1, 2]],
      [32e3, 40e3, [1, 1]],
    ]);
    expect(jointFeasibleSet([band(10e3, 14e3), band(15e3, 16e3)], hz(0), limits(20e3, 40e3)).lowestRate).toBe(20e3);
    // r − [10, 14] overlaps 3–5 when r − 14 < 5 and r − 10 > 3 (Akos et al. 1999 condition).
    expect(closeImageRates({ rateMultiple: 0, low: 3, high: 5 }, hz(0), band(10, 14), hz(14), hz(20))).toEqual([{ low: 13, high: 19 }]);
    const none = guardBands(hz(0), hz(0));
    const report = jointWindowsReport(
      [
        { band: band(10e3, 14e3), guard: none },
        { band: band(15e3, 16e3), guard: none },
      ],
      hz(0),
      NO_LIMITS,
    );
    expect([report.minimumRate, report.minimumIsSingleRate]).toEqual([10e3, true]);
    expect(bandFromPair('60M:80M', '--band')).toEqual({ low: 60e6, high: 80e6 });
  });
});

describe('subtractOpenKeepingPoints', () => {
  it('keeps the point between two open intervals that meet, and an edge an open interval stops at', () => {
    // The doc comment's example; the pieces follow from the set algebra (closed minus open).
    expect(
      subtractOpenKeepingPoints({ low: 0, high: 10 }, [
        { low: 2, high: 4 },
        { low: 4, high: 6 },
      ]),
    ).toEqual([
      { low: 0, high: 2 },
      { low: 4, high: 4 },
      { low: 6, high: 10 },
    ]);
    expect(
      subtractOpenKeepingPoints({ low: 0, high: 10 }, [
        { low: -1, high: 0 },
        { low: 10, high: 11 },
      ]),
    ).toEqual([{ low: 0, high: 10 }]);
    expect(subtractOpenKeepingPoints({ low: 0, high: 10 }, [{ low: -1, high: 10 }])).toEqual([{ low: 10, high: 10 }]);
    expect(
      subtractOpenKeepingPoints({ low: 5, high: 5 }, [
        { low: 1, high: 5 },
        { low: 5, high: 9 },
      ]),
    ).toEqual([{ low: 5, high: 5 }]);
    expect(subtractOpenKeepingPoints({ low: 5, high: 5 }, [{ low: 4, high: 6 }])).toEqual([]);
  });

  it('takes edges within 1e-12 of each other as one edge, whichever way the rounding fell', () => {
    const p = 0.1 + 0.2; // 0.30000000000000004: one edge in exact arithmetic, two doubles
    const q = 0.3;
    expect(p).not.toBe(q);
    // Holes overlapping by rounding noise still leave the exact point between them.
    expect(
      subtractOpenKeepingPoints({ low: 0, high: 1 }, [
        { low: 0.1, high: p },
        { low: q, high: 0.5 },
      ]),
    ).toEqual([
      { low: 0, high: 0.1 },
      { low: p, high: p },
      { low: 0.5, high: 1 },
    ]);
    // Holes apart by rounding noise leave a point, not a sliver.
    expect(
      subtractOpenKeepingPoints({ low: 0, high: 1 }, [
        { low: 0.1, high: q },
        { low: p, high: 0.5 },
      ]),
    ).toEqual([
      { low: 0, high: 0.1 },
      { low: q, high: q },
      { low: 0.5, high: 1 },
    ]);
    // A point window whose edge a hole reaches by noise only is kept.
    expect(
      subtractOpenKeepingPoints({ low: p, high: p }, [
        { low: 1, high: p * (1 - 1e-15) },
        { low: p * (1 + 1e-15), high: 5 },
      ]),
    ).toEqual([{ low: p, high: p }]);
  });
});

/**
 * Worked on paper, all figures in kHz. Bands A = 10–14 (the Vaughan, Scott &
 * White worked case) and B = 15–16, spacing 0 (aliases may touch, not overlap).
 *
 * 1. Windows per band (Vaughan, Scott & White, "The theory of bandpass
 *    sampling", IEEE Trans. Signal Processing 39(9), 1991):
 *    2·fH/n ≤ r ≤ 2·fL/(n − 1), n ≤ ⌊fH/B⌋.
 *    A (n ≤ 3): [28, ∞), [14, 20], [28/3, 10].
 *    B (n ≤ 16): [32, ∞), [16, 30], [32/3, 15], [8, 10], [6.4, 7.5], …, each
 *    below 8 under A's lowest window 28/3.
 *    Intersections: [28/3, 10] (A in 3, B in 4), [14, 15] (2, 3), [16, 20] (2, 2),
 *    [28, 30] (1, 2), [32, ∞) (1, 1).
 *
 * 2. Collisions (Akos et al., "Direct bandpass sampling of multiple distinct
 *    RF signals", IEEE Trans. Communications 47(7), 1999; Tseng & Chou, IEEE
 *    Trans. Wireless Communications 5(1), 2006): the two aliases overlap
 *    exactly when B overlaps an image k·r ± A.
 *    (3, 4): A shows at f − r, B at 2r − f; B meets 3r − A = [3r − 14, 3r − 10]
 *      when 3r − 14 < 16 and 3r − 10 > 15: 25/3 < r < 10, all of [28/3, 10) .
 *    (2, 3): A shows at r − f, B at f − r; B meets 2r − A when 2r − 14 < 16 and
 *      2r − 10 > 15: 12.5 < r < 15, all of [14, 15).
 *    (2, 2): A at [r − 14, r − 10], B at [r − 16, r − 15]: 1 apart at every rate.
 *    (1, 2): A at [10, 14], B at [r − 16, r − 15]; B meets r − A when r − 14 < 16
 *      and r − 10 > 15: 25 < r < 30, all of [28, 30).
 *    (1, 1): A at [10, 14], B at [15, 16]: 1 apart.
 *
 * 3. Valid: {10}, {15}, [16, 20], {30}, [32, ∞). The lowest valid rate is the
 *    single rate 10 kHz: there A shows at [0, 4] in zone 3 and B at [4, 5] in
 *    zone 4, touching. A hair above, the zone edge r = 10 + ε cuts A; a hair
 *    below, B at [4 − 2ε, 5 − 2ε] overlaps A at [ε, 4 + ε].
 */
describe('two bands worked on paper: 10–14 kHz and 15–16 kHz (Vaughan et al. 1991; Akos et al. 1999)', () => {
  const bands = [band(10e3, 14e3), band(15e3, 16e3)];
  const set = jointFeasibleSet(bands, hz(0), NO_LIMITS);

  it('common windows: the intersection of each band’s Vaughan–Scott–White windows', () => {
    expect(commonWindows(bands, NO_LIMITS).map((w) => [w.minRate, w.maxRate, w.zones])).toEqual([
      [28e3 / 3, 10e3, [3, 4]],
      [14e3, 15e3, [2, 3]],
      [16e3, 20e3, [2, 2]],
      [28e3, 30e3, [1, 2]],
      [32e3, Infinity, [1, 1]],
    ]);
  });

  it('valid rates: {10}, {15}, [16, 20], {30}, [32, ∞) kHz, each band’s zone and inversion', () => {
    expect(rows(set)).toEqual([
      [10e3, 10e3, [3, 4]],
      [15e3, 15e3, [2, 3]],
      [16e3, 20e3, [2, 2]],
      [30e3, 30e3, [1, 2]],
      [32e3, Infinity, [1, 1]],
    ]);
    expect(set.feasible.map((f) => f.inverted)).toEqual([
      [false, true],
      [true, false],
      [true, true],
      [false, true],
      [false, false],
    ]);
  });

  it('collisions: the open intervals from the images 3r − A, 2r − A and r − A, clipped to their windows', () => {
    expect(set.collisions.map((c) => [c.first, c.second, c.minRate, c.maxRate])).toEqual([
      [0, 1, 28e3 / 3, 10e3],
      [0, 1, 14e3, 15e3],
      [0, 1, 28e3, 30e3],
    ]);
  });

  it('the lowest valid rate is the single exact rate 10 kHz: a hair above and below fail', () => {
    expect(set.lowestRate).toBe(10e3);
    // The definition of aliasing, folded point by point (test/helpers/brute-force-bands.ts).
    expect(bruteBandsValid(bands, 0, 10e3)).toBe(true);
    expect(bruteBandsValid(bands, 0, 10e3 * (1 + HAIR))).toBe(false);
    expect(bruteBandsValid(bands, 0, 10e3 * (1 - HAIR))).toBe(false);
    for (const point of [15e3, 30e3]) {
      expect(bruteBandsValid(bands, 0, point)).toBe(true);
      expect(bruteBandsValid(bands, 0, point * (1 + HAIR))).toBe(false);
      expect(bruteBandsValid(bands, 0, point * (1 - HAIR))).toBe(false);
    }
  });

  it('the same bands given in the other order give the same rates, zones swapped', () => {
    const swapped = jointFeasibleSet([bands[1]!, bands[0]!], hz(0), NO_LIMITS);
    expect(swapped.feasible.map((f) => [f.minRate, f.maxRate, [...f.zones].reverse()])).toEqual(rows(set));
  });
});

/**
 * Worked on paper, kHz: A = 10–14, B = 16–18, the aliases kept 1 apart.
 * Windows: A as above; B (n ≤ 9): [36, ∞), [18, 32], [12, 16], [9, 32/3], [7.2, 8], …
 * Intersections: [28/3, 10] (3, 4), [14, 16] (2, 3), [18, 20] (2, 2), [28, 32] (1, 2), [36, ∞) (1, 1).
 * Closer than 1 (Akos et al. 1999: B within 1 of an image k·r ± A):
 *   (3, 4): 3r − A within 1 of [16, 18]: 3r − 14 < 19, 3r − 10 > 15: 25/3 < r < 11, the whole window;
 *   (2, 3): 2r − 14 < 19, 2r − 10 > 15: 12.5 < r < 16.5, the whole window;
 *   (2, 2): A at [r − 14, r − 10], B at [r − 18, r − 16]: 2 apart;
 *   (1, 2): r − 14 < 19, r − 10 > 15: 25 < r < 33, the whole window;
 *   (1, 1): 2 apart.
 * Valid: [18, 20] and [36, ∞); lowest 18. With no spacing, (2, 3) forbids only
 * 13 < r < 16 (2r − 14 < 18, 2r − 10 > 16), leaving the single rate 16, where
 * A shows at [2, 6] and B at [0, 2].
 */
describe('a spacing between the aliases: 10–14 kHz and 16–18 kHz, 1 kHz apart (Akos et al. 1999)', () => {
  const bands = [band(10e3, 14e3), band(16e3, 18e3)];

  it('valid: [18, 20] and [36, ∞) kHz', () => {
    const set = jointFeasibleSet(bands, hz(1e3), NO_LIMITS);
    expect(rows(set)).toEqual([
      [18e3, 20e3, [2, 2]],
      [36e3, Infinity, [1, 1]],
    ]);
    expect(set.lowestRate).toBe(18e3);
    expect(bruteBandsValid(bands, 1e3, 18e3)).toBe(true);
    expect(bruteBandsValid(bands, 1e3, 18e3 * (1 - HAIR))).toBe(false);
  });

  it('with no spacing the lowest valid rate is the single rate 16 kHz', () => {
    const set = jointFeasibleSet(bands, hz(0), NO_LIMITS);
    expect(set.lowestRate).toBe(16e3);
    expect(rows(set)[0]).toEqual([16e3, 16e3, [2, 3]]);
    expect(bruteBandsValid(bands, 0, 16e3)).toBe(true);
    expect(bruteBandsValid(bands, 0, 16e3 * (1 + HAIR))).toBe(false);
    expect(bruteBandsValid(bands, 0, 16e3 * (1 - HAIR))).toBe(false);
  });
});

/**
 * Worked on paper, MHz: A = 1–2, B = 3–4, C = 6–7, rates 8–13.
 * Windows inside the limits: A zone 1 (r ≥ 4), B zone 1 (r ≥ 8), C zone 2
 * ([7, 12]) or zone 1 (r ≥ 14, outside): common [8, 12], zones (1, 1, 2).
 * A and B show as themselves, 1 apart; C shows at r − [6, 7] = [r − 7, r − 6].
 * C meets A (Akos et al. 1999: A meets the image r − C) when r − 7 < 2 and
 * r − 6 > 1: 7 < r < 9; C meets B when r − 7 < 4 and r − 6 > 3: 9 < r < 11.
 * The two collisions meet at 9, where C shows at [2, 3] touching both:
 * valid {9} and [11, 12]; the lowest valid rate is the single rate 9 MHz,
 * left between two forbidden intervals (not at a window edge).
 */
describe('three bands, a point between two collisions: 1–2, 3–4 and 6–7 MHz, rates 8–13 MHz', () => {
  const bands = [band(1e6, 2e6), band(3e6, 4e6), band(6e6, 7e6)];
  const set = jointFeasibleSet(bands, hz(0), limits(8e6, 13e6));

  it('valid: {9} and [11, 12] MHz, zones 1, 1, 2', () => {
    expect(rows(set)).toEqual([
      [9e6, 9e6, [1, 1, 2]],
      [11e6, 12e6, [1, 1, 2]],
    ]);
    expect(set.collisions.map((c) => [c.first, c.second, c.minRate, c.maxRate])).toEqual([
      [0, 2, 8e6, 9e6],
      [1, 2, 9e6, 11e6],
    ]);
  });

  it('9 MHz passes the point-by-point fold; a hair either side fails', () => {
    expect(set.lowestRate).toBe(9e6);
    expect(bruteBandsValid(bands, 0, 9e6)).toBe(true);
    expect(bruteBandsValid(bands, 0, 9e6 * (1 + HAIR))).toBe(false);
    expect(bruteBandsValid(bands, 0, 9e6 * (1 - HAIR))).toBe(false);
  });

  it('the single point survives band edges that are not whole numbers of hertz', () => {
    // Everything scaled by 1/3: the edges are no longer exact doubles, the point 3 MHz must stay.
    const third = bands.map((b) => band(b.low / 3, b.high / 3));
    const scaled = jointFeasibleSet(third, hz(0), limits(8e6 / 3, 13e6 / 3));
    expect(scaled.feasible).toHaveLength(2);
    const point = scaled.feasible[0]!;
    expect(point.maxRate).toBe(point.minRate);
    expect(point.minRate).toBeCloseTo(3e6, 3);
    expect(bruteBandsValidWithin(third, 0, point.minRate, 1e-9 * point.minRate)).toBe(true);
    expect(bruteBandsValid(third, 0, point.minRate * (1 + HAIR))).toBe(false);
    expect(bruteBandsValid(third, 0, point.minRate * (1 - HAIR))).toBe(false);
  });
});

describe('edges of one band kept as carefully with several', () => {
  it('the twice-the-bandwidth window of one band (a single rate) survives intersection', () => {
    // Vaughan, Scott & White 1991: 40–50 kHz (B = 10, fH = 5B) has the zone-5 window [20, 20] exactly.
    // With a narrow band at 3–4 kHz (zone 1 at any r ≥ 8, aliases itself): at 20 kHz the first band shows
    // at f − 2r = [0, 10] in zone 5, the narrow one at [3, 4], inside it, so 20 kHz is not valid for both…
    const overlapping = jointFeasibleSet([band(40e3, 50e3), band(3e3, 4e3)], hz(0), limits(19e3, 21e3));
    expect(overlapping.windows.map((w) => [w.minRate, w.maxRate, w.zones])).toEqual([[20e3, 20e3, [5, 1]]]);
    expect(overlapping.feasible).toEqual([]);
    expect(overlapping.lowestRate).toBeNull();
    // …alone it is: the single rate 2B.
    const alone = jointFeasibleSet([band(40e3, 50e3)], hz(0), limits(19e3, 21e3));
    expect(rows(alone)).toEqual([[20e3, 20e3, [5]]]);
  });

  it('bands that overlap at the input overlap at every rate', () => {
    // Folding never moves two frequencies further apart (common practice).
    expect(jointFeasibleSet([band(10e3, 14e3), band(13e3, 20e3)], hz(0), NO_LIMITS).feasible).toEqual([]);
  });
});
