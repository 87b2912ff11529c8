import * as nodeFs from 'node:fs';
import { basename, dirname, join, resolve } from 'node:path';
import { InputError } from '../units/input-error.js';

/** The file-system calls a safe write makes; node:fs by default, a shim in tests. */
export type SafeWriteFs = Pick<
  typeof nodeFs,
  | 'lstatSync'
  | 'statSync'
  | 'realpathSync'
  | 'openSync'
  | 'writeSync'
  | 'fsyncSync'
  | 'closeSync'
  | 'renameSync'
  | 'linkSync'
  | 'unlinkSync'
  | 'fchmodSync'
>;

export interface SafeWriteOptions {
  /** Replace an existing regular file (never one of `inputs`). */
  readonly force?: boolean;
  /** Files the command read: never written over, even with force. */
  readonly inputs?: readonly string[];
  /** File-system calls to use (tests inject failures); default node:fs. */
  readonly fs?: SafeWriteFs;
}

/** One file a command writes. */
export interface OutputFile {
  readonly path: string;
  readonly content: string;
}

export const EXISTS_EXPECTED = 'exists; add --force to replace it';
export const INPUT_EXPECTED = 'a path other than an input file of this command';
export const WRITABLE_EXPECTED = 'a file ifzone can write';

/**
 * Checks every output path of a command before its computation starts, so
 * that a refusal never comes after minutes of work: each path must differ
 * from the others and from the command's inputs, and must not exist — or,
 * with force, be a regular file (not a directory, device, FIFO or socket,
 * and not a symbolic link, which is refused rather than written through).
 * Its directory must exist.
 *
 * @param paths the output paths as the user gave them
 * @param options force, the command's input files, an fs shim
 * @throws InputError naming the path as given, and what is wrong with it
 * @example checkOutputPaths([join(root, 'package.json')], { force: false, inputs: [] }) // throws (the file exists and force is off)
 */
export function checkOutputPaths(paths: readonly string[], options: SafeWriteOptions = {}): void {
  const fs = options.fs ?? nodeFs;
  const seen = new Map<string, string>();
  for (const path of paths) {
    const target = resolve(path);
    const earlier = seen.get(realPathOf(fs, target));
    if (earlier !== undefined) throw new InputError(path, `a path other than another output of this command (${earlier})`, path);
    seen.set(realPathOf(fs, target), path);
    if (isAnInput(fs, target, options.inputs ?? [])) throw new InputError(path, INPUT_EXPECTED, path);
    const existing = fs.lstatSync(target, { throwIfNoEntry: false });
    if (!existing) {
      const folder = fs.statSync(dirname(target), { throwIfNoEntry: false });
      if (!folder?.isDirectory())
        throw new InputError(
          path,
          'a path in an existing directory',
          `${dirname(path)}: ${folder ? 'not a directory' : 'no such directory'}`,
        );
      continue;
    }
    if (!options.force) throw new InputError(path, EXISTS_EXPECTED, path);
    if (existing.isSymbolicLink()) {
      throw new InputError(
        path,
        'a regular file to replace, not a symbolic link (ifzone does not write through links; give the file it points to)',
        `a link to ${realPathOf(fs, target)}`,
      );
    }
    if (!existing.isFile()) throw new InputError(path, 'a regular file to replace', kindOf(existing));
  }
}

/**
 * Writes a file so that readers see the old content or the new, never a
 * part; see writeFilesSafely.
 *
 * @param path where to write
 * @param content text, written as UTF-8
 * @param options force, the command's input files, an fs shim
 * @throws InputError as checkOutputPaths, or when writing fails (naming the path and the system's reason)
 * @example writeFileSafely(join(tmp, 'plan.svg'), '<svg/>', { force: false, inputs: ['heron.json'] }) // undefined
 */
export function writeFileSafely(path: string, content: string, options: SafeWriteOptions = {}): void {
  writeFilesSafely([{ path, content }], options);
}

