import { beforeAll, describe, expect, it } from 'vitest';
import { ensureBuilt, expectRefusal, runBin, type Run } from '../helpers/run-bin.js';

/**
 * `ifzone windows --band LOW:HIGH --band LOW:HIGH …` end to end through the
 * real bin/ifzone. The rates are the case worked on paper in
 * test/solve/joint-feasible-set.test.ts (Vaughan, Scott & White 1991 per
 * band; Akos et al. 1999 for two bands): 10–14 kHz with 15–16 kHz is valid
 * at {10}, {15}, [16, 20], {30} and [32, ∞) kHz.
 */
beforeAll(() => ensureBuilt(), 120_000);

interface JointJson {
  bands: { band: { low: number; high: number }; guard: { low: number; high: number }; guardedBand: { low: number; high: number } }[];
  spacing: number;
  limits: { minRate: number; maxRate: number | null };
  intervals: {
    minRate: number;
    maxRate: number | null;
    zones: number[];
    inverted: boolean[];
    width: number | null;
    center: number | null;
    images: unknown[] | null;
  }[];
  minimumRate: number | null;
  minimumIsSingleRate: boolean;
  caution: string;
}
const json = (run: Run) => JSON.parse(run.stdout) as JointJson;

describe('ifzone windows with several --band', () => {
  it('JSON: the intervals worked on paper, each band’s zone and inversion, the single lowest rate', () => {
    const run = runBin('windows', '--band', '10k:14k', '--band', '15 kHz:16 kHz', '--json');
    expect(run.status, run.stderr).toBe(0);
    const report = json(run);
    expect(report.bands.map((b) => [b.band.low, b.band.high])).toEqual([
      [10e3, 14e3],
      [15e3, 16e3],
    ]);
    expect(report.spacing).toBe(0);
    expect(report.intervals.map((i) => [i.minRate, i.maxRate, i.zones, i.inverted])).toEqual([
      [10e3, 10e3, [3, 4], [false, true]],
      [15e3, 15e3, [2, 3], [true, false]],
      [16e3, 20e3, [2, 2], [true, true]],
      [30e3, 30e3, [1, 2], [false, true]],
      [32e3, null, [1, 1], [false, false]],
    ]);
    expect(report.minimumRate).toBe(10e3);
    expect(report.minimumIsSingleRate).toBe(true);
    // At 18 kHz (the centre of [16, 20]) 10–14 kHz shows inverted at 18 − [10, 14] = [4, 8], 15–16 kHz at [2, 3].
    expect(report.intervals[2]!.images).toEqual([
      { zone: 2, inverted: true, low: 4e3, high: 8e3 },
      { zone: 2, inverted: true, low: 2e3, high: 3e3 },
    ]);
    expect(report.caution).toMatch(/paper design/);
  });

  it('guards widen each band, a spacing keeps the aliases apart, and the limits cut the rates', () => {
    // Akos et al. 1999, worked in test/solve/joint-feasible-set.test.ts: 10–14 and 16–18 kHz kept 1 kHz apart: [18, 20] and [36, ∞).
    const spaced = json(runBin('windows', '--band', '10k:14k', '--band', '16k:18k', '--spacing', '1k', '--json'));
    expect(spaced.intervals.map((i) => [i.minRate, i.maxRate])).toEqual([
      [18e3, 20e3],
      [36e3, null],
    ]);
    expect(
      json(runBin('windows', '--band', '10k:14k', '--band', '16k:18k', '--spacing', '1k', '--max-rate', '30k', '--json')).intervals,
    ).toHaveLength(1);
    // A 500 Hz guard each side: 9.5–14.5 and 15.5–16.5 kHz are the bands held.
    const guarded = json(runBin('windows', '--band', '10k:14k', '--band', '16k:18k', '--guard', '500', '--json'));
    expect(guarded.bands.map((b) => [b.guardedBand.low, b.guardedBand.high])).toEqual([
      [9.5e3, 14.5e3],
      [15.5e3, 18.5e3],
    ]);
  });

  it('prints a table naming the single lowest rate; no valid rate is exit 1', () => {
    const run = runBin('windows', '--band', '10k:14k', '--band', '15k:16k');
    expect(run.status).toBe(0);
    expect(run.stdout).toContain('single rate');
    expect(run.stdout).toMatch(/Lowest valid rate: 10 kHz, a single rate/);
    expect(run.stdout).toContain('paper design');
    const none = runBin('windows', '--band', '10k:14k', '--band', '13k:20k');
    expect(none.status).toBe(1);
    expect(none.stdout).toMatch(/No rate between/);
    expect(json(runBin('windows', '--band', '10k:14k', '--band', '13k:20k', '--json')).minimumRate).toBeNull();
  });

  it('one --band gives the single-band output unchanged', () => {
    const byBand = runBin('windows', '--band', '60M:80M', '--guard', '2M', '--json');
    const byEdges = runBin('windows', '--low', '60M', '--high', '80M', '--guard', '2M', '--json');
    expect(byBand.status).toBe(0);
    expect(byBand.stdout).toBe(byEdges.stdout);
  });

  it.each([
    ['no colon', ['--band', '10k-14k', '--band', '15k:16k'], ['--band', '10k-14k']],
    ['high below low', ['--band', '14k:10k', '--band', '15k:16k'], ['--band', '14k:10k']],
    ['not a frequency', ['--band', '10k:abc', '--band', '15k:16k'], ['--band', 'abc']],
    ['mixed with --low/--high', ['--band', '10k:14k', '--band', '15k:16k', '--low', '1k', '--high', '2k'], ['--band', '--low']],
    ['spacing with one band', ['--band', '10k:14k', '--spacing', '1k'], ['--spacing']],
    ['a range of more windows than one question may hold', ['--band', '10k:14k', '--band', '1G:1.000001G'], ['--min-rate', 'windows']],
    ['negative spacing', ['--band', '10k:14k', '--band', '15k:16k', '--spacing', '-1k'], ['--spacing', '-1k']],
  ])('refuses %s with one line and exit 2', (_, args, named) => expectRefusal(runBin('windows', ...args), ...named));
});
