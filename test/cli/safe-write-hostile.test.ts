import { execFileSync, spawnSync } from 'node:child_process';
import * as fs from 'node:fs';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { beforeAll, describe, expect, it } from 'vitest';
import { checkOutputPaths, writeFileSafely, writeFilesSafely, type SafeWriteFs } from '../../src/cli/safe-write.js';
import { thrownInputError } from '../helpers/thrown-input-error.js';
import { ensureBuilt, ROOT } from '../helpers/run-bin.js';
import { ifzone, refusalLine, scratchDirectory } from '../helpers/run-in-process.js';

/**
 * Safe writes against what a user's disk may hold. Before: --force replaced
 * a character device, a FIFO or a symbolic link to another file and turned a
 * 0600 file into 0644; a failed write read "internal error: EACCES …
 * .x.svg.25025….tmp"; Ctrl-C or SIGTERM left the partial temporary file;
 * `compare --svg a.svg -o exists.csv` wrote the SVG, then refused the CSV.
 */
const dir = scratchDirectory('safe-write-hostile');
const base = new URL('../../scenarios/heron-base.json', import.meta.url).pathname;
/** A character device node in the scratch folder (root can make one; others skip the case). */
function scratchDevice(): string {
  const node = join(dir, 'null-device.svg');
  if (!fs.existsSync(node)) execFileSync('mknod', ['-m', '666', node, 'c', '1', '3']);
  return node;
}
const canMakeDevices = spawnSync('mknod', ['--version']).status === 0 && process.getuid?.() === 0;

const listing = () => fs.readdirSync(dir).sort();

describe('--force replaces only a regular file', () => {
  // A device node of our own in the scratch folder (the same device as /dev/null), never the system's
  // /dev/null: a regression here would otherwise replace the machine's /dev/null with a regular file.
  it.skipIf(!canMakeDevices)('refuses a character device, and leaves it as it was', () => {
    const path = scratchDevice();
    const error = thrownInputError(() => writeFileSafely(path, 'x', { force: true }));
    expect(error.where).toBe(path);
    expect(error.expected).toBe('a regular file to replace');
    expect(error.received).toBe('a character device');
    expect(fs.statSync(path).isCharacterDevice()).toBe(true);
  });

  it.each([
    ['a directory', () => fs.mkdtempSync(join(dir, 'folder-')), 'a directory'],
    [
      'a FIFO',
      () => {
        const fifo = join(dir, 'pipe.svg');
        if (!fs.existsSync(fifo)) execFileSync('mkfifo', [fifo]);
        return fifo;
      },
      'a FIFO (named pipe)',
    ],
  ])('refuses %s, and leaves it as it was', (_name, make, kind) => {
    const path = make();
    const error = thrownInputError(() => writeFileSafely(path, 'x', { force: true }));
    expect(error.where).toBe(path);
    expect(error.expected).toBe('a regular file to replace');
    expect(error.received).toBe(kind);
  });

  it('refuses a symbolic link, saying it does not write through, and leaves the link and its target alone', () => {
    const other = join(dir, 'other.txt');
    fs.writeFileSync(other, 'precious');
    const link = join(dir, 'link.svg');
    fs.symlinkSync(other, link);
    const error = thrownInputError(() => writeFileSafely(link, 'x', { force: true }));
    expect(error.expected).toContain('not a symbolic link (ifzone does not write through links');
    expect(error.received).toBe(`a link to ${fs.realpathSync(other)}`);
    expect(fs.readFileSync(other, 'utf8')).toBe('precious');
    expect(fs.lstatSync(link).isSymbolicLink()).toBe(true);
  });

  it("keeps the replaced file's mode (0600 stays 0600)", () => {
    const secret = join(dir, 'secret.csv');
    fs.writeFileSync(secret, 'old', { mode: 0o600 });
    fs.chmodSync(secret, 0o600);
    writeFileSafely(secret, 'new', { force: true });
    expect(fs.readFileSync(secret, 'utf8')).toBe('new');
    expect(fs.statSync(secret).mode & 0o777).toBe(0o600);
  });
});

