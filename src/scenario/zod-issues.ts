import type * as z from 'zod';
import type { ScenarioIssue } from './scenario-issue.js';
import { pathText, type DocumentPath } from './document-path.js';
import { knownKeys } from './known-keys.js';
import { nearestKey } from './nearest-key.js';

type ZodIssue = z.core.$ZodIssue;

/** What the translation needs beyond the issues themselves. */
export interface IssueSetting {
  /** The file that supplied the values at these paths last (after `extends` merging). */
  readonly fileOf: (...paths: DocumentPath[]) => string;
  /** The validated document, to choose schema branches for key suggestions. */
  readonly document: unknown;
  /** The JSON Schema of the format, read only when a key is unknown. */
  readonly jsonSchema: () => Readonly<Record<string, unknown>>;
}

const TYPE_WORDS: Readonly<Record<string, string>> = {
  string: 'text',
  number: 'a number',
  int: 'a whole number',
  boolean: 'true or false',
  object: 'an object',
  array: 'a list',
  null: 'null',
};

/**
 * Words zod's own issues the way scenario issues read ("expected ..."); the
 * scenario schema's messages take precedence over these. Passed as the
 * `error` map of each parse.
 *
 * @param issue a raw zod issue
 * @returns the expected value in words
 * @example expectedWords({ code: 'invalid_type', expected: 'number', input: 'x', path: [] }) // 'a number'
 */
export const expectedWords: z.core.$ZodErrorMap = (issue) => {
  switch (issue.code) {
    case 'invalid_type':
      return TYPE_WORDS[issue.expected] ?? issue.expected;
    case 'too_small':
      return issue.origin === 'array'
        ? `a list of at least ${String(issue.minimum)} entries`
        : `a number ${issue.inclusive ? 'at least' : 'above'} ${String(issue.minimum)}`;
    case 'too_big':
      return issue.origin === 'array'
        ? `a list of at most ${String(issue.maximum)} entries`
        : `a number ${issue.inclusive ? 'at most' : 'below'} ${String(issue.maximum)}`;
    case 'invalid_value':
      return issue.values.length === 1
        ? JSON.stringify(issue.values[0])
        : `one of ${issue.values.map((v) => JSON.stringify(v)).join(', ')}`;
    case 'invalid_union':
      return 'discriminator' in issue && issue.discriminator !== undefined
        ? `an object with a valid "${issue.discriminator}"`
        : 'a valid value';
    default:
      return 'a valid value';
  }
};

/**
 * Turns zod's issues for a scenario document into scenario issues: each names
 * its file and path; an unknown key gets the nearest known key; a union that
 * failed is explained by the one branch whose type matched, if exactly one
 * did, else by the union's own words.
 *
 * @param issues zod's issues (parsed with `reportInput: true`)
 * @param setting where values came from, the document and the JSON Schema
 * @param prefix path of the value the issues are relative to
 * @returns the scenario issues, in zod's order
 */
export function issuesFromZod(issues: readonly ZodIssue[], setting: IssueSetting, prefix: DocumentPath = []): ScenarioIssue[] {
  return explainedFirst(translated(issues, setting, prefix));
}

function translated(issues: readonly ZodIssue[], setting: IssueSetting, prefix: DocumentPath): ScenarioIssue[] {
  return issues.flatMap((issue): ScenarioIssue[] => {
    const path = [...prefix, ...issue.path.map((step) => (typeof step === 'number' ? step : String(step)))];
    if (issue.code === 'unrecognized_keys') return issue.keys.map((key) => unknownKey(path, key, setting));
    if (issue.code === 'invalid_union') {
      if ('discriminator' in issue && issue.discriminator !== undefined) return [badDiscriminator(issue, path, setting)];
      const branch = matchedBranch(issue.errors);
      if (branch) return translated(branch, setting, path);
    }
    const misspelt = issue.code === 'invalid_value' ? unknownValue(issue, path, setting) : null;
    if (misspelt) return [misspelt];
    const expected = issue.code === 'invalid_key' ? (issue.issues[0]?.message ?? issue.message) : issue.message;
    return [
      {
        kind: 'invalid',
        file: setting.fileOf(path, ...relatedPaths(issue, path)),
        path: pathText(path),
        expected,
        received: receivedWords(issue),
      },
    ];
  });
}

/**
 * Unknown keys first, since a typo explains the rest; a missing key that an
 * unknown key's suggestion names is dropped (`lable` explains the missing `label`).
 */
function explainedFirst(issues: readonly ScenarioIssue[]): ScenarioIssue[] {
  const unknown = issues.filter((issue) => issue.kind === 'unknown-key');
  const meant = new Set(unknown.map((issue) => `${issue.file}\0${parentPath(issue.path)}\0${issue.suggestion ?? ''}`));
  const explained = (issue: ScenarioIssue) =>
    issue.received === 'nothing' && meant.has(`${issue.file}\0${parentPath(issue.path)}\0${lastKey(issue.path)}`);
  return [...unknown, ...issues.filter((issue) => issue.kind !== 'unknown-key' && !explained(issue))];
}

