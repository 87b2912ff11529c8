import { spawnSync } from 'node:child_process';
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { ensureBuilt, ROOT, runBin } from '../helpers/run-bin.js';
import { TEXT_EXAMPLES } from './examples.js';

/** Characters as a terminal shows them: one column per code point (none of our characters is double-width). */
const columns = (line: string) => [...line].length;
const widest = (text: string) => Math.max(0, ...text.split('\n').map(columns));

beforeAll(() => ensureBuilt());

// Common practice (no source): a report read in a terminal or pasted into a note keeps to the page's width.
describe('tables fit 100 columns when standard output is not a terminal', () => {
  for (const [name, args] of TEXT_EXAMPLES.filter(([n]) => n.endsWith('.txt'))) {
    it(`no line of ${name} is longer than 100 characters`, () => {
      const run = runBin(...args);
      expect(run.stderr).toBe('');
      const long = run.stdout.split('\n').filter((l) => columns(l) > 100);
      expect(long, long.join('\n')).toEqual([]);
    });
  }

  it("report's message fits too", () => {
    const out = join(mkdtempSync(join(tmpdir(), 'ifzone-width-')), 'family.html');
    const run = runBin('report', ...['base', 'lowif', 'narrow', 'wide'].map((n) => `scenarios/heron-${n}.json`), '--html', out);
    expect(run.status).toBe(0);
    expect(widest(run.stdout)).toBeLessThanOrEqual(100);
  });

  it('--width N lays out for N columns, --wide puts every column in one table', () => {
    const args = ['solve', 'scenarios/heron-base.json'];
    expect(widest(runBin(...args, '--width', '72').stdout)).toBeLessThanOrEqual(72);
    const wide = runBin(...args, '--wide').stdout;
    expect(widest(wide)).toBeGreaterThan(100);
    // One block: the candidate table's header carries the deciding and the detail columns together.
    expect(wide).toMatch(/^#\s+candidate\s+rate\s+zone\s+worst margin\s+limited by\s+verdict\s+tolerance\s+NCO/m);
    expect(widest(runBin('windows', '--low', '130M', '--high', '150M', '--columns', '60').stdout)).toBeLessThanOrEqual(60);
  });

  it('refuses a width that is not a whole number from 40 to 1000, and --wide with --width', () => {
    for (const bad of [
      ['--width', '20'],
      ['--width', 'wide'],
      ['--wide', '--width', '80'],
    ]) {
      const run = runBin('solve', 'scenarios/heron-base.json', ...bad);
      expect(run.status).toBe(2);
      expect(run.stdout).toBe('');
      expect(run.stderr).toMatch(/^ifzone: --(width|wide)[^\n]*\n$/);
    }
  });
});

describe('a closed pipe ends the command quietly', () => {
  it('`ifzone solve … --json | head -c 100` exits 0 with nothing on stderr', () => {
    // The JSON is larger than a pipe's buffer, so the writer meets the closed pipe (EPIPE).
    const run = spawnSync(
      'bash',
      [
        '-c',
        'set -o pipefail; node bin/ifzone solve scenarios/heron-base.json --json | head -c 100 >/dev/null; echo "status ${PIPESTATUS[0]}"',
      ],
      { cwd: ROOT, encoding: 'utf8' },
    );
    expect(run.stderr).toBe('');
    expect(run.stdout.trim()).toBe('status 0');
  });
});
