import { describe, expect, it } from 'vitest';
import { guardBands } from '../../src/math/band.js';
import { db, hz, ppm } from '../../src/units/quantities.js';
import type { Channel, Scenario } from '../../src/scenario/scenario.js';
import { contextFromScenario } from '../../src/solve/context-from-scenario.js';
import { planRates } from '../../src/solve/feasible-set.js';
import { evaluateRate } from '../../src/solve/evaluate-rate.js';
import { limitText } from '../../src/solve/limited-by.js';
import { planScenario } from '../../src/plan/plan-scenario.js';
import { converterFixture, scenarioFixture } from '../helpers/scenario-fixture.js';

/**
 * Two channels through one converter, worked on paper. Windows per band from
 * Vaughan, Scott & White, "The theory of bandpass sampling", IEEE Trans.
 * Signal Processing 39(9), 1991: a band [l, h] sits whole in zone n for
 * 2h/n ≤ r ≤ 2l/(n − 1). Two signals collide when one comes within the
 * margin of an image j·r ± the other (Akos et al., "Direct bandpass sampling
 * of multiple distinct RF signals", IEEE Trans. Communications 47(7), 1999;
 * Tseng & Chou, IEEE Trans. Wireless Communications 5(1), 2006). A square
 * law makes 2·f and f1 − f2 (common practice): here channel A's second
 * harmonic and its own difference product land near channel B.
 *
 * Channels (MHz): A = [10, 12], strongest −1 dBFS, weakest −10, rejection 5
 *   (threshold −15: nothing but B blocks A); B = [25, 27], strongest −40,
 *   weakest −60, rejection 5 (threshold −65), margin 3 MHz but 0.5 MHz for
 *   harmonics (kindMargins). Both keep 3 MHz from the other channel
 *   (channelSpacing). No guards, no drift, rates 15–60.
 *   The converter states H2 at −60 dBc (at A's −1 dBFS) and nothing else:
 *   against B, A's H2 [20, 24] at −61 dBFS and A's difference A − A
 *   [−2, 2] at −61 + 6.02 = −54.98 dBFS block; A ± B (−94) and B's own (below −130) do not.
 *
 * Windows: A zone 2 [12, 20], zone 1 r ≥ 24; B zone 4 [13.5, 16.67],
 *   zone 3 [18, 25], zone 2 [27, 50], zone 1 r ≥ 54. Common in [15, 60]:
 *   [15, 16.67] (2, 4), [18, 20] (2, 3), [24, 25] (1, 3), [27, 50] (1, 2), [54, 60] (1, 1).
 * Forbidden (gap to an image of B under 3 MHz; images j·r − [25, 27] and j·r + [25, 27]):
 *   A − A, [−2, 2]: j·r − 29 < 3 and 23 − j·r < 3 → j·r ∈ (20, 32): r ∈ (20, 32), (10, 16).
 *   channel A, [10, 12] and its mirror: j·r − 39 < 3 and 35 − j·r < 3 → j·r ∈ (32, 42): r ∈ (32, 42), (16, 21);
 *     j·r + [10, 12] (or the mirror against j·r − B): j·r ∈ (10, 20): r ∈ (10, 20), (5, 10).
 *   A's H2, [20, 24], 0.5 MHz: j·r − 51 < 0.5 and 45 − j·r < 0.5 → j·r ∈ (44.5, 51.5):
 *     r ∈ (44.5, 51.5), (22.25, 25.75), (14.83, 17.17). (At j = 0 it stays 1 MHz from B: had
 *     the harmonic margin been 3 MHz, no rate could work, since folding never moves two frequencies apart.)
 * Left: [15, 16.67] − (10, 16) − (14.83, 17.17) = ∅; [18, 20] − (16, 21) = ∅; [24, 25] − (20, 32) = ∅;
 *   [27, 50] − (20, 32) − (32, 42) − (44.5, 51.5) = {32} ∪ [42, 44.5]; [54, 60] stays.
 * So the lowest valid rate is the single rate 32 MHz (A in zone 1, B in zone 2, inverted):
 *   B folds to 32 − [25, 27] = [5, 7]; A − A shows at [0, 2], exactly 3 MHz below; A at [10, 12], exactly 3 MHz above.
 */

const MHZ = 1e6;
const none = guardBands(hz(0), hz(0));

function channel(label: string, low: number, high: number, levels: [number, number], margin: number): Channel {
  return {
    label,
    low: hz(low * MHZ),
    high: hz(high * MHZ),
    weakestLevel: db(levels[0]),
    strongestLevel: db(levels[1]),
    guard: none,
    requirements: {
      margin: hz(margin * MHZ),
      rejection: db(5),
      tolerancePpm: ppm(0),
      channelSpacing: hz(3 * MHZ),
      kindMargins: { harmonic: hz(0.5 * MHZ), intermod: null, neighbour: null, spur: null, converter: null },
    },
  };
}

const A = channel('A', 10, 12, [-10, -1], 0);
const B = channel('B', 25, 27, [-60, -40], 3);

