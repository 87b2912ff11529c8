import { existsSync, mkdirSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join, resolve } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { ensureBuilt, ROOT, runBin } from '../helpers/run-bin.js';
import { readScenarioFile } from '../../src/cli/read-scenario.js';

/** `ifzone init` end to end: what it writes loads, solves and points at the real schema; it never overwrites without --force. */
const dir = mkdtempSync(join(tmpdir(), 'ifzone-init-'));

beforeAll(() => ensureBuilt());

describe('ifzone init', () => {
  it('writes a starter scenario that validates, solves, and references the committed JSON Schema', () => {
    const file = join(dir, 'nested', 'starter.json');
    mkdirSync(dirname(file), { recursive: true });
    const run = runBin('init', file);
    expect(run.status).toBe(0);
    expect(run.stdout).toBe('');
    const document = JSON.parse(readFileSync(file, 'utf8'));
    expect(resolve(dirname(file), document.$schema)).toBe(join(ROOT, 'scenarios', 'ifzone-scenario.schema.json'));
    expect(readScenarioFile(file).name).toBe('New receiver variant');
    expect(runBin('solve', file).status).toBe(0);
  });

  it('prints the starter on standard output when no file is named', () => {
    const run = runBin('init');
    expect(run.status).toBe(0);
    expect(JSON.parse(run.stdout).name).toBe('New receiver variant');
  });

  it('writes a variant that extends an existing scenario by a relative path', () => {
    const variant = join(dir, 'variants', 'heron-test.json');
    mkdirSync(dirname(variant), { recursive: true });
    const base = join(ROOT, 'scenarios', 'heron-base.json');
    expect(runBin('init', variant, '--from', base).status).toBe(0);
    const document = JSON.parse(readFileSync(variant, 'utf8'));
    expect(resolve(dirname(variant), document.extends)).toBe(base);
    expect(readScenarioFile(variant).wanted).toEqual(readScenarioFile(base).wanted);
  });

  it('refuses to overwrite without --force and leaves the file byte for byte', () => {
    const file = join(dir, 'kept.json');
    writeFileSync(file, '{"keep": true}');
    const run = runBin('init', file);
    expect(run.status).toBe(2);
    expect(run.stderr).toMatch(/^ifzone: .*kept\.json: .*add --force to replace it/);
    expect(readFileSync(file, 'utf8')).toBe('{"keep": true}');
    expect(runBin('init', file, '--force').status).toBe(0);
    expect(JSON.parse(readFileSync(file, 'utf8')).name).toBe('New receiver variant');
  });

  it('refuses to write a variant over its own base, even with --force', () => {
    const base = join(dir, 'base.json');
    expect(runBin('init', base).status).toBe(0);
    const before = readFileSync(base);
    const run = runBin('init', base, '--from', base, '--force');
    expect(run.status).toBe(2);
    expect(readFileSync(base)).toEqual(before);
    expect(existsSync(base)).toBe(true);
  });
});
