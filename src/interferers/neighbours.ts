import type { Db } from '../units/quantities.js';
import type { Neighbour, Scenario } from '../scenario/scenario.js';
import { leastAttenuation } from '../filter/filter-attenuation.js';
import { level, type InterfererDraft } from './interferer-draft.js';
import { dbText } from './words.js';

/**
 * A neighbour's level at the converter, dBFS: its level at the filter input
 * minus the filter's least attenuation over its band (its strongest part).
 *
 * @param neighbour the neighbour band (Hz) and its input level (dBFS)
 * @param scenario the validated scenario (filter)
 * @returns dBFS after the filter
 * @example neighbourLevel({ label: 'ADJ-UP', low: hz(120e6), high: hz(130e6), level: db(10), ownMargin: null }, s) // 10 (no filter in the fixture)
 */
export function neighbourLevel(neighbour: Neighbour, scenario: Scenario): Db {
  return level(neighbour.level - leastAttenuation(scenario.filter, neighbour.low, neighbour.high));
}

/**
 * A neighbour band at its post-filter level (its harmonics and its mixing
 * with other signals come from mixingProducts), with its own required
 * margin when it states one.
 *
 * @param neighbour one neighbour band
 * @param index its place among the scenario's neighbours
 * @param scenario the validated scenario
 * @returns the draft labelled `<label>`
 * @example neighbourDraft({ label: 'ADJ-UP', low: hz(120e6), high: hz(130e6), level: db(-10), ownMargin: null }, 0, s).label // 'ADJ-UP'
 */
export function neighbourDraft(neighbour: Neighbour, index: number, scenario: Scenario): InterfererDraft {
  const loss = leastAttenuation(scenario.filter, neighbour.low, neighbour.high);
  return {
    label: neighbour.label,
    kind: 'neighbour',
    order: null,
    source: `neighbour band ${neighbour.label} at ${dbText(neighbour.level, 'dBFS')} before the filter, ${dbText(loss, 'dB')} least filter attenuation`,
    rateMultiple: 0,
    shiftMultiple: 1, // converted by the same LO as the wanted band
    low: neighbour.low,
    high: neighbour.high,
    level: neighbourLevel(neighbour, scenario),
    mixing: [{ signal: 'neighbour', index, harmonic: 1, plus: 1, minus: 0 }],
    ownMargin: neighbour.margin ?? null,
  };
}
