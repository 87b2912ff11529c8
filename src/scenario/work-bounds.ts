import type * as z from 'zod';
import { formatFrequency } from '../units/format-frequency.js';
import type { Hz } from '../units/quantities.js';
import { guardedBand, type Band, type Guard } from '../math/band.js';
import { windowCount, zoneSpan } from '../math/zone-span.js';
import { refuseAt } from './band-forms.js';
import { InputError } from '../units/input-error.js';
import { pathText, type DocumentPath } from './document-path.js';
import type { BoardSpur, Converter, KindMargins, Neighbour, WantedBand } from './scenario.js';

/**
 * Most rate windows a plan searches. Each window costs a search of every
 * interferer's images; a thousand already take a few seconds on one core,
 * and a real design has a few hundred zones at most in its converter's range.
 */
export const MOST_PLAN_WINDOWS = 1000;

/**
 * Most images of the wanted band the interferers can meet over the rate
 * range (an upper estimate, see foldingWork and, on the derived list, the
 * interferers stage's refuseTooManyImages). Measured at 20 to 40 µs per
 * blocking image in the solver on a loaded machine (most products are too weak
 * to block and cost far less), 200,000 images are seconds, not minutes.
 */
export const MOST_IMAGES = 200_000;

/** What the work checks read from a scenario, already validated field by field. */
export interface WorkInputs {
  readonly wanted: WantedBand;
  readonly guard: Guard;
  readonly converter: Converter;
  readonly harmonicOrder: number;
  readonly boardSpurs: readonly BoardSpur[];
  readonly neighbours: readonly Neighbour[];
  readonly ifShift: { readonly low: Hz; readonly high: Hz } | null;
  readonly requirements: { readonly margin: Hz; readonly kindMargins?: KindMargins };
  /** Highest total order of the mixing products among the signals. */
  readonly maxOrder: number;
}

/** One source of folding work: how many interferers it makes, and the sum of their highest frequencies, Hz. */
interface WorkSource {
  readonly path: (string | number)[];
  readonly words: string;
  readonly reach: number;
  readonly count: number;
}

/**
 * Refuses, before any solving starts, a scenario whose plan would take
 * unreasonable time or memory, saying what to narrow: a rate range holding
 * more than MOST_PLAN_WINDOWS windows for the guarded band (at either end of
 * the IF shift), or interferers folding onto more than MOST_IMAGES images of
 * the wanted band over the rate range.
 *
 * @param ctx the zod context of the whole scenario (paths from its root)
 * @param inputs the validated sections
 * @example scenarioFromDocument(heronBaseDocument, 'heron-base.json').converter.minRate // 40e6 (the demo is within the bounds: refuseTooMuchWork adds no issue)
 */
export function refuseTooMuchWork(ctx: z.RefinementCtx, inputs: WorkInputs): void {
  const { converter } = inputs;
  const bands = shiftedBands(inputs).map((band) => guardedBand(band, inputs.guard));
  const windows = Math.max(...bands.map((band) => windowCount(band, converter.minRate, converter.maxRate)));
  const range = `${formatFrequency(converter.minRate)} to ${formatFrequency(converter.maxRate)}`;
  if (windows > MOST_PLAN_WINDOWS) {
    const width = formatFrequency(bands[0]!.high - bands[0]!.low);
    refuseAt(
      ctx,
      ['converter', 'minRate'],
      `a rate range holding at most ${MOST_PLAN_WINDOWS} windows for the band; raise converter.minRate or lower converter.maxRate`,
      `${range} holds about ${windows} windows for the ${width} guarded band`,
      [['converter', 'maxRate'], ['wanted'], ['guard']],
    );
    return;
  }
  const { images, worst } = foldingWork(inputs, bands);
  if (images > MOST_IMAGES && worst) {
    refuseAt(
      ctx,
      worst.path,
      `interferers that fold onto at most ${MOST_IMAGES} images of the wanted band over the rate range; raise converter.minRate, or lower the highest frequencies or requirements.margin`,
      `about ${Math.round(images)} images over ${range}, most from ${worst.words}`,
      [
        ['converter', 'minRate'],
        ['converter', 'maxRate'],
        ['requirements', 'margin'],
      ],
    );
  }
}

/**
 * An upper estimate of the images of the wanted band that the interferers
 * can meet: an extent reaching frequency F meets about 2·F·(1/rLow − 1/rHigh)
 * images (j·r ± band for every j up to F/r, both sides) plus a few per
 * window, with rLow the lowest rate any window allows. Harmonics k·F of one
 * source reach F·Σk in all; the margin adds its width to each extent.
 */
function foldingWork(inputs: WorkInputs, bands: readonly Band[]): { images: number; worst: WorkSource | null } {
  const { perHertz, windows } = imageDensity(inputs.converter, bands);
  if (windows === 0) return { images: 0, worst: null };
  const margin = largestMargin(inputs);
  let images = 0;
  let worst: WorkSource | null = null;
  let worstImages = -1;
  for (const source of workSources(inputs)) {
    // The margin widens every extent searched on both sides: a huge margin is as much work as a huge frequency.
    const here = (source.reach + 2 * source.count * margin) * perHertz + 2 * windows * source.count;
    images += here;
    if (here > worstImages) [worst, worstImages] = [source, here];
  }
  return { images, worst };
}

