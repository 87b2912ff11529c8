import { db, type Db } from '../units/quantities.js';

/**
 * The largest attenuation the filter model reports, dB. An ideal band-pass
 * stops DC completely (infinite attenuation); a finite cap keeps every level
 * a finite number that tables, JSON and sums can carry. 300 dB is far below
 * any converter's noise floor (a 32-bit converter spans about 194 dB), so
 * capping never turns a negligible signal into a relevant one.
 */
export const ATTENUATION_CAP: Db = db(300);

/** The attenuation limited to [0, ATTENUATION_CAP], dB. */
export function capAttenuation(value: number): Db {
  return db(Math.min(Math.max(value, 0), ATTENUATION_CAP));
}
