import type { Command } from 'commander';
import { dirname, relative, resolve, sep } from 'node:path';
import { fileURLToPath } from 'node:url';
import { starterScenario, variantScenario } from '../../scenario/starter-scenario.js';
import { readScenarioWithInputs } from '../read-scenario.js';
import { writeFileSafely } from '../safe-write.js';
import { EXIT, type ExitCode, type Io } from '../io.js';

interface InitOptions {
  from?: string;
  force?: boolean;
}

/** The committed JSON Schema of scenario files, beside the demo scenarios. */
const SCHEMA_FILE = fileURLToPath(new URL('../../../scenarios/ifzone-scenario.schema.json', import.meta.url));

/** `ifzone init [FILE]`: a starter scenario, or with --from a variant extending an existing one. */
export function addInitCommand(program: Command, io: Io, settle: (code: ExitCode) => void): void {
  program
    .command('init')
    .description('write a starter scenario file, or with --from a variant that extends an existing one')
    .argument('[file]', 'where to write it (standard output when left out)')
    .option('--from <base>', 'write a variant extending this scenario file')
    .option('--force', 'replace an existing file')
    .action((file: string | undefined, options: InitOptions) => {
      const folder = file === undefined ? process.cwd() : dirname(resolve(file));
      const schema = relativeReference(folder, SCHEMA_FILE);
      let document: Record<string, unknown>;
      let inputs: string[] = [];
      if (options.from === undefined) {
        document = starterScenario(schema);
      } else {
        const base = readScenarioWithInputs(options.from);
        inputs = base.inputs;
        document = variantScenario(schema, relativeReference(folder, resolve(options.from)), base.scenario.name);
      }
      const text = JSON.stringify(document, null, 2) + '\n';
      if (file === undefined) io.out(text);
      else writeFileSafely(file, text, { force: options.force === true, inputs });
      settle(EXIT.answered);
    });
}

/** A path from a folder to a file, with forward slashes, starting ./ when it does not climb. */
function relativeReference(folder: string, target: string): string {
  const path = relative(folder, target).split(sep).join('/');
  return path.startsWith('.') ? path : `./${path}`;
}
