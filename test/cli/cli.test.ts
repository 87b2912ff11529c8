import { beforeAll, describe, expect, it } from 'vitest';
import { ensureBuilt, expectRefusal, runBin, type Run } from '../helpers/run-bin.js';
import { runCli } from '../../src/cli/main.js';

/**
 * End to end through the real bin/ifzone (a separate node process on dist/),
 * plus a few in-process runs of runCli. The JSON field names, exit statuses
 * and the one-line error convention are the contract the README states; the numbers
 * are checked against the sources named beside them.
 */
beforeAll(() => ensureBuilt(), 120_000);

const json = (run: Run) => JSON.parse(run.stdout) as Record<string, unknown> & { windows: WindowJson[]; tones: ToneJson[] };
interface WindowJson {
  zone: number;
  minRate: number;
  maxRate: number | null;
  inverted: boolean;
  width: number | null;
}
interface ToneJson {
  frequency: number;
  alias: number;
  zone: number;
  inverted: boolean;
  lookalikes: number[];
}

describe('ifzone windows --json', () => {
  it('keeps the contract: band, guard, windows[zone, minRate, maxRate, inverted], minimumRate', () => {
    // 60–80 MHz with 2 MHz guards holds 58–82 MHz; Vaughan, Scott & White 1991: ⌊82/24⌋ = 3 zones,
    // 2·82/n ≤ fs ≤ 2·58/(n − 1).
    const run = runBin('windows', '--center', '70M', '--width', '20M', '--guard', '2M', '--json');
    expect(run.status).toBe(0);
    expect(run.stderr).toBe('');
    const report = json(run);
    expect(report.band).toEqual({ low: 60e6, high: 80e6 });
    expect(report.guard).toEqual({ low: 2e6, high: 2e6 });
    expect(report.windows.map(({ zone, minRate, maxRate, inverted }) => ({ zone, minRate, maxRate, inverted }))).toEqual([
      { zone: 1, minRate: 164e6, maxRate: null, inverted: false },
      { zone: 2, minRate: 82e6, maxRate: 116e6, inverted: true },
      { zone: 3, minRate: 164e6 / 3, maxRate: 58e6, inverted: false },
    ]);
    expect(report.minimumRate).toBe(164e6 / 3);
  });

  it('10–14 kHz gives the worked case of Vaughan, Scott & White (1991)', () => {
    const report = json(runBin('windows', '--low', '10k', '--high', '14 kHz', '--json'));
    expect(report.windows.map((w) => [w.zone, w.minRate, w.maxRate, w.inverted])).toEqual([
      [1, 28e3, null, false],
      [2, 14e3, 20e3, true],
      [3, 28e3 / 3, 10e3, false],
    ]);
  });

  it('a 5 MHz band at 20 MHz gives 22.5–35, 15–17.5 and 11.25–35/3 MHz', () => {
    // Lyons, Understanding DSP, band-pass sampling section (from memory), edges recomputed from the formula.
    const report = json(runBin('windows', '--center', '20M', '--width', '5M', '--json'));
    expect(report.windows.slice(1).map((w) => [w.minRate, w.maxRate])).toEqual([
      [22.5e6, 35e6],
      [15e6, 17.5e6],
      [11.25e6, 35e6 / 3],
    ]);
  });

  it('lists the zero-width window at twice the width, typed in decimal with guards', () => {
    // Common practice, no source: 10.2–11.9 MHz (11.9 = 7·1.7) is sampled in zone 7 at exactly 3.4 MHz.
    for (const args of [
      ['--low', '10.2M', '--high', '11.9M'],
      ['--low', '10.3M', '--high', '11.8M', '--guard', '100k'],
      ['--low', '10.25M', '--high', '11.87M', '--guard-low', '50 kHz', '--guard-high', '30 kHz'],
    ]) {
      const run = runBin('windows', ...args, '--json');
      expect(run.status).toBe(0);
      const last = json(run).windows.at(-1)!;
      expect(last.zone).toBe(7);
      expect(last.minRate).toBe(last.maxRate);
      expect(last.width).toBe(0);
      expect(Math.abs(last.minRate - 3.4e6)).toBeLessThan(1e-6);
    }
  });

  it('when nothing fits the limits: an empty windows list, minimumRate null, exit 1', () => {
    // 60–80 MHz cannot be sampled below 2·20 MHz = 40 MHz (common practice, no source).
    const run = runBin('windows', '--low', '60M', '--high', '80M', '--max-rate', '39M', '--json');
    expect(run.status).toBe(1);
    expect(run.stderr).toBe('');
    expect(json(run).windows).toEqual([]);
    expect(json(run).minimumRate).toBeNull();
    // Between the zone-4 point (40 MHz) and the zone-3 window (160/3–60 MHz) lies a gap.
    const table = runBin('windows', '--low', '60M', '--high', '80M', '--min-rate', '41M', '--max-rate', '53M');
    expect(table.status).toBe(1);
    expect(table.stdout).toMatch(/no legal sampling rate/i);
  });

  it('prints a table with SI-prefixed frequencies by default', () => {
    const run = runBin('windows', '--center', '70M', '--width', '20M', '--guard', '2M');
    expect(run.status).toBe(0);
    expect(() => JSON.parse(run.stdout)).toThrow();
    expect(run.stdout).toContain('164 MHz');
    expect(run.stdout).toContain('116 MHz');
    // 2·82/3 MHz = 54.666… MHz, written rounded up so that the rate shown is legal.
    expect(run.stdout).toContain('Lowest legal rate: 54.67 MHz (rounded up).');
  });
});

