import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { ensureBuilt, ROOT, runBin } from '../helpers/run-bin.js';

/**
 * `ifzone solve` end to end through the real bin/ifzone: the JSON contract
 * (README), the exit statuses and the "nothing passes" explanation. The demo
 * family is invented data: these tests check plumbing and contracts, while
 * the reference values live in the core tests.
 */
const BASE = join(ROOT, 'scenarios/heron-base.json');
const dir = mkdtempSync(join(tmpdir(), 'ifzone-solve-'));

function variant(name: string, overrides: Record<string, unknown>): string {
  const path = join(dir, name);
  writeFileSync(path, JSON.stringify({ extends: BASE, name, ...overrides }, null, 2));
  return path;
}

beforeAll(() => ensureBuilt());

describe('ifzone solve --json: the contract', () => {
  it('carries every field the contract names, frequencies in Hz', () => {
    const run = runBin('solve', BASE, '--json');
    expect(run.status).toBe(0);
    expect(run.stderr).toBe('');
    const plan = JSON.parse(run.stdout);
    expect(plan.scenario).toBe('Heron-4 base');
    expect(plan.band).toEqual({ low: 130e6, high: 150e6 });
    expect(plan.guard).toEqual({ low: 2e6, high: 2e6 });
    expect(plan.search).toEqual({ minRate: 40e6, maxRate: 250e6 });
    for (const i of plan.interferers) {
      expect(Object.keys(i)).toEqual(
        expect.arrayContaining(['label', 'kind', 'order', 'rateMultiple', 'low', 'high', 'requiredMargin', 'blocking', 'level']),
      );
      expect(['harmonic', 'spur', 'neighbour', 'intermod', 'converter']).toContain(i.kind);
    }
    const labels = plan.interferers.map((i: { label: string }) => i.label);
    expect(new Set(labels).size).toBe(labels.length);
    for (const f of plan.feasible) expect(Object.keys(f)).toEqual(expect.arrayContaining(['zone', 'inverted', 'minRate', 'maxRate']));
    expect(plan.candidates.length).toBeGreaterThan(0);
    expect(plan.interferersListed).toBe('all');
    expect(plan.interferersOmitted).toBe(0);
    plan.candidates.forEach(
      (c: { checks: { label: string }[]; checksListed: string; checksOmitted: number; limitedBy: string }, index: number) => {
        expect(Object.keys(c)).toEqual(
          expect.arrayContaining([
            'label',
            'rate',
            'tolerancePpm',
            'zone',
            'inverted',
            'center',
            'nco',
            'worstMargin',
            'pass',
            'checks',
            'checksListed',
            'checksOmitted',
          ]),
        );
        for (const k of c.checks)
          expect(Object.keys(k)).toEqual(expect.arrayContaining(['label', 'kind', 'alias', 'margin', 'level', 'levelMargin', 'pass']));
        if (index === 0) {
          // The first-ranked candidate is shown in full: every interferer's check.
          expect(c.checksListed).toBe('all');
          expect(c.checks.map((k) => k.label)).toEqual(labels);
        } else {
          // The others were judged on the blocking interferers: their limiting check (none when the zone edge limits).
          expect(c.checksListed).toBe('limiting');
          expect(c.checks.map((k) => k.label)).toEqual(labels.includes(c.limitedBy) ? [c.limitedBy] : []);
        }
        expect(c.checksOmitted).toBe(labels.length - c.checks.length);
        // The mask's alias bands: all for the candidate shown in full, the worst one for the others.
        const after = (c as unknown as { afterRate: { mask: { bands: unknown[]; worst: unknown } } | null; maskBandsOmitted: number })
          .afterRate;
        const omitted = (c as unknown as { maskBandsOmitted: number }).maskBandsOmitted;
        if (index === 0) expect(omitted).toBe(0);
        else if (after !== null) expect(after.mask.bands).toEqual(after.mask.worst === null ? [] : [after.mask.worst]);
      },
    );
    expect(plan.caution).toMatch(/paper design/);
  });

  it('lists the windows of the guarded band by the published condition (Vaughan, Scott & White 1991)', () => {
    const plan = JSON.parse(runBin('solve', BASE, '--json').stdout);
    // Written out here, not taken from the enumerator: 130–150 MHz widened by its 2 MHz guards is fL = 128, fH = 152 MHz,
    // B = 24 MHz; zone n (1 ≤ n ≤ ⌊fH/B⌋ = 6) holds it for 2·fH/n ≤ fs ≤ 2·fL/(n − 1), cut to the converter's 40–250 MHz.
    const [fL, fH, minRate, maxRate] = [128e6, 152e6, 40e6, 250e6];
    const expected: { zone: number; minRate: number; maxRate: number; inverted: boolean }[] = [];
    for (let n = 1; n <= Math.floor(fH / (fH - fL)); n++) {
      const low = Math.max((2 * fH) / n, minRate);
      const high = Math.min(n === 1 ? Infinity : (2 * fL) / (n - 1), maxRate);
      if (low <= high) expected.push({ zone: n, minRate: low, maxRate: high, inverted: n % 2 === 0 });
    }
    expect(expected.map((w) => w.zone)).toEqual([2, 3, 4, 5, 6]); // zone 1 needs fs ≥ 304 MHz; zone 7 is past ⌊fH/B⌋
    expect(plan.windows.map((w: { zone: number }) => w.zone)).toEqual(expected.map((w) => w.zone));
    plan.windows.forEach((w: { zone: number; minRate: number; maxRate: number; inverted: boolean }, i: number) => {
      expect(w.inverted).toBe(expected[i]!.inverted);
      expect(w.minRate / expected[i]!.minRate).toBeCloseTo(1, 12);
      expect(w.maxRate / expected[i]!.maxRate).toBeCloseTo(1, 12);
    });
  });

  it('keeps every feasible interval inside a window and every passing candidate inside a feasible interval', () => {
    const plan = JSON.parse(runBin('solve', BASE, '--json').stdout);
    for (const f of plan.feasible) {
      expect(plan.windows.some((w: { minRate: number; maxRate: number }) => f.minRate >= w.minRate && f.maxRate <= w.maxRate)).toBe(true);
    }
    for (const c of plan.candidates.filter((x: { pass: boolean }) => x.pass)) {
      const drift = c.rate * c.tolerancePpm * 1e-6;
      expect(
        plan.feasible.some((f: { minRate: number; maxRate: number }) => c.rate - drift >= f.minRate && c.rate + drift <= f.maxRate),
      ).toBe(true);
    }
  });
});

