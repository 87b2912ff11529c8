import { describe, expect, it } from 'vitest';
import { db, hz, ppm } from '../../src/units/quantities.js';
import { afterRate, afterRateInputs, maskMargin } from '../../src/after-rate/after-rate.js';
import { contextFromScenario } from '../../src/solve/context-from-scenario.js';
import { NO_KIND_MARGINS } from '../../src/scenario/interferer-model-schema.js';
import type { Requirements } from '../../src/scenario/scenario.js';
import { scenarioFixture } from '../helpers/scenario-fixture.js';

const MHZ = 1e6;
const inMhz = (bands: ReadonlyArray<{ low: number; high: number }>) => bands.map((b) => [b.low / MHZ, b.high / MHZ]);

/**
 * The margin the anti-alias mask widens the channel by, worked by hand on the invented Heron test fixture
 * (65–75 MHz, requirements.margin 1 MHz, input bandwidth 500 MHz, no filter), sampled at 100 MHz, 0 ppm.
 *
 * The mask holds back a signal anywhere outside the channel at the filter input (a blocker, kind 'neighbour'),
 * so it keeps the margin the solver requires of such a signal: kindMargins.neighbour = 3 MHz here (the harmonic
 * kind's 10 MHz does not apply: harmonics are made in the converter, after the filter).
 * Channel widened by 3: [62, 78]. Alias bands j·100 ± [62, 78] up to 500 (images; common practice, no source):
 *   j = 1: [22, 38], [162, 178];  j = 2: [122, 138], [262, 278];  j = 3: [222, 238], [362, 378];
 *   j = 4: [322, 338], [462, 478];  j = 5: [422, 438] (562 and up dropped).
 * The nearest each side of the channel: [22, 38] below (stop from 38 down), [122, 138] above (stop from 122 up).
 * With the scenario's 1 MHz instead, [64, 76]: j = 1 mirrored [24, 36], the stops at 36 and 124.
 */
const requirements = (kindMargins: Partial<NonNullable<Requirements['kindMargins']>> | null): Requirements => ({
  margin: hz(1 * MHZ),
  rejection: db(40),
  tolerancePpm: ppm(20),
  ...(kindMargins ? { kindMargins: { ...NO_KIND_MARGINS, ...kindMargins } } : {}),
});
const blocker = { label: 'BLK 300M', low: hz(300 * MHZ), high: hz(301 * MHZ), level: db(-30), margin: null };
const withKinds = scenarioFixture({
  requirements: requirements({ neighbour: hz(3 * MHZ), harmonic: hz(10 * MHZ) }),
  neighbours: [blocker],
});
const plain = scenarioFixture({ requirements: requirements(null) });
const at100 = (scenario: typeof plain) => afterRate(afterRateInputs(scenario), hz(100 * MHZ), ppm(0), null, null);

describe('the mask keeps the margin the solver requires', () => {
  it('kindMargins.neighbour 3 MHz widens the channel to 62–78 MHz: the nine alias bands below 500 MHz', () => {
    const after = at100(withKinds);
    expect(inMhz(after.mask.bands)).toEqual([
      [22, 38],
      [122, 138],
      [162, 178],
      [222, 238],
      [262, 278],
      [322, 338],
      [362, 378],
      [422, 438],
      [462, 478],
    ]);
    expect([after.design.stopBelow, after.design.stopAbove]).toEqual([38 * MHZ, 122 * MHZ]);
  });

  it("without kind margins the scenario's 1 MHz: j = 1 mirrored at 24–36 MHz, stops at 36 and 124 MHz", () => {
    const after = at100(plain);
    expect(inMhz(after.mask.bands.slice(0, 2))).toEqual([
      [24, 36],
      [124, 136],
    ]);
    expect([after.design.stopBelow, after.design.stopAbove]).toEqual([36 * MHZ, 124 * MHZ]);
  });

  it("the same figure as the solver's required margin for a blocker with no margin of its own", () => {
    const solverBlocker = contextFromScenario(withKinds).interferers.find((i) => i.label === 'BLK 300M')!;
    expect(solverBlocker.requiredMargin).toBe(3 * MHZ);
    expect(afterRateInputs(withKinds).margin).toBe(solverBlocker.requiredMargin);
    expect(maskMargin(plain)).toBe(1 * MHZ);
  });

  it("several channels: each channel's mask takes its own requirements (its kindMargins.neighbour)", () => {
    const base = scenarioFixture({ requirements: requirements(null) });
    const a = { label: 'IF-A', low: hz(65 * MHZ), high: hz(75 * MHZ), weakestLevel: db(-60), strongestLevel: db(-1) };
    const b = { label: 'IF-B', low: hz(130 * MHZ), high: hz(140 * MHZ), weakestLevel: db(-60), strongestLevel: db(-1) };
    const twoChannels = {
      ...base,
      channels: [
        { ...a, guard: base.guard, requirements: requirements(null) },
        { ...b, guard: base.guard, requirements: requirements({ neighbour: hz(2.5 * MHZ) }) },
      ],
    };
    expect(afterRateInputs(twoChannels).channels!.map((c) => c.margin)).toEqual([1 * MHZ, 2.5 * MHZ]);
  });
});
