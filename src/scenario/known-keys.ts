import { isJsonObject, type DocumentPath } from './document-path.js';

type SchemaNode = Readonly<Record<string, unknown>>;

/**
 * The keys a JSON Schema allows in the object at a path of a document: the
 * `properties` of every object sub-schema reachable there, following
 * `anyOf`/`oneOf`/`then`/`else` branches and, where a branch pins a key with `const` (a
 * `kind` discriminator), only the branches the document's value agrees with.
 * Reading the emitted schema rather than zod internals keeps this exact for
 * whatever the schema says.
 *
 * @param schema the JSON Schema of the whole document
 * @param path where the object sits in the document
 * @param document the document, to choose between branches
 * @returns the allowed keys in schema order, without repeats (empty when unknown)
 * @example knownKeys(scenarioJsonSchema(), ['converter'], {}).includes('bits') // true
 */
export function knownKeys(schema: SchemaNode, path: DocumentPath, document: unknown): string[] {
  let nodes = [schema];
  let value = document;
  for (const step of path) {
    nodes = nodes.flatMap(branches).flatMap((node) => childSchemas(node, step));
    value = ownValue(value, step);
  }
  const keys = nodes
    .flatMap(branches)
    .filter((node) => agrees(node, value))
    .flatMap((node) => (isJsonObject(node.properties) ? Object.keys(node.properties) : []));
  return [...new Set(keys)];
}

function branches(node: SchemaNode): SchemaNode[] {
  const alternatives = [node.anyOf, node.oneOf, [node.then, node.else]].flatMap((list) =>
    Array.isArray(list) ? list.filter(isJsonObject) : [],
  );
  return [node, ...alternatives.flatMap(branches)];
}

function childSchemas(node: SchemaNode, step: string | number): SchemaNode[] {
  if (typeof step === 'number') {
    const tuple = Array.isArray(node.prefixItems) ? node.prefixItems[step] : undefined;
    return [tuple, node.items].filter(isJsonObject);
  }
  const property = isJsonObject(node.properties) ? node.properties[step] : undefined;
  return [property ?? node.additionalProperties].filter(isJsonObject);
}

function agrees(node: SchemaNode, value: unknown): boolean {
  if (!isJsonObject(node.properties)) return false;
  if (!isJsonObject(value)) return true;
  return Object.entries(node.properties).every(
    ([key, property]) => !isJsonObject(property) || !('const' in property) || !Object.hasOwn(value, key) || property.const === value[key],
  );
}

function ownValue(container: unknown, step: string | number): unknown {
  if (Array.isArray(container)) return typeof step === 'number' ? container[step] : undefined;
  return isJsonObject(container) && typeof step === 'string' && Object.hasOwn(container, step) ? container[step] : undefined;
}
