/**
 * A refused input, kept as data: where it was found (an option such as
 * `--low`, or a path such as `spurs[2].frequency`), what was expected and what
 * was received. The shell formats it for people; tests read the fields.
 */
export class InputError extends Error {
  constructor(
    readonly where: string,
    readonly expected: string,
    readonly received: string,
  ) {
    // A refused path names itself as `where`: saying it twice adds nothing.
    super(received === where ? `${where}: ${expected}` : `${where}: ${expected} (got ${JSON.stringify(received)})`);
    this.name = 'InputError';
  }
}
