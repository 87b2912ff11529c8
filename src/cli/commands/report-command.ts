import type { Command } from 'commander';
import { glossaryHelp } from '../../output/glossary-text.js';
import type { ExitCode, Io } from '../io.js';
import { helpWidth } from '../layout-options.js';

export interface ReportOptions {
  html: string;
  force?: boolean;
}

/** `ifzone report FILE... --html OUT`: one self-contained page for a design review. */
export function addReportCommand(program: Command, io: Io, settle: (code: ExitCode) => void, version: string): void {
  program
    .command('report')
    .description('write one self-contained HTML page for a design review: inputs, windows, feasible set, candidates, pictures, cautions')
    .argument('<file...>', 'scenario files (JSON); several make a comparison of variants')
    .requiredOption('--html <out>', 'the HTML file to write')
    .option('--force', 'replace an existing file')
    .addHelpText('after', () => glossaryHelp('report', helpWidth(io)))
    .action(async (files: string[], options: ReportOptions) => {
      const { runReport } = await import('./report-action.js');
      settle(runReport(files, options, io, version));
    });
}
