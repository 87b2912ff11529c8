import type { Hz } from '../units/quantities.js';

/** A closed interval of sampling rates that hold a band whole in one zone. */
export interface RateWindow {
  /** Nyquist zone the band occupies for every rate in the window. */
  readonly zone: number;
  /** Lowest legal rate, Hz. */
  readonly minRate: Hz;
  /** Highest legal rate, Hz; Infinity for an unbounded zone-1 window. */
  readonly maxRate: Hz;
  /** Even zone: the band arrives spectrally inverted. */
  readonly inverted: boolean;
  /** With several channels, the zone of each channel in order (`zone` is the first one's); absent for one band. */
  readonly channelZones?: readonly number[];
}

/** Lower and upper bounds on the sampling rate, Hz (upper may be Infinity). */
export interface RateLimits {
  readonly minRate: Hz;
  readonly maxRate: Hz;
}
