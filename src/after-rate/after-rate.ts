import { db, hz, type Db, type Hz, type Ppm } from '../units/quantities.js';
import type { Band } from '../math/band.js';
import type { AfterRateSettings, AntiAliasFilter, Scenario } from '../scenario/scenario.js';
import { levelThreshold } from '../interferers/level-threshold.js';
import { requiredMarginOf } from '../interferers/interferer-draft.js';
import { channelView } from '../scenario/channel-view.js';
import { driftRange } from '../solve/drift.js';
import type { Goal } from '../scenario/scenario.js';
import { aliasBands, nearestAliasBands } from './alias-bands.js';
import { filterMask, type FilterMask } from './filter-mask.js';
import { bandPassOrders, type BandPassOrders } from './band-pass-order.js';
import { driverLimitedSnr, noiseFolding, type NoiseFolding } from './noise-folding.js';
import { filterPowerResponse } from './power-response.js';
import { ncoSetting, type NcoSetting } from './nco-setting.js';
import { decimationPlan, type DecimationPlan } from './decimation-plan.js';

/** Everything the after-rate figures need from the scenario, fixed for every rate. */
export interface AfterRateInputs {
  readonly band: Band;
  /**
   * Margin to keep from the wanted alias, Hz: the channel is widened by it for the mask. The margin the solver
   * requires of a signal at the filter input that states none of its own (an unlisted blocker, kind 'neighbour'):
   * requirements.kindMargins.neighbour, else requirements.margin (maskMargin).
   */
  readonly margin: Hz;
  readonly inputBandwidth: Hz;
  readonly filter: AntiAliasFilter | null;
  /** Non-blocking threshold, dBFS. */
  readonly threshold: Db;
  readonly settings: AfterRateSettings;
  /** Output rate of the down-converter: stated, else the decimation goal's; null when neither. */
  readonly outputRate: Hz | null;
  /** With several channels, each channel's own inputs in order (the fields above are the first one's); absent for one band. */
  readonly channels?: readonly AfterRateInputs[];
}

/**
 * The after-rate inputs of a scenario; with several channels, each
 * channel's too (its band, margin and threshold, through channelView).
 *
 * @param scenario the validated scenario
 * @param goal the goal in force (a command-line goal may replace the scenario's): its output rate stands in for an unstated one
 * @returns the inputs
 * @example afterRateInputs(s).threshold // -100 (weakest wanted level −60 dBFS less the 40 dB rejection)
 */
export function afterRateInputs(scenario: Scenario, goal: Goal = scenario.goal): AfterRateInputs {
  if (scenario.channels.length > 1) {
    const channels = scenario.channels.map((_, i) => oneBandInputs(channelView(scenario, i), goal));
    return { ...channels[0]!, channels };
  }
  return oneBandInputs(scenario, goal);
}

function oneBandInputs(scenario: Scenario, goal: Goal): AfterRateInputs {
  const stated = scenario.afterRate.downConverter.outputRate;
  return {
    band: { low: scenario.wanted.low, high: scenario.wanted.high },
    margin: maskMargin(scenario),
    inputBandwidth: scenario.converter.inputBandwidth,
    filter: scenario.filter,
    threshold: levelThreshold(scenario),
    settings: scenario.afterRate,
    outputRate: stated ?? (goal.kind === 'decimation' ? goal.outputRate : null),
  };
}

/**
 * The margin the anti-alias mask widens the channel by: the one the solver
 * requires of the signals the mask holds back, a signal anywhere outside the
 * channel at the filter input with no margin of its own, that is a blocker of
 * kind 'neighbour' (requiredMarginOf: requirements.kindMargins.neighbour,
 * else requirements.margin).
 *
 * @param scenario the validated scenario (or one channel's view of it)
 * @returns Hz
 * @example maskMargin(s) // 1e6 (no kind margins: the scenario's 1 MHz)
 */
export function maskMargin(scenario: Scenario): Hz {
  return requiredMarginOf({ kind: 'neighbour', ownMargin: null }, scenario);
}

/** The filter orders a mask needs, for the channel and the nearest alias bands each side. */
export interface FilterDesign extends BandPassOrders {
  readonly passbandRippleDb: Db;
  readonly stopbandDb: Db;
  /** Upper edge of the nearest alias band below the channel, Hz; null when none. */
  readonly stopBelow: Hz | null;
  /** Lower edge of the nearest alias band above, Hz; null when none. */
  readonly stopAbove: Hz | null;
}

