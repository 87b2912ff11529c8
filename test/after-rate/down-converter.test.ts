import { describe, expect, it } from 'vitest';
import { hz } from '../../src/units/quantities.js';
import { ncoSetting } from '../../src/after-rate/nco-setting.js';
import { decimationPlan, NOT_AN_INTEGER } from '../../src/after-rate/decimation-plan.js';

// Tuning words worked by hand (common practice: word = round(f·2^bits / rate); the NCO gives word·rate / 2^bits).
describe('NCO tuning word', () => {
  it('the doc example: 10 MHz at 100 MHz with 8 bits', () => {
    // 10/100·256 = 25.6 → 26; 26·100/256 = 10.15625 MHz; error +156.25 kHz; −10 MHz: 256 − 26 = 230.
    expect(ncoSetting(hz(10e6), hz(100e6), 8, false)).toEqual({
      bits: 8,
      target: 10e6,
      word: 26,
      actual: 10.15625e6,
      error: 156.25e3,
      inverted: false,
      negativeWord: 230,
    });
  });

  it('17.12 MHz at 122.88 MHz with 32 bits, upright and inverted', () => {
    // 17.12/122.88 = 107/768; 2^32·107/768 = 5 592 405⅓ · 107 = 598 387 370⅔ → word 598 387 371.
    // Error: ⅓ · 122.88e6 / 2^32 = 40.96e6 / 4 294 967 296 = 0.0095367431640625 Hz.
    // Inverted: tune to −17.12 MHz with 2^32 − 598 387 371 = 3 696 579 925, which gives −actual: the error changes sign.
    const upright = ncoSetting(hz(17.12e6), hz(122.88e6), 32, false);
    expect(upright.word).toBe(598_387_371);
    expect(upright.error).toBeCloseTo(0.0095367431640625, 12);
    const inverted = ncoSetting(hz(17.12e6), hz(122.88e6), 32, true);
    expect(inverted.negativeWord).toBe(3_696_579_925);
    expect(inverted.inverted).toBe(true);
  });

  it('a frequency at rate/4 is exact: 30.72 MHz at 122.88 MHz gives 2^30 with 32 bits', () => {
    expect(ncoSetting(hz(30.72e6), hz(122.88e6), 32, false)).toMatchObject({ word: 2 ** 30, error: 0 });
  });

  it('refuses widths outside 1–48 bits and targets beyond rate/2', () => {
    expect(() => ncoSetting(hz(1e6), hz(10e6), 49, false)).toThrow(RangeError);
    expect(() => ncoSetting(hz(6e6), hz(10e6), 32, false)).toThrow(RangeError);
  });
});

describe('decimation to the output rate', () => {
  it('the doc example: 122.88 → 7.68 MHz is 16 = four half-band stages; a 5 MHz channel fits in 80 % of 7.68 MHz', () => {
    // Usable 0.8 · 7.68 = 6.144 MHz; room 3.072 − 2.5 = 0.572 MHz.
    const plan = decimationPlan(hz(122.88e6), hz(7.68e6), hz(5e6), 0.8, hz(0));
    expect(plan).toMatchObject({ factor: 16, halfBandStages: 4, remainder: 1, fits: true, refusal: null });
    expect(plan.fitSlack).toBeCloseTo(0.572e6, 3);
  });

  it('184.32 → 15.36 MHz is 12 = two half-band stages and a remainder of 3; 153.6 → 15.36 is 10 = one stage and 5', () => {
    expect(decimationPlan(hz(184.32e6), hz(15.36e6), hz(5e6), 0.8, hz(0))).toMatchObject({ factor: 12, halfBandStages: 2, remainder: 3 });
    expect(decimationPlan(hz(153.6e6), hz(15.36e6), hz(5e6), 0.8, hz(0))).toMatchObject({ factor: 10, halfBandStages: 1, remainder: 5 });
  });

  it('a ratio that is not whole needs a fractional resampler', () => {
    expect(decimationPlan(hz(100e6), hz(30.72e6), hz(5e6), 0.8, hz(0))).toMatchObject({
      factor: null,
      refusal: NOT_AN_INTEGER,
      remainder: null,
    });
    expect(decimationPlan(hz(10e6), hz(30.72e6), hz(5e6), 0.8, hz(0)).refusal).toBe('the output rate is above the sample rate');
  });

  it('a 20 MHz channel does not fit in 80 % of 15.36 MHz, and the NCO error eats into the room', () => {
    // Usable 12.288 MHz: half 6.144 − 10 = −3.856 MHz.
    expect(decimationPlan(hz(184.32e6), hz(15.36e6), hz(20e6), 0.8, hz(0))).toMatchObject({ fits: false });
    expect(decimationPlan(hz(184.32e6), hz(15.36e6), hz(20e6), 0.8, hz(0)).fitSlack).toBeCloseTo(-3.856e6, 3);
    // 12.288/2 − 6 = 0.144 MHz of room; an NCO 0.2 MHz off pushes the channel out.
    expect(decimationPlan(hz(184.32e6), hz(15.36e6), hz(12e6), 0.8, hz(0.2e6)).fits).toBe(false);
  });
});
