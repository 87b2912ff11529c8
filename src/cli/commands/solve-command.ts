import type { Command } from 'commander';
import type { ExitCode, Io } from '../io.js';

export interface SolveOptions {
  goal?: string;
  outputRate?: string;
  json?: boolean;
  allChecks?: boolean;
  svg?: string;
  force?: boolean;
}

/**
 * `ifzone solve FILE`: the full plan of one scenario. The work is imported
 * when the command runs, so that the scenario schema and the LP solver do not
 * slow the start-up of the light commands.
 */
export function addSolveCommand(program: Command, io: Io, settle: (code: ExitCode) => void): void {
  program
    .command('solve')
    .description('solve the frequency plan of a scenario file: windows, feasible rates, ranked candidates, margins')
    .argument('<file>', 'scenario file (JSON)')
    .option('--goal <goal>', 'widest-margin, lowest-rate, quarter-rate or decimation (overrides the scenario)')
    .option('--output-rate <freq>', 'output rate for the decimation goal, e.g. 30.72M')
    .option('--json', 'print JSON for programs')
    .option('--all-checks', 'judge every candidate on every interferer and list them all (default: the first candidate in full, the others on the blocking interferers)')
    .option('--svg <file>', 'also draw the rate map, the spectrum of the best candidate, the band-position chart and its anti-alias filter mask')
    .option('--force', 'let --svg replace an existing file')
    .action(async (file: string, options: SolveOptions) => {
      const { runSolve } = await import('./solve-action.js');
      settle(await runSolve(file, options, io));
    });
}