function parentPath(path: string): string {
  return path.replace(/(?:\.[A-Za-z_$][\w$]*|\[[^\]]*\])$|^[A-Za-z_$][\w$]*$/, '');
}

function lastKey(path: string): string {
  return /([A-Za-z_$][\w$]*)$/.exec(path)?.[1] ?? '';
}

function badDiscriminator(issue: ZodIssue & { code: 'invalid_union' }, path: DocumentPath, setting: IssueSetting): ScenarioIssue {
  const key = (issue as { discriminator?: string }).discriminator ?? 'kind';
  const options = (issue as { options?: readonly unknown[] }).options ?? [];
  const input = issue.input;
  const object = typeof input === 'object' && input !== null ? (input as Record<string, unknown>) : null;
  const value = object && Object.hasOwn(object, key) ? object[key] : undefined;
  const where = path.at(-1) === key ? path : [...path, key];
  // A misspelt discriminator key (`knid`) is the unknown key it is, not a missing `kind`.
  const misspelt =
    value === undefined && object
      ? Object.keys(object).find((written) => written !== key && nearestKey(written, [key]) === key)
      : undefined;
  if (misspelt !== undefined) return unknownKey(path.at(-1) === key ? path.slice(0, -1) : path, misspelt, setting);
  const choices = options.map((option) => JSON.stringify(option)).join(', ');
  const nearest =
    typeof value === 'string'
      ? nearestKey(
          value,
          options.filter((option): option is string => typeof option === 'string'),
        )
      : null;
  return {
    kind: nearest ? 'unknown-value' : 'invalid',
    file: setting.fileOf(where),
    path: pathText(where),
    expected: `one of ${choices}`,
    received: describeValue(value),
    ...(nearest ? { suggestion: nearest } : {}),
  };
}

/** A text that is not one of the allowed words, with the nearest of them when one is near (`widest-margn`). */
function unknownValue(issue: ZodIssue & { code: 'invalid_value' }, path: DocumentPath, setting: IssueSetting): ScenarioIssue | null {
  const words = issue.values.filter((value): value is string => typeof value === 'string');
  const nearest = typeof issue.input === 'string' && words.length === issue.values.length ? nearestKey(issue.input, words) : null;
  if (!nearest) return null;
  const expected = `one of ${words.map((word) => JSON.stringify(word)).join(', ')}`;
  return {
    kind: 'unknown-value',
    file: setting.fileOf(path),
    path: pathText(path),
    expected,
    received: describeValue(issue.input),
    suggestion: nearest,
  };
}

function unknownKey(path: DocumentPath, key: string, setting: IssueSetting): ScenarioIssue {
  const known = knownKeys(setting.jsonSchema(), path, setting.document);
  const where = [...path, key];
  return {
    kind: 'unknown-key',
    file: setting.fileOf(where),
    path: pathText(where),
    expected: known.length > 0 ? `one of the keys ${known.join(', ')}` : 'no key here',
    received: JSON.stringify(key),
    suggestion: nearestKey(key, known),
  };
}

/** The one union branch whose failure is more than a wrong type at its root, if exactly one. */
function matchedBranch(branches: readonly (readonly ZodIssue[])[]): readonly ZodIssue[] | null {
  const matched = branches.filter((issues) => !issues.every(wrongTypeAtRoot));
  return matched.length === 1 ? (matched[0] ?? null) : null;
}

function wrongTypeAtRoot(issue: ZodIssue): boolean {
  if (issue.path.length > 0) return false;
  if (issue.code === 'invalid_type') return true;
  // An enum of texts given an object, say: the other branch was meant.
  if (issue.code === 'invalid_value') return issue.values.every((value) => typeof value !== typeof issue.input);
  return issue.code === 'invalid_union' && issue.errors.length > 0 && issue.errors.every((branch) => branch.every(wrongTypeAtRoot));
}

/** The other fields a cross-field check compared (see refuseAt), as paths from the root. */
function relatedPaths(issue: ZodIssue, path: DocumentPath): DocumentPath[] {
  const params = (issue as { params?: { related?: DocumentPath[]; depth?: number } }).params;
  if (!params?.related || params.depth === undefined) return [];
  const object = path.slice(0, path.length - params.depth);
  return params.related.map((related) => [...object, ...related]);
}

function receivedWords(issue: ZodIssue): string {
  const given = (issue as { params?: { received?: unknown } }).params?.received;
  if (typeof given === 'string') return given;
  return describeValue(issue.input);
}

/** A value as it appears in a message: JSON for short scalars, words for the rest. */
export function describeValue(value: unknown): string {
  if (value === undefined) return 'nothing';
  if (Array.isArray(value)) return value.length === 0 ? 'an empty list' : `a list of ${value.length}`;
  if (typeof value === 'object' && value !== null) return Object.keys(value).length === 0 ? 'an empty object' : 'an object';
  const text = JSON.stringify(value) ?? String(value);
  return text.length > 60 ? `${text.slice(0, 57)}...` : text;
}
