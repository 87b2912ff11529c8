import type { Db } from '../units/quantities.js';
import { arithmeticGeometricMean, complementaryModulus } from './elliptic-integral.js';

/** Minimum orders of the low-pass prototype for one mask (the band-pass filter has twice as many poles). */
export interface PrototypeOrders {
  readonly butterworth: number;
  readonly chebyshev: number;
  readonly elliptic: number;
}

/**
 * The minimum low-pass prototype orders that keep the passband ripple within
 * Ap dB up to Ω = 1 and give at least As dB from Ωs on, by the standard order
 * formulas (filter design handbooks, e.g. Williams & Taylor, Electronic
 * Filter Design Handbook):
 *   Butterworth  N ≥ log10(D) / (2·log10 Ωs),
 *   Chebyshev I  N ≥ arccosh(√D) / arccosh(Ωs),
 *   elliptic     N ≥ K(k)·K(√(1 − k1²)) / (K(k1)·K(√(1 − k²))),
 * with D = (10^(As/10) − 1)/(10^(Ap/10) − 1), k = 1/Ωs, k1 = 1/√D. With
 * K(k) = π/(2·AGM(1, k′)) the elliptic ratio is
 * AGM(1, k1′)·AGM(1, k) / (AGM(1, k′)·AGM(1, k1)), every modulus used
 * directly (no loss near 1). Each order is the ceiling of its bound; a mask
 * that asks for no more than the ripple (As ≤ Ap) needs order 0 (no filter).
 *
 * @param passbandRippleDb Ap, dB > 0
 * @param stopbandDb As, dB
 * @param selectivity Ωs > 1: the stopband edge over the passband edge of the prototype
 * @returns the three minimum orders
 * @throws RangeError unless Ap > 0 and Ωs > 1 (finite), As finite
 * @example prototypeOrders(db(1), db(40), 2) // { butterworth: 8, chebyshev: 5, elliptic: 4 }
 */
export function prototypeOrders(passbandRippleDb: Db, stopbandDb: Db, selectivity: number): PrototypeOrders {
  if (!(passbandRippleDb > 0 && Number.isFinite(passbandRippleDb)))
    throw new RangeError(`passband ripple must be > 0 dB, found ${passbandRippleDb}`);
  if (!(selectivity > 1 && Number.isFinite(selectivity))) throw new RangeError(`selectivity must be > 1, found ${selectivity}`);
  if (!Number.isFinite(stopbandDb)) throw new RangeError(`stopband attenuation must be finite, found ${stopbandDb}`);
  if (stopbandDb <= passbandRippleDb) return { butterworth: 0, chebyshev: 0, elliptic: 0 };
  const discrimination = Math.expm1((stopbandDb * Math.LN10) / 10) / Math.expm1((passbandRippleDb * Math.LN10) / 10);
  const butterworth = Math.log10(discrimination) / (2 * Math.log10(selectivity));
  const chebyshev = Math.acosh(Math.sqrt(discrimination)) / Math.acosh(selectivity);
  const k = 1 / selectivity;
  const k1 = 1 / Math.sqrt(discrimination);
  const elliptic =
    (arithmeticGeometricMean(1, complementaryModulus(k1)) * arithmeticGeometricMean(1, k)) /
    (arithmeticGeometricMean(1, complementaryModulus(k)) * arithmeticGeometricMean(1, k1));
  return { butterworth: Math.ceil(butterworth), chebyshev: Math.ceil(chebyshev), elliptic: Math.ceil(elliptic) };
}