/**
 * How many images of the wanted band an extent meets over the rate range:
 * about `perHertz` per hertz of its reach, 2·F·(1/rLow − 1/rHigh) for an
 * extent reaching F (j·r ± band for every j up to F/r, both sides), plus
 * two per window (`windows`, the most any guarded band has).
 *
 * @param converter the converter's rate range, Hz
 * @param bands the guarded wanted band (and its IF-shifted copies)
 * @returns images per hertz of reach (1/Hz) and the window count
 * @example imageDensity({ minRate: 40e6, maxRate: 250e6 }, [{ low: 128e6, high: 152e6 }]).windows // 6 (the 24 MHz guarded band has a window in six zones between 40 and 250 MHz)
 */
export function imageDensity(
  converter: Pick<Converter, 'minRate' | 'maxRate'>,
  bands: readonly Band[],
): { perHertz: number; windows: number } {
  const lowestRate = Math.min(
    ...bands.map((band) => Math.max(converter.minRate, (2 * band.high) / zoneSpan(band, converter.minRate, converter.maxRate).last)),
  );
  const perHertz = 2 * (1 / lowestRate - 1 / converter.maxRate);
  const windows = Math.max(...bands.map((band) => windowCount(band, converter.minRate, converter.maxRate)));
  return { perHertz, windows };
}

/**
 * A plan refused for its size after the scenario itself was found valid
 * (the interferers it derives would take too long to search), naming the
 * scenario field to narrow by its path from the document's root. The shell
 * adds the file (resolveScenario's check).
 */
export class WorkBoundError extends InputError {
  constructor(
    readonly path: DocumentPath,
    expected: string,
    received: string,
  ) {
    super(pathText(path), expected, received);
    this.name = 'WorkBoundError';
    this.message = `${pathText(path)}: expected ${expected} (got ${received})`;
  }
}

/** The interferers' sources, each with the highest frequency its derived interferers reach. */
function workSources(inputs: WorkInputs): WorkSource[] {
  const lift = Math.max(0, inputs.ifShift?.high ?? 0);
  const highestWanted = inputs.wanted.high + lift;
  const order = inputs.harmonicOrder;
  // The mixing products are left out here: most are too weak to block and are never made (mixingProducts prunes
  // them). The interferers stage counts the blocking ones it derives instead (refuseTooManyImages).
  return [
    {
      path: ['harmonicOrder'],
      words: `the wanted band's harmonics up to ${formatFrequency(order * highestWanted)}`,
      reach: highestWanted * (triangle(order) - 1),
      count: order - 1,
    },
    ...inputs.boardSpurs.map((spur, i) => ({
      path: ['boardSpurs', i, spur.high === spur.low ? 'frequency' : 'high'],
      words: `boardSpurs[${i}] (${spur.label}) up to ${formatFrequency(spur.harmonics * spur.high)}`,
      reach: spur.high * triangle(spur.harmonics),
      count: spur.harmonics,
    })),
    ...inputs.neighbours.map((neighbour, i) => ({
      path: ['neighbours', i, 'high'],
      words: `neighbours[${i}] (${neighbour.label}) and its harmonics up to ${formatFrequency(3 * (neighbour.high + lift))}`,
      reach: (neighbour.high + lift) * triangle(3),
      count: 3,
    })),
  ];
}

/** The widest margin any check may ask for, Hz: the scenario's, a kind's, or a spur's or neighbour's own. */
function largestMargin(inputs: WorkInputs): number {
  const own = [...inputs.boardSpurs, ...inputs.neighbours].map((signal) => signal.margin ?? 0);
  const kinds = Object.values(inputs.requirements.kindMargins ?? {}).map((margin) => margin ?? 0);
  return Math.max(inputs.requirements.margin, ...own, ...kinds);
}

/** 1 + 2 + … + n. */
function triangle(n: number): number {
  return (n * (n + 1)) / 2;
}

/**
 * The wanted band, and moved to either end of the IF shift.
 *
 * @param inputs the wanted band (Hz) and the IF shift (Hz, or null)
 * @returns one band, or three (the unshifted one and either end of the shift, those not below zero)
 * @example shiftedBands({ wanted: { low: 130e6, high: 150e6 }, ifShift: null }) // [{ low: 130e6, high: 150e6 }]
 */
export function shiftedBands(inputs: { readonly wanted: Band; readonly ifShift: WorkInputs['ifShift'] }): Band[] {
  const { wanted, ifShift } = inputs;
  const at = (shift: number): Band => ({ low: (wanted.low + shift) as Hz, high: (wanted.high + shift) as Hz });
  return ifShift ? [at(0), at(ifShift.low), at(ifShift.high)].filter((band) => band.low >= 0) : [at(0)];
}
