import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { ensureBuilt, ROOT, runBin } from '../helpers/run-bin.js';

/**
 * The folding-work bound counts what the plan will search: the blocking
 * interferers actually derived, not every mixing product the signals could
 * make. Weak neighbours in their hundreds make few products above the level
 * threshold and are planned; strong ones make thousands of blocking products
 * and are refused by every command that plans, in one line naming a field.
 */
const BASE = join(ROOT, 'scenarios/heron-base.json');
const dir = mkdtempSync(join(tmpdir(), 'ifzone-work-'));

/** n neighbours 100 kHz wide from 160 MHz up, at the given level (dBFS at the filter input). */
function neighbours(count: number, level: number, stepMhz: number): Array<Record<string, unknown>> {
  return Array.from({ length: count }, (_, i) => ({ label: `N${i}`, center: `${160 + i * stepMhz}M`, width: '100k', level }));
}

function variant(name: string, overrides: Record<string, unknown>): string {
  const path = join(dir, name);
  writeFileSync(path, JSON.stringify({ extends: BASE, name, ...overrides }));
  return path;
}

beforeAll(() => ensureBuilt());

describe('the folding-work bound on the derived interferers', () => {
  it('plans 200 weak neighbours at order 3 (their products fall below the level threshold)', () => {
    // At −60 dBFS each and above the demo's filter passband, their products fall under the −80 dBFS threshold
    // (weakest wanted level −70 dBFS less 10 dB rejection) and are pruned before they are listed.
    const path = variant('weak-200.json', { neighbours: neighbours(200, -60, 0.4), maxOrder: 3 });
    const run = runBin('solve', path, '--json');
    expect(run.stderr).toBe('');
    expect([0, 1]).toContain(run.status);
    const plan = JSON.parse(run.stdout);
    expect(plan.interferers.length + plan.interferersOmitted).toBeGreaterThan(200);
  }, 60_000);

  it('refuses 32 strong neighbours with no filter at order 3, exit 2 and one line naming maxOrder, from every command that plans', () => {
    // N tones make N(N−1) third-order products of the 2·A−B kind and N(N−1)(N−2)/2 of the A+B−C kind (the
    // usual count of third-order intermodulation among N carriers): 992 + 14,880 for N = 32, each near −5 dBFS
    // here and blocking, several hundred thousand images of the band over 40–250 MHz.
    const path = variant('strong-32.json', { neighbours: neighbours(32, -5, 1), filter: null, maxOrder: 3 });
    const runs = [
      runBin('solve', path),
      runBin('compare', path),
      runBin('report', path, '--html', join(dir, 'strong-32.html')),
      runBin('verify', path, '--rate', '184.32M'),
    ];
    for (const run of runs) {
      expect(run.status).toBe(2);
      expect(run.stdout).toBe('');
      expect(run.stderr).toMatch(
        /^ifzone: [^\n]*strong-32\.json: maxOrder: expected blocking interferers that fold onto at most 200000 images[^\n]*lower maxOrder[^\n]*\n$/,
      );
    }
  }, 60_000);

  it('refuses 200 strong neighbours while their products are listed, naming maxOrder and what to lower', () => {
    // 201 signals (the neighbours and the wanted band) make 20,100 pairs, so 40,200 sums and differences at
    // order 2 alone (counted by hand), all at about −5 dBFS: the generator stops during order 2.
    const path = variant('strong-200.json', { neighbours: neighbours(200, -5, 1), filter: null, maxOrder: 3 });
    const run = runBin('solve', path);
    expect(run.status).toBe(2);
    expect(run.stderr).toMatch(
      /^ifzone: [^\n]*strong-200\.json: maxOrder: expected at most 40000 mixing products above the level threshold; lower maxOrder[^\n]*neighbours[^\n]*\n$/,
    );
    expect(run.stderr).toContain('by order 2');
  }, 60_000);
});
