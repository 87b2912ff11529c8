import { execFileSync } from 'node:child_process';
import { closeSync, openSync, readFileSync, ftruncateSync, symlinkSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { MOST_SCENARIO_BYTES, readTextFile } from '../../src/cli/read-scenario.js';
import { ifzone, refusalLine, scratchDirectory, writeInto } from '../helpers/run-in-process.js';

/**
 * Only regular files are read as scenarios, and only small ones. Before,
 * `"extends": "/dev/zero"` read until memory ran out, a FIFO blocked the
 * command forever and a 2.2 GB file was read whole before being refused.
 * Each refusal here must come at once (the stat is checked before opening).
 */
const dir = scratchDirectory('input-files');
const base = new URL('../../scenarios/heron-base.json', import.meta.url).pathname;

function refusalOf(path: string): string {
  try {
    readTextFile(path);
  } catch (error) {
    return (error as Error).message;
  }
  throw new Error('read');
}

describe('readTextFile: regular files only, size checked first', () => {
  it('reads a scenario file whole', () => {
    expect(readTextFile(base)).toBe(readFileSync(base, 'utf8'));
  });

  it.each([
    ['/dev/zero', 'a character device, not a regular file'],
    ['/dev/null', 'a character device, not a regular file'],
    [dir, 'a directory, not a regular file'],
  ])('refuses %s', (path, reason) => {
    expect(refusalOf(path)).toBe(reason);
  });

  it('refuses a FIFO without opening it (no writer, so an open would block)', () => {
    const fifo = join(dir, 'pipe.json');
    execFileSync('mkfifo', [fifo]);
    expect(refusalOf(fifo)).toBe('a FIFO (named pipe), not a regular file');
  });

  it('refuses a 2.2 GB file by its size, before reading it (sparse: no disk used)', () => {
    const big = join(dir, 'big.json');
    const fd = openSync(big, 'w');
    ftruncateSync(fd, 2.2e9);
    closeSync(fd);
    expect(refusalOf(big)).toBe(`2200000000 bytes, more than a scenario's limit of ${MOST_SCENARIO_BYTES} bytes (1 MiB)`);
  });

  it('reads a file of exactly the limit, and follows a symbolic link to a regular file', () => {
    const edge = writeInto(dir, 'edge.json', ' '.repeat(MOST_SCENARIO_BYTES));
    expect(readTextFile(edge)).toHaveLength(MOST_SCENARIO_BYTES);
    const link = join(dir, 'link.json');
    symlinkSync(base, link);
    expect(readTextFile(link)).toBe(readFileSync(base, 'utf8'));
  });
});

describe('hostile files through ifzone solve: one line, exit 2', () => {
  it.each([
    ['extends /dev/zero', () => writeInto(dir, 'zero.json', { extends: '/dev/zero' }), '/dev/zero: a character device, not a regular file'],
    ['a FIFO as the file', () => join(dir, 'pipe.json'), 'a FIFO (named pipe), not a regular file'],
    [
      'extends a FIFO',
      () => writeInto(dir, 'via-pipe.json', { extends: 'pipe.json' }),
      'pipe.json: a FIFO (named pipe), not a regular file',
    ],
    ['a directory', () => dir, 'a directory, not a regular file'],
  ])('%s', async (_name, make, reason) => {
    const run = await ifzone('solve', make());
    expect(run.code).toBe(2);
    expect(run.out).toBe('');
    expect(refusalLine(run)).toContain(reason);
  });
});
