import { guardBands } from '../../src/math/band.js';
import { db, hz, ppm, type Hz } from '../../src/units/quantities.js';
import { planScenario } from '../../src/plan/plan-scenario.js';
import type { PlanReport } from '../../src/plan/plan-report.js';
import type { Channel, Scenario } from '../../src/scenario/scenario.js';
import { scenarioFixture } from './scenario-fixture.js';

/**
 * A scenario of two channels for the pictures and the page, solved by the
 * real planner. Invented demo data of the Heron line (Saltmarsh Radio):
 * IF-A 65–75 MHz with 2 MHz guards, IF-B 100–104 MHz with 1 MHz guards,
 * their aliases kept 1 MHz apart; direct clocks at 122.88, 170, 184.32 and
 * 245.76 MHz (at 170 MHz IF-B in zone 2 folds onto IF-A).
 */
const requirements = { margin: hz(1e6), rejection: db(20), tolerancePpm: ppm(20), channelSpacing: hz(1e6) };

export const TWO_CHANNELS: readonly Channel[] = [
  {
    label: 'IF-A',
    low: hz(65e6),
    high: hz(75e6),
    weakestLevel: db(-45),
    strongestLevel: db(-20),
    guard: guardBands(hz(2e6), hz(2e6)),
    requirements,
  },
  {
    label: 'IF-B',
    low: hz(100e6),
    high: hz(104e6),
    weakestLevel: db(-50),
    strongestLevel: db(-25),
    guard: guardBands(hz(1e6), hz(1e6)),
    requirements,
  },
];

const direct = (label: string, frequency: number): Scenario['clocks'][number] => ({
  ...scenarioFixture().clocks[0]!,
  label,
  frequency: hz(frequency),
  tolerancePpm: ppm(20),
});

/** The two-channel scenario (see TWO_CHANNELS). */
export function twoChannelScenario(channels: readonly Channel[] = TWO_CHANNELS): Scenario {
  const [first] = channels;
  const { label: _label, guard, requirements: firstRequirements, ...band } = first!;
  return scenarioFixture({
    name: 'Heron-2 dual IF (test)',
    wanted: band,
    guard,
    requirements: firstRequirements,
    channels,
    clocks: [
      direct('XO-A 122.88M', 122.88e6),
      direct('XO-C 170M', 170e6),
      direct('XO-D 184.32M', 184.32e6),
      direct('XO-E 245.76M', 245.76e6),
    ],
  });
}

/**
 * The two-channel scenario planned by the real planner.
 *
 * @returns the plan report
 */
export function twoChannelReport(): PlanReport {
  return planScenario(twoChannelScenario());
}

/** A channel's guarded band edges, Hz. */
export function guardedEdges(channel: { low: Hz; high: Hz; guard: { low: Hz; high: Hz } }): { low: Hz; high: Hz } {
  return { low: hz(channel.low - channel.guard.low), high: hz(channel.high + channel.guard.high) };
}
