import { guardBands } from '../../src/math/band.js';
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { db, hz, ppm } from '../../src/units/quantities.js';
import type { Scenario } from '../../src/scenario/scenario.js';
import { deriveInterferers } from '../../src/interferers/derive-interferers.js';
import { converterFixture, scenarioFixture } from '../helpers/scenario-fixture.js';

const MHz = 1e6;

/**
 * How each interferer moves when the first LO is retuned and the IF moves by
 * δ, worked from the algebra of the products (common practice, no source):
 * the wanted band f and each neighbour g are converted by the same LO, so
 * they become f + δ and g + δ; a k-th harmonic k·(f + δ) = k·f + k·δ; a
 * third-order product 2·(f1 + δ) − (f2 + δ) = 2·f1 − f2 + δ; a second-order
 * difference (f1 + δ) − (f2 + δ) = f1 − f2 does not move, a sum
 * (f1 + δ) + (f2 + δ) = f1 + f2 + 2·δ moves twice, whether f1 and f2 are two
 * tones of the wanted band, the band and a neighbour, or two neighbours; an interleaving
 * image k/M·r ∓ (f + δ) moves by ∓δ; board spurs (on the board, not through
 * the LO) and the converter's rate-tied tones (DC, k/M·r) do not move.
 * No filter, so that no level changes with δ.
 */
const scenario: Scenario = scenarioFixture({
  name: 'Heron-SM',
  wanted: { low: hz(40 * MHz), high: hz(50 * MHz), weakestLevel: db(-60), strongestLevel: db(-1) },
  guard: guardBands(hz(1 * MHz), hz(1 * MHz)),
  converter: converterFixture({
    label: 'Saltmarsh SR-12D',
    maxRate: hz(300 * MHz),
    bits: 12,
    harmonics: new Map([
      [2, db(-70)],
      [3, db(-75)],
    ]),
    rateSpurs: { dc: db(-80), halfRate: db(-90), quarterRate: db(-95) },
    interleave: { ways: 2, offsetSpur: db(-85), imageLevel: db(-70) },
  }),
  harmonicOrder: 4,
  boardSpurs: [{ label: 'REF 10M', low: hz(10 * MHz), high: hz(10 * MHz), level: db(-30), coupling: 'after-filter', harmonics: 2 }],
  neighbours: [
    { label: 'ADJ-UP', low: hz(120 * MHz), high: hz(130 * MHz), level: db(10) },
    { label: 'ADJ-LO', low: hz(15 * MHz), high: hz(20 * MHz), level: db(-20) },
  ],
  requirements: { margin: hz(0.5 * MHz), rejection: db(40), tolerancePpm: ppm(20) },
  clocks: [],
  ifShift: { low: hz(-5 * MHz), high: hz(5 * MHz) },
});

// [label, shiftMultiple], from the algebra above (a product written the other way round, ADJ-UP − 2·wanted, moves by 1 − 2 = −1).
const expected: Array<[string, number]> = [
  ['REF 10M', 0],
  ['REF 10M H2', 0],
  ['ADJ-UP', 1],
  ['ADJ-LO', 1],
  ['H2 wanted', 2],
  ['H3 wanted', 3],
  ['H4 wanted', 4],
  ['ADJ-UP H2', 2],
  ['ADJ-UP H3', 3],
  ['IM3 2·ADJ-UP−ADJ-LO', 1],
  ['IM3 ADJ-UP−2·ADJ-LO', -1],
  ['IM3 ADJ-UP−2·wanted', -1],
  ['IM3 2·ADJ-UP−wanted', 1],
  ['IM3 wanted+ADJ-UP−ADJ-UP', 1],
  ['IM2 wanted difference', 0],
  ['IM2 ADJ-UP−wanted', 0],
  ['IM2 wanted+ADJ-UP', 2],
  ['IM2 ADJ-UP−ADJ-LO', 0],
  ['IM2 ADJ-UP+ADJ-LO', 2],
  ['IM2 ADJ-UP+REF 10M', 1],
  ['IM2 ADJ-UP−REF 10M', 1],
  ['DC', 0],
  ['rate/2', 0],
  ['rate/4', 0],
  ['IL offset 1/2', 0],
  ['IL image 1/2−', -1],
  ['IL image 1/2+', 1],
  ['IL image 1/2− ADJ-UP', -1],
  ['IL image 1/2+ ADJ-UP', 1],
];

/** The scenario with the IF moved by δ, written out here (the wanted band and the neighbours move). */
function movedBy(shift: number): Scenario {
  return {
    ...scenario,
    wanted: { ...scenario.wanted, low: hz(scenario.wanted.low + shift), high: hz(scenario.wanted.high + shift) },
    neighbours: scenario.neighbours.map((n) => ({ ...n, low: hz(n.low + shift), high: hz(n.high + shift) })),
  };
}

describe('shiftMultiple: how each interferer moves with the IF', () => {
  const derived = deriveInterferers(scenario);

  it('lists each of these interferers', () => {
    expect(derived.map((i) => i.label)).toEqual(expect.arrayContaining(expected.map((e) => e[0])));
  });

  it.each(expected)('%s moves %d times the shift', (label, multiple) => {
    expect(derived.find((i) => i.label === label)!.shiftMultiple).toBe(multiple);
  });

  it('deriving the moved scenario moves every extent by shiftMultiple·δ and leaves the rate multiples and levels alone (fast-check)', () => {
    fc.assert(
      fc.property(fc.double({ min: -5 * MHz, max: 5 * MHz, noNaN: true }), (shift) => {
        const moved = deriveInterferers(movedBy(shift));
        expect(moved.map((i) => i.label)).toEqual(derived.map((i) => i.label));
        moved.forEach((m, index) => {
          const at0 = derived[index]!;
          expect(m.shiftMultiple).toBe(at0.shiftMultiple);
          expect(m.rateMultiple).toBe(at0.rateMultiple);
          // Sums of a few terms of up to 500 MHz: a few ulps (1e-7 Hz each) of rounding.
          expect(Math.abs(m.low - (at0.low + at0.shiftMultiple * shift))).toBeLessThan(1e-6);
          expect(Math.abs(m.high - (at0.high + at0.shiftMultiple * shift))).toBeLessThan(1e-6);
          expect(m.level).toBe(at0.level);
        });
      }),
      { numRuns: 200, seed: 404 },
    );
  });
});
