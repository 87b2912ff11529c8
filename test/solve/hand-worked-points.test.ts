import { describe, expect, it } from 'vitest';
import { hz, ppm } from '../../src/units/quantities.js';
import { handWorkedContext, handWorkedTone, MHZ } from '../helpers/hand-worked-plan.js';
import { planRates } from '../../src/solve/feasible-set.js';
import { evaluateRate } from '../../src/solve/evaluate-rate.js';
import { solvePlan } from '../../src/plan/solve-plan.js';
import { mergeOverlapping } from '../../src/math/interval-set.js';

/**
 * One band whose valid rates include a single point, worked on paper (MHz).
 *
 * Wanted band 21–25 (B = 4), no guards, fixed tones kept m = 0.5 from the
 * band's alias. Windows (Vaughan, Scott & White, "The theory of bandpass
 * sampling", IEEE Trans. Signal Processing 39(9), 1991): zone n holds the
 * band for 2·fH/n ≤ r ≤ 2·fL/(n − 1): zone 1 r ≥ 50, zone 2 [25, 42],
 * zone 3 [50/3, 21].
 *
 * The margin (common practice, no source): a frequency f aliases within m of
 * the band's alias exactly when it lies within m of an image j·r + [21, 25]
 * or j·r − [25, 21] for an integer j, i.e. when
 *   j·r + 21 − m < f < j·r + 25 + m   (upright), or
 *   j·r − 25 − m < f < j·r − 21 + m   (mirrored),
 * each an open interval of rates.
 *
 * Case A, two interferers whose intervals meet (rates 24–45: zone 2 only).
 *   Tone at 4, j = 1 mirrored: r − 25.5 < 4 < r − 20.5  ⇔  r ∈ (24.5, 29.5).
 *   Tone at 9, j = 1 mirrored: r − 25.5 < 9 < r − 20.5  ⇔  r ∈ (29.5, 34.5).
 *   Their other images miss [25, 42]: j = 2 mirrored gives (12.25, 14.75) and
 *   (14.75, 17.25), j = −1 upright (16.5, 21.5) and (11.5, 16.5), upright j ≥ 1
 *   lies above both tones.
 *   Feasible: [25, 42] minus (24.5, 29.5) ∪ (29.5, 34.5) = {29.5} ∪ [34.5, 42].
 *   At r = 29.5 the band shows inverted at [29.5 − 25, 29.5 − 21] = [4.5, 8.5]:
 *   the tone at 4 is 0.5 below it, the tone at 9 0.5 above; a hair lower the
 *   band moves down towards 4, a hair higher up towards 9. The lowest valid
 *   rate is exactly 29.5.
 *
 * Case B, two images of one interferer meeting (rates 45–60: zone 1 only).
 *   Tone at 76.5, j = 2 mirrored: 2r − 25.5 < 76.5 < 2r − 20.5  ⇔  r ∈ (48.5, 51);
 *                 j = 1 upright:  r + 20.5 < 76.5 < r + 25.5    ⇔  r ∈ (51, 56).
 *   Other images miss [50, 60]: j = 3 mirrored (97/3, 34), j = 2 upright (25.5, 28).
 *   Feasible: [50, 60] minus (48.5, 51) ∪ (51, 56) = {51} ∪ [56, 60].
 *   At r = 51 the tone is 1.5·r and folds onto r/2 = 25.5, 0.5 above the band's
 *   upper edge 25 (zone 1, upright); a hair either way it folds below 25.5.
 */

const HAIR = 1e-9;
const exact = (mhz: number) => mhz * MHZ;
const closeTo = (mhz: number) => expect.closeTo(mhz * MHZ, 6);

const twoTones = handWorkedContext({
  interferers: [handWorkedTone('tone 4M', 0, 4), handWorkedTone('tone 9M', 0, 9)],
  limits: { minRate: hz(24 * MHZ), maxRate: hz(45 * MHZ) },
});
const oneTone = handWorkedContext({
  interferers: [handWorkedTone('tone 76.5M', 0, 76.5)],
  limits: { minRate: hz(45 * MHZ), maxRate: hz(60 * MHZ) },
});

