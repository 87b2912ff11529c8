import { beforeAll, describe, expect, it } from 'vitest';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { ensureBuilt, runBin } from '../helpers/run-bin.js';

/**
 * Several channels end to end through the real bin/ifzone on the invented
 * Heron dual-band variant (scenarios/heron-dual.json): the JSON contract
 * (the report's and every candidate's channels, the worst over channels at
 * the top), the per-channel tables within 100 columns, the compare CSV's
 * channel columns (verify of several channels: verify-channels-cli.test.ts). Plumbing: the reference
 * values of the algebra are in test/solve/channels-*.test.ts.
 */

const DUAL = join('scenarios', 'heron-dual.json');
const BASE = join('scenarios', 'heron-base.json');

interface Channel {
  label: string;
  zone: number | null;
  inverted: boolean | null;
  nco: number | null;
  worstMargin: number;
  worstSlack: number;
  limitedBy: string;
  limitedByKind: string;
  pass: boolean;
  checks: { label: string; pass: boolean }[];
}
interface Candidate {
  label: string;
  rate: number;
  zone: number | null;
  nco: number | null;
  worstMargin: number;
  worstSlack: number;
  limitedBy: string;
  pass: boolean;
  checks: { label: string; pass: boolean }[];
  checksListed: string;
  channels: Channel[];
}

let report: {
  channels: {
    label: string;
    low: number;
    high: number;
    guard: { below: number; above: number };
    derivation: { threshold: number; products: number } | null;
  }[];
  feasible: { channelZones: number[]; minRate: number; maxRate: number }[];
  candidates: Candidate[];
  best: string | null;
};

beforeAll(() => {
  ensureBuilt();
  const run = runBin('solve', DUAL, '--json');
  expect(run.status, run.stderr).toBe(0);
  report = JSON.parse(run.stdout);
});

describe('solve on a scenario with two channels', () => {
  it('reports both channels and, on every candidate, each channel with the worst at the top', () => {
    expect(report.channels.map(({ derivation: _derivation, ...c }) => c)).toEqual([
      { label: 'IF-A', low: 130e6, high: 150e6, weakestLevel: -70, strongestLevel: -1, guard: { below: 2e6, above: 2e6 } },
      { label: 'IF-B', low: 30e6, high: 40e6, weakestLevel: -60, strongestLevel: -20, guard: { below: 1e6, above: 1e6 } },
    ]);
    for (const c of report.candidates) {
      expect(c.channels.map((ch) => ch.label)).toEqual(['IF-A', 'IF-B']);
      const worst = c.channels.reduce((a, b) => (b.worstSlack < a.worstSlack ? b : a));
      expect(c.worstSlack).toBe(worst.worstSlack);
      expect(c.limitedBy).toBe(`${worst.label}: ${worst.limitedBy}`);
      expect(c.zone).toBe(c.channels[0]!.zone);
      expect(c.nco).toBe(c.channels[0]!.nco);
      // The candidate's own verdict needs every channel's (the mask is judged on top).
      if (c.pass) expect(c.channels.every((ch) => ch.pass)).toBe(true);
      // Shown in full, every channel check appears among the candidate's, named channel: check.
      if (c.checksListed === 'all')
        for (const ch of c.channels) for (const k of ch.checks) expect(c.checks.map((x) => x.label)).toContain(`${ch.label}: ${k.label}`);
    }
  });

  it("states each channel's own blocking threshold (its weakest level less the rejection) in the JSON, the heading and verify", () => {
    // heron-dual.json: IF-A weakest -70 dBFS, IF-B -60 dBFS; heron-base.json: rejection 10 dB. The threshold is the
    // weakest wanted level less the required rejection (common practice: a spur that far under the weakest signal is harmless).
    const expected = { 'IF-A': -80, 'IF-B': -70 } as Record<string, number>;
    for (const c of report.channels) expect(c.derivation?.threshold).toBe(expected[c.label]);
    const text = runBin('solve', DUAL, '--width', '100').stdout.replace(/\s+/g, ' ');
    expect(text).toMatch(/IF-A: \d+ listed, \d+ at or under the threshold -80\.0 dBFS/);
    expect(text).toMatch(/IF-B: \d+ listed, \d+ at or under the threshold -70\.0 dBFS/);
    const verify = runBin('verify', DUAL, '--rate', String(report.candidates[0]!.rate), '--samples', '8192');
    expect(verify.stdout.replace(/\s+/g, ' ')).toContain('threshold -80.0 dBFS (IF-A), -70.0 dBFS (IF-B)');
  });

  it('puts each passing interval candidate inside a feasible interval with the same channel zones', () => {
    const best = report.candidates.find((c) => c.label === report.best)!;
    expect(best.pass).toBe(true);
    const interval = report.feasible.find((f) => best.rate >= f.minRate && best.rate <= f.maxRate)!;
    expect(interval.channelZones).toEqual(best.channels.map((ch) => ch.zone));
  });

  it('writes the per-channel tables within 100 columns', () => {
    const run = runBin('solve', DUAL);
    expect(run.status).toBe(0);
    expect(run.stdout).toContain('2 channels: IF-A 130–150 MHz');
    expect(run.stdout).toContain('Each channel at each candidate');
    expect(run.stdout).toContain('IF-A 2 inv, IF-B 1');
    for (const line of run.stdout.split('\n')) expect([...line].length, line).toBeLessThanOrEqual(100);
  });

  it('judges typed rates per channel', () => {
    const run = runBin('solve', DUAL, '--rate', '184.32M', '--json');
    expect(run.status).toBe(1);
    const typed = JSON.parse(run.stdout).candidates[0] as Candidate;
    // 184.32 MHz folds IF-A (zone 2, inverted) onto 2·92.16 − [130, 150] = [34.32, 54.32] MHz, over IF-B at 30–40 MHz (zone 1).
    expect(typed.channels.map((ch) => [ch.zone, ch.inverted])).toEqual([
      [2, true],
      [1, false],
    ]);
    expect(typed.pass).toBe(false);
    expect(typed.channels.find((ch) => ch.label === 'IF-B')!.limitedBy).toBe('IF-A');
  });
});

