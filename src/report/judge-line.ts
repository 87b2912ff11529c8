import { db, hz } from '../units/quantities.js';
import { quantityText } from '../text/quantity-text.js';
import type { CheckResult } from '../solve/evaluate-rate.js';
import { binDistance } from '../capture/coherent-bins.js';
import type { LineDraft } from '../capture/family-lines.js';
import type { ModelComponent } from '../capture/model-components.js';
import type { LevelBasis, LineStatus, PredictionRow } from './verify-result.js';

/** The notes are read in the terminal and the JSON: the terminal's way of writing numbers. */
const T = quantityText('terminal');

/** A line must stand this far above the floor to be looked for, dB. */
export const FIND_ABOVE_FLOOR = 3;
/**
 * ...and this far for its level to be judged ("well above the floor"), dB:
 * 30 dB above the median noise, where noise moves a level by about ±0.3 dB.
 */
export const JUDGE_ABOVE_FLOOR = 15;
/** Bins around a prediction searched for its peak: the window's reach, so a peak up to 3 bins off is seen as off, not as missing. */
export const SEARCH_BINS = 3;
/** A component within this many bins of a line, and no more than 40 dB weaker, can move its peak or level. */
const CROWD_BINS = 4;
const CROWD_RATIO = 0.01;

/** What one line is judged against. */
export interface LineSetting {
  readonly check: CheckResult;
  readonly line: LineDraft;
  readonly width: 'tone' | 'band';
  readonly basis: LevelBasis;
  /** The model's amplitude of the line. */
  readonly amplitude: number;
  /** The record: length N and bin width R/N, Hz. */
  readonly samples: number;
  readonly binWidth: number;
  /** The component's own folded bin. */
  readonly bin: number;
}

/** The measured spectrum and the levels it is judged by. */
export interface Measurement {
  readonly levels: Float64Array;
  /** Peak bins, ascending. */
  readonly peaks: readonly number[];
  readonly floor: number;
  readonly threshold: number;
  readonly tolerance: number;
  readonly components: readonly ModelComponent[];
  /** Components that sit at DC or rate/2 by nature (DC and rate/2 spurs). */
  readonly edgeKeys: ReadonlySet<string>;
}

/**
 * Judges one predicted line against the capture, in this order: below the
 * floor (not looked for); crowded (another component within 4 bins, at most
 * 40 dB weaker, or the line's own mirror about DC or rate/2: shown, not
 * judged); missing (no peak within 3 bins); off position (more than one bin
 * from the prediction); outside the plan's segments (a band's product whose
 * measured place the plan's aliased extent does not hold, ±1 bin); then the
 * level, when the model puts it JUDGE_ABOVE_FLOOR above the floor: on basis
 * `plan` within ±tolerance of the plan's level, on basis `bound` not above
 * it by more than the tolerance when above the threshold.
 *
 * @param setting the line, its check and how it is judged
 * @param measurement the spectrum and levels
 * @returns the row for the result
 * @example verifyCapture(heronBase, { rate: hz(184.32e6), samples: 16384, wantedTones: 1 }).predictions.some((p) => p.status === 'agrees') // true (judgeLine's verdicts)
 */
export function judgeLine(setting: LineSetting, measurement: Measurement): PredictionRow {
  const { check, line, samples, binWidth } = setting;
  const predictedBin = setting.width === 'tone' ? check.alias[0]![0] / binWidth : setting.bin;
  const modelLevel = db(20 * Math.log10(setting.amplitude));
  const base = {
    check: check.label,
    kind: check.kind,
    line: line.what,
    width: setting.width,
    basis: setting.basis,
    predicted: { frequency: hz(predictedBin * binWidth), bin: predictedBin },
    planLevel: check.level,
    modelLevel,
  };
  // DC and rate/2 spurs are read on their own bin: there the window's main lobe folds onto itself, and the bin beside reads higher on the tone scale.
  const ownEdge = measurement.edgeKeys.has(line.component);
  const peak = ownEdge
    ? measurement.levels[setting.bin]! > measurement.floor
      ? setting.bin
      : null
    : nearestPeak(measurement, predictedBin, samples);
  const measured = peak === null ? null : { frequency: hz(peak * binWidth), bin: peak, level: db(measurement.levels[peak]!) };
  const binError = peak === null ? null : peak - predictedBin;
  const levelError = measured === null ? null : db(measured.level - check.level);
  const insidePlan = setting.width === 'tone' ? null : inSegments((measured?.bin ?? setting.bin) * binWidth, check.alias, binWidth);
  const row = (status: LineStatus, note: string): PredictionRow => ({ ...base, insidePlan, measured, binError, levelError, status, note });

  if (modelLevel < measurement.floor + FIND_ABOVE_FLOOR)
    return row('below floor', `the model puts it at ${T.level(modelLevel)} dBFS, under the floor ${T.level(measurement.floor)} dBFS`);
  const crowd = crowdedBy(setting, measurement);
  if (crowd !== null) return row('crowded', crowd);
  if (measured === null || binError === null)
    return row('missing', `no peak within ${SEARCH_BINS} bins of bin ${T.number(predictedBin, 7)}`);
  if (Math.abs(binError) > 1) return row('off position', `peak ${T.number(binError, 3)} bins from the prediction`);
  if (insidePlan === false)
    return row(
      'outside plan segments',
      `measured at ${T.frequency(measured.frequency)}, outside the plan's aliased segments of ${check.label}`,
    );
  if (modelLevel < measurement.floor + JUDGE_ABOVE_FLOOR)
    return row('found', `level not judged: less than ${T.decibels(JUDGE_ABOVE_FLOOR)} dB above the floor`);
  const error = measured.level - check.level;
  if (setting.basis === 'plan') {
    return Math.abs(error) > measurement.tolerance
      ? row('off level', `${T.signedDecibels(error)} dB from the plan's level`)
      : row('agrees', '');
  }
  if (error > measurement.tolerance && measured.level > measurement.threshold)
    return row('above plan level', `${T.signedDecibels(error)} dB above the plan's level, and above the threshold`);
  return row('agrees', `the plan's level is a bound here; measured ${T.signedDecibels(error)} dB from it`);
}

function nearestPeak(measurement: Measurement, predictedBin: number, samples: number): number | null {
  const centre = Math.round(predictedBin);
  let best: number | null = null;
  for (const peak of measurement.peaks) {
    if (peak < centre - SEARCH_BINS) continue;
    if (peak > centre + SEARCH_BINS) break;
    if (peak > samples / 2) break;
    if (best === null || measurement.levels[peak]! > measurement.levels[best]!) best = peak;
  }
  return best;
}

function crowdedBy(setting: LineSetting, measurement: Measurement): string | null {
  const { bin, samples, line } = setting;
  const atEdge = !measurement.edgeKeys.has(line.component) && Math.min(2 * bin, samples - 2 * bin) <= 2 * SEARCH_BINS;
  if (atEdge) return `within ${SEARCH_BINS} bins of DC or rate/2: its mirror image overlaps it`;
  const other = measurement.components.find(
    (c) => c.key !== line.component && binDistance(c.bin, bin, samples) <= CROWD_BINS && c.amplitude >= setting.amplitude * CROWD_RATIO,
  );
  if (!other) return null;
  const apart = binDistance(other.bin, bin, samples);
  return `${other.name} lies ${apart} bin${apart === 1 ? '' : 's'} away: not told apart`;
}

function inSegments(frequency: number, segments: ReadonlyArray<readonly [number, number]>, slack: number): boolean {
  return segments.some(([low, high]) => frequency >= low - slack && frequency <= high + slack);
}
