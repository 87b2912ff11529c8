import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { hz } from '../../src/units/quantities.js';
import { partRateCount, partRates, rateFamilies, rateOf } from '../../src/clocks/part-rates.js';
import { everySetting, part, synthesiser } from './part-fixtures.js';

const MHZ = 1e6;
const key = (s: { N: number; M: number; D: number }) => `${s.N}/${s.M}/${s.D}`;

describe('the rates a part gives (rate = f·N/(M·D), the synthesiser relation; common practice, no source)', () => {
  it('a direct part gives its own frequency, N = M = D = 1', () => {
    const xo = part('XO-A 122.88M', 122.88 * MHZ, { kind: 'direct' });
    expect(partRates(xo, [1, 2, 4], hz(40 * MHZ), hz(250 * MHZ))).toEqual([{ rate: 122.88 * MHZ, settings: { N: 1, M: 1, D: 1 } }]);
    expect(partRates(xo, [1], hz(130 * MHZ), hz(250 * MHZ))).toEqual([]);
  });

  it('a divider part gives f/D for each converter divider inside the range', () => {
    const xo = part('XO-G 491.52M', 491.52 * MHZ, { kind: 'divider' });
    const rates = partRates(xo, [1, 2, 4], hz(40 * MHZ), hz(250 * MHZ));
    expect(rates.map((r) => [r.rate, r.settings.D])).toEqual([
      [245.76 * MHZ, 2],
      [122.88 * MHZ, 4],
    ]);
  });

  it('a synthesiser keeps the VCO f·N/M inside its range: 10 MHz, N 1..200, M 1..2, VCO 800–1600 MHz', () => {
    // M = 1: N 80..160 (VCO 800..1600); M = 2: N 160..200 (VCO 800..1000).
    const syn = part('SYN-1', 10 * MHZ, synthesiser([1, 200], [1, 2], [1, 1], [800 * MHZ, 1600 * MHZ]));
    expect(rateFamilies(syn, [1])).toEqual([
      { M: 1, D: 1, nMin: 80, nMax: 160 },
      { M: 2, D: 1, nMin: 160, nMax: 200 },
    ]);
  });

  it('computes each rate in one expression from the integers: 10 MHz × 7 / (3 × 2) is (10e6·7)/6', () => {
    expect(rateOf(hz(10 * MHZ), { N: 7, M: 3, D: 2 })).toBe((10e6 * 7) / 6);
  });

  it('keeps a rate that lands exactly on a range end: 12.288 MHz × 10 / 1 = 122.88 MHz with the range ending there', () => {
    const syn = part('SYN-2', 12.288 * MHZ, synthesiser([1, 20], [1, 1], [1, 1]));
    const top = (12.288 * MHZ * 10) / 1;
    expect(partRates(syn, [1], hz(40 * MHZ), hz(top)).map((r) => r.settings.N)).toEqual([4, 5, 6, 7, 8, 9, 10]);
  });

  it('lists exactly the settings the definition gives, on random parts and ranges (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1 * MHZ, max: 100 * MHZ, noNaN: true }),
        fc.integer({ min: 1, max: 60 }),
        fc.integer({ min: 0, max: 80 }),
        fc.integer({ min: 1, max: 5 }),
        fc.integer({ min: 0, max: 3 }),
        fc.integer({ min: 1, max: 3 }),
        fc.integer({ min: 0, max: 2 }),
        fc.option(fc.tuple(fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: 0, max: 1, noNaN: true }))),
        fc.tuple(fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: 0, max: 1, noNaN: true })),
        (f, nMin, nSpan, mMin, mSpan, dMin, dSpan, vcoShape, limitShape) => {
          const nMax = nMin + nSpan;
          const vco: [number, number] | null = vcoShape ? [f * nMax * vcoShape[0], f * nMax * (vcoShape[0] + vcoShape[1])] : null;
          const syn = part('SYN-X', f, synthesiser([nMin, nMax], [mMin, mMin + mSpan], [dMin, dMin + dSpan], vco));
          const top = (f * nMax) / mMin;
          const low = top * limitShape[0];
          const high = low + top * limitShape[1];
          const listed = partRates(syn, [1], hz(low), hz(high));
          const expected = everySetting(syn, [1], low, high);
          expect(listed.map((r) => key(r.settings)).sort()).toEqual(expected.map(key).sort());
          for (const r of listed) expect(r.rate).toBe((f * r.settings.N) / (r.settings.M * r.settings.D));
          expect(partRateCount(syn, [1], hz(low), hz(high))).toBe(expected.length);
        },
      ),
      { numRuns: 400 },
    );
  });

  it('refuses a range that is not a range of positive integers', () => {
    expect(() => rateFamilies(part('bad', 10 * MHZ, synthesiser([0, 4], [1, 1], [1, 1])), [1])).toThrow(/positive integer/);
    expect(() => rateFamilies(part('bad', 10 * MHZ, synthesiser([5, 4], [1, 1], [1, 1])), [1])).toThrow(/below min/);
    expect(() => rateFamilies(part('bad', 10 * MHZ, { kind: 'divider' }), [1.5])).toThrow(/positive integer/);
  });
});
