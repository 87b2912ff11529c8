import type { Command } from 'commander';
import type { ExitCode, Io } from '../io.js';
import { withLayoutOptions, type LayoutOptions } from '../layout-options.js';

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

/** What the candidate table's columns and words mean, for --help. */
const COLUMNS_HELP = `
Columns of the candidate table:
  candidate      a clock part by its label, "best in A–B MHz" (the goal's best rate of that
                 feasible interval), or a rate given with --rate
  rate           the nominal sampling rate, to 1 Hz
  zone           Nyquist zone of the wanted band; "inv": the band arrives inverted
  worst margin   least distance, over the whole tolerance, from any blocking interferer's
                 alias (or a zone edge) to the wanted band's alias; negative: overlap width
  limited by     the check with the least margin beyond its requirement
  decimation factor      rate ÷ output rate (decimation goal); parts must give a whole one
  centre from odd·rate/4 input centre minus the nearest odd multiple of rate/4 (quarter-rate)
  tolerance      the clock's ±drift judged; ppm up to 10 000, per cent beyond
  NCO            where the band's centre lands after sampling: the digital down-converter's tuning
  settings       rate = f × N / M ÷ D: "direct", "÷D" (divider), "×N ÷D" or "×N/M ÷D" (synthesiser)
  drift room     how far the nominal rate may move down / up before its first check fails
  jitter SNR     −20·log10(2π·f·σ) at the band's top edge, part and aperture jitter combined
  channel SNR    jitter and quantisation SNR with the processing gain of decimating to the channel
Checks: margin is the least distance over the tolerance (negative: overlap); level dBFS at the
converter, "< −200" for lower; level margin = threshold − level (≥ 0: too weak to block);
blocks: strong enough to count.`;

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
    .addHelpText('after', COLUMNS_HELP)
    .action(async (file: string, options: SolveOptions) => {
      const { runSolve } = await import('./solve-action.js');
      settle(await runSolve(file, options, io));
    });
}
