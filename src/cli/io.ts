/** Where a command writes: the real process streams, or strings in tests. */
export interface Io {
  readonly out: (text: string) => void;
  readonly err: (text: string) => void;
  /** Progress notes for long runs; present only when stderr is a terminal. */
  readonly progress?: (text: string) => void;
}

/** Exit statuses: answered, a valid question with no answer, bad input or usage. */
export const EXIT = { answered: 0, noAnswer: 1, badInput: 2 } as const;
export type ExitCode = (typeof EXIT)[keyof typeof EXIT];
