/// <reference types="vite/client" />
import { readFileSync } from 'node:fs';
import { relative } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { exampleScope } from './example-scope.js';
import { matchesWritten, parseWritten, splitExample } from './written-value.js';

/**
 * Every `@example` of a doc comment under src/ is run (date-fns style): the
 * code before ` // ` is evaluated with the exports of its own module, the
 * public API and a few named fixtures in scope (test/docs/example-scope.ts),
 * and its value must match the result written after ` // ` (a literal:
 * number, string, boolean, null, array, object; numbers to the digits
 * written, objects on the keys written; an explanation in parentheses may
 * follow), or throw when the result is written `throws`.
 */

const modules = import.meta.glob<Record<string, unknown>>(['../../src/**/*.ts', '!../../src/index.ts']);
const srcRoot = fileURLToPath(new URL('../../src/', import.meta.url));

interface Example {
  readonly file: string;
  readonly line: number;
  readonly text: string;
}

/** The @example lines of a file, each joined with a next line that holds only its `// result`. */
function examplesOf(path: string): Example[] {
  const lines = readFileSync(fileURLToPath(new URL(path, import.meta.url)), 'utf8').split('\n');
  const found: Example[] = [];
  lines.forEach((line, index) => {
    const match = /^\s*\*\s*@example\s+(.*)$/.exec(line);
    if (!match) return;
    const next = /^\s*\*\s+(\/\/ .*)$/.exec(lines[index + 1] ?? '');
    found.push({ file: path, line: index + 1, text: next && !match[1]!.includes(' // ') ? `${match[1]} ${next[1]}` : match[1]! });
  });
  return found;
}

const examples = Object.keys(modules).flatMap(examplesOf);
const scope = await exampleScope();
/** Every module's exports, so that an example may call a helper of another module (its own module's names win). */
const everyExport: Record<string, unknown> = {};
for (const load of Object.values(modules)) Object.assign(everyExport, await load());

describe('doc examples under src/', () => {
  it('finds them (a reader that finds none would pass anything)', () => {
    expect(examples.length).toBeGreaterThan(150);
  });

  for (const example of examples) {
    const where = `${relative(srcRoot, fileURLToPath(new URL(example.file, import.meta.url)))}:${example.line}`;
    it(`${where}: ${example.text}`, async () => {
      const parts = splitExample(example.text);
      expect(parts, 'an example is written `call // result`').not.toBeNull();
      const own = await modules[example.file]!();
      const names = { ...everyExport, ...scope, ...own };
      const run = () => evaluate(parts!.code, names);
      if (parts!.result.startsWith('throws')) {
        expect(run).toThrow();
        return;
      }
      const written = parseWritten(parts!.result);
      const actual = await run();
      const verdict = matchesWritten(actual, written);
      expect(verdict, `${parts!.code} gave ${JSON.stringify(actual, (_, v) => (v instanceof Float64Array ? [...v] : v))}`).toBe(true);
    });
  }
});

/**
 * Evaluates an expression, or statements `a; b; expression` whose last is the
 * result, with the names in scope. TypeScript's non-null `x!` is read as `x`.
 */
function evaluate(typed: string, names: Record<string, unknown>): unknown {
  const code = typed.replace(/([\w)\]])!(?=[.[),\s]|$)/g, '$1');
  const keys = Object.keys(names).filter((k) => /^[A-Za-z_$][\w$]*$/.test(k));
  const run = (body: string) => new Function(...keys, body)(...keys.map((k) => names[k]));
  const statements = /^const \w+ = [^;]*;\s/.test(code) ? code.split(/;\s+/) : [code];
  const last = statements.pop()!;
  return run(`${statements.map((s) => `${s};`).join('\n')}\nreturn (${last});`);
}
