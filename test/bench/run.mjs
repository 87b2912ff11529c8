// Runs every benchmark module in test/bench/ in turn (file name order).
// A module exports a default async function that prints its figures and
// returns true when its limit is met. Exits 1 when any benchmark misses.
import { readdirSync } from 'node:fs';
import { fileURLToPath, pathToFileURL } from 'node:url';

const here = fileURLToPath(new URL('.', import.meta.url));
const modules = readdirSync(here)
  .filter((name) => name.endsWith('.mjs') && name !== 'run.mjs')
  .sort();

let failed = 0;
for (const name of modules) {
  const { default: bench } = await import(pathToFileURL(here + name).href);
  if (typeof bench !== 'function') {
    console.error(`${name}: no default export to run`);
    failed++;
    continue;
  }
  console.log(`— ${name}`);
  const ok = await bench();
  console.log(ok ? `${name}: within limit` : `${name}: LIMIT MISSED`);
  if (!ok) failed++;
}
console.log(`${modules.length - failed} of ${modules.length} benchmarks within their limits`);
process.exitCode = failed === 0 ? 0 : 1;
