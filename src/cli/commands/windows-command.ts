import type { Command } from 'commander';
import { glossaryHelp } from '../../output/glossary-text.js';
import { hz } from '../../units/quantities.js';
import { parseFrequency } from '../../units/parse-frequency.js';
import { InputError } from '../../units/input-error.js';
import { windowsReport } from '../../report/windows-report.js';
import { guardedBand, type Band } from '../../math/band.js';
import { MOST_WINDOWS, windowCount } from '../../math/zone-span.js';
import { formatFrequency } from '../../units/format-frequency.js';
import { windowsTable } from '../../output/windows-table.js';
import { writeJson } from '../../output/json.js';
import { jointWindowsReport } from '../../report/joint-windows-report.js';
import { jointWindowsTable } from '../../output/joint-windows-table.js';
import { EXIT, type ExitCode, type Io } from '../io.js';
import { helpWidth, layoutWidth, withLayoutOptions, type LayoutOptions } from '../layout-options.js';
import { bandFromOptions, bandFromPair, guardFromOptions, type BandOptions, type GuardOptions } from '../option-values.js';

interface WindowsOptions extends BandOptions, GuardOptions, LayoutOptions {
  minRate?: string;
  maxRate?: string;
  json?: boolean;
  band?: string[];
  spacing?: string;
}

/** Collects a repeated option's values in the order given. */
const collect = (value: string, previous: string[] = []) => [...previous, value];

/** `ifzone windows`: every legal sampling-rate window of a band. */
export function addWindowsCommand(program: Command, io: Io, settle: (code: ExitCode) => void): void {
  withLayoutOptions(program.command('windows'), true)
    .description('list every legal band-pass sampling-rate window for a band, or the rates valid for several bands together')
    .option('--low <freq>', 'lower band edge, e.g. 60M')
    .option('--high <freq>', 'upper band edge, e.g. 80 MHz')
    .option('--center <freq>', 'band centre (with --width)')
    .option('--width <freq>', 'band width (with --center)')
    .option('--guard <freq>', 'guard band on each side, Hz or % of the width')
    .option('--guard-low <freq>', 'guard band below the band')
    .option('--guard-high <freq>', 'guard band above the band')
    .option('--min-rate <freq>', 'lowest rate to consider')
    .option('--max-rate <freq>', 'highest rate to consider')
    .option('--band <low:high>', 'a band as LOW:HIGH, e.g. 1574.4M:1576.4M; give it again for each band sampled with it', collect)
    .option('--spacing <freq>', "with several --band: least distance kept between two bands' aliases (default 0)")
    .option('--json', 'print JSON for programs')
    .addHelpText('after', () => glossaryHelp('windows', helpWidth(io)))
    .action((options: WindowsOptions) => {
      const bands = bandsFromOptions(options);
      const band = bands[0]!;
      const guard = guardFromOptions(options, band);
      const minRate = options.minRate === undefined ? hz(0) : parseFrequency(options.minRate, '--min-rate');
      const maxRate = options.maxRate === undefined ? hz(Infinity) : parseFrequency(options.maxRate, '--max-rate');
      if (maxRate < minRate) throw new InputError('--max-rate', `a rate not below --min-rate (${options.minRate})`, options.maxRate ?? '');
      for (const each of bands) {
        const guarded = guardedBand(each, guardFromOptions(options, each));
        const count = windowCount(guarded, minRate, maxRate);
        if (count > MOST_WINDOWS) {
          const words = `a rate range holding at most ${MOST_WINDOWS} windows; raise --min-rate${options.maxRate === undefined ? ' or give --max-rate' : ' or lower --max-rate'}`;
          throw new InputError(
            '--min-rate',
            words,
            `${options.minRate ?? '0'}: the range holds about ${count} windows for this ${formatFrequency(guarded.high - guarded.low)} band`,
          );
        }
      }
      if (bands.length > 1) {
        const spacing = options.spacing === undefined ? hz(0) : parseFrequency(options.spacing, '--spacing');
        const joint = jointWindowsReport(
          bands.map((b) => ({ band: b, guard: guardFromOptions(options, b) })),
          spacing,
          { minRate, maxRate },
        );
        if (options.json) writeJson(joint, io.out);
        else io.out(jointWindowsTable(joint, layoutWidth({ ...options, width: undefined }, io)));
        settle(joint.intervals.length > 0 ? EXIT.answered : EXIT.noAnswer);
        return;
      }
      const report = windowsReport(band, guard, { minRate, maxRate });
      if (options.json) writeJson(report, io.out);
      else io.out(windowsTable(report, layoutWidth({ ...options, width: undefined }, io)));
      settle(report.windows.length > 0 ? EXIT.answered : EXIT.noAnswer);
    });
}

/** The bands asked for: every --band, or the one band of --low/--high or --center/--width; never both forms. */
function bandsFromOptions(options: WindowsOptions): Band[] {
  const given = options.band ?? [];
  if (given.length === 0) {
    if (options.spacing !== undefined) throw new InputError('--spacing', 'two or more --band options with --spacing', 'one band');
    return [bandFromOptions(options)];
  }
  const single = [options.low, options.high, options.center, options.width].some((v) => v !== undefined);
  if (single) throw new InputError('--band', 'either --band options, or --low/--high or --center/--width, not both', 'both');
  if (given.length === 1 && options.spacing !== undefined) {
    throw new InputError('--spacing', 'two or more --band options with --spacing', 'one band');
  }
  return given.map((text) => bandFromPair(text, '--band'));
}
