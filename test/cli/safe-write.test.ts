import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import * as fs from 'node:fs';
import { randomBytes } from 'node:crypto';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { EXISTS_EXPECTED, INPUT_EXPECTED, writeFileSafely, type SafeWriteFs } from '../../src/cli/safe-write.js';
import { InputError } from '../../src/units/input-error.js';
import { thrownInputError } from '../helpers/thrown-input-error.js';

/**
 * Safe writes on a real temporary directory: refused writes leave the old
 * file byte for byte, interrupted writes (failures injected through an fs
 * shim, or a directory in the way) leave it intact and no temporary file
 * behind, and the command's inputs are never written over.
 */

let dir: string;
let old: Buffer;
let target: string;

beforeEach(() => {
  dir = fs.mkdtempSync(join(tmpdir(), 'ifzone-safe-write-'));
  target = join(dir, 'plan.svg');
  old = randomBytes(4096);
  fs.writeFileSync(target, old);
});

afterEach(() => {
  fs.rmSync(dir, { recursive: true, force: true });
});

const listing = () => fs.readdirSync(dir).sort();

describe('writeFileSafely', () => {
  it('writes a new file whole and leaves nothing else', () => {
    const fresh = join(dir, 'new.svg');
    writeFileSafely(fresh, '<svg/>\n', { force: false });
    expect(fs.readFileSync(fresh, 'utf8')).toBe('<svg/>\n');
    expect(listing()).toEqual(['new.svg', 'plan.svg']);
  });

  it('refuses an existing file without force and leaves it byte for byte', () => {
    const error = thrownInputError(() => writeFileSafely(target, 'new content', { force: false }));
    expect(error.where).toBe(target);
    expect(error.expected).toBe(EXISTS_EXPECTED);
    expect(error.message).toContain('add --force to replace it');
    expect(fs.readFileSync(target).equals(old)).toBe(true);
    expect(listing()).toEqual(['plan.svg']);
  });

  it('replaces an existing file with force', () => {
    writeFileSafely(target, 'new content', { force: true });
    expect(fs.readFileSync(target, 'utf8')).toBe('new content');
    expect(listing()).toEqual(['plan.svg']);
  });

  it('refuses to write over an input even with force: same path, another spelling, a symbolic link, a hard link', () => {
    const input = join(dir, 'heron.json');
    fs.writeFileSync(input, old);
    fs.symlinkSync(input, join(dir, 'link.json'));
    fs.linkSync(input, join(dir, 'hard.json'));
    fs.mkdirSync(join(dir, 'sub'));
    for (const path of [input, join(dir, 'sub', '..', 'heron.json'), join(dir, 'link.json'), join(dir, 'hard.json')]) {
      const error = thrownInputError(() => writeFileSafely(path, 'oops', { force: true, inputs: [input] }));
      expect(error.expected).toBe(INPUT_EXPECTED);
      expect(error.where).toBe(path);
    }
    // An input named by a relative path is the same file.
    const cwd = process.cwd();
    try {
      process.chdir(dir);
      expect(() => writeFileSafely(input, 'oops', { force: true, inputs: ['heron.json'] })).toThrow(InputError);
    } finally {
      process.chdir(cwd);
    }
    expect(fs.readFileSync(input).equals(old)).toBe(true);
    expect(listing()).toEqual(['hard.json', 'heron.json', 'link.json', 'plan.svg', 'sub']);
  });

  it('leaves the old file and no temporary file when the rename fails', () => {
    const shim: SafeWriteFs = {
      ...fs,
      renameSync: () => {
        throw Object.assign(new Error('EIO: simulated'), { code: 'EIO' });
      },
    };
    // The refusal names the user's path and the system's reason, never the hidden temporary file.
    const error = thrownInputError(() => writeFileSafely(target, 'new content', { force: true, fs: shim }));
    expect(error.where).toBe(target);
    expect(error.received).toBe('an input/output error (EIO)');
    expect(fs.readFileSync(target).equals(old)).toBe(true);
    expect(listing()).toEqual(['plan.svg']);
  });

  it('leaves the old file and no temporary file when the disk fills half-way through the write', () => {
    let calls = 0;
    const shim: SafeWriteFs = {
      ...fs,
      writeSync: ((fd: number, buffer: Buffer, offset: number, length: number) => {
        if (++calls > 1) throw Object.assign(new Error('ENOSPC: simulated'), { code: 'ENOSPC' });
        return fs.writeSync(fd, buffer, offset, Math.min(length, 1000));
      }) as SafeWriteFs['writeSync'],
    };
    expect(() => writeFileSafely(target, 'x'.repeat(10_000), { force: true, fs: shim })).toThrow(/ENOSPC/);
    expect(calls).toBe(2);
    expect(fs.readFileSync(target).equals(old)).toBe(true);
    expect(listing()).toEqual(['plan.svg']);
  });

  it('leaves a directory in the way as it was and no temporary file', () => {
    const inTheWay = join(dir, 'out.svg');
    fs.mkdirSync(inTheWay);
    fs.writeFileSync(join(inTheWay, 'keep.txt'), 'keep');
    expect(() => writeFileSafely(inTheWay, 'x', { force: true })).toThrow();
    expect(fs.readFileSync(join(inTheWay, 'keep.txt'), 'utf8')).toBe('keep');
    expect(listing()).toEqual(['out.svg', 'plan.svg']);
  });

  it('refuses, without force, a file that appears between the check and the write (no clobbering race)', () => {
    // The shim's first look says the path is free; the file is there all the same.
    let looks = 0;
    const shim: SafeWriteFs = {
      ...fs,
      lstatSync: ((path: fs.PathLike, options?: fs.StatSyncOptions) =>
        ++looks === 1 ? undefined : fs.lstatSync(path, options)) as SafeWriteFs['lstatSync'],
    };
    const error = thrownInputError(() => writeFileSafely(target, 'new content', { force: false, fs: shim }));
    expect(error.expected).toBe(EXISTS_EXPECTED);
    expect(fs.readFileSync(target).equals(old)).toBe(true);
    expect(listing()).toEqual(['plan.svg']);
  });

  it('falls back to check-and-rename where the file system has no hard links', () => {
    const shim: SafeWriteFs = {
      ...fs,
      linkSync: () => {
        throw Object.assign(new Error('EPERM: simulated'), { code: 'EPERM' });
      },
    };
    const fresh = join(dir, 'fresh.svg');
    writeFileSafely(fresh, 'made', { force: false, fs: shim });
    expect(fs.readFileSync(fresh, 'utf8')).toBe('made');
    expect(() => writeFileSafely(target, 'new', { force: false, fs: shim })).toThrow(InputError);
    expect(fs.readFileSync(target).equals(old)).toBe(true);
    expect(listing()).toEqual(['fresh.svg', 'plan.svg']);
  });

  it('writes UTF-8 text byte for byte', () => {
    const fresh = join(dir, 'text.svg');
    const text = 'zone 2 (inv) · −76 dBFS · ±20 ppm · ∞\n';
    writeFileSafely(fresh, text);
    expect(fs.readFileSync(fresh).equals(Buffer.from(text, 'utf8'))).toBe(true);
  });
});
