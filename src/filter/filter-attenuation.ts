import { db, type Db, type Hz } from '../units/quantities.js';
import type { AntiAliasFilter } from '../scenario/scenario.js';
import { butterworthAttenuation, butterworthLeastAttenuation, checkButterworth } from './butterworth-attenuation.js';
import { sortedTable, tableAttenuation, tableLeastAttenuation } from './table-attenuation.js';

/**
 * Attenuation of the scenario's anti-alias filter at one frequency, dB ≥ 0.
 * No filter (null) attenuates nothing.
 *
 * @param filter the scenario's filter, or null
 * @param frequency Hz (sign ignored: the filter is real)
 * @returns attenuation in dB; a Butterworth is capped at 300 dB (DC)
 * @throws RangeError for a malformed Butterworth (see checkButterworth) or table (see sortedTable)
 * @example filterAttenuation({ kind: 'butterworth', order: 5, passLow: hz(30e6), passHigh: hz(80e6) }, hz(120e6)) // 30.11
 */
export function filterAttenuation(filter: AntiAliasFilter | null, frequency: Hz): Db {
  if (filter === null) return db(0);
  if (filter.kind === 'butterworth') {
    checkButterworth(filter);
    return butterworthAttenuation(filter, frequency);
  }
  return tableAttenuation(sortedTable(filter.points), frequency);
}

/**
 * The least attenuation of the anti-alias filter across an input extent
 * [low, high], dB: the attenuation that leaves the strongest part of a band
 * (or the whole of a tone) at the converter. Exact, not sampled.
 *
 * @param filter the scenario's filter, or null (0 dB)
 * @param low lower end of the extent, Hz
 * @param high upper end, Hz (≥ low); a negative extent counts as its magnitudes
 * @returns least attenuation in dB
 * @throws RangeError when high < low, or for a malformed filter (see checkButterworth, sortedTable)
 * @example leastAttenuation({ kind: 'butterworth', order: 5, passLow: hz(30e6), passHigh: hz(80e6) }, hz(10e6), hz(20e6)) // 30.11 (at 20 MHz, Ω = −2.05)
 */
export function leastAttenuation(filter: AntiAliasFilter | null, low: Hz, high: Hz): Db {
  if (!(high >= low)) throw new RangeError(`extent needs low ≤ high, found [${low}, ${high}]`);
  if (filter === null) return db(0);
  if (filter.kind === 'butterworth') {
    checkButterworth(filter);
    return butterworthLeastAttenuation(filter, low, high);
  }
  return tableLeastAttenuation(sortedTable(filter.points), low, high);
}