/**
 * Writes a command's output files together: all of them or none. Each text
 * goes to a temporary file in its target's directory, is flushed to disk
 * (fsync) and given the mode of the file it replaces; only when every one is
 * ready are they moved into place. Without force the move is a hard link,
 * which the system refuses when the path exists (no window between a check
 * and the write); with force a rename, which replaces the file. Should a
 * move fail, the files already moved are put back as they were. Temporary
 * files are removed whatever fails, and on SIGINT or SIGTERM (the signal is
 * held until the write is done, then the process ends by it).
 *
 * @param files the paths and texts (UTF-8)
 * @param options force, the command's input files, an fs shim
 * @throws InputError as checkOutputPaths, or when writing fails: naming the
 *   path as given and the system's reason, e.g. `no space left on the device (ENOSPC)`
 * @example writeFilesSafely([{ path: join(tmp, 'map.svg'), content: '<svg/>' }, { path: join(tmp, 'parts.csv'), content: 'part,rate' }], { force: true }) // undefined
 */
export function writeFilesSafely(files: readonly OutputFile[], options: SafeWriteOptions = {}): void {
  const fs = options.fs ?? nodeFs;
  checkOutputPaths(
    files.map((file) => file.path),
    options,
  );
  const staged: Staged[] = [];
  holdSignals();
  try {
    for (const file of files) staged.push(stage(fs, file, options.force === true));
    commit(fs, staged);
  } finally {
    for (const item of staged) forget(fs, item.temporary);
    releaseSignals();
  }
}

interface Staged {
  readonly shown: string;
  readonly target: string;
  readonly temporary: string;
  readonly replaces: boolean;
}

function temporaryName(target: string, role: string): string {
  // The global Web Crypto loads Node's crypto module on first use, only when a file is written: importing node:crypto
  // would cost every start of the commands that can write files about 3 ms.
  const random = Array.from(crypto.getRandomValues(new Uint8Array(6)), (b) => b.toString(16).padStart(2, '0')).join('');
  return join(dirname(target), `.${basename(target)}.${process.pid}.${random}.${role}`);
}

/** Writes one text to a temporary file beside its target, flushed, with the mode of the file it replaces. */
function stage(fs: SafeWriteFs, file: OutputFile, force: boolean): Staged {
  const target = resolve(file.path);
  const existing = force ? fs.lstatSync(target, { throwIfNoEntry: false }) : undefined;
  const temporary = temporaryName(target, 'tmp');
  let fd: number | null = null;
  try {
    fd = fs.openSync(temporary, 'wx', 0o666);
    live.add(temporary);
    if (existing) fs.fchmodSync(fd, existing.mode & 0o7777);
    const bytes = Buffer.from(file.content, 'utf8');
    for (let written = 0; written < bytes.length;) written += fs.writeSync(fd, bytes, written, bytes.length - written);
    fs.fsyncSync(fd);
    fs.closeSync(fd);
    fd = null;
  } catch (error) {
    if (fd !== null) ignoreFailure(() => fs.closeSync(fd!));
    forget(fs, temporary);
    throw writeFailure(file.path, error);
  }
  return { shown: file.path, target, temporary, replaces: existing !== undefined };
}

/** Moves every staged file into place, or, when one move fails, puts back those already moved. */
function commit(fs: SafeWriteFs, staged: readonly Staged[]): void {
  const done: Array<{ readonly item: Staged; readonly backup: string | null }> = [];
  for (const item of staged) {
    const backup = item.replaces ? keepOld(fs, item.target) : null;
    try {
      if (item.replaces) {
        fs.renameSync(item.temporary, item.target);
        live.delete(item.temporary);
      } else moveIntoFreePath(fs, item);
    } catch (error) {
      if (backup !== null) forget(fs, backup);
      for (const { item: earlier, backup: old } of done.reverse()) {
        if (old !== null) {
          ignoreFailure(() => fs.renameSync(old, earlier.target));
          live.delete(old);
        } else if (!earlier.replaces) ignoreFailure(() => fs.unlinkSync(earlier.target));
        // A replaced file with no second name (no hard links here) cannot be put back; the new one stays whole.
      }
      throw writeFailure(item.shown, error);
    }
    done.push({ item, backup });
  }
  for (const { backup } of done) if (backup !== null) forget(fs, backup);
}

