import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { jsonSyntaxProblem, parseJsonText } from '../../src/scenario/json-text.js';
import { ScenarioError } from '../../src/scenario/scenario-issue.js';

/**
 * The syntax locator against the grammar of RFC 8259 (The JavaScript Object
 * Notation Data Interchange Format) and against the engine's own JSON.parse,
 * the reference implementation here: on any text, the locator finds a
 * problem exactly when JSON.parse throws.
 */
describe('jsonSyntaxProblem', () => {
  it.each([
    ['{"a": 1,}', 1, 9, 'a key in double quotes', '"}"'],
    ['[1, 2', 1, 6, "',' or ']'", 'the end of the text'],
    ['{\n  "a": 1\n  "b": 2\n}', 3, 3, "',' or '}'", '"\\""'],
    ['{"a" 1}', 1, 6, "':' after the key", '"1"'],
    ['01', 1, 2, 'a number', '"1"'],
    ['-x', 1, 2, 'a digit', '"x"'],
    ['"tab\there"', 1, 5, 'no control character', '"\\t"'],
    ['"\\q"', 1, 3, 'an escape', '"q"'],
    ["{'a': 1}", 1, 2, 'a key in double quotes', '"\'"'],
    ['{"a": tru}', 1, 7, 'a value', '"t"'],
    ['{} {}', 1, 4, 'the end of the text', '"{"'],
    ['', 1, 1, 'a value', 'the end of the text'],
    ['{"é": 1 x}', 1, 9, "',' or '}'", '"x"'],
  ])('%j: line %i, column %i', (text, line, column, expected, received) => {
    const problem = jsonSyntaxProblem(text);
    expect(problem).not.toBeNull();
    expect(problem).toMatchObject({ line, column, received });
    expect(problem!.expected).toContain(expected);
  });

  it('counts columns in characters and lines by line feeds (CRLF files too)', () => {
    expect(jsonSyntaxProblem('{\r\n  "a": 1,\r\n  }')).toMatchObject({ line: 3, column: 3 });
  });

  it('finds nothing in valid JSON, at any depth', () => {
    expect(jsonSyntaxProblem('{"a": [1, -2.5e+3, "x\\u00e9\\n", true, false, null, {}], "b": {"c": []}}')).toBeNull();
    expect(jsonSyntaxProblem('['.repeat(200_000) + ']'.repeat(200_000))).toBeNull();
    expect(jsonSyntaxProblem('['.repeat(200_000))).toMatchObject({ line: 1, column: 200_001 });
  });

  it('agrees with JSON.parse on valid documents and on random edits of them', () => {
    const edited = fc
      .tuple(
        fc.json({ maxDepth: 4 }),
        fc.nat(),
        fc.constantFrom('', ',', '}', ']', '"', ':', '{', '[', ' ', '0', '-', '.', 'e', '\\', '\n', 'x'),
        fc.boolean(),
      )
      .map(([text, at, char, remove]) => {
        const i = text.length === 0 ? 0 : at % text.length;
        return remove ? text.slice(0, i) + text.slice(i + 1) : text.slice(0, i) + char + text.slice(i);
      });
    fc.assert(
      fc.property(fc.oneof(fc.json({ maxDepth: 4 }), edited, fc.string()), (text) => {
        let parses = true;
        try {
          JSON.parse(text);
        } catch {
          parses = false;
        }
        expect(jsonSyntaxProblem(text) === null).toBe(parses);
      }),
      { numRuns: 5000 },
    );
  });
});

describe('parseJsonText', () => {
  it('skips a byte-order mark', () => {
    expect(parseJsonText('\uFEFF{"a": 1}', 'f.json')).toEqual({ a: 1 });
  });

  it('throws a syntax issue naming the file and line:column', () => {
    try {
      parseJsonText('{\n "a": }', 'f.json');
      expect.unreachable();
    } catch (error) {
      expect(error).toBeInstanceOf(ScenarioError);
      const words = 'a value (text in double quotes, a number, an object, a list, true, false or null)';
      expect((error as ScenarioError).issues).toEqual([{ kind: 'syntax', file: 'f.json', path: '2:7', expected: words, received: '"}"' }]);
      expect((error as Error).message).toBe(`f.json:2:7: JSON syntax error: expected ${words} (got "}")`);
    }
  });
});
