// Loads the bundled command line (dist/bundle/cli/ifzone.cjs, built by
// `npm run build`) with V8's code cache: the build runs the common commands
// once and saves the compiled code beside the bundle, so a start deserialises
// code instead of parsing and compiling it. The cache is read, never written,
// here: nothing is left in the user's directories. It is used only when its
// key (the SHA-256 of the bundle) matches the bundle; V8 itself refuses it when
// its version or flags differ. Either way the bundle is compiled from source
// as if there were no cache, and runs the same.
import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import Module, { createRequire } from 'node:module';
import { dirname } from 'node:path';
import { fileURLToPath } from 'node:url';
import { Script, constants } from 'node:vm';

/** The bundle: one CommonJS file, each lazily imported command a module run on first use. */
export const BUNDLE = fileURLToPath(new URL('../dist/bundle/cli/ifzone.cjs', import.meta.url));
/** The code cache: the key (SHA-256 of the bundle, 32 bytes), then V8's cached data. */
export const CODE_CACHE = `${BUNDLE}.cache`;
const KEY_BYTES = 32;

/** The key of a bundle's bytes: their SHA-256. */
export function codeCacheKey(bytes) {
  return createHash('sha256').update(bytes).digest();
}

/**
 * Compiles and runs the bundle. Returns its exports (`runCli`), the compiled
 * script (the build asks it for the cached data), and whether V8 took a cache.
 */
export function loadBundle({ useCache = true } = {}) {
  const bytes = readFileSync(BUNDLE);
  const cachedData = useCache ? matchingCache(bytes) : undefined;
  const script = new Script(Module.wrap(bytes.toString('utf8')), {
    filename: BUNDLE,
    cachedData,
    // Older Node 20 releases lack the constant; the bundle has no import() of its own to serve.
    importModuleDynamically: constants?.USE_MAIN_CONTEXT_DEFAULT_LOADER,
  });
  const module = { exports: {} };
  script.runInThisContext()(module.exports, createRequire(BUNDLE), module, BUNDLE, dirname(BUNDLE));
  return { exports: module.exports, script, cacheUsed: cachedData !== undefined && !script.cachedDataRejected };
}

/** V8's cached data when the cache file exists and was made from these bytes. */
function matchingCache(bytes) {
  let cache;
  try {
    cache = readFileSync(CODE_CACHE);
  } catch {
    return undefined;
  }
  return cache.length > KEY_BYTES && cache.subarray(0, KEY_BYTES).equals(codeCacheKey(bytes)) ? cache.subarray(KEY_BYTES) : undefined;
}
