import { guardBands } from '../../src/math/band.js';
import { describe, expect, it } from 'vitest';
import { db, hz, ppm } from '../../src/units/quantities.js';
import type { Scenario } from '../../src/scenario/scenario.js';
import { contextFromScenario } from '../../src/solve/context-from-scenario.js';
import { evaluateRate } from '../../src/solve/evaluate-rate.js';
import { verifyCapture } from '../../src/report/verify-capture.js';
import { converterFixture, scenarioFixture } from '../helpers/scenario-fixture.js';
import { alias, passingRates } from '../capture/plan-rates.js';

/**
 * `solve` and `verify` on the same converter: a 4-way interleaved converter
 * with a stated third-order intercept, a low IF (12–16 MHz) and three close
 * tone blockers (invented Heron data). The capture computes its spectrum from
 * time samples (M cores with the mismatch that gives the stated image level,
 * the polynomial fitted to the intercept and the harmonic figures, a
 * quantiser and an FFT), independently of the folding algebra. Where the plan
 * passes, the capture must show nothing above the threshold that the plan
 * did not list ("missed by the plan") and no listed line stronger than
 * planned; where the plan is blocked by a product, the capture must show
 * that product inside the wanted image (no "agrees" over a blocking product).
 * Positions are checked against the definition of aliasing,
 * alias = |f − R·round(f/R)| (common practice, no source).
 */
const MHZ = 1e6;

function agreementScenario(imageReference: number | null): Scenario {
  return scenarioFixture({
    name: 'Heron-L4 agreement',
    wanted: { low: hz(12 * MHZ), high: hz(16 * MHZ), weakestLevel: db(-70), strongestLevel: db(-12) },
    guard: guardBands(hz(0), hz(0)),
    converter: converterFixture({
      minRate: hz(40 * MHZ),
      maxRate: hz(160 * MHZ),
      harmonics: new Map([
        [2, db(-75)],
        [3, db(-80)],
      ]),
      intercept3: db(25),
      intercepts: new Map([[3, db(25)]]),
      interleave: {
        ways: 4,
        offsetSpur: db(-90),
        imageLevel: db(-60),
        ...(imageReference === null ? {} : { imageReference: hz(imageReference) }),
      },
    }),
    harmonicOrder: 3,
    maxOrder: 3,
    neighbours: [50, 55.5, 61.2].map((f, i) => ({ label: `B${i + 1}`, low: hz(f * MHZ), high: hz(f * MHZ), level: db(-15) })),
    requirements: { margin: hz(0.5 * MHZ), rejection: db(30), tolerancePpm: ppm(20) },
    clocks: [],
  });
}

