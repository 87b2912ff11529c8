import * as nodeFs from 'node:fs';
import { randomBytes } from 'node:crypto';
import { basename, dirname, join, resolve } from 'node:path';
import { InputError } from '../units/input-error.js';

/** The file-system calls a safe write makes; node:fs by default, a shim in tests. */
export type SafeWriteFs = Pick<
  typeof nodeFs,
  'lstatSync' | 'statSync' | 'realpathSync' | 'openSync' | 'writeSync' | 'fsyncSync' | 'closeSync' | 'renameSync' | 'linkSync' | 'unlinkSync'
>;

export interface SafeWriteOptions {
  /** Replace an existing file (never one of `inputs`). */
  readonly force?: boolean;
  /** Files the command read: never written over, even with force. */
  readonly inputs?: readonly string[];
  /** File-system calls to use (tests inject failures); default node:fs. */
  readonly fs?: SafeWriteFs;
}

export const EXISTS_EXPECTED = 'a path that does not exist yet; add --force to overwrite';
export const INPUT_EXPECTED = 'a path other than an input file of this command';

/**
 * Writes a file so that readers see the old content or the new, never a
 * part: the text goes to a temporary file in the same directory, is flushed
 * to disk (fsync), then moved into place. Without force, the move is a hard
 * link, which the system refuses when the path exists (no window between a
 * check and the write); with force, a rename, which replaces it. The
 * temporary file is removed whatever fails.
 *
 * @param path where to write
 * @param content text, written as UTF-8
 * @param options force, the command's input files, an fs shim
 * @throws InputError (where = path) when the path exists and force is off,
 *   or when it is one of the inputs (same real path, or the same file by
 *   device and inode) even with force; the file is left untouched
 * @throws the file system's error when writing fails; the old file, if any, is intact
 * @example writeFileSafely('plan.svg', svg, { force: false, inputs: ['heron.json'] })
 */
export function writeFileSafely(path: string, content: string, options: SafeWriteOptions = {}): void {
  const fs = options.fs ?? nodeFs;
  const target = resolve(path);
  const existing = fs.lstatSync(target, { throwIfNoEntry: false });
  if (isAnInput(fs, target, options.inputs ?? [])) throw new InputError(path, INPUT_EXPECTED, path);
  if (existing && !options.force) throw new InputError(path, EXISTS_EXPECTED, path);

  const temporary = join(dirname(target), `.${basename(target)}.${process.pid}.${randomBytes(6).toString('hex')}.tmp`);
  let fd: number | null = null;
  try {
    fd = fs.openSync(temporary, 'wx', 0o666);
    const bytes = Buffer.from(content, 'utf8');
    for (let written = 0; written < bytes.length; ) written += fs.writeSync(fd, bytes, written, bytes.length - written);
    fs.fsyncSync(fd);
    fs.closeSync(fd);
    fd = null;
    if (options.force) fs.renameSync(temporary, target);
    else moveIntoFreePath(fs, temporary, target, path);
  } catch (error) {
    if (fd !== null) ignoreFailure(() => fs.closeSync(fd!));
    ignoreFailure(() => fs.unlinkSync(temporary));
    throw error;
  }
}

/** Links the temporary file to a path that must not exist, then drops the temporary name. */
function moveIntoFreePath(fs: SafeWriteFs, temporary: string, target: string, shown: string): void {
  try {
    fs.linkSync(temporary, target);
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code;
    if (code === 'EEXIST') throw new InputError(shown, EXISTS_EXPECTED, shown);
    // Some file systems have no hard links: check once more and rename instead.
    if (code !== 'EPERM' && code !== 'ENOTSUP' && code !== 'EOPNOTSUPP' && code !== 'ENOSYS') throw error;
    if (fs.lstatSync(target, { throwIfNoEntry: false })) throw new InputError(shown, EXISTS_EXPECTED, shown);
    fs.renameSync(temporary, target);
    return;
  }
  fs.unlinkSync(temporary);
}

/** Whether the target is one of the inputs: the same real path, or the same file (a hard link). */
function isAnInput(fs: SafeWriteFs, target: string, inputs: readonly string[]): boolean {
  if (inputs.length === 0) return false;
  const realTarget = realPathOf(fs, target);
  const targetStat = fs.statSync(target, { throwIfNoEntry: false });
  return inputs.some((input) => {
    const realInput = realPathOf(fs, resolve(input));
    if (realInput === realTarget) return true;
    const inputStat = fs.statSync(input, { throwIfNoEntry: false });
    return targetStat !== undefined && inputStat !== undefined && targetStat.dev === inputStat.dev && targetStat.ino === inputStat.ino;
  });
}

/** The real path of a file, or of its directory joined with its name when the file does not exist yet. */
function realPathOf(fs: SafeWriteFs, path: string): string {
  try {
    return fs.realpathSync(path);
  } catch {
    try {
      return join(fs.realpathSync(dirname(path)), basename(path));
    } catch {
      return path;
    }
  }
}

function ignoreFailure(action: () => void): void {
  try {
    action();
  } catch {
    // Cleaning up after a failure: the first error is the one to report.
  }
}
