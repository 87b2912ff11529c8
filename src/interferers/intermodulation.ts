import type { Db, Hz } from '../units/quantities.js';
import type { Converter, Scenario } from '../scenario/scenario.js';
import { harmonicFigure } from './harmonic-figure.js';
import { neighbourLevel } from './neighbours.js';
import { level, type InterfererDraft } from './interferer-draft.js';
import { dbText } from './words.js';

/** A level of a third-order product and how it was found. */
export interface Im3Level {
  readonly level: Db;
  readonly note: string;
}

/**
 * Level of the third-order product 2·f1 − f2 made in the converter, dBFS,
 * from the levels L1 (the doubled tone) and L2 at the converter.
 *
 * With a stated input intercept IP3 (dBFS): 2·L1 + L2 − 2·IP3 (the product
 * grows as A1²·A2 and meets the equal-tone fundamental at IP3).
 *
 * Otherwise from the 3rd-harmonic figure, in the same memoryless polynomial
 * model as the harmonics. For y = x + a3·x³ and x = A1·cos ω1t + A2·cos ω2t,
 * x³ holds 3·A1²·A2·cos²ω1t·cos ω2t, whose 2ω1 − ω2 part is (3/4)·a3·A1²·A2;
 * one tone of amplitude A makes a 3rd harmonic (1/4)·a3·A³. At the reference
 * level Lref, HD3 (dBc) = 20·log10(a3/4) + 2·Lref, so 20·log10(a3/4) =
 * HD3 − 2·Lref and
 *   IM3 = 20·log10(3) + 20·log10(a3/4) + 2·L1 + L2 = 20·log10(3) + HD3 − 2·Lref + 2·L1 + L2.
 * Check: L1 = L2 = Lref gives Lref + HD3 + 9.54 dB, the familiar "two-tone
 * IM3 three times (9.5 dB above) the HD3 of one tone at the same level".
 * The missing-order rule of harmonicFigure applies to HD3.
 *
 * @param doubled L1, dBFS
 * @param other L2, dBFS
 * @param converter the converter (intercept3, harmonic figures)
 * @param referenceLevel Lref, dBFS (the strongest wanted level)
 * @returns the level and a note, or null when neither an intercept nor a harmonic figure is stated
 * @example im3Level(-1, -1, c, -1) // HD3 − 1 + 9.54 dBFS when intercept3 is null
 */
export function im3Level(doubled: number, other: number, converter: Converter, referenceLevel: number): Im3Level | null {
  if (converter.intercept3 !== null) {
    return { level: level(2 * doubled + other - 2 * converter.intercept3), note: `from the intercept ${dbText(converter.intercept3, 'dBFS')}` };
  }
  const figure = harmonicFigure(converter, 3);
  if (figure === null) return null;
  return {
    level: level(20 * Math.log10(3) + figure.dbc - 2 * referenceLevel + 2 * doubled + other),
    note: `from the 3rd-harmonic figure, ${figure.note}`,
  };
}

/** One signal taking part in intermodulation: its band at the converter. */
interface Tone {
  readonly label: string;
  readonly low: Hz;
  readonly high: Hz;
  readonly level: Db;
  /** How far it moves per hertz of IF shift (1: it moves with the IF). */
  readonly shiftMultiple: number;
}

/**
 * Third-order intermodulation made in the converter: 2·f1 − f2 and 2·f2 − f1
 * of each pair of neighbours, and of each neighbour with the wanted band (at
 * the strongest wanted level). Extents by interval arithmetic,
 * 2·[a, b] − [c, d] = [2a − d, 2b − c]; a negative extent is kept (it folds as
 * its magnitude). Every signal here moves with the IF, so every product
 * moves by (2·1 − 1)·δ = δ. Levels from im3Level with the post-filter neighbour levels.
 *
 * @param scenario the validated scenario
 * @returns drafts labelled `IM3 2·A−B`
 * @example intermodDrafts(s).map((d) => d.label) // ['IM3 2·ADJ-UP−ADJ-LO', 'IM3 2·ADJ-LO−ADJ-UP', 'IM3 2·wanted−ADJ-UP', ...]
 */
export function intermodDrafts(scenario: Scenario): InterfererDraft[] {
  const neighbours: Tone[] = scenario.neighbours.map((n) => ({ label: n.label, low: n.low, high: n.high, level: neighbourLevel(n, scenario), shiftMultiple: 1 }));
  const wanted: Tone = { label: 'wanted', low: scenario.wanted.low, high: scenario.wanted.high, level: scenario.wanted.strongestLevel, shiftMultiple: 1 };
  const pairs: Array<[Tone, Tone]> = [];
  for (let i = 0; i < neighbours.length; i++) {
    for (let j = i + 1; j < neighbours.length; j++) pairs.push([neighbours[i]!, neighbours[j]!], [neighbours[j]!, neighbours[i]!]);
  }
  for (const n of neighbours) pairs.push([wanted, n], [n, wanted]);
  const drafts: InterfererDraft[] = [];
  for (const [a, b] of pairs) {
    const found = im3Level(a.level, b.level, scenario.converter, scenario.wanted.strongestLevel);
    if (found === null) return [];
    drafts.push({
      label: `IM3 2·${a.label}−${b.label}`,
      kind: 'intermod',
      order: 3,
      source: `third-order intermodulation 2·${a.label} − ${b.label}, made in the converter (${found.note})`,
      rateMultiple: 0,
      shiftMultiple: 2 * a.shiftMultiple - b.shiftMultiple,
      low: (2 * a.low - b.high) as Hz,
      high: (2 * a.high - b.low) as Hz,
      level: found.level,
    });
  }
  return drafts;
}
