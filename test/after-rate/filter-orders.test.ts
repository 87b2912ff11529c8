import { describe, expect, it } from 'vitest';
import { db, hz } from '../../src/units/quantities.js';
import { arithmeticGeometricMean, complementaryModulus, completeEllipticK } from '../../src/after-rate/elliptic-integral.js';
import { prototypeOrders } from '../../src/after-rate/prototype-order.js';
import { bandPassOrders } from '../../src/after-rate/band-pass-order.js';

describe('complete elliptic integral K by the arithmetic-geometric mean', () => {
  it('the doc example: K(1/√2) = 1.8540746773013719', () => {
    expect(completeEllipticK(Math.SQRT1_2)).toBeCloseTo(1.8540746773013719, 14);
  });

  // Reference values: scipy 1.17.1, scipy.special.ellipk(m) with m = k² (Abramowitz & Stegun table 17.1 gives the same to
  // its 9 places: K(m = 0.5) = 1.854074677, K(α = 80°) = 3.153385252).
  it.each([
    [0, 1.5707963267948966],
    [Math.sqrt(0.5), 1.8540746773013719],
    [Math.sqrt(0.9), 2.5780921133481733],
    [Math.sin((80 * Math.PI) / 180), 3.1533852518878374],
    [0.999999, 7.9474797735479665], // scipy.special.ellipkm1(1 − k²)
  ])('K(%f) = %f (scipy.special.ellipk)', (k, expected) => {
    expect(completeEllipticK(k)).toBeCloseTo(expected, 9);
  });

  it('Gauss: AGM(1, √2) = 1.19814023473559 (the lemniscate constant relation, from memory) and √(1 − k²) exact near 1', () => {
    expect(arithmeticGeometricMean(1, Math.SQRT2)).toBeCloseTo(1.19814023473559, 13);
    expect(complementaryModulus(0.6)).toBeCloseTo(0.8, 15);
    // k = 1 − δ: √(1 − k²) = √(δ·(2 − δ)) ≈ √(2δ); squaring k first would lose most of δ's digits.
    const k = 1 - 2 ** -40;
    expect(complementaryModulus(k) / Math.sqrt(2 * 2 ** -40)).toBeCloseTo(1, 9);
  });

  it('refuses a modulus outside [0, 1)', () => {
    expect(() => completeEllipticK(1)).toThrow(RangeError);
    expect(() => completeEllipticK(-0.1)).toThrow(RangeError);
  });
});

describe('low-pass prototype orders', () => {
  it('the doc example: Ap 1 dB, As 40 dB, Ωs 2 → 8, 5, 4', () => {
    expect(prototypeOrders(db(1), db(40), 2)).toEqual({ butterworth: 8, chebyshev: 5, elliptic: 4 });
  });

  // Reference: scipy 1.17.1, scipy.signal.buttord / cheb1ord / ellipord(wp = 1, ws = Ωs, gpass = Ap, gstop = As, analog = True).
  it.each([
    [2, 1, 40, 8, 5, 4],
    [1.5, 0.5, 60, 20, 9, 6],
    [1.05, 1, 40, 109, 19, 7],
    [10, 1, 80, 5, 4, 4],
    [1.2, 0.1, 100, 74, 23, 12],
  ])(
    'Ωs %f, Ap %f dB, As %f dB → Butterworth %i, Chebyshev I %i, elliptic %i (scipy.signal, analog)',
    (omega, ap, as, butterworth, chebyshev, elliptic) => {
      expect(prototypeOrders(db(ap), db(as), omega)).toEqual({ butterworth, chebyshev, elliptic });
    },
  );

  it('a mask asking no more than the ripple needs no filter; bad masks are refused', () => {
    expect(prototypeOrders(db(1), db(0.5), 2)).toEqual({ butterworth: 0, chebyshev: 0, elliptic: 0 });
    expect(() => prototypeOrders(db(0), db(40), 2)).toThrow(RangeError);
    expect(() => prototypeOrders(db(1), db(40), 1)).toThrow(RangeError);
  });

  it('the Butterworth order meets its mask and one order less does not: 10·log10(1 + ε²·Ωs^(2N)) against As (the magnitude formula)', () => {
    // With the passband edge at the ripple point, |H|² = 1/(1 + ε²Ω^(2N)), ε² = 10^(Ap/10) − 1 (Williams & Taylor, from memory).
    const [ap, as, omega] = [1, 60, 1.7];
    const n = prototypeOrders(db(ap), db(as), omega).butterworth;
    const attenuation = (order: number) => 10 * Math.log10(1 + (10 ** (ap / 10) - 1) * omega ** (2 * order));
    expect(attenuation(n)).toBeGreaterThanOrEqual(as);
    expect(attenuation(n - 1)).toBeLessThan(as);
  });
});

