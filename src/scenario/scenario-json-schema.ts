import './zod-config.js';
import * as z from 'zod';
import { scenarioFileSchema } from './scenario-file-schema.js';

type SchemaNode = Readonly<Record<string, unknown>>;

let cached: SchemaNode | undefined;

/**
 * The JSON Schema (draft 2020-12) of the scenario file format, generated from
 * the zod definition: what a file may contain as written (`io: 'input'`),
 * every sub-schema inline so editors need no references.
 *
 * A file with `extends` is a partial scenario (its base fills the rest), so
 * the schema holds it to the same keys and types but requires nothing in the
 * objects that merge; list entries replace, so they stay complete.
 *
 * @returns the schema as a plain JSON object (the same object on every call; do not mutate)
 * @example scenarioJsonSchema().$schema // 'https://json-schema.org/draft/2020-12/schema'
 */
export function scenarioJsonSchema(): SchemaNode {
  if (cached) return cached;
  const generated = z.toJSONSchema(scenarioFileSchema, { target: 'draft-2020-12', io: 'input', reused: 'inline' }) as SchemaNode;
  const { $schema, $id, title, description, ...body } = generated;
  cached = { $schema, $id, title, description, if: { required: ['extends'] }, then: partial(body), else: body };
  return cached;
}

/**
 * The same object schema with nothing required where objects merge: no
 * `required`, and no choice between key forms (a `oneOf` whose branches name
 * no `type`, as oneFormOf writes them), down through properties and union
 * branches but not into list items.
 */
function partial(node: SchemaNode): SchemaNode {
  const entries = Object.entries(node).flatMap(([keyword, value]): Array<[string, unknown]> => {
    if (keyword === 'required') return [];
    if (keyword === 'oneOf' && Array.isArray(value) && value.every((branch: SchemaNode) => !('type' in branch))) return [];
    if (keyword === 'properties')
      return [[keyword, Object.fromEntries(Object.entries(value as SchemaNode).map(([key, sub]) => [key, partial(sub as SchemaNode)]))]];
    if (keyword === 'anyOf' || keyword === 'oneOf') return [[keyword, (value as SchemaNode[]).map(partial)]];
    return [[keyword, value]];
  });
  return Object.fromEntries(entries);
}