describe('compare with a variant of two channels', () => {
  it('adds the channel columns to the CSV, one value per channel', () => {
    const run = runBin('compare', BASE, DUAL, '--csv');
    expect(run.status).toBe(0);
    const [head, ...rows] = run.stdout.trim().split('\r\n');
    const columns = head!.split(',');
    expect(columns.slice(-7)).toEqual([
      'channels',
      'channel_zones',
      'channel_inverted',
      'channel_nco_hz',
      'channel_worst_margin_hz',
      'channel_limited_by',
      'channel_pass',
    ]);
    const cells = (row: string) => Object.fromEntries(columns.map((c, i) => [c, row.split(',')[i]]));
    for (const row of rows.map(cells)) {
      if (row['variant'] === 'Heron-4 base') expect(row['channels']).toBe('');
      else if (row['rate_hz'] !== '') expect(row['channels']).toBe('IF-A;IF-B');
    }
  });

  it('writes each channel at each part within 100 columns', () => {
    const run = runBin('compare', BASE, DUAL);
    expect(run.stdout).toContain("Each channel at each part's rate");
    for (const line of run.stdout.split('\n')) expect([...line].length, line).toBeLessThanOrEqual(100);
  });
});

describe('a list of one channel', () => {
  it('plans exactly as the single wanted object does', () => {
    const dir = mkdtempSync(join(tmpdir(), 'ifzone-one-channel-'));
    writeFileSync(join(dir, 'heron-base.json'), readFileSync(BASE, 'utf8'));
    const one = {
      extends: 'heron-base.json',
      name: 'Heron-4 base',
      wanted: [{ label: 'L1', center: '140M', width: '20M', weakestLevel: -70 }],
    };
    writeFileSync(join(dir, 'one.json'), JSON.stringify(one));
    const listed = runBin('solve', join(dir, 'one.json'));
    const object = runBin('solve', BASE);
    expect(listed.status).toBe(0);
    expect(listed.stdout).toBe(object.stdout);
    const json = JSON.parse(runBin('solve', join(dir, 'one.json'), '--json').stdout);
    expect(json.channels.map((c: { label: string }) => c.label)).toEqual(['L1']);
  });
});
