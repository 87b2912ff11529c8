import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { hz } from '../../src/units/quantities.js';
import { ATTENUATION_CAP } from '../../src/filter/attenuation-cap.js';
import {
  butterworthAttenuation,
  butterworthLeastAttenuation,
  butterworthOmega,
  checkButterworth,
  type ButterworthBandPass,
} from '../../src/filter/butterworth-attenuation.js';

/**
 * 30–80 MHz: f0² = 2400 (MHz)², BW = 50 MHz. Ω = 2 solves f² − 100f − 2400 = 0
 * → f = 50 + √4900 = 120 MHz; Ω = −2 at f = −50 + 70 = 20 MHz. Worked by hand.
 */
const band = (order: number): ButterworthBandPass => ({ order, passLow: hz(30e6), passHigh: hz(80e6) });

/**
 * The low-pass prototype evaluated from its poles, independent of the
 * closed-form magnitude: p_k = exp(jπ(2k + N − 1)/(2N)), k = 1..N, and
 * H(s) = ∏(−p_k) / ∏(s − p_k) (Butterworth pole positions, e.g. Williams &
 * Taylor, Electronic Filter Design Handbook; from memory). The band-pass
 * comes from the substitution s → (s² + ω0²)/(s·B), at s = j·2πf.
 */
function attenuationFromPoles(filter: ButterworthBandPass, f: number): number {
  const w = 2 * Math.PI * f;
  const w0sq = (2 * Math.PI) ** 2 * filter.passLow * filter.passHigh;
  const b = 2 * Math.PI * (filter.passHigh - filter.passLow);
  // (s² + ω0²)/(s·B) at s = jω: (ω0² − ω²)/(jωB) = j(ω² − ω0²)/(ωB).
  const sIm = (w * w - w0sq) / (w * b);
  let magSq = 1;
  for (let k = 1; k <= filter.order; k++) {
    const angle = (Math.PI * (2 * k + filter.order - 1)) / (2 * filter.order);
    const pRe = Math.cos(angle);
    const pIm = Math.sin(angle);
    // |−p_k|² = 1; |s − p_k|² with s = j·sIm.
    magSq /= pRe * pRe + (sIm - pIm) ** 2;
  }
  return -10 * Math.log10(magSq);
}

describe('butterworthAttenuation: the standard magnitude', () => {
  it('5th order at Ω = 2 is 30.1 dB', () => {
    // Williams & Taylor, Electronic Filter Design Handbook (from memory): 30.1 dB.
    // Recomputed: 10·log10(1 + 2^10) = 10·log10(1025) = 30.1072 dB.
    expect(butterworthOmega(band(5), hz(120e6))).toBeCloseTo(2, 12);
    expect(butterworthAttenuation(band(5), hz(120e6))).toBeCloseTo(30.1, 1);
    expect(butterworthAttenuation(band(5), hz(120e6))).toBeCloseTo(10 * Math.log10(1025), 10);
    expect(butterworthAttenuation(band(5), hz(20e6))).toBeCloseTo(10 * Math.log10(1025), 10);
  });

  it('3 dB at Ω = ±1, the passband edges, for any order', () => {
    // Williams & Taylor (from memory); recomputed: 10·log10(2) = 3.0103 dB.
    for (let order = 1; order <= 12; order++) {
      expect(butterworthAttenuation(band(order), hz(30e6))).toBeCloseTo(10 * Math.log10(2), 10);
      expect(butterworthAttenuation(band(order), hz(80e6))).toBeCloseTo(10 * Math.log10(2), 10);
    }
  });

  it('0 dB at the geometric centre f0 = √(passLow·passHigh)', () => {
    expect(butterworthAttenuation(band(4), hz(Math.sqrt(2400) * 1e6))).toBeCloseTo(0, 12);
  });

  it('agrees with the prototype evaluated from its poles', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 8 }), fc.double({ min: 1e6, max: 1e9, noNaN: true }), (order, f) => {
        const expected = attenuationFromPoles(band(order), f);
        fc.pre(expected < 250); // the pole product loses precision far out; the cap is tested below
        expect(butterworthAttenuation(band(order), hz(f))).toBeCloseTo(expected, 6);
      }),
    );
  });

  it('is geometrically symmetric: the same at f and f0²/f', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 10 }), fc.double({ min: 1e5, max: 1e10, noNaN: true }), (order, f) => {
        const f0sq = 30e6 * 80e6;
        const a = butterworthAttenuation(band(order), hz(f));
        const b = butterworthAttenuation(band(order), hz(f0sq / f));
        expect(Math.abs(a - b)).toBeLessThanOrEqual(1e-9 * Math.max(1, a));
      }),
    );
  });

  it('is infinite at DC, reported as the 300 dB cap; far out it never overflows', () => {
    expect(ATTENUATION_CAP).toBe(300);
    expect(butterworthAttenuation(band(5), hz(0))).toBe(300);
    expect(butterworthAttenuation(band(40), hz(1))).toBe(300);
    expect(butterworthAttenuation(band(3), hz(1e15))).toBe(300);
    // Just under the cap the log form still equals the closed form: Ω = 1e4, N = 3 → 240 dB.
    const f = 5e11; // Ω ≈ f/BW = 1e4
    const omega = butterworthOmega(band(3), hz(f));
    expect(butterworthAttenuation(band(3), hz(f))).toBeCloseTo(10 * Math.log10(1 + omega ** 6), 9);
  });

  it('a negative frequency is attenuated as its magnitude', () => {
    expect(butterworthAttenuation(band(5), hz(-120e6))).toBe(butterworthAttenuation(band(5), hz(120e6)));
  });

  it('refuses a malformed filter', () => {
    expect(() => checkButterworth({ order: 0, passLow: hz(1), passHigh: hz(2) })).toThrow(RangeError);
    expect(() => checkButterworth({ order: 2.5, passLow: hz(1), passHigh: hz(2) })).toThrow(RangeError);
    expect(() => checkButterworth({ order: 2, passLow: hz(2), passHigh: hz(2) })).toThrow(RangeError);
    // passLow 0 is a low-pass and passHigh ∞ a high-pass; both at once pass everything and are refused.
    expect(() => checkButterworth({ order: 2, passLow: hz(0), passHigh: hz(2) })).not.toThrow();
    expect(() => checkButterworth({ order: 2, passLow: hz(2), passHigh: hz(Infinity) })).not.toThrow();
    expect(() => checkButterworth({ order: 2, passLow: hz(0), passHigh: hz(Infinity) })).toThrow(RangeError);
    expect(() => checkButterworth({ order: 2, passLow: hz(-1), passHigh: hz(2) })).toThrow(RangeError);
    expect(() => checkButterworth(band(5))).not.toThrow();
  });
});

