import { describe, expect, it } from 'vitest';
import { db, hz, ppm } from '../../src/units/quantities.js';
import { guardBands } from '../../src/math/band.js';
import type { Scenario } from '../../src/scenario/scenario.js';
import { deriveInterferers } from '../../src/interferers/derive-interferers.js';
import { contextFromScenario } from '../../src/solve/context-from-scenario.js';
import { bestShiftAndRate } from '../../src/solve/if-shift/best-shift-and-rate.js';
import { shiftedScenario, sweptScenario } from '../../src/solve/if-shift/shifted-scenario.js';
import { converterFixture, scenarioFixture } from '../helpers/scenario-fixture.js';

const MHz = 1e6;

/**
 * With an IF shift the products that block differ from shift to shift (a
 * neighbour walks along the filter's skirt), yet the IF-shift search needs
 * one list of interferers in one order at every shift. The listing is
 * decided on the neighbours swept over the whole range (their strongest
 * level): a product that blocks at some shift is listed at all of them.
 * Invented Heron data; the filter attenuation is the Butterworth magnitude
 * (filter design handbooks; from memory).
 */
const scenario: Scenario = scenarioFixture({
  name: 'Heron-shift listing',
  wanted: { low: hz(60 * MHz), high: hz(64 * MHz), weakestLevel: db(-60), strongestLevel: db(-1) },
  guard: guardBands(hz(0), hz(0)),
  converter: converterFixture({ minRate: hz(40 * MHz), maxRate: hz(200 * MHz) }),
  harmonicOrder: 3,
  neighbours: [{ label: 'EDGE', low: hz(84 * MHz), high: hz(85 * MHz), level: db(0) }],
  filter: { kind: 'butterworth', order: 6, passLow: hz(55 * MHz), passHigh: hz(70 * MHz) },
  requirements: { margin: hz(0.5 * MHz), rejection: db(40), tolerancePpm: ppm(10) },
  clocks: [],
  ifShift: { low: hz(-6 * MHz), high: hz(6 * MHz) },
});

describe('IF shift: one list of interferers at every shift', () => {
  const ends = [-6 * MHz, 6 * MHz].map((shift) => deriveInterferers(shiftedScenario(scenario, hz(shift))).map((i) => i.label));

  it('derived alone, the two ends of the range list different products (the case this guards)', () => {
    expect(ends[0]).not.toEqual(ends[1]);
  });

  it('with the swept listing, every shift lists the same labels in the same order, and blocking products of either end are among them', () => {
    const swept = sweptScenario(scenario, scenario.ifShift!);
    const lists = [-6, -3, 0, 2.5, 6].map((d) =>
      contextFromScenario(shiftedScenario(scenario, hz(d * MHz)), swept).interferers.map((i) => i.label),
    );
    for (const list of lists) expect(list).toEqual(lists[0]);
    for (const end of ends) for (const label of end) expect(lists[0]).toContain(label);
  });

  it('the search runs over the whole range and re-checks its answer exactly', () => {
    const search = bestShiftAndRate(scenario);
    expect(search.best).not.toBeNull();
    expect(search.best!.evaluation.pass).toBe(true);
  });
});