describe('ifzone solve --all-checks', () => {
  it('lists every check of every candidate, with the same verdicts and margins as the default run', () => {
    const plain = JSON.parse(runBin('solve', BASE, '--json').stdout);
    const run = runBin('solve', BASE, '--json', '--all-checks');
    expect(run.status).toBe(0);
    const full = JSON.parse(run.stdout);
    const labels = full.interferers.map((i: { label: string }) => i.label);
    expect(full.candidates.length).toBe(plain.candidates.length);
    full.candidates.forEach((c: { checks: { label: string }[]; checksListed: string; checksOmitted: number }, index: number) => {
      expect(c.checksListed).toBe('all');
      expect(c.checksOmitted).toBe(0);
      expect(c.checks.map((k) => k.label)).toEqual(labels);
      // The same candidate, verdict and margins; only what is listed differs (the checks, and the mask's alias bands).
      const {
        checks: _full,
        checksListed: _a,
        checksOmitted: _b,
        afterRate: fullAfter,
        maskBandsOmitted: _e,
        channels: fullChannels,
        ...summary
      } = c as Record<string, unknown>;
      const {
        checks: _plain,
        checksListed: _c,
        checksOmitted: _d,
        afterRate: plainAfter,
        maskBandsOmitted: _f,
        channels: plainChannels,
        ...plainSummary
      } = plain.candidates[index];
      expect(summary).toEqual(plainSummary);
      // Each channel's result too, but for its listed checks and its mask's listed alias bands (its worst is the same).
      const withoutChecks = (channels: unknown) =>
        (channels as { checks: unknown; afterRate: { mask: { worst: unknown } } | null }[]).map(({ checks: _k, afterRate, ...rest }) => ({
          ...rest,
          worst: afterRate?.mask.worst,
        }));
      expect(withoutChecks(fullChannels)).toEqual(withoutChecks(plainChannels));
      const masks = [fullAfter, plainAfter].map((a) => (a as { mask: { worst: unknown; pass: boolean } } | null)?.mask);
      expect(masks[0]?.worst).toEqual(masks[1]?.worst);
      expect(masks[0]?.pass).toEqual(masks[1]?.pass);
    });
  });

  it('refuses, exit 2 and one line naming the option, when candidates × interferers pass the limit', () => {
    // 64 low board spurs with 20 harmonics each (about 1,300 interferers, little folding work) and 450 clock parts on a direct-RF plan.
    const boardSpurs = Array.from({ length: 64 }, (_, k) => ({ label: `S${k}`, frequency: `${1 + k * 0.37}M`, level: -60, harmonics: 20 }));
    const clocks = Array.from({ length: 450 }, (_, k) => ({ label: `XO${k}`, frequency: `${1000 + (k * 2000) / 450}M`, tolerance: 20 }));
    const path = join(dir, 'crowded.json');
    writeFileSync(path, JSON.stringify({ extends: join(ROOT, 'test/bench/direct-rf.json'), name: 'crowded', boardSpurs, clocks }));
    const plain = JSON.parse(runBin('solve', path, '--json').stdout);
    const interferers = plain.interferers.length + plain.interferersOmitted;
    // The case must be past the limit for the refusal to mean anything.
    expect(plain.candidates.length * interferers).toBeGreaterThan(500_000);
    expect(plain.interferersListed).toBe('nearest');
    const run = runBin('solve', path, '--json', '--all-checks');
    expect(run.status).toBe(2);
    expect(run.stdout).toBe('');
    expect(run.stderr).toMatch(/^ifzone: --all-checks: at most 500,000 checks in one run; leave out --all-checks[^\n]*\n$/);
  }, 60_000);
});

