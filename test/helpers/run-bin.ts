import { execFileSync, spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { expect } from 'vitest';

/** The repository root (test/helpers/../..). */
export const ROOT = fileURLToPath(new URL('../../', import.meta.url));

/**
 * Builds dist/ (tsc) and the bundle bin/ifzone runs (dist/bundle/cli/) when
 * either is missing, so a test file run on its own still drives the real
 * bin/ifzone. `npm test` builds first.
 */
export function ensureBuilt(): void {
  if (
    existsSync(new URL('../../dist/cli/main.js', import.meta.url)) &&
    existsSync(new URL('../../dist/bundle/cli/ifzone.cjs', import.meta.url))
  )
    return;
  execFileSync(process.execPath, ['node_modules/typescript/bin/tsc', '-p', 'tsconfig.json'], { cwd: ROOT, stdio: 'inherit' });
  execFileSync(process.execPath, ['scripts/bundle-cli.mjs'], { cwd: ROOT, stdio: 'inherit' });
}

export interface Run {
  readonly status: number | null;
  readonly stdout: string;
  readonly stderr: string;
}

/** Runs `node bin/ifzone ...args` as a separate process and collects what it wrote. */
export function runBin(...args: string[]): Run {
  const result = spawnSync(process.execPath, ['bin/ifzone', ...args], { cwd: ROOT, encoding: 'utf8', maxBuffer: 1 << 28 });
  return { status: result.status, stdout: result.stdout, stderr: result.stderr };
}

/** A refusal: exit 2, one `ifzone: ` line on stderr naming every given word, nothing on stdout, no stack. */
export function expectRefusal(run: Run, ...named: string[]): void {
  expect(run.status, run.stderr).toBe(2);
  expect(run.stdout).toBe('');
  const lines = run.stderr.split('\n').filter((l) => l !== '');
  expect(lines, run.stderr).toHaveLength(1);
  expect(lines[0]!.startsWith('ifzone: ')).toBe(true);
  for (const word of named) expect(lines[0]).toContain(word);
  expect(run.stderr).not.toMatch(/^\s+at /m);
}
