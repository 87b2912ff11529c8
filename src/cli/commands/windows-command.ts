import type { Command } from 'commander';
import { hz } from '../../units/quantities.js';
import { parseFrequency } from '../../units/parse-frequency.js';
import { InputError } from '../../units/input-error.js';
import { windowsReport } from '../../report/windows-report.js';
import { guardedBand } from '../../math/band.js';
import { MOST_WINDOWS, windowCount } from '../../math/zone-span.js';
import { formatFrequency } from '../../units/format-frequency.js';
import { windowsTable } from '../../output/windows-table.js';
import { writeJson } from '../../output/json.js';
import { EXIT, type ExitCode, type Io } from '../io.js';
import { bandFromOptions, guardFromOptions, type BandOptions, type GuardOptions } from '../option-values.js';

interface WindowsOptions extends BandOptions, GuardOptions {
  minRate?: string;
  maxRate?: string;
  json?: boolean;
}

/** `ifzone windows`: every legal sampling-rate window of a band. */
export function addWindowsCommand(program: Command, io: Io, settle: (code: ExitCode) => void): void {
  program
    .command('windows')
    .description('list every legal band-pass sampling-rate window for a band')
    .option('--low <freq>', 'lower band edge, e.g. 60M')
    .option('--high <freq>', 'upper band edge, e.g. 80 MHz')
    .option('--center <freq>', 'band centre (with --width)')
    .option('--width <freq>', 'band width (with --center)')
    .option('--guard <freq>', 'guard band on each side, Hz or % of the width')
    .option('--guard-low <freq>', 'guard band below the band')
    .option('--guard-high <freq>', 'guard band above the band')
    .option('--min-rate <freq>', 'lowest rate to consider')
    .option('--max-rate <freq>', 'highest rate to consider')
    .option('--json', 'print JSON for programs')
    .action((options: WindowsOptions) => {
      const band = bandFromOptions(options);
      const guard = guardFromOptions(options, band);
      const minRate = options.minRate === undefined ? hz(0) : parseFrequency(options.minRate, '--min-rate');
      const maxRate = options.maxRate === undefined ? hz(Infinity) : parseFrequency(options.maxRate, '--max-rate');
      if (maxRate < minRate) throw new InputError('--max-rate', `a rate not below --min-rate (${options.minRate})`, options.maxRate ?? '');
      const guarded = guardedBand(band, guard);
      const count = windowCount(guarded, minRate, maxRate);
      if (count > MOST_WINDOWS) {
        const words = `a rate range holding at most ${MOST_WINDOWS} windows; raise --min-rate${options.maxRate === undefined ? ' or give --max-rate' : ' or lower --max-rate'}`;
        throw new InputError('--min-rate', words, `${options.minRate ?? '0'}: the range holds about ${count} windows for this ${formatFrequency(guarded.high - guarded.low)} band`);
      }
      const report = windowsReport(band, guard, { minRate, maxRate });
      if (options.json) writeJson(report, io.out);
      else io.out(windowsTable(report));
      settle(report.windows.length > 0 ? EXIT.answered : EXIT.noAnswer);
    });
}
