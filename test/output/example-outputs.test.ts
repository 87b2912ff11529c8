import { mkdirSync, mkdtempSync, readFileSync, writeFileSync, existsSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { ensureBuilt, ROOT } from '../helpers/run-bin.js';
import { FILE_EXAMPLES, runExample, TEXT_EXAMPLES } from './examples.js';

/**
 * Example outputs of every writer, committed under test/output/examples/ and
 * read by people in review: the terminal tables (at the default 100
 * columns, standard output not a terminal), the CSV, the SVG pictures, the
 * HTML page. Each test runs the real bin/ifzone and compares with the
 * committed file, so a change to any writer shows up as a diff of its
 * example. IFZONE_WRITE_EXAMPLES=1 writes them afresh.
 */
const EXAMPLES = join(ROOT, 'test', 'output', 'examples');
const WRITE = process.env['IFZONE_WRITE_EXAMPLES'] === '1';
const out = mkdtempSync(join(tmpdir(), 'ifzone-examples-'));

beforeAll(() => {
  ensureBuilt();
  if (WRITE) mkdirSync(EXAMPLES, { recursive: true });
});

describe('example outputs of every writer (test/output/examples)', () => {
  for (const [name, args] of TEXT_EXAMPLES) {
    it(`${name}: ifzone ${args.join(' ')}`, () => {
      const run = runExample(args);
      expect(run.stderr).toBe('');
      if (WRITE) writeFileSync(join(EXAMPLES, name), run.stdout);
      expect(existsSync(join(EXAMPLES, name)), `${name} is committed`).toBe(true);
      expect(run.stdout).toBe(readFileSync(join(EXAMPLES, name), 'utf8'));
    });
  }
  for (const [name, args] of FILE_EXAMPLES) {
    it(`${name}: ifzone ${args.join(' ')}`, () => {
      const file = join(out, name);
      const run = runExample(args, file);
      expect(run.stderr).toBe('');
      const written = readFileSync(file, 'utf8');
      if (WRITE) writeFileSync(join(EXAMPLES, name), written);
      expect(written).toBe(readFileSync(join(EXAMPLES, name), 'utf8'));
    });
  }
});
