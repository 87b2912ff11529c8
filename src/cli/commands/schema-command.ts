import type { Command } from 'commander';
import { EXIT, type ExitCode, type Io } from '../io.js';

/**
 * `ifzone schema`: prints the JSON Schema of scenario files. The schema
 * module (and zod with it) loads only when the command runs, so other
 * commands start without it.
 */
export function addSchemaCommand(program: Command, io: Io, settle: (code: ExitCode) => void): void {
  program
    .command('schema')
    .description('print the JSON Schema (draft 2020-12) of scenario files, for editors')
    .action(async () => {
      const { scenarioJsonSchema } = await import('../../scenario/scenario-json-schema.js');
      io.out(`${JSON.stringify(scenarioJsonSchema(), null, 2)}\n`);
      settle(EXIT.answered);
    });
}
