import type { CaptureTone } from './capture-tones.js';
import type { MixingTerm } from '../interferers/interferer.js';
import type { LineFamily } from './check-families.js';
import { imageKey } from './model-components.js';

/**
 * One spectral line the capture expects for an interferer: a product of the
 * input tones (net multiples over the inputs) or a tone added after the
 * converter, with the whole cycles it lands on before folding.
 */
export interface LineDraft {
  /** In words, e.g. `3·W1`, `2·W1 − ADJ`, `DC`. */
  readonly what: string;
  /** Identifies the physical component: two lines with one key are one tone. */
  readonly component: string;
  readonly cycles: number;
  /** Net multiples per input tone (first nonzero positive), or null for a tone added after the converter. */
  readonly net: readonly number[] | null;
  /** Index into the capture's tones of the after-converter tone, or null. */
  readonly tone: number | null;
  /** For an interleaving image at k/M·R + f of the product `net`: round(k·N/M), the cycles it adds; absent otherwise. */
  readonly offset?: number;
  /** For an interleaving image: the whole cycles of its source product `net` (its frequency sets a timing-skew image's level). */
  readonly sourceCycles?: number;
}

/** Input tones in order, and each tone's position among them. */
export interface InputIndex {
  readonly inputs: readonly number[];
  readonly position: ReadonlyMap<number, number>;
}

/**
 * The input tones (those through the polynomial) and their positions.
 *
 * @param tones the capture's tones
 * @returns their indices in order, and each index's position among the inputs
 * @example inputIndex(tones).inputs[0] // 0
 */
export function inputIndex(tones: readonly CaptureTone[]): InputIndex {
  const inputs = tones.flatMap((t, i) => (t.input ? [i] : []));
  return { inputs, position: new Map(inputs.map((tone, p) => [tone, p])) };
}

/**
 * The lines of one family (see LineFamily). For a mixing family, each term's
 * signal stands for its tones (the wanted band or a channel: each of its tones; a
 * neighbour or a board spur harmonic: its one tone), and the term's plus
 * and minus picks are multisets of those tones: e.g. the 3rd harmonic of the
 * wanted band with tones W1, W2 gives 3·W1, 2·W1 + W2, W1 + 2·W2, 3·W2; the
 * band's own differences with W1..W3 give W1 − W2, W1 − W3, W2 − W3 (a
 * product and its negative are one line; a tone taken with both signs
 * cancels to a lower order, so such picks are none; with one wanted tone
 * the band's differences have no line). An
 * image family puts each such line at k/M·R + side·f.
 *
 * @param family the family
 * @param tones the capture's tones
 * @param index the input index of those tones
 * @param samples record length N (for the image offsets k·N/M)
 * @returns the lines, possibly several for one component
 * @example familyLines(checkFamily(captureInterferers[0], tones, 65536, new Set()), tones, index, 65536).length > 0 // true
 */
export function familyLines(family: LineFamily, tones: readonly CaptureTone[], index: InputIndex, samples: number): LineDraft[] {
  switch (family.kind) {
    case 'tone': {
      const t = tones[family.tone]!;
      return [{ what: t.label, component: `t:${family.tone}`, cycles: t.cycles, net: null, tone: family.tone }];
    }
    case 'mixing':
      return mixingLines(family.terms, tones, index).map((line) => ({
        what: productName(line.normal, index, tones),
        component: `n:${line.normal.join(',')}`,
        cycles: line.cycles,
        net: line.normal,
        tone: null,
      }));
    case 'interleave image':
      return mixingLines(family.terms, tones, index).map((line) => {
        // k/M·R + side·f with f written as its normal form: the normal form may be −f, which turns the side.
        // (k/M·R − f folds where (M − k)/M·R + f does: one real tone, keyed and placed by the latter.)
        const side = family.side * line.sign;
        const k = side === 1 ? family.k : family.ways - family.k;
        const offset = Math.round((k * samples) / family.ways);
        return {
          what: `IL ${family.k}/${family.ways} ${family.side === 1 ? '+' : '−'} (${productName(line.normal, index, tones)})`,
          component: imageKey(k, line.normal),
          cycles: offset + line.cycles,
          net: line.normal,
          tone: null,
          offset,
          sourceCycles: line.cycles,
        };
      });
    case 'not simulated':
      return [];
  }
}

