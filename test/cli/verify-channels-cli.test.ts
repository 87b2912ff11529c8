import { beforeAll, describe, expect, it } from 'vitest';
import { copyFileSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { ensureBuilt, expectRefusal, runBin } from '../helpers/run-bin.js';
import { parseSvg, textsOf } from '../pictures/svg-check.js';

/**
 * `ifzone verify` on the demo's multi-channel variant (the invented Heron-4
 * dual: IF-A 130–150 MHz and IF-B 30–40 MHz on one converter) through the
 * real bin/ifzone: the command's contract with several channels (exit
 * statuses, the JSON's channels, the table's channels section, the
 * picture's channel images, the refusal of a record too short for a
 * channel). The reference checks of the capture itself are in
 * test/report/channel-capture.test.ts (fft.js).
 */
const DUAL = 'scenarios/heron-dual.json';
const dir = mkdtempSync(join(tmpdir(), 'ifzone-verify-channels-'));

beforeAll(() => ensureBuilt());

interface Channel {
  label: string;
  zone: number | null;
  inverted: boolean | null;
  planPass: boolean;
  tonesSeen: number | null;
  order: string | null;
  consistent: boolean;
  contradictions: string[];
}

describe('ifzone verify with several channels', () => {
  const solve = JSON.parse(runBin('solve', DUAL, '--json').stdout) as {
    candidates: Array<{ rate: number; pass: boolean; channels: Array<{ label: string; zone: number; inverted: boolean; pass: boolean }> }>;
  };
  const best = solve.candidates.find((c) => c.pass)!;
  const failing = solve.candidates.find((c) => !c.pass)!;

  it('judges every channel at a passing rate: its zone and inversion as solve reports them, every tone seen, in order', () => {
    const run = runBin('verify', DUAL, '--rate', String(best.rate), '--samples', '16384', '--json');
    expect(run.status, run.stderr).toBe(0);
    const result = JSON.parse(run.stdout) as { consistent: boolean; channels: Channel[]; tones: Array<{ label: string; role: string }> };
    expect(result.channels.map((c) => c.label)).toEqual(best.channels.map((c) => c.label));
    result.channels.forEach((c, i) => {
      expect(c.zone).toBe(best.channels[i]!.zone);
      expect(c.inverted).toBe(best.channels[i]!.inverted);
      expect(c.planPass).toBe(true);
      expect(c.tonesSeen).toBe(3);
      expect(c.order).toBe(c.inverted ? 'inverted' : 'upright');
      expect(c.consistent, c.contradictions.join('\n')).toBe(true);
    });
    // Three tones per channel, labelled by the channel.
    for (const c of best.channels)
      expect(result.tones.filter((t) => t.role === 'wanted' && t.label.startsWith(`${c.label}.`)).map((t) => t.label)).toEqual(
        [1, 2, 3].map((k) => `${c.label}.${k}`),
      );
    expect(result.consistent).toBe(true);
  });

  it('prints a channels section naming each channel once, and draws each channel in the picture', () => {
    const svg = join(dir, 'dual.svg');
    const run = runBin('verify', DUAL, '--rate', String(failing.rate), '--samples', '16384', '--svg', svg);
    expect([0, 1]).toContain(run.status);
    expect(run.stdout).toMatch(/^Channels: the plan's zone and image of each/m);
    for (const c of failing.channels) expect(run.stdout).toMatch(new RegExp(`^${c.label} +\\d`, 'm'));
    const texts = textsOf(parseSvg(readFileSync(svg, 'utf8')));
    for (const c of failing.channels) {
      expect(texts).toContain(`channel ${c.label}`);
      expect(texts.some((t) => t === c.label || t === `${c.label} (inverted)`)).toBe(true);
    }
    // The heading counts the tones per channel (three by default, one set in each channel).
    expect(texts.some((t) => t.includes(`3 wanted tones in each of ${failing.channels.length} channels`))).toBe(true);
  });

  it('refuses a record too short for the narrowest channel, naming it', () => {
    // The dual variant with IF-B narrowed to 1 MHz: 5 tones need 40 bins, a 1 MHz channel spans 4.4 at 1024 samples of 230 MHz.
    copyFileSync('scenarios/heron-base.json', join(dir, 'heron-base.json'));
    const dual = JSON.parse(readFileSync(DUAL, 'utf8')) as { wanted: Array<Record<string, unknown>> };
    dual.wanted[1] = { ...dual.wanted[1], width: '1M' };
    const narrow = join(dir, 'heron-dual-narrow.json');
    writeFileSync(narrow, JSON.stringify(dual));
    const run = runBin('verify', narrow, '--rate', '230M', '--samples', '1024', '--tones', '5');
    expectRefusal(run, '--samples', 'channel IF-B');
  });

  it('keeps one entry, labelled "wanted", for a single wanted band', () => {
    const run = runBin('verify', 'scenarios/heron-base.json', '--rate', '184.32M', '--samples', '16384', '--json');
    const result = JSON.parse(run.stdout) as { channels: Channel[]; consistent: boolean };
    expect(result.channels.map((c) => c.label)).toEqual(['wanted']);
    expect(result.channels[0]!.consistent).toBe(result.consistent);
    expect(result.channels[0]!.order).toBeNull();
  });
});