describe('butterworthLeastAttenuation: exact, against a dense sweep', () => {
  it('hand-worked extents', () => {
    // Holds f0 ≈ 48.99 MHz: 0 dB.
    expect(butterworthLeastAttenuation(band(5), hz(40e6), hz(50e6))).toBe(0);
    // Wholly above f0: the lower end, 120 MHz (Ω = 2).
    expect(butterworthLeastAttenuation(band(5), hz(120e6), hz(130e6))).toBeCloseTo(10 * Math.log10(1025), 10);
    // Wholly below f0: the upper end, 20 MHz (Ω = −2).
    expect(butterworthLeastAttenuation(band(5), hz(15e6), hz(20e6))).toBeCloseTo(10 * Math.log10(1025), 10);
    // Negative extent [−130, −120] MHz: magnitudes [120, 130].
    expect(butterworthLeastAttenuation(band(5), hz(-130e6), hz(-120e6))).toBeCloseTo(10 * Math.log10(1025), 10);
    // Straddling 0: magnitudes [0, 20] MHz, least at 20 MHz.
    expect(butterworthLeastAttenuation(band(5), hz(-10e6), hz(20e6))).toBeCloseTo(10 * Math.log10(1025), 10);
    // A tone.
    expect(butterworthLeastAttenuation(band(5), hz(120e6), hz(120e6))).toBeCloseTo(10 * Math.log10(1025), 10);
  });

  it('is the minimum of a 20001-point sweep of the closed form, to within one sweep step', () => {
    // The sweep evaluates 10·log10(1 + Ω^(2N)) written out here, not the module's function.
    const direct = (filter: ButterworthBandPass, f: number) => {
      const a = Math.abs(f);
      const omega = (a * a - filter.passLow * filter.passHigh) / (a * (filter.passHigh - filter.passLow));
      return Math.min(300, 10 * Math.log10(1 + omega ** (2 * filter.order)));
    };
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 9 }),
        fc.double({ min: 1e6, max: 1e9, noNaN: true }),
        fc.double({ min: 1.01, max: 5, noNaN: true }),
        fc.double({ min: -2e9, max: 2e9, noNaN: true }),
        fc.double({ min: 0, max: 1e9, noNaN: true }),
        (order, passLow, ratio, low, width) => {
          const filter = { order, passLow: hz(passLow), passHigh: hz(passLow * ratio) };
          const high = low + width;
          let bruteMin = Infinity;
          const steps = 20000;
          for (let i = 0; i <= steps; i++) bruteMin = Math.min(bruteMin, direct(filter, low + (width * i) / steps));
          const least = butterworthLeastAttenuation(filter, hz(low), hz(high));
          expect(least).toBeLessThanOrEqual(bruteMin + 1e-9);
          // The sweep includes both ends, so it can miss the minimum only near an interior f0,
          // and there by no more than the attenuation one sweep step away from f0.
          const f0 = Math.sqrt(filter.passLow * filter.passHigh);
          const magnitudes = [Math.abs(low), Math.abs(high)];
          const f0Inside = (low <= f0 && f0 <= high) || (low <= -f0 && -f0 <= high);
          const step = width / steps;
          const slack = f0Inside
            ? Math.max(direct(filter, f0 + step), direct(filter, f0 - step))
            : 1e-9 * Math.max(1, ...magnitudes.map((m) => direct(filter, m)));
          expect(bruteMin - least).toBeLessThanOrEqual(slack + 1e-12);
        },
      ),
      { numRuns: 300 },
    );
  });
});
