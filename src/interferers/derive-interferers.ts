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
import { channelView } from '../scenario/channel-view.js';
import { dbText } from './words.js';

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
 * With several channels the list is derived against one of them (`channel`,
 * through channelView: its threshold, margins and requirements): every other
 * channel is an interferer of kind 'channel' at its strongest level, always
 * blocking, with the planned channel's channelSpacing (default: its margin) as
 * its margin; the channels are input signals like any other, so their
 * harmonics and the products among them come from the one generator.
 *
 * @param scenario the validated scenario
 * @param listing the same scenario with its signals where they decide what is listed and which way round a product is written (default: the scenario itself): the IF-shift search passes the neighbours swept over the shift range, so that every shift lists the same interferers in the same order
 * @param channel the channel the list is derived against, its index in scenario.channels (default 0)
 * @returns the interferers (extents rateMultiple·r + [low, high] in Hz, levels in dBFS) and the summary
 * @throws RangeError for a malformed filter (see leastAttenuation)
 * @throws WorkBoundError (an InputError) past MOST_PRODUCTS listed products, or MOST_IMAGES images of the blocking ones
 * @example deriveInterfererList(s).summary.pruned // 0
 */
export function deriveInterfererList(whole: Scenario, listed: Scenario = whole, channel = 0): DerivedInterferers {
  const scenario = channelView(whole, channel);
  const listing = listed === whole ? scenario : channelView(listed, channel);
  const threshold = levelThreshold(scenario);
  const signals = inputSignals(scenario);
  const listingSignals = listing === scenario ? signals : inputSignals(listing);
  // The converter's harmonic figures are quoted at one level: the wanted band's, or the first channel's.
  const reference = whole.wanted.strongestLevel;
  const request = {
    law: (order: number) => orderLaw(scenario.converter, order, reference),
    maxOrder: scenario.maxOrder ?? DEFAULT_MAX_ORDER,
    harmonicOrder: scenario.harmonicOrder,
    threshold,
    listing: listingSignals,
    ownChannel: channel,
  };
  const products = mixingProducts({ ...request, signals });
  const sources = (s: Scenario, made: readonly InterfererDraft[]) => [
    wantedDraft(s, channel),
    ...otherChannelDrafts(s, channel),
    ...s.boardSpurs.flatMap((spur, i) => boardSpurDrafts(spur, i, s)),
    ...s.neighbours.map((n, i) => neighbourDraft(n, i, s)),
    ...made,
  ];
  const own = sources(scenario, products.drafts);
  const images = interleaveImages(
    own,
    scenario,
    listing === scenario ? own : sources(listing, mixingProducts({ ...request, signals: listingSignals }).drafts),
    channel,
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

/** The wanted band (the planned channel) as an image source: at its strongest level, moving with the IF. */
function wantedDraft(scenario: Scenario, channel: number): InterfererDraft {
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
    mixing: [{ signal: 'wanted', index: channel, harmonic: 1, plus: 1, minus: 0 }],
  };
}

/** Every channel but the planned one, as interferers of kind 'channel' kept the planned channel's spacing away. */
function otherChannelDrafts(scenario: Scenario, channel: number): InterfererDraft[] {
  if (scenario.channels.length <= 1) return [];
  const spacing = scenario.requirements.channelSpacing ?? scenario.requirements.margin;
  return scenario.channels.flatMap((other, index): InterfererDraft[] =>
    index === channel
      ? []
      : [
          {
            label: other.label,
            kind: 'channel',
            order: null,
            source: `channel ${other.label} at its strongest level, ${dbText(other.strongestLevel, 'dBFS')}`,
            rateMultiple: 0,
            shiftMultiple: 1,
            low: other.low,
            high: other.high,
            level: other.strongestLevel,
            mixing: [{ signal: 'wanted', index, harmonic: 1, plus: 1, minus: 0 }],
            ownMargin: spacing,
          },
        ],
  );
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
