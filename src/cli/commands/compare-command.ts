import type { Command } from 'commander';
import { glossaryHelp } from '../../output/glossary-text.js';
import type { ExitCode, Io } from '../io.js';
import { helpWidth, withLayoutOptions, type LayoutOptions } from '../layout-options.js';

export interface CompareOptions extends LayoutOptions {
  json?: boolean;
  csv?: boolean;
  output?: string;
  svg?: string;
  force?: boolean;
}

/**
 * `ifzone compare FILE...`: the clock parts of one scenario, or of several
 * variants side by side with the one-part-for-the-family answer. The work is
 * imported when the command runs (zod, the LP solver).
 */
export function addCompareCommand(program: Command, io: Io, settle: (code: ExitCode) => void): void {
  withLayoutOptions(program.command('compare'))
    .description('compare the clock parts of one scenario, or of several variants, and find one part for the family')
    .argument('<file...>', 'scenario files (JSON), one per variant')
    .option('--json', 'print JSON for programs')
    .option('--csv', 'print CSV for spreadsheets')
    .option('-o, --output <file>', 'write the table, JSON or CSV to a file instead of standard output')
    .option('--svg <file>', "also draw each variant's rate map with the parts marked")
    .option('--force', 'let --output and --svg replace existing files')
    .addHelpText('after', () => glossaryHelp('compare', helpWidth(io)))
    .action(async (files: string[], options: CompareOptions) => {
      const { runCompare } = await import('./compare-action.js');
      settle(runCompare(files, options, io));
    });
}
