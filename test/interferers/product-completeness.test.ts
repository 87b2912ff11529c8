import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { db, hz } from '../../src/units/quantities.js';
import { deriveInterfererList } from '../../src/interferers/derive-interferers.js';
import type { Scenario } from '../../src/scenario/scenario.js';
import { converterFixture, scenarioFixture } from '../helpers/scenario-fixture.js';
import { bruteProducts, fallsOnWanted, productKey, type BruteSignal } from '../helpers/brute-force-products.js';

/**
 * The pruned generator against the brute-force enumerator of
 * test/helpers/brute-force-products.ts (multinomial expansion; common
 * practice, no source), on random scenarios (fast-check): every product the
 * brute force puts above the threshold is listed, with the same extent and
 * level; nothing else is listed; the pruned count and the strongest pruned
 * level are those of the brute force's products at or below the threshold.
 */

const MHZ = 1e6;

const signalArbitrary = fc.record({
  centre: fc.integer({ min: 1, max: 400 }),
  width: fc.oneof(fc.constant(0), fc.integer({ min: 1, max: 20 })),
  level: fc.integer({ min: -90, max: 0 }),
});

const scenarioArbitrary = fc.record({
  neighbours: fc.array(signalArbitrary, { maxLength: 4 }),
  spurs: fc.array(
    fc.record({
      centre: fc.integer({ min: 1, max: 100 }),
      level: fc.integer({ min: -90, max: -20 }),
      harmonics: fc.integer({ min: 1, max: 2 }),
    }),
    { maxLength: 2 },
  ),
  maxOrder: fc.integer({ min: 2, max: 4 }),
  extraHarmonics: fc.integer({ min: 0, max: 2 }),
  hd: fc.array(fc.integer({ min: -100, max: -50 }), { minLength: 6, maxLength: 6 }),
  weakest: fc.integer({ min: -90, max: -20 }),
  rejection: fc.integer({ min: 0, max: 80 }),
});

describe('the pruned generator lists every product above the threshold (brute force, random scenarios)', () => {
  it('same products, extents and levels; pruned count and strongest pruned level', () => {
    let listed = 0;
    let pruned = 0;
    fc.assert(
      fc.property(scenarioArbitrary, (p) => {
        const harmonics = new Map(p.hd.map((v, i) => [i + 2, db(v)] as const));
        const scenario: Scenario = scenarioFixture({
          wanted: { low: hz(65 * MHZ), high: hz(75 * MHZ), weakestLevel: db(p.weakest), strongestLevel: db(-1) },
          converter: converterFixture({ harmonics }),
          neighbours: p.neighbours.map((n, i) => ({
            label: `N${i}`,
            low: hz((n.centre - n.width / 2) * MHZ),
            high: hz((n.centre + n.width / 2) * MHZ),
            level: db(n.level),
          })),
          boardSpurs: p.spurs.map((s, i) => ({
            label: `S${i}`,
            low: hz(s.centre * MHZ),
            high: hz(s.centre * MHZ),
            level: db(s.level),
            coupling: 'after-filter' as const,
            harmonics: s.harmonics,
          })),
          maxOrder: p.maxOrder,
          harmonicOrder: Math.max(2, p.maxOrder + p.extraHarmonics),
          requirements: { ...scenarioFixture().requirements, rejection: db(p.rejection) },
        });
        const threshold = p.weakest - p.rejection;
        // The signals, in the generator's order: wanted, neighbours, each spur's harmonics (1/h roll-off, no filter).
        const signals: BruteSignal[] = [
          { low: 65 * MHZ, high: 75 * MHZ, amplitude: 10 ** (-1 / 20), wanted: true },
          ...scenario.neighbours.map((n) => ({ low: n.low, high: n.high, amplitude: 10 ** (n.level / 20), wanted: false })),
          ...p.spurs.flatMap((s) =>
            Array.from({ length: s.harmonics }, (_, k) => ({
              low: (k + 1) * s.centre * MHZ,
              high: (k + 1) * s.centre * MHZ,
              amplitude: 10 ** (s.level / 20) / (k + 1),
              wanted: false,
            })),
          ),
        ];
        const slot = (term: { signal: string; index: number; harmonic: number }) => {
          if (term.signal === 'wanted') return 0;
          if (term.signal === 'neighbour') return 1 + term.index;
          return 1 + scenario.neighbours.length + p.spurs.slice(0, term.index).reduce((sum, s) => sum + s.harmonics, 0) + term.harmonic - 1;
        };
        const brute = bruteProducts(signals, harmonics, 10 ** (-1 / 20), p.maxOrder, scenario.harmonicOrder);
        const above = brute.filter((b) => b.level > threshold && !fallsOnWanted(b, signals));
        const below = brute.filter((b) => b.level <= threshold);

        const derived = deriveInterfererList(scenario);
        const products = derived.interferers.filter((i) => i.kind === 'harmonic' || i.kind === 'intermod');
        const byKey = new Map(
          products.map((i) => {
            const picks: Array<[number, number]> = signals.map(() => [0, 0]);
            for (const t of i.mixing!) picks[slot(t)] = [t.plus, t.minus];
            return [productKey(picks), i] as const;
          }),
        );
        expect(byKey.size).toBe(products.length);
        expect(products.length).toBe(above.length);
        for (const b of above) {
          const found = byKey.get(productKey(b.picks));
          expect(found, `product ${productKey(b.picks)} at ${b.level} dBFS missing`).toBeDefined();
          expect(found!.level).toBeCloseTo(b.level, 6);
          expect(found!.order).toBe(b.order);
          // The same frequencies, up to the sign of the whole product.
          const same =
            Math.abs(found!.low - b.low) + Math.abs(found!.high - b.high) < 1e-3 ||
            Math.abs(found!.low + b.high) + Math.abs(found!.high + b.low) < 1e-3;
          expect(same, `${found!.label}: [${found!.low}, ${found!.high}] vs [${b.low}, ${b.high}]`).toBe(true);
        }
        expect(derived.summary.pruned).toBe(below.length);
        const strongest = below.length === 0 ? null : Math.max(...below.map((b) => b.level));
        if (strongest === null) expect(derived.summary.strongestPruned).toBeNull();
        else expect(derived.summary.strongestPruned!).toBeCloseTo(strongest, 6);
        listed += products.length;
        pruned += below.length;
      }),
      { numRuns: 150, seed: 8128 },
    );
    console.info(`product completeness: ${listed} listed, ${pruned} pruned across the runs`);
    expect(listed).toBeGreaterThan(500);
    expect(pruned).toBeGreaterThan(500);
  }, 30_000);
});
