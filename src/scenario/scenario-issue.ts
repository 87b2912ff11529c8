import { InputError } from '../units/input-error.js';

/** What kind of refusal an issue is; the formatter words each kind. */
export type ScenarioIssueKind = 'syntax' | 'unknown-key' | 'unknown-value' | 'invalid' | 'unreadable' | 'cycle';

/**
 * One problem found in a scenario file, as data. Frequencies, paths and
 * values stay as the user wrote them so the message can quote them.
 */
export interface ScenarioIssue {
  readonly kind: ScenarioIssueKind;
  /** The file the offending value came from (after `extends`, the file that set it). */
  readonly file: string;
  /** Where in the document, e.g. `boardSpurs[2].frequency`; `` for the whole document; `12:5` (line:column) for a syntax error. */
  readonly path: string;
  /** What was expected, in words, e.g. `a frequency such as 70M`. */
  readonly expected: string;
  /** What was found, as written (JSON text of the value), or a description such as `nothing`. */
  readonly received: string;
  /** For an unknown key or value: the nearest known one, or null when none is near. */
  readonly suggestion?: string | null;
  /** For `extends` problems: the files in order, ending at the offending one. */
  readonly chain?: readonly string[];
}

/**
 * A refused scenario: every issue found, the first one also in the
 * InputError fields so the CLI maps it to exit 2 like any refused input.
 * The message is one line: the first issue, then how many more there are.
 */
export class ScenarioError extends InputError {
  readonly issues: readonly ScenarioIssue[];

  constructor(issues: readonly ScenarioIssue[]) {
    const first = issues[0];
    if (!first) throw new RangeError('a ScenarioError needs at least one issue');
    super(issueWhere(first), first.expected, first.received);
    this.name = 'ScenarioError';
    this.issues = issues;
    const more = issues.length - 1;
    this.message = formatScenarioIssue(first) + (more > 0 ? ` (and ${more} more issue${more === 1 ? '' : 's'})` : '');
  }
}

/**
 * Words one issue for people, on one line.
 *
 * @param issue the issue
 * @returns e.g. `heron-x.json: converter.bitz: unknown key; did you mean "bits"?`
 *   or `heron-x.json: boardSpurs[2].frequency: expected a frequency such as 70M (got "ten")`
 * @example formatScenarioIssue({ kind: 'cycle', file: 'b.json', path: 'extends', expected: 'a base file that does not lead back to itself', received: 'a cycle', chain: ['a.json', 'b.json', 'a.json'] })
 *   // 'b.json: extends: expected a base file that does not lead back to itself (got a cycle); extends chain: a.json → b.json → a.json'
 */
export function formatScenarioIssue(issue: ScenarioIssue): string {
  return oneLine(wordsFor(issue));
}

/** Control characters (a file name with a line feed, say) written as JSON escapes, so a message stays one line. */
function oneLine(text: string): string {
  // eslint-disable-next-line no-control-regex -- finding control characters is the point
  return text.replace(/[\u0000-\u001f\u007f]/g, (char) => JSON.stringify(char).slice(1, -1));
}

function wordsFor(issue: ScenarioIssue): string {
  const where = issueWhere(issue);
  if (issue.kind === 'unknown-value') {
    return `${where}: unknown value ${issue.received}; did you mean "${issue.suggestion ?? ''}"? (expected ${issue.expected})`;
  }
  if (issue.kind === 'unknown-key') {
    return `${where}: unknown key; ${issue.suggestion ? `did you mean "${issue.suggestion}"?` : `expected ${issue.expected}`}`;
  }
  const what = issue.kind === 'syntax' ? 'JSON syntax error: expected' : 'expected';
  const chain = issue.chain && issue.chain.length > 1 ? `; extends chain: ${issue.chain.join(' → ')}` : '';
  return `${where}: ${what} ${issue.expected} (got ${issue.received})${chain}`;
}

function issueWhere(issue: ScenarioIssue): string {
  if (issue.path === '') return issue.file;
  return issue.kind === 'syntax' ? `${issue.file}:${issue.path}` : `${issue.file}: ${issue.path}`;
}
