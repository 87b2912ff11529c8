import { db, type Db, type Hz } from '../units/quantities.js';
import type { InputSignal } from './input-signals.js';
import type { MixingTerm } from './interferer.js';
import type { InterfererDraft } from './interferer-draft.js';
import { factorial, productLevel, type OrderLaw } from './converter-law.js';
import { ordinal } from './words.js';
import { WorkBoundError } from '../scenario/work-bounds.js';

/**
 * Most products listed above the threshold. Each blocking one costs the
 * solver a search over every window; tens of thousands already take minutes,
 * so the walk stops here rather than list (and hold) millions.
 */
export const MOST_PRODUCTS = 40_000;

/** What the generator was asked for. */
export interface ProductRequest {
  readonly signals: readonly InputSignal[];
  /** The law of each order n ≥ 2 (null: the converter says nothing of that order, so no product of it is made). */
  readonly law: (order: number) => OrderLaw | null;
  /** Highest total order of products of two or more picks, ≥ 2. */
  readonly maxOrder: number;
  /** Highest order of a single signal's harmonics (when above maxOrder, the harmonics alone go on to it). */
  readonly harmonicOrder: number;
  /** Products at or below this level are not listed (non-blocking), dBFS. */
  readonly threshold: Db;
  /**
   * The same signals, in the same order, as they decide what is listed and
   * which way round each product is written; absent: `signals` themselves.
   * The IF-shift search passes each signal at its strongest over the shift
   * range, so that every shift lists the same products in the same order.
   */
  readonly listing?: readonly InputSignal[];
  /**
   * Which channel the products are listed against (its index among the
   * 'wanted' signals, default 0): its own in-band distortion is counted, not
   * listed; another channel's is an interferer like any product.
   */
  readonly ownChannel?: number;
}

/** The products listed, and what was left out. */
export interface ProductList {
  readonly drafts: readonly InterfererDraft[];
  /** Products at or below the threshold, left out (most were never enumerated). */
  readonly pruned: number;
  /** The strongest of them, dBFS; null when none was left out. */
  readonly strongestPruned: Db | null;
  /** Products of the wanted band alone that fall back onto it (net multiple 1, e.g. 2·f1 − f2 inside the band), above the threshold and not listed. */
  readonly inBand: number;
}

/**
 * Every mixing product Σ cᵢ·fᵢ of the signals at the converter input with
 * total order |c|₁ from 2 to maxOrder, every sign combination, and every
 * single signal's harmonics up to max(maxOrder, harmonicOrder), whose level
 * (converter-law.ts) is above the threshold. A band enters as an interval:
 * taking it p times with + and q times with − gives p·[l, h] − q·[l, h] =
 * [p·l − q·h, p·h − q·l] (its own differences fill [−(h − l), h − l] for
 * p = q = 1), and the extents of the picks add. A tone taken with both signs
 * makes nothing new (f − f = 0), so a tone is taken one way only. A product
 * and its negative are one real signal: each is listed once, written the way
 * round whose centre is not below zero. Products of the wanted band alone
 * whose net multiple is 1 (2·f1 − f2, f1 + f2 − f3, 3·f1 − 2·f2 of tones
 * inside it) fall back onto the band at every rate: they are the signal's own
 * in-band distortion, which no sampling rate moves (the converter's in-band
 * linearity), so they are counted (inBand) and not listed.
 *
 * Pruned before enumeration: the signals are walked strongest first, and a
 * branch that still has m picks to place from signal j on is cut when the
 * exact strongest level of any completion, found by a table best[j][m]
 * (the largest Σ t·L − 20·log10(p!·q!) over the remaining signals, a band's
 * t picks split evenly), cannot rise above the threshold; the products cut
 * are counted by a second table, and the strongest of them recorded. The
 * walk visits only branches that hold a listed product.
 *
 * @param request signals, laws, orders and threshold
 * @returns drafts of kind `harmonic` (one signal, all +) or `intermod`, labelled `H3 wanted`, `ADJ H2`, `IM3 2·A−B`, `IM3 A+B−C`, `IM2 wanted difference`
 * @throws WorkBoundError at maxOrder as soon as more than MOST_PRODUCTS products are listed
 * @example mixingProducts({ signals: inputSignals(s), law: (order) => orderLaw(s.converter, order, -1), maxOrder: 3, harmonicOrder: 3, threshold: db(-100) }).drafts.length > 0 // true
 */
