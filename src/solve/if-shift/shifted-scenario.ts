import type { Hz } from '../../units/quantities.js';
import type { Scenario } from '../../scenario/scenario.js';

/**
 * The scenario with the first LO retuned so that the IF moves by δ: the
 * wanted band and every neighbour (converted by the same LO) move by δ;
 * board spurs, the filter, the converter and the requirements stay. The
 * result is a fixed-LO scenario (ifShift null), ready for the exact solver.
 *
 * @param scenario the validated scenario
 * @param shift δ, Hz (any sign)
 * @returns a new scenario; the input is not changed
 * @example shiftedScenario(s, hz(-2e6)).wanted // { low: 63e6, high: 73e6 }
 */
export function shiftedScenario(scenario: Scenario, shift: Hz): Scenario {
  const move = <T extends { readonly low: Hz; readonly high: Hz }>(band: T): T => ({
    ...band,
    low: (band.low + shift) as Hz,
    high: (band.high + shift) as Hz,
  });
  return { ...scenario, wanted: move(scenario.wanted), neighbours: scenario.neighbours.map(move), ifShift: null };
}

/**
 * The scenario with every neighbour widened to the whole band it sweeps over
 * the shift range, [low + δlow, high + δhigh], the wanted band left in place.
 * Only its levels are used: the filter's least attenuation over the swept band
 * is at most its attenuation at any one shift, and every level derived from a
 * neighbour (its harmonics, third-order products) grows with the neighbour's
 * level, so an interferer that blocks at some shift blocks here.
 *
 * @param scenario the validated scenario
 * @param range the shift range, Hz, low ≤ high
 * @returns a new scenario (ifShift null)
 * @example sweptScenario(heronNarrow, { low: hz(-2e6), high: hz(2e6) }).neighbours[0] // { low: 141e6, high: 150e6 } (143–148 MHz swept ±2 MHz)
 */
export function sweptScenario(scenario: Scenario, range: { readonly low: Hz; readonly high: Hz }): Scenario {
  const widen = <T extends { readonly low: Hz; readonly high: Hz }>(band: T): T => ({
    ...band,
    low: (band.low + range.low) as Hz,
    high: (band.high + range.high) as Hz,
  });
  return { ...scenario, neighbours: scenario.neighbours.map(widen), ifShift: null };
}
