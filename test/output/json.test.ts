import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { toJson, writeJson } from '../../src/output/json.js';

/**
 * The streamed JSON writer against the engine's own JSON.stringify (ECMA-262,
 * JSON.stringify with a replacer and a two-space indent): the same text for
 * any JSON-shaped value, Infinity written as null.
 */
const reference = (value: unknown) => JSON.stringify(value, (_k, v: unknown) => (v === Infinity ? null : v), 2) + '\n';

describe('toJson', () => {
  it('writes Infinity as null (the doc example)', () => {
    expect(toJson({ maxRate: Infinity })).toBe('{\n  "maxRate": null\n}\n');
  });

  it('writes what JSON.stringify writes, for nested values with infinities, NaN, undefined and toJSON', () => {
    const leaf = fc.oneof(
      fc.double(),
      fc.constantFrom(Infinity, -Infinity, NaN, undefined, null, true, false),
      fc.string(),
      fc.date({ noInvalidDate: true }),
    );
    // A report is an object or an array at the top (JSON.stringify of a bare undefined is not JSON).
    const { array, object } = fc.letrec((tie) => ({
      value: fc.oneof({ depthSize: 'small' }, leaf, tie('array'), tie('object')),
      array: fc.array(tie('value'), { maxLength: 5 }),
      object: fc.dictionary(fc.string({ maxLength: 6 }), tie('value'), { maxKeys: 5 }),
    }));
    fc.assert(
      fc.property(fc.oneof(array, object), (v) => {
        expect(toJson(v)).toBe(reference(v));
      }),
      { numRuns: 500 },
    );
  });
});

describe('writeJson', () => {
  it('sends a large report in pieces of bounded size that join to the whole text', () => {
    const report = {
      candidates: Array.from({ length: 2000 }, (_, i) => ({
        rate: 1e9 + i,
        checks: [{ label: `check ${i}`, margin: i === 7 ? Infinity : i }],
      })),
    };
    const pieces: string[] = [];
    writeJson(report, (text) => pieces.push(text));
    expect(pieces.join('')).toBe(reference(report));
    expect(pieces.length).toBeGreaterThan(3);
    // Each piece is gathered up to 64 k characters, plus at most one small entry.
    expect(Math.max(...pieces.map((p) => p.length))).toBeLessThan((1 << 16) + 1000);
  });
});
