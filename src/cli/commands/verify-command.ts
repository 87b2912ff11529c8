import type { Command } from 'commander';
import { glossaryHelp } from '../../output/glossary-text.js';
import type { ExitCode, Io } from '../io.js';
import { helpWidth, withLayoutOptions, type LayoutOptions } from '../layout-options.js';

export interface VerifyOptions extends LayoutOptions {
  rate: string;
  tones: string;
  samples: string;
  json?: boolean;
  svg?: string;
  force?: boolean;
}

/**
 * `ifzone verify FILE --rate R [--svg OUT [--force]]`: a simulated capture at one rate set beside
 * the plan. Exit 0 when the capture agrees with the plan, 1 when it
 * contradicts it, 2 for bad input. The work is imported when the command
 * runs, so that it does not slow the start-up of the light commands.
 *
 * @param program the ifzone program
 * @param io where the command writes
 * @param settle receives the exit status
 * @example addVerifyCommand(new Command(), io, () => undefined) // undefined (then: ifzone verify scenarios/heron-base.json --rate 184.32M)
 */
export function addVerifyCommand(program: Command, io: Io, settle: (code: ExitCode) => void): void {
  withLayoutOptions(program.command('verify'))
    .description('simulate a capture at one rate and set it beside the plan: each predicted spur against the measured peaks')
    .argument('<file>', 'scenario file (JSON)')
    .requiredOption('--rate <freq>', 'sample rate of the capture, e.g. 184.32M')
    .option('--tones <count>', 'tones across the wanted band, 1 to 5 (1: a single tone at the strongest wanted level)', '3')
    .option('--samples <count>', 'record length, a power of two from 1024 to 1048576', '65536')
    .option('--json', 'print JSON for programs')
    .option('--svg <file>', 'also draw the measured spectrum with the predicted lines, the threshold, the peak floor and the wanted image')
    .option('--force', 'let --svg replace an existing file')
    .addHelpText('after', () => glossaryHelp('verify', helpWidth(io)))
    .action(async (file: string, options: VerifyOptions) => {
      const { runVerify } = await import('./verify-action.js');
      settle(runVerify(file, options, io));
    });
}
