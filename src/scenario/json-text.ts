import { ScenarioError } from './scenario-issue.js';
import { strictJsonProblems } from './strict-json.js';

/** Where and why a JSON text stops being JSON (RFC 8259 grammar). */
export interface JsonSyntaxProblem {
  /** 1-based line and column (in characters) of the first offending character, or of the end. */
  readonly line: number;
  readonly column: number;
  readonly expected: string;
  /** The offending character, JSON-quoted, or `the end of the text`. */
  readonly received: string;
}

/**
 * Parses a scenario file's text as strict JSON, skipping a leading byte-order
 * mark: besides the grammar, no key twice in an object, no `__proto__` or
 * `constructor` key, no number a double cannot hold (see
 * strictJsonProblems).
 *
 * @param text the file's text
 * @param file the file's name, for the error
 * @returns the parsed value
 * @throws ScenarioError with one `syntax` issue whose path is `line:column`,
 *   or with every strictness issue, each at its document path and position
 * @example parseJsonText('{"name": "Heron"}', 'heron.json') // { name: 'Heron' }
 */
export function parseJsonText(text: string, file: string): unknown {
  const body = text.startsWith('\uFEFF') ? text.slice(1) : text;
  let value: unknown;
  try {
    value = JSON.parse(body) as unknown;
  } catch (error) {
    const problem = jsonSyntaxProblem(body) ?? {
      line: 1,
      column: 1,
      expected: 'valid JSON',
      received: error instanceof Error ? error.message : String(error),
    };
    throw new ScenarioError([
      { kind: 'syntax', file, path: `${problem.line}:${problem.column}`, expected: problem.expected, received: problem.received },
    ]);
  }
  const problems = strictJsonProblems(body, file);
  if (problems.length > 0) throw new ScenarioError(problems);
  return value;
}

type Expecting = 'value' | 'value-or-close' | 'key' | 'key-or-close' | 'colon' | 'comma-or-close' | 'end';

const NUMBER = /-?(?:0|[1-9]\d*)(?:\.\d+)?(?:[eE][+-]?\d+)?/y;
const LITERALS = ['true', 'false', 'null'];

/**
 * Finds the first place a text breaks the JSON grammar (RFC 8259), because
 * the engine's own message gives no position for some errors (Node 20:
 * `Unexpected end of JSON input`). Iterative, so deep nesting cannot
 * overflow the stack.
 *
 * @param text the text
 * @returns the problem, or null when the text is valid JSON
 * @example jsonSyntaxProblem('{"a": 1,}') // { line: 1, column: 9, expected: 'a key in double quotes', received: '"}"' }
 */
export function jsonSyntaxProblem(text: string): JsonSyntaxProblem | null {
  const open: string[] = [];
  let expecting: Expecting = 'value';
  let at = 0;
  const fail = (expected: string): JsonSyntaxProblem => problemAt(text, at, expected);
  const afterValue = (): Expecting => (open.length === 0 ? 'end' : 'comma-or-close');
  for (;;) {
    at = skipSpace(text, at);
    const char = text[at];
    if (char === undefined) return expecting === 'end' ? null : fail(wordsFor(expecting, open.at(-1)));
    switch (expecting) {
      case 'end':
        return fail('the end of the text');
      case 'colon':
        if (char !== ':') return fail("':' after the key");
        at += 1;
        expecting = 'value';
        break;
      case 'comma-or-close': {
        const close = open.at(-1) === '[' ? ']' : '}';
        if (char === ',') {
          expecting = close === ']' ? 'value' : 'key';
          at += 1;
        } else if (char === close) {
          open.pop();
          at += 1;
          expecting = afterValue();
        } else return fail(wordsFor(expecting, open.at(-1)));
        break;
      }
      case 'key':
      case 'key-or-close': {
        if (expecting === 'key-or-close' && char === '}') {
          open.pop();
          at += 1;
          expecting = afterValue();
          break;
        }
        if (char !== '"') return fail('a key in double quotes');
        const end = stringEnd(text, at);
        if (typeof end !== 'number') return end;
        at = end;
        expecting = 'colon';
        break;
      }
      case 'value':
      case 'value-or-close': {
        if (expecting === 'value-or-close' && char === ']') {
          open.pop();
          at += 1;
          expecting = afterValue();
          break;
        }
        if (char === '[' || char === '{') {
          open.push(char);
          at += 1;
          expecting = char === '[' ? 'value-or-close' : 'key-or-close';
          break;
        }
        const end = scalarEnd(text, at);
        if (typeof end !== 'number') return end;
        at = end;
        expecting = afterValue();
        break;
      }
    }
  }
}

function wordsFor(expecting: Expecting, container: string | undefined): string {
  switch (expecting) {
    case 'value':
    case 'value-or-close':
      return 'a value';
    case 'key':
    case 'key-or-close':
      return 'a key in double quotes';
    case 'colon':
      return "':' after the key";
    case 'comma-or-close':
      return container === '[' ? "',' or ']'" : "',' or '}'";
    case 'end':
      return 'the end of the text';
  }
}

function skipSpace(text: string, from: number): number {
  let at = from;
  while (at < text.length && ' \t\n\r'.includes(text[at] ?? '')) at += 1;
  return at;
}

function scalarEnd(text: string, at: number): number | JsonSyntaxProblem {
  const char = text[at] ?? '';
  if (char === '"') return stringEnd(text, at);
  if (char === '-' || (char >= '0' && char <= '9')) {
    NUMBER.lastIndex = at;
    const match = NUMBER.exec(text);
    if (!match) return problemAt(text, at + 1, 'a digit');
    const end = at + match[0].length;
    // A number must not run on into letters or more digits (`01`, `1x`).
    if (/[0-9A-Za-z.]/.test(text[end] ?? '')) return problemAt(text, end, 'a number (digits, one point, an exponent)');
    return end;
  }
  const literal = LITERALS.find((word) => text.startsWith(word, at));
  if (literal) return at + literal.length;
  return problemAt(text, at, 'a value (text in double quotes, a number, an object, a list, true, false or null)');
}

function stringEnd(text: string, start: number): number | JsonSyntaxProblem {
  let at = start + 1;
  for (;;) {
    const char = text[at];
    if (char === undefined) return problemAt(text, at, 'a closing double quote');
    if (char === '"') return at + 1;
    if (char < ' ') return problemAt(text, at, 'no control character inside text (write \\n, \\t)');
    if (char === '\\') {
      const escaped = text[at + 1];
      if (escaped !== undefined && '"\\/bfnrt'.includes(escaped)) at += 2;
      else if (escaped === 'u' && /^[0-9A-Fa-f]{4}$/.test(text.slice(at + 2, at + 6))) at += 6;
      else return problemAt(text, at + 1, 'an escape: \\" \\\\ \\/ \\b \\f \\n \\r \\t or \\u and four hex digits');
    } else at += 1;
  }
}

function problemAt(text: string, at: number, expected: string): JsonSyntaxProblem {
  const before = text.slice(0, at);
  const lineStart = before.lastIndexOf('\n') + 1;
  const line = (before.match(/\n/g)?.length ?? 0) + 1;
  const column = [...before.slice(lineStart)].length + 1;
  const char = at < text.length ? String.fromCodePoint(text.codePointAt(at) ?? 0) : null;
  return { line, column, expected, received: char === null ? 'the end of the text' : JSON.stringify(char) };
}
