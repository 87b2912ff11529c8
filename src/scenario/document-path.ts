/** A place in a JSON document: object keys and list indexes from the root. */
export type DocumentPath = readonly (string | number)[];

const IDENTIFIER = /^[A-Za-z_$][\w$]*$/;

/**
 * Writes a document path as people read it: keys joined by dots, list
 * indexes in brackets, keys that are not plain words quoted in brackets.
 *
 * @param path the keys and indexes from the root
 * @returns e.g. `boardSpurs[2].frequency`, `converter.harmonics["2"]`; `` for the root
 * @example pathText(['boardSpurs', 2, 'frequency']) // 'boardSpurs[2].frequency'
 */
export function pathText(path: DocumentPath): string {
  let text = '';
  for (const step of path) {
    if (typeof step === 'number') text += `[${step}]`;
    else if (IDENTIFIER.test(step)) text += text === '' ? step : `.${step}`;
    else text += `[${JSON.stringify(step)}]`;
  }
  return text;
}

/** Whether a value is a JSON object (not a list, not null). */
export function isJsonObject(value: unknown): value is Readonly<Record<string, unknown>> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}
