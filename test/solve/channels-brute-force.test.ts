import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { guardBands } from '../../src/math/band.js';
import { db, hz, ppm } from '../../src/units/quantities.js';
import type { Channel, Scenario } from '../../src/scenario/scenario.js';
import { contextFromScenario } from '../../src/solve/context-from-scenario.js';
import { planRates } from '../../src/solve/feasible-set.js';
import { converterFixture, scenarioFixture } from '../helpers/scenario-fixture.js';
import { bruteChannelsPass, type BruteChannel, type BruteSignal } from '../helpers/brute-force-channels.js';
import { nearAnEdge, sweepRates } from './random-plan.js';

/**
 * The exact feasible set of several channels against the independent brute
 * force of test/helpers/brute-force-channels.ts (every channel and every
 * signal folded point by point from the definition of aliasing,
 * |f − r·round(f/r)|; common practice, no source), on random scenarios from
 * fast-check (seeded): two or three channels with their own guards, margins,
 * spacings and thresholds, and up to three neighbour bands and two tones at
 * random levels. The converter states no harmonic, spur or interleaving, so
 * the signals are the channels, neighbours and tones themselves (checked).
 * Rates within a relative 1e-9 of an edge of a feasible interval are
 * skipped: there rounding decides; single rates are checked within the
 * brute force's own slack by the paper case (channels-hand-worked.test.ts).
 */

const MHZ = 1e6;
const RATES = 400;
const on10k = (min: number, max: number) => fc.integer({ min: min * 100, max: max * 100 }).map((n) => n * 1e4);

const channelArb = fc.record({
  low: on10k(1, 80),
  width: on10k(0.2, 6),
  guardBelow: on10k(0, 0.3),
  guardAbove: on10k(0, 0.3),
  weakest: fc.integer({ min: -80, max: -30 }),
  margin: on10k(0.05, 1),
  spacing: on10k(0.05, 1),
});
const signalArb = fc.record({ low: on10k(0.5, 200), width: on10k(0, 2), level: fc.integer({ min: -100, max: -20 }) });
const scenarioArb = fc.record({
  channels: fc.array(channelArb, { minLength: 2, maxLength: 3 }),
  neighbours: fc.array(signalArb, { maxLength: 3 }),
  tones: fc.array(
    signalArb.map((s) => ({ ...s, width: 0 })),
    { maxLength: 2 },
  ),
});

type Drawn = typeof scenarioArb extends fc.Arbitrary<infer T> ? T : never;
const REJECTION = 10;

function scenarioOf(drawn: Drawn): Scenario {
  const channels: Channel[] = drawn.channels.map((c, i) => ({
    label: `C${i}`,
    low: hz(c.low),
    high: hz(c.low + c.width),
    weakestLevel: db(c.weakest),
    strongestLevel: db(-10),
    guard: guardBands(hz(c.guardBelow), hz(c.guardAbove)),
    requirements: { margin: hz(c.margin), rejection: db(REJECTION), tolerancePpm: ppm(0), channelSpacing: hz(c.spacing) },
  }));
  const first = channels[0]!;
  return scenarioFixture({
    wanted: { low: first.low, high: first.high, weakestLevel: first.weakestLevel, strongestLevel: first.strongestLevel },
    guard: first.guard,
    requirements: first.requirements,
    channels,
    neighbours: drawn.neighbours.map((n, i) => ({ label: `N${i}`, low: hz(n.low), high: hz(n.low + n.width), level: db(n.level) })),
    boardSpurs: drawn.tones.map((t, i) => ({
      label: `T${i}`,
      low: hz(t.low),
      high: hz(t.low),
      level: db(t.level),
      coupling: 'after-filter',
      harmonics: 1,
    })),
    harmonicOrder: 2,
    maxOrder: 2,
    clocks: [],
    converter: converterFixture({ minRate: hz(5 * MHZ), maxRate: hz(250 * MHZ), inputBandwidth: hz(1e9), harmonics: new Map() }),
  });
}

function bruteOf(drawn: Drawn): { channels: BruteChannel[]; signals: BruteSignal[] } {
  return {
    channels: drawn.channels.map((c) => ({
      low: c.low,
      high: c.low + c.width,
      guardBelow: c.guardBelow,
      guardAbove: c.guardAbove,
      spacing: c.spacing,
      margin: c.margin,
      threshold: c.weakest - REJECTION,
    })),
    signals: [...drawn.neighbours, ...drawn.tones].map((s) => ({ low: s.low, high: s.low + s.width, level: s.level })),
  };
}

const tally = { scenarios: 0, compared: 0, valid: 0, skipped: 0 };

describe('the exact set of several channels against a point-by-point fold (random scenarios)', () => {
  it(`agree at ${RATES} rates per scenario from 5 to 250 MHz`, () => {
    fc.assert(
      fc.property(scenarioArb, fc.integer({ min: 0, max: 1e6 }), (drawn, seed) => {
        const context = contextFromScenario(scenarioOf(drawn));
        for (const c of context.channels!) {
          // Nothing but the channels, neighbours and tones: the brute force judges exactly these.
          expect(new Set(c.interferers.map((i) => i.kind))).toEqual(
            new Set(c.interferers.map((i) => i.kind).filter((k) => k === 'channel' || k === 'neighbour' || k === 'spur')),
          );
        }
        const set = planRates(context);
        const brute = bruteOf(drawn);
        const edges = set.feasible.flatMap((f) => [f.minRate, f.maxRate]);
        tally.scenarios++;
        for (const rate of sweepRates(5 * MHZ, 250 * MHZ, RATES, seed)) {
          if (nearAnEdge(rate, edges)) {
            tally.skipped++;
            continue;
          }
          const exact = set.feasible.some((f) => rate >= f.minRate && rate <= f.maxRate);
          // Independent point-by-point fold (definition of aliasing; common practice, no source).
          expect(exact, `valid at ${rate} Hz for ${JSON.stringify(drawn)}`).toBe(bruteChannelsPass(brute.channels, brute.signals, rate));
          tally.compared++;
          if (exact) tally.valid++;
        }
        for (const f of set.feasible) {
          if (f.minRate < f.maxRate) expect(bruteChannelsPass(brute.channels, brute.signals, (f.minRate + f.maxRate) / 2)).toBe(true);
        }
      }),
      { numRuns: 150, seed: 20261202 },
    );
    console.info(
      `channels agreement: ${tally.scenarios} scenarios, ${tally.compared} rates compared (${tally.valid} valid), ${tally.skipped} skipped near an edge`,
    );
    // The sweep must meet valid rates as well as invalid ones, or it proves little.
    expect(tally.valid).toBeGreaterThan(1000);
    expect(tally.compared - tally.valid).toBeGreaterThan(1000);
  });
});
