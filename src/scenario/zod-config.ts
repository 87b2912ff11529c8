import * as z from 'zod';

/**
 * zod without its compiled fast path for objects (jitless). A command reads
 * one scenario or a few: building the compiled parsers costs more at start-up
 * (about 5 ms) than it saves on a few parses. zod reads the setting when a
 * schema is built, so every module that builds one imports this module
 * first.
 */
z.config({ jitless: true });

/**
 * Whether the setting is in force (for the test that says so).
 *
 * @returns true
 * @example zodIsJitless() // true
 */
export function zodIsJitless(): boolean {
  return z.config().jitless === true;
}