/** The noise figures at one rate. */
export interface RateNoise extends NoiseFolding {
  /** The driver's noise density, dBFS/Hz; null when not stated. */
  readonly driverNoiseDensity: Db | null;
  /** SNR the folded driver noise alone leaves in the channel, dB; null without a density. */
  readonly driverSnrDb: Db | null;
}

/** The down-converter settings at one rate. */
export interface DownConverterSettings {
  /** Null when no NCO width is stated or the channel straddles a zone edge. */
  readonly nco: NcoSetting | null;
  /** Null when no output rate is stated (nor a decimation goal). */
  readonly decimation: DecimationPlan | null;
}

/** What a chosen rate asks of the filter and the down-converter. */
export interface AfterRate {
  readonly mask: FilterMask;
  readonly design: FilterDesign;
  /** Null when the filter stops the whole channel. */
  readonly noise: RateNoise | null;
  readonly downConverter: DownConverterSettings;
}

/**
 * The anti-alias mask, the filter orders it needs, the noise that folds in
 * and the down-converter settings, at one rate.
 *
 * @param inputs the scenario's after-rate inputs
 * @param rate nominal sample rate, Hz
 * @param tolerancePpm the rate's drift, ±ppm: the mask's alias bands cover it
 * @param center the channel's aliased centre, Hz (the NCO frequency); null when the channel straddles a zone edge
 * @param inverted whether the channel arrives mirrored; null with center
 * @returns the figures
 * @example Object.keys(afterRate(afterRateInputs(heronBase), hz(184.32e6), ppm(20), hz(10e6), false)) // ['mask', 'design', 'noise', 'downConverter']
 */
export function afterRate(inputs: AfterRateInputs, rate: Hz, tolerancePpm: Ppm, center: Hz | null, inverted: boolean | null): AfterRate {
  const { band, margin, settings } = inputs;
  const drift = driftRange(rate, tolerancePpm);
  const widened = { low: hz(band.low - margin), high: hz(band.high + margin) };
  const maskBands = aliasBands(widened, hz(drift.low), hz(drift.high), inputs.inputBandwidth);
  const mask = filterMask(maskBands, inputs.filter, settings.outOfBandLevel, inputs.threshold);
  const nearest = nearestAliasBands(maskBands, band);
  const stopBelow = nearest.below ? nearest.below.high : null;
  const stopAbove = nearest.above ? nearest.above.low : null;
  const orders = bandPassOrders(band, stopBelow, stopAbove, settings.passbandRipple, mask.requiredDb);
  const design: FilterDesign = { ...orders, passbandRippleDb: settings.passbandRipple, stopbandDb: mask.requiredDb, stopBelow, stopAbove };
  return { mask, design, noise: rateNoise(inputs, rate), downConverter: downConverterSettings(inputs, rate, center, inverted) };
}

function rateNoise(inputs: AfterRateInputs, rate: Hz): RateNoise | null {
  const images = aliasBands(inputs.band, rate, rate, inputs.inputBandwidth);
  let folding: NoiseFolding;
  try {
    folding = noiseFolding(filterPowerResponse(inputs.filter), inputs.band, images);
  } catch (error) {
    if (error instanceof RangeError) return null;
    throw error;
  }
  const density = inputs.settings.driverNoiseDensity;
  return { ...folding, driverNoiseDensity: density, driverSnrDb: density === null ? null : driverLimitedSnr(density, folding) };
}

function downConverterSettings(inputs: AfterRateInputs, rate: Hz, center: Hz | null, inverted: boolean | null): DownConverterSettings {
  const { ncoBits, usableFraction } = inputs.settings.downConverter;
  const nco = ncoBits === null || center === null ? null : ncoSetting(center, rate, ncoBits, inverted === true);
  const width = hz(inputs.band.high - inputs.band.low);
  const decimation =
    inputs.outputRate === null ? null : decimationPlan(rate, inputs.outputRate, width, usableFraction, nco ? nco.error : hz(0));
  return { nco, decimation };
}

/**
 * The channel SNR once the folded driver noise is added (noise powers add).
 *
 * @param channelSnrDb the SNR from jitter, quantisation and processing gain, dB; null when not known
 * @param noise the rate's noise figures
 * @returns the lowered SNR, dB; null when either figure is missing
 * @example channelSnrWithDriver(null, null) // null
 */
export function channelSnrWithDriver(channelSnrDb: Db | null, noise: RateNoise | null): Db | null {
  if (channelSnrDb === null || noise === null || noise.driverSnrDb === null) return null;
  return db(-10 * Math.log10(10 ** (-channelSnrDb / 10) + 10 ** (-noise.driverSnrDb / 10)));
}
