import { sameEdge } from '../math/edge-tolerance.js';
import type { Interferer, MixingTerm } from '../interferers/interferer.js';
import { foldCycles } from './coherent-bins.js';
import type { CaptureTone } from './capture-tones.js';

/**
 * Which synthesised tones, or which of their products, stand for one
 * interferer of the plan. An interferer made of the signals at the
 * converter input names them (`mixing`: each signal with its plus and minus
 * counts); the capture takes each signal's own tones (the wanted tones, a
 * neighbour's tone, a board spur's harmonic) and forms every product with
 * those counts by whole-cycle arithmetic. Where its frequencies land is
 * computed here, never read from the plan.
 */
export type LineFamily =
  /** Every product of the signals' tones with these counts (one signal, plus 1: the tone itself). */
  | { readonly kind: 'mixing'; readonly terms: readonly MixingTerm[] }
  /** The interleaving images k/M·R + side·f of every line of a mixing family. */
  | {
      readonly kind: 'interleave image';
      readonly k: number;
      readonly ways: number;
      readonly side: 1 | -1;
      readonly terms: readonly MixingTerm[];
    }
  /** One tone added after the converter (a rate-tied spur). */
  | { readonly kind: 'tone'; readonly tone: number }
  /** Nothing in the capture stands for it. */
  | { readonly kind: 'not simulated' };

const same = (a: number, b: number) => a === b || sameEdge(a, b);

/**
 * The family of tones or products that stands for an interferer.
 *
 * @param interferer one interferer of the plan derived from the moved scenario
 * @param tones the capture's tones
 * @param samples record length N
 * @param claimed after-converter tones already standing for an earlier interferer, so that two identical spurs take one tone each; updated
 * @returns the family, or 'not simulated'
 * @example checkFamily(captureInterferers[0], tones, 65536, new Set()).kind // 'mixing'
 */
export function checkFamily(interferer: Interferer, tones: readonly CaptureTone[], samples: number, claimed: Set<number>): LineFamily {
  if (interferer.mixing) {
    if (interferer.image) return { kind: 'interleave image', ...interferer.image, terms: interferer.mixing };
    return { kind: 'mixing', terms: interferer.mixing };
  }
  if (interferer.kind === 'converter' && interferer.low === 0 && interferer.high === 0) {
    const bin = foldCycles(Math.round(interferer.rateMultiple * samples), samples);
    const matching = tones.flatMap((t, i) =>
      !t.input &&
      (t.source.kind === 'rate spur' || t.source.kind === 'interleave offset') &&
      foldCycles(t.cycles, samples) === bin &&
      same(t.level, interferer.level)
        ? [i]
        : [],
    );
    const free = matching.find((i) => !claimed.has(i)) ?? matching[0];
    if (free !== undefined) {
      claimed.add(free);
      return { kind: 'tone', tone: free };
    }
  }
  return { kind: 'not simulated' };
}
