import type { Db, Hz, Ppm, Seconds } from '../units/quantities.js';
import type { Band, Guard } from '../math/band.js';

/**
 * The validated scenario: one receiver variant, every frequency in Hz, every
 * level in dB, every default filled in. The file format (strings such as
 * `70 MHz`, `extends`, percentages) is read into this by the scenario schema;
 * every later stage reads only this.
 */
export interface Scenario {
  /** Variant name, e.g. "Heron-4 base". */
  readonly name: string;
  readonly description: string;
  /** The wanted IF band and the levels at which it is planned; with several channels, the first one. */
  readonly wanted: WantedBand;
  /**
   * Every channel digitised by the converter, in the file's order, at least
   * one: a `wanted` object gives one channel labelled "wanted" (its guard and
   * requirements the scenario's); a `wanted` list gives one per entry. The
   * first is `wanted`, `guard` and `requirements`.
   */
  readonly channels: readonly Channel[];
  /** Guard bands for the anti-alias filter's transitions, Hz. */
  readonly guard: Guard;
  readonly converter: Converter;
  /** Highest harmonic order checked (every signal at the converter input), ≥ 2. */
  readonly harmonicOrder: number;
  /** Highest total order of the mixing products generated among the signals at the converter input, ≥ 2 (default 3). */
  readonly maxOrder?: number;
  readonly boardSpurs: readonly BoardSpur[];
  readonly neighbours: readonly Neighbour[];
  /** The analog anti-alias filter, or null when none is stated (no attenuation). */
  readonly filter: AntiAliasFilter | null;
  readonly requirements: Requirements;
  /** The clock parts the board may use, each giving one or more sample rates. */
  readonly clocks: readonly ClockPart[];
  readonly goal: Goal;
  /**
   * How far the IF may move when the first LO is retuned, Hz (the wanted band
   * and the neighbours shift by δ in [low, high]; fixed board spurs do not);
   * null when the LO is fixed.
   */
  readonly ifShift: { readonly low: Hz; readonly high: Hz } | null;
  /** What the work after the rate needs: the filter mask, the driver's noise, the down-converter (src/after-rate/). */
  readonly afterRate: AfterRateSettings;
}

/** Widest NCO accumulator a scenario may state, bits: every tuning word then stays an exact integer in a double. */
export const MOST_NCO_BITS = 48;

/** Settings for the anti-alias mask, noise folding and down-converter figures of a chosen rate. */
export interface AfterRateSettings {
  /** Strongest signal outside the channel at the filter input, dBFS; null: not stated (full scale assumed, reported only). */
  readonly outOfBandLevel: Db | null;
  /** Passband ripple the filter orders are sized for, dB. */
  readonly passbandRipple: Db;
  /** Wideband noise density of the driver ahead of the filter, dBFS/Hz; null when not stated. */
  readonly driverNoiseDensity: Db | null;
  readonly downConverter: {
    /** NCO accumulator width, bits; null: no tuning word. */
    readonly ncoBits: number | null;
    /** Complex output rate, Hz; null: the decimation goal's, if any. */
    readonly outputRate: Hz | null;
    /** Part of the output band left usable by the digital filter's transition, (0, 1]. */
    readonly usableFraction: number;
  };
}

export interface WantedBand extends Band {
  /** Weakest wanted level at which the requirements apply, dBFS. */
  readonly weakestLevel: Db;
  /** Strongest wanted level, dBFS: the level at which harmonic figures are quoted. */
  readonly strongestLevel: Db;
}

/** One channel through the converter: its band, levels, guards and what it must keep. */
export interface Channel extends WantedBand {
  /** Unique among the channels, neighbours, board spurs and clock parts, e.g. "L1". */
  readonly label: string;
  /** Its guard bands, Hz (its own, or the scenario's with percentages of its own width). */
  readonly guard: Guard;
  /** Its requirements: the scenario's, with the fields it states replaced. */
  readonly requirements: Requirements;
}

export interface Converter {
  readonly label: string;
  /** Slowest and fastest sample clock the converter accepts, Hz. */
  readonly minRate: Hz;
  readonly maxRate: Hz;
  /** Analog input bandwidth, Hz: a wanted band above it is refused. */
  readonly inputBandwidth: Hz;
  readonly bits: number;
  /** Harmonic levels by order (2, 3, ...), dBc at the strongest wanted level. */
  readonly harmonics: ReadonlyMap<number, Db>;
  /** Third-order input intercept referred to full scale, dBFS; null: derived from the 3rd harmonic (also in `intercepts` as order 3). */
  readonly intercept3: Db | null;
  /** Input intercepts by order referred to full scale, dBFS; an order not here follows its harmonic figure (absent: none but intercept3). */
  readonly intercepts?: ReadonlyMap<number, Db>;
  /** Rate-tied spurs, dBFS; null where not stated; `fractions` at any p/q of the rate. */
  readonly rateSpurs: {
    readonly dc: Db | null;
    readonly halfRate: Db | null;
    readonly quarterRate: Db | null;
    readonly fractions?: readonly RateFractionSpur[];
  };
  /** M-way interleaving, or null for a single core. */
  readonly interleave: Interleave | null;
  /** Aperture jitter, s rms (0 when not stated). */
  readonly apertureJitter: Seconds;
  /** Integer dividers the converter can apply to its clock input (1 = undivided), ascending. */
  readonly clockDividers: readonly number[];
}

