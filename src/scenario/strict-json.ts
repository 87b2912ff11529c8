import { pathText, type DocumentPath } from './document-path.js';
import type { ScenarioIssue } from './scenario-issue.js';

/** Keys that name an object's machinery in JavaScript rather than data: refused, so no key can reach a prototype. */
export const FORBIDDEN_KEYS: ReadonlySet<string> = new Set(['__proto__', 'constructor']);

/** Smallest positive normal double: a non-zero number written below it loses digits or becomes 0. */
const LEAST_NORMAL = 2.2250738585072014e-308;

interface Container {
  readonly kind: '{' | '[';
  readonly path: DocumentPath;
  /** For an object: each key and where it was first written. */
  readonly keys: Map<string, string>;
  /** The key (object) or index (list) of the value being read. */
  step: string | number;
}

/**
 * What RFC 8259 leaves open and a scenario file must not do: the same key
 * twice in one object (JSON.parse keeps the last silently; RFC 8259 §4 says
 * names SHOULD be unique), a key that names JavaScript machinery
 * (`__proto__`, `constructor`), and a number a double cannot
 * hold (beyond ±1.8e308, or non-zero below 2.2e-308, which would read as ∞
 * or as 0). Iterative, so deep nesting cannot overflow the stack.
 *
 * @param text a text JSON.parse accepts (the caller has checked)
 * @param file the file's name, for the issues
 * @returns every problem, in text order, each at its document path with the
 *   line:column where it was written (both places for a repeated key)
 * @example strictJsonProblems('{"a": 1, "a": 2}', 'f.json')[0].received // '"a" again at 1:10, first at 1:2'
 */
export function strictJsonProblems(text: string, file: string): ScenarioIssue[] {
  const issues: ScenarioIssue[] = [];
  const open: Container[] = [];
  const position = lineColumn(text);
  const pathHere = (): DocumentPath => {
    const top = open.at(-1);
    return top ? [...top.path, top.step] : [];
  };
  let expectKey = false;
  for (let at = 0; at < text.length;) {
    const char = text[at]!;
    if (char === '{' || char === '[') {
      open.push({ kind: char, path: pathHere(), keys: new Map(), step: 0 });
      expectKey = char === '{';
      at += 1;
    } else if (char === '}' || char === ']') {
      open.pop();
      at += 1;
    } else if (char === ',') {
      const top = open.at(-1);
      if (top?.kind === '[') top.step = (top.step as number) + 1;
      expectKey = top?.kind === '{';
      at += 1;
    } else if (char === '"') {
      const end = stringEnd(text, at);
      if (expectKey) {
        const top = open.at(-1)!;
        const key = JSON.parse(text.slice(at, end)) as string;
        const where = position(at);
        top.step = key;
        const first = top.keys.get(key);
        if (first !== undefined) {
          issues.push(
            problem(file, [...top.path, key], 'each key once in an object', `${JSON.stringify(key)} again at ${where}, first at ${first}`),
          );
        } else top.keys.set(key, where);
        if (FORBIDDEN_KEYS.has(key)) {
          issues.push(problem(file, [...top.path, key], 'a key other than __proto__ or constructor', `${JSON.stringify(key)} at ${where}`));
        }
        expectKey = false;
      }
      at = end;
    } else if (char === '-' || (char >= '0' && char <= '9')) {
      let end = at + 1;
      while (end < text.length && /[0-9eE+\-.]/.test(text[end]!)) end += 1;
      const written = text.slice(at, end);
      const range = numberRangeProblem(written);
      if (range) issues.push(problem(file, pathHere(), range, `${written} at ${position(at)}`));
      at = end;
    } else at += 1;
  }
  return issues;
}

/**
 * Why a JSON number cannot be held as written, or null when it can.
 *
 * @param written the number's text, valid JSON
 * @returns the expected words, or null
 * @example numberRangeProblem('1e999') // 'a number a double can hold (at most ±1.8e308; this one overflows)'
 */
export function numberRangeProblem(written: string): string | null {
  const value = Number(written);
  if (!Number.isFinite(value)) return 'a number a double can hold (at most ±1.8e308; this one overflows)';
  const mantissa = written.split(/[eE]/)[0] ?? '';
  if (/[1-9]/.test(mantissa) && Math.abs(value) < LEAST_NORMAL) {
    return 'a number a double can hold (zero, or at least 2.2e-308 in size; this one underflows)';
  }
  return null;
}

function problem(file: string, path: DocumentPath, expected: string, received: string): ScenarioIssue {
  return { kind: 'invalid', file, path: pathText(path), expected, received };
}

/** The index just past the string that opens at `start` (the text is valid JSON). */
function stringEnd(text: string, start: number): number {
  let at = start + 1;
  while (text[at] !== '"') at += text[at] === '\\' ? 2 : 1;
  return at + 1;
}

/** A reader of 1-based line:column (columns in characters) for offsets read in increasing order; linear in the text. */
function lineColumn(text: string): (at: number) => string {
  let line = 1;
  let column = 1;
  let scanned = 0;
  return (at) => {
    for (; scanned < at; scanned++) {
      const code = text.charCodeAt(scanned);
      if (code === 10) {
        line += 1;
        column = 1;
      } else if (code < 0xdc00 || code > 0xdfff) column += 1; // the second half of a surrogate pair is the same character
    }
    return `${line}:${column}`;
  };
}
