// Bundles the command line into dist/bundle/ with esbuild: one small entry
// chunk (commander, the light commands) and, split at each lazy `import()`,
// a chunk per heavy command and per shared library (zod, the LP solver), so
// that a run loads only what its command needs. `tsc` still type-checks and
// writes dist/ module by module for the tests and benchmarks; bin/ifzone runs
// this bundle.
import { build } from 'esbuild';
import { rmSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

const root = fileURLToPath(new URL('..', import.meta.url));
const outdir = `${root}dist/bundle`;

rmSync(outdir, { recursive: true, force: true });
await build({
  absWorkingDir: root,
  entryPoints: ['src/cli/main.ts'],
  outdir,
  bundle: true,
  splitting: true,
  format: 'esm',
  platform: 'node',
  target: 'node20',
  // Whitespace and syntax only: identifiers keep their names, so the stack
  // that --debug prints still names our functions.
  minifyWhitespace: true,
  minifySyntax: true,
  // commander is CommonJS and requires Node's built-ins; an ES module has no
  // `require` of its own.
  banner: {
    js: "import { createRequire as ifzoneCreateRequire } from 'node:module'; const require = ifzoneCreateRequire(import.meta.url);",
  },
  chunkNames: 'chunks/[name]-[hash]',
  logLevel: 'warning',
});
