import type { Command } from 'commander';
import type { ExitCode, Io } from '../io.js';

export interface InitOptions {
  from?: string;
  force?: boolean;
}

/** `ifzone init [FILE]`: a starter scenario, or with --from a variant extending an existing one (work imported when it runs). */
export function addInitCommand(program: Command, io: Io, settle: (code: ExitCode) => void): void {
  program
    .command('init')
    .description('write a starter scenario file, or with --from a variant that extends an existing one')
    .argument('[file]', 'where to write it (standard output when left out)')
    .option('--from <base>', 'write a variant extending this scenario file')
    .option('--force', 'replace an existing file')
    .action(async (file: string | undefined, options: InitOptions) => {
      const { runInit } = await import('./init-action.js');
      settle(runInit(file, options, io));
    });
}
