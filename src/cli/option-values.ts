import { InputError } from '../units/input-error.js';
import { parseFrequency } from '../units/parse-frequency.js';
import { hz, type Hz } from '../units/quantities.js';
import { guardBands, type Band, type Guard } from '../math/band.js';

/** A frequency option that must be above zero. */
export function positiveFrequency(text: string, option: string): Hz {
  const value = parseFrequency(text, option);
  if (value <= 0) throw new InputError(option, 'a frequency above zero', text);
  return value;
}

/** A guard band: a frequency, or a percentage of the band's width (`5%`). */
export function guardWidth(text: string, option: string, bandwidth: Hz): Hz {
  const percent = /^\s*(\d+\.?\d*|\.\d+)\s*%\s*$/.exec(text);
  if (percent) return hz((Number(percent[1]) / 100) * bandwidth);
  return parseFrequency(text, option);
}

export interface BandOptions {
  low?: string;
  high?: string;
  center?: string;
  width?: string;
}

/** The band from either --low/--high or --center/--width, never a mix. */
export function bandFromOptions(options: BandOptions): Band {
  const byEdges = options.low !== undefined || options.high !== undefined;
  const byCentre = options.center !== undefined || options.width !== undefined;
  if (byEdges && byCentre) {
    throw new InputError('--low/--high', 'either --low and --high, or --center and --width, not both', 'both');
  }
  if (byCentre) {
    const center = positiveFrequency(required(options.center, '--center'), '--center');
    const width = positiveFrequency(required(options.width, '--width'), '--width');
    if (width / 2 > center) throw new InputError('--width', `a width of at most twice the centre (${options.center})`, options.width ?? '');
    return { low: hz(center - width / 2), high: hz(center + width / 2) };
  }
  const low = parseFrequency(required(options.low, '--low'), '--low');
  const high = parseFrequency(required(options.high, '--high'), '--high');
  if (high <= low) throw new InputError('--high', `a frequency above --low (${options.low})`, options.high ?? '');
  return { low, high };
}

export interface GuardOptions {
  guard?: string;
  guardLow?: string;
  guardHigh?: string;
}

/** The guards from --guard (both sides) or --guard-low/--guard-high. */
export function guardFromOptions(options: GuardOptions, band: Band): Guard {
  const width = hz(band.high - band.low);
  if (options.guard !== undefined) {
    if (options.guardLow !== undefined || options.guardHigh !== undefined) {
      throw new InputError('--guard', 'either --guard, or --guard-low/--guard-high, not both', options.guard);
    }
    const both = guardWidth(options.guard, '--guard', width);
    return guardBands(both, both);
  }
  return guardBands(
    options.guardLow === undefined ? hz(0) : guardWidth(options.guardLow, '--guard-low', width),
    options.guardHigh === undefined ? hz(0) : guardWidth(options.guardHigh, '--guard-high', width),
  );
}

/**
 * A band written LOW:HIGH, each side a frequency as engineers write it.
 *
 * @param text the option's value, e.g. `1574.397M:1576.443M`
 * @param option the option's name, for the error
 * @returns the band, Hz
 * @throws InputError when either side is missing or not a frequency, or HIGH is not above LOW
 * @example bandFromPair('60M:80M', '--band') // { low: 60000000, high: 80000000 }
 */
export function bandFromPair(text: string, option: string): Band {
  const sides = text.split(':');
  if (sides.length !== 2) throw new InputError(option, 'a band written LOW:HIGH, e.g. 60M:80M', text);
  const low = parseFrequency(sides[0]!, option);
  const high = parseFrequency(sides[1]!, option);
  if (!(high > low)) throw new InputError(option, `a band whose upper edge is above its lower edge (${sides[0]!.trim()})`, text);
  return { low, high };
}

function required(value: string | undefined, option: string): string {
  if (value === undefined) throw new InputError(option, `${option} with a frequency`, 'nothing');
  return value;
}

/** A whole number within bounds, for counts such as --multiples. */
export function wholeNumber(text: string, option: string, least: number, most: number): number {
  const value = Number(text);
  if (!/^\s*\d+\s*$/.test(text) || value < least || value > most) {
    throw new InputError(option, `a whole number from ${least} to ${most}`, text);
  }
  return value;
}