describe('ifzone alias at 80 columns', () => {
  it('wraps the look-alike list between values, never between a value and its unit', () => {
    // Common practice (SI Brochure, 9th ed., 5.4.3: a space between number and unit, kept unbroken in print).
    // 140 MHz at 122.88 MHz is 17.12 MHz in zone 3; k·122.88 ± 17.12 MHz gives the look-alikes (k = 1, 2).
    const run = runBin('alias', '--rate', '122.88M', '140M', '10M', '280M', '--width', '80');
    expect(run.status).toBe(0);
    const lines = run.stdout.split('\n');
    for (const line of lines) {
      expect(line.length).toBeLessThanOrEqual(80);
      expect(line.trimStart()).not.toMatch(/^(?:[kMG]?Hz|dB)\b/);
    }
    expect(run.stdout).toContain('262.88 MHz');
  });
});

describe('ifzone alias --json', () => {
  it('keeps the contract: rate, tones[frequency, alias, zone, inverted]', () => {
    // Common practice, no source: 1 Hz at 7 Hz cannot be told from 6, 8, 13, 15 Hz; 1 Hz at 1.5 Hz shows at 0.5 Hz.
    const run = runBin('alias', '--rate', '7', '1', '--json');
    expect(run.status).toBe(0);
    expect(run.stderr).toBe('');
    const report = json(run);
    expect(report.rate).toBe(7);
    expect(report.tones).toEqual([{ frequency: 1, alias: 1, zone: 1, inverted: false, lookalikes: [6, 8, 13, 15] }]);
    const half = json(runBin('alias', '--rate', '1.5', '1', '--json')).tones[0]!;
    expect([half.alias, half.zone, half.inverted]).toEqual([0.5, 2, true]);
  });

  it('folds several frequencies in one call', () => {
    // Folding rule (common practice, no source): 70 MHz at 100 MHz → 30 MHz (zone 2), 140 MHz → 40 MHz (zone 3), 20 kHz at 44.1 kHz in zone 1.
    const tones = json(runBin('alias', '--rate', '100M', '70M', '140 MHz', '--json')).tones;
    expect(tones.map((t) => [t.frequency, t.alias, t.zone, t.inverted])).toEqual([
      [70e6, 30e6, 2, true],
      [140e6, 40e6, 3, false],
    ]);
    expect(json(runBin('alias', '--rate', '44.1k', '20k', '--json')).tones[0]).toMatchObject({ alias: 20e3, zone: 1, inverted: false });
  });

  it('prints a table by default', () => {
    const run = runBin('alias', '--rate', '100M', '70M');
    expect(run.status).toBe(0);
    expect(run.stdout).toContain('30 MHz');
    expect(run.stdout).toContain('70 MHz');
  });
});

