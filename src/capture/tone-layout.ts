import type { Scenario } from '../scenario/scenario.js';
import { binDistance, foldCycles } from './coherent-bins.js';
import { captureTones, toneBands, type CaptureRecord, type ToneLayout } from './capture-tones.js';

/** How far a band's tone may be moved to find a clear place, whole cycles each way. */
export const LAYOUT_SEARCH = 64;
/** Layouts tried in all, so that a dense set of products (many tones, high orders) cannot stall the search. */
export const LAYOUT_BUDGET = 400;

/**
 * Bins within which two lines' window spectra touch: a whole-cycle tone
 * under the 4-term Blackman–Harris window fills its own bin and 3 either
 * side, so lines 7 or more bins apart are measured with no trace of each
 * other.
 */
export const CLEAR_BINS = 7;

/** A spectral component by what it is made of, independent of where the tones sit. */
export interface ComponentTemplate {
  readonly key: string;
  /** Net multiples per input tone, or null for a tone added after the converter. */
  readonly net: readonly number[] | null;
  /** Index of that after-converter tone, or null. */
  readonly tone: number | null;
  /** A line of the plan or a wanted tone (true), or another product of the model (false). */
  readonly watched: boolean;
  /** Whole cycles added to the product (an interleaving image at k/M·R + f: round(k·N/M)); absent: none. */
  readonly offset?: number;
}

/**
 * Places the tones that stand for bands (the wanted tones, and the tones of
 * neighbours wider than zero) so that the lines of the plan are clear of
 * each other and of the model's other products: each tone in turn is tried
 * at 0, +1, −1, +2, … cycles from its first place (staying inside its band),
 * keeping the first place with the fewest close pairs (see crowding), within
 * LAYOUT_BUDGET layouts in all. Tone
 * sources are not moved: their place is the plan's. Pairs no move can part
 * stay, and are reported as crowded when measured.
 *
 * @param scenario the validated scenario
 * @param record rate, length, wanted tone count
 * @param components the plan's lines and wanted tones (watched) and the model's strong products
 * @returns the offsets, whole cycles
 * @example chooseLayout(heronBase, { rate: hz(184.32e6), samples: 65536, wantedTones: 1 }, []).wanted.length // 1
 */
export function chooseLayout(scenario: Scenario, record: CaptureRecord, components: readonly ComponentTemplate[]): ToneLayout {
  const { rate, samples } = record;
  const base = captureTones(scenario, record, { wanted: [], neighbours: [] });
  const inputs = base.flatMap((t, i) => (t.input ? [i] : []));
  const cycles = base.map((t) => t.cycles);
  const range = (low: number, high: number, first: number) => ({
    least: Math.ceil((low * samples) / rate) - first,
    most: Math.floor((high * samples) / rate) - first,
  });
  const bands = toneBands(scenario);
  const layout = { wanted: new Array<number>(bands.length * record.wantedTones).fill(0), neighbours: scenario.neighbours.map(() => 0) };
  // Each movable tone and how far it may go.
  const movable = base.flatMap((t, i) => {
    const source = t.source;
    if (source.kind === 'wanted') {
      // Each tone stays inside its own channel's band.
      const band = bands[source.channel]!;
      return [
        {
          offsets: layout.wanted,
          slot: source.channel * record.wantedTones + source.index,
          tones: [i],
          allowed: range(band.low, band.high, t.cycles),
        },
      ];
    }
    if (source.kind === 'neighbour') {
      const n = scenario.neighbours[source.index]!;
      return n.low === n.high
        ? []
        : [{ offsets: layout.neighbours, slot: source.index, tones: [i], allowed: range(n.low, n.high, t.cycles) }];
    }
    return [];
  });
  let tried = 0;
  for (const { offsets, slot, tones, allowed } of movable) {
    let best = { offset: 0, cost: Infinity };
    const share = Math.max(8, Math.floor((LAYOUT_BUDGET - tried) / Math.max(1, movable.length))); // each tone gets a fair part of what is left
    // Only this tone moves: each component's whole cycles are its total at offset 0 plus its multiple of the tone times the offset.
    for (const j of tones) cycles[j] = base[j]!.cycles;
    const still = componentTotals(components, cycles, inputs);
    const multiple = components.map((c) =>
      c.net === null ? (tones.includes(c.tone!) ? 1 : 0) : c.net.reduce((sum, n, i) => (tones.includes(inputs[i]!) ? sum + n : sum), 0),
    );
    const totals = new Float64Array(components.length);
    for (let step = 0, mine = 0; step <= 2 * LAYOUT_SEARCH && best.cost > 0 && mine < share; step++) {
      const offset = step % 2 === 1 ? (step + 1) / 2 : -step / 2;
      if (offset < allowed.least || offset > allowed.most) continue;
      for (let k = 0; k < totals.length; k++) totals[k] = still[k]! + multiple[k]! * offset;
      const cost = crowdingOfTotals(components, totals, samples);
      tried++;
      mine++;
      if (cost < best.cost) best = { offset, cost };
    }
    offsets[slot] = best.offset;
    for (const j of tones) cycles[j] = base[j]!.cycles + best.offset;
  }
  return layout;
}

