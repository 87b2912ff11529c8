import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { runCli } from '../../src/cli/main.js';

/**
 * Scenario refusals through the CLI (in process): `ifzone solve` reads the
 * file with readScenarioFile, and a ScenarioError, being an InputError,
 * exits 2 with one `ifzone: ` line naming the file and the path.
 */
const dir = mkdtempSync(join(tmpdir(), 'ifzone-scenario-'));
const base = new URL('../../scenarios/heron-base.json', import.meta.url).pathname;

async function solve(file: string) {
  let out = '';
  let err = '';
  const code = await runCli(['solve', file], { out: (t) => (out += t), err: (t) => (err += t) });
  return { code, out, err };
}

function write(name: string, content: unknown): string {
  const path = join(dir, name);
  writeFileSync(path, typeof content === 'string' ? content : JSON.stringify(content, null, 2));
  return path;
}

describe('scenario refusals through ifzone solve', () => {
  it.each([
    [
      'an unknown key',
      () => write('typo.json', { extends: base, converter: { bitz: 12 } }),
      'converter.bitz: unknown key; did you mean "bits"?',
    ],
    ['a syntax error', () => write('broken.json', '{\n  "name": "x"\n  "wanted": {}\n}'), 'broken.json:3:3: JSON syntax error'],
    ['a missing base', () => write('orphan.json', { extends: 'no-such-base.json' }), 'no-such-base.json: no such file'],
    ['a missing file', () => join(dir, 'absent.json'), 'absent.json: expected a scenario file that can be read (got no such file)'],
  ])('%s exits 2 with one ifzone: line', async (_name, make, words) => {
    const run = await solve(make());
    expect(run.code).toBe(2);
    expect(run.out).toBe('');
    const lines = run.err.split('\n').filter((line) => line !== '');
    expect(lines).toHaveLength(1);
    expect(lines[0]!.startsWith('ifzone: ')).toBe(true);
    expect(lines[0]).toContain(words);
  });
});