describe('ifzone solve: exit statuses', () => {
  it('exits 0 with tables when a candidate passes', () => {
    const run = runBin('solve', BASE);
    expect(run.status).toBe(0);
    expect(run.stdout).toMatch(/^Best: /m);
    expect(run.stdout).toMatch(/paper design/);
  });

  it('exits 1 and names the blocking check and the shortfall when nothing passes', () => {
    // Neighbours keep 4 MHz, everything else 30 MHz: no neighbour is that close at the input, yet no rate passes.
    const impossible = variant('impossible.json', { requirements: { margin: '30M', kindMargins: { neighbour: '4M' } } });
    const run = runBin('solve', impossible);
    expect(run.status).toBe(1);
    expect(run.stderr).toBe('');
    // The verdict is prose, wrapped to the width: read it as one line.
    expect(run.stdout.replace(/\n(?!\n)/g, ' ')).toMatch(
      /No candidate passes\. Nearest: .+ at .+: .+ lands .+ from the band where 30 MHz is required \(short by .+\)\./,
    );
    const plan = JSON.parse(runBin('solve', impossible, '--json').stdout);
    expect(plan.best).toBeNull();
    expect(plan.conflicts).toEqual([]);
    expect(plan.candidates.every((c: { pass: boolean }) => !c.pass)).toBe(true);
  });

  it('exits 1 with one sentence per conflict no rate can fix, naming what can, instead of near misses', () => {
    // The base scenario's lower adjacent channel ends 5 MHz below the band and the paging blocker starts 24.5 MHz above it
    // (at the converter input): with 60 MHz required, folding (which never moves two frequencies apart) cannot help.
    const impossible = variant('conflict.json', { requirements: { margin: '60M' } });
    const run = runBin('solve', impossible);
    expect(run.status).toBe(1);
    expect(run.stderr).toBe('');
    // Each sentence is a list item wrapped to the width, its continuation lines indented: read each as one line.
    const sentences = run.stdout
      .replace(/\n {2}(?=\S)/g, ' ')
      .split('\n')
      .filter((line) => line.startsWith('- '));
    expect(sentences).toHaveLength(2);
    expect(sentences[0]).toMatch(
      /^- Lower adjacent channel \(neighbour\) lies 5 MHz from the wanted band where 60 MHz is required; .*no sampling rate can clear it: more anti-alias filter rejection .* a different channel plan, or a smaller required margin for it/,
    );
    expect(sentences[1]).toMatch(/^- Paging blocker 175M \(neighbour\) lies 24\.5 MHz from the wanted band/);
    expect(run.stdout).not.toMatch(/Nearest:/);
    const plan = JSON.parse(runBin('solve', impossible, '--json').stdout);
    expect(plan.conflicts.map((c: { label: string; distance: number }) => [c.label, c.distance])).toEqual([
      ['Lower adjacent channel', 5e6],
      ['Paging blocker 175M', 24.5e6],
    ]);
  });

  it('exits 2 with one line for a bad goal, a missing output rate, or an output rate under another goal', () => {
    for (const args of [
      ['solve', BASE, '--goal', 'fastest'],
      ['solve', BASE, '--goal', 'decimation'],
      ['solve', BASE, '--goal', 'widest-margin', '--output-rate', '30.72M'],
      ['solve', BASE, '--ppm', '5'],
    ]) {
      const run = runBin(...args);
      expect(run.status).toBe(2);
      expect(run.stdout).toBe('');
      expect(run.stderr).toMatch(/^ifzone: --(goal|output-rate|ppm)[^\n]*\n$/);
    }
  });

  it('--output-rate alone asks for decimation; every candidate shows its factor', () => {
    const plan = JSON.parse(runBin('solve', BASE, '--output-rate', '30.72M', '--json').stdout);
    expect(plan.goal).toEqual({ kind: 'decimation', outputRate: 30.72e6 });
    for (const c of plan.candidates) expect(c.decimationFactor).toBeCloseTo(c.rate / 30.72e6, 12);
    // 184.32 MHz = 6 × 30.72 MHz (common practice: a whole decimation factor).
    const table = runBin('solve', BASE, '--output-rate', '30.72M').stdout;
    expect(table).toMatch(/decimation\s+factor/);
    expect(table).toMatch(/VCXO-C 184\.32M\s+184\.32 MHz\s.*\s6\s*$/m);
  });

  it('under decimation a clock part passes only at a whole multiple of the output rate (exhaustive check of the synthesiser)', () => {
    const plan = JSON.parse(runBin('solve', BASE, '--output-rate', '30.72M', '--json').stdout);
    for (const c of plan.candidates.filter((c: { origin: string; pass: boolean }) => c.origin === 'clock' && c.pass))
      expect(Number.isInteger(c.decimationFactor), c.label).toBe(true);
    // SYN-1: 10 MHz × N / M ÷ D with N 1–512, M 1–16, D 1–8, VCO 10 MHz·N/M in 800 MHz–1.6 GHz (scenarios/heron-base.json).
    // Every setting enumerated, in integers (Hz): no rate in 40–250 MHz is a whole multiple of 30.72 MHz, so the part fails.
    const multiples: number[] = [];
    for (let N = 1; N <= 512; N++)
      for (let M = 1; M <= 16; M++)
        for (let D = 1; D <= 8; D++) {
          const vco = (10e6 * N) / M;
          if (vco < 800e6 || vco > 1.6e9) continue;
          const numerator = 10_000_000n * BigInt(N);
          const denominator = BigInt(M * D);
          if (numerator % denominator !== 0n) continue;
          const rate = numerator / denominator;
          if (rate >= 40_000_000n && rate <= 250_000_000n && rate % 30_720_000n === 0n) multiples.push(Number(rate));
        }
    expect(multiples).toEqual([]);
    const syn = plan.candidates.find((c: { label: string }) => c.label === 'SYN-1 from TCXO-R 10M');
    expect(syn).toMatchObject({ pass: false, limitedBy: 'no whole multiple of the output rate' });
    // With a 10 MHz output the synthesiser makes whole multiples (N a multiple of M·D), so it can pass.
    const ten = JSON.parse(runBin('solve', BASE, '--output-rate', '10M', '--json').stdout);
    const syn10 = ten.candidates.find((c: { label: string }) => c.label === 'SYN-1 from TCXO-R 10M');
    expect(syn10.pass).toBe(true);
    expect(Number.isInteger(syn10.decimationFactor)).toBe(true);
  });

  it('--rate judges the rates given: every check and a verdict each, exit 0 only when all pass', () => {
    const both = JSON.parse(runBin('solve', BASE, '--rate', '184.32M', '245.76M', '--json').stdout);
    expect(both.candidates.map((c: { label: string; origin: string }) => [c.label, c.origin])).toEqual([
      ['184.32 MHz', 'typed'],
      ['245.76 MHz', 'typed'],
    ]);
    // Every candidate of the search judged on every interferer (--all-checks), as a typed rate is.
    const base = JSON.parse(runBin('solve', BASE, '--json', '--all-checks').stdout);
    const part = (label: string) => base.candidates.find((c: { label: string }) => c.label === label);
    // The same rate judged as a part with the same tolerance gives the same checks (the VCXO is ±10 ppm).
    const typed = JSON.parse(runBin('solve', BASE, '--rate', '184.32M', '--ppm', '10', '--json').stdout).candidates[0];
    expect(typed.checks).toEqual(part('VCXO-C 184.32M').checks);
    expect(typed.pass).toBe(part('VCXO-C 184.32M').pass);
    expect(both.candidates[0].tolerancePpm).toBe(base.candidates.find((c: { origin: string }) => c.origin === 'interval').tolerancePpm);
    const pass = runBin('solve', BASE, '--rate', '184.32M');
    expect(pass.status).toBe(0);
    expect(pass.stdout).toMatch(/^184\.32 MHz: passes, zone 2 inv/m);
    const fail = runBin('solve', BASE, '--rate', '184.32M', '245.76M');
    expect(fail.status).toBe(1);
    expect(fail.stdout).toMatch(/^245\.76 MHz: FAILS/m);
    expect(fail.stdout.match(/^Checks at /gm)).toHaveLength(2);
    // A rate given by the user is its own label: the headings name it once (common practice), as "Checks at 184.32 MHz:" does.
    expect(fail.stdout).toMatch(/^After the rate, at 184\.32 MHz:$/m);
    expect(fail.stdout).not.toContain('184.32 MHz (184.32 MHz)');
  });

  it('puts every decimation candidate on an integer multiple of the output rate', () => {
    const plan = JSON.parse(runBin('solve', BASE, '--goal', 'decimation', '--output-rate', '7.68M', '--json').stdout);
    const chosen = plan.candidates.filter((c: { origin: string }) => c.origin === 'interval');
    expect(chosen.length).toBeGreaterThan(0);
    for (const c of chosen) expect(Number.isInteger(Math.round((c.rate / 7.68e6) * 1e9) / 1e9)).toBe(true);
  });

  it('puts the quarter-rate candidates with their aliased centre at rate/4 where the interval allows (common practice: odd multiple of fs/4)', () => {
    const plan = JSON.parse(runBin('solve', BASE, '--goal', 'quarter-rate', '--json').stdout);
    const chosen = plan.candidates.filter((c: { origin: string; pass: boolean }) => c.origin === 'interval' && c.pass);
    expect(chosen.length).toBeGreaterThan(0);
    // 4·fc/(2n − 1) with fc = 140 MHz: zone 2 → 186.667 MHz, inside the 171–194.5 MHz interval
    expect(
      chosen.some((c: { rate: number; center: number }) => Math.abs(c.rate - 560e6 / 3) < 1 && Math.abs(c.center - c.rate / 4) < 1),
    ).toBe(true);
  });
});
