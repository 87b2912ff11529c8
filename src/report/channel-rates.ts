import { hz, type Hz } from '../units/quantities.js';
import { guardBands, guardedBand, type Band } from '../math/band.js';
import type { RateLimits, RateWindow } from '../windows/rate-window.js';
import { rateWindows } from '../windows/enumerate-windows.js';
import { commonWindows } from '../windows/common-windows.js';
import { jointFeasibleSet } from '../solve/joint-feasible-set.js';

/** One channel of a multi-channel plan as the rate map needs it: its band and guards, Hz. */
export interface ChannelBand extends Band {
  readonly label: string;
  readonly guard: { readonly below: Hz; readonly above: Hz };
}

/** The rates one pair of channels forbids: inside their common windows, where their aliases come closer than the spacing. */
export interface PairRates {
  /** Indexes of the two channels, first < second. */
  readonly first: number;
  readonly second: number;
  /** The least distance kept between the two aliases, Hz; null when neither channel blocks the other (the pair forbids nothing). */
  readonly spacing: Hz | null;
  /** The forbidden rates, open intervals [minRate, maxRate], Hz, ascending. */
  readonly forbidden: ReadonlyArray<{ readonly minRate: Hz; readonly maxRate: Hz }>;
}

/** Each channel's own windows and each pair's forbidden rates. */
export interface ChannelRates {
  /** Per channel, in the order given: the windows holding its guarded band whole in one zone. */
  readonly windows: ReadonlyArray<readonly RateWindow[]>;
  /** Every pair, first channel major. */
  readonly pairs: readonly PairRates[];
}

/**
 * What each channel and each pair of channels says about the rate, for the
 * rate map of a multi-channel plan: each channel's own windows (its guarded
 * band whole in one zone, Vaughan, Scott & White 1991) and, for each pair,
 * the rates at which both are whole but their aliases come closer than the
 * spacing (one channel within the spacing of an image j·r ± the other,
 * Akos et al. 1999; `jointFeasibleSet` of the two bands without guards, the
 * margins being measured between the bands themselves, then kept where both
 * guarded bands are whole). Exact: every edge from the one image algebra.
 *
 * @param channels the channels, Hz, at least one
 * @param spacing the distance kept between two channels' aliases, Hz, by
 *   their indexes (first < second); null when that pair need not be kept
 *   apart (neither blocks the other)
 * @param limits the rates searched, Hz
 * @returns the windows per channel and the forbidden rates per pair
 * @throws RangeError for a channel without width
 * @example channelRates([{ label: 'A', low: hz(10e3), high: hz(14e3), guard: { below: hz(0), above: hz(0) } }, { label: 'B', low: hz(15e3), high: hz(16e3), guard: { below: hz(0), above: hz(0) } }], () => hz(0), { minRate: hz(20e3), maxRate: hz(40e3) }).pairs[0].forbidden
 *   // [{ minRate: 28000, maxRate: 30000 }] (B in zone 2 folds to r − 16k…r − 15k, onto A's 10k…14k)
 */
export function channelRates(
  channels: readonly ChannelBand[],
  spacing: (first: number, second: number) => Hz | null,
  limits: RateLimits,
): ChannelRates {
  const guarded = channels.map((c) => guardedBand(c, guardBands(c.guard.below, c.guard.above)));
  const windows = guarded.map((band) => rateWindows(band, limits));
  const pairs: PairRates[] = [];
  for (let first = 0; first < channels.length; first++) {
    for (let second = first + 1; second < channels.length; second++) {
      const apart = spacing(first, second);
      if (apart === null) {
        pairs.push({ first, second, spacing: null, forbidden: [] });
        continue;
      }
      const bands = [channels[first]!, channels[second]!].map((c) => ({ low: c.low, high: c.high }));
      const whole = commonWindows([guarded[first]!, guarded[second]!], limits).map((w) => ({ low: w.minRate, high: w.maxRate }));
      const collisions = jointFeasibleSet(bands, apart, limits).collisions.map((c) => ({ low: c.minRate, high: c.maxRate }));
      const forbidden = collisions.flatMap((c) =>
        whole.flatMap((w) => {
          const [low, high] = [Math.max(c.low, w.low), Math.min(c.high, w.high)];
          return low < high ? [{ minRate: hz(low), maxRate: hz(high) }] : [];
        }),
      );
      pairs.push({ first, second, spacing: apart, forbidden });
    }
  }
  return { windows, pairs };
}
