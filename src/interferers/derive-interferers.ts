import type { Scenario } from '../scenario/scenario.js';
import type { Interferer } from '../solve/interferer.js';
import { boardSpurDrafts } from './board-spurs.js';
import { converterSpurDrafts } from './converter-spurs.js';
import { complete } from './interferer-draft.js';
import { intermodDrafts } from './intermodulation.js';
import { neighbourDrafts } from './neighbours.js';
import { secondOrderDrafts } from './second-order.js';
import { uniqueLabels } from './unique-labels.js';
import { wantedHarmonics } from './wanted-harmonics.js';

/**
 * Every interferer of a scenario, with its level at the converter: harmonics
 * of the wanted band, board spurs and their harmonics, neighbour bands and
 * their 2nd/3rd harmonics, third-order intermodulation, second-order
 * products (differences and sums of the bands), and the converter's
 * rate-tied spurs, in that order. Each carries the scenario's margin and is
 * blocking when its level is above levelThreshold(scenario). Labels are
 * unique (repeats suffixed ` #2`, ...).
 *
 * @param scenario the validated scenario
 * @returns interferers, extents rateMultiple·r + [low, high] in Hz, levels in dBFS
 * @throws RangeError for a malformed filter (see leastAttenuation)
 * @example deriveInterferers(s).find((i) => i.label === 'H2 wanted') // 2·[low, high], strongestLevel + HD2
 */
export function deriveInterferers(scenario: Scenario): Interferer[] {
  const drafts = [
    ...wantedHarmonics(scenario),
    ...scenario.boardSpurs.flatMap((spur) => boardSpurDrafts(spur, scenario)),
    ...scenario.neighbours.flatMap((n) => neighbourDrafts(n, scenario)),
    ...intermodDrafts(scenario),
    ...secondOrderDrafts(scenario),
    ...converterSpurDrafts(scenario),
  ];
  return uniqueLabels(drafts).map((draft) => complete(draft, scenario));
}
