// Bundles the command line into one CommonJS file, dist/bundle/cli/ifzone.cjs,
// with esbuild, then primes V8's code cache for it (prime-code-cache.mjs).
// Each lazy `import()` in src/ becomes a module that the bundle runs on first
// use, so a command still runs only the top-level code it needs (`windows`
// never builds the zod schema, the LP solver or the pictures); and with the
// cache, the code of the whole file is deserialised instead of parsed and
// compiled. `tsc` still type-checks and writes dist/ module by module for the
// tests and benchmarks; bin/ifzone runs this bundle (through bin/load-bundle.js).
import { build } from 'esbuild';
import { execFileSync } from 'node:child_process';
import { rmSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

const root = fileURLToPath(new URL('..', import.meta.url));

// commander requires node:child_process at its top (for subcommands run as separate programs, which ifzone has none
// of), and javascript-lp-solver does too (for an external solver it never calls here); loading it costs a start about
// 3 ms of CPU. In the bundle they get a stand-in that loads the real module on the first property read (never, in
// ifzone). Both only read properties of it (commander `childProcess.spawn`, the LP solver its default import's).
const lazyChildProcess = {
  name: 'lazy-child-process',
  setup(build) {
    build.onResolve({ filter: /^(node:)?child_process$/ }, (args) =>
      /[\\/]node_modules[\\/](commander|javascript-lp-solver)[\\/]/.test(args.importer)
        ? { path: 'child_process', namespace: 'lazy-builtin' }
        : undefined,
    );
    build.onLoad({ filter: /.*/, namespace: 'lazy-builtin' }, () => ({
      contents: "let real; module.exports = new Proxy({}, { get: (_, key) => (real ??= require('node:child_process'))[key] });",
      loader: 'js',
    }));
  },
};

rmSync(`${root}dist/bundle`, { recursive: true, force: true });
await build({
  absWorkingDir: root,
  entryPoints: ['src/cli/main.ts'],
  // Three folders below the package root, as src/cli/commands/ and dist/cli/commands/ are, so that the paths the
  // commands make from their own location (`new URL('../../../scenarios/…', import.meta.url)`) hold in the bundle too.
  outfile: `${root}dist/bundle/cli/ifzone.cjs`,
  bundle: true,
  format: 'cjs',
  platform: 'node',
  target: 'node20',
  // A CommonJS file has no import.meta: the bundle's own file URL stands in for it.
  banner: { js: "const ifzoneModuleUrl = require('node:url').pathToFileURL(__filename).href;" },
  define: { 'import.meta.url': 'ifzoneModuleUrl' },
  // Whitespace and syntax only: identifiers keep their names, so the stack
  // that --debug prints still names our functions.
  minifyWhitespace: true,
  minifySyntax: true,
  logLevel: 'warning',
  plugins: [lazyChildProcess],
});
// In a child process with no NODE_OPTIONS: V8 accepts a cache only from a process with the same flags, and `ifzone` runs with none.
const env = { ...process.env };
delete env.NODE_OPTIONS;
execFileSync(process.execPath, [`${root}scripts/prime-code-cache.mjs`], { cwd: root, env, stdio: 'inherit' });