describe('case A: the forbidden intervals of two tones meet at 29.5 MHz', () => {
  const rates = planRates(twoTones);

  it('blocked ranges: (24.5, 29.5) by the 4 MHz tone, (29.5, 34.5) by the 9 MHz tone, clipped to zone 2 [25, 42]', () => {
    expect(rates.windows.map((w) => [w.zone, w.minRate, w.maxRate])).toEqual([[2, exact(25), exact(42)]]);
    expect(rates.blocked.map((b) => [b.label, b.minRate, b.maxRate])).toEqual([
      ['tone 4M', exact(25), closeTo(29.5)],
      ['tone 9M', closeTo(29.5), closeTo(34.5)],
    ]);
  });

  it('feasible: the single rate 29.5 MHz and [34.5, 42] MHz', () => {
    expect(rates.feasible.map((f) => [f.zone, f.inverted, f.minRate, f.maxRate])).toEqual([
      [2, true, closeTo(29.5), closeTo(29.5)],
      [2, true, closeTo(34.5), exact(42)],
    ]);
    // A point, not a sliver: both ends are the same number.
    expect(rates.feasible[0]!.minRate).toBe(rates.feasible[0]!.maxRate);
  });

  it('at 29.5 MHz both tones sit exactly 0.5 MHz from the band [4.5, 8.5] MHz and it passes; a hair either side fails', () => {
    const at = evaluateRate(twoTones, hz(exact(29.5)), ppm(0));
    expect(at.image).toEqual({ low: closeTo(4.5), high: closeTo(8.5) });
    expect(at.checks.map((c) => [c.label, c.margin])).toEqual([
      ['tone 4M', closeTo(0.5)],
      ['tone 9M', closeTo(0.5)],
    ]);
    expect(at.pass).toBe(true);
    const below = evaluateRate(twoTones, hz(exact(29.5) * (1 - HAIR)), ppm(0));
    const above = evaluateRate(twoTones, hz(exact(29.5) * (1 + HAIR)), ppm(0));
    expect([below.pass, below.limitedBy]).toEqual([false, { kind: 'interferer', label: 'tone 4M' }]);
    expect([above.pass, above.limitedBy]).toEqual([false, { kind: 'interferer', label: 'tone 9M' }]);
  });

  it('the lowest-rate goal answers exactly 29.5 MHz; at ±1 ppm the drift analysis fails that point', () => {
    const lowest = solvePlan({ ...twoTones, goal: { kind: 'lowest-rate' } });
    const first = lowest.candidates[0]!.evaluation;
    expect([first.rate, first.pass]).toEqual([closeTo(29.5), true]);
    // The drift r·(1 ± 1e-6) leaves the point both ways, each way towards one tone.
    const drifting = evaluateRate(twoTones, hz(exact(29.5)), ppm(1));
    expect(drifting.pass).toBe(false);
    expect(drifting.worstSlack).toBeLessThan(0);
  });
});

describe('case B: two images of one tone forbid (48.5, 51) and (51, 56) MHz', () => {
  const rates = planRates(oneTone);

  it('the two open intervals stay apart (the rate between them is valid) and the feasible set is {51} ∪ [56, 60] MHz', () => {
    expect(rates.windows.map((w) => [w.zone, w.minRate, w.maxRate])).toEqual([[1, exact(50), exact(60)]]);
    expect(rates.blocked.map((b) => [b.label, b.minRate, b.maxRate])).toEqual([
      ['tone 76.5M', exact(50), closeTo(51)],
      ['tone 76.5M', closeTo(51), closeTo(56)],
    ]);
    expect(rates.feasible.map((f) => [f.zone, f.minRate, f.maxRate])).toEqual([
      [1, closeTo(51), closeTo(51)],
      [1, closeTo(56), exact(60)],
    ]);
  });

  it('at 51 MHz the tone folds onto 25.5 MHz = rate/2, 0.5 MHz above the band; a hair either side it comes closer', () => {
    const at = evaluateRate(oneTone, hz(exact(51)), ppm(0));
    expect([at.pass, at.checks[0]!.margin]).toEqual([true, closeTo(0.5)]);
    for (const factor of [1 - HAIR, 1 + HAIR]) {
      const near = evaluateRate(oneTone, hz(exact(51) * factor), ppm(0));
      expect(near.pass, `at 51 MHz × ${factor}`).toBe(false);
      expect(near.checks[0]!.margin).toBeLessThan(exact(0.5));
    }
  });
});

describe('mergeOverlapping', () => {
  it("the doc comment's example: overlapping open intervals merge, touching ones stay apart (set algebra)", () => {
    expect(
      mergeOverlapping([
        { low: 4, high: 6 },
        { low: 2, high: 4 },
        { low: 5, high: 7 },
      ]),
    ).toEqual([
      { low: 2, high: 4 },
      { low: 4, high: 7 },
    ]);
  });
});
