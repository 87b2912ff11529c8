import type { Command } from 'commander';
import { InputError } from '../units/input-error.js';
import type { Io } from './io.js';

/** Characters per line when standard output is not a terminal (a file, a pipe, a log). */
export const DEFAULT_WIDTH = 100;

/** --width (or --columns) and --wide as commander hands them over. */
export interface LayoutOptions {
  width?: string;
  columns?: string;
  wide?: boolean;
}

/**
 * Adds the layout options of the commands that print tables: --width N
 * (--columns N says the same, and is the only name on `windows`, whose
 * --width is the band's width) and --wide.
 *
 * @param command a command that prints tables
 * @param widthIsTaken the command already uses --width for something else
 * @returns the same command
 * @example withLayoutOptions(new Command('solve')).options.map((o) => o.long) // ['--width', '--columns', '--wide']
 */
export function withLayoutOptions(command: Command, widthIsTaken = false): Command {
  const help = `characters per line for tables and text (default: the terminal's width, ${DEFAULT_WIDTH} when not a terminal)`;
  if (!widthIsTaken) command.option('--width <columns>', help);
  return command
    .option('--columns <columns>', widthIsTaken ? help : 'the same as --width')
    .option('--wide', 'every column in one table, however wide; nothing wrapped');
}

/**
 * The width to lay out for: --wide (no limit), --width N, the terminal's
 * width when standard output is one, else 100 characters.
 *
 * @param options --width and --wide as written
 * @param io tells the terminal's width, when there is one
 * @returns characters per line (Infinity with --wide)
 * @throws InputError for a --width that is not a whole number from 40 to 1000, or --width with --wide
 * @example layoutWidth({ width: '80' }, io) // 80
 */
export function layoutWidth(options: LayoutOptions, io: Io): number {
  const [name, written] = options.columns !== undefined ? ['--columns', options.columns] : ['--width', options.width];
  if (options.wide && written !== undefined)
    throw new InputError('--wide', `either --wide or ${name}, not both`, `--wide ${name} ${written}`);
  if (options.wide) return Infinity;
  if (written !== undefined) {
    const value = Number(written);
    if (!/^\s*\d+\s*$/.test(written) || value < 40 || value > 1000)
      throw new InputError(name, 'a whole number of characters from 40 to 1000', written);
    return value;
  }
  return io.columns !== undefined && io.columns >= 40 ? io.columns : DEFAULT_WIDTH;
}

/**
 * Characters per line for the glossary under --help: the terminal's width
 * when standard output is one, held between 60 and 100.
 *
 * @param io tells the terminal's width, when there is one
 * @returns characters per line
 * @example helpWidth({ out: () => undefined, err: () => undefined, columns: 80 }) // 80
 */
export function helpWidth(io: Io): number {
  return Math.min(DEFAULT_WIDTH, Math.max(60, io.columns ?? DEFAULT_WIDTH));
}
