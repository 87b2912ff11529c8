import { closeSync, constants, fstatSync, openSync, readSync, statSync, type Stats } from 'node:fs';
import type { Scenario } from '../scenario/scenario.js';
import { resolveScenario } from '../scenario/resolve-scenario.js';
import { deriveInterfererList } from '../interferers/derive-interferers.js';

/** The work bounds on the derived interferers, refused as an issue of the file (deriveInterfererList throws them). */
const planWork = (scenario: Scenario): void => void deriveInterfererList(scenario);

/**
 * Reads a scenario file from disk, following its `extends` chain, and
 * validates it, including the work bounds of its interferers. The shell side of resolveScenario: node:fs does the reading
 * and its error codes become short reasons for the message.
 *
 * @param path the scenario file, relative to the working directory or absolute
 * @returns the validated scenario
 * @throws ScenarioError (an InputError: exit 2) naming the file and path of each issue
 * @example readScenarioFile('scenarios/heron-base.json').converter.bits // 14
 */
export function readScenarioFile(path: string): Scenario {
  return resolveScenario(path, readTextFile, planWork);
}

/**
 * Reads a scenario file like readScenarioFile, and also names every file read
 * on the way (the file and its extends chain), so that a command can refuse
 * to write over its own inputs.
 */
export function readScenarioWithInputs(path: string): { scenario: Scenario; inputs: string[] } {
  const inputs: string[] = [];
  const scenario = resolveScenario(
    path,
    (file) => {
      inputs.push(file);
      return readTextFile(file);
    },
    planWork,
  );
  return { scenario, inputs };
}

/** Largest scenario file read, bytes: scenarios are a few kilobytes; a megabyte is already a mistake. */
export const MOST_SCENARIO_BYTES = 1024 * 1024;

const REASONS: Readonly<Record<string, string>> = {
  ENOENT: 'no such file',
  EISDIR: 'a directory, not a file',
  EACCES: 'permission denied',
  EPERM: 'permission denied',
  ENOTDIR: 'a path through something that is not a directory',
  ELOOP: 'a loop of symbolic links',
  ENAMETOOLONG: 'a path too long for the system',
};

/**
 * Reads a UTF-8 text file, turning fs failures into short reasons. Only a
 * regular file is read, and only when it is at most MOST_SCENARIO_BYTES:
 * both are checked on the path before opening (so a FIFO is never opened
 * and cannot block) and again on the open descriptor (in case the path
 * changed between), and the read stops one byte past the limit whatever the
 * size said (a file that grows while read).
 *
 * @param path the file
 * @returns its text
 * @throws Error whose message is the reason, e.g. `a FIFO (named pipe), not a regular file`
 * @example readTextFile('scenarios/heron-base.json').startsWith('{') // true
 */
export function readTextFile(path: string): string {
  try {
    refuseUnlessSmallRegularFile(statSync(path));
    // O_NONBLOCK: should the path have become a FIFO since the check, opening it does not wait for a writer.
    const fd = openSync(path, constants.O_RDONLY | constants.O_NONBLOCK);
    try {
      refuseUnlessSmallRegularFile(fstatSync(fd));
      const buffer = Buffer.alloc(MOST_SCENARIO_BYTES + 1);
      let length = 0;
      for (let read = -1; read !== 0 && length < buffer.length; length += read)
        read = readSync(fd, buffer, length, buffer.length - length, null);
      if (length > MOST_SCENARIO_BYTES) throw new Error(tooLarge(length));
      return buffer.toString('utf8', 0, length);
    } finally {
      closeSync(fd);
    }
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code ?? '';
    throw new Error(REASONS[code] ?? (error instanceof Error ? error.message : String(error)), { cause: error });
  }
}

function refuseUnlessSmallRegularFile(stats: Stats): void {
  if (!stats.isFile()) throw new Error(`${kindOf(stats)}, not a regular file`);
  if (stats.size > MOST_SCENARIO_BYTES) throw new Error(tooLarge(stats.size));
}

function tooLarge(bytes: number): string {
  return `${bytes} bytes, more than a scenario's limit of ${MOST_SCENARIO_BYTES} bytes (1 MiB)`;
}

function kindOf(stats: Stats): string {
  if (stats.isDirectory()) return 'a directory';
  if (stats.isFIFO()) return 'a FIFO (named pipe)';
  if (stats.isCharacterDevice()) return 'a character device';
  if (stats.isBlockDevice()) return 'a block device';
  if (stats.isSocket()) return 'a socket';
  return 'not a file';
}
