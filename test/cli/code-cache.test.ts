import { spawnSync } from 'node:child_process';
import { copyFileSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ensureBuilt, ROOT } from '../helpers/run-bin.js';

/**
 * The code cache bin/ifzone starts with (bin/load-bundle.js): taken when it
 * was made from the bundle, ignored when the bundle changed, never written at
 * run time. V8's own check of cached data compares the source length and its
 * flags only (V8's SerializedCodeData sanity check, v8/src/snapshot/code-serializer.cc),
 * so the copy of the bundle the cache holds is what keeps a same-length edit
 * from running stale code.
 */
const dir = mkdtempSync(join(tmpdir(), 'ifzone-code-cache-'));
const BUNDLE = join(ROOT, 'dist', 'bundle', 'cli', 'ifzone.cjs');

beforeAll(() => ensureBuilt());
afterAll(() => rmSync(dir, { recursive: true, force: true }));

/** Runs a module in a child with no NODE_OPTIONS (V8 takes a cache only under the flags it was made with). */
function runNode(args: string[], cwd: string) {
  const env = { ...process.env };
  delete env['NODE_OPTIONS'];
  return spawnSync(process.execPath, args, { cwd, env, encoding: 'utf8' });
}

/** A copy of bin/ and the bundle with its cache under a fresh root; `edit` changes the bundle's text. */
function copyInstall(name: string, edit: (source: string) => string): string {
  const root = join(dir, name);
  mkdirSync(join(root, 'bin'), { recursive: true });
  mkdirSync(join(root, 'dist', 'bundle', 'cli'), { recursive: true });
  for (const file of ['ifzone', 'load-bundle.js', 'package.json']) copyFileSync(join(ROOT, 'bin', file), join(root, 'bin', file));
  writeFileSync(join(root, 'package.json'), '{ "type": "module" }');
  writeFileSync(join(root, 'dist', 'bundle', 'cli', 'ifzone.cjs'), edit(readFileSync(BUNDLE, 'utf8')));
  copyFileSync(`${BUNDLE}.cache`, join(root, 'dist', 'bundle', 'cli', 'ifzone.cjs.cache'));
  return root;
}

const CACHE_USED = "import { loadBundle } from './bin/load-bundle.js'; console.log(loadBundle().cacheUsed)";

describe('the code cache of the bundle', () => {
  it('is taken by a start from the built bundle', () => {
    const run = runNode(['--input-type=module', '-e', CACHE_USED], ROOT);
    expect(run.stderr).toBe('');
    expect(run.stdout.trim()).toBe('true');
  });

  it('is ignored when the bundle changed, even keeping its length, and the changed code runs', () => {
    const root = copyInstall('edited', (source) => {
      const edited = source.replace('VERSION="0.1.0"', 'VERSION="9.8.7"');
      expect(edited).not.toBe(source);
      return edited;
    });
    const used = runNode(['--input-type=module', '-e', CACHE_USED], root);
    expect(used.stdout.trim()).toBe('false');
    const version = runNode(['bin/ifzone', '--version'], root);
    expect(version.status).toBe(0);
    expect(version.stdout.trim()).toBe('9.8.7');
  });

  it('is read, never written: a run leaves its working folder and the bundle folder as they were', () => {
    const work = join(dir, 'work');
    mkdirSync(work);
    const bundleFolder = join(ROOT, 'dist', 'bundle', 'cli');
    const before = readdirSync(bundleFolder).map((f) => [f, statSync(join(bundleFolder, f)).mtimeMs]);
    const run = runNode([join(ROOT, 'bin', 'ifzone'), 'solve', join(ROOT, 'scenarios', 'heron-base.json')], work);
    expect(run.status).toBe(0);
    expect(readdirSync(work)).toEqual([]);
    expect(readdirSync(bundleFolder).map((f) => [f, statSync(join(bundleFolder, f)).mtimeMs])).toEqual(before);
  });
});
