import type { CaptureTone } from './capture-tones.js';
import type { Group, LineFamily } from './check-families.js';

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
 * @example inputIndex(tones).inputs // [0, 1, 2, …] for tones whose inputs come first
 */
export function inputIndex(tones: readonly CaptureTone[]): InputIndex {
  const inputs = tones.flatMap((t, i) => (t.input ? [i] : []));
  return { inputs, position: new Map(inputs.map((tone, p) => [tone, p])) };
}

/**
 * The lines of one family (see LineFamily), e.g. for the 3rd harmonic of the
 * wanted band with tones W1, W2: 3·W1, 2·W1 + W2, W1 + 2·W2, 3·W2; for the
 * differences inside the wanted band with W1..W3: W1 − W2, W1 − W3, W2 − W3.
 *
 * @param family the family
 * @param tones the capture's tones
 * @param index the input index of those tones
 * @param ways M of an interleaved converter (for images), or null
 * @returns the lines, possibly several for one component
 * @example familyLines({ kind: 'tone harmonic', tone: 1, order: 2 }, tones, index, null)[0].what // '2·ADJ'
 */
export function familyLines(family: LineFamily, tones: readonly CaptureTone[], index: InputIndex, ways: number | null): LineDraft[] {
  const wanted = tones.flatMap((t, i) => (t.source.kind === 'wanted' ? [i] : []));
  const product = (terms: ReadonlyArray<readonly [number, number]>): LineDraft => {
    const net = new Array<number>(index.inputs.length).fill(0);
    for (const [tone, multiple] of terms) net[index.position.get(tone)!]! += multiple;
    const normal = normalisedNet(net);
    const cycles = terms.reduce((sum, [tone, multiple]) => sum + multiple * tones[tone]!.cycles, 0);
    return { what: productName(normal, index, tones), component: `n:${normal.join(',')}`, cycles, net: normal, tone: null };
  };
  const direct = (tone: number): LineDraft => {
    const t = tones[tone]!;
    return t.input ? product([[tone, 1]]) : { what: t.label, component: `t:${tone}`, cycles: t.cycles, net: null, tone };
  };
  const members = (group: Group) => (group === 'wanted' ? wanted : tones.flatMap((t, i) => (t.source.kind === 'neighbour' && t.source.index === group.neighbour ? [i] : [])));
  switch (family.kind) {
    case 'wanted harmonic':
      return multisets(wanted, family.order).map((pick) => product(pick.map((tone) => [tone, 1] as const)));
    case 'tone':
      return [direct(family.tone)];
    case 'tone harmonic':
      return [product([[family.tone, family.order]])];
    case 'intermod':
      return members(family.doubled).flatMap((a) => members(family.other).map((b) => product([[a, 2], [b, -1]])));
    case 'second order': {
      const same = family.first === family.second;
      // Within one group (the wanted tones) each pair once: Wi − Wj and Wj − Wi are one real tone, Wi − Wi is DC.
      return members(family.first).flatMap((a, i) => members(family.second).flatMap((b, j) => (same && j <= i ? [] : [product([[a, 1], [b, family.sign]])])));
    }
    case 'interleave image': {
      if (ways === null) return [];
      const k = family.side === 1 ? family.k : ways - family.k;
      return tones.flatMap((t, i) => (t.source.kind === 'interleave image' && t.source.k === k ? [direct(i)] : []));
    }
    case 'not simulated':
      return [];
  }
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
 * @example productName([2, -1], index, tones) // '2·W1 − ADJ'
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