describe('bad input: exit 2, one line naming the option and the value, nothing on stdout', () => {
  const cases: Array<[string, string[], string[]]> = [
    ['milli instead of mega', ['windows', '--low', '70m', '--high', '80M'], ['--low', '70m', 'write 70M']],
    ['capital K', ['windows', '--low', '70K', '--high', '80K'], ['--low', '70K']],
    ['not a number', ['windows', '--low', '60M', '--high', 'abc'], ['--high', 'abc']],
    ['unknown unit', ['windows', '--low', '60 furlongs', '--high', '80M'], ['--low', '60 furlongs']],
    ['empty value', ['windows', '--low', '', '--high', '80M'], ['--low', '""']],
    ['NaN', ['windows', '--low', '60M', '--high', '80M', '--min-rate', 'NaN'], ['--min-rate', 'NaN']],
    ['Infinity', ['windows', '--low', '60M', '--high', '80M', '--max-rate', 'Infinity'], ['--max-rate', 'Infinity']],
    ['negative guard', ['windows', '--center', '70M', '--width', '20M', '--guard', '-2M'], ['--guard', '-2M']],
    ['high below low', ['windows', '--low', '60M', '--high', '50M'], ['--high', '50M']],
    ['width above twice the centre', ['windows', '--center', '70M', '--width', '200M'], ['--width', '200M']],
    ['centre without width', ['windows', '--center', '70M'], ['--width']],
    ['edges and centre mixed', ['windows', '--low', '60M', '--high', '80M', '--center', '70M'], ['--low', '--center']],
    ['guard with one-sided guards', ['windows', '--low', '60M', '--high', '80M', '--guard', '2M', '--guard-low', '1M'], ['--guard', '2M']],
    [
      'max rate below min rate',
      ['windows', '--low', '60M', '--high', '80M', '--min-rate', '100M', '--max-rate', '50M'],
      ['--max-rate', '50M'],
    ],
    ['zero rate', ['alias', '--rate', '0', '70M'], ['--rate', '0']],
    ['negative rate', ['alias', '--rate', '-7', '1'], ['--rate', '-7']],
    ['milli rate', ['alias', '--rate', '61.44m', '70M'], ['--rate', '61.44m']],
    ['bad first frequency', ['alias', '--rate', '7', 'abc'], ['frequency 1', 'abc']],
    ['bad second frequency', ['alias', '--rate', '7', '1', '2x'], ['frequency 2', '2x']],
    ['zero multiples', ['alias', '--rate', '7', '1', '--multiples', '0'], ['--multiples', '0']],
    ['fractional multiples', ['alias', '--rate', '7', '1', '--multiples', '2.5'], ['--multiples', '2.5']],
  ];
  it.each(cases)('%s', (_, args, named) => expectRefusal(runBin(...args), ...named));
});

describe("commander's own usage errors give exit 2", () => {
  const cases: Array<[string, string[], string[]]> = [
    ['unknown option', ['windows', '--low', '60M', '--high', '80M', '--bogus'], ['--bogus']],
    ['missing option value', ['windows', '--low'], ['--low']],
    ['missing argument', ['alias', '--rate', '7'], ['freq']],
    ['missing required option', ['alias', '1'], ['--rate']],
    ['unknown command', ['fold', '70M'], ['fold']],
    ['excess argument', ['windows', 'extra', '--low', '1', '--high', '2'], ['windows']],
  ];
  it.each(cases)('%s', (_, args, named) => expectRefusal(runBin(...args), ...named));

  it('no command at all: exit 2, one line on stderr pointing at --help, nothing on stdout', () => {
    const run = runBin();
    expect(run.status).toBe(2);
    expect(run.stdout).toBe('');
    expect(run.stderr).toMatch(/^ifzone: no command given; run ifzone --help[^\n]*\n$/);
  });

  it('--help and --version answer with exit 0 on stdout', () => {
    const help = runBin('--help');
    expect(help.status).toBe(0);
    expect(help.stdout).toMatch(/Usage: ifzone/);
    expect(help.stderr).toBe('');
    const version = runBin('--version');
    expect(version.status).toBe(0);
    expect(version.stdout.trim()).toMatch(/^\d+\.\d+\.\d+$/);
  });
});

describe('--debug', () => {
  it('adds the stack trace after the one-line message', () => {
    const run = runBin('windows', '--low', '70m', '--high', '80M', '--debug');
    expect(run.status).toBe(2);
    expect(run.stdout).toBe('');
    const [first, ...rest] = run.stderr.split('\n');
    expect(first).toMatch(/^ifzone: --low: .*"70m"/);
    expect(rest.join('\n')).toMatch(/^\s+at /m);
  });
});

describe('runCli in process', () => {
  /** Runs the CLI with string streams. */
  async function inProcess(...args: string[]) {
    let stdout = '';
    let stderr = '';
    const status = await runCli(args, { out: (t) => (stdout += t), err: (t) => (stderr += t) });
    return { status, stdout, stderr };
  }

  it('writes the same JSON as the real process', async () => {
    const args = ['windows', '--low', '10k', '--high', '14k', '--json'];
    const mine = await inProcess(...args);
    expect(mine.status).toBe(0);
    expect(mine.stdout).toBe(runBin(...args).stdout);
  });

  it('answers 0, 1 and 2', async () => {
    expect((await inProcess('alias', '--rate', '4', '1')).status).toBe(0);
    expect((await inProcess('windows', '--low', '10k', '--high', '14k', '--min-rate', '21k', '--max-rate', '27k')).status).toBe(1);
    const bad = await inProcess('alias', '--rate', '4', '1 Mc');
    expect(bad).toMatchObject({ status: 2, stdout: '' });
    expect(bad.stderr).toMatch(/^ifzone: frequency 1: .*"1 Mc"\)\n$/);
  });

  it('1 Hz at 4 Hz cannot be told from 3, 5 and 7 Hz', async () => {
    // Common practice, no source.
    const tone = JSON.parse((await inProcess('alias', '--rate', '4', '1', '--json')).stdout).tones[0];
    expect(tone.lookalikes.slice(0, 3)).toEqual([3, 5, 7]);
  });
});
