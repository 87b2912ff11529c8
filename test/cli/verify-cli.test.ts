import { describe, expect, it } from 'vitest';
import { copyFileSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { Command, CommanderError } from 'commander';
import { InputError } from '../../src/units/input-error.js';
import { EXIT, type ExitCode, type Io } from '../../src/cli/io.js';
import { addVerifyCommand } from '../../src/cli/commands/verify-command.js';
import { runVerify } from '../../src/cli/commands/verify-action.js';
import { readScenarioFile } from '../../src/cli/read-scenario.js';
import { runCli } from '../../src/cli/main.js';
import { badRate, passingRates } from '../capture/plan-rates.js';
import { parseSvg, rootOf, textsOf } from '../pictures/svg-check.js';

/**
 * `ifzone verify` in process: the command as commander parses it (until it
 * is registered in src/cli/main.ts, with the same error-to-exit mapping as
 * runCli: an InputError or a usage error is exit 2), and the action directly.
 * The demo scenario is invented data: these tests check the command's
 * contract (exit statuses, JSON fields, refusals); the reference checks of
 * the capture are in test/capture.
 */
const BASE = 'scenarios/heron-base.json';
const base = readScenarioFile(BASE);
const good = passingRates(base)[0]!;
const bad = badRate(base).rate;

interface Run {
  readonly status: ExitCode;
  readonly stdout: string;
  readonly stderr: string;
}

async function verify(...args: string[]): Promise<Run> {
  let stdout = '';
  let stderr = '';
  const io: Io = { out: (t) => (stdout += t), err: (t) => (stderr += t) };
  let status: ExitCode = EXIT.answered;
  const program = new Command('ifzone')
    .exitOverride()
    .configureOutput({ writeOut: io.out, writeErr: io.err, outputError: (m, write) => write(`ifzone: ${m}`) });
  addVerifyCommand(program, io, (code) => (status = code));
  try {
    await program.parseAsync(['verify', ...args], { from: 'user' });
  } catch (error) {
    if (error instanceof InputError) io.err(`ifzone: ${error.message}\n`);
    else if (!(error instanceof CommanderError)) throw error;
    status = EXIT.badInput;
  }
  return { status, stdout, stderr };
}

describe('ifzone verify: exit statuses', () => {
  it(`exits 0 at a rate the solver passes (${good} Hz) with one wanted tone, with the tables, the verdict and the caution`, async () => {
    const started = performance.now();
    const run = await verify(BASE, '--rate', String(good), '--tones', '1');
    console.info(`verify on the demo at ${good} Hz, one tone: ${(performance.now() - started).toFixed(0)} ms in process`);
    expect(run.status, run.stdout).toBe(0);
    expect(run.stderr).toBe('');
    expect(run.stdout).toMatch(/^Simulated capture: Heron-4 base/);
    expect(run.stdout).toMatch(/Predicted lines beside the capture/);
    expect(run.stdout).toMatch(/Verdict: the capture agrees with the plan/);
    expect(run.stdout).toMatch(/paper design/);
    expect(run.stdout).toMatch(/simulated capture is still a paper check/);
  });

  it(`exits 0 at a rate where a harmonic falls on the band (${bad} Hz): the capture confirms the plan's failure`, async () => {
    const run = await verify(BASE, '--rate', String(bad), '--tones', '1');
    expect(run.status).toBe(0);
    expect(run.stdout).toMatch(/Verdict: the capture agrees with the plan at .* \(the plan fails there\)/);
    expect(run.stdout).not.toMatch(/Verdict: the capture contradicts/);
  });

  it("exits 2 for a rate outside the converter's range, a bad record length or tone count, and a missing --rate", async () => {
    const outside = await verify(BASE, '--rate', '300M');
    expect(outside.status).toBe(2);
    expect(outside.stderr).toMatch(/--rate: a rate within the converter's range, 40 MHz to 250 MHz/);
    expect(outside.stdout).toBe('');
    expect((await verify(BASE, '--rate', '184.32M', '--samples', '5000')).stderr).toMatch(/--samples: a power of two/);
    expect((await verify(BASE, '--rate', '184.32M', '--tones', '0')).status).toBe(2);
    expect((await verify(BASE, '--rate', '184.32M', '--tones', '6')).stderr).toMatch(/--tones: a whole number from 1 to 5/);
    expect((await verify('scenarios/heron-narrow.json', '--rate', '245.76M', '--samples', '1024', '--tones', '5')).stderr).toMatch(
      /--samples: a record long enough/,
    );
    expect((await verify(BASE)).status).toBe(2);
    expect((await verify('no-such.json', '--rate', '184.32M')).status).toBe(2);
  });
});

describe('ifzone verify --json', () => {
  it('carries the result for programs: frequencies in Hz, levels in dBFS, one row per predicted line', async () => {
    const run = await verify(BASE, '--rate', '184.32M', '--json');
    const result = JSON.parse(run.stdout);
    expect(Object.keys(result)).toEqual(
      expect.arrayContaining([
        'scenario',
        'rate',
        'samples',
        'binWidth',
        'window',
        'converter',
        'levels',
        'margin',
        'wantedImage',
        'tones',
        'predictions',
        'unlisted',
        'intrusions',
        'plan',
        'notSimulated',
        'contradictions',
        'consistent',
        'compared',
        'caution',
      ]),
    );
    expect(result.rate).toBe(184.32e6);
    expect(result.samples).toBe(65536);
    expect(result.binWidth).toBe(184.32e6 / 65536);
    expect(result.wantedTones).toBe(3);
    expect(result.window.coherentGain).toBe(0.35875);
    for (const p of result.predictions) {
      expect(Object.keys(p)).toEqual(
        expect.arrayContaining([
          'check',
          'kind',
          'line',
          'width',
          'basis',
          'predicted',
          'planLevel',
          'modelLevel',
          'measured',
          'binError',
          'levelError',
          'status',
        ]),
      );
    }
    expect(result.caution).toMatch(/paper design/);
    expect(run.status).toBe(result.consistent ? 0 : 1);
  });

  it('runVerify returns the same status as the command', () => {
    let out = '';
    const code = runVerify(
      BASE,
      { rate: String(bad), tones: '1', samples: '65536', json: true },
      { out: (t) => (out += t), err: () => {} },
    );
    // At the bad rate the plan fails and the capture confirms it: agreement, exit 0.
    expect(code).toBe(0);
    expect(JSON.parse(out).consistent).toBe(true);
  });
});

describe('ifzone verify through runCli (registered in src/cli/main.ts)', () => {
  const run = async (...args: string[]) => {
    let stdout = '';
    let stderr = '';
    const status = await runCli(args, { out: (t) => (stdout += t), err: (t) => (stderr += t) });
    return { status, stdout, stderr };
  };

  it("exits 0 at the solver's rate, and at the bad rate where the capture confirms the plan's failure", async () => {
    expect((await run('verify', BASE, '--rate', String(good), '--tones', '1')).status).toBe(0);
    const failing = await run('verify', BASE, '--rate', String(bad), '--tones', '1', '--json');
    expect(failing.status).toBe(0);
    expect(JSON.parse(failing.stdout).plan.pass).toBe(false);
    expect(JSON.parse(failing.stdout).intrusions.length).toBeGreaterThan(0);
  });

  it('refuses bad input with exit 2 and one `ifzone: ` line naming the option', async () => {
    const refused = await run('verify', BASE, '--rate', '10M');
    expect(refused.status).toBe(2);
    expect(refused.stdout).toBe('');
    expect(refused.stderr.trim().split('\n')).toHaveLength(1);
    expect(refused.stderr).toMatch(/^ifzone: --rate: a rate within the converter's range/);
  });
});

describe('ifzone verify --svg', () => {
  it('draws the capture, refuses to overwrite without --force, replaces with it, and never writes over the scenario', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'ifzone-verify-svg-'));
    const scenario = join(dir, 'heron.json');
    copyFileSync(BASE, scenario);
    const out = join(dir, 'capture.svg');
    const args = ['--rate', String(bad), '--tones', '1', '--samples', '16384'];
    const first = await verify(scenario, ...args, '--svg', out);
    expect(first.status).toBe(0);
    const document = parseSvg(readFileSync(out, 'utf8'));
    expect(rootOf(document).getAttribute('width')).toBe('960');
    expect(textsOf(document)[0]).toMatch(/^Simulated capture at .*: Heron-4 base$/);
    expect(first.stdout).toMatch(/Verdict: the capture agrees with the plan/);

    writeFileSync(out, 'mine');
    const again = await verify(scenario, ...args, '--svg', out);
    expect(again.status).toBe(2);
    expect(again.stderr).toMatch(/add --force to replace it/);
    expect(readFileSync(out, 'utf8')).toBe('mine');
    expect((await verify(scenario, ...args, '--svg', out, '--force')).status).toBe(0);
    expect(readFileSync(out, 'utf8')).toMatch(/^<svg /);

    const before = readFileSync(scenario, 'utf8');
    const over = await verify(scenario, ...args, '--svg', scenario, '--force');
    expect(over.status).toBe(2);
    expect(over.stderr).toMatch(/a path other than an input file/);
    expect(readFileSync(scenario, 'utf8')).toBe(before);
  });
});
