import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { ensureBuilt, ROOT, runBin } from '../helpers/run-bin.js';

/**
 * The after-rate figures end to end through bin/ifzone: the JSON fields, the solve table's block, the
 * compare column and a stated out-of-band level that blocks. Plumbing and contracts; the reference values
 * live in test/after-rate/.
 */
const BASE = join(ROOT, 'scenarios/heron-base.json');
const dir = mkdtempSync(join(tmpdir(), 'ifzone-after-rate-'));

function variant(name: string, overrides: Record<string, unknown>): string {
  const path = join(dir, name);
  writeFileSync(path, JSON.stringify({ extends: BASE, name, ...overrides }, null, 2));
  return path;
}

beforeAll(() => ensureBuilt());

describe('after-rate outputs', () => {
  it('solve --json: every candidate carries afterRate (mask, design, noise, downConverter), the inputs are echoed', () => {
    const run = runBin('solve', BASE, '--json');
    expect(run.status).toBe(0);
    const plan = JSON.parse(run.stdout);
    expect(plan.afterRateInputs).toMatchObject({
      inputBandwidth: 650e6,
      outputRate: 30.72e6,
      settings: { driverNoiseDensity: -155, passbandRipple: 1 },
    });
    for (const c of plan.candidates) {
      expect(Object.keys(c.afterRate)).toEqual(['mask', 'design', 'noise', 'downConverter']);
      expect(Object.keys(c.afterRate.mask)).toEqual(
        expect.arrayContaining(['outOfBandLevel', 'levelStated', 'threshold', 'requiredDb', 'bands', 'worst', 'pass']),
      );
      for (const band of c.afterRate.mask.bands) {
        expect(band.low).toBeLessThanOrEqual(band.high);
        expect(band.high).toBeLessThanOrEqual(650e6);
      }
      expect(Object.keys(c.afterRate.design.orders ?? {})).toEqual(expect.arrayContaining(['butterworth', 'chebyshev', 'elliptic']));
      expect(c).toHaveProperty('channelSnrWithDriverDb');
    }
    const best = plan.candidates.find((c: { label: string }) => c.label === plan.best);
    expect(best.afterRate.downConverter.nco).toMatchObject({ bits: 32, target: best.nco, inverted: best.inverted });
  });

  it('solve: the table has the after-rate block for the best candidate, no line over 100 columns but the tables', () => {
    // Decimation to the down-converter's 30.72 MHz: the best rate is a whole multiple of it, so the block splits it into stages.
    const run = runBin('solve', BASE, '--output-rate', '30.72M');
    const block = run.stdout.slice(run.stdout.indexOf('After the rate, at '));
    expect(block).toMatch(/Anti-alias mask: /);
    expect(block).toMatch(/Filter that would do .*Butterworth \d+, Chebyshev I \d+, elliptic \d+/s);
    expect(block).toMatch(/Noise folding: \+\d/);
    expect(block).toMatch(/NCO \(32-bit\): word \d+/);
    expect(block).toMatch(/Decimation to 30\.72 MHz: ÷\d+/);
    const prose = block
      .split('\n\n')[0]!
      .split('\n')
      .filter((line) => !/[│┌└├]/.test(line));
    for (const line of prose) expect([...line].length, line).toBeLessThanOrEqual(100);
  });

  it('a stated out-of-band level that a 2nd-order filter cannot hold back blocks every rate: exit 1, the mask named', () => {
    const weak = variant('weak.json', {
      filter: { kind: 'butterworth', order: 2, passLow: '128M', passHigh: '152M' },
      filterMask: { outOfBandLevel: -20 },
    });
    const run = runBin('solve', weak);
    expect(run.status).toBe(1);
    // The verdict is prose wrapped to the width: read it as one line.
    expect(run.stdout.replace(/\s+/g, ' ')).toMatch(/No candidate passes\. Nearest: .*anti-alias mask: the filter gives/);
  });

  it('a candidate only the mask fails is limited by "anti-alias mask" in the JSON, the table, the CSV and the page', () => {
    const weak = variant('weak-limit.json', {
      filter: { kind: 'butterworth', order: 2, passLow: '128M', passHigh: '152M' },
      filterMask: { outOfBandLevel: -20 },
    });
    type Json = {
      label: string;
      limitedBy: string;
      limitedByKind: string;
      pass: boolean;
      zoneEdgeMargin: number;
      worstSlack: number;
      afterRate: { mask: { pass: boolean } };
    };
    const plan = JSON.parse(runBin('solve', weak, '--json').stdout) as { candidates: Json[] };
    // Every frequency check and the zone edge pass (worst slack ≥ 0, inside the zone) but the mask fails: the mask limits.
    const onlyMask = plan.candidates.filter((c) => c.worstSlack >= 0 && c.zoneEdgeMargin >= 0 && !c.afterRate.mask.pass);
    expect(onlyMask.length).toBeGreaterThan(0);
    for (const c of onlyMask) expect([c.limitedBy, c.limitedByKind, c.pass]).toEqual(['anti-alias mask', 'anti-alias mask', false]);
    for (const c of plan.candidates.filter((c) => c.worstSlack < 0)) expect(c.limitedByKind).not.toBe('anti-alias mask');
    // The terminal table: the row of such a candidate names the mask in "limited by".
    const table = runBin('solve', weak, '--wide').stdout;
    const row = table.split('\n').find((line) => line.includes(onlyMask[0]!.label) && line.includes('FAIL: mask'));
    expect(row).toMatch(/anti-alias mask\s+FAIL: mask/);
    // compare --csv: the limited_by column.
    const [head, ...rows] = runBin('compare', weak, '--csv').stdout.trim().split(/\r?\n/);
    const column = head!.split(',').indexOf('limited_by');
    expect(rows.some((r) => r.split(',')[column] === 'anti-alias mask')).toBe(true);
    // The review page: the candidates table's cell.
    const page = join(dir, 'weak-limit.html');
    expect(runBin('report', weak, '--html', page, '--force').status).toBe(1); // written; exit 1: no candidate passes
    expect(readFileSync(page, 'utf8')).toContain('<td>anti-alias mask</td><td class="fail">FAIL: mask</td>');
  });

  it('several channels: the channel whose mask falls short is named, `channel: anti-alias mask`', () => {
    const dual = variant('dual-limit.json', { extends: join(ROOT, 'scenarios/heron-dual.json'), filterMask: { outOfBandLevel: -20 } });
    const plan = JSON.parse(runBin('solve', dual, '--json').stdout) as {
      candidates: Array<{ limitedBy: string; limitedByKind: string; channels: Array<{ label: string; limitedByKind: string }> }>;
    };
    const limited = plan.candidates.filter((c) => c.limitedByKind === 'anti-alias mask');
    expect(limited.length).toBeGreaterThan(0);
    for (const c of limited) {
      const channel = c.limitedBy.replace(/: anti-alias mask$/, '');
      expect(c.channels.map((ch) => ch.label)).toContain(channel);
      expect(c.channels.find((ch) => ch.label === channel)!.limitedByKind).toBe('anti-alias mask');
    }
  });

  it("compare: the filter orders each part's rate needs", () => {
    const run = runBin('compare', BASE, '--csv');
    expect(run.status).toBe(0);
    const [head, ...rows] = run.stdout.trim().split(/\r?\n/);
    expect(head).toMatch(/butterworth_order,chebyshev_order,elliptic_order,mask_margin_db$/);
    expect(rows.some((row) => /,\d+,\d+,\d+,-?[\d.]+$/.test(row))).toBe(true);
    expect(runBin('compare', BASE).stdout).toContain('filter orders B/C/E');
  });

  it('refuses a bad after-rate field with one line and exit 2', () => {
    const bad = variant('bad.json', { downConverter: { usableFraction: 2 } });
    const run = runBin('solve', bad);
    expect(run.status).toBe(2);
    expect(run.stderr).toMatch(/^ifzone: .*downConverter\.usableFraction/);
    expect(run.stderr.trim().split('\n')).toHaveLength(1);
  });
});
