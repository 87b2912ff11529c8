import { describe, expect, it } from 'vitest';
import { fileOfPath, fileOfPaths, mergeLayers, type Layer } from '../../src/scenario/merge-layers.js';

/** The merge rule the README states: objects merge key by key, lists (and anything else) replace; `extends` chains. */
const base: Layer = { file: 'base.json', document: { a: { x: 1, y: 2 }, list: [1, 2, 3], filter: { kind: 'k1', p: 1 }, s: 'base' } };
const mid: Layer = { file: 'mid.json', document: { a: { y: 20, z: 30 }, list: [9], filter: { kind: 'k2', q: 2 } } };
const top: Layer = { file: 'top.json', document: { a: { x: 100 }, s: null } };

describe('mergeLayers', () => {
  it('merges objects by key, replaces lists and scalars, most derived last', () => {
    expect(mergeLayers([top, mid, base])).toEqual({ a: { x: 100, y: 20, z: 30 }, list: [9], filter: { kind: 'k2', q: 2 }, s: null });
  });

  it('replaces an object whose kind differs, merges one whose kind agrees', () => {
    expect(mergeLayers([mid, base]).filter).toEqual({ kind: 'k2', q: 2 });
    const same: Layer = { file: 's.json', document: { filter: { kind: 'k1', q: 3 } } };
    expect(mergeLayers([same, base]).filter).toEqual({ kind: 'k1', p: 1, q: 3 });
  });

  it('lets an object replace a scalar and a scalar replace an object', () => {
    expect(mergeLayers([{ file: 'o', document: { s: { k: 1 } } }, base]).s).toEqual({ k: 1 });
    expect(mergeLayers([{ file: 'o', document: { a: 5 } }, base]).a).toBe(5);
  });

  it('keeps a key named __proto__ as data', () => {
    const sneaky = JSON.parse('{"__proto__": {"polluted": true}}') as Record<string, unknown>;
    const merged = mergeLayers([
      { file: 'x', document: sneaky },
      { file: 'y', document: JSON.parse('{"__proto__": {"also": 1}}') as Record<string, unknown> },
    ]);
    expect(Object.hasOwn(merged, '__proto__')).toBe(true);
    expect((merged as { polluted?: unknown }).polluted).toBeUndefined();
    expect(({} as { polluted?: unknown }).polluted).toBeUndefined();
  });

  it('leaves the layers untouched', () => {
    const before = JSON.stringify([top, mid, base]);
    mergeLayers([top, mid, base]);
    expect(JSON.stringify([top, mid, base])).toBe(before);
  });
});

describe('fileOfPath', () => {
  const chain = [top, mid, base];
  it.each([
    [['a', 'x'], 'top.json'],
    [['a', 'y'], 'mid.json'],
    [['a', 'z'], 'mid.json'],
    [['a'], 'top.json'],
    [['list', 0], 'mid.json'],
    [['list', 2], 'mid.json'], // replaced: base's third entry is gone, the list is mid's
    [['filter', 'p'], 'mid.json'], // replaced by a different kind
    [['filter', 'kind'], 'mid.json'],
    [['s'], 'top.json'],
    [['missing', 'deeper'], 'top.json'],
    [[], 'top.json'],
  ] as const)('%j comes from %s', (path, file) => {
    expect(fileOfPath(chain, path)).toBe(file);
  });

  it('charges a comparison to the file that wrote either field last', () => {
    expect(
      fileOfPaths(chain, [
        ['a', 'y'],
        ['a', 'x'],
      ]),
    ).toBe('top.json');
    expect(fileOfPaths([mid, base], [['filter', 'q'], ['list']])).toBe('mid.json');
    expect(fileOfPaths([top, mid, base], [['filter', 'q']])).toBe('mid.json');
  });
});
