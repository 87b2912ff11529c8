import { db, type Db, type Hz } from '../units/quantities.js';
import { magnitudeRange } from './butterworth-attenuation.js';

/** One point of a stated filter response. */
export interface AttenuationPoint {
  readonly frequency: Hz;
  readonly attenuation: Db;
}

/**
 * The table's points sorted by frequency, checked once at the boundary.
 *
 * @param points (frequency Hz, attenuation dB) pairs in any order
 * @returns the points ascending in frequency
 * @throws RangeError when the table is empty, a frequency is not a finite
 *   number > 0 (it must sit on a log axis), two points share a frequency, or
 *   an attenuation is not a finite number ≥ 0
 * @example sortedTable([{ frequency: hz(2e6), attenuation: db(40) }, { frequency: hz(1e6), attenuation: db(0) }])[0].frequency // 1e6
 */
export function sortedTable(points: ReadonlyArray<AttenuationPoint>): AttenuationPoint[] {
  if (points.length === 0) throw new RangeError('an attenuation table needs at least one point');
  for (const p of points) {
    if (!(Number.isFinite(p.frequency) && p.frequency > 0))
      throw new RangeError(`attenuation table frequency must be > 0 Hz, found ${p.frequency}`);
    if (!(Number.isFinite(p.attenuation) && p.attenuation >= 0)) throw new RangeError(`attenuation must be ≥ 0 dB, found ${p.attenuation}`);
  }
  const sorted = [...points].sort((a, b) => a.frequency - b.frequency);
  for (let i = 1; i < sorted.length; i++) {
    if (sorted[i]!.frequency === sorted[i - 1]!.frequency)
      throw new RangeError(`attenuation table has two points at ${sorted[i]!.frequency} Hz`);
  }
  return sorted;
}

/**
 * Attenuation of a tabulated filter: linear in dB over log-frequency between
 * points, held flat below the first point and above the last. Frequency 0
 * (−∞ on the log axis) takes the first point's value; a negative frequency is
 * attenuated as its magnitude.
 *
 * @param points the table, ascending in frequency (see sortedTable)
 * @param frequency Hz
 * @returns attenuation in dB
 * @example tableAttenuation([{ frequency: hz(1e6), attenuation: db(0) }, { frequency: hz(100e6), attenuation: db(40) }], hz(10e6)) // 20
 */
export function tableAttenuation(points: ReadonlyArray<AttenuationPoint>, frequency: Hz): Db {
  const f = Math.abs(frequency);
  const first = points[0]!;
  const last = points[points.length - 1]!;
  if (f <= first.frequency) return first.attenuation;
  if (f >= last.frequency) return last.attenuation;
  // First point strictly above f: exists, since f < last.frequency.
  const upper = points.findIndex((p) => p.frequency > f);
  const a = points[upper - 1]!;
  const b = points[upper]!;
  if (f === a.frequency) return a.attenuation;
  const t = Math.log(f / a.frequency) / Math.log(b.frequency / a.frequency);
  return db(a.attenuation + t * (b.attenuation - a.attenuation));
}

/**
 * The least attenuation of a tabulated filter over the extent [low, high], dB.
 * The response is piecewise linear in log-frequency, so its minimum over an
 * interval is at an end or at a table point inside: exact, no sampling. A
 * negative extent is taken as its magnitudes.
 *
 * @param points the table, ascending in frequency (see sortedTable)
 * @param low lower end of the extent, Hz
 * @param high upper end, Hz (≥ low)
 * @returns least attenuation in dB
 * @example tableLeastAttenuation([{ frequency: hz(1e6), attenuation: db(0) }, { frequency: hz(100e6), attenuation: db(40) }], hz(10e6), hz(50e6)) // 20 (at 10 MHz, the lower end)
 */
export function tableLeastAttenuation(points: ReadonlyArray<AttenuationPoint>, low: Hz, high: Hz): Db {
  const [near, far] = magnitudeRange(low, high);
  let least = Math.min(tableAttenuation(points, near as Hz), tableAttenuation(points, far as Hz));
  for (const p of points) if (p.frequency > near && p.frequency < far) least = Math.min(least, p.attenuation);
  return db(least);
}
