import { readFileSync } from 'node:fs';
import type { Scenario } from '../scenario/scenario.js';
import { resolveScenario } from '../scenario/resolve-scenario.js';

/**
 * Reads a scenario file from disk, following its `extends` chain, and
 * validates it. The shell side of resolveScenario: node:fs does the reading
 * and its error codes become short reasons for the message.
 *
 * @param path the scenario file, relative to the working directory or absolute
 * @returns the validated scenario
 * @throws ScenarioError (an InputError: exit 2) naming the file and path of each issue
 * @example readScenarioFile('scenarios/heron-base.json').converter.bits // 14
 */
export function readScenarioFile(path: string): Scenario {
  return resolveScenario(path, readTextFile);
}

/**
 * Reads a scenario file like readScenarioFile, and also names every file read
 * on the way (the file and its extends chain), so that a command can refuse
 * to write over its own inputs.
 */
export function readScenarioWithInputs(path: string): { scenario: Scenario; inputs: string[] } {
  const inputs: string[] = [];
  const scenario = resolveScenario(path, (file) => {
    inputs.push(file);
    return readTextFile(file);
  });
  return { scenario, inputs };
}

const REASONS: Readonly<Record<string, string>> = {
  ENOENT: 'no such file',
  EISDIR: 'a directory, not a file',
  EACCES: 'permission denied',
  EPERM: 'permission denied',
  ENOTDIR: 'a path through something that is not a directory',
};

/** Reads a UTF-8 text file, turning fs failures into short reasons. */
export function readTextFile(path: string): string {
  try {
    return readFileSync(path, 'utf8');
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code ?? '';
    throw new Error(REASONS[code] ?? (error instanceof Error ? error.message : String(error)), { cause: error });
  }
}
