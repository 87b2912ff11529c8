import { sameEdge } from '../math/edge-tolerance.js';
import type { Scenario } from '../scenario/scenario.js';
import type { Interferer } from '../solve/interferer.js';
import { foldCycles } from './coherent-bins.js';
import type { CaptureTone } from './capture-tones.js';

/**
 * Which synthesised tones, or which of their products, stand for one
 * interferer of the plan. The plan names interferers by extent; the capture
 * recognises each by its kind and its extent, recomputed here from the
 * scenario's own bands (never from its label).
 */
export type LineFamily =
  /** Sums of k wanted tones: the k-th harmonic of the wanted band. */
  | { readonly kind: 'wanted harmonic'; readonly order: number }
  /** One synthesised tone itself (a neighbour, a board spur or its harmonic, a converter spur). */
  | { readonly kind: 'tone'; readonly tone: number }
  /** k times one input tone: the converter's harmonic of a neighbour. */
  | { readonly kind: 'tone harmonic'; readonly tone: number; readonly order: number }
  /** 2·a − b for every tone a of one group and b of the other (a group: the wanted tones, or one neighbour). */
  | { readonly kind: 'intermod'; readonly doubled: Group; readonly other: Group }
  /** a + sign·b for every tone a of one group and b of the other; with both groups the wanted tones, each difference of two of them once. */
  | { readonly kind: 'second order'; readonly first: Group; readonly second: Group; readonly sign: 1 | -1 }
  /** k·R/M + side·f of each wanted tone. */
  | { readonly kind: 'interleave image'; readonly k: number; readonly side: 1 | -1 }
  /** Nothing in the capture stands for it. */
  | { readonly kind: 'not simulated' };

/** The wanted tones, or the tone of neighbour `index`. */
export type Group = 'wanted' | { readonly neighbour: number };

const same = (a: number, b: number) => a === b || sameEdge(a, b);
const sameExtent = (i: Interferer, low: number, high: number) => same(i.low, low) && same(i.high, high);

/**
 * The family of tones or products that stands for an interferer.
 *
 * @param interferer one interferer of the plan derived from the moved scenario
 * @param scenario that moved scenario
 * @param tones the capture's tones
 * @param samples record length N
 * @param claimed tones already standing for an earlier interferer, so that two identical sources take one tone each; updated
 * @returns the family, or 'not simulated'
 * @example checkFamily({ kind: 'harmonic', order: 3, low: 3·low, high: 3·high, … }, s, tones, 65536, new Set()) // { kind: 'wanted harmonic', order: 3 }
 */
export function checkFamily(interferer: Interferer, scenario: Scenario, tones: readonly CaptureTone[], samples: number, claimed: Set<number>): LineFamily {
  const { wanted } = scenario;
  const toneOf = (test: (t: CaptureTone) => boolean): number | null => {
    const matching = tones.flatMap((t, i) => (test(t) ? [i] : []));
    const free = matching.find((i) => !claimed.has(i)) ?? matching[0];
    if (free === undefined) return null;
    claimed.add(free);
    return free;
  };
  const neighbourTone = (j: number) => tones.findIndex((t) => t.source.kind === 'neighbour' && t.source.index === j);
  if (interferer.rateMultiple === 0 && interferer.kind !== 'converter') {
    const k = interferer.order ?? 1;
    if (interferer.kind === 'harmonic') {
      if (sameExtent(interferer, k * wanted.low, k * wanted.high)) return { kind: 'wanted harmonic', order: k };
      const j = scenario.neighbours.findIndex((n) => sameExtent(interferer, k * n.low, k * n.high));
      if (j >= 0) return { kind: 'tone harmonic', tone: neighbourTone(j), order: k };
    }
    if (interferer.kind === 'neighbour') {
      const tone = toneOf((t) => t.source.kind === 'neighbour' && sameExtent(interferer, scenario.neighbours[t.source.index]!.low, scenario.neighbours[t.source.index]!.high));
      if (tone !== null) return { kind: 'tone', tone };
    }
    if (interferer.kind === 'spur') {
      const tone = toneOf((t) => {
        if (t.source.kind !== 'board spur' || t.source.harmonic !== k) return false;
        const spur = scenario.boardSpurs[t.source.index]!;
        return sameExtent(interferer, k * spur.low, k * spur.high);
      });
      if (tone !== null) return { kind: 'tone', tone };
    }
    if (interferer.kind === 'intermod') {
      const groups: Array<{ group: Group; low: number; high: number }> = [
        { group: 'wanted', low: wanted.low, high: wanted.high },
        ...scenario.neighbours.map((n, j) => ({ group: { neighbour: j }, low: n.low, high: n.high })),
      ];
      if (interferer.order === 2) {
        if (sameExtent(interferer, 0, wanted.high - wanted.low)) return { kind: 'second order', first: 'wanted', second: 'wanted', sign: -1 };
        for (const a of groups) for (const b of groups) {
          if (a === b) continue;
          if (sameExtent(interferer, a.low - b.high, a.high - b.low)) return { kind: 'second order', first: a.group, second: b.group, sign: -1 };
          if (sameExtent(interferer, a.low + b.low, a.high + b.high)) return { kind: 'second order', first: a.group, second: b.group, sign: 1 };
        }
      } else {
        for (const a of groups) for (const b of groups) {
          if (a !== b && sameExtent(interferer, 2 * a.low - b.high, 2 * a.high - b.low)) return { kind: 'intermod', doubled: a.group, other: b.group };
        }
      }
    }
    return { kind: 'not simulated' };
  }
  if (interferer.kind === 'converter') {
    if (interferer.low === 0 && interferer.high === 0) {
      const bin = foldCycles(Math.round(interferer.rateMultiple * samples), samples);
      const tone = toneOf((t) => !t.input && (t.source.kind === 'rate spur' || t.source.kind === 'interleave offset') && foldCycles(t.cycles, samples) === bin && same(t.level, interferer.level));
      if (tone !== null) return { kind: 'tone', tone };
    }
    const ways = scenario.converter.interleave?.ways;
    if (ways !== undefined) {
      const k = Math.round(interferer.rateMultiple * ways);
      if (sameExtent(interferer, wanted.low, wanted.high)) return { kind: 'interleave image', k, side: 1 };
      if (sameExtent(interferer, -wanted.high, -wanted.low)) return { kind: 'interleave image', k, side: -1 };
    }
  }
  return { kind: 'not simulated' };
}
