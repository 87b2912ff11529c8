import { guardBands } from '../../src/math/band.js';
import { db, hz, ppm } from '../../src/units/quantities.js';
import { contextFromScenario } from '../../src/solve/context-from-scenario.js';
import { solvePlan } from '../../src/plan/solve-plan.js';
import { planReport, type PlanReport } from '../../src/plan/plan-report.js';
import type { Scenario } from '../../src/scenario/scenario.js';
import { converterFixture, scenarioFixture } from '../helpers/scenario-fixture.js';

/**
 * Reports solved by the real solver for the picture tests. Invented demo data
 * of the "Heron" receiver line (Saltmarsh Radio), not real parts.
 */

/** A clock part used directly as the sample clock: the fixture's part with another label and frequency. */
function directClock(label: string, frequency: number): Scenario['clocks'][number] {
  return { ...scenarioFixture().clocks[0]!, label, frequency: hz(frequency), tolerancePpm: ppm(20) };
}

/** Heron IF board: 65–75 MHz, a board spur, a strong neighbour, two clocks, some blocking. */
export function heronBoardScenario(): Scenario {
  return scenarioFixture({
    name: 'Heron-4 board <rev "B"> & co',
    boardSpurs: [
      { label: 'SMPS 1.2M', low: hz(1.2e6), high: hz(1.2e6), level: db(-30), coupling: 'after-filter', harmonics: 3 },
      { label: 'LO leak 92M', low: hz(92e6), high: hz(92e6), level: db(-35), coupling: 'after-filter', harmonics: 1 },
    ],
    neighbours: [{ label: 'Paging 81M', low: hz(80.5e6), high: hz(81.5e6), level: db(-20) }],
    filter: { kind: 'butterworth', order: 5, passLow: hz(63e6), passHigh: hz(77e6) },
    requirements: { margin: hz(1e6), rejection: db(20), tolerancePpm: ppm(20) },
    clocks: [directClock('XO-A 122.88M', 122.88e6), directClock('XO-B 100M', 100e6), directClock('XO-C 61.44M', 61.44e6)],
  });
}

/** The board with one more clock at 140 MHz, where the wanted band straddles the zone 1/2 edge (70 MHz). */
export function heronStraddleScenario(): Scenario {
  const board = heronBoardScenario();
  return { ...board, name: 'Heron-4 straddling clock', clocks: [...board.clocks, directClock('XO-S 140M', 140e6)] };
}

/** A low-pass band whose lower guard reaches DC: only zone 1 holds it. */
export function heronLowPassScenario(): Scenario {
  return scenarioFixture({
    name: 'Heron-1 baseband',
    wanted: { low: hz(1e6), high: hz(10e6), weakestLevel: db(-60), strongestLevel: db(-1) },
    guard: guardBands(hz(2e6), hz(2e6)),
    clocks: [directClock('XO-L 30.72M', 30.72e6)],
  });
}

/** A narrow band high up (many narrow windows over a long rate range). */
export function heronHighIfScenario(): Scenario {
  return scenarioFixture({
    name: 'Heron-9 high IF',
    wanted: { low: hz(1.4e9), high: hz(1.41e9), weakestLevel: db(-60), strongestLevel: db(-1) },
    guard: guardBands(hz(1e6), hz(1e6)),
    converter: converterFixture({ minRate: hz(20e6), maxRate: hz(3e9), inputBandwidth: hz(3e9) }),
    clocks: [directClock('XO-H 245.76M', 245.76e6)],
  });
}

/** The report of a scenario, solved by the real solver. */
export function reportOf(scenario: Scenario): PlanReport {
  const context = contextFromScenario(scenario);
  return planReport(scenario.name, context, solvePlan(context));
}
