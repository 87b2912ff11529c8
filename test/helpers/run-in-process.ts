import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { runCli } from '../../src/cli/main.js';

/** What one in-process run of the CLI wrote and returned. */
export interface InProcessRun {
  readonly code: number;
  readonly out: string;
  readonly err: string;
}

/** Runs one ifzone command line in this process (runCli), collecting stdout and stderr. */
export async function ifzone(...args: string[]): Promise<InProcessRun> {
  let out = '';
  let err = '';
  const code = await runCli(args, { out: (t) => (out += t), err: (t) => (err += t) });
  return { code, out, err };
}

/** A fresh temporary directory for one test file. */
export function scratchDirectory(name: string): string {
  return mkdtempSync(join(tmpdir(), `ifzone-${name}-`));
}

/** Writes a file (JSON unless a string is given) and returns its path. */
export function writeInto(dir: string, name: string, content: unknown): string {
  const path = join(dir, name);
  writeFileSync(path, typeof content === 'string' ? content : JSON.stringify(content, null, 2));
  return path;
}

/** The one `ifzone:` line of a refusal, or throws when stderr holds anything else. */
export function refusalLine(run: InProcessRun): string {
  const lines = run.err.split('\n').filter((line) => line !== '');
  if (lines.length !== 1 || !lines[0]!.startsWith('ifzone: ')) throw new Error(`expected one ifzone: line, got ${JSON.stringify(run.err)}`);
  return lines[0]!;
}
