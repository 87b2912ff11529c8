// Loads the bundled command line (dist/bundle/cli/ifzone.cjs, built by
// `npm run build`) with V8's code cache: the build runs the common commands
// once and saves the compiled code beside the bundle, so a start deserialises
// code instead of parsing and compiling it. The cache is read, never written,
// here: nothing is left in the user's directories. It is used only when its
// key (the SHA-256 of the bundle) matches the bundle; V8 itself refuses it when
// its version or flags differ; either way the bundle is then compiled from
// source and runs the same, only slower to start. CommonJS, like bin/ifzone
// (bin/package.json).
'use strict';
const { createHash } = require('node:crypto');
const { readFileSync } = require('node:fs');
const Module = require('node:module');
const { dirname, join } = require('node:path');
const { Script, constants } = require('node:vm');

/** The bundle: one CommonJS file, each lazily imported command a module run on first use. */
const BUNDLE = join(__dirname, '..', 'dist', 'bundle', 'cli', 'ifzone.cjs');
/** The code cache: the key (SHA-256 of the bundle, 32 bytes), then V8's cached data. */
const CODE_CACHE = `${BUNDLE}.cache`;
const KEY_BYTES = 32;

/** The key of a bundle's bytes: their SHA-256. */
function codeCacheKey(bytes) {
  return createHash('sha256').update(bytes).digest();
}

/**
 * Compiles and runs the bundle. Returns its exports (`runCli`), the compiled
 * script (the build asks it for the cached data), and whether V8 took a cache.
 */
function loadBundle({ useCache = true } = {}) {
  const bytes = readFileSync(BUNDLE);
  const cachedData = useCache ? matchingCache(bytes) : undefined;
  const script = new Script(Module.wrap(bytes.toString('utf8')), {
    filename: BUNDLE,
    cachedData,
    // Older Node 20 releases lack the constant; the bundle has no import() of its own to serve.
    importModuleDynamically: constants?.USE_MAIN_CONTEXT_DEFAULT_LOADER,
  });
  const module = { exports: {} };
  script.runInThisContext()(module.exports, Module.createRequire(BUNDLE), module, BUNDLE, dirname(BUNDLE));
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

module.exports = { BUNDLE, CODE_CACHE, codeCacheKey, loadBundle };
