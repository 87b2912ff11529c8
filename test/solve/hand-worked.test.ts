import { describe, expect, it } from 'vitest';
import { hz, ppm } from '../../src/units/quantities.js';
import { handWorkedContext, MHZ } from '../helpers/hand-worked-plan.js';
import { solvePlan } from '../../src/plan/solve-plan.js';
import { evaluateRate } from '../../src/solve/evaluate-rate.js';

/**
 * A plan worked on paper (all figures in MHz; fractions kept exact).
 *
 * Wanted band 21–25 (B = 4), no guards, rates searched 10–60. Two blocking
 * interferers, each to be kept 0.5 away from the band's alias:
 *   - a board tone at 10 (fixed);
 *   - a converter spur at rate/4 (rateMultiple 1/4; it aliases to r/4 itself).
 *
 * 1. Windows (Vaughan, Scott & White, "The theory of bandpass sampling",
 *    IEEE Trans. Signal Processing 39(9), 1991): zone n holds [fL, fH] for
 *    2·fH/n ≤ r ≤ 2·fL/(n − 1), n ≤ ⌊fH/B⌋ = ⌊25/4⌋ = 6: 50/n ≤ r ≤ 42/(n − 1).
 *      n = 1: r ≥ 50 → [50, 60] after the limit;  n = 2: [25, 42];
 *      n = 3: [50/3, 21];  n = 4: [12.5, 14];  n = 5: [10, 10.5];
 *      n = 6: [25/3, 8.4], below 10, so cut away.
 *
 * 2. Blocked rates, from the image condition (common practice, no source: a
 *    frequency aliases within m of the band's alias exactly when it lies within
 *    m of an image j·r + [21, 25] or j·r − [25, 21] for an integer j).
 *    Tone at 10:
 *      j·r + [21, 25] within 0.5 of 10  ⇔ j·r ∈ (−15.5, −10.5):
 *        j = −1: r ∈ (10.5, 15.5);   j = −2: (5.25, 7.75), out of range.
 *      j·r − [21, 25] within 0.5 of 10  ⇔ j·r ∈ (30.5, 35.5):
 *        j = 1: (30.5, 35.5);  j = 2: (15.25, 17.75);  j = 3: (61/6, 71/6);
 *        j = 4: (7.625, 8.875), out of range.
 *      Union: (61/6, 17.75) ∪ (30.5, 35.5).
 *    Spur at r/4:
 *      r/4 within 0.5 of j·r + [21, 25]  ⇔ (1/4 − j)·r ∈ (20.5, 25.5):
 *        j = −1: r ∈ (16.4, 20.4);  j = −2: (82/9, 102/9);  j = 0: (82, 102) and
 *        j = −3: (82/13, 102/13), out of range.
 *      r/4 within 0.5 of j·r − [21, 25]  ⇔ (j − 1/4)·r ∈ (20.5, 25.5):
 *        j = 1: (82/3, 34);  j = 2: (82/7, 102/7);  j = 3: (82/11, 102/11), out of range.
 *    Clipped to the windows:
 *      zone 5 [10, 10.5]:   tone [61/6, 10.5],  spur the whole window (82/9 < 10, 102/9 > 10.5);
 *      zone 4 [12.5, 14]:   tone the whole window, spur the whole window (82/7 < 12.5, 102/7 > 14);
 *      zone 3 [50/3, 21]:   tone [50/3, 17.75], spur [50/3, 20.4];
 *      zone 2 [25, 42]:     tone [30.5, 35.5],  spur [82/3, 34];
 *      zone 1 [50, 60]:     nothing.
 *
 * 3. Feasible: [20.4, 21] (zone 3), [25, 82/3] and [35.5, 42] (zone 2, inverted), [50, 60] (zone 1).
 *    Spot checks at the edges: at r = 20.4 the band shows at [21 − r, 25 − r] = [0.6, 4.6] and the
 *    spur at 5.1, 0.5 above; at r = 82/3 the band shows at [r − 25, r − 21] = [7/3, 19/3] and the
 *    spur at 41/6, 0.5 above; at r = 35.5 the band shows at [10.5, 14.5] and the tone at 10.
 *
 * 4. Widest margin in each interval (tolerance 0): the worst slack is the least of the zone-edge
 *    distances (band.low − (n − 1)·r/2 and n·r/2 − band.high) and each margin minus 0.5.
 *    [25, 82/3]: min(21 − r/2, r − 25, (31 − r) − 0.5, (21 − 3r/4) − 0.5); r − 25 rises and
 *      20.5 − 3r/4 falls, equal at r = 26, worst slack 1 (the other two are 8 and 4.5).
 *    [35.5, 42]: min(21 − r/2, r − 25, (r − 35) − 0.5, (3r/4 − 25) − 0.5); 21 − r/2 = r − 35.5 at
 *      r = 113/3, worst slack 13/6 (the spur's is 2.75).
 *    [20.4, 21]: min(21 − r, 3r/2 − 25, (r − 15) − 0.5, (5r/4 − 25) − 0.5); 21 − r = 5r/4 − 25.5 at
 *      r = 62/3, worst slack 1/3.
 *    [50, 60]: min(21, r/2 − 25, 10.5, (21 − r/4) − 0.5): r/2 − 25 ≤ 20.5 − r/4 up to 182/3 > 60,
 *      so the best is the top, r = 60, worst slack 5.
 */

