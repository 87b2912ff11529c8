import { dirname, relative, resolve, sep } from 'node:path';
import { fileURLToPath } from 'node:url';
import { starterScenario, variantScenario } from '../../scenario/starter-scenario.js';
import { readScenarioWithInputs } from '../read-scenario.js';
import { writeFileSafely } from '../safe-write.js';
import { EXIT, type ExitCode, type Io } from '../io.js';
import type { InitOptions } from './init-command.js';

/** The committed JSON Schema of scenario files, beside the demo scenarios. */
const SCHEMA_FILE = fileURLToPath(new URL('../../../scenarios/ifzone-scenario.schema.json', import.meta.url));

/** Writes (or prints) a starter scenario, or a variant extending --from; exit 0. */
export function runInit(file: string | undefined, options: InitOptions, io: Io): ExitCode {
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
  return EXIT.answered;
}

/** A path from a folder to a file, with forward slashes, starting ./ when it does not climb. */
function relativeReference(folder: string, target: string): string {
  const path = relative(folder, target).split(sep).join('/');
  return path.startsWith('.') ? path : `./${path}`;
}
