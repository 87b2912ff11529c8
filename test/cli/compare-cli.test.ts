import { existsSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { readScenarioFile } from '../../src/cli/read-scenario.js';
import { ensureBuilt, ROOT, runBin } from '../helpers/run-bin.js';

/**
 * `ifzone compare` end to end through the real bin/ifzone: the JSON contract
 * (README), the family answer, CSV, safe writes and exit statuses. The
 * Heron family is invented data; these tests check plumbing and consistency
 * (every "pass" must agree with `ifzone solve` on the same variant).
 */
const VARIANTS = ['heron-base.json', 'heron-narrow.json', 'heron-wide.json', 'heron-lowif.json'].map((f) => join(ROOT, 'scenarios', f));
const dir = mkdtempSync(join(tmpdir(), 'ifzone-compare-'));
const converters = new Map(VARIANTS.map((f) => readScenarioFile(f)).map((s) => [s.name, s.converter] as const));

beforeAll(() => ensureBuilt());

describe('ifzone compare --json: the contract', () => {
  it('names the variants and gives every part its per-variant verdicts', () => {
    const run = runBin('compare', ...VARIANTS, '--json');
    expect(run.stderr).toBe('');
    const report = JSON.parse(run.stdout);
    expect(report.variants).toEqual(['Heron-4 base', 'Heron-4N narrowband', 'Heron-4W wideband', 'Heron-2L low IF']);
    for (const part of report.parts) {
      expect(Object.keys(part)).toEqual(
        expect.arrayContaining(['label', 'frequency', 'tolerancePpm', 'jitter', 'perVariant', 'passesAll']),
      );
      expect(part.perVariant.map((v: { variant: string }) => v.variant)).toEqual(report.variants);
      for (const v of part.perVariant) {
        expect(Object.keys(v)).toEqual(
          expect.arrayContaining([
            'variant',
            'rate',
            'settings',
            'zone',
            'inverted',
            'worstMargin',
            'limitedBy',
            'headroomPpm',
            'jitterSnrDb',
            'channelSnrDb',
            'pass',
          ]),
        );
      }
      expect(part.passesAll).toBe(part.perVariant.every((v: { pass: boolean }) => v.pass));
    }
    expect(report.caution).toMatch(/paper design/);
  });

  it('answers the family question with the parts that pass every variant, and exits 0', () => {
    const run = runBin('compare', ...VARIANTS, '--json');
    expect(run.status).toBe(0);
    const report = JSON.parse(run.stdout);
    const passingAll = report.parts.filter((p: { passesAll: boolean }) => p.passesAll).map((p: { label: string }) => p.label);
    expect(report.family).toEqual(passingAll);
    expect(report.family.length).toBeGreaterThan(0);
    expect(report.parts.some((p: { passesAll: boolean }) => !p.passesAll)).toBe(true);
  });

  it('gives each settings triple a rate of f·N/(M·D) (the synthesiser relation)', () => {
    const report = JSON.parse(runBin('compare', ...VARIANTS, '--json').stdout);
    for (const part of report.parts) {
      for (const v of part.perVariant) {
        if (v.rate === null) continue;
        expect(v.rate).toBeCloseTo((part.frequency * v.settings.N) / (v.settings.M * v.settings.D), 3);
      }
    }
  });

  it('agrees with ifzone solve on each variant: the same parts pass at the same rates', () => {
    const report = JSON.parse(runBin('compare', ...VARIANTS, '--json').stdout);
    VARIANTS.forEach((file, index) => {
      const plan = JSON.parse(runBin('solve', file, '--json').stdout);
      for (const part of report.parts) {
        const candidate = plan.candidates.find((c: { label: string; origin: string }) => c.label === part.label && c.origin === 'clock');
        const verdict = part.perVariant[index];
        if (!candidate) {
          expect(verdict.rate).toBeNull();
          continue;
        }
        expect(verdict.rate).toBe(candidate.rate);
        expect(verdict.pass).toBe(candidate.pass);
      }
    });
  });

  it('ranks the parts of one variant in the order ifzone solve ranks them, ties on the worst margin included', () => {
    // One ranking rule across commands (common practice): heron-base has parts that tie on the worst margin
    // (VCXO-C and SYN-1 at 5 MHz from the lower adjacent channel), which solve ranks by the next-tightest check.
    for (const file of VARIANTS) {
      const parts = JSON.parse(runBin('compare', file, '--json').stdout).parts.map((p: { label: string }) => p.label);
      const plan = JSON.parse(runBin('solve', file, '--json').stdout);
      const solved = plan.candidates
        .filter((c: { origin: string; label: string }) => c.origin === 'clock' && parts.includes(c.label))
        .map((c: { label: string }) => c.label);
      expect(
        parts.filter((label: string) => solved.includes(label)),
        file,
      ).toEqual(solved);
    }
  });

  it('keeps the drift headroom of every passing verdict at or above the part tolerance', () => {
    const report = JSON.parse(runBin('compare', ...VARIANTS, '--json').stdout);
    for (const part of report.parts) {
      for (const v of part.perVariant.filter((x: { pass: boolean }) => x.pass)) {
        // The whole drift stays inside the checks and inside the converter's rate range (src/clocks/plan-part.ts).
        expect(Math.min(v.headroomPpm.down, v.headroomPpm.up)).toBeGreaterThanOrEqual(part.tolerancePpm);
        const { minRate, maxRate } = converters.get(v.variant)!;
        expect(v.rate * (1 - part.tolerancePpm * 1e-6)).toBeGreaterThanOrEqual(minRate);
        expect(v.rate * (1 + part.tolerancePpm * 1e-6)).toBeLessThanOrEqual(maxRate);
      }
    }
  });
});

describe('ifzone compare: CSV, files and exit statuses', () => {
  it('writes one CSV row per part and variant with a header', () => {
    const run = runBin('compare', ...VARIANTS, '--csv');
    const lines = run.stdout.trimEnd().split('\r\n');
    expect(lines[0]).toMatch(/^part,frequency_hz,tolerance_ppm,jitter_s,variant,rate_hz,N,M,D,/);
    const parts = JSON.parse(runBin('compare', ...VARIANTS, '--json').stdout).parts.length;
    expect(lines).toHaveLength(1 + parts * VARIANTS.length);
  });

  it('writes to -o FILE, refuses to overwrite it without --force, leaves it intact', () => {
    const out = join(dir, 'parts.csv');
    expect(runBin('compare', VARIANTS[0]!, '--csv', '-o', out).status).toBe(0);
    const first = readFileSync(out);
    writeFileSync(out, 'keep me');
    const refused = runBin('compare', VARIANTS[0]!, '--csv', '-o', out);
    expect(refused.status).toBe(2);
    expect(refused.stderr).toMatch(/^ifzone: .*parts\.csv: .*add --force to replace it/);
    expect(readFileSync(out, 'utf8')).toBe('keep me');
    expect(runBin('compare', VARIANTS[0]!, '--csv', '-o', out, '--force').status).toBe(0);
    expect(readFileSync(out)).toEqual(first);
  });

  it('never writes over one of its inputs, even with --force', () => {
    const before = readFileSync(VARIANTS[0]!);
    const run = runBin('compare', VARIANTS[0]!, '-o', VARIANTS[0]!, '--force');
    expect(run.status).toBe(2);
    expect(readFileSync(VARIANTS[0]!)).toEqual(before);
  });

  it('exits 1 when no part passes', () => {
    const hopeless = join(dir, 'hopeless.json');
    writeFileSync(hopeless, JSON.stringify({ extends: VARIANTS[0], name: 'hopeless', requirements: { margin: '60M' } }));
    const run = runBin('compare', hopeless);
    expect(run.status).toBe(1);
    expect(run.stdout).toMatch(/FAIL/);
  });

  it('exits 2 for --json with --csv, and for a missing file', () => {
    expect(runBin('compare', VARIANTS[0]!, '--json', '--csv').status).toBe(2);
    const missing = runBin('compare', join(dir, 'absent.json'));
    expect(missing.status).toBe(2);
    expect(missing.stderr).toMatch(/^ifzone: .*absent\.json/);
    expect(existsSync(join(dir, 'absent.json'))).toBe(false);
  });
});
