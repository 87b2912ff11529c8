import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { resolveScenario } from '../../src/scenario/resolve-scenario.js';
import { ScenarioError } from '../../src/scenario/scenario-issue.js';
import { deriveInterferers } from '../../src/interferers/derive-interferers.js';
import { memoryFiles } from './memory-files.js';

/**
 * The scenario keys of the interferer model, read from files over the demo
 * base (invented Heron data): the mixing order, intercepts by order, rate
 * spurs at fractions of the rate, the reference frequency of an image level,
 * and required margins per signal and per kind. Each read value is then seen
 * in the derived interferers.
 */
const BASE_TEXT = readFileSync(new URL('../../scenarios/heron-base.json', import.meta.url), 'utf8');
const load = (fields: Record<string, unknown>) =>
  resolveScenario('s/v.json', memoryFiles({ 's/heron-base.json': BASE_TEXT, 's/v.json': { extends: 'heron-base.json', ...fields } }));
const refused = (fields: Record<string, unknown>) => {
  try {
    load(fields);
  } catch (error) {
    expect(error).toBeInstanceOf(ScenarioError);
    return (error as ScenarioError).issues.map((issue) => `${issue.path}: ${issue.expected}`).join('\n');
  }
  throw new Error('expected a refusal');
};

describe('scenario keys of the interferer model', () => {
  it('maxOrder defaults to 3, accepts 5, refuses 1 and 8', () => {
    expect(load({}).maxOrder).toBe(3);
    expect(load({ maxOrder: 5 }).maxOrder).toBe(5);
    expect(refused({ maxOrder: 1 })).toMatch(/^maxOrder: a whole number from 2 to 7/);
    expect(refused({ maxOrder: 8 })).toMatch(/^maxOrder: a whole number from 2 to 7/);
  });

  it('intercepts by order; intercept3 is order 3, and the two may not disagree', () => {
    const scenario = load({ converter: { intercepts: { '2': 55, '3': 28 } } });
    expect([...scenario.converter.intercepts!]).toEqual([
      [2, 55],
      [3, 28],
    ]);
    expect(scenario.converter.intercept3).toBe(28);
    expect(load({ converter: { intercept3: 30 } }).converter.intercepts!.get(3)).toBe(30);
    expect(refused({ converter: { intercept3: 30, intercepts: { '3': 28 } } })).toMatch(
      /converter\.intercept3: the same value as intercepts\["3"\]/,
    );
  });

  it('rate spurs at fractions p/q of the rate become interferers at p/q·r', () => {
    const scenario = load({
      converter: {
        rateSpurs: {
          fractions: [
            { fraction: '1/3', level: -88 },
            { fraction: ' 3 / 8 ', level: -90 },
          ],
        },
      },
    });
    expect(scenario.converter.rateSpurs.fractions).toEqual([
      { numerator: 1, denominator: 3, level: -88 },
      { numerator: 3, denominator: 8, level: -90 },
    ]);
    const derived = deriveInterferers(scenario);
    expect(derived.find((i) => i.label === 'rate/3')!.rateMultiple).toBeCloseTo(1 / 3, 15);
    expect(derived.find((i) => i.label === '3·rate/8')!.rateMultiple).toBe(0.375);
    expect(refused({ converter: { rateSpurs: { fractions: [{ fraction: '1/0', level: -90 }] } } })).toMatch(/a denominator of 1 or more/);
    expect(refused({ converter: { rateSpurs: { fractions: [{ fraction: 'r/3', level: -90 }] } } })).toMatch(
      /a fraction of the rate as "p\/q"/,
    );
  });

  it('an image level quoted at a reference frequency rises 20 dB per decade for the images of each signal', () => {
    const scenario = load({ converter: { interleave: { ways: 2, offsetSpur: -90, imageLevel: -60, imageReference: '70M' } } });
    expect(scenario.converter.interleave!.imageReference).toBe(70e6);
    const image = deriveInterferers(scenario).find((i) => i.label === 'IL image 1/2+')!;
    // The wanted band 130–150 MHz at −1 dBFS: −1 − 60 + 20·log10(150/70) (its highest frequency, the worst case).
    expect(image.level).toBeCloseTo(-61 + 20 * Math.log10(150 / 70), 9);
  });

  it('a neighbour or board spur may carry its own margin, and a kind its own, over the scenario margin', () => {
    const base = JSON.parse(BASE_TEXT) as { neighbours: Array<Record<string, unknown>> };
    const neighbours = base.neighbours.map((n, i) => (i === 0 ? { ...n, margin: 0 } : n));
    const scenario = load({ neighbours, requirements: { kindMargins: { harmonic: '3M', converter: '250k' } } });
    const derived = deriveInterferers(scenario);
    const first = derived.find((i) => i.label === (base.neighbours[0]!.label as string))!;
    expect(first.requiredMargin).toBe(0);
    expect(derived.find((i) => i.label === 'H2 wanted')!.requiredMargin).toBe(3e6);
    expect(derived.find((i) => i.label === 'DC')!.requiredMargin).toBe(250e3);
    // Everything else keeps the scenario's 1 MHz.
    expect(derived.find((i) => i.label === (base.neighbours[1]!.label as string))!.requiredMargin).toBe(1e6);
  });
});
