/** Where a command writes: the real process streams, or strings in tests. */
export interface Io {
  readonly out: (text: string) => void;
  readonly err: (text: string) => void;
  /** Progress notes for long runs; present only when stderr is a terminal. */
  readonly progress?: (text: string) => void;
  /** The terminal's width in characters; present only when standard output is a terminal. */
  readonly columns?: number;
}

/** Exit statuses: answered, a valid question with no answer, bad input or usage. */
export const EXIT = { answered: 0, noAnswer: 1, badInput: 2 } as const;
export type ExitCode = (typeof EXIT)[keyof typeof EXIT];

/** Progress is shown only once a command has run this long, ms. */
export const PROGRESS_AFTER_MS = 1000;

/**
 * Notes a command's stages on stderr, and only when stderr is a terminal
 * (io.progress present) and the command has run for over a second: short
 * runs and pipes stay silent.
 *
 * @param io where the notes go
 * @returns note(text) before each stage, done() at the end (clears the line)
 * @example const progress = progressNotes(io); progress.note('drawing the pictures'); progress.done() // undefined (silent: this io has no progress, as when stderr is not a terminal)
 */
export function progressNotes(io: Io): { note: (text: string) => void; done: () => void } {
  const started = Date.now();
  let shown = false;
  const note = (text: string) => {
    if (io.progress === undefined || Date.now() - started <= PROGRESS_AFTER_MS) return;
    io.progress(text);
    shown = true;
  };
  return { note, done: () => (shown ? io.progress?.('') : undefined) };
}
