import { describe, expect, it } from 'vitest';
import { hz } from '../../src/units/quantities.js';
import {
  breakpointAt,
  firstNearbyImage,
  imageOffsetHigh,
  imageOffsetLow,
  lastNearbyImage,
  marginAt,
  normalisedHigh,
  normalisedLow,
  normalisedMultiple,
} from '../../src/solve/fold-images.js';

/**
 * The plain-number forms of the image algebra, on values worked by hand from
 * the image condition (common practice, no source: an input frequency aliases
 * within m of the band's alias exactly when it lies within m of an image
 * j·r + [low, high] or j·r − [high, low]).
 */
describe('image algebra on plain numbers (the doc examples)', () => {
  it('offsets of the upright and mirrored images of 21–25 MHz', () => {
    expect(imageOffsetLow({ low: hz(21e6), high: hz(25e6) }, -1)).toBe(-25e6);
    expect(imageOffsetHigh({ low: hz(21e6), high: hz(25e6) }, -1)).toBe(-21e6);
    expect(imageOffsetLow({ low: hz(21e6), high: hz(25e6) }, 1)).toBe(21e6);
    expect(imageOffsetHigh({ low: hz(21e6), high: hz(25e6) }, 1)).toBe(25e6);
  });

  it('the image indices that can reach: c·r between −15 and 35 MHz for r in 10–60 MHz gives j from −2 to 4', () => {
    // c ≥ −15/10 = −1.5 → first integer −1, less one for rounding: −2; c ≤ 35/10 = 3.5 → 3, plus one: 4.
    expect(firstNearbyImage(0, -15e6, 10e6, 60e6)).toBe(-2);
    expect(lastNearbyImage(0, 35e6, 10e6, 60e6)).toBe(4);
  });

  it('a 72 MHz tone inside a 70–80 MHz image is 2 MHz in; at 65 MHz it is 5 MHz clear', () => {
    expect(marginAt(72e6, 72e6, 70e6, 80e6, 0)).toBe(-2e6);
    expect(marginAt(65e6, 65e6, 70e6, 80e6, 0)).toBe(5e6);
  });

  it('the margin bends where the centres meet: (10 + 10 − 21 − 25)/2 = −13 MHz at slope 1', () => {
    expect(breakpointAt(10e6, 10e6, 21e6, 25e6, 1)).toBe(-13e6);
    // The mirrored image at slope 2: (10 + 10 + 25 + 21)/(2·2) = 16.5 MHz.
    expect(breakpointAt(10e6, 10e6, -25e6, -21e6, 2)).toBe(16.5e6);
  });

  it('a negative extent −0.25·r + [1, 2] MHz folds as its magnitude 0.25·r + [−2, −1] MHz', () => {
    const extent = { rateMultiple: -0.25, low: hz(1e6), high: hz(2e6) };
    expect(normalisedMultiple(extent)).toBe(0.25);
    expect(normalisedLow(extent)).toBe(-2e6);
    expect(normalisedHigh(extent)).toBe(-1e6);
    expect(normalisedLow({ ...extent, rateMultiple: 0.5 })).toBe(1e6);
  });
});