describe('a failed write names the user path and the system reason', () => {
  it.each([
    ['EACCES', 'permission denied (EACCES)'],
    ['ENOSPC', 'no space left on the device (ENOSPC)'],
  ])('%s at open', (code, words) => {
    const shim: SafeWriteFs = {
      ...fs,
      openSync: () => {
        throw Object.assign(new Error(`${code}: simulated, open '.x.svg.1.tmp'`), { code });
      },
    } as SafeWriteFs;
    const path = join(dir, 'x.svg');
    const error = thrownInputError(() => writeFileSafely(path, 'x', { fs: shim }));
    expect(error.where).toBe(path);
    expect(error.received).toBe(words);
    expect(error.message).not.toContain('.tmp');
  });

  it('a directory that does not exist is refused before any work', () => {
    const error = thrownInputError(() => checkOutputPaths([join(dir, 'no-such-dir', 'plan.svg')]));
    expect(error.expected).toBe('a path in an existing directory');
  });
});

describe('outputs are committed together or not at all', () => {
  it('a second write that fails puts back the first: the new file removed, the replaced one restored', () => {
    const kept = join(dir, 'kept.svg');
    fs.writeFileSync(kept, 'old picture');
    const fresh = join(dir, 'fresh.csv');
    let links = 0;
    const shim: SafeWriteFs = {
      ...fs,
      linkSync: ((existing: fs.PathLike, made: fs.PathLike) => {
        if (String(made).endsWith('fresh.csv')) throw Object.assign(new Error('EIO: simulated'), { code: 'EIO' });
        links++;
        return fs.linkSync(existing, made);
      }) as SafeWriteFs['linkSync'],
    };
    const error = thrownInputError(() =>
      writeFilesSafely(
        [
          { path: kept, content: 'new picture' },
          { path: fresh, content: 'table' },
        ],
        { force: true, fs: shim },
      ),
    );
    expect(error.where).toBe(fresh);
    expect(links).toBe(1); // the old picture's second name
    expect(fs.readFileSync(kept, 'utf8')).toBe('old picture');
    expect(fs.existsSync(fresh)).toBe(false);
    expect(listing().filter((name) => name.startsWith('.'))).toEqual([]);
  });

  it('compare --svg new.svg -o exists.csv refuses before computing and writes neither', async () => {
    const exists = join(dir, 'exists.csv');
    fs.writeFileSync(exists, 'mine');
    const svg = join(dir, 'new.svg');
    const run = await ifzone('compare', base, '--csv', '--svg', svg, '-o', exists);
    expect(run.code).toBe(2);
    expect(run.out).toBe('');
    expect(refusalLine(run)).toContain(`${exists}: exists; add --force to replace it`);
    expect(fs.existsSync(svg)).toBe(false);
    expect(fs.readFileSync(exists, 'utf8')).toBe('mine');
  });
});

describe('an interrupted write leaves no temporary file', () => {
  beforeAll(() => ensureBuilt());

  it.each(['SIGTERM', 'SIGINT'])('%s in the middle of a write: the old file whole or the new one, and no temporary file', (signal) => {
    const target = join(dir, `interrupted-${signal}.svg`);
    fs.writeFileSync(target, 'old');
    // A child writes 4 MB in 64 kB pieces and signals itself after the first piece.
    const module = pathToFileURL(join(ROOT, 'dist', 'cli', 'safe-write.js')).href;
    const script = `
      import * as fs from 'node:fs';
      import { writeFileSafely } from ${JSON.stringify(module)};
      let pieces = 0;
      const shim = { ...fs, writeSync: (fd, buffer, offset, length) => {
        if (++pieces === 2) process.kill(process.pid, ${JSON.stringify(signal)});
        return fs.writeSync(fd, buffer, offset, Math.min(length, 65536));
      } };
      writeFileSafely(${JSON.stringify(target)}, 'n'.repeat(4e6), { force: true, fs: shim });
    `;
    const child = spawnSync(process.execPath, ['--input-type=module', '-e', script], { encoding: 'utf8' });
    expect(child.signal).toBe(signal);
    const text = fs.readFileSync(target, 'utf8');
    expect(text === 'old' || text === 'n'.repeat(4e6)).toBe(true);
    expect(listing().filter((name) => name.includes(`interrupted-${signal}`) && name !== `interrupted-${signal}.svg`)).toEqual([]);
  });
});
