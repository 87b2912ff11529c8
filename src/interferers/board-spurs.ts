import type { BoardSpur, Scenario } from '../scenario/scenario.js';
import { leastAttenuation } from '../filter/filter-attenuation.js';
import { level, scaled, type InterfererDraft } from './interferer-draft.js';
import { dbText, ordinal } from './words.js';

/**
 * Level of a board spur's h-th harmonic before any filter, dBFS: the stated
 * level minus 20·log10(h). The 1/h amplitude roll-off is that of a square
 * wave's odd harmonics, the usual shape of a clock edge; applied to every
 * order as a planning estimate (common practice, no source).
 *
 * @param spur the board spur (level in dBFS)
 * @param h harmonic order ≥ 1 (1: the fundamental)
 * @returns dBFS
 * @example spurHarmonicLevel({ label: 'REF', low: hz(10e6), high: hz(10e6), level: db(-50), coupling: 'after-filter', harmonics: 2, ownMargin: null }, 2) // -56.02
 */
export function spurHarmonicLevel(spur: BoardSpur, h: number): number {
  return spur.level - 20 * Math.log10(h);
}

/**
 * A board spur's fundamental [low, high] and its harmonics h·[low, high],
 * h = 2..spur.harmonics. A before-filter spur (and its harmonics, which exist
 * on the board already) is attenuated by the filter's least attenuation over
 * each extent; an after-filter spur is not.
 *
 * @param spur one board spur
 * @param index its place among the scenario's board spurs
 * @param scenario the validated scenario (filter)
 * @returns drafts labelled `<label>`, `<label> H2`, ...
 * @example boardSpurDrafts({ label: 'REF 10M', low: hz(10e6), high: hz(10e6), level: db(-30), coupling: 'after-filter', harmonics: 2, ownMargin: null }, s).map((d) => d.label) // ['REF 10M', 'REF 10M H2']
 */
export function boardSpurDrafts(spur: BoardSpur, index: number, scenario: Scenario): InterfererDraft[] {
  const drafts: InterfererDraft[] = [];
  for (let h = 1; h <= Math.max(1, spur.harmonics); h++) {
    const extent = scaled(h, spur);
    const before = spurHarmonicLevel(spur, h);
    const filtered = spur.coupling === 'before-filter';
    const loss = filtered ? leastAttenuation(scenario.filter, extent.low, extent.high) : 0;
    const what = h === 1 ? `board spur ${spur.label}` : `${ordinal(h)} harmonic of board spur ${spur.label} (1/h roll-off)`;
    const path = filtered ? `before the filter, ${dbText(loss, 'dB')} least filter attenuation` : 'past the filter';
    drafts.push({
      label: h === 1 ? spur.label : `${spur.label} H${h}`,
      kind: 'spur',
      order: h === 1 ? null : h,
      source: `${what}, coupled ${path}`,
      rateMultiple: 0,
      shiftMultiple: 0, // on the board, not converted by the LO
      ...extent,
      level: level(before - loss),
      mixing: [{ signal: 'board spur', index, harmonic: h, plus: 1, minus: 0 }],
      ownMargin: spur.margin ?? null,
    });
  }
  return drafts;
}
