import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseJsonText } from '../../src/scenario/json-text.js';
import { numberRangeProblem } from '../../src/scenario/strict-json.js';
import { ScenarioError } from '../../src/scenario/scenario-issue.js';
import { ifzone, refusalLine, scratchDirectory, writeInto } from '../helpers/run-in-process.js';

/**
 * Strict JSON for scenario files. RFC 8259 §4: names within an object SHOULD
 * be unique, and implementations differ when they are not (JSON.parse keeps
 * the last); §6: numbers beyond the implementation's range are not
 * interoperable (IEEE 754 binary64: largest finite 1.7976931348623157e308,
 * least normal 2.2250738585072014e-308). Each case below was accepted
 * silently before: the last duplicate won, `1e999` became null, `1e-400` 0.
 */
const dir = scratchDirectory('strict-json');
const base = new URL('../../scenarios/heron-base.json', import.meta.url).pathname;
const baseText = readFileSync(base, 'utf8');

function issuesOf(text: string): ScenarioError['issues'] {
  try {
    parseJsonText(text, 'f.json');
  } catch (error) {
    if (error instanceof ScenarioError) return error.issues;
    throw error;
  }
  throw new Error('accepted');
}

describe('parseJsonText: strict JSON', () => {
  it('refuses a repeated key, giving both positions', () => {
    expect(issuesOf('{\n  "a": 1,\n  "a": 2\n}')).toEqual([
      { kind: 'invalid', file: 'f.json', path: 'a', expected: 'each key once in an object', received: '"a" again at 3:3, first at 2:3' },
    ]);
  });

  it('tells keys apart by their decoded text, and keys of different objects apart', () => {
    expect(issuesOf('{"é": 1, "\\u00e9": 2}')[0]!.path).toBe('["é"]');
    expect(parseJsonText('{"a": {"x": 1}, "b": {"x": 1}, "c": [{"x": 1}, {"x": 2}]}', 'f.json')).toBeTruthy();
  });

  it.each(['__proto__', 'constructor'])('refuses %s as a key, at any depth', (key) => {
    expect(issuesOf(`{"converter": {"${key}": {"bits": 99}}}`)[0]).toMatchObject({
      path: `converter.${key}`,
      received: `"${key}" at 1:16`,
    });
  });

  it.each([
    ['1e999', 'overflows'],
    ['-1e309', 'overflows'],
    ['1e-400', 'underflows'],
    ['4e-320', 'underflows'],
  ])('refuses %s (%s) at its path', (number, why) => {
    const [issue] = issuesOf(`{"converter": {"minRate": ${number}}}`);
    expect(issue!.path).toBe('converter.minRate');
    expect(issue!.expected).toContain(why);
    expect(issue!.received).toBe(`${number} at 1:27`);
  });

  it('keeps what a double holds: zero in any spelling, the extremes', () => {
    for (const number of ['0', '-0', '0e-999', '0.000e5000', '1.7976931348623157e308', '2.2250738585072014e-308', '-5e-300'])
      expect(numberRangeProblem(number)).toBeNull();
  });

  it('counts columns in characters across a line with astral characters', () => {
    expect(issuesOf('{"😀": 1, "a": 1, "a": 2}')[0]!.received).toBe('"a" again at 1:18, first at 1:10');
  });
});

describe('strict JSON through ifzone solve', () => {
  it('refuses two extends in one file, rather than planning the second silently', async () => {
    const other = writeInto(dir, 'other.json', JSON.parse(baseText));
    const file = writeInto(dir, 'twice.json', `{\n  "extends": ${JSON.stringify(base)},\n  "extends": ${JSON.stringify(other)}\n}\n`);
    const run = await ifzone('solve', file);
    expect(run.code).toBe(2);
    expect(run.out).toBe('');
    expect(refusalLine(run)).toBe(
      `ifzone: ${file}: extends: expected each key once in an object (got "extends" again at 3:3, first at 2:3)`,
    );
  });

  it('refuses 1e999 as an overflow at its line and column, not as "(got null)"', async () => {
    const file = writeInto(dir, 'huge.json', baseText.replace(/"minRate": "[^"]*"/, '"minRate": 1e999'));
    const line = refusalLine(await ifzone('solve', file));
    expect(line).toContain('converter.minRate: expected a number a double can hold');
    expect(line).not.toContain('null');
  });

  it('shows the extends chain when a base file has a syntax error', async () => {
    const broken = writeInto(dir, 'broken-base.json', '{\n  "name": "x",\n}\n');
    const file = writeInto(dir, 'variant.json', { extends: 'broken-base.json', name: 'v' });
    expect(refusalLine(await ifzone('solve', file))).toBe(
      `ifzone: ${broken}:3:1: JSON syntax error: expected a key in double quotes (got "}"); extends chain: ${file} → ${broken}`,
    );
  });
});
