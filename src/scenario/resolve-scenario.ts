import { dirname, isAbsolute, join, normalize } from 'node:path';
import type { Scenario } from './scenario.js';
import { ScenarioError, type ScenarioIssue } from './scenario-issue.js';
import { parseJsonText } from './json-text.js';
import { describeValue, expectedWords, issuesFromZod } from './zod-issues.js';
import { fileOfPaths, mergeLayers, type Layer } from './merge-layers.js';
import { isJsonObject, pathText, type DocumentPath } from './document-path.js';
import { scenarioFileSchema } from './scenario-file-schema.js';
import { scenarioJsonSchema } from './scenario-json-schema.js';
import { WorkBoundError } from './work-bounds.js';

/**
 * Reads a file's whole text. Throws when it cannot, with a short reason as
 * the message (e.g. `no such file`); the reason is quoted in the issue.
 */
export type ReadText = (path: string) => string;

/**
 * A check of the validated scenario that needs a later stage (the shell
 * passes the interferers' work bound): it throws a WorkBoundError, which
 * becomes an issue naming the file that set the path.
 */
export type ScenarioCheck = (scenario: Scenario) => void;

/** Deeper than any scenario needs (4 levels) and far below the call stack's limit. */
const MAX_NESTING = 32;

/**
 * Reads a scenario file and the chain of bases it `extends` (each path
 * relative to the file naming it, unless absolute), merges them (objects key by key, lists
 * replace) and validates the result. Pure but for `readText`.
 *
 * @param path the variant's file
 * @param readText reads one file (the shell passes node:fs; tests a Map)
 * @param check run on the validated scenario (default: none)
 * @returns the validated scenario: every frequency in Hz, defaults filled
 * @throws ScenarioError (an InputError) listing every issue found, each
 *   naming its file and path; a missing file or a cycle shows the chain;
 *   the check's WorkBoundError as one issue
 * @example resolveScenario(join(root, 'scenarios', 'heron-narrow.json'), (p) => readFileSync(p, 'utf8')).wanted // { low: 137.5e6, high: 142.5e6 }
 */
export function resolveScenario(path: string, readText: ReadText, check?: ScenarioCheck): Scenario {
  const layers = readChain(path, readText);
  const scenario = validateLayers(layers);
  try {
    check?.(scenario);
  } catch (error) {
    if (!(error instanceof WorkBoundError)) throw error;
    throw new ScenarioError([
      {
        kind: 'invalid',
        file: fileOfPaths(layers, [error.path]),
        path: pathText(error.path),
        expected: error.expected,
        received: error.received,
      },
    ]);
  }
  return scenario;
}

/**
 * Validates one parsed document on its own, with no `extends` to follow
 * (a document that names a base is refused: only resolveScenario reads files).
 *
 * @param document a parsed JSON value
 * @param file the name used in issues
 * @returns the validated scenario
 * @throws ScenarioError listing every issue found
 * @example scenarioFromDocument(JSON.parse(readFileSync(join(root, 'scenarios', 'heron-base.json'), 'utf8')), 'heron-base.json').name // 'Heron-4 base'
 */
export function scenarioFromDocument(document: unknown, file: string): Scenario {
  const layer = layerOf(document, file);
  if (layer.extendsPath !== null) {
    throw new ScenarioError([
      {
        kind: 'invalid',
        file,
        path: 'extends',
        expected: 'no extends here (use resolveScenario to follow a base file)',
        received: JSON.stringify(layer.extendsPath),
      },
    ]);
  }
  return validateLayers([layer]);
}

interface ChainLayer extends Layer {
  readonly extendsPath: string | null;
}

function readChain(first: string, readText: ReadText): ChainLayer[] {
  const chain: ChainLayer[] = [];
  let file = normalize(first);
  for (;;) {
    const files = [...chain.map((layer) => layer.file), file];
    const namedBy = chain.at(-1)?.file;
    let text: unknown;
    let reason = 'no text';
    try {
      text = readText(file);
    } catch (error) {
      reason = error instanceof Error ? error.message : String(error);
    }
    if (typeof text !== 'string') {
      throw new ScenarioError([
        namedBy === undefined
          ? { kind: 'unreadable', file, path: '', expected: 'a scenario file that can be read', received: reason }
          : {
              kind: 'unreadable',
              file: namedBy,
              path: 'extends',
              expected: 'a base file that can be read',
              received: `${file}: ${reason}`,
              chain: files,
            },
      ]);
    }
    const layer = layerOf(parsedInChain(text, file, files), file);
    chain.push(layer);
    if (layer.extendsPath === null) return chain;
    const next = normalize(isAbsolute(layer.extendsPath) ? layer.extendsPath : join(dirname(file), layer.extendsPath));
    if (chain.some((seen) => seen.file === next)) {
      throw new ScenarioError([
        {
          kind: 'cycle',
          file,
          path: 'extends',
          expected: 'a base file that does not lead back to itself',
          received: 'a cycle',
          chain: [...chain.map((seen) => seen.file), next],
        },
      ]);
    }
    file = next;
  }
}

/** Parses one file of the chain; a base file's problems show the chain that led to it. */
function parsedInChain(text: string, file: string, files: readonly string[]): unknown {
  try {
    return parseJsonText(text, file);
  } catch (error) {
    if (!(error instanceof ScenarioError) || files.length < 2) throw error;
    throw new ScenarioError(error.issues.map((issue) => ({ ...issue, chain: files })));
  }
}

function layerOf(document: unknown, file: string): ChainLayer {
  if (!isJsonObject(document)) {
    throw new ScenarioError([
      { kind: 'invalid', file, path: '', expected: 'a JSON object holding the scenario', received: describeValue(document) },
    ]);
  }
  const tooDeep = nestedBeyond(document, MAX_NESTING);
  if (tooDeep) {
    throw new ScenarioError([
      {
        kind: 'invalid',
        file,
        path: pathText(tooDeep),
        expected: `nesting at most ${MAX_NESTING} levels deep`,
        received: 'deeper nesting',
      },
    ]);
  }
  const { extends: base, ...rest } = document;
  if (base !== undefined && (typeof base !== 'string' || base.trim() === '')) {
    throw new ScenarioError([
      { kind: 'invalid', file, path: 'extends', expected: 'the name of a base scenario file', received: describeValue(base) },
    ]);
  }
  return { file, document: rest, extendsPath: base ?? null };
}

function validateLayers(layers: readonly Layer[]): Scenario {
  const document = layers.length === 1 && layers[0] ? layers[0].document : mergeLayers(layers);
  const result = scenarioFileSchema.safeParse(document, { reportInput: true, error: expectedWords });
  if (result.success) return result.data;
  const issues: ScenarioIssue[] = issuesFromZod(result.error.issues, {
    fileOf: (...paths) => fileOfPaths(layers, paths),
    document,
    jsonSchema: scenarioJsonSchema,
  });
  throw new ScenarioError(issues);
}

/** The path to the first value nested deeper than `limit`, or null; iterative, so depth cannot overflow the stack. */
function nestedBeyond(document: unknown, limit: number): DocumentPath | null {
  const pending: Array<{ value: unknown; path: DocumentPath }> = [{ value: document, path: [] }];
  for (let next = pending.pop(); next; next = pending.pop()) {
    const { value, path } = next;
    if (path.length > limit) return path;
    if (Array.isArray(value)) value.forEach((item, i) => pending.push({ value: item, path: [...path, i] }));
    else if (isJsonObject(value)) for (const [key, item] of Object.entries(value)) pending.push({ value: item, path: [...path, key] });
  }
  return null;
}
