import { guardBands } from '../../src/math/band.js';
import { db, hz, ppm, seconds } from '../../src/units/quantities.js';
import type { Converter, Scenario } from '../../src/scenario/scenario.js';

/**
 * A complete, valid converter of the invented Heron line (Saltmarsh Radio),
 * with fields replaced by `overrides`. Invented demo data, not a real part.
 */
export function converterFixture(overrides: Partial<Converter> = {}): Converter {
  return {
    label: 'Saltmarsh SR-14',
    minRate: hz(20e6),
    maxRate: hz(250e6),
    inputBandwidth: hz(500e6),
    bits: 14,
    harmonics: new Map([
      [2, db(-75)],
      [3, db(-80)],
    ]),
    intercept3: null,
    rateSpurs: { dc: null, halfRate: null, quarterRate: null },
    interleave: null,
    apertureJitter: seconds(0),
    clockDividers: [1],
    ...overrides,
  };
}

/**
 * A complete, valid Scenario (invented "Heron" receiver: 65–75 MHz wanted
 * band, no spurs, no neighbours, no filter), with top-level fields replaced
 * by `overrides` (shallow: pass a whole `wanted`, `converter`, ... to change
 * one; converterFixture helps with the converter).
 *
 * @example scenarioFixture({ harmonicOrder: 3, converter: converterFixture({ intercept3: db(30) }) })
 */
export function scenarioFixture(overrides: Partial<Scenario> = {}): Scenario {
  const made: Omit<Scenario, 'channels'> & { channels?: Scenario['channels'] } = {
    name: 'Heron-test',
    description: 'Test fixture of the invented Heron receiver line',
    wanted: { low: hz(65e6), high: hz(75e6), weakestLevel: db(-60), strongestLevel: db(-1) },
    guard: guardBands(hz(2e6), hz(2e6)),
    converter: converterFixture(),
    harmonicOrder: 5,
    boardSpurs: [],
    neighbours: [],
    filter: null,
    requirements: { margin: hz(1e6), rejection: db(40), tolerancePpm: ppm(20) },
    clocks: [
      {
        label: 'XO-A 122.88M',
        frequency: hz(122.88e6),
        tolerancePpm: ppm(20),
        toleranceBreakdown: null,
        jitter: null,
        note: '',
        derivation: { kind: 'direct' },
      },
    ],
    goal: { kind: 'widest-margin' },
    ifShift: null,
    afterRate: {
      outOfBandLevel: null,
      passbandRipple: db(1),
      driverNoiseDensity: null,
      downConverter: { ncoBits: null, outputRate: null, usableFraction: 0.8 },
    },
    ...overrides,
  };
  // One channel unless a list is given: the wanted band with the scenario's guard and requirements, as the file reader makes it.
  return { ...made, channels: made.channels ?? [{ label: 'wanted', ...made.wanted, guard: made.guard, requirements: made.requirements }] };
}
