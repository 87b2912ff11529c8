import { formatFrequency } from '../units/format-frequency.js';
import { quantityText } from '../text/quantity-text.js';

/** One SI unit for a whole frequency axis: the tick numbers are value / 10^power. */
export interface FrequencyUnit {
  /** e.g. 'MHz' */
  readonly unit: string;
  /** 0, 3, 6 or 9 */
  readonly power: number;
}

const POWERS: Readonly<Record<string, number>> = { Hz: 0, kHz: 3, MHz: 6, GHz: 9 };

/**
 * The SI unit for an axis whose largest magnitude is `largest`: the prefix
 * formatFrequency would give that value, so axis and tables agree.
 *
 * @param largest Hz, the axis's largest absolute value
 * @example frequencyUnit(250e6) // { unit: 'MHz', power: 6 }
 */
export function frequencyUnit(largest: number): FrequencyUnit {
  const unit =
    formatFrequency(Math.abs(largest) || 1)
      .split(' ')
      .pop() ?? 'Hz';
  return { unit, power: POWERS[unit] ?? 0 };
}

/**
 * A frequency as a number of the axis unit, for a tick label, written by the
 * text layer for SVG (a tick is an exact 1-2-5 multiple, so its digits are
 * the fewest that write it). Divides by the exact power of ten once, so
 * 2.5e8 Hz reads '250' (MHz).
 *
 * @param value Hz
 * @param unit the axis unit
 * @example inUnit(122.88e6, frequencyUnit(250e6)) // '122.88'
 */
export function inUnit(value: number, unit: FrequencyUnit): string {
  return quantityText('svg').number(value / 10 ** unit.power, 10);
}
