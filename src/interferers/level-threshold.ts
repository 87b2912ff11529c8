import { db, type Db } from '../units/quantities.js';
import type { Scenario } from '../scenario/scenario.js';

/**
 * The level at or below which an interferer may land anywhere: the weakest
 * wanted level minus the required rejection, dBFS.
 *
 * @param scenario the validated scenario
 * @returns threshold in dBFS
 * @example levelThreshold(s) // -100 (weakestLevel −60 dBFS, rejection 40 dB)
 */
export function levelThreshold(scenario: Scenario): Db {
  return db(scenario.wanted.weakestLevel - scenario.requirements.rejection);
}

/**
 * Whether an interferer at this level blocks rates: strictly above the
 * threshold. At the threshold it is weak enough (non-blocking).
 *
 * @param level interferer level at the converter, dBFS
 * @param scenario the validated scenario
 * @returns true when level > levelThreshold(scenario)
 * @example isBlocking(db(-100), s) // false (the threshold is −100 dBFS)
 */
export function isBlocking(level: Db, scenario: Scenario): boolean {
  return level > levelThreshold(scenario);
}
