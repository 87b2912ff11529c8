import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { coveringTicks, linearTicks, logTicks, niceStep } from '../../src/pictures/nice-ticks.js';
import { frequencyUnit, inUnit } from '../../src/pictures/frequency-unit.js';

/**
 * 1-2-5 tick steps (common practice in plotting, no source) built from
 * integers so labels land exactly: 0.3 is the double nearest 3/10, which
 * prints as "0.3", where 3 × 0.1 prints "0.30000000000000004" (IEEE 754
 * double arithmetic, a fact of the trade).
 */
describe('linearTicks', () => {
  it('steps by 0.1 and lands every tick on its decimal', () => {
    expect(3 * 0.1).not.toBe(0.3); // the trap the integer construction avoids
    expect(linearTicks(0, 0.7, 7).values).toEqual([0, 0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7]);
  });

  it('stays finite where the span is a few ulps of its values (coarsens the step)', () => {
    const ticks = linearTicks(9999999999.999998, 1e10, 8);
    expect(ticks.values.length).toBeGreaterThan(0);
    expect(new Set(ticks.values).size).toBe(ticks.values.length);
  });

  it('gives a 10 MHz step over a 61.44 MHz half rate', () => {
    expect(linearTicks(0, 61.44e6, 8).values).toEqual([0, 1e7, 2e7, 3e7, 4e7, 5e7, 6e7]);
  });

  it('keeps ticks inside the range, 1-2-5 steps, about the wanted count, each printing as a short decimal', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -1e10, max: 1e10, noNaN: true }),
        fc.double({ min: 1e-6, max: 1e10, noNaN: true }),
        fc.integer({ min: 2, max: 12 }),
        (low, span, count) => {
          const high = low + span;
          // Spans of at least a millionth of their values: an axis, not a few ulps (that case is tested above).
          fc.pre(high > low && span >= 1e-6 * Math.abs(low));
          const ticks = linearTicks(low, high, count);
          expect([1, 2, 5]).toContain(ticks.step.mantissa);
          for (const v of ticks.values) expect(v >= low - 1e-9 * span && v <= high + 1e-9 * span).toBe(true);
          expect(ticks.values.length).toBeGreaterThanOrEqual(Math.floor(count / 2.5));
          expect(ticks.values.length).toBeLessThanOrEqual(count + 2);
          // Each tick is the double nearest its decimal k·m·10^e, as the JavaScript number parser reads it.
          for (const [i, v] of ticks.values.entries())
            expect(v).toBe(Number(`${ticks.multiples[i]! * ticks.step.mantissa}e${ticks.step.exponent}`));
        },
      ),
      { numRuns: 500, seed: 5 },
    );
  });
});

describe('niceStep and coveringTicks', () => {
  it('picks the smallest 1-2-5 step at least the spacing, exact powers of ten included', () => {
    expect(niceStep(0.13)).toEqual({ mantissa: 2, exponent: -1 });
    expect(niceStep(1000)).toEqual({ mantissa: 1, exponent: 3 });
    expect(niceStep(1e-3)).toEqual({ mantissa: 1, exponent: -3 });
    expect(niceStep(3)).toEqual({ mantissa: 5, exponent: 0 });
    expect(niceStep(6)).toEqual({ mantissa: 1, exponent: 1 });
  });

  it('encloses the range with its first and last tick', () => {
    expect(coveringTicks(-186, 0, 10).values).toEqual([-200, -180, -160, -140, -120, -100, -80, -60, -40, -20, 0]);
    expect(coveringTicks(0, 18.1, 8).values.at(-1)).toBe(20);
  });
});

describe('logTicks', () => {
  it('uses 1-2-5 per decade over a wide span', () => {
    expect(logTicks(20e6, 3e9)).toEqual([2e7, 5e7, 1e8, 2e8, 5e8, 1e9, 2e9]);
  });

  it('fills in a narrow span with more mantissas', () => {
    expect(logTicks(30e6, 250e6)).toEqual([3e7, 4e7, 5e7, 6e7, 7e7, 8e7, 9e7, 1e8, 1.5e8, 2e8, 2.5e8]);
  });
});

describe('frequency axis units', () => {
  it('takes the prefix formatFrequency gives the largest value and divides once', () => {
    expect(frequencyUnit(250e6)).toEqual({ unit: 'MHz', power: 6 });
    expect(frequencyUnit(3e9)).toEqual({ unit: 'GHz', power: 9 });
    expect(frequencyUnit(500)).toEqual({ unit: 'Hz', power: 0 });
    expect(inUnit(122.88e6, frequencyUnit(250e6))).toBe('122.88');
    expect(inUnit(3e8, frequencyUnit(3e9))).toBe('0.3');
  });
});
