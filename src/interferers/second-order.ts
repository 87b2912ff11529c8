import type { Db, Hz } from '../units/quantities.js';
import type { Converter, Scenario } from '../scenario/scenario.js';
import { harmonicFigure } from './harmonic-figure.js';
import { neighbourLevel } from './neighbours.js';
import { level, type InterfererDraft } from './interferer-draft.js';
import { dbText } from './words.js';

/**
 * Level of a second-order product f1 ± f2 made in the converter, dBFS, from
 * the levels L1 and L2 of the two signals at the converter.
 *
 * Memoryless polynomial y = x + a2·x² + …, x = A1·cos ω1t + A2·cos ω2t:
 * x² holds 2·A1·A2·cos ω1t·cos ω2t = A1·A2·(cos(ω1 − ω2)t + cos(ω1 + ω2)t),
 * so each of f1 ± f2 has amplitude a2·A1·A2; one tone of amplitude A makes
 * a 2nd harmonic a2·A²/2 (cos² = (1 + cos 2ωt)/2). At the reference level
 * Lref, HD2 (dBc) = 20·log10(a2/2) + Lref, so 20·log10(a2) = HD2 + 20·log10(2) − Lref and
 *   IM2 = 20·log10(a2) + L1 + L2 = HD2 + 20·log10(2) − Lref + L1 + L2.
 * Check: L1 = L2 = Lref gives Lref + HD2 + 6.02 dB, two tones' product twice
 * (6 dB above) one tone's 2nd harmonic. The missing-order rule of
 * harmonicFigure applies to HD2.
 *
 * @param first L1, dBFS
 * @param second L2, dBFS
 * @param converter the converter (harmonic figures)
 * @param referenceLevel Lref, dBFS (the strongest wanted level)
 * @returns the level and a note, or null when the converter states no harmonic figure
 * @example im2Level(-1, -1, c, -1)!.level // −1 + HD2 + 6.02 dBFS
 */
export function im2Level(first: number, second: number, converter: Converter, referenceLevel: number): { level: Db; note: string } | null {
  const figure = harmonicFigure(converter, 2);
  if (figure === null) return null;
  return { level: level(figure.dbc + 20 * Math.log10(2) - referenceLevel + first + second), note: `from the 2nd-harmonic figure, ${figure.note}` };
}

/** One band taking part: its extent at the converter and its level there. */
interface Part {
  readonly label: string;
  readonly low: Hz;
  readonly high: Hz;
  readonly level: Db;
}

/**
 * Second-order products made in the converter, beyond the 2nd harmonics:
 * the differences of tones inside the wanted band, which fill [0, high − low];
 * for each neighbour n the difference n − wanted, [n.low − high, n.high − low],
 * and the sum wanted + n, [low + n.low, high + n.high]; and for each pair of
 * neighbours a − b and a + b likewise (interval arithmetic; a negative extent
 * is kept, it folds as its magnitude). The sums of the wanted band with
 * itself are its 2nd harmonic, already listed. Everything here moves with the
 * IF, so a difference moves by 1 − 1 = 0 and a sum by 2. Levels from im2Level
 * with the post-filter neighbour levels; for the wanted band both tones are
 * taken at the strongest wanted level, a conservative bound (two tones of the
 * band are not both at its strongest level at once in every signal).
 *
 * @param scenario the validated scenario
 * @returns drafts labelled `IM2 wanted difference`, `IM2 n−wanted`, `IM2 wanted+n`, `IM2 a−b`, `IM2 a+b`; none without a harmonic figure
 * @example secondOrderDrafts(s).map((d) => d.label) // ['IM2 wanted difference', 'IM2 ADJ-UP−wanted', 'IM2 wanted+ADJ-UP', …]
 */
export function secondOrderDrafts(scenario: Scenario): InterfererDraft[] {
  const { wanted, converter } = scenario;
  const reference = wanted.strongestLevel;
  const band: Part = { label: 'wanted', low: wanted.low, high: wanted.high, level: reference };
  const neighbours: Part[] = scenario.neighbours.map((n) => ({ label: n.label, low: n.low, high: n.high, level: neighbourLevel(n, scenario) }));
  if (im2Level(reference, reference, converter, reference) === null) return [];
  const draft = (label: string, words: string, first: Part, second: Part, extent: readonly [number, number], shiftMultiple: number, bound: string): InterfererDraft => {
    const found = im2Level(first.level, second.level, converter, reference)!;
    return {
      label,
      kind: 'intermod',
      order: 2,
      source: `second-order ${words}, made in the converter (${found.note}${bound})`,
      rateMultiple: 0,
      shiftMultiple,
      low: extent[0] as Hz,
      high: extent[1] as Hz,
      level: found.level,
    };
  };
  const difference = (a: Part, b: Part) => [a.low - b.high, a.high - b.low] as const;
  const sum = (a: Part, b: Part) => [a.low + b.low, a.high + b.high] as const;
  const drafts: InterfererDraft[] = [
    draft('IM2 wanted difference', 'differences of tones inside the wanted band', band, band, [0, wanted.high - wanted.low], 0, `; both tones at the strongest wanted level ${dbText(reference, 'dBFS')}, a conservative bound`),
  ];
  for (const n of neighbours) {
    drafts.push(
      draft(`IM2 ${n.label}−wanted`, `difference ${n.label} − wanted`, n, band, difference(n, band), 0, '; the wanted band at its strongest level'),
      draft(`IM2 wanted+${n.label}`, `sum wanted + ${n.label}`, band, n, sum(band, n), 2, '; the wanted band at its strongest level'),
    );
  }
  for (let i = 0; i < neighbours.length; i++) {
    for (let j = i + 1; j < neighbours.length; j++) {
      const a = neighbours[i]!;
      const b = neighbours[j]!;
      drafts.push(draft(`IM2 ${a.label}−${b.label}`, `difference ${a.label} − ${b.label}`, a, b, difference(a, b), 0, ''), draft(`IM2 ${a.label}+${b.label}`, `sum ${a.label} + ${b.label}`, a, b, sum(a, b), 2, ''));
    }
  }
  return drafts;
}
