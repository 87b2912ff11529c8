import type { Scenario } from '../scenario/scenario.js';
import { harmonicFigure } from './harmonic-figure.js';
import { level, scaled, type InterfererDraft } from './interferer-draft.js';
import { ordinal } from './words.js';

/**
 * Harmonics k = 2..harmonicOrder of the wanted band, made in the converter:
 * extent k·[low, high] (moving k·δ with the IF), level strongestLevel + the k-th harmonic figure (dBc
 * at the strongest wanted level). Made past the filter, so not attenuated.
 * None when the converter states no harmonic figure.
 *
 * @param scenario the validated scenario
 * @returns drafts labelled `H2 wanted`, `H3 wanted`, ...
 * @example wantedHarmonics(s)[0] // { label: 'H2 wanted', low: 2·low, high: 2·high, level: strongest + HD2 }
 */
export function wantedHarmonics(scenario: Scenario): InterfererDraft[] {
  const drafts: InterfererDraft[] = [];
  for (let k = 2; k <= scenario.harmonicOrder; k++) {
    const figure = harmonicFigure(scenario.converter, k);
    if (figure === null) return [];
    drafts.push({
      label: `H${k} wanted`,
      kind: 'harmonic',
      order: k,
      source: `${ordinal(k)} harmonic of the wanted band, made in the converter (${figure.note})`,
      rateMultiple: 0,
      shiftMultiple: k, // k·(band + δ)
      ...scaled(k, scenario.wanted),
      level: level(scenario.wanted.strongestLevel + figure.dbc),
    });
  }
  return drafts;
}