/** Every product of the terms' tones: its normal form, the sign that gives it (+1 or −1) and its whole cycles before folding. */
function mixingLines(
  terms: readonly MixingTerm[],
  tones: readonly CaptureTone[],
  index: InputIndex,
): Array<{ normal: number[]; sign: 1 | -1; cycles: number }> {
  const members = (term: MixingTerm) =>
    tones.flatMap((t, i) => {
      const s = t.source;
      const match =
        term.signal === 'wanted'
          ? s.kind === 'wanted' && s.channel === term.index
          : term.signal === 'neighbour'
            ? s.kind === 'neighbour' && s.index === term.index
            : s.kind === 'board spur' && s.index === term.index && s.harmonic === term.harmonic;
      return match ? [i] : [];
    });
  let partial: number[][] = [new Array<number>(index.inputs.length).fill(0)];
  for (const term of terms) {
    const own = members(term);
    const next: number[][] = [];
    for (const plus of multisets(own, term.plus)) {
      for (const minus of multisets(own, term.minus)) {
        // One tone taken with both signs cancels to a product of lower order, which is not this one (W1 + B − W1 is B itself).
        if (plus.some((tone) => minus.includes(tone))) continue;
        for (const net of partial) {
          const grown = [...net];
          for (const tone of plus) grown[index.position.get(tone)!]! += 1;
          for (const tone of minus) grown[index.position.get(tone)!]! -= 1;
          next.push(grown);
        }
      }
    }
    partial = next;
  }
  const seen = new Set<string>();
  const lines: Array<{ normal: number[]; sign: 1 | -1; cycles: number }> = [];
  for (const net of partial) {
    if (net.every((n) => n === 0)) continue;
    const normal = normalisedNet(net);
    const key = normal.join(',');
    if (seen.has(key)) continue;
    seen.add(key);
    const cycles = normal.reduce((sum, n, p) => sum + n * tones[index.inputs[p]!]!.cycles, 0);
    lines.push({ normal, sign: normal.some((n, p) => n !== net[p]) ? -1 : 1, cycles });
  }
  return lines;
}

/**
 * The net multiples with the first nonzero one made positive (a product and its negative are one real tone).
 *
 * @example normalisedNet([0, -2, 1]) // [0, 2, −1]
 */
export function normalisedNet(net: readonly number[]): number[] {
  const first = net.find((n) => n !== 0) ?? 0;
  return first < 0 ? net.map((n) => -n || 0) : [...net];
}

/**
 * A product in words from its net multiples, e.g. [2, 0, −1] → `2·W1 − ADJ`.
 *
 * @param net multiples per input tone
 * @param index the input index
 * @param tones the capture's tones (for labels)
 * @returns the product in words
 * @example productName([2], index, tones) // '2·W1'
 */
export function productName(net: readonly number[], index: InputIndex, tones: readonly CaptureTone[]): string {
  const terms = net.flatMap((n, p) => (n === 0 ? [] : [[n, tones[index.inputs[p]!]!.label] as const]));
  return terms
    .map(([n, label], i) => {
      const size = Math.abs(n) === 1 ? label : `${Math.abs(n)}·${label}`;
      if (i === 0) return n < 0 ? `−${size}` : size;
      return `${n < 0 ? '−' : '+'} ${size}`;
    })
    .join(' ');
}

/** Every multiset of `size` items (non-decreasing index sequences). */
function multisets(items: readonly number[], size: number): number[][] {
  if (size === 0) return [[]];
  const out: number[][] = [];
  const walk = (start: number, picked: number[]) => {
    if (picked.length === size) {
      out.push([...picked]);
      return;
    }
    for (let i = start; i < items.length; i++) walk(i, [...picked, items[i]!]);
  };
  walk(0, []);
  return out;
}
