import { describe, expect, it } from 'vitest';
import { readdirSync, readFileSync } from 'node:fs';
import { dirname, join, normalize, relative } from 'node:path';
import { fileURLToPath } from 'node:url';

/**
 * The pipeline as imports: a stage imports only from the stages before it.
 * The order is read from the folder table of DEVELOPERS.md (its "order"
 * column), so the guide and this test cannot drift apart: a folder missing
 * from the table fails, and so does any import of a folder of the same or a
 * later order (two folders of one order stand side by side and import
 * neither way). Imports are read from the source text: static `import`/
 * `export … from` and dynamic `import('…')`, type-only imports included.
 */

const root = join(dirname(fileURLToPath(import.meta.url)), '..', '..');
const src = join(root, 'src');

/** Folder → order, from the rows "| `src/NAME/` | N | …" of DEVELOPERS.md. */
function documentedOrder(): Map<string, number> {
  const order = new Map<string, number>();
  for (const match of readFileSync(join(root, 'DEVELOPERS.md'), 'utf8').matchAll(/^\|\s*`src\/([a-z-]+)\/`\s*\|\s*(\d+)\s*\|/gm)) {
    order.set(match[1]!, Number(match[2]));
  }
  return order;
}

function sourceFiles(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((entry) =>
    entry.isDirectory() ? sourceFiles(join(dir, entry.name)) : entry.name.endsWith('.ts') ? [join(dir, entry.name)] : [],
  );
}

/** Every relative module a file imports, as a path under src/ (static, re-export and dynamic imports). */
function importsOf(file: string): string[] {
  const text = readFileSync(file, 'utf8');
  const specifiers = [...text.matchAll(/(?:\bfrom\s*|\bimport\s*\(\s*|^\s*import\s+)['"](\.{1,2}\/[^'"]+)['"]/gm)].map((m) => m[1]!);
  return specifiers.map((s) => relative(src, normalize(join(dirname(file), s))));
}

const folderOf = (pathUnderSrc: string) => pathUnderSrc.split(/[\\/]/)[0]!;

/**
 * Back-edges being removed by work in progress elsewhere: [importing file, imported file], both under src/.
 * Each must still occur (a stale entry fails), so the list only shrinks.
 */
const KNOWN_BACK_EDGES: ReadonlyArray<readonly [string, string]> = [];

describe('the pipeline as imports (order from DEVELOPERS.md)', () => {
  const order = documentedOrder();
  const files = sourceFiles(src);

  it('reads an order for every folder under src/', () => {
    const folders = [...new Set(files.map((f) => folderOf(relative(src, f))))].filter((f) => !f.endsWith('.ts'));
    expect(folders.length).toBeGreaterThan(10);
    for (const folder of folders) expect(order.has(folder), `src/${folder}/ has no row in the DEVELOPERS.md table`).toBe(true);
  });

  it('finds the imports it checks (a parser that reads nothing would pass anything)', () => {
    const planImports = importsOf(join(src, 'plan', 'plan-scenario.ts'));
    expect(planImports).toContain(join('solve', 'context-from-scenario.js'));
    expect(planImports).toContain(join('plan', 'solve-plan.js'));
  });

  it('no stage imports a stage of the same or a later order', () => {
    const backEdges: string[] = [];
    const seenKnown = new Set<string>();
    for (const file of files) {
      const from = relative(src, file);
      const fromFolder = folderOf(from);
      if (fromFolder === from) continue; // src/index.ts: the package's entry, above every stage
      for (const target of importsOf(file)) {
        const toFolder = folderOf(target);
        if (toFolder === target) backEdges.push(`${from} imports the package entry ${target}`);
        if (toFolder === fromFolder || target.startsWith('..')) continue;
        const known = KNOWN_BACK_EDGES.find(([a, b]) => a === from && b === target.replace(/\.js$/, '.ts'));
        if (known) {
          seenKnown.add(known.join(' -> '));
          continue;
        }
        if (!(order.get(toFolder)! < order.get(fromFolder)!))
          backEdges.push(`${from} imports ${target} (${fromFolder} ${order.get(fromFolder)}, ${toFolder} ${order.get(toFolder)})`);
      }
    }
    expect(backEdges).toEqual([]);
    expect([...seenKnown].sort()).toEqual(KNOWN_BACK_EDGES.map((e) => e.join(' -> ')).sort());
  });
});