const context = handWorkedContext();

/** Rates compared to within 1e-6 Hz (the hand fractions are exact; the solver divides once). */
const closeTo = (mhz: number) => expect.closeTo(mhz * MHZ, 6);

describe('hand-worked plan: 21–25 MHz, tone at 10 MHz, rate/4 spur, 10–60 MHz', () => {
  const result = solvePlan(context);

  it('windows: Vaughan, Scott & White 1991, zones 1–5 inside the limits', () => {
    expect(result.windows.map((w) => [w.zone, w.minRate, w.maxRate])).toEqual([
      [1, 50 * MHZ, 60 * MHZ],
      [2, 25 * MHZ, 42 * MHZ],
      [3, closeTo(50 / 3), 21 * MHZ],
      [4, 12.5 * MHZ, 14 * MHZ],
      [5, 10 * MHZ, 10.5 * MHZ],
    ]);
  });

  it('blocked ranges: each derived from the image condition above', () => {
    const blocked = result.blocked.map((b) => [b.label, b.zone, b.minRate, b.maxRate]);
    const tone = 'board tone 10M';
    const spur = 'rate/4 spur';
    const expected = [
      [tone, 5, closeTo(61 / 6), closeTo(10.5)],
      [spur, 5, closeTo(10), closeTo(10.5)],
      [tone, 4, closeTo(12.5), closeTo(14)],
      [spur, 4, closeTo(12.5), closeTo(14)],
      [tone, 3, closeTo(50 / 3), closeTo(17.75)],
      [spur, 3, closeTo(50 / 3), closeTo(20.4)],
      [spur, 2, closeTo(82 / 3), closeTo(34)],
      [tone, 2, closeTo(30.5), closeTo(35.5)],
    ];
    expect(blocked).toHaveLength(expected.length);
    for (const row of expected) expect(blocked).toContainEqual(row);
  });

  it('feasible intervals: [20.4, 21], [25, 82/3], [35.5, 42], [50, 60] MHz', () => {
    expect(result.feasible.map((f) => [f.zone, f.inverted, f.minRate, f.maxRate])).toEqual([
      [3, false, closeTo(20.4), 21 * MHZ],
      [2, true, 25 * MHZ, closeTo(82 / 3)],
      [2, true, closeTo(35.5), 42 * MHZ],
      [1, false, 50 * MHZ, 60 * MHZ],
    ]);
  });

  it('widest-margin candidates: 60, 113/3, 26 and 62/3 MHz with worst slacks 5, 13/6, 1 and 1/3 MHz', () => {
    const found = result.candidates.map((c) => [c.label, c.evaluation.rate, c.evaluation.worstSlack, c.evaluation.pass]);
    // Rates to within 1 Hz: the LP (javascript-lp-solver) rounds its position to about 1e-8 of the interval.
    const near = (mhz: number) => expect.closeTo(mhz * MHZ, -0.3);
    expect(found).toEqual([
      // Each labelled by its feasible interval, rounded inward (82/3 MHz written 27.33 MHz).
      ['best in 50–60 MHz', near(60), near(5), true],
      ['best in 35.5–42 MHz', near(113 / 3), near(13 / 6), true],
      ['best in 25–27.33 MHz', near(26), near(1), true],
      ['best in 20.4–21 MHz', near(62 / 3), near(1 / 3), true],
    ]);
  });

  it('at 26 MHz: zone 2 inverted, band at 1–5 MHz, tone margin 5 MHz, spur at 6.5 MHz with margin 1.5 MHz', () => {
    // Zone 2 inverts: 21–25 MHz shows at [26 − 25, 26 − 21] = [1, 5] MHz, centre 3 MHz; the tone at
    // 10 MHz is below 13 MHz and shows as itself; the spur shows at 26/4 = 6.5 MHz.
    const judged = evaluateRate(context, hz(26 * MHZ), ppm(0));
    expect([judged.zone, judged.inverted, judged.image, judged.center]).toEqual([2, true, { low: 1 * MHZ, high: 5 * MHZ }, 3 * MHZ]);
    expect(judged.checks.map((c) => [c.label, c.alias, c.margin, c.pass])).toEqual([
      ['board tone 10M', [[10 * MHZ, 10 * MHZ]], 5 * MHZ, true],
      ['rate/4 spur', [[6.5 * MHZ, 6.5 * MHZ]], 1.5 * MHZ, true],
    ]);
    expect(judged.zoneEdgeMargin).toBe(1 * MHZ); // 26 − 25 above, 21 − 13 below
  });

  it('at 31 MHz: the tone lands 10 − (31 − 21) = 0 MHz from the band edge; the rate/4 spur lands inside, which ranks worse', () => {
    const judged = evaluateRate(context, hz(31 * MHZ), ppm(0));
    // Band at [6, 10] MHz; the tone at 10 MHz sits on its upper edge: margin 0 < 0.5 MHz.
    expect(judged.checks[0]!.margin).toBeCloseTo(0, 6);
    // The spur at 31/4 = 7.75 MHz lies inside [6, 10]: it would have to move 7.75 − 6 = 1.75 MHz (to the nearer edge) to clear it.
    expect(judged.checks[1]!.margin).toBeCloseTo(-1.75 * MHZ, 6);
    expect(judged.pass).toBe(false);
    expect(judged.limitedBy).toEqual({ kind: 'interferer', label: 'rate/4 spur' });
  });
});