/** A second name for the file about to be replaced, so that a failed commit can put it back; null where links are not supported. */
function keepOld(fs: SafeWriteFs, target: string): string | null {
  const backup = temporaryName(target, 'old');
  try {
    fs.linkSync(target, backup);
    live.add(backup);
    return backup;
  } catch {
    return null;
  }
}

/** Links the temporary file to a path that must not exist, then drops the temporary name. */
function moveIntoFreePath(fs: SafeWriteFs, item: Staged): void {
  try {
    fs.linkSync(item.temporary, item.target);
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code;
    if (code === 'EEXIST') throw new InputError(item.shown, EXISTS_EXPECTED, item.shown);
    // Some file systems have no hard links: check once more and rename instead.
    if (code !== 'EPERM' && code !== 'ENOTSUP' && code !== 'EOPNOTSUPP' && code !== 'ENOSYS') throw error;
    if (fs.lstatSync(item.target, { throwIfNoEntry: false })) throw new InputError(item.shown, EXISTS_EXPECTED, item.shown);
    fs.renameSync(item.temporary, item.target);
    live.delete(item.temporary);
    return;
  }
  forget(fs, item.temporary);
}

const REASONS: Readonly<Record<string, string>> = {
  EACCES: 'permission denied',
  EPERM: 'operation not permitted',
  EROFS: 'a read-only file system',
  ENOSPC: 'no space left on the device',
  EDQUOT: 'the disk quota is used up',
  EIO: 'an input/output error',
  ENOENT: 'no such directory',
  ENOTDIR: 'a path through something that is not a directory',
  EISDIR: 'a directory',
  ENAMETOOLONG: 'a name too long for the system',
  EMFILE: 'too many open files',
  EFBIG: 'a file too large for the file system',
};

/** A write failure as the user reads it: their path, and the system's reason in words with its code. */
function writeFailure(shown: string, error: unknown): InputError {
  if (error instanceof InputError) return error;
  const code = (error as NodeJS.ErrnoException).code;
  const words =
    code !== undefined ? `${REASONS[code] ?? 'the system refused'} (${code})` : error instanceof Error ? error.message : String(error);
  return new InputError(shown, WRITABLE_EXPECTED, words);
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

function kindOf(stats: nodeFs.Stats): string {
  if (stats.isDirectory()) return 'a directory';
  if (stats.isFIFO()) return 'a FIFO (named pipe)';
  if (stats.isCharacterDevice()) return 'a character device';
  if (stats.isBlockDevice()) return 'a block device';
  if (stats.isSocket()) return 'a socket';
  return 'not a regular file';
}

function ignoreFailure(action: () => void): void {
  try {
    action();
  } catch {
    // Cleaning up after a failure: the first error is the one to report.
  }
}

/*
 * Temporary files alive now, removed by the signal handlers. Writes are
 * synchronous, so a handler runs only once the write has finished or failed;
 * having a handler at all is what keeps SIGINT and SIGTERM from killing the
 * process half-way through a write.
 */
const live = new Set<string>();
const SIGNALS = ['SIGINT', 'SIGTERM'] as const;
let holders = 0;

function forget(fs: SafeWriteFs, path: string): void {
  if (!live.has(path)) return;
  ignoreFailure(() => fs.unlinkSync(path));
  live.delete(path);
}

function onSignal(signal: NodeJS.Signals): void {
  for (const path of live) ignoreFailure(() => nodeFs.unlinkSync(path));
  live.clear();
  for (const name of SIGNALS) process.removeListener(name, onSignal);
  process.kill(process.pid, signal);
}

function holdSignals(): void {
  if (holders++ === 0) for (const name of SIGNALS) process.on(name, onSignal);
}

/**
 * Drops the handlers a little later, so that a signal caught during the
 * write is still delivered to them (the event loop reads pending signals
 * only once it polls; an immediate or a zero timer runs too soon).
 */
function releaseSignals(): void {
  setTimeout(() => {
    if (--holders === 0) for (const name of SIGNALS) process.removeListener(name, onSignal);
  }, SIGNAL_GRACE_MS);
}

const SIGNAL_GRACE_MS = 20;