export interface Interleave {
  /** Number of interleaved cores M ≥ 2. */
  readonly ways: number;
  /** Offset (gain-independent) spurs at k·rate/M, dBFS. */
  readonly offsetSpur: Db;
  /** Images of the input at k·rate/M ± f, dBc (at imageReference when one is given). */
  readonly imageLevel: Db;
  /** Input frequency imageLevel is quoted at, Hz: the image rises 20 dB per decade of input frequency (timing skew); null: flat (gain mismatch). */
  readonly imageReference?: Hz | null;
}

/** A converter spur at numerator/denominator of the sample rate. */
export interface RateFractionSpur {
  readonly numerator: number;
  readonly denominator: number;
  /** dBFS. */
  readonly level: Db;
}

/** Required margins by interferer kind, Hz; null: the scenario's margin. */
export interface KindMargins {
  readonly harmonic: Hz | null;
  readonly intermod: Hz | null;
  readonly neighbour: Hz | null;
  readonly spur: Hz | null;
  readonly converter: Hz | null;
}

/** Where a board spur enters: ahead of the anti-alias filter or past it. */
export type Coupling = 'before-filter' | 'after-filter';

export interface BoardSpur {
  readonly label: string;
  /** A tone is a band with low = high. */
  readonly low: Hz;
  readonly high: Hz;
  /** Level, dBFS at the converter (before the filter's attenuation when coupling is before-filter). */
  readonly level: Db;
  readonly coupling: Coupling;
  /** Highest harmonic order of the spur itself (1: the fundamental only). */
  readonly harmonics: number;
  /** Its own required margin, Hz; null or absent: the kind's or the scenario's. */
  readonly margin?: Hz | null;
}

export interface Neighbour extends Band {
  readonly label: string;
  /** Level at the filter's input, dBFS (referred to converter full scale). */
  readonly level: Db;
  /** Its own required margin, Hz; null or absent: the kind's or the scenario's. */
  readonly margin?: Hz | null;
}

export type AntiAliasFilter =
  | { readonly kind: 'butterworth'; readonly order: number; readonly passLow: Hz; readonly passHigh: Hz }
  | { readonly kind: 'table'; readonly points: ReadonlyArray<{ readonly frequency: Hz; readonly attenuation: Db }> };

export interface Requirements {
  /** Frequency margin to keep between an interferer's alias and the wanted alias, Hz. */
  readonly margin: Hz;
  /** An interferer this far below the weakest wanted level may land anywhere, dB. */
  readonly rejection: Db;
  /** Drift a rate found by the solver (not a listed clock) must survive, ±ppm. */
  readonly tolerancePpm: Ppm;
  /** Margins by interferer kind, overriding `margin` for that kind (absent: none). */
  readonly kindMargins?: KindMargins;
  /** Margin to keep between another channel's alias and this channel's alias, Hz (absent: `margin`). */
  readonly channelSpacing?: Hz;
}

/** A clock part: a crystal, an oscillator, or a reference feeding a synthesiser. */
export interface ClockPart {
  readonly label: string;
  /** Nominal output frequency of the part, Hz. */
  readonly frequency: Hz;
  /** Total frequency tolerance, ±ppm (the sum of the breakdown when one is listed). */
  readonly tolerancePpm: Ppm;
  /** The contributions as listed, ±ppm; null when one figure was given. */
  readonly toleranceBreakdown: { readonly initial: Ppm; readonly temperature: Ppm; readonly ageing: Ppm } | null;
  /** rms jitter of the part, s; null when not stated. */
  readonly jitter: Seconds | null;
  /** Free text: cost, stock, preference. */
  readonly note: string;
  readonly derivation: RateDerivation;
}

/** An inclusive range of integers. */
export interface IntegerRange {
  readonly min: number;
  readonly max: number;
}

/**
 * How a part's frequency becomes a sample rate: directly; through the
 * converter's clock dividers (rate = f / D, D from converter.clockDividers);
 * or through a synthesiser, rate = f × N / (M × D), with the VCO at
 * f × N / M kept inside its range when one is given.
 */
export type RateDerivation =
  | { readonly kind: 'direct' }
  | { readonly kind: 'divider' }
  | {
      readonly kind: 'synthesiser';
      readonly n: IntegerRange;
      readonly m: IntegerRange;
      readonly d: IntegerRange;
      readonly vco: { readonly low: Hz; readonly high: Hz } | null;
    };

/** A concrete sample rate put forward for judging, with the drift it may take. */
export interface ClockCandidate {
  readonly label: string;
  readonly rate: Hz;
  readonly tolerancePpm: Ppm;
}

/** What "best" means for a rate inside a feasible interval. */
export type Goal =
  | { readonly kind: 'widest-margin' }
  | { readonly kind: 'lowest-rate' }
  | { readonly kind: 'quarter-rate' }
  | { readonly kind: 'decimation'; readonly outputRate: Hz };
