import type { Db, Hz } from '../units/quantities.js';
import type { ClockPart } from '../scenario/scenario.js';
import type { RateEvaluation } from '../solve/evaluate-rate.js';
import type { DriftHeadroom } from '../solve/drift.js';

/** The integer settings that turn a part's frequency into a rate: rate = f × N / (M × D). */
export interface RateSettings {
  readonly N: number;
  readonly M: number;
  readonly D: number;
}

/** The SNR figures a part allows at the band's highest frequency, dB. */
export interface ClockSnr {
  /** −20·log10(2π·f·σ), σ = √(σ_part² + σ_aperture²); null when the part states no jitter. */
  readonly jitterSnrDb: Db | null;
  /** 6.02·bits + 1.76. */
  readonly quantisationSnrDb: Db;
  /** Jitter and quantisation limits combined (noise powers add). */
  readonly combinedSnrDb: Db;
  /** The combined SNR plus the processing gain 10·log10(rate / (2·bandwidth)). */
  readonly channelSnrDb: Db;
}

/** The best rate one part offers for one plan, judged exactly. */
export interface PartPlan {
  readonly part: ClockPart;
  readonly rate: Hz;
  readonly settings: RateSettings;
  readonly evaluation: RateEvaluation;
  /** Null when the nominal rate already fails. */
  readonly headroom: DriftHeadroom | null;
  readonly snr: ClockSnr;
  /** The evaluation passes over the part's whole tolerance. */
  readonly pass: boolean;
  /** How the rate was chosen among the part's rates (how far the answer is proven best). */
  readonly search: PartSearch;
  /**
   * Rates judged exactly (evaluateRate) or screened (worstSlackAt) on the
   * way, the answer's final judgement included; a sampled search keeps this
   * within its budget plus one.
   */
  readonly ratesJudged: number;
}

/**
 * - "every rate": every rate of the part inside the converter's range was judged; the answer is the best of them all.
 * - "intervals": a passing rate, the best of every feasible interval's integer optimum (enumerated or MILP), within the
 *   MILP allowance of the best passing rate.
 * - "sampled": nothing passes and the part has too many rates to screen them all; the failing rate reported is the
 *   best of a sample (every k-th N, the N next to interval, blocked-range and zone-centre rates, refined by climbing
 *   to better neighbours), not proven the nearest.
 */
export type PartSearch = 'every rate' | 'intervals' | 'sampled';
