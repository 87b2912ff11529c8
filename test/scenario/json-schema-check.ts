/**
 * A small JSON Schema (draft 2020-12) checker, written here independently of
 * zod, for the keywords the scenario schema uses: type, enum, const,
 * properties, required, additionalProperties, propertyNames, items,
 * prefixItems, minItems, maxItems, uniqueItems, minimum, maximum, exclusiveMinimum,
 * exclusiveMaximum, pattern, anyOf, oneOf, not, if/then/else. Semantics as in JSON Schema
 * Validation 2020-12, sections 6.1–6.5, and Core 2020-12, section 10
 * (applicators). An unknown keyword makes it throw, so it cannot pass by
 * ignoring what it does not understand. Annotations (description, default,
 * examples, title, $id, $schema) are skipped.
 */
type Schema = Readonly<Record<string, unknown>>;

const ANNOTATIONS = new Set(['description', 'default', 'examples', 'title', '$id', '$schema']);

export function jsonSchemaAccepts(schema: Schema | boolean, value: unknown): boolean {
  // Boolean schemas (Core 2020-12, section 4.3.2): true accepts anything, false nothing (`items: false` closes a tuple).
  if (typeof schema === 'boolean') return schema;
  for (const [keyword, argument] of Object.entries(schema)) {
    if (ANNOTATIONS.has(keyword)) continue;
    if (!keywordHolds(keyword, argument, schema, value)) return false;
  }
  return true;
}

function keywordHolds(keyword: string, argument: unknown, schema: Schema, value: unknown): boolean {
  const object = isObject(value) ? value : null;
  const list = Array.isArray(value) ? value : null;
  switch (keyword) {
    case 'type':
      return (Array.isArray(argument) ? argument : [argument]).some((type) => hasType(value, String(type)));
    case 'enum':
      return (argument as unknown[]).some((option) => option === value);
    case 'const':
      return argument === value;
    case 'properties':
      return (
        !object ||
        Object.entries(argument as Schema).every(
          ([key, sub]) => !Object.hasOwn(object, key) || jsonSchemaAccepts(sub as Schema, object[key]),
        )
      );
    case 'required':
      return !object || (argument as string[]).every((key) => Object.hasOwn(object, key));
    case 'additionalProperties': {
      if (!object) return true;
      const named = isObject(schema.properties) ? schema.properties : {};
      const extra = Object.keys(object).filter((key) => !Object.hasOwn(named, key));
      if (argument === false) return extra.length === 0;
      return extra.every((key) => jsonSchemaAccepts(argument as Schema, object[key]));
    }
    case 'propertyNames':
      return !object || Object.keys(object).every((key) => jsonSchemaAccepts(argument as Schema, key));
    case 'prefixItems':
      return !list || (argument as Schema[]).every((sub, i) => i >= list.length || jsonSchemaAccepts(sub, list[i]));
    case 'items': {
      if (!list) return true;
      const from = Array.isArray(schema.prefixItems) ? schema.prefixItems.length : 0;
      return list.slice(from).every((item) => jsonSchemaAccepts(argument as Schema, item));
    }
    case 'minItems':
      return !list || list.length >= Number(argument);
    case 'maxItems':
      return !list || list.length <= Number(argument);
    case 'uniqueItems':
      // Validation 2020-12, section 6.4.3. Items compared as JSON text: exact for the lists of numbers the
      // scenario schema asks it of (objects differing only in key order would count as different).
      return argument !== true || !list || new Set(list.map((item) => JSON.stringify(item))).size === list.length;
    case 'minimum':
      return typeof value !== 'number' || value >= Number(argument);
    case 'maximum':
      return typeof value !== 'number' || value <= Number(argument);
    case 'exclusiveMinimum':
      return typeof value !== 'number' || value > Number(argument);
    case 'exclusiveMaximum':
      return typeof value !== 'number' || value < Number(argument);
    case 'pattern':
      return typeof value !== 'string' || new RegExp(String(argument), 'u').test(value);
    case 'anyOf':
      return (argument as Schema[]).some((sub) => jsonSchemaAccepts(sub, value));
    case 'oneOf':
      return (argument as Schema[]).filter((sub) => jsonSchemaAccepts(sub, value)).length === 1;
    case 'not':
      return !jsonSchemaAccepts(argument as Schema, value);
    case 'if': {
      const branch = jsonSchemaAccepts(argument as Schema, value) ? schema.then : schema.else;
      return branch === undefined || jsonSchemaAccepts(branch as Schema, value);
    }
    case 'then':
    case 'else':
      return true; // read with 'if'
    default:
      throw new Error(`json-schema-check does not know the keyword ${keyword}`);
  }
}

function hasType(value: unknown, type: string): boolean {
  switch (type) {
    case 'null':
      return value === null;
    case 'boolean':
      return typeof value === 'boolean';
    case 'string':
      return typeof value === 'string';
    case 'number':
      return typeof value === 'number';
    case 'integer':
      return typeof value === 'number' && Number.isInteger(value);
    case 'array':
      return Array.isArray(value);
    case 'object':
      return isObject(value);
    default:
      throw new Error(`json-schema-check does not know the type ${type}`);
  }
}

function isObject(value: unknown): value is Readonly<Record<string, unknown>> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}