export function mixingProducts(request: ProductRequest): ProductList {
  const { signals, threshold } = request;
  const listing = request.listing ?? signals;
  const order = listing.map((_, i) => i).sort((a, b) => listing[b]!.level - listing[a]!.level || a - b);
  const sorted = order.map((i) => listing[i]!);
  const isTone = sorted.map((s) => s.low === s.high);
  const drafts: InterfererDraft[] = [];
  let pruned = 0;
  let inBand = 0;
  let strongestPruned = -Infinity;
  const ownChannel = request.ownChannel ?? 0;
  const wantedOnly = sorted.map((s) => s.ref.signal === 'wanted' && s.ref.index === ownChannel);
  const prune = (count: number, level: number) => {
    pruned += count;
    if (count > 0) strongestPruned = Math.max(strongestPruned, level);
  };
  const highest = Math.max(request.maxOrder, request.harmonicOrder);
  for (let n = 2; n <= highest; n++) {
    const law = request.law(n);
    if (law === null) continue;
    const base = law.gain + 20 * Math.log10(factorial(n));
    if (n > request.maxOrder) {
      // Past the mixing order, each signal's own n-th harmonic only.
      for (const [j, signal] of sorted.entries()) {
        const level = base - 20 * Math.log10(factorial(n)) + n * signal.level;
        if (level > threshold) drafts.push(productDraft(law, [[order[j]!, n, 0]], signals, listing));
        else prune(1, level);
      }
      continue;
    }
    const tables = completionTables(sorted, isTone, n);
    const picks: Array<[number, number, number]> = [];
    const walk = (from: number, left: number, partial: number, leading: boolean): void => {
      if (left === 0) {
        const level = productLevel(
          law,
          picks.map(([i, plus, minus]) => [sorted[i]!.level, plus, minus] as const),
        );
        if (level <= threshold) prune(1, level);
        else if (picks.every(([i]) => wantedOnly[i]) && picks.reduce((net, [, plus, minus]) => net + plus - minus, 0) === 1) inBand++;
        else {
          drafts.push(
            productDraft(
              law,
              picks.map(([i, plus, minus]) => [order[i]!, plus, minus] as const),
              signals,
              listing,
            ),
          );
          if (drafts.length > MOST_PRODUCTS) throw tooManyProducts(n);
        }
        return;
      }
      for (let j = from; j < sorted.length; j++) {
        const best = base + partial + tables.best[j]![left]!;
        if (best <= threshold) {
          // Every remaining completion places its picks on signals j.. only: all at most `best`.
          prune(tables.count[j]![left]![leading ? 1 : 0]!, best);
          return;
        }
        const level = sorted[j]!.level;
        for (let t = 1; t <= left; t++) {
          for (const [plus, minus] of splits(t, isTone[j]!, leading)) {
            picks.push([j, plus, minus]);
            walk(j + 1, left - t, partial + t * level - 20 * Math.log10(factorial(plus) * factorial(minus)), leading && plus === minus);
            picks.pop();
          }
        }
      }
    };
    walk(0, n, 0, true);
  }
  return { drafts, pruned, strongestPruned: Number.isFinite(strongestPruned) ? db(strongestPruned) : null, inBand };
}

function tooManyProducts(order: number): WorkBoundError {
  return new WorkBoundError(
    ['maxOrder'],
    `at most ${MOST_PRODUCTS} mixing products above the level threshold; lower maxOrder, the signals' levels at the converter (a filter ahead of it) or the number of neighbours`,
    `more than ${MOST_PRODUCTS} by order ${order}`,
  );
}

/**
 * The (plus, minus) splits of t picks of one signal: a tone one way only; a
 * band any split. While every earlier signal was taken evenly (leading), only
 * splits with plus ≥ minus are taken, so that a product and its negative are
 * generated once.
 */
function splits(t: number, tone: boolean, leading: boolean): Array<readonly [number, number]> {
  if (tone)
    return leading
      ? [[t, 0]]
      : [
          [t, 0],
          [0, t],
        ];
  const out: Array<readonly [number, number]> = [];
  for (let plus = t; plus >= 0; plus--) if (!leading || plus >= t - plus) out.push([plus, t - plus]);
  return out;
}

/**
 * best[j][m]: the largest Σ (t·L − 20·log10(p!·q!)) over ways of placing
 * exactly m picks on signals j.. (−∞ when m > 0 and none is left);
 * count[j][m][leading]: how many such ways splits() generates.
 */