describe('band-pass orders from the channel and the nearest alias bands', () => {
  it('the doc example: 100–120 MHz, stop at 80 and 150 MHz, 1 dB / 60 dB → 7, 5, 4', () => {
    expect(bandPassOrders({ low: hz(100e6), high: hz(120e6) }, hz(80e6), hz(150e6), db(1), db(60)).orders).toEqual({
      butterworth: 7,
      chebyshev: 5,
      elliptic: 4,
    });
  });

  // Reference: scipy 1.17.1, scipy.signal.buttord / cheb1ord / ellipord(wp = [low, high], ws = [below, above], gpass, gstop, analog = True).
  it.each([
    [130e6, 150e6, 55321843.2, 217636313.6, 1, 80, 6, 5, 4],
    [10e6, 14e6, 8e6, 17e6, 0.5, 50, 9, 6, 4],
    [65e6, 75e6, 40e6, 76e6, 1, 40, 32, 10, 6],
    [21e6, 25e6, 19e6, 55e6, 0.1, 70, 13, 8, 6],
  ])('pass %f–%f, stop %f / %f, Ap %f, As %f → %i, %i, %i (scipy.signal, analog band-pass)', (low, high, below, above, ap, as, b, c, e) => {
    expect(bandPassOrders({ low: hz(low), high: hz(high) }, hz(below), hz(above), db(ap), db(as)).orders).toEqual({
      butterworth: b,
      chebyshev: c,
      elliptic: e,
    });
  });

  it('names the tightest side: Ω(f) = |f² − f0²|/(f·BW) of each stop edge, the smaller wins', () => {
    // Worked by hand: passband 100–120 MHz, f0² = 12000 (MHz²), BW = 20. Below at 80: |6400 − 12000|/(80·20) = 3.5;
    // above at 150: (22500 − 12000)/(150·20) = 3.5 as well; move the upper edge to 140: 7600/2800 = 2.714 → above is tighter.
    const even = bandPassOrders({ low: hz(100e6), high: hz(120e6) }, hz(80e6), hz(150e6), db(1), db(60));
    expect(even.selectivityBelow).toBeCloseTo(3.5, 12);
    expect(even.selectivityAbove).toBeCloseTo(3.5, 12);
    const upper = bandPassOrders({ low: hz(100e6), high: hz(120e6) }, hz(80e6), hz(140e6), db(1), db(60));
    expect(upper.tightest).toBe('above');
    expect(upper.selectivity).toBeCloseTo(7600 / 2800, 12);
    const lower = bandPassOrders({ low: hz(100e6), high: hz(120e6) }, hz(95e6), null, db(1), db(60));
    expect(lower.tightest).toBe('below');
    expect(lower.selectivityAbove).toBeNull();
  });

  it('a channel from 0 Hz is a low-pass: 0–10 MHz, stop from 15 MHz, 1 dB / 60 dB → 19, 9, 6 (scipy.signal, analog low-pass)', () => {
    // Reference: scipy 1.17.1, buttord / cheb1ord / ellipord(wp = 10e6, ws = 15e6, gpass = 1, gstop = 60, analog = True).
    const lowPass = bandPassOrders({ low: hz(0), high: hz(10e6) }, hz(0), hz(15e6), db(1), db(60));
    expect(lowPass.orders).toEqual({ butterworth: 19, chebyshev: 9, elliptic: 6 });
    expect(lowPass).toMatchObject({ tightest: 'above', selectivity: 1.5, selectivityBelow: null });
  });

  it('a stop band reaching into the passband cannot be met (orders null); no stop band needs no filter', () => {
    expect(bandPassOrders({ low: hz(100e6), high: hz(120e6) }, hz(101e6), hz(150e6), db(1), db(60)).orders).toBeNull();
    expect(bandPassOrders({ low: hz(100e6), high: hz(120e6) }, null, null, db(1), db(60))).toMatchObject({
      orders: { butterworth: 0, chebyshev: 0, elliptic: 0 },
      tightest: null,
    });
  });
});
