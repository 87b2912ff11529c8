import type { Command } from 'commander';
import { glossaryHelp } from '../../output/glossary-text.js';
import type { ExitCode, Io } from '../io.js';
import { helpWidth, withLayoutOptions, type LayoutOptions } from '../layout-options.js';

export interface SolveOptions extends LayoutOptions {
  goal?: string;
  outputRate?: string;
  rate?: string[];
  ppm?: string;
  json?: boolean;
  allChecks?: boolean;
  svg?: string;
  force?: boolean;
}

/**
 * `ifzone solve FILE`: the full plan of one scenario, or with --rate the
 * verdict on rates given. The work is imported when the command runs, so
 * that the scenario schema and the LP solver do not slow the start-up of
 * the light commands.
 *
 * @param program the ifzone program
 * @param io where the command writes
 * @param settle receives the exit status
 * @example addSolveCommand(new Command(), io, () => undefined) // undefined (then: ifzone solve scenarios/heron-base.json --rate 200M)
 */
export function addSolveCommand(program: Command, io: Io, settle: (code: ExitCode) => void): void {
  withLayoutOptions(program.command('solve'))
    .description('solve the frequency plan of a scenario file: windows, feasible rates, ranked candidates, margins')
    .argument('<file>', 'scenario file (JSON)')
    .option('--goal <goal>', 'widest-margin, lowest-rate, quarter-rate or decimation (overrides the scenario)')
    .option('--output-rate <freq>', 'output rate of the decimation goal, e.g. 30.72M (alone, it implies --goal decimation)')
    .option('--rate <freq...>', 'judge these rates instead of searching: every check and a verdict for each')
    .option('--ppm <ppm>', "drift judged with --rate, ±ppm (default: the scenario's tolerance)")
    .option('--json', 'print JSON for programs')
    .option(
      '--all-checks',
      'judge every candidate on every interferer and list them all (default: the first candidate in full, the others on the blocking interferers)',
    )
    .option(
      '--svg <file>',
      'also draw the rate map, the spectrum of the best candidate, the band-position chart and its anti-alias filter mask',
    )
    .option('--force', 'let --svg replace an existing file')
    .addHelpText('after', () => glossaryHelp('solve', helpWidth(io)))
    .action(async (file: string, options: SolveOptions) => {
      const { runSolve } = await import('./solve-action.js');
      settle(await runSolve(file, options, io));
    });
}