function completionTables(
  sorted: readonly InputSignal[],
  isTone: readonly boolean[],
  n: number,
): { best: number[][]; count: number[][][] } {
  const size = sorted.length;
  const best: number[][] = Array.from({ length: size + 1 }, () => new Array<number>(n + 1).fill(-Infinity));
  const count: number[][][] = Array.from({ length: size + 1 }, () => Array.from({ length: n + 1 }, () => [0, 0]));
  best[size]![0] = 0;
  count[size]![0] = [1, 1];
  for (let j = size - 1; j >= 0; j--) {
    const level = sorted[j]!.level;
    for (let m = 0; m <= n; m++) {
      let most = best[j + 1]![m]!;
      const ways = [...count[j + 1]![m]!]; // t = 0: the signal left out
      for (let t = 1; t <= m; t++) {
        const even = isTone[j] ? factorial(t) : factorial(Math.ceil(t / 2)) * factorial(Math.floor(t / 2));
        most = Math.max(most, t * level - 20 * Math.log10(even) + best[j + 1]![m - t]!);
        for (const leading of [0, 1]) {
          for (const [plus, minus] of splits(t, isTone[j]!, leading === 1))
            ways[leading]! += count[j + 1]![m - t]![leading === 1 && plus === minus ? 1 : 0]!;
        }
      }
      best[j]![m] = most;
      count[j]![m] = ways;
    }
  }
  return { best, count };
}

/**
 * One product as a draft: its extent (the interval sum), IF-shift multiple,
 * level, label and words, written the way round whose centre is not below zero.
 *
 * @param law the law of its order
 * @param picks (signal index in `signals`, plus, minus) for each signal taken
 * @param signals the input signals, in scenario order
 * @param listing the same signals as they decide which way round it is written (default: `signals`)
 */
export function productDraft(
  law: OrderLaw,
  picks: ReadonlyArray<readonly [number, number, number]>,
  signals: readonly InputSignal[],
  listing: readonly InputSignal[] = signals,
): InterfererDraft {
  let low = 0;
  let high = 0;
  let shift = 0;
  let centre = 0;
  for (const [i, plus, minus] of picks) {
    const s = signals[i]!;
    low += plus * s.low - minus * s.high;
    high += plus * s.high - minus * s.low;
    shift += (plus - minus) * s.shiftMultiple;
    centre += ((plus - minus) * (listing[i]!.low + listing[i]!.high)) / 2;
  }
  const flip = centre < 0;
  const terms = [...picks]
    .sort((a, b) => a[0] - b[0])
    .map(([i, plus, minus]) => (flip ? ([i, minus, plus] as const) : ([i, plus, minus] as const)));
  const mixing: MixingTerm[] = terms.map(([i, plus, minus]) => ({ ...signals[i]!.ref, plus, minus }));
  const level = productLevel(
    law,
    picks.map(([i, plus, minus]) => [signals[i]!.level, plus, minus] as const),
  );
  const n = law.order;
  const single = terms.length === 1 ? terms[0]! : null;
  const extent = flip ? { low: -high as Hz, high: -low as Hz } : { low: low as Hz, high: high as Hz };
  const shiftMultiple = flip ? -shift : shift;
  if (single && single[2] === 0) {
    const signal = signals[single[0]]!;
    // One wanted band keeps its own words; a channel of a list is named by its label.
    const wantedBand = signal.ref.signal === 'wanted' && signal.label === 'wanted';
    const whose = wantedBand ? 'the wanted band' : `${signal.ref.signal === 'wanted' ? 'channel' : signal.ref.signal} ${signal.label}`;
    return {
      label: wantedBand ? `H${n} wanted` : `${signal.label} H${n}`,
      kind: 'harmonic',
      order: n,
      source: `${ordinal(n)} harmonic of ${whose}, made in the converter (${law.note})`,
      rateMultiple: 0,
      shiftMultiple,
      ...extent,
      level,
      mixing,
    };
  }
  const name = single && single[1] === 1 && single[2] === 1 ? `${signals[single[0]]!.label} difference` : productName(terms, signals);
  return {
    label: `IM${n} ${name}`,
    kind: 'intermod',
    order: n,
    source: `${ordinal(n)}-order product ${productName(terms, signals, ' ')}, made in the converter (${law.note}; each signal at its strongest level at the converter)`,
    rateMultiple: 0,
    shiftMultiple,
    ...extent,
    level,
    mixing,
  };
}

/** `2·A−B+C`: the plus picks first, then the minus picks, each in scenario order. */
function productName(terms: ReadonlyArray<readonly [number, number, number]>, signals: readonly InputSignal[], space = ''): string {
  const part = (count: number, i: number) => (count === 1 ? signals[i]!.label : `${count}·${signals[i]!.label}`);
  const plus = terms.filter(([, p]) => p > 0).map(([i, p]) => part(p, i));
  const minus = terms.filter(([, , q]) => q > 0).map(([i, , q]) => part(q, i));
  return plus.join(`${space}+${space}`) + minus.map((m) => `${space}−${space}${m}`).join('');
}
