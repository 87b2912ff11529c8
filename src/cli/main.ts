import { Command, CommanderError } from 'commander';
import { InputError } from '../units/input-error.js';
import { visibleText } from '../units/visible-text.js';
import { EXIT, type ExitCode, type Io } from './io.js';
import { addWindowsCommand } from './commands/windows-command.js';
import { addAliasCommand } from './commands/alias-command.js';
import { addSolveCommand } from './commands/solve-command.js';
import { addSchemaCommand } from './commands/schema-command.js';
import { addCompareCommand } from './commands/compare-command.js';
import { addInitCommand } from './commands/init-command.js';
import { addReportCommand } from './commands/report-command.js';
import { addVerifyCommand } from './commands/verify-command.js';

const VERSION = '0.1.0';

/**
 * Runs one ifzone command line and returns its exit status. Errors become one
 * line on stderr starting `ifzone: `, with nothing on stdout; `--debug` adds
 * the stack.
 *
 * @param args the arguments after the program name
 * @param given where output and errors are written (control characters in them are escaped first)
 */
export async function runCli(args: readonly string[], given: Io): Promise<ExitCode> {
  // Text from scenario files (names, labels) reaches the terminal only with its control characters escaped.
  const io: Io = {
    ...given,
    out: (text) => given.out(visibleText(text, true)),
    err: (text) => given.err(visibleText(text, true)),
  };
  const debug = args.includes('--debug');
  if (args.every((a) => a === '--debug')) {
    io.err('ifzone: no command given; run ifzone --help to list the commands\n');
    return EXIT.badInput;
  }
  let exitCode: ExitCode = EXIT.answered;
  const settle = (code: ExitCode) => {
    exitCode = code;
  };
  const program = new Command('ifzone')
    .description('band-pass (undersampling) frequency plan solver')
    .version(VERSION, '-V, --version')
    .option('--debug', 'show the stack trace of an error')
    .exitOverride()
    .showSuggestionAfterError(true)
    .configureOutput({
      writeOut: io.out,
      writeErr: io.err,
      outputError: (message, write) => write(`ifzone: ${oneLine(message.replace(/^error: /, ''))}\n`),
    });
  addWindowsCommand(program, io, settle);
  addAliasCommand(program, io, settle);
  addSolveCommand(program, io, settle);
  addCompareCommand(program, io, settle);
  addSchemaCommand(program, io, settle);
  addInitCommand(program, io, settle);
  addReportCommand(program, io, settle, VERSION);
  addVerifyCommand(program, io, settle);
  try {
    await program.parseAsync(
      args.filter((a) => a !== '--debug'),
      { from: 'user' },
    );
    return exitCode;
  } catch (error) {
    return failure(error, io, debug);
  }
}

function failure(error: unknown, io: Io, debug: boolean): ExitCode {
  if (error instanceof CommanderError) {
    const finished = error.code === 'commander.helpDisplayed' || error.code === 'commander.version' || error.code === 'commander.help';
    // Help shown because no command was given comes with exit code 1: that is a usage error.
    return finished && error.exitCode === 0 ? EXIT.answered : EXIT.badInput;
  }
  if (error instanceof InputError) {
    io.err(`ifzone: ${oneLine(error.message)}\n`);
    if (debug) io.err(`${error.stack ?? ''}\n`);
    return EXIT.badInput;
  }
  const message = error instanceof Error ? error.message : String(error);
  io.err(`ifzone: internal error: ${oneLine(message)} (run with --debug for the stack)\n`);
  if (debug && error instanceof Error) io.err(`${error.stack ?? ''}\n`);
  return EXIT.badInput;
}

function oneLine(text: string): string {
  return text.replace(/\s*\n\s*/g, ' ').trim();
}