/**
 * The number of close pairs (fewer than CLEAR_BINS apart, mirror images
 * about DC and rate/2 counted) of distinct components, at least one of them
 * watched; a watched component near DC or rate/2 also pairs with its own
 * mirror, except the DC and rate/2 spurs, which sit there by nature.
 *
 * @param components templates
 * @param cycles each tone's whole cycles at one layout
 * @param inputs the indices of the input tones, in order
 * @param samples record length N
 * @returns the number of close pairs
 * @example crowding([], [], [], 65536) // 0 (nothing to keep apart)
 */
export function crowding(
  components: readonly ComponentTemplate[],
  cycles: readonly number[],
  inputs: readonly number[],
  samples: number,
): number {
  return crowdingOfTotals(components, componentTotals(components, cycles, inputs), samples);
}

/** Each component's whole cycles: its tone's, or Σ nᵢ·cᵢ over the input tones plus its offset. */
function componentTotals(components: readonly ComponentTemplate[], cycles: readonly number[], inputs: readonly number[]): Float64Array {
  const totals = new Float64Array(components.length);
  for (let k = 0; k < components.length; k++) {
    const c = components[k]!;
    if (c.net === null) totals[k] = cycles[c.tone!]!;
    else {
      let total = c.offset ?? 0;
      for (let i = 0; i < c.net.length; i++) if (c.net[i] !== 0) total += c.net[i]! * cycles[inputs[i]!]!;
      totals[k] = total;
    }
  }
  return totals;
}

/** crowding, from each component's whole cycles. */
function crowdingOfTotals(components: readonly ComponentTemplate[], totals: Float64Array, samples: number): number {
  // Each component as one number, bin·4 + 2·watched + atEdge, so that a plain numeric sort orders them by bin
  // (a layout search calls this hundreds of times: no object per component, no comparator).
  const placed = new Float64Array(components.length);
  for (let k = 0; k < components.length; k++) {
    const c = components[k]!;
    const bin = foldCycles(totals[k]!, samples);
    const atEdge = c.net === null && (bin === 0 || bin === samples / 2);
    placed[k] = bin * 4 + (c.watched ? 2 : 0) + (atEdge ? 1 : 0);
  }
  placed.sort();
  const binOf = (code: number) => Math.floor(code / 4);
  const watchedOf = (code: number) => (code & 2) !== 0;
  let close = 0;
  for (let i = 0; i < placed.length; i++) {
    const a = placed[i]!;
    const bin = binOf(a);
    for (let j = i + 1; j < placed.length && binOf(placed[j]!) - bin < CLEAR_BINS; j++) if (watchedOf(a) || watchedOf(placed[j]!)) close++;
  }
  const nearEdges = placed.filter((code) => binOf(code) < CLEAR_BINS || binOf(code) > samples / 2 - CLEAR_BINS);
  for (let i = 0; i < nearEdges.length; i++) {
    const a = nearEdges[i]!;
    const aBin = binOf(a);
    if (watchedOf(a) && (a & 1) === 0 && Math.min(2 * aBin, samples - 2 * aBin) < CLEAR_BINS) close++;
    for (let j = i + 1; j < nearEdges.length; j++) {
      const b = nearEdges[j]!;
      const bBin = binOf(b);
      if ((watchedOf(a) || watchedOf(b)) && Math.abs(aBin - bBin) >= CLEAR_BINS && binDistance(aBin, bBin, samples) < CLEAR_BINS) close++;
    }
  }
  return close;
}
