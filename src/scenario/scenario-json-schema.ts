import { z } from 'zod';
import { scenarioFileSchema } from './scenario-file-schema.js';

let cached: Readonly<Record<string, unknown>> | undefined;

/**
 * The JSON Schema (draft 2020-12) of the scenario file format, generated from
 * the zod definition: what a file may contain as written (`io: 'input'`),
 * every sub-schema inline so editors need no references.
 *
 * @returns the schema as a plain JSON object (the same object on every call; do not mutate)
 * @example scenarioJsonSchema().$schema // 'https://json-schema.org/draft/2020-12/schema'
 */
export function scenarioJsonSchema(): Readonly<Record<string, unknown>> {
  cached ??= z.toJSONSchema(scenarioFileSchema, { target: 'draft-2020-12', io: 'input', reused: 'inline' }) as Record<string, unknown>;
  return cached;
}
