import { spawnSync } from 'node:child_process';
import { join } from 'node:path';
import { ROOT } from '../helpers/run-bin.js';

const scenario = (name: string) => join('scenarios', `${name}.json`);

/** name → the command line; a `{out}` argument is a file the command writes, which is the example. */
export const TEXT_EXAMPLES: ReadonlyArray<readonly [string, readonly string[]]> = [
  ['windows.txt', ['windows', '--center', '140M', '--width', '20M', '--guard', '2M', '--min-rate', '40M', '--max-rate', '250M']],
  ['windows-bands.txt', ['windows', '--band', '10k:14k', '--band', '16k:18k', '--spacing', '1k']],
  ['alias.txt', ['alias', '--rate', '122.88M', '140M', '10M', '280M', '19.2M']],
  ['solve-heron-base.txt', ['solve', scenario('heron-base')]],
  ['solve-heron-lowif.txt', ['solve', scenario('heron-lowif')]],
  ['solve-heron-narrow.txt', ['solve', scenario('heron-narrow')]],
  ['solve-heron-wide.txt', ['solve', scenario('heron-wide')]],
  ['solve-decimation.txt', ['solve', scenario('heron-base'), '--output-rate', '30.72M']],
  ['solve-quarter-rate.txt', ['solve', scenario('heron-base'), '--goal', 'quarter-rate']],
  ['solve-rates.txt', ['solve', scenario('heron-base'), '--rate', '200M', '184.32M']],
  ['compare-heron-base.txt', ['compare', scenario('heron-base')]],
  ['compare-family.txt', ['compare', scenario('heron-base'), scenario('heron-lowif'), scenario('heron-narrow'), scenario('heron-wide')]],
  [
    'compare-family.csv',
    ['compare', scenario('heron-base'), scenario('heron-lowif'), scenario('heron-narrow'), scenario('heron-wide'), '--csv'],
  ],
  ['solve-heron-dual.txt', ['solve', scenario('heron-dual')]],
  ['compare-dual.txt', ['compare', scenario('heron-base'), scenario('heron-dual')]],
  ['compare-dual.csv', ['compare', scenario('heron-base'), scenario('heron-dual'), '--csv']],
  ['verify-heron-base.txt', ['verify', scenario('heron-base'), '--rate', '184.32M']],
  ['verify-failing-rate.txt', ['verify', scenario('heron-base'), '--rate', '245.76M']],
  ['verify-heron-dual.txt', ['verify', scenario('heron-dual'), '--rate', '184.32M', '--samples', '16384']],
];

export const FILE_EXAMPLES: ReadonlyArray<readonly [string, readonly string[]]> = [
  ['solve-heron-base.svg', ['solve', scenario('heron-base'), '--svg', '{out}']],
  ['compare-family.svg', ['compare', scenario('heron-base'), scenario('heron-narrow'), '--svg', '{out}']],
  ['verify-heron-base.svg', ['verify', scenario('heron-base'), '--rate', '184.32M', '--samples', '16384', '--svg', '{out}']],
  ['report-heron-narrow.html', ['report', scenario('heron-narrow'), '--html', '{out}']],
];

/** Runs bin/ifzone with standard output a pipe (so 100 columns) and a fixed date for the HTML page. */
export function runExample(args: readonly string[], file?: string) {
  const argv = args.map((a) => (a === '{out}' ? file! : a));
  return spawnSync(process.execPath, ['bin/ifzone', ...argv], {
    cwd: ROOT,
    encoding: 'utf8',
    env: { ...process.env, SOURCE_DATE_EPOCH: '1790000000' },
  });
}
