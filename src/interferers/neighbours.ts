import type { Db } from '../units/quantities.js';
import type { Neighbour, Scenario } from '../scenario/scenario.js';
import { leastAttenuation } from '../filter/filter-attenuation.js';
import { harmonicFigure } from './harmonic-figure.js';
import { level, scaled, type InterfererDraft } from './interferer-draft.js';
import { dbText, ordinal } from './words.js';

/**
 * A neighbour's level at the converter, dBFS: its level at the filter input
 * minus the filter's least attenuation over its band (its strongest part).
 *
 * @param neighbour the neighbour band (Hz) and its input level (dBFS)
 * @param scenario the validated scenario (filter)
 * @returns dBFS after the filter
 * @example neighbourLevel({ label: 'ADJ-UP', low: hz(120e6), high: hz(130e6), level: db(10) }, s) // 10 − 30.10 with a 5th-order 30–80 MHz Butterworth
 */
export function neighbourLevel(neighbour: Neighbour, scenario: Scenario): Db {
  return level(neighbour.level - leastAttenuation(scenario.filter, neighbour.low, neighbour.high));
}

/**
 * Level of the k-th harmonic the converter makes of a signal at level L, dBFS.
 *
 * Derivation: in a memoryless polynomial y = Σ a_n·x^n, a tone of amplitude A
 * makes a k-th harmonic of amplitude ≈ (a_k/2^(k−1))·A^k (leading term). In
 * dB its level is k·L + c_k, so its dBc (level − L) is (k−1)·L + c_k: it
 * grows (k−1) dB per dB of input. Knowing HDk dBc at Lref = strongestLevel
 * fixes c_k, so dBc at L is HDk + (k−1)·(L − Lref) and the level is
 * L + HDk + (k−1)·(L − Lref). At L = Lref this is Lref + HDk, the wanted
 * band's own harmonic.
 *
 * @param inputLevel L, dBFS at the converter
 * @param figureDbc HDk, dBc at the reference level
 * @param referenceLevel Lref, dBFS (the strongest wanted level)
 * @param order k ≥ 2
 * @returns dBFS
 * @example converterHarmonicLevel(-21, -70, -1, 2) // −111 (20 dB lower input: H2 dBc 20 dB better)
 */
export function converterHarmonicLevel(inputLevel: number, figureDbc: number, referenceLevel: number, order: number): Db {
  return level(inputLevel + figureDbc + (order - 1) * (inputLevel - referenceLevel));
}

/**
 * A neighbour band at its post-filter level, and its 2nd and 3rd harmonics
 * (orders up to harmonicOrder) made in the converter from that level. The
 * harmonics are skipped when the converter states no harmonic figure.
 *
 * @param neighbour one neighbour band
 * @param scenario the validated scenario
 * @returns drafts labelled `<label>`, `<label> H2`, `<label> H3`
 * @example neighbourDrafts(adjUp, s).map((d) => d.label) // ['ADJ-UP', 'ADJ-UP H2', 'ADJ-UP H3']
 */
export function neighbourDrafts(neighbour: Neighbour, scenario: Scenario): InterfererDraft[] {
  const loss = leastAttenuation(scenario.filter, neighbour.low, neighbour.high);
  const atConverter = neighbourLevel(neighbour, scenario);
  const drafts: InterfererDraft[] = [
    {
      label: neighbour.label,
      kind: 'neighbour',
      order: null,
      source: `neighbour band ${neighbour.label} at ${dbText(neighbour.level, 'dBFS')} before the filter, ${dbText(loss, 'dB')} least filter attenuation`,
      rateMultiple: 0,
      shiftMultiple: 1, // converted by the same LO as the wanted band
      low: neighbour.low,
      high: neighbour.high,
      level: atConverter,
    },
  ];
  for (let k = 2; k <= Math.min(3, scenario.harmonicOrder); k++) {
    const figure = harmonicFigure(scenario.converter, k);
    if (figure === null) break;
    drafts.push({
      label: `${neighbour.label} H${k}`,
      kind: 'harmonic',
      order: k,
      source: `${ordinal(k)} harmonic of neighbour ${neighbour.label}, made in the converter (${figure.note} at ${dbText(scenario.wanted.strongestLevel, 'dBFS')}, scaled to the neighbour's level)`,
      rateMultiple: 0,
      shiftMultiple: k,
      ...scaled(k, neighbour),
      level: converterHarmonicLevel(atConverter, figure.dbc, scenario.wanted.strongestLevel, k),
    });
  }
  return drafts;
}