const twoChannels: Scenario = scenarioFixture({
  wanted: { low: A.low, high: A.high, weakestLevel: A.weakestLevel, strongestLevel: A.strongestLevel },
  guard: none,
  requirements: A.requirements,
  channels: [A, B],
  harmonicOrder: 2,
  maxOrder: 2,
  clocks: [],
  goal: { kind: 'lowest-rate' },
  converter: converterFixture({
    minRate: hz(15 * MHZ),
    maxRate: hz(60 * MHZ),
    inputBandwidth: hz(100 * MHZ),
    harmonics: new Map([[2, db(-60)]]),
  }),
});

const context = contextFromScenario(twoChannels);
const judge = (rate: number) => evaluateRate(context, hz(rate), ppm(0));

describe('two channels worked on paper (Vaughan–Scott–White windows, Akos / Tseng–Chou collisions, a square-law harmonic)', () => {
  it('derives against each channel what blocks it', () => {
    const blocking = context.channels!.map((c) => c.interferers.filter((i) => i.blocking).map((i) => `${i.label} ${i.kind}`));
    expect(blocking).toEqual([['B channel'], ['A channel', 'A H2 harmonic', 'IM2 A difference intermod']]);
    const b = context.channels![1]!.interferers;
    expect(b.find((i) => i.label === 'A H2')).toMatchObject({ low: 20e6, high: 24e6, requiredMargin: 0.5e6 });
    expect(b.find((i) => i.label === 'IM2 A difference')).toMatchObject({ low: -2e6, high: 2e6, requiredMargin: 3e6 });
    expect(b.find((i) => i.label === 'A')).toMatchObject({ low: 10e6, high: 12e6, requiredMargin: 3e6, level: -1 });
  });

  it('finds the exact set: a single rate and two intervals', () => {
    const set = planRates(context);
    expect(set.feasible.map((f) => [f.minRate / MHZ, f.maxRate / MHZ, f.channelZones])).toEqual([
      [32, 32, [1, 2]],
      [42, 44.5, [1, 2]],
      [54, 60, [1, 1]],
    ]);
    expect(set.feasible[0]!.channelInverted).toEqual([false, true]);
  });

  it('passes the single rate 32 MHz and fails a hair either side, naming the check', () => {
    const at = judge(32 * MHZ);
    expect(at.pass).toBe(true);
    expect(at.channels!.map((c) => [c.label, c.zone, c.inverted, c.image])).toEqual([
      ['A', 1, false, { low: 10e6, high: 12e6 }],
      ['B', 2, true, { low: 5e6, high: 7e6 }],
    ]);
    expect(at.worstSlack).toBe(0);
    const below = judge(32 * MHZ * (1 - 1e-9));
    expect(below.pass).toBe(false);
    expect(limitText(below.limitedBy)).toBe('B: IM2 A difference');
    const above = judge(32 * MHZ * (1 + 1e-9));
    expect(above.pass).toBe(false);
    expect(limitText(above.limitedBy)).toMatch(/^(A: B|B: A)$/);
  });

  it('fails where A’s harmonic lands on B, and where the channels meet', () => {
    // 48 MHz: B folds to 48 − [25, 27] = [21, 23]; A's H2 [20, 24] covers it.
    const h2 = judge(48 * MHZ);
    expect(h2.channels![1]!.pass).toBe(false);
    expect(h2.checks.find((c) => c.label === 'B: A H2')!.margin).toBe(-3e6); // [20, 24] must move 3 MHz to clear [21, 23]
    // 37 MHz: B at 37 − [25, 27] = [10, 12], on A itself.
    expect(limitText(judge(37 * MHZ).limitedBy)).toMatch(/^(A: B|B: A)$/);
  });

  it('gives the exact minimum under the lowest-rate goal', () => {
    const report = planScenario(twoChannels);
    const best = report.candidates[0]!;
    expect(best.rate).toBe(32 * MHZ);
    expect(best.pass).toBe(true);
    expect(best.channels.map((c) => [c.label, c.zone, c.nco, c.conjugate])).toEqual([
      ['A', 1, 11e6, false],
      ['B', 2, 6e6, true],
    ]);
    // Each channel's NCO word at 32 MHz, 32 bits, round(f·2^32 / rate) (tuning words worked by hand, common practice):
    // A at 11 MHz: 11/32 = 0.34375 → 1476395008; B at 6 MHz: 6/32 = 0.1875 → 805306368, inverted: 2^32 − 805306368 = 3489660928.
    const words = planScenario({
      ...twoChannels,
      afterRate: { ...twoChannels.afterRate, downConverter: { ...twoChannels.afterRate.downConverter, ncoBits: 32 } },
    }).candidates[0]!.channels.map((c) => c.afterRate?.downConverter.nco);
    expect(words.map((n) => [n?.word, n?.inverted, n?.negativeWord])).toEqual([
      [1476395008, false, 2 ** 32 - 1476395008],
      [805306368, true, 3489660928],
    ]);
    expect(report.channels.map((c) => [c.label, c.low, c.high, c.guard])).toEqual([
      ['A', 10e6, 12e6, { below: 0, above: 0 }],
      ['B', 25e6, 27e6, { below: 0, above: 0 }],
    ]);
  });
});