describe('verify and solve agree: interleaving, an intercept and three close blockers', () => {
  for (const [name, reference] of [
    ['gain mismatch (flat images)', null],
    ['timing skew (images quoted at 30 MHz)', 30 * MHZ],
  ] as const) {
    const scenario = agreementScenario(reference);
    const rates = passingRates(scenario);

    it(`${name}: the solver finds a rate, and lists products of every kind: third-order differences, sums and triple beats, interleaving images, second-order differences`, () => {
      expect(rates.length).toBeGreaterThan(0);
      const labels = contextFromScenario(scenario).interferers.map((i) => i.label);
      for (const label of ['IM3 2·B1−B2', 'IM3 B1+B2−B3', 'IM3 2·B1+B2', 'IL image 1/4− B1', 'IM2 B2−B1']) expect(labels).toContain(label);
    });

    for (const wantedTones of [1, 3]) {
      it(`${name}: at the solver's rate with ${wantedTones} wanted tone(s) the capture agrees, with no product missed by the plan`, () => {
        const result = verifyCapture(scenario, { rate: rates[0]!, wantedTones });
        expect(result.plan.pass).toBe(true);
        expect(result.notSimulated).toEqual([]);
        expect(result.contradictions.filter((c) => c.includes('missed by the plan'))).toEqual([]);
        expect(result.consistent, result.contradictions.join('\n')).toBe(true);
        // The blockers' images and third-order products were looked for and found where the plan says.
        const found = result.predictions.filter((p) => p.status === 'agrees');
        expect(found.some((p) => p.check.startsWith('IL image') && p.check.endsWith('B1'))).toBe(true);
        expect(found.some((p) => p.check.startsWith('IM3 ') && /B\d.*B\d/.test(p.check))).toBe(true);
        for (const p of found.filter((row) => row.width === 'tone')) expect(Math.abs(p.binError!), p.check).toBeLessThanOrEqual(1);
        // Levels the plan states exactly (a blocker's image, one blocker's product with another): within 1 dB.
        for (const p of found.filter((row) => row.basis === 'plan'))
          expect(Math.abs(p.levelError!), `${p.check}: ${p.note}`).toBeLessThanOrEqual(1);
        console.info(
          `${name}, ${wantedTones} tone(s): ${result.predictions.length} lines, ${found.length} agree, ${result.unlisted.length} unlisted peaks (none above the threshold unexplained)`,
        );
      });
    }
  }

  it('a neighbour that needs no margin (its own margin 0) 0.3 MHz beside the band: the plan passes and the capture agrees, judging its peak by its own margin', () => {
    const base = agreementScenario(null);
    const scenario: Scenario = {
      ...base,
      neighbours: [...base.neighbours, { label: 'ADJ', low: hz(16.3 * MHZ), high: hz(16.3 * MHZ), level: db(-40), margin: hz(0) }],
    };
    const rate = passingRates(scenario)[0]!;
    const result = verifyCapture(scenario, { rate, wantedTones: 1 });
    expect(result.plan.pass).toBe(true);
    const adj = result.predictions.find((p) => p.check === 'ADJ')!;
    expect(adj.status).toBe('agrees');
    // 0.3 MHz from the image: inside the scenario's 0.5 MHz, outside ADJ's own 0.
    expect(result.intrusions).toEqual([]);
    expect(result.consistent, result.contradictions.join('\n')).toBe(true);
  });

  it('at a rate the plan blocks with a triple beat of the blockers, the capture shows that product inside the wanted image, confirming the failure', () => {
    const scenario = agreementScenario(null);
    const context = contextFromScenario(scenario);
    const centre = 14 * MHZ;
    let chosen: { rate: number; label: string } | null = null;
    for (let i = 0; i <= 2000 && chosen === null; i++) {
      const rate = hz(40 * MHZ + (120 * MHZ * i) / 2000);
      const e = evaluateRate(context, rate, ppm(0));
      const limit = e.limitedBy.kind === 'interferer' ? e.limitedBy.label : '';
      if (e.pass || !e.image || !/^IM3 B\d\+B\d−B\d$/.test(limit)) continue;
      const interferer = context.interferers.find((x) => x.label === limit)!;
      const where = alias(interferer.low, rate);
      if (where > e.image.low + 0.3 * MHZ && where < e.image.high - 0.3 * MHZ && Math.abs(where - alias(centre, rate)) > 0.3 * MHZ)
        chosen = { rate, label: limit };
    }
    expect(chosen).not.toBeNull();
    const result = verifyCapture(scenario, { rate: hz(chosen!.rate), wantedTones: 1 });
    expect(result.plan.pass).toBe(false);
    const line = result.predictions.find((p) => p.check === chosen!.label && p.measured);
    expect(line, `${chosen!.label} looked for`).toBeDefined();
    expect(result.intrusions.some((u) => u.bin === line!.measured!.bin)).toBe(true);
    // The plan fails at this rate because of that very product: the capture confirms it, so the two agree.
    expect(result.contradictions.some((c) => c.includes('not clean'))).toBe(false);
    expect(result.consistent, result.contradictions.join('\n')).toBe(true);
    console.info(
      `blocked rate ${(chosen!.rate / MHZ).toFixed(6)} MHz: ${chosen!.label} measured at ${line!.measured!.level.toFixed(1)} dBFS inside the image`,
    );
  });
});
