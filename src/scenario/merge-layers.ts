import { isJsonObject, type DocumentPath } from './document-path.js';

/** One file of an `extends` chain, its `extends` key already taken out. */
export interface Layer {
  readonly file: string;
  readonly document: Readonly<Record<string, unknown>>;
}

/**
 * Merges an `extends` chain into one document: objects merge key by key
 * (recursively), anything else, lists included, replaces what the base had.
 * An object whose `kind` differs from the base's is a different thing (a
 * table filter over a Butterworth one) and replaces it whole.
 *
 * @param layers the chain, the file asked for first and its furthest base last
 * @returns the merged document (new objects where merged; values not copied otherwise)
 * @example mergeLayers([{ file: 'v.json', document: { a: { x: 1 }, l: [2] } }, { file: 'b.json', document: { a: { y: 0 }, l: [1, 1] } }])
 *   // { a: { y: 0, x: 1 }, l: [2] }
 */
export function mergeLayers(layers: readonly Layer[]): Readonly<Record<string, unknown>> {
  return layers.reduceRight<Readonly<Record<string, unknown>>>((merged, layer) => mergeObjects(merged, layer.document), {});
}

function mergeObjects(base: Readonly<Record<string, unknown>>, over: Readonly<Record<string, unknown>>): Readonly<Record<string, unknown>> {
  const keys = [...new Set([...Object.keys(base), ...Object.keys(over)])];
  // Object.fromEntries defines own properties, so a key named __proto__ stays data.
  return Object.fromEntries(
    keys.map((key) => {
      if (!Object.hasOwn(over, key)) return [key, base[key]];
      const mine = over[key];
      const theirs = Object.hasOwn(base, key) ? base[key] : undefined;
      return [key, merges(theirs, mine) ? mergeObjects(theirs, mine as Readonly<Record<string, unknown>>) : mine];
    }),
  );
}

/**
 * Which file of a chain supplied the value at a path of the merged document,
 * following the merge rule: where objects merged, deeper keys may come from
 * any of them; a non-object (or a list) comes whole from the most derived
 * file that has it. A path that exists nowhere (a missing key) is charged to
 * the most derived file holding its nearest existing parent.
 *
 * @param layers the chain, most derived first
 * @param path the path in the merged document
 * @returns the file's name
 * @example fileOfPath([{ file: 'v.json', document: { converter: { bits: 12 } } }, { file: 'base.json', document: { converter: { bits: 14 } } }], ['converter', 'bits']) // 'v.json' (the variant, which sets bits)
 */
export function fileOfPath(layers: readonly Layer[], path: DocumentPath): string {
  return layers[supplierIndex(layers, path)]?.file ?? '';
}

/**
 * The most derived file among those that supplied any of the paths: where a
 * check compares two fields, the file that wrote either of them last.
 *
 * @param layers the chain, most derived first
 * @param paths paths in the merged document
 * @returns the file's name
 * @example fileOfPaths([{ file: 'v.json', document: { converter: { minRate: 2 } } }, { file: 'base.json', document: { converter: { maxRate: 1 } } }], [['converter', 'maxRate'], ['converter', 'minRate']]) // 'v.json' (the variant, which set minRate)
 */
export function fileOfPaths(layers: readonly Layer[], paths: readonly DocumentPath[]): string {
  const index = Math.min(...paths.map((path) => supplierIndex(layers, path)));
  return layers[index]?.file ?? layers[0]?.file ?? '';
}

function supplierIndex(layers: readonly Layer[], path: DocumentPath): number {
  // Contributors at the current depth, furthest base first, as the merge folds them.
  let contributors: ReadonlyArray<{ readonly index: number; readonly value: unknown }> = layers
    .map((layer, index) => ({ index, value: layer.document as unknown }))
    .reverse();
  for (const step of path) {
    let next: Array<{ index: number; value: unknown }> = [];
    let merged: unknown;
    for (const { index, value: holder } of contributors) {
      const value = childOf(holder, step);
      if (value === undefined) continue;
      if (merged !== undefined && merges(merged, value)) {
        next.push({ index, value });
        merged = mergeObjects(merged, value as Readonly<Record<string, unknown>>);
      } else {
        next = [{ index, value }];
        merged = value;
      }
    }
    if (next.length === 0) break;
    contributors = next;
  }
  return contributors.at(-1)?.index ?? 0;
}

/** Whether a base value and its override merge key by key (else the override replaces). */
function merges(base: unknown, over: unknown): base is Readonly<Record<string, unknown>> {
  if (!isJsonObject(base) || !isJsonObject(over)) return false;
  return !(Object.hasOwn(base, 'kind') && Object.hasOwn(over, 'kind') && base.kind !== over.kind);
}

function childOf(holder: unknown, step: string | number): unknown {
  if (Array.isArray(holder)) return typeof step === 'number' ? holder[step] : undefined;
  return isJsonObject(holder) && typeof step === 'string' && Object.hasOwn(holder, step) ? holder[step] : undefined;
}
