import { formatFrequency } from '../units/format-frequency.js';
import type { Scenario } from '../scenario/scenario.js';
import type { DocumentPath } from '../scenario/document-path.js';
import { guardedBand } from '../math/band.js';
import { imageDensity, MOST_IMAGES, shiftedBands, WorkBoundError } from '../scenario/work-bounds.js';
import type { Interferer } from './interferer.js';

/** One scenario field and the images its blocking interferers meet. */
interface FieldWork {
  readonly path: DocumentPath;
  /** What to narrow, in words. */
  readonly narrow: string;
  images: number;
}

/**
 * Refuses a plan whose blocking interferers would meet more than MOST_IMAGES
 * images of the wanted band over the rate range, naming the scenario field
 * whose interferers meet the most (a neighbour or board spur, maxOrder for
 * the mixing products, harmonicOrder for the wanted band's harmonics,
 * requirements.margin for the widening of every extent) and what to narrow.
 * Each blocking interferer reaching F (its farthest edge from zero), with
 * required margin m, meets about (F + 2·m)·perHertz + 2·windows images
 * (imageDensity). Non-blocking interferers are not counted: the solver
 * searches the forbidden rates of the blocking ones only, and judges the
 * others at a single rate (the first candidate), one check each.
 *
 * @param scenario the validated scenario the interferers were derived from
 * @param interferers its derived interferers (levels in dBFS, extents in Hz)
 * @throws WorkBoundError naming the field, when the estimate is above MOST_IMAGES
 * @example refuseTooManyImages(heronBase, deriveInterfererList(heronBase).interferers) // undefined (the demo is within the bound)
 */
export function refuseTooManyImages(scenario: Scenario, interferers: readonly Interferer[]): void {
  const bands = shiftedBands(scenario).map((band) => guardedBand(band, scenario.guard));
  const { perHertz, windows } = imageDensity(scenario.converter, bands);
  if (windows === 0) return;
  const fields = new Map<string, FieldWork>();
  const charge = (path: DocumentPath, narrow: string, images: number) => {
    const key = path.join('.');
    const field = fields.get(key) ?? { path, narrow, images: 0 };
    field.images += images;
    fields.set(key, field);
  };
  let images = 0;
  for (const interferer of interferers) {
    if (!interferer.blocking) continue;
    const reach = Math.max(Math.abs(interferer.low), Math.abs(interferer.high));
    const own = reach * perHertz + 2 * windows;
    // The margin widens every extent searched on both sides: a huge margin is as much work as a huge frequency.
    const widening = 2 * interferer.requiredMargin * perHertz;
    images += own + widening;
    const source = fieldOf(interferer);
    charge(source.path, source.narrow, own);
    charge(['requirements', 'margin'], 'lower requirements.margin (or the kind margins)', widening);
  }
  if (images <= MOST_IMAGES) return;
  const worst = [...fields.values()].reduce((a, b) => (b.images > a.images ? b : a));
  const range = `${formatFrequency(scenario.converter.minRate)} to ${formatFrequency(scenario.converter.maxRate)}`;
  throw new WorkBoundError(
    worst.path,
    `blocking interferers that fold onto at most ${MOST_IMAGES} images of the wanted band over the rate range; ${worst.narrow}, or raise converter.minRate`,
    `about ${Math.round(images)} images over ${range}, ${Math.round(worst.images)} of them from ${worst.path.join('.').replace(/\.(\d+)/g, '[$1]')}`,
  );
}

/** The scenario field an interferer comes from, and what narrowing it means. */
function fieldOf(interferer: Interferer): { path: DocumentPath; narrow: string } {
  const terms = interferer.mixing ?? [];
  if (interferer.kind === 'channel')
    return { path: ['wanted', terms[0]?.index ?? 0], narrow: 'raise converter.minRate or plan fewer channels together' };
  if (interferer.kind === 'intermod') {
    return {
      path: ['maxOrder'],
      narrow: "lower maxOrder, the neighbours' levels (a filter ahead of the converter) or the number of neighbours",
    };
  }
  if (interferer.kind === 'converter' || terms.length !== 1)
    return { path: ['converter'], narrow: "lower the converter's spur or image levels" };
  const [term] = terms;
  if (term!.signal === 'wanted') return { path: ['harmonicOrder'], narrow: 'lower harmonicOrder' };
  if (term!.signal === 'neighbour')
    return {
      path: ['neighbours', term!.index],
      narrow: `lower neighbours[${term!.index}]'s level (a filter ahead of the converter) or remove it`,
    };
  return { path: ['boardSpurs', term!.index], narrow: `lower boardSpurs[${term!.index}]'s level or harmonics` };
}
