import type { Db } from '../units/quantities.js';
import type { Scenario } from '../scenario/scenario.js';
import type { Interferer } from './interferer.js';
import { boardSpurDrafts } from './board-spurs.js';
import { orderLaw } from './converter-law.js';
import { converterSpurDrafts } from './converter-spurs.js';
import { inputSignals } from './input-signals.js';
import { complete, type InterfererDraft } from './interferer-draft.js';
import { refuseTooManyImages } from './image-work.js';
import { interleaveImages } from './interleave-images.js';
import { levelThreshold } from './level-threshold.js';
import { mixingProducts } from './mixing-products.js';
import { neighbourDraft } from './neighbours.js';
import { uniqueLabels } from './unique-labels.js';

/** The mixing order when a scenario states none. */
export const DEFAULT_MAX_ORDER = 3;

/** How the interferer list was made, for the report: what was generated and what was left out. */
export interface DerivationSummary {
  /** Highest total order of the mixing products generated. */
  readonly maxOrder: number;
  /** Highest harmonic order of each signal. */
  readonly harmonicOrder: number;
  /** Mixing products and harmonics listed (above the threshold). */
  readonly products: number;
  /** Products at or below the threshold, left out; most never enumerated. */
  readonly pruned: number;
  /** The strongest product left out, dBFS; null when none was. */
  readonly strongestPruned: Db | null;
  /** Products of the wanted band alone that fall back onto it (its own in-band distortion), not listed. */
  readonly inBand: number;
  /** Interleaving images at or below the threshold, left out. */
  readonly prunedImages: number;
  /** The level at or below which nothing blocks, dBFS. */
  readonly threshold: Db;
}

/** The interferers of a scenario and how they were derived. */
export interface DerivedInterferers {
  readonly interferers: Interferer[];
  readonly summary: DerivationSummary;
}

/**
 * Every interferer of a scenario, with its level at the converter: board
 * spurs and their harmonics, neighbour bands, every mixing product and
 * harmonic of the signals at the converter input above the threshold
 * (mixingProducts, orders 2..maxOrder and harmonics to harmonicOrder), the
 * converter's rate-tied spurs, and the interleaving images of every input
 * signal and every listed product, in that order. Each carries its required
 * margin (its own, its kind's or the scenario's) and is blocking when its
 * level is above levelThreshold(scenario). Labels are unique (repeats
 * suffixed ` #2`, ...). A list whose blocking interferers would take too
 * long to search is refused here, before any solving (refuseTooManyImages).
 *
 * @param scenario the validated scenario
 * @param listing the same scenario with its signals where they decide what is listed and which way round a product is written (default: the scenario itself): the IF-shift search passes the neighbours swept over the shift range, so that every shift lists the same interferers in the same order
 * @returns the interferers (extents rateMultiple·r + [low, high] in Hz, levels in dBFS) and the summary
 * @throws RangeError for a malformed filter (see leastAttenuation)
 * @throws WorkBoundError (an InputError) past MOST_PRODUCTS listed products, or MOST_IMAGES images of the blocking ones
 * @example deriveInterfererList(s).summary.pruned // 0
 */
export function deriveInterfererList(scenario: Scenario, listing: Scenario = scenario): DerivedInterferers {
  const threshold = levelThreshold(scenario);
  const signals = inputSignals(scenario);
  const listingSignals = listing === scenario ? signals : inputSignals(listing);
  const reference = scenario.wanted.strongestLevel;
  const request = {
    law: (order: number) => orderLaw(scenario.converter, order, reference),
    maxOrder: scenario.maxOrder ?? DEFAULT_MAX_ORDER,
    harmonicOrder: scenario.harmonicOrder,
    threshold,
    listing: listingSignals,
  };
  const products = mixingProducts({ ...request, signals });
  const sources = (s: Scenario, made: readonly InterfererDraft[]) => [
    wantedDraft(s),
    ...s.boardSpurs.flatMap((spur, i) => boardSpurDrafts(spur, i, s)),
    ...s.neighbours.map((n, i) => neighbourDraft(n, i, s)),
    ...made,
  ];
  const own = sources(scenario, products.drafts);
  const images = interleaveImages(
    own,
    scenario,
    listing === scenario ? own : sources(listing, mixingProducts({ ...request, signals: listingSignals }).drafts),
  );
  const drafts = [...own.slice(1), ...converterSpurDrafts(scenario), ...images.drafts];
  const interferers = uniqueLabels(drafts).map((draft) => complete(draft, scenario));
  refuseTooManyImages(scenario, interferers);
  return {
    interferers,
    summary: {
      maxOrder: request.maxOrder,
      harmonicOrder: scenario.harmonicOrder,
      products: products.drafts.length,
      pruned: products.pruned,
      strongestPruned: products.strongestPruned,
      inBand: products.inBand,
      prunedImages: images.pruned,
      threshold,
    },
  };
}

/** The wanted band as an image source: at its strongest level, moving with the IF. */
function wantedDraft(scenario: Scenario): InterfererDraft {
  return {
    label: 'wanted',
    kind: 'neighbour',
    order: null,
    source: 'the wanted band',
    rateMultiple: 0,
    shiftMultiple: 1,
    low: scenario.wanted.low,
    high: scenario.wanted.high,
    level: scenario.wanted.strongestLevel,
    mixing: [{ signal: 'wanted', index: 0, harmonic: 1, plus: 1, minus: 0 }],
  };
}

/**
 * The interferers of deriveInterfererList, without the summary.
 *
 * @param scenario the validated scenario
 * @returns interferers, extents rateMultiple·r + [low, high] in Hz, levels in dBFS
 * @throws RangeError for a malformed filter (see leastAttenuation)
 * @example deriveInterferers(s).find((i) => i.label === 'H2 wanted') // { low: 130e6, high: 150e6, level: -76 }
 */
export function deriveInterferers(scenario: Scenario): Interferer[] {
  return deriveInterfererList(scenario).interferers;
}
