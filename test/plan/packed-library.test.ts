import { execFileSync, spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, readdirSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { ensureBuilt, ROOT } from '../helpers/run-bin.js';
import { formatFrequency } from '../../src/units/format-frequency.js';
import { hz } from '../../src/units/quantities.js';
import { readScenarioFile } from '../../src/cli/read-scenario.js';
import { planScenario } from '../../src/plan/plan-scenario.js';

/**
 * The library as another project sees it: `npm pack`, the tarball installed
 * into a fresh temporary project (`npm ci --offline`: the dependencies come
 * from the npm cache, as this repository locks them), and the README's "Use from a program" script run there against the
 * installed package's own demo scenario. Its lines must match planScenario
 * called here from the sources.
 */
const npm = process.platform === 'win32' ? 'npm.cmd' : 'npm';
const project = mkdtempSync(join(tmpdir(), 'ifzone-library-'));
let installed = false;

/** The README's script: the first ```js block after the "Use from a program" heading. */
function readmeScript(): string {
  const readme = readFileSync(join(ROOT, 'README.md'), 'utf8');
  const section = readme.slice(readme.indexOf('## Use from a program'));
  const match = /```js\n([\s\S]*?)```/.exec(section);
  if (!match) throw new Error('README: no js block under "Use from a program"');
  return match[1]!;
}

interface LockEntry {
  readonly dev?: boolean;
}

/** The consumer's lockfile: ifzone from the tarball, its run-time dependencies as this repository locks them. */
function consumerLock(tarball: string): object {
  const own = JSON.parse(readFileSync(join(ROOT, 'package.json'), 'utf8')) as {
    version: string;
    dependencies: Record<string, string>;
    bin: Record<string, string>;
  };
  const lock = JSON.parse(readFileSync(join(ROOT, 'package-lock.json'), 'utf8')) as { packages: Record<string, LockEntry> };
  const runtime = Object.entries(lock.packages).filter(([path, entry]) => path !== '' && entry.dev !== true);
  return {
    name: 'sweep-check',
    version: '1.0.0',
    lockfileVersion: 3,
    requires: true,
    packages: {
      '': { name: 'sweep-check', version: '1.0.0', dependencies: { ifzone: `file:${tarball}` } },
      'node_modules/ifzone': { version: own.version, resolved: `file:${tarball}`, dependencies: own.dependencies, bin: own.bin },
      ...Object.fromEntries(runtime),
    },
  };
}

beforeAll(() => {
  ensureBuilt();
  execFileSync(npm, ['pack', '--ignore-scripts', '--pack-destination', project], { cwd: ROOT, stdio: 'pipe' });
  const tarball = readdirSync(project).find((f) => f.endsWith('.tgz'))!;
  // A lockfile naming the tarball and the package's own locked dependencies lets `npm ci --offline` install from the cache alone.
  const manifest = { name: 'sweep-check', version: '1.0.0', private: true, type: 'module', dependencies: { ifzone: `file:${tarball}` } };
  writeFileSync(join(project, 'package.json'), JSON.stringify(manifest, null, 2));
  writeFileSync(join(project, 'package-lock.json'), JSON.stringify(consumerLock(tarball), null, 2));
  execFileSync(npm, ['ci', '--offline', '--no-audit', '--no-fund', '--ignore-scripts'], { cwd: project, stdio: 'pipe' });
  writeFileSync(join(project, 'sweep.mjs'), readmeScript());
  installed = true;
}, 180_000);

describe('ifzone as a packed library', () => {
  it('the README script runs from the installed package and prints the best rate for each margin', () => {
    expect(installed).toBe(true);
    const scenarioFile = join(project, 'node_modules', 'ifzone', 'scenarios', 'heron-base.json');
    const run = spawnSync(process.execPath, ['sweep.mjs', scenarioFile], { cwd: project, encoding: 'utf8' });
    expect(run.stderr).toBe('');
    expect(run.status).toBe(0);
    const lines = run.stdout.trim().split('\n');
    expect(lines).toHaveLength(5);
    // The same sweep from the sources: the packed build must say the same.
    const base = readScenarioFile(join(ROOT, 'scenarios', 'heron-base.json'));
    [0.5, 1, 2, 4, 8].forEach((mhz, i) => {
      const plan = planScenario({ ...base, requirements: { ...base.requirements, margin: hz(mhz * 1e6) } });
      const best = plan.candidates.find((c) => c.label === plan.best);
      expect(lines[i]).toContain(`margin ${formatFrequency(mhz * 1e6)}: `);
      expect(lines[i]).toContain(best ? `${best.label} at ${formatFrequency(best.rate)}` : 'no rate passes');
    });
  });

  it('exposes the types beside the code (package.json types and exports)', () => {
    const manifest = JSON.parse(readFileSync(join(project, 'node_modules', 'ifzone', 'package.json'), 'utf8')) as {
      types: string;
      exports: Record<string, unknown>;
    };
    expect(readFileSync(join(project, 'node_modules', 'ifzone', manifest.types), 'utf8')).toMatch(/export \{ planScenario/);
    expect(Object.keys(manifest.exports)).toContain('.');
  });

  it('exports the functions the README names, as functions', () => {
    const probe =
      "const m = await import('ifzone'); console.log(['planScenario', 'planFamily', 'planAtRate', 'readScenarioFile', 'rateWindows', 'foldFrequency'].filter((n) => typeof m[n] !== 'function').join(','))";
    const run = spawnSync(process.execPath, ['--input-type=module', '-e', probe], { cwd: project, encoding: 'utf8' });
    expect(run.stderr).toBe('');
    expect(run.stdout.trim()).toBe('');
  });
});
