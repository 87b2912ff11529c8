import type { Db, Hz } from '../units/quantities.js';
import type { Band } from '../math/band.js';
import { prototypeOrders, type PrototypeOrders } from './prototype-order.js';

/** Which stopband edge sets the order. */
export type MaskSide = 'below' | 'above';

/** The least orders of a band-pass filter that meets a mask. */
export interface BandPassOrders {
  /** Low-pass prototype orders (the band-pass has twice as many poles); null when no filter can meet the mask (a stopband reaches into the passband). */
  readonly orders: PrototypeOrders | null;
  /** The prototype selectivity of the side that sets the order (the smaller Ωs); null with no stopband at all. */
  readonly selectivity: number | null;
  /** The tightest side; null with no stopband at all. */
  readonly tightest: MaskSide | null;
  /** |Ω| of each stopband edge, null where that side has none. */
  readonly selectivityBelow: number | null;
  readonly selectivityAbove: number | null;
  /** The channel starts at 0 Hz: the filter is a low-pass of the prototype's order. */
  readonly lowPass: boolean;
}

/**
 * The minimum Butterworth, Chebyshev type I and elliptic band-pass orders for
 * a mask: the passband [low, high] with the stated ripple, stopbands from 0 Hz
 * up to `stopBelow` and from `stopAbove` on, each at the stated attenuation.
 * The low-pass to band-pass transform Ω(f) = (f² − f0²)/(f·BW), f0 = √(low·high),
 * BW = high − low, maps each stopband edge to a prototype frequency; the
 * smaller |Ω| sets the order (the tightest side), as in filter design
 * handbooks and scipy.signal's order estimators (analog case). A channel
 * from 0 Hz is a low-pass: Ωs = stopAbove / high, and nothing lies below.
 *
 * @param passband the channel, Hz (0 ≤ low < high)
 * @param stopBelow upper edge of the nearest stopband below, Hz; null when there is none
 * @param stopAbove lower edge of the nearest stopband above, Hz; null when there is none
 * @param passbandRippleDb Ap, dB > 0
 * @param stopbandDb As, dB
 * @returns the orders, the tightest side and its selectivity
 * @throws RangeError for a passband that is not 0 ≤ low < high
 * @example bandPassOrders({ low: hz(100e6), high: hz(120e6) }, hz(80e6), hz(150e6), db(1), db(60)).orders // { butterworth: 7, chebyshev: 5, elliptic: 4 }
 */
export function bandPassOrders(
  passband: Band,
  stopBelow: Hz | null,
  stopAbove: Hz | null,
  passbandRippleDb: Db,
  stopbandDb: Db,
): BandPassOrders {
  if (!(passband.low >= 0 && passband.high > passband.low && Number.isFinite(passband.high))) {
    throw new RangeError(`band-pass orders need 0 ≤ low < high, found [${passband.low}, ${passband.high}] Hz`);
  }
  const f0Squared = passband.low * passband.high;
  const bandwidth = passband.high - passband.low;
  // With f0 = 0 (a low-pass) the transform is Ω = f / high.
  const omega = (f: number) => Math.abs(f * f - f0Squared) / (f * bandwidth);
  const selectivityBelow =
    stopBelow === null || passband.low === 0 ? null : stopBelow <= 0 ? Infinity : stopBelow >= passband.low ? 1 : omega(stopBelow);
  const selectivityAbove = stopAbove === null ? null : stopAbove <= passband.high ? 1 : omega(stopAbove);
  const lowPass = passband.low === 0;
  const sides = (
    [
      ['below', selectivityBelow],
      ['above', selectivityAbove],
    ] as const
  ).filter((s): s is readonly [MaskSide, number] => s[1] !== null);
  if (sides.length === 0)
    return {
      orders: { butterworth: 0, chebyshev: 0, elliptic: 0 },
      selectivity: null,
      tightest: null,
      selectivityBelow,
      selectivityAbove,
      lowPass,
    };
  const [tightest, selectivity] = sides.reduce((a, b) => (b[1] < a[1] ? b : a));
  if (stopbandDb <= passbandRippleDb || selectivity === Infinity) {
    return { orders: { butterworth: 0, chebyshev: 0, elliptic: 0 }, selectivity, tightest, selectivityBelow, selectivityAbove, lowPass };
  }
  const orders = selectivity > 1 ? prototypeOrders(passbandRippleDb, stopbandDb, selectivity) : null;
  return { orders, selectivity, tightest, selectivityBelow, selectivityAbove, lowPass };
}
